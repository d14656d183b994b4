// XML 1.0 text and attribute values. Free text may hold characters XML 1.0
// cannot carry at all (§2.2 Char: most C0 controls, lone surrogates, U+FFFE and
// U+FFFF); those become U+FFFD rather than making the whole report unreadable.

const NOT_XML =
  // eslint-disable-next-line no-control-regex -- matching the characters XML forbids is the point
  /[\u0000-\u0008\u000b\u000c\u000e-\u001f\ufffe\uffff]|[\ud800-\udbff](?![\udc00-\udfff])|(?<![\ud800-\udbff])[\udc00-\udfff]/g;

const ENTITIES: Readonly<Record<string, string>> = {
  "&": "&amp;",
  "<": "&lt;",
  ">": "&gt;",
  '"': "&quot;",
  "'": "&apos;",
  // Kept as references so an attribute value keeps its line breaks and tabs (§3.3.3 normalization).
  "\n": "&#10;",
  "\r": "&#13;",
  "\t": "&#9;",
};

/** Text for an attribute value in double quotes. */
export function xmlAttr(text: string): string {
  return text.replace(NOT_XML, "\ufffd").replace(/[&<>"'\n\r\t]/g, (c) => ENTITIES[c] ?? c);
}

/** Text for element content. */
export function xmlText(text: string): string {
  return text.replace(NOT_XML, "\ufffd").replace(/[&<>]/g, (c) => ENTITIES[c] ?? c);
}
