// The try page ships the default design's topology with its first script and
// fetches every other topology's module when the design names it
// (src/client/try/engine.ts). These checks hold it to that: the first answer
// needs nothing but the page's own scripts (the very files bench/weight.ts
// counts), choosing a topology (by mouse or keyboard, or through a short link)
// loads its code and redraws results that read exactly as the CLI's engine
// has them, the results are marked busy while the code loads, and a chunk that
// fails to load is said plainly, with the address kept for a reload.
import type { Browser, Page, Route } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { defaultDesignChunks, tryPageFiles } from "../../bench/weight.ts";
import { DEFAULT_DRAFT } from "../../src/client/try/defaults.ts";
import { rawFromDraft } from "../../src/client/try/draft.ts";
import { stateFromUrl } from "../../src/client/try/url-state.ts";
// Reading a link checks it with the page's engine, which needs the topologies' modules.
import "../client/try/all-topologies.ts";
import { evaluateDesign, parseDesignValue } from "../../src/engine.ts";
import { loadCatalogue } from "../../src/node/load-data.ts";
import { TOPOLOGY_META } from "../../src/topologies/meta.ts";
import { holdsLine, renderResults } from "../../src/view/render-results.ts";
import { browserReady, openBrowser, openTracked, site, troubles, type Tracked } from "./harness/session.ts";
import { tryPageReady } from "./harness/steps.ts";

/**
 * What the CLI's engine says of the design at an address of the try page (the
 * default design with this topology unless `search` is given): the status
 * line, and the results' text and rows.
 */
function cliAnswer(topology: string, search = "") {
  const { catalogue } = loadCatalogue(site("demo").dataDir);
  const draft = search === "" ? { ...DEFAULT_DRAFT, topology } : stateFromUrl(search, DEFAULT_DRAFT).draft;
  const read = parseDesignValue("form", rawFromDraft(draft));
  if (!read.design) throw new Error(`the default design in ${topology} does not validate`);
  const evaluation = evaluateDesign(read.design, catalogue);
  if (!evaluation.ok) throw new Error(`the default design in ${topology} does not evaluate`);
  const result = evaluation.result;
  return {
    status: `${holdsLine(result).line} ${catalogue.parts.length} parts checked.`,
    html: renderResults(result, { expanded: new Set() }),
  };
}

/** The page's results and the CLI's, both read the same way in the page: text, and each row's part and verdict. */
async function pageAgreesWithCli(page: Page, topology: string, search = ""): Promise<void> {
  const cli = cliAnswer(topology, search);
  expect(await page.locator("#try-status").textContent()).toBe(cli.status);
  const read = (html: string | null) => {
    const root = document.createElement("div");
    if (html === null)
      root.append(...[...(document.getElementById("try-results")?.childNodes ?? [])].map((n) => n.cloneNode(true)));
    else root.innerHTML = html;
    const rows = [...root.querySelectorAll<HTMLElement>("[data-part]")].map(
      (e) => `${e.dataset.part} ${e.dataset.verdict ?? ""}`,
    );
    return { text: root.textContent ?? "", rows };
  };
  const shown = await page.evaluate(read, null);
  const expected = await page.evaluate(read, cli.html);
  expect(shown.rows).toEqual(expected.rows);
  expect(shown.text).toBe(expected.text);
  expect(shown.rows.length).toBeGreaterThan(0);
}

const notBusy = (page: Page) => page.locator("#try-results:not([aria-busy])").waitFor();
const addressHas = (page: Page, topology: string) =>
  page.waitForURL((url) => url.searchParams.get("topology") === topology);

describe.skipIf(!browserReady)("the try page's topologies", () => {
  let browser: Browser;
  let t: Tracked;
  let page: Page;
  const ids = TOPOLOGY_META.map((m) => m.id);
  const title = (id: string) => TOPOLOGY_META.find((m) => m.id === id)?.title ?? id;

  beforeAll(async () => {
    browser = await openBrowser();
    t = await openTracked(browser, "demo");
    page = t.page;
  });
  afterAll(async () => browser?.close());

  it("answers the default design with the page's own scripts: the files the bench's first-answer figure counts", async () => {
    await page.goto(t.url("try/"));
    await tryPageReady(page);
    await pageAgreesWithCli(page, DEFAULT_DRAFT["topology"] ?? "");
    const fetched = t.requests
      .filter((u) => new URL(u).pathname.endsWith(".js"))
      .map((u) => new URL(u).pathname.slice(new URL(t.site.home).pathname.length))
      .sort();
    expect(fetched).toEqual(tryPageFiles(t.site.dir, defaultDesignChunks()).firstAnswer);
  });

  it.each([...ids.filter((id) => id !== DEFAULT_DRAFT["topology"]), "all", DEFAULT_DRAFT["topology"] ?? ""])(
    "switching to %s loads its code and redraws the results as the CLI has them",
    async (topology) => {
      await page.getByLabel("Topology", { exact: true }).selectOption(topology);
      await addressHas(page, topology);
      await notBusy(page);
      await pageAgreesWithCli(page, topology);
    },
  );

  it("switches by keyboard too, and a short link naming a topology answers in it from the start", async () => {
    const select = page.getByLabel("Topology", { exact: true });
    await select.selectOption(ids[0] ?? "");
    await addressHas(page, ids[0] ?? "");
    await select.focus();
    await page.keyboard.press("ArrowDown");
    await addressHas(page, ids[1] ?? "");
    await notBusy(page);
    await pageAgreesWithCli(page, ids[1] ?? "");

    const fresh = await openTracked(browser, "demo");
    await fresh.page.goto(fresh.url(`try/?topology=${ids[2]}`));
    await tryPageReady(fresh.page);
    // A short link leaves the optional fields (the policy) out, so they take the schema's defaults.
    await pageAgreesWithCli(fresh.page, ids[2] ?? "", `?topology=${ids[2]}`);
    expect(troubles(fresh)).toEqual([]);
    await fresh.context.close();
  });

  it("marks the results busy while a topology loads, and says a failed load plainly, keeping the address for a reload", async () => {
    const fresh = await openTracked(browser, "demo");
    const p = fresh.page;
    await p.goto(fresh.url("try/"));
    await tryPageReady(p);
    const select = p.getByLabel("Topology", { exact: true });

    // Held back until the page has been seen busy.
    let release = () => {};
    const held = new Promise<void>((r) => (release = r));
    const hold = async (route: Route) => {
      await held;
      await route.continue();
    };
    await p.route(new RegExp(`/${ids[1]}\\.[^/]*\\.js$`), hold);
    await select.selectOption(ids[1] ?? "");
    await p.locator('#try-results[aria-busy="true"]').waitFor();
    expect(await p.locator("#try-status").textContent()).toBe(`Loading the ${title(ids[1] ?? "")} topology…`);
    release();
    await notBusy(p);
    await pageAgreesWithCli(p, ids[1] ?? "");

    // A chunk that cannot be fetched: the status says which topology, and why, and the results stay marked stale.
    const fail = (route: Route) => route.abort("connectionfailed");
    await p.route(new RegExp(`/${ids[2]}\\.[^/]*\\.js$`), fail);
    await select.selectOption(ids[2] ?? "");
    await p.locator("#try-status", { hasText: "could not load" }).waitFor();
    expect(await p.locator("#try-status").textContent()).toMatch(
      new RegExp(
        `^The page could not load the ${title(ids[2] ?? "")} topology \\(.+\\)\\. Reload the page to try again: the address holds the design\\.$`,
      ),
    );
    expect(await p.locator("#try-results").getAttribute("aria-busy")).toBeNull();
    expect(await p.locator("#try-results").getAttribute("class")).toContain("try-stale");

    // The address follows the choice, so once the connection is back a reload answers in that topology.
    await addressHas(p, ids[2] ?? "");
    await p.unroute(new RegExp(`/${ids[2]}\\.[^/]*\\.js$`), fail);
    await p.reload();
    await tryPageReady(p);
    await pageAgreesWithCli(p, ids[2] ?? "", new URL(p.url()).search);
    await fresh.context.close();
  });

  it("stayed clean: no request to another host, no console error, no CSP violation", () => {
    expect(troubles(t)).toEqual([]);
  });
});
