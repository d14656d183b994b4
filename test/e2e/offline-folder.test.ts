// The built guide opened from a folder (file://), as from a shared drive or an
// unpacked archive (issue 20): the stylesheet applies, every link on every page
// leads to a file that exists, catalogue search runs, the try page says it
// needs a server; and a design's one-file report renders on its own, with the
// network off, making no request at all.
import { copyFileSync, existsSync, mkdtempSync, readdirSync, readFileSync, statSync } from "node:fs";
import { tmpdir } from "node:os";
import { join, relative, sep } from "node:path";
import { fileURLToPath, pathToFileURL } from "node:url";
import { parse } from "parse5";
import type { DefaultTreeAdapterTypes } from "parse5";
import type { Browser, BrowserContext, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { loadDataSet } from "../../src/node/load-data.ts";
import { buildSearchIndex } from "../../src/view/search-index.ts";
import { reportPolicyProblems } from "./harness/csp.ts";
import { browserReady, openBrowser, site } from "./harness/session.ts";

type Element = DefaultTreeAdapterTypes.Element;

function htmlFiles(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const path = join(dir, name);
    if (statSync(path).isDirectory()) return htmlFiles(path);
    return name.endsWith(".html") ? [path] : [];
  });
}

function* elements(node: DefaultTreeAdapterTypes.Node): Generator<Element> {
  if ("tagName" in node) yield node;
  if ("childNodes" in node) for (const c of node.childNodes) yield* elements(c);
}

/** Everything a page asks for by itself: stylesheets, scripts, icons and images. */
function assetsOf(page: Page): Promise<string[]> {
  return page.evaluate(() =>
    [
      ...document.querySelectorAll<HTMLLinkElement | HTMLScriptElement | HTMLImageElement>(
        "link[href], script[src], img[src]",
      ),
    ].map((e) => ("href" in e && e.href ? e.href : (e as HTMLScriptElement).src)),
  );
}

type Watch = { requests: string[]; errors: string[]; csp: string[] };

async function watchedContext(browser: Browser, offline = false): Promise<{ context: BrowserContext; watch: Watch }> {
  const context = await browser.newContext({ colorScheme: "light" });
  if (offline) await context.setOffline(true);
  const watch: Watch = { requests: [], errors: [], csp: [] };
  context.on("request", (r) => watch.requests.push(r.url()));
  context.on("console", (m) => {
    if (m.type() === "error") watch.errors.push(m.text());
  });
  context.on("weberror", (e) => watch.errors.push(e.error().message));
  await context.exposeFunction("__reportCsp", (v: string) => watch.csp.push(v));
  await context.addInitScript(
    `document.addEventListener("securitypolicyviolation", (e) => window.__reportCsp(e.effectiveDirective + " " + e.blockedURI));`,
  );
  return { context, watch };
}

describe.skipIf(!browserReady)("the guide opened from a folder", () => {
  let browser: Browser;
  let dir: string;
  const fileUrl = (path: string) => pathToFileURL(join(dir, path)).href;

  beforeAll(async () => {
    browser = await openBrowser();
    // The hostile site is built for a sub-path (/team/railsieve/): from a folder that base must not matter.
    dir = site("hostile").dir;
  });
  afterAll(async () => browser?.close());

  it("every link and asset of every page leads to a file that exists (checked on disk)", () => {
    const broken: string[] = [];
    for (const file of htmlFiles(dir)) {
      const page = relative(dir, file).split(sep).join("/");
      if (page === "404.html") continue; // served at any depth by a server; never opened from a folder
      for (const el of elements(parse(readFileSync(file, "utf8")))) {
        for (const attr of el.attrs) {
          if (!["href", "src"].includes(attr.name) || /^(#|data:|mailto:|https?:)/.test(attr.value)) continue;
          const target = new URL(attr.value, pathToFileURL(file));
          if (
            target.protocol !== "file:" ||
            !existsSync(fileURLToPath(target)) ||
            statSync(fileURLToPath(target)).isDirectory()
          )
            broken.push(`${page}: ${attr.name}="${attr.value}"`);
        }
      }
    }
    expect(broken).toEqual([]);
  });

  it("styles the home page, and every navigation link opens a page that exists and is styled", async () => {
    const { context, watch } = await watchedContext(browser);
    const page = await context.newPage();
    await page.goto(fileUrl("index.html"));
    const nav = await page.evaluate(() =>
      [...document.querySelectorAll<HTMLAnchorElement>("header a[href]")].map((a) => a.href),
    );
    expect(nav.length).toBeGreaterThanOrEqual(4);
    for (const href of [fileUrl("index.html"), ...nav]) {
      const path = fileURLToPath(href.replace(/#.*$/, ""));
      expect(existsSync(path) && statSync(path).isFile(), `${href} is a file`).toBe(true);
      await page.goto(href);
      // --bg is set by the site stylesheet's :root rule, nowhere else.
      expect(
        await page.evaluate(() => getComputedStyle(document.documentElement).getPropertyValue("--bg").trim()),
      ).toBe("#fbfaf6");
      for (const asset of await assetsOf(page)) {
        if (asset.startsWith("file:")) expect(existsSync(fileURLToPath(asset)), asset).toBe(true);
      }
    }
    expect(watch.requests.filter((u) => !u.startsWith("file:"))).toEqual([]);
    expect(watch.csp).toEqual([]);
    await context.close();
  });

  it("finds a part by a misspelt search in the catalogue", async () => {
    const { context, watch } = await watchedContext(browser);
    const page = await context.newPage();
    await page.goto(fileUrl("catalogue/index.html"));
    const box = page.getByRole("searchbox", { name: "Search" });
    await box.waitFor();
    const { catalogue } = loadDataSet(site("hostile").dataDir);
    const part = catalogue.parts[0]!;
    // One letter dropped from the id: fuse.js forgives it (the same index the page builds).
    const query = part.id.slice(0, 3) + part.id.slice(4);
    const best = buildSearchIndex(catalogue.parts).search(query)[0]!.id;
    await box.fill(query);
    await page.locator("#catalogue-status-line", { hasText: "matching" }).waitFor();
    const first = page.locator("table.catalogue-table tbody tr:not([hidden])").first();
    expect((await first.locator("td:first-child").textContent())?.trim()).toBe(best);
    expect(watch.errors).toEqual([]);
    expect(watch.csp).toEqual([]);
    await context.close();
  });

  it("says on the try page that it needs a server, and how to start one", async () => {
    const { context } = await watchedContext(browser);
    const page = await context.newPage();
    await page.goto(fileUrl("try/index.html"));
    const notice = page.locator("#try-needs-server");
    await notice.waitFor({ state: "visible" });
    expect(await notice.textContent()).toContain("npx railsieve serve dist");
    expect(await page.locator("#try").count()).toBe(0);
    await context.close();
  });
});

describe.skipIf(!browserReady)("a design's one-file report", () => {
  let browser: Browser;

  beforeAll(async () => {
    browser = await openBrowser();
  });
  afterAll(async () => browser?.close());

  it("renders alone in an empty folder with the network off, and asks for nothing", async () => {
    const demo = site("demo").dir;
    const [id] = readdirSync(join(demo, "designs"));
    const alone = join(mkdtempSync(join(tmpdir(), "railsieve-report-")), "review.html");
    copyFileSync(join(demo, "designs", id!, "report.html"), alone);

    const { context, watch } = await watchedContext(browser, true);
    const page = await context.newPage();
    const url = pathToFileURL(alone).href;
    await page.goto(url, { waitUntil: "load" });
    expect(watch.requests).toEqual([url]);
    expect(watch.csp).toEqual([]);
    expect(watch.errors).toEqual([]);
    const seen = await page.evaluate(() => ({
      csp: document.querySelector('meta[http-equiv="Content-Security-Policy"]')?.getAttribute("content") ?? null,
      bg: getComputedStyle(document.documentElement).getPropertyValue("--bg").trim(),
      h1: document.querySelector("h1")?.textContent ?? "",
      diagrams: [...document.querySelectorAll("svg")].filter((s) => s.getBoundingClientRect().width > 0).length,
      scripts: document.scripts.length,
      links: [...document.querySelectorAll("a[href]")].map((a) => a.getAttribute("href") ?? ""),
    }));
    expect(reportPolicyProblems(seen.csp)).toEqual([]);
    expect(seen.bg).toBe("#fbfaf6");
    expect(seen.h1.length).toBeGreaterThan(0);
    expect(seen.diagrams).toBeGreaterThan(0);
    expect(seen.scripts).toBe(0);
    // Only in-page anchors remain; a link to another page would lead nowhere from a review folder.
    expect(seen.links.filter((h) => !h.startsWith("#"))).toEqual([]);
    await context.close();
  });
});
