import { describe, expect, it } from "vitest";
import { compareKeys, orderRows, parseSortKey } from "../../src/view/catalogue-order.ts";

describe("parseSortKey", () => {
  it.each<[string | undefined, number | string | null]>([
    ["0.5", 0.5],
    ["-0.3", -0.3],
    ["1e-7", 1e-7],
    ["1300", 1300],
    ["stocked", "stocked"],
    ["Rail-To-Rail", "rail-to-rail"],
    ["2.2k", "2.2k"],
    ["", null],
    [undefined, null],
  ])("%j → %j", (raw, key) => expect(parseSortKey(raw)).toEqual(key));
});

describe("compareKeys", () => {
  it("sorts numbers by value, not as text", () => {
    const keys = [10, 9, 100, -0.3, 0.01];
    expect([...keys].sort((a, b) => compareKeys(a, b, "ascending"))).toEqual([-0.3, 0.01, 9, 10, 100]);
    expect([...keys].sort((a, b) => compareKeys(a, b, "descending"))).toEqual([100, 10, 9, 0.01, -0.3]);
  });

  it("keeps empty (not rated) cells last in both directions", () => {
    const keys = [null, 2, null, 1];
    expect([...keys].sort((a, b) => compareKeys(a, b, "ascending"))).toEqual([1, 2, null, null]);
    expect([...keys].sort((a, b) => compareKeys(a, b, "descending"))).toEqual([2, 1, null, null]);
  });

  it("orders text naturally (2 before 10)", () => {
    const keys = ["oa-10m", "oa-2m", "approved"];
    expect([...keys].sort((a, b) => compareKeys(a, b, "ascending"))).toEqual(["approved", "oa-2m", "oa-10m"]);
  });
});

describe("orderRows", () => {
  type Row = { id: string; at: number; gbw: number | null; score?: number };
  const rows: Row[] = [
    { id: "a", at: 0, gbw: 3, score: 0.4 },
    { id: "b", at: 1, gbw: null, score: 0.1 },
    { id: "c", at: 2, gbw: 1 },
    { id: "d", at: 3, gbw: 3, score: 0.1 },
  ];
  const position = (r: Row) => r.at;
  const ids = (rs: Row[]) => rs.map((r) => r.id).join("");

  it("keeps file order with nothing chosen", () => {
    expect(ids(orderRows({ items: rows, position }))).toBe("abcd");
  });

  it("puts best search matches first, ties in file order", () => {
    expect(ids(orderRows({ items: rows, position, score: (r) => r.score }))).toBe("bdac");
  });

  it("lets a chosen column win over relevance, ties in file order", () => {
    expect(
      ids(orderRows({ items: rows, position, key: (r) => r.gbw, direction: "descending", score: (r) => r.score })),
    ).toBe("adcb");
    expect(ids(orderRows({ items: rows, position, key: (r) => r.gbw }))).toBe("cadb");
  });
});
