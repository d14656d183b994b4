// Characters that are not text: C0/C1 controls (a terminal escape starts with
// ESC, U+001B), DEL, the Unicode line separators, and the bidirectional
// controls that reorder what follows them (U+202A–U+202E, U+2066–U+2069, the
// marks U+200E, U+200F, U+061C). Shown raw, the first repaint a terminal and
// the last make a name read backwards on a page; none belongs in a part's
// name, notes or a design's title.

// Line feed, carriage return and tab are allowed: a quoted notes cell may hold a line break.
const UNSAFE =
  // eslint-disable-next-line no-control-regex -- matching control characters is the point
  /[\u0000-\u0008\u000b\u000c\u000e-\u001f\u007f-\u009f\u061c\u200e\u200f\u2028\u2029\u202a-\u202e\u2066-\u2069]/;
// eslint-disable-next-line no-control-regex -- as above
const UNSAFE_ALL = /[\u0000-\u001f\u007f-\u009f\u061c\u200e\u200f\u2028\u2029\u202a-\u202e\u2066-\u2069]/g;

const NAMES: Readonly<Record<number, string>> = {
  0x1b: "ESC",
  0x7f: "DEL",
  0x061c: "arabic letter mark",
  0x200e: "left-to-right mark",
  0x200f: "right-to-left mark",
  0x2028: "line separator",
  0x2029: "paragraph separator",
  0x202a: "left-to-right embedding",
  0x202b: "right-to-left embedding",
  0x202c: "pop directional formatting",
  0x202d: "left-to-right override",
  0x202e: "right-to-left override",
  0x2066: "left-to-right isolate",
  0x2067: "right-to-left isolate",
  0x2068: "first strong isolate",
  0x2069: "pop directional isolate",
};

/** A code point as "U+" and four hex digits, with a name where one helps ("U+202E right-to-left override"). */
export function codePointName(code: number): string {
  const hex = `U+${code.toString(16).toUpperCase().padStart(4, "0")}`;
  const name = NAMES[code] ?? (code < 0x20 || (code >= 0x7f && code <= 0x9f) ? "control character" : undefined);
  return name ? `${hex} ${name}` : hex;
}

/** The first character that is not text, with its 1-based position; undefined when the text is clean. */
export function firstUnsafe(text: string): { code: number; position: number } | undefined {
  const m = UNSAFE.exec(text);
  if (!m) return undefined;
  return { code: m[0].charCodeAt(0), position: m.index + 1 };
}

/** The message for a cell or field holding such a character, in the house pattern. */
export function unsafeTextMessage(found: { code: number; position: number }): string {
  return `text holds ${codePointName(found.code)} at character ${found.position} (expected printable text without control characters or bidirectional overrides)`;
}

const NAMED_ESCAPES: Readonly<Record<string, string>> = { "\n": "\\n", "\r": "\\r", "\t": "\\t" };

/** Every such character (line breaks included) as a visible escape: "\u001b", "\n". */
export function visibleText(text: string): string {
  return text.replace(UNSAFE_ALL, (c) => NAMED_ESCAPES[c] ?? `\\u${c.charCodeAt(0).toString(16).padStart(4, "0")}`);
}

/**
 * Output for a terminal: keeps line feeds, tabs and CRLF line ends (CSV needs
 * them), turns `escMark` (a character input can never hold) into ESC, and every
 * other such character, a lone CR included, into a visible escape, so only the
 * escapes the program wrote reach the screen.
 */
export function terminalText(text: string, escMark: string): string {
  return text.replace(UNSAFE_ALL, (c, offset: number) =>
    c === "\n" || c === "\t" || (c === "\r" && text.charCodeAt(offset + 1) === 10)
      ? c
      : c === escMark
        ? "\u001b"
        : (NAMED_ESCAPES[c] ?? `\\u${c.charCodeAt(0).toString(16).padStart(4, "0")}`),
  );
}
