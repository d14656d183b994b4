// Turns file bytes into text, refusing encodings a spreadsheet may have saved
// by accident. TextDecoder is a web standard, so this stays runtime-neutral.
import type { Problem } from "./problems.ts";

export type Decoded = { ok: true; text: string } | { ok: false; problem: Problem };

export function decodeUtf8(bytes: Uint8Array, file: string): Decoded {
  const b0 = bytes[0];
  const b1 = bytes[1];
  if ((b0 === 0xff && b1 === 0xfe) || (b0 === 0xfe && b1 === 0xff) || looksLikeUtf16(bytes)) {
    return {
      ok: false,
      problem: { file, line: 1, message: "file is saved as UTF-16 (expected UTF-8; save or export it as 'CSV UTF-8')" },
    };
  }
  try {
    const text = new TextDecoder("utf-8", { fatal: true }).decode(bytes);
    return { ok: true, text: text.startsWith("\uFEFF") ? text.slice(1) : text };
  } catch {
    const { line, offset } = firstInvalidUtf8(bytes);
    return {
      ok: false,
      problem: {
        file,
        line,
        message: `bytes that are not UTF-8 (got byte 0x${(bytes[offset] ?? 0).toString(16).padStart(2, "0")} at byte ${offset}, expected UTF-8 text; re-save the file as UTF-8)`,
      },
    };
  }
}

// UTF-16 without a byte-order mark: every other byte of ASCII text is zero.
function looksLikeUtf16(bytes: Uint8Array): boolean {
  const n = Math.min(bytes.length, 64);
  if (n < 4) return false;
  let zeros = 0;
  for (let i = 0; i < n; i++) if (bytes[i] === 0) zeros++;
  return zeros >= n / 4;
}

// Walks the UTF-8 byte patterns by hand to name the line of the first bad byte.
function firstInvalidUtf8(bytes: Uint8Array): { line: number; offset: number } {
  let line = 1;
  let i = 0;
  while (i < bytes.length) {
    const b = bytes[i] ?? 0;
    if (b === 0x0a) line++;
    const extra =
      b < 0x80 ? 0 : b >= 0xc2 && b <= 0xdf ? 1 : b >= 0xe0 && b <= 0xef ? 2 : b >= 0xf0 && b <= 0xf4 ? 3 : -1;
    if (extra < 0) return { line, offset: i };
    for (let k = 1; k <= extra; k++) {
      const c = bytes[i + k];
      if (c === undefined || (c & 0xc0) !== 0x80) return { line, offset: i };
    }
    i += extra + 1;
  }
  return { line, offset: Math.max(0, bytes.length - 1) };
}
