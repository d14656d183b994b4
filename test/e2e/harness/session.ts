// One browser per test file, and pages that record everything the security and
// offline checks need: every request (and whether it left 127.0.0.1), failed
// responses, Content-Security-Policy violations, console errors and uncaught
// exceptions.
import { inject } from "vitest";
import type { Browser, BrowserContext, BrowserContextOptions, Page } from "playwright-core";
import { launchChromium } from "./chromium.ts";
import type { E2eContext, Site, SiteName } from "./context.ts";

const e2e: E2eContext = inject("e2e");
export const browserReady = e2e.ready;

export function site(name: SiteName): Site {
  if (!e2e.ready) throw new Error(`browser tests are not ready: ${e2e.reason}`);
  return e2e.sites[name];
}

export function openBrowser(): Promise<Browser> {
  if (!e2e.ready) throw new Error(`browser tests are not ready: ${e2e.reason}`);
  return launchChromium(e2e.chromium);
}

export type CspViolation = { directive: string; blocked: string; sample: string; source: string; line: number };

export type Tracked = {
  site: Site;
  context: BrowserContext;
  page: Page;
  /** Every URL the pages asked for, in order. */
  requests: string[];
  /** Requests to anything but the local server (blocked before they leave). */
  foreign: string[];
  /** Local requests that failed or answered 4xx/5xx. */
  broken: string[];
  csp: CspViolation[];
  consoleErrors: string[];
  pageErrors: string[];
  /** URL of a path inside the site, e.g. url("catalogue/"). */
  url(path?: string): string;
};

// Data and blob URLs carry their content with them; they never reach a host.
function isLocal(url: string, origin: string): boolean {
  if (url.startsWith("data:") || url.startsWith("blob:") || url === "about:blank") return true;
  try {
    return new URL(url).origin === origin;
  } catch {
    return false;
  }
}

// Runs before any page script, unaffected by the page's CSP; reports each
// violation to the test through an exposed function, so none is lost when the
// page navigates away.
const LISTEN_FOR_CSP = `
  document.addEventListener("securitypolicyviolation", (e) => {
    window.__reportCsp?.({ directive: e.effectiveDirective || e.violatedDirective, blocked: e.blockedURI,
      sample: e.sample, source: e.sourceFile, line: e.lineNumber });
  });
`;

/** A page in a fresh context whose every request is recorded; options go to newContext (bypassCSP only for axe). */
export async function openTracked(
  browser: Browser,
  siteName: SiteName,
  options: BrowserContextOptions = {},
): Promise<Tracked> {
  const s = site(siteName);
  const context = await browser.newContext({ acceptDownloads: true, ...options });
  const t: Tracked = {
    site: s,
    context,
    page: undefined as unknown as Page,
    requests: [],
    foreign: [],
    broken: [],
    csp: [],
    consoleErrors: [],
    pageErrors: [],
    url: (path = "") => new URL(path.replace(/^\//, ""), s.home).href,
  };
  await context.route(
    (url) => !isLocal(url.href, s.origin),
    (route) => route.abort("blockedbyclient"),
  );
  context.on("request", (r) => {
    t.requests.push(r.url());
    if (!isLocal(r.url(), s.origin)) t.foreign.push(r.url());
  });
  context.on("requestfailed", (r) => {
    // ERR_ABORTED is a load cut short by the next navigation (a favicon, a fetch), not a broken link.
    const aborted = r.failure()?.errorText === "net::ERR_ABORTED";
    if (!aborted && isLocal(r.url(), s.origin) && !r.url().startsWith("blob:") && !r.url().startsWith("data:")) {
      t.broken.push(`${r.url()} (${r.failure()?.errorText ?? "failed"})`);
    }
  });
  context.on("response", (r) => {
    if (r.status() >= 400 && isLocal(r.url(), s.origin)) t.broken.push(`${r.url()} (HTTP ${r.status()})`);
  });
  await context.exposeFunction("__reportCsp", (v: CspViolation) => t.csp.push(v));
  await context.addInitScript(LISTEN_FOR_CSP);
  context.on("console", (m) => {
    if (m.type() === "error") t.consoleErrors.push(`${m.text()} @ ${m.location().url}`);
  });
  t.page = await context.newPage();
  t.page.on("pageerror", (e) => t.pageErrors.push(`${e.message} @ ${t.page.url()}`));
  t.page.setDefaultTimeout(10_000);
  return t;
}

/** Everything that went wrong while browsing, one line each; [] when clean. */
export function troubles(t: Tracked): string[] {
  return [
    ...t.foreign.map((u) => `request to another host: ${u}`),
    ...t.broken.map((u) => `broken request: ${u}`),
    ...t.csp.map(
      (v) =>
        `CSP violation: ${v.directive} blocked ${v.blocked || "(inline)"} ${v.sample ? `'${v.sample}' ` : ""}at ${v.source}:${v.line}`,
    ),
    ...t.consoleErrors.map((m) => `console error: ${m}`),
    ...t.pageErrors.map((m) => `uncaught exception: ${m}`),
  ];
}

/** Forgets what went wrong so far, so one test's problem is not blamed on the next. */
export function resetTroubles(t: Tracked): void {
  for (const list of [t.foreign, t.broken, t.csp, t.consoleErrors, t.pageErrors]) list.length = 0;
}

/** What any hostile payload would have set had it run; undefined when nothing ran. */
export function pwned(page: Page): Promise<unknown> {
  return page.evaluate(() => (window as unknown as { __pwned?: unknown }).__pwned);
}
