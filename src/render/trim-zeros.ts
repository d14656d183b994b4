// Kept apart from parameters.ts, which reads the catalogue's column schemas:
// the try page's browser bundle formats numbers without shipping those.

/** Drops zeros that only pad the significant digits: "1.20 MHz" → "1.2 MHz", "10.0 kΩ" → "10 kΩ". */
export function trimZeros(text: string): string {
  return text.replace(/^([^\s.]*\d)\.(\d*?)0+(?=\s|$)/, (_m, whole: string, frac: string) =>
    frac === "" ? whole : `${whole}.${frac}`,
  );
}
