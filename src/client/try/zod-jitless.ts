// Imported before anything that builds or runs a zod schema. zod 4 otherwise
// probes `new Function("")` once to decide whether to compile fast object
// parsers; the page's CSP (script-src 'self') blocks it, and although zod
// catches the error, the browser still reports a CSP violation. Designs are
// small, so the interpreted parser costs nothing noticeable.
import { z } from "zod";

z.config({ jitless: true });
