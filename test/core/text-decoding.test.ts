import { describe, expect, it } from "vitest";
import { formatProblem } from "../../src/core/problems.ts";
import { decodeUtf8 } from "../../src/core/text-decoding.ts";

const utf8 = (s: string) => new TextEncoder().encode(s);
const utf16le = (s: string, bom: boolean) => {
  const out = new Uint8Array((s.length + (bom ? 1 : 0)) * 2);
  const text = bom ? `\uFEFF${s}` : s;
  for (let i = 0; i < text.length; i++) {
    out[2 * i] = text.charCodeAt(i) & 0xff;
    out[2 * i + 1] = text.charCodeAt(i) >> 8;
  }
  return out;
};
const swapBytes = (b: Uint8Array) => b.map((_, i) => b[i ^ 1] ?? 0);
const CSV = "id,name\nd-a,Silicon 10 µA\n";

describe("decodeUtf8", () => {
  it("decodes UTF-8, keeping non-ASCII text", () => {
    expect(decodeUtf8(utf8(CSV), "d.csv")).toEqual({ ok: true, text: CSV });
  });

  it("drops a UTF-8 byte-order mark", () => {
    expect(decodeUtf8(utf8(`\uFEFF${CSV}`), "d.csv")).toEqual({ ok: true, text: CSV });
  });

  it("decodes an empty file to empty text", () => {
    expect(decodeUtf8(new Uint8Array(), "d.csv")).toEqual({ ok: true, text: "" });
  });

  it("refuses UTF-16 little- and big-endian, with or without a byte-order mark", () => {
    const cases = {
      "LE with BOM": utf16le(CSV, true),
      "BE with BOM": swapBytes(utf16le(CSV, true)),
      "LE without BOM": utf16le(CSV, false),
      "BE without BOM": swapBytes(utf16le(CSV, false)),
    };
    const messages = Object.entries(cases).map(([label, bytes]) => {
      const d = decodeUtf8(bytes, "d.csv");
      return `${label}: ${d.ok ? "decoded" : formatProblem(d.problem)}`;
    });
    expect(messages).toMatchInlineSnapshot(`
      [
        "LE with BOM: d.csv:1: file is saved as UTF-16 (expected UTF-8; save or export it as 'CSV UTF-8')",
        "BE with BOM: d.csv:1: file is saved as UTF-16 (expected UTF-8; save or export it as 'CSV UTF-8')",
        "LE without BOM: d.csv:1: file is saved as UTF-16 (expected UTF-8; save or export it as 'CSV UTF-8')",
        "BE without BOM: d.csv:1: file is saved as UTF-16 (expected UTF-8; save or export it as 'CSV UTF-8')",
      ]
    `);
  });

  it("names the line and byte of the first byte that is not UTF-8", () => {
    const latin1 = Uint8Array.from([...utf8("id,name\nd-a,ok\nd-b,10 "), 0xb5, ...utf8("A\n")]); // Latin-1 micro sign
    const truncated = Uint8Array.from([...utf8("id\n\n\n"), 0xe2, 0x82]); // a 3-byte sequence cut short at the end
    const overlong = Uint8Array.from([...utf8("id\n"), 0xc0, 0xaf]); // overlong "/"
    const result = [latin1, truncated, overlong].map((b) => {
      const d = decodeUtf8(b, "d.csv");
      return d.ok ? "decoded" : formatProblem(d.problem);
    });
    expect(result).toMatchInlineSnapshot(`
      [
        "d.csv:3: bytes that are not UTF-8 (got byte 0xb5 at byte 22, expected UTF-8 text; re-save the file as UTF-8)",
        "d.csv:4: bytes that are not UTF-8 (got byte 0xe2 at byte 5, expected UTF-8 text; re-save the file as UTF-8)",
        "d.csv:2: bytes that are not UTF-8 (got byte 0xc0 at byte 3, expected UTF-8 text; re-save the file as UTF-8)",
      ]
    `);
  });
});
