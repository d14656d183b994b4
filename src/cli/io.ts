// What a command may touch: two output streams and whether colour is wanted.
import { terminalText } from "../core/text-safety.ts";

export type Io = { out: (text: string) => void; err: (text: string) => void; color: boolean };

const CODES = { pass: "32", marginal: "33", unrated: "35", fail: "31", dim: "2", bold: "1" } as const;

// paint() writes NUL where ESC belongs; terminalSafe() turns it into ESC after
// every other control character has been made visible. Input can never hold
// NUL (validation refuses control characters in every text cell and field, and
// problem messages print it as "\u0000"), so only escapes we wrote survive.
const ESC_MARK = "\u0000";

export function paint(io: Pick<Io, "color">, style: keyof typeof CODES, text: string): string {
  return io.color ? `${ESC_MARK}[${CODES[style]}m${text}${ESC_MARK}[0m` : text;
}

/** Text as it may reach a terminal: the program's own colours, nothing a file smuggled in. */
export function terminalSafe(text: string): string {
  return terminalText(text, ESC_MARK);
}

/** The same streams, writing only terminal-safe text. */
export function safeIo(io: Io): Io {
  return { out: (t) => io.out(terminalSafe(t)), err: (t) => io.err(terminalSafe(t)), color: io.color };
}
