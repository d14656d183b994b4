// Escaping for the markdown reports, read back by a maintained CommonMark/GFM
// parser (marked): free text must come out as the same text, never as markup.
// References: CommonMark 0.31.2 §2.4 (any ASCII punctuation may be
// backslash-escaped), GFM 0.29 §4.10 (tables: an escaped pipe stays in its cell).
import { marked, type Tokens } from "marked";
import { describe, expect, it } from "vitest";
import { mdCode, mdLink, mdTable, mdText } from "../../../src/cli/formats/markdown.ts";

/** The plain text a reader sees for inline markdown (HTML entities decoded). */
function seen(inline: string): string {
  const html = marked.parseInline(inline, { async: false });
  return html
    .replace(/<[^>]*>/g, "")
    .replace(/&lt;/g, "<")
    .replace(/&gt;/g, ">")
    .replace(/&quot;/g, '"')
    .replace(/&#39;/g, "'")
    .replace(/&amp;/g, "&");
}

describe("mdText", () => {
  it.each([
    ["emphasis", "*not bold* _nor this_"],
    ["code", "`not code`"],
    ["a link", "[click](javascript:alert(1))"],
    ["raw HTML", '<img src=x onerror="alert(1)"> </script>'],
    ["an entity", "&lt; stays as typed"],
    ["strikethrough", "~~kept~~"],
    ["a pipe", "a | b"],
    ["an image", "![x](y)"],
    ["backslashes", "C:\\path\\*"],
  ])("keeps %s as text", (_name, text) => {
    expect(seen(mdText(text))).toBe(text);
  });

  it("joins lines, so a cell cannot end its row", () => {
    expect(mdText("one\ntwo\r\n  three")).toBe("one two three");
  });
});

describe("mdCode and mdLink", () => {
  it("puts a plain id in backticks and escapes anything else", () => {
    expect(mdCode("oa-cmos-rrio-3m")).toBe("`oa-cmos-rrio-3m`");
    expect(seen(mdCode("a`b"))).toBe("a`b");
  });

  it("keeps a link's address in one piece", () => {
    const tokens = marked.lexer(mdLink("part (x)", "https://host/a b/(c)/index.html"));
    const link = (tokens[0] as Tokens.Paragraph).tokens[0] as Tokens.Link;
    expect(link.type).toBe("link");
    expect(link.href).toBe("https://host/a%20b/%28c%29/index.html");
    expect(seen(link.text)).toBe("part (x)");
  });
});

describe("mdTable", () => {
  it("parses as one GFM table with the cells given, pipes and all", () => {
    const cells = ["a | b", "<b>x</b>", ""];
    const tokens = marked.lexer(mdTable(["One", "Two", "Three"], [cells.map(mdText)]));
    expect(tokens.filter((t) => t.type === "table")).toHaveLength(1);
    const table = tokens[0] as Tokens.Table;
    expect(table.header.map((h) => h.text)).toEqual(["One", "Two", "Three"]);
    expect(table.rows[0]?.map((c) => seen(c.text))).toEqual(["a | b", "<b>x</b>", ""]);
  });
});
