// Imported before anything that builds or runs a zod schema. The page ships
// zod/mini (the design schema is written with it), which leaves two settings of
// full zod unset that the CLI has:
// - jitless: zod otherwise probes `new Function("")` once to decide whether to
//   compile fast object parsers; the page's CSP (script-src 'self') blocks it,
//   and although zod catches the error, the browser still reports a CSP
//   violation. Designs are small, so the interpreted parser costs nothing noticeable.
// - the English messages full zod installs on import, so any issue the design
//   schema does not word itself reads in the browser as it does in the CLI.
import * as z from "zod/mini";
import en from "zod/v4/locales/en.js";

z.config({ jitless: true, ...en() });
