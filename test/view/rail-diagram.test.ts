// The rail diagram: geometry checked by number, text checked for escaping.
// Voltages are the SPEC §7 ranges (reach = rail ± headroom, margin = min of the
// two ends), worked by hand below for ±5 V rails and a ±2.5 V window.
import { describe, expect, it } from "vitest";
import type { Finding, OpAmpStage, Rails, SignStage, Verdict } from "../../src/core/engine/types.ts";
import { layoutRailDiagram, RAIL_LEGEND, renderRailDiagram } from "../../src/view/rail-diagram.ts";
import { comparator, diode, opAmp } from "../helpers/parts.ts";

const rails: Rails = { positive_v: 5, negative_v: -5 };
const buffer: OpAmpStage = {
  stage: "op-amp",
  label: "the buffer",
  input: { low: -2.5, high: 2.5 },
  output: { low: -2.5, high: 2.5 },
  noise_gain: 1,
  vos_multiplier: 1,
  bias_ohm: 0,
  output_per_input: 1,
  bandwidth_peak_v: 2.5,
  slew_amplitude_v: 2.5,
};
const sign: SignStage = {
  stage: "sign",
  label: "the sign comparator",
  input: { low: -2.5, high: 2.5 },
  output_per_input: 1,
};

// Input reach −5.1 … +5.1 V (0.1 V beyond each rail), output −4.95 … +3.5 V.
const part = opAmp({
  icm_neg_headroom_v: -0.1,
  icm_pos_headroom_v: -0.1,
  out_neg_headroom_v: 0.05,
  out_pos_headroom_v: 1.5,
});

describe("layoutRailDiagram", () => {
  const layout = layoutRailDiagram({ part, stage: buffer, rails });
  // Voltages span −5.1 … +5.1 V, padded 6 % (0.612 V) each side: −5.712 … +5.712 V
  // onto the plot's x = 112 … 706, so x(v) = 112 + (v + 5.712) / 11.424 · 594.
  it.each([
    [0, 409],
    [-5, 149],
    [5, 669],
    [-2.5, 279],
    [-5.1, 143.8],
    [5.1, 674.2],
  ])("puts %d V at x = %d", (v, x) => {
    expect(layout.x(v)).toBeCloseTo(x, 1);
  });

  it("draws the rails where the scale puts them", () => {
    expect(layout.rails).toEqual({ negative: { volts: -5, x: 149 }, positive: { volts: 5, x: 669 } });
  });

  it("labels each input margin between the needed end and the reached end", () => {
    const input = layout.rows.find((r) => r.name === "input");
    expect(input?.needed).toEqual({ low: -2.5, high: 2.5, x1: 279, x2: 539 });
    expect(input?.reach).toEqual({ low: -5.1, high: 5.1, x1: 143.8, x2: 674.2 });
    expect(
      input?.margins.map(({ side, volts, x1, x2, label }) => ({
        side,
        volts: Number(volts.toFixed(6)),
        x1,
        x2,
        label,
      })),
    ).toEqual([
      { side: "low", volts: 2.6, x1: 279, x2: 143.8, label: "2.60 V" },
      { side: "high", volts: 2.6, x1: 539, x2: 674.2, label: "2.60 V" },
    ]);
  });

  it("labels each output margin, 2.45 V below and 1.00 V above", () => {
    const output = layout.rows.find((r) => r.name === "output");
    expect(output?.margins.map((m) => [m.side, Number(m.volts.toFixed(6)), m.label])).toEqual([
      ["low", 2.45, "2.45 V"],
      ["high", 1, "1.00 V"],
    ]);
    // The label sits midway along its dimension line: (x(2.5) + x(3.5)) / 2.
    const high = output?.margins[1];
    expect(high?.labelX).toBeCloseTo((layout.x(2.5) + layout.x(3.5)) / 2, 0);
  });

  it("marks a headroom failure as short, with the needed end beyond the reached one", () => {
    // Output to V+ − 3 V = +2.0 V against a needed +2.5 V: 0.50 V short.
    const low = opAmp({ out_pos_headroom_v: 3 });
    const l = layoutRailDiagram({ part: low, stage: buffer, rails });
    const high = l.rows[1]?.margins.find((m) => m.side === "high");
    expect(high?.volts).toBeCloseTo(-0.5, 9);
    expect(high?.label).toBe("0.50 V short");
    expect(high && high.x1 > high.x2).toBe(true);
    expect(renderRailDiagram({ part: low, stage: buffer, rails })).toContain('class="rd-margin rd-short"');
  });

  it("widens the scale to take in a range beyond the rails and a ground rail", () => {
    const l = layoutRailDiagram({ part, stage: buffer, rails: { positive_v: 3.3, negative_v: 0 } });
    expect(l.x(-5.1 + 5)).toBeLessThan(l.rails.negative.x);
    expect(l.x(3.4)).toBeGreaterThan(l.rails.positive.x);
    expect(l.x(-2.5)).toBeGreaterThanOrEqual(l.plot.left);
  });

  it("colours rows by the verdict of their rule", () => {
    const finding = (rule: string, verdict: Verdict): Finding => ({
      rule,
      verdict,
      needed: 0,
      available: 0,
      margin: 0,
      unit: "V",
      reason: "",
      steps: [],
    });
    const l = layoutRailDiagram({
      part,
      stage: buffer,
      rails,
      findings: [finding("input-common-mode", "marginal"), finding("output-swing", "fail")],
    });
    expect(l.rows.map((r) => r.verdict)).toEqual(["marginal", "fail"]);
  });

  it("shows a comparator's output levels without a needed window, and says so for open drain", () => {
    const pushPull = layoutRailDiagram({ part: comparator(), stage: sign, rails });
    expect(pushPull.rows[1]).toEqual(expect.objectContaining({ subtitle: "levels", margins: [] }));
    expect(pushPull.rows[1]?.reach).toEqual(expect.objectContaining({ low: -5, high: 5 }));
    const openDrain = layoutRailDiagram({
      part: comparator({ output: "open-drain", out_neg_headroom_v: undefined, out_pos_headroom_v: undefined }),
      stage: sign,
      rails,
    });
    expect(openDrain.rows[1]?.note).toBe("Open-drain output: it pulls low and needs a resistor to go high.");
    expect(openDrain.rows[1]?.reach).toBeUndefined();
  });

  it("refuses a diode", () => {
    expect(() => layoutRailDiagram({ part: diode(), stage: buffer, rails })).toThrow(
      /parts that run from the rails only/,
    );
  });
});

describe("renderRailDiagram", () => {
  it("escapes the part name, the stage label and the id in every place they appear", () => {
    const hostile = opAmp({ name: `<script>alert("x")</script> & 'q'` });
    const svg = renderRailDiagram({ part: hostile, stage: { ...buffer, label: "<b>stage</b>" }, rails, id: `a"b` });
    expect(svg).not.toContain("<script>");
    expect(svg).not.toContain("<b>");
    expect(svg).toContain("&lt;script&gt;alert(&quot;x&quot;)&lt;/script&gt; &amp; &#39;q&#39;");
    expect(svg).toContain("&lt;b&gt;stage&lt;/b&gt;");
    expect(svg).toContain('aria-labelledby="a&quot;b-t a&quot;b-d"');
  });

  it("has no style attribute and no link (the site's CSP forbids inline styles)", () => {
    const svg = renderRailDiagram({ part, stage: buffer, rails });
    expect(svg).not.toMatch(/\sstyle=/);
    expect(svg).not.toMatch(/href=|<script|<style/);
  });

  it("writes each margin label at its layout position", () => {
    const svg = renderRailDiagram({ part, stage: buffer, rails });
    const layout = layoutRailDiagram({ part, stage: buffer, rails });
    for (const m of layout.rows.flatMap((r) => r.margins)) {
      expect(svg).toContain(
        `<text x="${m.labelX}" y="${m.y + 15}" text-anchor="middle" fill="currentColor">${m.label}</text>`,
      );
    }
  });

  it("describes the picture in words for screen readers", () => {
    const svg = renderRailDiagram({ part, stage: buffer, rails, id: "d1" });
    expect(svg).toContain('<title id="d1-t">Rail diagram: Test op amp as the buffer</title>');
    const desc = /<desc id="d1-d">(.*?)<\/desc>/.exec(svg)?.[1];
    expect(desc).toMatchInlineSnapshot(
      `"Rails: V− −5.00 V, V+ +5.00 V. Input common mode: needs −2.50 V to +2.50 V; the part reaches −5.10 V to +5.10 V, 2.60 V to spare at the low end and 2.60 V to spare at the high end. Output swing: needs −2.50 V to +2.50 V; the part reaches −4.95 V to +3.50 V, 2.45 V to spare at the low end and 1.00 V to spare at the high end."`,
    );
  });

  it("draws a dimension line with both end ticks for each margin", () => {
    const svg = renderRailDiagram({ part, stage: buffer, rails });
    const layout = layoutRailDiagram({ part, stage: buffer, rails });
    for (const m of layout.rows.flatMap((r) => r.margins)) {
      const [a, b] = [Math.min(m.x1, m.x2), Math.max(m.x1, m.x2)];
      expect(svg).toContain(`<path d="M${a} ${m.y}H${b}M${a} ${m.y - 4}V${m.y + 4}M${b} ${m.y - 4}V${m.y + 4}"`);
    }
  });

  it("leaves the key out when the page draws one for all its diagrams, ending just under the rails", () => {
    const layout = layoutRailDiagram({ part, stage: buffer, rails });
    const without = renderRailDiagram({ part, stage: buffer, rails, legend: false });
    expect(renderRailDiagram({ part, stage: buffer, rails })).toContain('<g class="rd-legend">');
    expect(without).not.toContain("rd-legend");
    // The rails run down to height − 24 (the key's band); the picture stops 4 below that.
    expect(without).toContain(`viewBox="0 0 720 ${layout.height - 24 + 4}"`);
    expect(RAIL_LEGEND).toContain('<g class="rd-legend">');
    expect(RAIL_LEGEND).toMatch(
      /^<svg class="rail-diagram rail-legend"[^>]* role="img" aria-labelledby="rd-key-t"><title id="rd-key-t">Key to the rail diagrams: /,
    );
  });
});
