// HTML/SVG text escaping for the string renderers. Astro escapes its own
// expressions; anything assembled as a string (set:html, the try page) goes
// through here, because catalogue names and notes are free text.
const ENTITIES: Readonly<Record<string, string>> = {
  "&": "&amp;",
  "<": "&lt;",
  ">": "&gt;",
  '"': "&quot;",
  "'": "&#39;",
};

const SPECIAL = /[&<>"']/;

/** Escapes text for an element body or a quoted attribute value. */
export function escapeHtml(text: string): string {
  // Most text (reasons, numbers, ids) has nothing to escape; a test is cheaper than a replace that finds nothing.
  return SPECIAL.test(text) ? text.replace(/[&<>"']/g, (c) => ENTITIES[c] ?? c) : text;
}
