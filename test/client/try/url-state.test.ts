import fc from "fast-check";
import { describe, expect, it } from "vitest";
import "./all-topologies.ts";
import { parseDesignValue } from "../../../src/engine.ts";
import { evaluateDesign } from "../../../src/engine.ts";
import { formatProblem } from "../../../src/core/problems.ts";
import type { Design } from "../../../src/core/schemas/design.ts";
import { loadCatalogue } from "../../../src/node/load-data.ts";
import { DEFAULT_DRAFT } from "../../../src/client/try/defaults.ts";
import { checkDraft, draftFromInput } from "../../../src/client/try/draft.ts";
import { applies, FIELDS } from "../../../src/client/try/fields.ts";
import { decodeQuery, encodeDraft, MAX_QUERY_CHARS, stateFromUrl } from "../../../src/client/try/url-state.ts";
import { DEMO_DESIGNS } from "./demo-designs.ts";

const { catalogue } = loadCatalogue("data");
const engineCheck = (design: Design) => {
  const e = evaluateDesign(design, catalogue);
  return e.ok ? [] : e.problems;
};

describe("encodeDraft → stateFromUrl round trip", () => {
  it.each(DEMO_DESIGNS.map((d) => [d.file, d.raw] as const))(
    "%s comes back as the same design, text and link",
    (_file, raw) => {
      const draft = draftFromInput(raw, DEFAULT_DRAFT);
      const query = encodeDraft(draft);
      const state = stateFromUrl(`?${query}`, DEFAULT_DRAFT, engineCheck);
      expect(state.problems).toEqual([]);
      expect(state.fallback).toBe("none");
      expect(state.design).toEqual(parseDesignValue("file", raw).design);
      for (const f of FIELDS) if (applies(f, draft)) expect(state.draft[f.path], f.path).toBe(draft[f.path]);
      expect(encodeDraft(state.draft)).toBe(query);
    },
  );

  it("keeps text exactly, including SI prefixes, micro signs, spaces and reserved URL characters", () => {
    const draft = {
      ...DEFAULT_DRAFT,
      title: "±10 V & 50 % <test> #1 +/=?",
      "supply.negative.flying_cap_f": "4.7µ",
      "signal.source_ohm": "2.2k",
    };
    const state = stateFromUrl(`?${encodeDraft(draft)}`, DEFAULT_DRAFT);
    expect(state.problems).toEqual([]);
    expect(state.draft).toEqual(draft);
    expect(state.design.supply.negative).toMatchObject({ flying_cap_f: 4.7e-6 });
  });

  it("writes fields in file order and leaves out the ones the design does not use", () => {
    const query = encodeDraft(DEFAULT_DRAFT);
    expect(query.startsWith("id=new-design&title=")).toBe(true);
    expect(query).toContain("&supply.negative.flying_cap_f=10u&");
    expect(query).not.toContain("supply.negative.v=");
    // Only the policy key the default design sets itself (SPEC §11.2: the summer carries 4·Vos).
    expect(query.match(/policy\.[a-z_]+/g)).toEqual(["policy.offset_share"]);
    expect(query).not.toContain("bom.");
  });

  it("reads a link whose query is behind a # as well", () => {
    expect(stateFromUrl(`#${encodeDraft(DEFAULT_DRAFT)}`, DEFAULT_DRAFT).problems).toEqual([]);
  });

  it("starts from the defaults, without a problem, when there is no query", () => {
    for (const search of ["", "?", "#"]) {
      const state = stateFromUrl(search, DEFAULT_DRAFT);
      expect(state).toMatchObject({ problems: [], fallback: "none", replaced: [] });
      expect(state.draft).toEqual(DEFAULT_DRAFT);
    }
  });
});

describe("tampered links", () => {
  const good = encodeDraft(DEFAULT_DRAFT);
  const lines = (search: string) => stateFromUrl(search, DEFAULT_DRAFT, engineCheck).problems.map(formatProblem);

  it("names an unknown field, suggests the closest one and ignores it", () => {
    expect(lines(`?${good}&signal.peek_v=3&zzz=1`)).toMatchInlineSnapshot(`
      [
        "link: signal.peek_v: unknown field (got 'signal.peek_v', expected 'signal.peak_v'); it was ignored",
        "link: zzz: unknown field (got 'zzz', expected a design field such as 'signal.peak_v'); it was ignored",
      ]
    `);
  });

  it("uses the first of a repeated field", () => {
    const state = stateFromUrl(`?${good}&supply.positive_v=12`, DEFAULT_DRAFT);
    expect(state.problems.map(formatProblem)).toMatchInlineSnapshot(`
      [
        "link: supply.positive_v: field appears 2 times (expected once); the first value was used",
      ]
    `);
    expect(state.design.supply.positive_v).toBe(5);
  });

  it("puts the default in place of a bad value and says what was wrong", () => {
    const state = stateFromUrl(`?${good.replace("signal.peak_v=10", "signal.peak_v=ten")}`, DEFAULT_DRAFT);
    expect(state).toMatchObject({ fallback: "fields", replaced: ["signal.peak_v"] });
    expect(state.problems).toEqual([
      { file: "link", path: "signal.peak_v", message: expect.stringContaining("(got 'ten'") },
    ]);
    expect(state.design.signal.peak_v).toBe(10);
  });

  it("takes a short link as it is: left-out fields show their defaults, with no problem to report", () => {
    const state = stateFromUrl("?signal.peak_v=3&supply.positive_v=12", DEFAULT_DRAFT);
    expect(state.problems).toEqual([]);
    expect(state.design.signal.peak_v).toBe(3);
    expect(state.design.supply.positive_v).toBe(12);
    expect(state.fallback).toBe("none");
    expect(state.defaulted).toHaveLength(27);
    expect(state.defaulted).toContain("title");
  });

  it("resets a BOM part the catalogue does not have (the engine's check)", () => {
    const state = stateFromUrl(`?${good}&bom.buffer=no-such-part`, DEFAULT_DRAFT, engineCheck);
    expect(state).toMatchObject({ fallback: "fields", replaced: ["bom.buffer"] });
    expect(state.problems).toEqual([
      {
        file: "link",
        path: "bom.buffer",
        message: expect.stringContaining("names no part in the catalogue (got 'no-such-part'"),
      },
    ]);
    expect(state.design.bom).toEqual({});
  });

  it("resets a field the cross-field checks blame, then the whole design when that does not help", () => {
    // window_v ≥ positive_v is blamed on window_v; the default window (2.5 V) still does not fit a 2 V rail.
    const state = stateFromUrl(`?${good.replace("supply.positive_v=5", "supply.positive_v=2")}`, DEFAULT_DRAFT);
    expect(state.fallback).toBe("defaults");
    expect(state.draft).toEqual(DEFAULT_DRAFT);
    expect(state.problems.map((p) => p.path)).toContain("front_end.window_v");
  });

  it.each([
    ["a link with no design field", "?utm_source=mail", "defaults"],
    ["garbage", "?%%%&&==&=%E0%A4%A", "defaults"],
    ["a very long link", `?title=${"x".repeat(MAX_QUERY_CHARS)}`, "defaults"],
    [
      "an unknown rail kind",
      `?${good.replace("supply.negative.kind=charge-pump", "supply.negative.kind=battery")}`,
      "fields",
    ],
    [
      "a hostile title",
      `?${good.replace(/title=[^&]*/, `title=${encodeURIComponent("<img src=x onerror=alert(1)>")}`)}`,
      "none",
    ],
    ["a prototype key", `?__proto__.x=1&constructor=1&${good}`, "none"],
  ] as const)("%s gives problems or a design, never an exception", (_label, search, fallback) => {
    const state = stateFromUrl(search, DEFAULT_DRAFT, engineCheck);
    expect(state.fallback).toBe(fallback);
    expect(checkDraft(state.draft).design).toEqual(state.design);
    expect(({} as Record<string, unknown>)["x"]).toBeUndefined();
  });

  it("says why a very long link is refused", () => {
    expect(decodeQuery(`?title=${"x".repeat(MAX_QUERY_CHARS)}`).problems.map(formatProblem)).toMatchInlineSnapshot(`
      [
        "link: link is 8006 characters long (expected at most 8000; was it cut or pasted twice?)",
      ]
    `);
  });

  it("never throws and always ends on a valid design, whatever the query holds (property)", () => {
    const keys = [...FIELDS.map((f) => f.path), "junk", "__proto__", ""];
    const query = fc.oneof(
      fc.string({ unit: "binary", maxLength: 300 }),
      fc
        .array(
          fc.tuple(
            fc.constantFrom(...keys),
            fc.oneof(
              fc.string({ maxLength: 12 }),
              fc.constantFrom("1", "-5", "4.7u", "1e400", "NaN", "true", "fixed", "E96"),
            ),
          ),
          { maxLength: 40 },
        )
        .map((pairs) => new URLSearchParams(pairs).toString()),
    );
    fc.assert(
      fc.property(query, (q) => {
        const state = stateFromUrl(`?${q}`, DEFAULT_DRAFT, engineCheck);
        expect(checkDraft(state.draft).design).toEqual(state.design);
        expect(stateFromUrl(`?${encodeDraft(state.draft)}`, DEFAULT_DRAFT, engineCheck).problems).toEqual([]);
      }),
      { numRuns: 300 },
    );
  });
});
