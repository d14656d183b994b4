// Looks for markup that could only be in the page because catalogue or design
// text was inserted as HTML instead of as text (the hostile fixture's payloads).
import type { Page } from "playwright-core";

export function injectedMarkup(page: Page): Promise<string[]> {
  return page.evaluate(() => {
    const found: string[] = [];
    const describe = (el: Element) => el.outerHTML.slice(0, 120);
    const suspicious = [
      'img[src="x"]',
      "iframe",
      "object",
      "embed",
      "body style",
      "script:not([src]):not([type='application/json']):not([type='application/ld+json'])",
      "[xlink\\:href]",
    ];
    for (const el of document.querySelectorAll(suspicious.join(","))) found.push(describe(el));
    for (const el of document.querySelectorAll("*")) {
      for (const attr of el.attributes) {
        if (/^on/i.test(attr.name)) found.push(`${attr.name} on ${describe(el)}`);
        const runs =
          /^\s*(javascript|vbscript):/i.test(attr.value) &&
          /^(href|src|action|formaction|xlink:href)$/i.test(attr.name);
        // A data: URL a reader can open as a page (a link, a form target); a data: icon or image is fine.
        const opensInline =
          /^\s*data:/i.test(attr.value) &&
          ((/^(a|area)$/i.test(el.tagName) && attr.name === "href") || /^(action|formaction)$/i.test(attr.name));
        if (runs || opensInline) {
          found.push(`${attr.name}="${attr.value.slice(0, 60)}" on ${describe(el)}`);
        }
      }
    }
    return found;
  });
}
