// The bad-input corpus (issue 8 §1): every defect gets exit 2 (or 1 for a
// legitimate "no fit"), one message line per problem naming the file and its
// line or JSON path, and never a stack trace. The expected wording is the house
// pattern of SPEC §4: "file:line: column 'x': what is wrong (got 'v', expected …)".
import { describe, expect, it } from "vitest";
import { loadDataSet } from "../../src/node/load-data.ts";
import { BAD, check, corpusFolders, STACK_TRACE, validate, type CliRun } from "./cli.ts";

type Case = {
  /** Exit of `validate --data DIR`, the same gate the site build passes first. */
  validate: 0 | 2;
  /** Exit of `check DIR/designs/*.json --data DIR`. */
  check: 1 | 2;
  /** The problem concerns the whole file, so a message names no line or path. */
  wholeFile?: true;
};

// Exit codes from SPEC §10: 2 on invalid input, 1 when a role has no fit.
const CASES: Record<string, Case> = {
  "bom-names-no-part": { validate: 2, check: 2 },
  "bom-names-wrong-kind": { validate: 2, check: 2 },
  "bom-unknown-role": { validate: 2, check: 2 },
  "csv-control-characters": { validate: 2, check: 2 },
  "csv-line-100kb": { validate: 2, check: 2 },
  "csv-lone-cr-line-ends": { validate: 2, check: 2 },
  "csv-negative-load-resistance": { validate: 2, check: 2 },
  "csv-non-utf8-bytes": { validate: 2, check: 2 },
  "csv-tab-separated": { validate: 2, check: 2 },
  "csv-utf16-no-bom": { validate: 2, check: 2 },
  "csv-utf16-with-bom": { validate: 2, check: 2 },
  "csv-zero-gbw": { validate: 2, check: 2 },
  "design-json-trailing-comma": { validate: 2, check: 2 },
  "design-line-100kb": { validate: 2, check: 2 },
  "design-negative-frequency": { validate: 2, check: 2 },
  "design-negative-resistance": { validate: 2, check: 2 },
  "design-nested-too-deep": { validate: 2, check: 2 },
  "design-non-utf8-bytes": { validate: 2, check: 2 },
  "design-not-an-object": { validate: 2, check: 2, wholeFile: true },
  "design-number-overflow": { validate: 2, check: 2 },
  "design-unknown-level-shift": { validate: 2, check: 2 },
  "design-unknown-topology": { validate: 2, check: 2 },
  "design-window-beyond-every-part": { validate: 0, check: 1 },
  "design-window-wider-than-rails": { validate: 2, check: 2 },
  "design-wrong-types": { validate: 2, check: 2 },
  "design-zero-bits": { validate: 2, check: 2 },
  "design-zero-frequency": { validate: 2, check: 2 },
  "design-zero-peak": { validate: 2, check: 2 },
  "design-zero-reference": { validate: 2, check: 2 },
  "design-zero-resistance": { validate: 2, check: 2 },
  "duplicate-design-ids": { validate: 2, check: 2 },
  "pump-drive-below-two-diode-drops": { validate: 2, check: 2 },
  "pump-load-past-collapse": { validate: 2, check: 2 },
};

const SUMMARY = /^railsieve: (\d+) problems? found; (the data is not valid|nothing was checked)$/;

function messageLines(run: CliRun): { lines: string[]; summary: number | undefined } {
  const all = run.err.split("\n").filter((l) => l !== "");
  const last = SUMMARY.exec(all.at(-1) ?? "");
  return { lines: last ? all.slice(0, -1) : all, summary: last ? Number(last[1]) : undefined };
}

/** Where a message must point: the CSV file and line, or the design file and a line or JSON path. */
function wherePattern(defect: string, wholeFile: boolean): RegExp {
  const dir = `${BAD}/${defect}/`.replace(/[.-]/g, "\\$&");
  const csv = String.raw`(?:op-amps|comparators|diodes)\.csv:\d+: `;
  const design = String.raw`designs/[a-z0-9-]+\.json(?::\d+: |: [a-z_][a-z0-9_-]*(?:\.[a-z0-9_-]+)*: ${wholeFile ? "|: " : ""})`;
  return new RegExp(`^${dir}(?:${csv}|${design})`);
}

describe("every corpus folder has a row, and every row a folder", () => {
  it("matches the folders on disk", () => {
    expect(corpusFolders()).toEqual(Object.keys(CASES).sort());
  });
});

describe.each(Object.entries(CASES))("%s", (defect, c) => {
  const dir = `${BAD}/${defect}`;

  it(`validate exits ${c.validate} with one line per problem`, async () => {
    const run = await validate(dir);
    expect(run.code).toBe(c.validate);
    if (c.validate === 0) {
      expect(run.err).toBe("");
      expect(run.out).toMatch(/^valid: \d+ op amps?, \d+ comparators?, \d+ diodes?, \d+ designs?\n$/);
      return;
    }
    expect(run.out).toBe("");
    const { lines, summary } = messageLines(run);
    // One line per problem the loader found: nothing merged, nothing split over lines.
    expect(summary).toBe(lines.length);
    // The site build stops on exactly these problems (scripts/build.ts runs loadDataSet first).
    expect(lines.length).toBe(loadDataSet(dir).problems.length);
    for (const line of lines) expect(line).toMatch(wherePattern(defect, c.wholeFile === true));
  });

  it(`the build gate ${c.check === 2 ? "stops" : "passes"} as check does`, () => {
    // Input check refuses is input the site must not be built from; a "no fit" is a result to show.
    expect(loadDataSet(dir).problems.length > 0).toBe(c.check === 2);
  });

  it(`check exits ${c.check}`, async () => {
    const run = await check(dir);
    expect(run.code).toBe(c.check);
    if (c.check === 1) {
      // A legitimate "no fit": the report is printed and says which role has none.
      expect(run.err).toBe("");
      expect(run.out).toMatch(/result: \w+: no part fits/);
      return;
    }
    expect(run.out).toBe("");
    const { lines, summary } = messageLines(run);
    expect(summary).toBe(lines.length);
    expect(lines.length).toBeGreaterThan(0);
    for (const line of lines) expect(line).toMatch(wherePattern(defect, c.wholeFile === true));
  });

  it("prints no stack trace and no internal error", async () => {
    for (const run of [await validate(dir), await check(dir), await check(dir, "json"), await check(dir, "csv")]) {
      expect(run.code).not.toBe(70);
      for (const pattern of STACK_TRACE) expect(run.err).not.toMatch(pattern);
      expect(run.err).not.toContain("internal error");
    }
  });
});

/** What a user sees: both commands' exit codes and messages (and the verdict lines of a report). */
async function seen(defect: string): Promise<string> {
  const dir = `${BAD}/${defect}`;
  const v = await validate(dir);
  const c = await check(dir);
  // "result:" lines of the text report, with their wrapped continuations joined back.
  const verdicts: string[] = [];
  let inResult = false;
  for (const line of c.out.split("\n")) {
    if (/^ {2}result: /.test(line)) verdicts.push(line.trim());
    else if (inResult && /^ {4}\S/.test(line)) verdicts[verdicts.length - 1] += ` ${line.trim()}`;
    inResult = /^ {2}result: /.test(line) || (inResult && /^ {4}\S/.test(line));
  }
  return [`validate: exit ${v.code}`, v.out + v.err, `check: exit ${c.code}`, c.err || verdicts.join("\n")]
    .join("\n")
    .trimEnd();
}

describe("messages, pinned", () => {
  it("bom-names-no-part", async () => {
    expect(await seen("bom-names-no-part")).toMatchInlineSnapshot(`
      "validate: exit 2
      .fixtures/bad/bom-names-no-part/designs/audio-1v5-20k.json: bom.buffer: names no part in the catalogue (got 'oa-jfet-precision', expected the id of an op amp such as 'oa-bip-gs-dual')
      railsieve: 1 problem found; the data is not valid

      check: exit 2
      .fixtures/bad/bom-names-no-part/designs/audio-1v5-20k.json: bom.buffer: names no part in the catalogue (got 'oa-jfet-precision', expected the id of an op amp such as 'oa-bip-gs-dual')
      railsieve: 1 problem found; nothing was checked"
    `);
  });
  it("bom-names-wrong-kind", async () => {
    expect(await seen("bom-names-wrong-kind")).toMatchInlineSnapshot(`
      "validate: exit 2
      .fixtures/bad/bom-names-wrong-kind/designs/audio-1v5-20k.json: bom.rectifier-diode: names a part of the wrong kind (got 'oa-jfet-prec', an op amp, expected a diode)
      railsieve: 1 problem found; the data is not valid

      check: exit 2
      .fixtures/bad/bom-names-wrong-kind/designs/audio-1v5-20k.json: bom.rectifier-diode: names a part of the wrong kind (got 'oa-jfet-prec', an op amp, expected a diode)
      railsieve: 1 problem found; nothing was checked"
    `);
  });
  it("bom-unknown-role", async () => {
    expect(await seen("bom-unknown-role")).toMatchInlineSnapshot(`
      "validate: exit 2
      .fixtures/bad/bom-unknown-role/designs/audio-1v5-20k.json: bom.buffr: unknown role (got 'buffr', expected 'buffer')
      railsieve: 1 problem found; the data is not valid

      check: exit 2
      .fixtures/bad/bom-unknown-role/designs/audio-1v5-20k.json: bom.buffr: unknown role (got 'buffr', expected 'buffer')
      railsieve: 1 problem found; nothing was checked"
    `);
  });
  it("csv-control-characters", async () => {
    expect(await seen("csv-control-characters")).toMatchInlineSnapshot(`
      "validate: exit 2
      .fixtures/bad/csv-control-characters/diodes.csv:4: column 'id': not a valid id (got 'd-schottky\\n30v\\u001b[2J', expected lower-case letters, digits and '-', starting with a letter or digit, at most 80 characters)
      railsieve: 1 problem found; the data is not valid

      check: exit 2
      .fixtures/bad/csv-control-characters/diodes.csv:4: column 'id': not a valid id (got 'd-schottky\\n30v\\u001b[2J', expected lower-case letters, digits and '-', starting with a letter or digit, at most 80 characters)
      railsieve: 1 problem found; nothing was checked"
    `);
  });
  it("csv-line-100kb", async () => {
    expect(await seen("csv-line-100kb")).toMatchInlineSnapshot(`
      "validate: exit 2
      .fixtures/bad/csv-line-100kb/op-amps.csv:3: line is 102592 characters long (expected at most 20000; is this really a catalogue file?)
      railsieve: 1 problem found; the data is not valid

      check: exit 2
      .fixtures/bad/csv-line-100kb/op-amps.csv:3: line is 102592 characters long (expected at most 20000; is this really a catalogue file?)
      railsieve: 1 problem found; nothing was checked"
    `);
  });
  it("csv-lone-cr-line-ends", async () => {
    expect(await seen("csv-lone-cr-line-ends")).toMatchInlineSnapshot(`
      "validate: exit 2
      .fixtures/bad/csv-lone-cr-line-ends/comparators.csv:4: column 'supply_max_v': not a number (got '16 V', expected a number such as 0.5, 500m or 2.2k, greater than 0)
      railsieve: 1 problem found; the data is not valid

      check: exit 2
      .fixtures/bad/csv-lone-cr-line-ends/comparators.csv:4: column 'supply_max_v': not a number (got '16 V', expected a number such as 0.5, 500m or 2.2k, greater than 0)
      railsieve: 1 problem found; nothing was checked"
    `);
  });
  it("csv-negative-load-resistance", async () => {
    expect(await seen("csv-negative-load-resistance")).toMatchInlineSnapshot(`
      "validate: exit 2
      .fixtures/bad/csv-negative-load-resistance/op-amps.csv:2: column 'out_load_ohm': must not be negative (got '-10k', expected a number such as 0.5, 500m or 2.2k, greater than 0)
      railsieve: 1 problem found; the data is not valid

      check: exit 2
      .fixtures/bad/csv-negative-load-resistance/op-amps.csv:2: column 'out_load_ohm': must not be negative (got '-10k', expected a number such as 0.5, 500m or 2.2k, greater than 0)
      railsieve: 1 problem found; nothing was checked"
    `);
  });
  it("csv-non-utf8-bytes", async () => {
    expect(await seen("csv-non-utf8-bytes")).toMatchInlineSnapshot(`
      "validate: exit 2
      .fixtures/bad/csv-non-utf8-bytes/comparators.csv:4: bytes that are not UTF-8 (got byte 0xb1 at byte 730, expected UTF-8 text; re-save the file as UTF-8)
      railsieve: 1 problem found; the data is not valid

      check: exit 2
      .fixtures/bad/csv-non-utf8-bytes/comparators.csv:4: bytes that are not UTF-8 (got byte 0xb1 at byte 730, expected UTF-8 text; re-save the file as UTF-8)
      railsieve: 1 problem found; nothing was checked"
    `);
  });
  it("csv-tab-separated", async () => {
    expect(await seen("csv-tab-separated")).toMatchInlineSnapshot(`
      "validate: exit 2
      .fixtures/bad/csv-tab-separated/diodes.csv:1: header looks tab-separated (got 'id\\tname\\tstatus\\tcost_band\\ttags\\tnotes\\tt…', expected comma-separated columns; export the sheet as CSV with commas)
      railsieve: 1 problem found; the data is not valid

      check: exit 2
      .fixtures/bad/csv-tab-separated/diodes.csv:1: header looks tab-separated (got 'id\\tname\\tstatus\\tcost_band\\ttags\\tnotes\\tt…', expected comma-separated columns; export the sheet as CSV with commas)
      railsieve: 1 problem found; nothing was checked"
    `);
  });
  it("csv-utf16-no-bom", async () => {
    expect(await seen("csv-utf16-no-bom")).toMatchInlineSnapshot(`
      "validate: exit 2
      .fixtures/bad/csv-utf16-no-bom/diodes.csv:1: file is saved as UTF-16 (expected UTF-8; save or export it as 'CSV UTF-8')
      railsieve: 1 problem found; the data is not valid

      check: exit 2
      .fixtures/bad/csv-utf16-no-bom/diodes.csv:1: file is saved as UTF-16 (expected UTF-8; save or export it as 'CSV UTF-8')
      railsieve: 1 problem found; nothing was checked"
    `);
  });
  it("csv-utf16-with-bom", async () => {
    expect(await seen("csv-utf16-with-bom")).toMatchInlineSnapshot(`
      "validate: exit 2
      .fixtures/bad/csv-utf16-with-bom/diodes.csv:1: file is saved as UTF-16 (expected UTF-8; save or export it as 'CSV UTF-8')
      railsieve: 1 problem found; the data is not valid

      check: exit 2
      .fixtures/bad/csv-utf16-with-bom/diodes.csv:1: file is saved as UTF-16 (expected UTF-8; save or export it as 'CSV UTF-8')
      railsieve: 1 problem found; nothing was checked"
    `);
  });
  it("csv-zero-gbw", async () => {
    expect(await seen("csv-zero-gbw")).toMatchInlineSnapshot(`
      "validate: exit 2
      .fixtures/bad/csv-zero-gbw/op-amps.csv:5: column 'gbw_mhz': out of range (got '0', expected a number such as 0.5, 500m or 2.2k, greater than 0)
      railsieve: 1 problem found; the data is not valid

      check: exit 2
      .fixtures/bad/csv-zero-gbw/op-amps.csv:5: column 'gbw_mhz': out of range (got '0', expected a number such as 0.5, 500m or 2.2k, greater than 0)
      railsieve: 1 problem found; nothing was checked"
    `);
  });
  it("design-json-trailing-comma", async () => {
    expect(await seen("design-json-trailing-comma")).toMatchInlineSnapshot(`
      "validate: exit 2
      .fixtures/bad/design-json-trailing-comma/designs/bridge-10v-5v-adc.json:20: not valid JSON: Expected double-quoted property name (expected a design object as in SPEC §5)
      railsieve: 1 problem found; the data is not valid

      check: exit 2
      .fixtures/bad/design-json-trailing-comma/designs/bridge-10v-5v-adc.json:20: not valid JSON: Expected double-quoted property name (expected a design object as in SPEC §5)
      railsieve: 1 problem found; nothing was checked"
    `);
  });
  it("design-line-100kb", async () => {
    expect(await seen("design-line-100kb")).toMatchInlineSnapshot(`
      "validate: exit 2
      .fixtures/bad/design-line-100kb/designs/bridge-10v-5v-adc.json: title: not a valid title (got '±10 V bridge ±10 V bridge ±10 V bridg…', expected text of 1 to 200 characters)
      railsieve: 1 problem found; the data is not valid

      check: exit 2
      .fixtures/bad/design-line-100kb/designs/bridge-10v-5v-adc.json: title: not a valid title (got '±10 V bridge ±10 V bridge ±10 V bridg…', expected text of 1 to 200 characters)
      railsieve: 1 problem found; nothing was checked"
    `);
  });
  it("design-negative-frequency", async () => {
    expect(await seen("design-negative-frequency")).toMatchInlineSnapshot(`
      "validate: exit 2
      .fixtures/bad/design-negative-frequency/designs/bridge-10v-5v-adc.json: supply.negative.frequency_hz: out of range (got -980, expected a number (or a string such as "100k"), greater than 0)
      railsieve: 1 problem found; the data is not valid

      check: exit 2
      .fixtures/bad/design-negative-frequency/designs/bridge-10v-5v-adc.json: supply.negative.frequency_hz: out of range (got -980, expected a number (or a string such as "100k"), greater than 0)
      railsieve: 1 problem found; nothing was checked"
    `);
  });
  it("design-negative-resistance", async () => {
    expect(await seen("design-negative-resistance")).toMatchInlineSnapshot(`
      "validate: exit 2
      .fixtures/bad/design-negative-resistance/designs/bridge-10v-5v-adc.json: signal.source_ohm: out of range (got -1000, expected a number (or a string such as "100k"), at least 0)
      .fixtures/bad/design-negative-resistance/designs/bridge-10v-5v-adc.json: front_end.rectifier_load_ohm: out of range (got '-10k', expected a number (or a string such as "100k"), greater than 0)
      railsieve: 2 problems found; the data is not valid

      check: exit 2
      .fixtures/bad/design-negative-resistance/designs/bridge-10v-5v-adc.json: signal.source_ohm: out of range (got -1000, expected a number (or a string such as "100k"), at least 0)
      .fixtures/bad/design-negative-resistance/designs/bridge-10v-5v-adc.json: front_end.rectifier_load_ohm: out of range (got '-10k', expected a number (or a string such as "100k"), greater than 0)
      railsieve: 2 problems found; nothing was checked"
    `);
  });
  it("design-nested-too-deep", async () => {
    expect(await seen("design-nested-too-deep")).toMatchInlineSnapshot(`
      "validate: exit 2
      .fixtures/bad/design-nested-too-deep/designs/bridge-10v-5v-adc.json: policy: wrong type (got […], expected an object { … })
      railsieve: 1 problem found; the data is not valid

      check: exit 2
      .fixtures/bad/design-nested-too-deep/designs/bridge-10v-5v-adc.json: policy: wrong type (got […], expected an object { … })
      railsieve: 1 problem found; nothing was checked"
    `);
  });
  it("design-non-utf8-bytes", async () => {
    expect(await seen("design-non-utf8-bytes")).toMatchInlineSnapshot(`
      "validate: exit 2
      .fixtures/bad/design-non-utf8-bytes/designs/bridge-10v-5v-adc.json:3: bytes that are not UTF-8 (got byte 0xb1 at byte 43, expected UTF-8 text; re-save the file as UTF-8)
      railsieve: 1 problem found; the data is not valid

      check: exit 2
      .fixtures/bad/design-non-utf8-bytes/designs/bridge-10v-5v-adc.json:3: bytes that are not UTF-8 (got byte 0xb1 at byte 43, expected UTF-8 text; re-save the file as UTF-8)
      railsieve: 1 problem found; nothing was checked"
    `);
  });
  it("design-not-an-object", async () => {
    expect(await seen("design-not-an-object")).toMatchInlineSnapshot(`
      "validate: exit 2
      .fixtures/bad/design-not-an-object/designs/bridge-10v-5v-adc.json: wrong type (got ["bridge-10v-5v-adc"], expected an object { … })
      railsieve: 1 problem found; the data is not valid

      check: exit 2
      .fixtures/bad/design-not-an-object/designs/bridge-10v-5v-adc.json: wrong type (got ["bridge-10v-5v-adc"], expected an object { … })
      railsieve: 1 problem found; nothing was checked"
    `);
  });
  it("design-number-overflow", async () => {
    expect(await seen("design-number-overflow")).toMatchInlineSnapshot(`
      "validate: exit 2
      .fixtures/bad/design-number-overflow/designs/bridge-10v-5v-adc.json: signal.peak_v: out of range (got Infinity, expected a number (or a string such as "100k"), greater than 0 and at most 100000)
      railsieve: 1 problem found; the data is not valid

      check: exit 2
      .fixtures/bad/design-number-overflow/designs/bridge-10v-5v-adc.json: signal.peak_v: out of range (got Infinity, expected a number (or a string such as "100k"), greater than 0 and at most 100000)
      railsieve: 1 problem found; nothing was checked"
    `);
  });
  it("design-unknown-level-shift", async () => {
    expect(await seen("design-unknown-level-shift")).toMatchInlineSnapshot(`
      "validate: exit 2
      .fixtures/bad/design-unknown-level-shift/designs/bridge-10v-5v-adc.json: logic.level_shift: unknown value (got 'optocoupler', expected 'diode-clamp' or 'npn-inverter' or 'pull-up')
      railsieve: 1 problem found; the data is not valid

      check: exit 2
      .fixtures/bad/design-unknown-level-shift/designs/bridge-10v-5v-adc.json: logic.level_shift: unknown value (got 'optocoupler', expected 'diode-clamp' or 'npn-inverter' or 'pull-up')
      railsieve: 1 problem found; nothing was checked"
    `);
  });
  it("design-unknown-topology", async () => {
    expect(await seen("design-unknown-topology")).toMatchInlineSnapshot(`
      "validate: exit 2
      .fixtures/bad/design-unknown-topology/designs/bridge-10v-5v-adc.json: topology: unknown value (got 'full-wave-bridge', expected 'rectify-and-sign' or 'offset-to-mid-rail' or 'gained-level-shift' or 'difference-to-mid' or 'all')
      railsieve: 1 problem found; the data is not valid

      check: exit 2
      .fixtures/bad/design-unknown-topology/designs/bridge-10v-5v-adc.json: topology: unknown value (got 'full-wave-bridge', expected 'rectify-and-sign' or 'offset-to-mid-rail' or 'gained-level-shift' or 'difference-to-mid' or 'all')
      railsieve: 1 problem found; nothing was checked"
    `);
  });
  it("design-window-beyond-every-part", async () => {
    expect(await seen("design-window-beyond-every-part")).toMatchInlineSnapshot(`
      "validate: exit 0
      valid: 4 op amps, 3 comparators, 4 diodes, 2 designs

      check: exit 1
      result: buffer: no part fits; the closest, oa-bip-gs-dual, is unrated on stage-output-current: with the output at −1.00 V it sinks 200 µA into stage 1's input R to its virtual ground (10.0 kΩ to 0.00 V), the summer's input R to its virtual ground (10.0 kΩ to 0.00 V); and 'iout_max_ma' is empty for this part: not rated
      result: buffer: BOM part oa-jfet-prec does not fit (stage-output-current: with the output at −1.00 V it sinks 200 µA into stage 1's input R to its virtual ground (10.0 kΩ to 0.00 V), the summer's input R to its virtual ground (10.0 kΩ to 0.00 V); and 'iout_max_ma' is empty for this part: not rated)
      result: rectifier: no part fits; every candidate fails zero-crossing, e.g. oa-bip-gs-dual: dead 4.45 µs at each crossing, gain-bandwidth, then slew: the open-loop output ramps as an integrator for 760 ns (114 mV) until its rate reaches the 0.300 V/µs slew rate, then slews the rest of the 1.22 V (two diode drops at 0 °C (the cold end)): 4.45 µs in all; the reading is off by up to 839 mV (2π·f·peak·t: the output would go below 0 V, where the converter reads 0); the limit is 12.5 mV (timing share 25 % of the required accuracy): 826 mV short
      result: rectifier: BOM part oa-jfet-prec does not fit (stage-output-current: with the node beyond its diode at −1.00 V it sinks 300 µA into feedback R (through the diode) to the virtual ground (10.0 kΩ to 0.00 V), the summer's input R/2 to its virtual ground (5.00 kΩ to 0.00 V); and 'iout_max_ma' is empty for this part: not rated; on the other half-cycle it carries only the input R's W/R, through the other diode)
      result: sign: no part fits; every candidate fails propagation-delay, e.g. cmp-cmos-pp-rr: switches 450 ns after its input passes the threshold by 100 mV (assumed, common practice: tpd_overdrive_mv is empty, so at best marginal), which the 126 kV/s ramp takes 796 ns to reach: 1.25 µs in all; the sign may be late by 33.2 ns (timing share 25 % of the required accuracy at 2·2π·f·peak·t): 1.21 µs short
      result: buffer: no part fits; every candidate fails output-swing, e.g. oa-bip-gs-dual: needs the output to reach −4.98 V; with V− = −2.96 V it reaches only −2.94 V (0.02 V headroom): 2.03 V short
      result: rectifier: no part fits; every candidate fails output-swing, e.g. oa-bip-gs-dual: needs the output to reach −5.70 V; with V− = −2.96 V it reaches only −2.94 V (0.02 V headroom): 2.76 V short
      result: sign: no part fits; every candidate fails input-common-mode, e.g. cmp-cmos-pp-rr: needs inputs from −4.98 V to +4.98 V; with V− = −2.96 V and V+ = +5.00 V it accepts −3.16 V to +5.20 V: 1.81 V short"
    `);
  });
  it("design-window-wider-than-rails", async () => {
    expect(await seen("design-window-wider-than-rails")).toMatchInlineSnapshot(`
      "validate: exit 2
      .fixtures/bad/design-window-wider-than-rails/designs/bridge-10v-5v-adc.json: front_end.window_v: window can never fit inside the positive rail (got 5 V, expected less than supply.positive_v 5 V)
      railsieve: 1 problem found; the data is not valid

      check: exit 2
      .fixtures/bad/design-window-wider-than-rails/designs/bridge-10v-5v-adc.json: front_end.window_v: window can never fit inside the positive rail (got 5 V, expected less than supply.positive_v 5 V)
      railsieve: 1 problem found; nothing was checked"
    `);
  });
  it("design-wrong-types", async () => {
    expect(await seen("design-wrong-types")).toMatchInlineSnapshot(`
      "validate: exit 2
      .fixtures/bad/design-wrong-types/designs/bridge-10v-5v-adc.json: supply.positive_v: not a number (got '5 V', expected a number (or a string such as "100k"), greater than 0 and at most 100)
      .fixtures/bad/design-wrong-types/designs/bridge-10v-5v-adc.json: signal.peak_v: not a number (got true, expected a number (or a string such as "100k"), greater than 0 and at most 100000)
      .fixtures/bad/design-wrong-types/designs/bridge-10v-5v-adc.json: logic.level_shift: unknown value (got 3, expected 'diode-clamp' or 'npn-inverter' or 'pull-up')
      .fixtures/bad/design-wrong-types/designs/bridge-10v-5v-adc.json: temperature: wrong type (got [0,50], expected an object { … })
      railsieve: 4 problems found; the data is not valid

      check: exit 2
      .fixtures/bad/design-wrong-types/designs/bridge-10v-5v-adc.json: supply.positive_v: not a number (got '5 V', expected a number (or a string such as "100k"), greater than 0 and at most 100)
      .fixtures/bad/design-wrong-types/designs/bridge-10v-5v-adc.json: signal.peak_v: not a number (got true, expected a number (or a string such as "100k"), greater than 0 and at most 100000)
      .fixtures/bad/design-wrong-types/designs/bridge-10v-5v-adc.json: logic.level_shift: unknown value (got 3, expected 'diode-clamp' or 'npn-inverter' or 'pull-up')
      .fixtures/bad/design-wrong-types/designs/bridge-10v-5v-adc.json: temperature: wrong type (got [0,50], expected an object { … })
      railsieve: 4 problems found; nothing was checked"
    `);
  });
  it("design-zero-bits", async () => {
    expect(await seen("design-zero-bits")).toMatchInlineSnapshot(`
      "validate: exit 2
      .fixtures/bad/design-zero-bits/designs/bridge-10v-5v-adc.json: adc.bits: out of range (got 0, expected a whole number, at least 1 and at most 32)
      railsieve: 1 problem found; the data is not valid

      check: exit 2
      .fixtures/bad/design-zero-bits/designs/bridge-10v-5v-adc.json: adc.bits: out of range (got 0, expected a whole number, at least 1 and at most 32)
      railsieve: 1 problem found; nothing was checked"
    `);
  });
  it("design-zero-frequency", async () => {
    expect(await seen("design-zero-frequency")).toMatchInlineSnapshot(`
      "validate: exit 2
      .fixtures/bad/design-zero-frequency/designs/bridge-10v-5v-adc.json: signal.max_frequency_hz: out of range (got 0, expected a number (or a string such as "100k"), greater than 0)
      railsieve: 1 problem found; the data is not valid

      check: exit 2
      .fixtures/bad/design-zero-frequency/designs/bridge-10v-5v-adc.json: signal.max_frequency_hz: out of range (got 0, expected a number (or a string such as "100k"), greater than 0)
      railsieve: 1 problem found; nothing was checked"
    `);
  });
  it("design-zero-peak", async () => {
    expect(await seen("design-zero-peak")).toMatchInlineSnapshot(`
      "validate: exit 2
      .fixtures/bad/design-zero-peak/designs/bridge-10v-5v-adc.json: signal.peak_v: out of range (got 0, expected a number (or a string such as "100k"), greater than 0 and at most 100000)
      railsieve: 1 problem found; the data is not valid

      check: exit 2
      .fixtures/bad/design-zero-peak/designs/bridge-10v-5v-adc.json: signal.peak_v: out of range (got 0, expected a number (or a string such as "100k"), greater than 0 and at most 100000)
      railsieve: 1 problem found; nothing was checked"
    `);
  });
  it("design-zero-reference", async () => {
    expect(await seen("design-zero-reference")).toMatchInlineSnapshot(`
      "validate: exit 2
      .fixtures/bad/design-zero-reference/designs/bridge-10v-5v-adc.json: adc.reference_v: out of range (got 0, expected a number (or a string such as "100k"), greater than 0 and at most 100)
      railsieve: 1 problem found; the data is not valid

      check: exit 2
      .fixtures/bad/design-zero-reference/designs/bridge-10v-5v-adc.json: adc.reference_v: out of range (got 0, expected a number (or a string such as "100k"), greater than 0 and at most 100)
      railsieve: 1 problem found; nothing was checked"
    `);
  });
  it("design-zero-resistance", async () => {
    expect(await seen("design-zero-resistance")).toMatchInlineSnapshot(`
      "validate: exit 2
      .fixtures/bad/design-zero-resistance/designs/bridge-10v-5v-adc.json: front_end.divider_total_ohm: out of range (got 0, expected a number (or a string such as "100k"), greater than 0)
      .fixtures/bad/design-zero-resistance/designs/bridge-10v-5v-adc.json: logic.pull_down_ohm: out of range (got '0k', expected a number (or a string such as "100k"), greater than 0)
      railsieve: 2 problems found; the data is not valid

      check: exit 2
      .fixtures/bad/design-zero-resistance/designs/bridge-10v-5v-adc.json: front_end.divider_total_ohm: out of range (got 0, expected a number (or a string such as "100k"), greater than 0)
      .fixtures/bad/design-zero-resistance/designs/bridge-10v-5v-adc.json: logic.pull_down_ohm: out of range (got '0k', expected a number (or a string such as "100k"), greater than 0)
      railsieve: 2 problems found; nothing was checked"
    `);
  });
  it("duplicate-design-ids", async () => {
    expect(await seen("duplicate-design-ids")).toMatchInlineSnapshot(`
      "validate: exit 2
      .fixtures/bad/duplicate-design-ids/designs/audio-1v5-20k.json: id: duplicate design id (got 'audio-1v5-20k', expected an id not already used in .fixtures/bad/duplicate-design-ids/designs/audio-1v5-20k-copy.json)
      .fixtures/bad/duplicate-design-ids/designs/audio-1v5-20k-copy.json: id: id does not match the file name (got 'audio-1v5-20k', expected 'audio-1v5-20k-copy')
      railsieve: 2 problems found; the data is not valid

      check: exit 2
      .fixtures/bad/duplicate-design-ids/designs/audio-1v5-20k.json: id: duplicate design id (got 'audio-1v5-20k', expected an id not already used in .fixtures/bad/duplicate-design-ids/designs/audio-1v5-20k-copy.json)
      railsieve: 1 problem found; nothing was checked"
    `);
  });
  it("pump-drive-below-two-diode-drops", async () => {
    expect(await seen("pump-drive-below-two-diode-drops")).toMatchInlineSnapshot(`
      "validate: exit 2
      .fixtures/bad/pump-drive-below-two-diode-drops/designs/bridge-10v-5v-adc.json: supply.negative.drive_v: pump drive cannot make a negative rail (got 1.20 V, expected more than two diode drops, 2 × 0.75 V = 1.50 V with diode d-si-switch); raise the drive or use a diode with a lower forward voltage
      railsieve: 1 problem found; the data is not valid

      check: exit 2
      .fixtures/bad/pump-drive-below-two-diode-drops/designs/bridge-10v-5v-adc.json: supply.negative.drive_v: pump drive cannot make a negative rail (got 1.20 V, expected more than two diode drops, 2 × 0.75 V = 1.50 V with diode d-si-switch); raise the drive or use a diode with a lower forward voltage
      railsieve: 1 problem found; nothing was checked"
    `);
  });
  it("pump-load-past-collapse", async () => {
    expect(await seen("pump-load-past-collapse")).toMatchInlineSnapshot(`
      "validate: exit 2
      .fixtures/bad/pump-load-past-collapse/designs/bridge-10v-5v-adc.json: supply.negative.load_a: load is at or past the pump's collapse current (got 5.00 mA stated = 5.00 mA, expected less than (drive − 2·Vf)·f·C = 3.12 mA with diode d-si-switch); raise the frequency or the flying capacitor, or lower the load
      railsieve: 1 problem found; the data is not valid

      check: exit 2
      .fixtures/bad/pump-load-past-collapse/designs/bridge-10v-5v-adc.json: supply.negative.load_a: load is at or past the pump's collapse current (got 5.00 mA stated = 5.00 mA, expected less than (drive − 2·Vf)·f·C = 3.12 mA with diode d-si-switch); raise the frequency or the flying capacitor, or lower the load
      railsieve: 1 problem found; nothing was checked"
    `);
  });
});
