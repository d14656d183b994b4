// Kept apart from parameters.ts, which reads the catalogue's column schemas:
// the try page's browser bundle formats numbers without shipping those.
// The function itself is in src/core/units.ts, where the topologies' derived values use it too.
export { trimZeros } from "../core/units.ts";
