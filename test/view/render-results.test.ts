import { describe, expect, it } from "vitest";
import { catalogueFromParts, type Part } from "../../src/core/catalogue.ts";
import { evaluateDesign } from "../../src/engine.ts";
import type { DesignResult } from "../../src/core/engine/result.ts";
import { loadCatalogue } from "../../src/node/load-data.ts";
import "../client/try/all-topologies.ts";
import { DEFAULT_DRAFT } from "../../src/client/try/defaults.ts";
import { checkDraft } from "../../src/client/try/draft.ts";
import { pieceHtml, type Piece } from "../../src/view/pieces.ts";
import { rejectionGroups } from "../../src/view/role-lists.ts";
import { FIRST_ROWS, holdsLine, renderResults, renderRole, resultPieces } from "../../src/view/render-results.ts";

const { catalogue } = loadCatalogue("data");

function evaluate(draft: Record<string, string>, parts: readonly Part[] = catalogue.parts): DesignResult {
  const design = checkDraft(draft).design;
  if (!design) throw new Error("draft does not validate");
  const e = evaluateDesign(design, catalogueFromParts([...parts]));
  if (!e.ok) throw new Error(e.problems.map((p) => p.message).join("\n"));
  return e.result;
}

const closed = { expanded: new Set<string>() };
// Fits are table rows, rejections list lines, both marked with their part and verdict.
const rowsOf = (html: string) =>
  [...html.matchAll(/<(?:tr|li) data-part="([^"]*)" data-verdict="([^"]*)">/g)].map((m) => [m[1], m[2]]);

describe("renderRole", () => {
  // 12 V rails on fixed ±12 V: most op amps fit the buffer, so both lists are long enough to cut.
  const result = evaluate({
    ...DEFAULT_DRAFT,
    "supply.positive_v": "12",
    "supply.negative.kind": "fixed",
    "supply.negative.v": "-12",
  });
  const buffer = result.roles.find((r) => r.role === "buffer");
  if (!buffer) throw new Error("no buffer role");

  it("marks every shown part with its id and verdict, fits first in rank order", () => {
    const html = renderRole(buffer, result, closed);
    const shown = rowsOf(html);
    // Rejections come grouped by the rule that decides them (role-lists.ts), the first rows of each group.
    const rejected = rejectionGroups(buffer).flatMap((g) => g.parts.slice(0, FIRST_ROWS).map((p) => p.result));
    const expected = [...buffer.fits.slice(0, FIRST_ROWS), ...rejected].map((p) => [p.part.id, p.verdict]);
    expect(shown).toEqual(expected);
  });

  it("cuts long lists after the first rows and offers the rest behind a button", () => {
    expect(buffer.fits.length).toBeGreaterThan(FIRST_ROWS);
    const html = renderRole(buffer, result, closed);
    const more = buffer.fits.length - FIRST_ROWS;
    expect(html).toContain(
      `data-toggle="buffer:fits" aria-expanded="false">Show all ${buffer.fits.length} fits (${more} more)</button>`,
    );
    const open = renderRole(buffer, result, { expanded: new Set(["buffer:fits"]) });
    const firstRejected = rejectionGroups(buffer).reduce((n, g) => n + Math.min(FIRST_ROWS, g.parts.length), 0);
    expect(rowsOf(open).length).toBe(buffer.fits.length + firstRejected);
    expect(open).toContain(`aria-expanded="true">Show the first ${FIRST_ROWS} fits only</button>`);
  });

  it("counts fits and names the part the design uses", () => {
    const html = renderRole(buffer, result, closed);
    expect(html).toContain(
      `<strong>${buffer.fits.length}</strong> of ${buffer.fits.length + buffer.rejected.length} fit. Best fit: ${buffer.chosen}.`,
    );
  });

  it("draws the rail diagram of the chosen op amp", () => {
    expect(renderRole(buffer, result, closed)).toMatch(
      /<figure class="try-diagram"><svg class="rail-diagram"[^>]*aria-labelledby="try-rd-buffer-t try-rd-buffer-d"/,
    );
  });
});

describe("renderResults with hostile catalogue text", () => {
  const template = catalogue.opAmps[0] as Part;
  const hostile: Part = {
    ...template,
    id: "oa-hostile",
    name: `"><img src=x onerror=alert(1)><script>alert(2)</script>`,
    status: "stocked",
    cost_band: 1,
  };
  const result = evaluate(
    { ...DEFAULT_DRAFT, "supply.positive_v": "12", "supply.negative.kind": "fixed", "supply.negative.v": "-12" },
    [hostile, ...catalogue.parts],
  );
  const html = renderResults(result, {
    expanded: new Set(result.roles.flatMap((r) => [`${r.role}:fits`, `${r.role}:rejected`])),
  });

  it("lists the part by its id and never lets its name in as markup", () => {
    expect(html).toContain('<a href="/parts/oa-hostile/">oa-hostile</a>');
    expect(html).not.toMatch(/<img|<script|onerror=alert\(1\)>/);
  });

  it("has no inline style or script anywhere (the page's CSP forbids both)", () => {
    expect(html).not.toMatch(/<[^>]*\sstyle=|<script|<[^>]*\son[a-z]+=/i);
  });
});

describe("holdsLine", () => {
  // Worded by the design pages' summary (src/view/design-summary.ts); here, that the page states the right case.
  // SPEC §11.11: the state includes the budget; a worst case over the requirement with the RSS inside is marginal.
  it.each([
    [
      "the default design",
      {},
      false,
      /^Design marginal\. Every role has a fit and every BOM part fits\. Accuracy budget is marginal \(worst case 178 mV against 100 mV\)\.$/,
    ],
    [
      "a BOM buffer that cannot reach the window",
      { "bom.buffer": "oa-bip-gs-dual" },
      false,
      /oa-bip-gs-dual \(buffer\) does not fit/,
    ],
    [
      "a 12 V rail that lifts every comparator output above the logic supply and puts the pumped supply beyond the fast rectifiers' 12 V",
      { "supply.positive_v": "12" },
      false,
      /^Design fails\. No part fits the rectifier and sign comparator\. Accuracy budget incomplete: no part for the rectifier and sign comparator\.$/,
    ],
  ] as const)("%s", (_label, change, holds, line) => {
    const result = holdsLine(evaluate({ ...DEFAULT_DRAFT, ...change }));
    expect(result.holds).toBe(holds);
    expect(result.line).toMatch(line);
  });
});

describe("resultPieces", () => {
  // The page keeps one element per piece and finds it again by key (src/client/try/render.ts).
  const result = evaluate({ ...DEFAULT_DRAFT, topology: "all" });
  const everything = {
    expanded: new Set(result.roles.flatMap((r) => [`${r.role}:fits`, `${r.role}:rejected`])),
  };
  const problems = (pieces: readonly Piece[], path: string): string[] => {
    const keys = pieces.map((p) => p.key);
    const repeated = keys.filter((k, i) => keys.indexOf(k) !== i).map((k) => `${path}: key '${k}' repeats`);
    const notOneElement = pieces
      .filter((p) => !/^<([a-z][a-z0-9]*)[\s>][\s\S]*<\/\1>$/.test(pieceHtml(p)))
      .map((p) => `${path}/${p.key}: not one element`);
    const inside = pieces.flatMap((p) => ("children" in p ? problems(p.children, `${path}/${p.key}`) : []));
    return [...repeated, ...notOneElement, ...inside];
  };

  it.each([
    ["the first rows", closed],
    ["every list open", everything],
  ])("keys each piece uniquely among its siblings and makes it one element, with %s", (_label, view) => {
    const pieces = resultPieces(result, view);
    expect(pieces.length).toBeGreaterThan(result.roles.length);
    expect(problems(pieces, "")).toEqual([]);
  });
});
