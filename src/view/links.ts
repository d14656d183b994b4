// Every internal link goes through here, so the site works from any base path
// (RAILSIEVE_BASE=/tools/railsieve/ serves it from a subfolder).
import { kindSpec, type PartKind } from "../core/kinds.ts";
import type { Role } from "../core/schemas/design.ts";

/** Joins a base ("/", "/sub", "/sub/") and a site path ("parts/x/") into one absolute path. */
export function joinBase(base: string, path: string): string {
  const b = base.endsWith("/") ? base : `${base}/`;
  return `${b}${path.replace(/^\/+/, "")}`;
}

export type SiteLinks = {
  url: (path: string) => string;
  homeUrl: () => string;
  catalogueUrl: () => string;
  kindUrl: (kind: PartKind) => string;
  partUrl: (id: string) => string;
  designUrl: (id: string, anchor?: string) => string;
  rulesUrl: (rule?: string) => string;
  tryUrl: () => string;
};

export function linksFor(base: string): SiteLinks {
  const url = (path: string) => joinBase(base, path);
  return {
    url,
    homeUrl: () => url(""),
    catalogueUrl: () => url("catalogue/"),
    kindUrl: (kind) => url(`catalogue/${kindPath(kind)}/`),
    partUrl: (id) => url(`parts/${id}/`),
    designUrl: (id, anchor) => url(`designs/${id}/`) + (anchor ? `#${anchor}` : ""),
    rulesUrl: (rule) => url("rules/") + (rule ? `#rule-${rule}` : ""),
    tryUrl: () => url("try/"),
  };
}

/** The folder of a kind's catalogue page: its catalogue file's name ("op-amps"), plural as the file is. */
export const kindPath = (kind: PartKind) => kindSpec(kind).file.replace(/\.csv$/, "");

/** Id of one part's entry in a role on a design page; ids and roles are [a-z0-9-]. */
export const resultAnchor = (role: Role, partId: string) => `${role}--${partId}`;
export const roleAnchor = (role: Role) => `role-${role}`;
/** Id of one design × role entry on a part page; roles hold no "--", so the pair reads back unambiguously. */
export const placeAnchor = (designId: string, role: Role) => `in-${designId}--${role}`;

// The default links read the base when called. In the browser it is the one
// Vite compiles in. On the server Astro lets a BASE_URL variable left in the
// build's environment (vitest sets one) override import.meta.env.BASE_URL, so
// page-links.ts, which the Layout of every page imports, sets the configured
// base before any page renders.
// Outside Vite (the CLI, plain Node) there is no import.meta.env at all.
let siteBase: string = import.meta.env?.BASE_URL ?? "/";

export function setSiteBase(base: string): void {
  siteBase = base;
}

export const url = (path: string) => joinBase(siteBase, path);
export const homeUrl = () => linksFor(siteBase).homeUrl();
export const catalogueUrl = () => linksFor(siteBase).catalogueUrl();
export const kindUrl = (kind: PartKind) => linksFor(siteBase).kindUrl(kind);
export const partUrl = (id: string) => linksFor(siteBase).partUrl(id);
export const designUrl = (id: string, anchor?: string) => linksFor(siteBase).designUrl(id, anchor);
export const rulesUrl = (rule?: string) => linksFor(siteBase).rulesUrl(rule);
export const tryUrl = () => linksFor(siteBase).tryUrl();
