// Links from a report into the published guide, when its address is given
// (--guide-url). Page paths end in index.html so they open on any static host
// and from a folder alike; anchors are the ones the pages carry.
import { roleAnchor } from "../view/links.ts";
import type { Role } from "../core/schemas/design.ts";
import { UsageError } from "./args.ts";

export type GuideLinks = {
  design: (id: string, role?: string) => string;
  part: (id: string) => string;
};

/** Checks the address a user gave: a web address or a relative path, nothing that runs. */
export function guideLinks(url: string | undefined): GuideLinks | undefined {
  if (url === undefined) return undefined;
  const scheme = /^([a-z][a-z0-9+.-]*):/i.exec(url)?.[1]?.toLowerCase();
  if (scheme !== undefined && scheme !== "http" && scheme !== "https") {
    throw new UsageError(`--guide-url must be an http(s) address or a relative path (got '${url}')`);
  }
  const base = url.endsWith("/") ? url : `${url}/`;
  const page = (path: string) => `${base}${path.split("/").map(encodeURIComponent).join("/")}/index.html`;
  return {
    design: (id, role) => page(`designs/${id}`) + (role === undefined ? "" : `#${roleAnchor(role as Role)}`),
    part: (id) => page(`parts/${id}`),
  };
}
