import { describe, expect, it } from "vitest";
import { escapeHtml } from "../../src/view/escape.ts";
import { renderVerdict, VERDICT_LOOK } from "../../src/view/verdict.ts";

describe("escapeHtml", () => {
  // The five characters HTML gives meaning to in text and quoted attributes (HTML Living Standard, "escaping a string").
  it.each([
    ["plain text", "plain text"],
    ["a < b > c", "a &lt; b &gt; c"],
    ["R&D", "R&amp;D"],
    [`"quoted" 'single'`, "&quot;quoted&quot; &#39;single&#39;"],
    ["<script>alert(1)</script>", "&lt;script&gt;alert(1)&lt;/script&gt;"],
    ["&amp; stays visible", "&amp;amp; stays visible"],
    ["±10 V, −0.1 V, 2π × 20 kHz", "±10 V, −0.1 V, 2π × 20 kHz"],
  ])("%j → %j", (input, expected) => {
    expect(escapeHtml(input)).toBe(expected);
  });
});

describe("renderVerdict", () => {
  it.each(Object.keys(VERDICT_LOOK) as (keyof typeof VERDICT_LOOK)[])(
    "%s carries a word and a glyph, not colour alone",
    (verdict) => {
      const html = renderVerdict(verdict);
      expect(html).toContain(`verdict-${verdict}`);
      expect(html).toContain(VERDICT_LOOK[verdict].word);
      expect(html).toContain(`aria-hidden="true">${VERDICT_LOOK[verdict].glyph}<`);
    },
  );

  it("uses four different glyphs", () => {
    expect(new Set(Object.values(VERDICT_LOOK).map((l) => l.glyph)).size).toBe(4);
  });

  it("renders the fail verdict exactly", () => {
    expect(renderVerdict("fail")).toMatchInlineSnapshot(
      `"<span class="verdict verdict-fail"><span class="glyph" aria-hidden="true">✕</span> fail</span>"`,
    );
  });
});
