// Markdown that says exactly the text it is given: catalogue and design text is
// free text, so every character markdown would read as syntax is escaped, and
// a table cell never breaks its row (CommonMark 0.31 §2.4 backslash escapes;
// GFM tables: a pipe inside a cell is escaped, a cell is one line).

// ASCII punctuation that starts or ends markup inline: emphasis, code, links,
// raw HTML, entities, strikethrough and the table's own pipe.
const SPECIAL = /[\\`*_[\]<>|&~!#]/g;

/** Free text as markdown inline text: escaped, on one line. */
export function mdText(text: string): string {
  return text
    .replace(/\s+/g, " ")
    .trim()
    .replace(SPECIAL, (c) => `\\${c}`);
}

/** Text shown as code: backtick-free text in backticks, else escaped text. */
export function mdCode(text: string): string {
  return /^[\w.:/@+-]+$/.test(text) ? `\`${text}\`` : mdText(text);
}

/** A link whose text is escaped and whose address cannot end the link early. */
export function mdLink(text: string, url: string): string {
  // encodeURIComponent leaves ( and ) alone; either would end the destination.
  const safe = url.replace(/[\s<>()\\]/g, (c) => (c === "(" ? "%28" : c === ")" ? "%29" : encodeURIComponent(c)));
  return `[${mdText(text)}](${safe})`;
}

/** A GFM table; cells are markdown already (escape them with mdText). */
export function mdTable(headers: readonly string[], rows: readonly (readonly string[])[]): string {
  const line = (cells: readonly string[]) => `| ${cells.map((c) => (c === "" ? " " : c)).join(" | ")} |`;
  return [line(headers), line(headers.map(() => "---")), ...rows.map(line)].join("\n");
}
