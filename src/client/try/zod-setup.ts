// Imported before anything that builds or runs a zod schema. zod otherwise
// probes `new Function("")` once to decide whether to compile fast object
// parsers; the page's CSP (script-src 'self') blocks it, and although zod
// catches the error, the browser still reports a CSP violation. Designs are
// small, so the interpreted parser costs nothing noticeable.
// The page ships zod/mini without zod's English messages (full zod installs
// them in the CLI): the design schema words every problem itself, which
// test/client/try/design-messages.test.ts holds it to.
import * as z from "zod/mini";

z.config({ jitless: true });
