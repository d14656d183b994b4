// Links for server-rendered pages, bound to the base in astro.config.mjs.
// `astro:config/client` carries the config's own value; import.meta.env.BASE_URL
// does not on the server (see links.ts). Layout.astro imports this module, so
// every page, and anything it calls from links.ts, sees the configured base.
import { base } from "astro:config/client";
import { setSiteBase } from "./links.ts";

setSiteBase(base);

export {
  catalogueUrl,
  designUrl,
  homeUrl,
  kindPath,
  kindUrl,
  partUrl,
  placeAnchor,
  resultAnchor,
  roleAnchor,
  rulesUrl,
  tryUrl,
  url,
} from "./links.ts";
