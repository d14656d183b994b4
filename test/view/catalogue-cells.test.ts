// The catalogue writes data-sort only where a cell's text would sort another way
// (issue 18: the page's bytes are mostly cells). These tests hold the browser's
// reading of a cell (cellSortKey) to the key the value itself sorts by (sortKey),
// so slimming the markup cannot change any order.
import { describe, expect, it } from "vitest";
import { catalogueCell, isTextColumn } from "../../src/view/catalogue-cells.ts";
import { cellSortKey, parseSortKey, textSortKey } from "../../src/view/catalogue-order.ts";
import { sortKey, type Column } from "../../src/view/parameters.ts";

const column = (key: string): Column => ({ key, label: key, unit: "" });

describe("textSortKey", () => {
  it.each<[string, string, number | string | null]>([
    ["0.01", "vos_max_mv", 0.01],
    ["−0.3", "icm_neg_headroom_v", -0.3],
    ["1300", "gbw_mhz", 1300],
    ["yes", "unity_gain_stable", 1],
    ["no", "phase_reversal", 0],
    ["Ground-sensing bipolar, single", "name", "ground-sensing bipolar, single"],
    ["rail-to-rail, cmos", "tags", "rail-to-rail cmos"],
    ["", "gbw_mhz", null],
  ])("%j in %s sorts by %j", (text, key, expected) => expect(textSortKey(text, key)).toEqual(expected));
});

describe("catalogue cells", () => {
  it.each<[string, unknown, string, string | undefined]>([
    ["gbw_mhz", 1300, "1300", undefined],
    ["icm_neg_headroom_v", -0.3, "−0.3", undefined],
    ["ib_max_na", 1e-7, "0.0000001", undefined],
    // Seven significant digits print as six: the cell keeps the exact value to sort by.
    ["gbw_mhz", 1.2345678, "1.23457", "1.2345678"],
    ["unity_gain_stable", true, "yes", undefined],
    ["tags", ["rail-to-rail", "cmos"], "rail-to-rail, cmos", undefined],
    ["name", "Ground-sensing bipolar, single", "Ground-sensing bipolar, single", undefined],
    // A word column holding digits sorts as the number it reads as, both ways (parseSortKey).
    ["type", "2", "2", undefined],
    // A text that reads "yes" in a word column is a word, not a 1.
    ["type", "yes", "yes", "yes"],
  ])("%s %j shows %j with data-sort %j", (key, value, text, sort) => {
    const cell = catalogueCell(column(key), value);
    expect(cell).toEqual({ text, spoken: text, rated: true, ...(sort === undefined ? {} : { sort }) });
    // What the browser reads back is the key a full data-sort of the value gave before (parseSortKey of it).
    const full = sortKey(value);
    const read = cellSortKey({ sort: cell.sort, text: cell.text, rated: cell.rated }, key);
    expect(read).toEqual(parseSortKey(full === null ? undefined : String(full)));
  });

  it.each<[string, unknown, string]>([
    ["gbw_mhz", undefined, "not rated"],
    ["phase_reversal", undefined, "not stated"],
    ["tags", [], "none"],
  ])("%s %j is an empty cell read as %j, sorted last", (key, value, spoken) => {
    const cell = catalogueCell(column(key), value);
    expect(cell).toEqual({ text: "", spoken, rated: false });
    expect(cellSortKey({ text: `—${spoken}`, rated: false }, key)).toBeNull();
  });

  it("sets words left and numbers right", () => {
    expect(["id", "name", "status", "tags", "type", "output", "input_fet"].every(isTextColumn)).toBe(true);
    expect(["gbw_mhz", "cost_band", "channels"].some(isTextColumn)).toBe(false);
  });
});
