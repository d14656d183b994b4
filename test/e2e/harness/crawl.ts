// Follows every link inside the site from its home page, the way a reader (or
// a link checker) would, and records what each page declares.
import type { Tracked } from "./session.ts";

export type CrawledPage = {
  url: string;
  status: number;
  title: string;
  lang: string | null;
  csp: string | null;
  /** Links whose href would run script or open inline content, or that leave the base path. */
  badLinks: string[];
  /** Links to other hosts: allowed (a reader may follow a cited source), never followed here. */
  external: string[];
};

const MAX_PAGES = 500;

// Anything else (CSV, JSON, SVG files) is fetched, not opened, so a download link cannot stall the crawl.
function isPage(url: URL): boolean {
  return url.pathname.endsWith("/") || url.pathname.endsWith(".html");
}

export async function crawl(t: Tracked): Promise<{ pages: CrawledPage[]; files: { url: string; status: number }[] }> {
  const { page, site } = t;
  const home = new URL(site.home);
  const queue = [home.href];
  const seen = new Set(queue);
  const downloads = new Set<string>();
  const pages: CrawledPage[] = [];
  const files: { url: string; status: number }[] = [];
  while (queue.length > 0 && pages.length < MAX_PAGES) {
    const href = queue.shift() as string;
    const url = new URL(href);
    if (!isPage(url) || downloads.has(href)) {
      const response = await t.context.request.get(href);
      files.push({ url: href, status: response.status() });
      await response.dispose();
      continue;
    }
    const response = await page.goto(href, { waitUntil: "load" });
    const found = await page.evaluate(() => {
      const meta = document.querySelector('meta[http-equiv="Content-Security-Policy" i]');
      return {
        title: document.title,
        lang: document.documentElement.getAttribute("lang"),
        csp: meta && meta.parentElement === document.head ? meta.getAttribute("content") : null,
        links: [...document.querySelectorAll("a[href]")].map((a) => ({
          raw: a.getAttribute("href") ?? "",
          resolved: (a as HTMLAnchorElement).href,
          download: a.hasAttribute("download"),
        })),
      };
    });
    const badLinks: string[] = [];
    const external: string[] = [];
    for (const link of found.links) {
      let target: URL;
      try {
        target = new URL(link.resolved);
      } catch {
        badLinks.push(link.raw);
        continue;
      }
      if (!["http:", "https:", "mailto:"].includes(target.protocol)) {
        badLinks.push(link.raw);
        continue;
      }
      if (target.origin !== home.origin) {
        external.push(link.raw);
        continue;
      }
      target.hash = "";
      if (!target.pathname.startsWith(home.pathname)) {
        badLinks.push(`${link.raw} (outside the base path ${home.pathname})`);
        continue;
      }
      if (!seen.has(target.href)) {
        seen.add(target.href);
        // A download (a design's one-file report) is a file to fetch, not a page of the site to browse.
        if (link.download) downloads.add(target.href);
        queue.push(target.href);
      }
    }
    pages.push({
      url: href,
      status: response?.status() ?? 0,
      title: found.title,
      lang: found.lang,
      csp: found.csp,
      badLinks,
      external,
    });
  }
  return { pages, files };
}
