// What the browser tests' global setup hands to every test file (via vitest's
// provide/inject): where Chromium is and where each built site is served.
export type SiteName = "demo" | "hostile";

export type Site = {
  name: SiteName;
  /** Data folder the site was built from. */
  dataDir: string;
  /** Built site on disk. */
  dir: string;
  /** Base path the site was built for, "/" or "/team/railsieve/". */
  base: string;
  /** "http://127.0.0.1:PORT" */
  origin: string;
  /** origin + base */
  home: string;
};

export type E2eContext =
  { ready: true; chromium: string; sites: Record<SiteName, Site> } | { ready: false; reason: string };

declare module "vitest" {
  export interface ProvidedContext {
    e2e: E2eContext;
  }
}
