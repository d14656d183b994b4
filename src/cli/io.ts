// What a command may touch: two output streams and whether colour is wanted.
export type Io = { out: (text: string) => void; err: (text: string) => void; color: boolean };

const CODES = { pass: "32", marginal: "33", unrated: "35", fail: "31", dim: "2", bold: "1" } as const;

export function paint(io: Pick<Io, "color">, style: keyof typeof CODES, text: string): string {
  return io.color ? `\u001b[${CODES[style]}m${text}\u001b[0m` : text;
}
