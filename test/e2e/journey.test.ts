// A reader's way through the demo site (issue 7 §2): home → catalogue → fuzzy
// search with a typo → part page → design page → try page (change V+, a verdict
// flips, the address follows, a reload restores it) → download the design file
// and validate it with the CLI. The steps share one page and run in order.
import { spawnSync } from "node:child_process";
import { cpSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join, resolve } from "node:path";
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { parseDesignValue } from "../../src/engine.ts";
import { evaluateDesign } from "../../src/engine.ts";
import { loadDataSet, type DataSet } from "../../src/node/load-data.ts";
import { FITS_IN_FULL } from "../../src/view/design-view.ts";
import { buildSearchIndex } from "../../src/view/search-index.ts";
import { rejectionGroups } from "../../src/view/role-lists.ts";
import { projectNode, ROOT } from "./harness/build-site.ts";
import { browserReady, openBrowser, openTracked, site, troubles, type Tracked } from "./harness/session.ts";
import { catalogueRow, screenshot, tryPageReady, visibleCatalogueRows } from "./harness/steps.ts";

const TYPO = "rial to rial";
const DESIGN = "bridge-10v-5v-adc";
// In the try page's default design (the bridge design, pumped V− ≈ −3.16 V) this
// class fits as buffer at V+ = 5 V (total 8.16 V), marginal: its swing is rated at
// 100 kΩ and the buffer drives the rectifier's two 10 kΩ inputs, 5 kΩ (output-load);
// at V+ = 12 V the total of 15.16 V exceeds its 12 V supply_max_v (data/op-amps.csv),
// a supply-range fail.
const FLIPS = { part: "oa-nanopower-rro-12v", before: "marginal", after: "fail", rule: "supply-range" };

describe.skipIf(!browserReady)("a reader's journey through the demo site", () => {
  let browser: Browser;
  let t: Tracked;
  let page: Page;
  let data: DataSet;
  let firstHit: string;
  let downloaded: { name: string; text: string };

  beforeAll(async () => {
    data = loadDataSet(site("demo").dataDir);
    browser = await openBrowser();
    t = await openTracked(browser, "demo");
    page = t.page;
  });
  afterAll(async () => browser?.close());

  const h1 = () => page.getByRole("heading", { level: 1 }).textContent();
  const mainNav = () => page.getByRole("navigation", { name: "Main" });

  it("goes from the home page to the catalogue", async () => {
    await page.goto(t.url());
    expect(await h1()).toBe("railsieve");
    await mainNav().getByRole("link", { name: "Catalogue" }).click();
    await page.waitForURL(t.url("catalogue/index.html"));
    expect(await h1()).toBe("Catalogue");
  });

  it(`finds every rail-to-rail class from the typo "${TYPO}", best match first, and keeps the query in the address`, async () => {
    await page.getByRole("searchbox", { name: "Search" }).pressSequentially(TYPO, { delay: 15 });
    await page.locator("#catalogue-status-line", { hasText: `matching “${TYPO}”` }).waitFor();
    const shown = await visibleCatalogueRows(page);
    // The rail-to-rail classes are the ones the catalogue tags so (data/*.csv), 26 in the demo data.
    const railToRail = data.catalogue.parts.filter((p) => p.tags.includes("rail-to-rail")).map((p) => p.id);
    expect(railToRail).toHaveLength(26);
    expect([...shown].sort()).toEqual([...railToRail].sort());
    // Within each table the rows follow the search index's ranking.
    const index = buildSearchIndex(data.catalogue.parts);
    const kindOf = (id: string) => data.catalogue.byId.get(id)?.kind;
    const ranked = index.search(TYPO).map((h) => h.id);
    for (const kind of ["op-amp", "comparator"]) {
      expect(shown.filter((id) => kindOf(id) === kind)).toEqual(ranked.filter((id) => kindOf(id) === kind));
    }
    expect(new URL(page.url()).searchParams.get("q")).toBe(TYPO);
    firstHit = shown[0]!;
    expect(kindOf(firstHit)).toBe("op-amp");
  });

  it("opens the best match's part page with its parameters in SI units and its fit in each design", async () => {
    const part = data.catalogue.byId.get(firstHit)!;
    await catalogueRow(page, firstHit).getByRole("link", { name: part.name }).click();
    await page.waitForURL(t.url(`parts/${firstHit}/index.html`));
    expect(await h1()).toBe(part.name);
    const value = (column: string) => page.locator(`dl.values dt:has(code:text-is("${column}")) + dd`).textContent();
    // oa-cmos-rrio-3m in data/op-amps.csv: gbw_mhz 3, ib_max_na 0.01 (= 10 pA), slew 2 V/µs.
    expect(firstHit).toBe("oa-cmos-rrio-3m");
    expect(await value("gbw_mhz")).toMatch(/^3(\.0+)? MHz$/);
    expect(await value("ib_max_na")).toMatch(/^10(\.0+)? pA$/);
    expect(await value("slew_v_per_us")).toMatch(/^2(\.0+)? V\/µs$/);
    const line = page.locator(`#in-${DESIGN}--buffer`);
    expect(await line.textContent()).toContain("rejected");
  });

  it("reads the part's verdict in one line per design and role: the rule that decides it, with its numbers", async () => {
    const evaluation = evaluateDesign(data.designs.find((d) => d.design?.id === DESIGN)!.design!, data.catalogue);
    if (!evaluation.ok) throw new Error(`${DESIGN} does not evaluate`);
    const rejection = evaluation.result.roles
      .find((r) => r.role === "buffer")!
      .rejected.find((p) => p.part.id === firstHit)!;
    const line = page.locator(`#in-${DESIGN}--buffer`);
    const failing = rejection.findings.find((f) => f.verdict === "fail")!;
    expect(failing.rule).toBe("supply-range");
    expect(failing.reason).toMatch(/\d\.\d+ V/);
    expect(await line.textContent()).toContain(`${failing.rule}: ${failing.reason}`);
    await screenshot(line, "part-page-entry");
    await line.getByRole("link", { name: evaluation.result.design.title }).click();
    await page.waitForURL(t.url(`designs/${DESIGN}/index.html#role-buffer`));
  });

  it("shows the design's buffer shortlist in full, then every rejection with its reasons and numbers", async () => {
    const evaluation = evaluateDesign(data.designs.find((d) => d.design?.id === DESIGN)!.design!, data.catalogue);
    if (!evaluation.ok) throw new Error(`${DESIGN} does not evaluate`);
    const buffer = evaluation.result.roles.find((r) => r.role === "buffer")!;
    const role = page.locator("#role-buffer");

    // The link from the part page lands on the role; the part is one line under the rule that decides it.
    expect(await role.isVisible()).toBe(true);
    const group = role.locator('section.reject-group[data-rule="supply-range"]');
    expect(await group.locator(`li:has(a:text-is("${firstHit}"))`).textContent()).toMatch(/\d\.\d+ V short$/);
    const supplyGroup = rejectionGroups(buffer).find((g) => g.rule === "supply-range")!;
    expect(await group.locator("p.reject-head").textContent()).toContain(
      `supply-range: ${supplyGroup.parts.length} part`,
    );

    // Shortlist: the best fits in full, best first, every reason with a number.
    expect(buffer.fits.length).toBeGreaterThan(0);
    const inFull = buffer.fits.slice(0, FITS_IN_FULL);
    const fits = role.locator("ol.results > li");
    expect(await fits.count()).toBe(inFull.length);
    expect(await fits.first().locator("h4 a").textContent()).toBe(buffer.fits[0]!.part.name);
    const fitReasons = await fits.locator("table.findings > tbody > tr > td:last-child").allInnerTexts();
    // SPEC §7: unity-gain-stable and phase-reversal are yes/no; every other rule states numbers.
    const numeric = inFull.flatMap((p) =>
      p.findings.filter((f) => !["unity-gain-stable", "phase-reversal"].includes(f.rule)),
    );
    expect(numeric.length).toBeGreaterThanOrEqual(inFull.length * 5);
    for (const f of numeric) {
      expect(fitReasons).toContain(f.reason);
      expect(f.reason).toMatch(/\d/);
    }

    // Rejections: all of them, one line each, grouped by the rule that decides them.
    expect(await role.locator(".rejections ul.part-lines > li").count()).toBe(buffer.rejected.length);

    // A rail diagram for each fit drawn in full, drawing both rails.
    const diagrams = role.locator("svg.rail-diagram");
    expect(await diagrams.count()).toBe(inFull.filter((p) => p.part.kind === "op-amp").length);
    const first = diagrams.first();
    expect(await first.getAttribute("role")).toBe("img");
    expect(await first.locator("title").textContent()).toBe(
      `Rail diagram: ${buffer.fits[0]!.part.name} as ${buffer.stage.label}`,
    );
    const labels = (await first.locator("text").allTextContents()).join(" ");
    expect(labels).toMatch(/V− −3\.\d+ V/);
    expect(labels).toMatch(/V\+ \+5\.00 V/);

    await page.evaluate(() => window.scrollTo(0, 0));
    await screenshot(page, "design-page");
    await screenshot(fits.first(), "design-page-buffer-best-fit");
  });

  const verdictOf = async (partId: string): Promise<string | null> => {
    const row = page.locator(`#try-role-buffer [data-part="${partId}"]`);
    if ((await row.count()) === 0) {
      // Long lists show their first rows; open the rest as a reader would.
      // Each click re-renders the list, so take the first closed button each time (a list's
      // buttons are not stable handles across patches).
      const closed = page.locator('#try-role-buffer button.more[aria-expanded="false"]');
      for (let guard = 0; guard < 10 && (await closed.count()) > 0; guard++) await closed.first().click();
    }
    return row.getAttribute("data-verdict");
  };
  const positiveRail = () => page.getByLabel("Positive rail V+");
  const vPlusInAddress = () => new URL(page.url()).searchParams.get("supply.positive_v");

  it("on the try page, changing V+ flips a verdict and puts the design in the address; a reload restores it", async () => {
    await mainNav().getByRole("link", { name: "Try a design" }).click();
    await tryPageReady(page);
    expect(await positiveRail().inputValue()).toBe("5");
    expect(await verdictOf(FLIPS.part)).toBe(FLIPS.before);

    await positiveRail().fill("12");
    // The page redraws the results before it writes the address, so once the address moved the results are new.
    await page.waitForURL((url) => url.searchParams.get("supply.positive_v") === "12");
    expect(await verdictOf(FLIPS.part)).toBe(FLIPS.after);
    // A rejection is one line under the rule that decides it.
    const group = page.locator(`#try-role-buffer section.reject-group:has([data-part="${FLIPS.part}"])`);
    expect(await group.getAttribute("data-rule")).toBe(FLIPS.rule);

    await page.reload();
    await tryPageReady(page);
    expect(vPlusInAddress()).toBe("12");
    expect(await positiveRail().inputValue()).toBe("12");
    expect(await verdictOf(FLIPS.part)).toBe(FLIPS.after);
    await page.evaluate(() => window.scrollTo(0, 0));
    await screenshot(page, "try-page");
  });

  it("downloads the design file, which railsieve validate accepts in a copy of the data folder", async () => {
    const [download] = await Promise.all([
      page.waitForEvent("download"),
      page.getByRole("button", { name: "Download design file" }).click(),
    ]);
    downloaded = { name: download.suggestedFilename(), text: readFileSync((await download.path())!, "utf8") };
    const raw: unknown = JSON.parse(downloaded.text);
    const parsed = parseDesignValue(downloaded.name, raw);
    expect(parsed.problems).toEqual([]);
    expect(parsed.design?.supply.positive_v).toBe(12);
    expect(downloaded.name).toBe(`${parsed.design!.id}.json`);

    const dir = mkdtempSync(join(tmpdir(), "railsieve-e2e-data-"));
    try {
      cpSync(site("demo").dataDir, dir, { recursive: true });
      writeFileSync(join(dir, "designs", downloaded.name), downloaded.text);
      const cli = spawnSync(projectNode(), [resolve(ROOT, "bin/railsieve.ts"), "validate", "--data", dir], {
        cwd: ROOT,
        encoding: "utf8",
      });
      expect({ status: cli.status, stderr: cli.stderr }).toEqual({ status: 0, stderr: "" });
      expect(cli.stdout).toMatch(new RegExp(`valid: .*\\b${data.designs.length + 1} designs`));
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });

  it("goes back to V+ = 5 V with the browser's back button", async () => {
    await page.goBack();
    await page.waitForURL((url) => url.searchParams.get("supply.positive_v") !== "12");
    expect(await positiveRail().inputValue()).toBe("5");
    expect(await verdictOf(FLIPS.part)).toBe(FLIPS.before);
  });

  it("fetched nothing from another host and met no broken link, console error or CSP violation on the way", () => {
    expect(t.requests.length).toBeGreaterThan(5);
    expect(troubles(t)).toEqual([]);
  });
});
