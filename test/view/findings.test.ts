// Findings as HTML: every rule's row, the arithmetic and the reasons that
// reject a part, with every piece of text escaped (catalogue text is free text).
import { describe, expect, it } from "vitest";
import type { Finding, Verdict } from "../../src/core/engine/types.ts";
import {
  renderArithmetic,
  renderFindingsTable,
  renderPassedRules,
  renderRejectionReasons,
} from "../../src/view/findings.ts";

const finding = (rule: string, verdict: Verdict, reason: string, steps: Finding["steps"] = []): Finding => ({
  rule,
  verdict,
  needed: 0,
  available: 0,
  margin: verdict === "fail" ? -1 : 1,
  unit: "V",
  reason,
  steps,
});

const href = (rule: string) => `/r/#rule-${rule}`;

describe("renderFindingsTable", () => {
  it("has a row per rule with its link, verdict and sentence, all text escaped", () => {
    const html = renderFindingsTable(
      [finding("output-swing", "fail", "reaches <+2.0 V>: 0.50 V short"), finding("offset", "pass", "fine")],
      `Findings for <b>x</b> & "y"`,
      href,
    );
    expect(html).toContain('aria-label="Findings for &lt;b&gt;x&lt;/b&gt; &amp; &quot;y&quot;"');
    expect(html.match(/<tr><th scope="row">/g)?.length).toBe(2);
    expect(html).toContain('<a href="/r/#rule-output-swing">output-swing</a>');
    expect(html).toContain('class="verdict verdict-fail"');
    expect(html).toContain("<td>reaches &lt;+2.0 V&gt;: 0.50 V short</td>");
  });
});

describe("renderArithmetic", () => {
  const steps = [{ label: "one ADC step = V_ref / 2^bits / k", value: 0.01953125, unit: "V" }];

  it("writes each rule's steps with SI prefixes in a closed details", () => {
    // IEEE Std 1241-2010: Q = 5 V / 2^10 = 4.8828 mV, ÷ k 0.25 = 19.53 mV.
    const html = renderArithmetic([finding("offset", "pass", "", steps)]);
    expect(html).toMatch(/^<details class="steps"><summary>Arithmetic<\/summary>/);
    expect(html).toContain("<caption>offset</caption>");
    expect(html).toContain('<th scope="row">one ADC step = V_ref / 2^bits / k</th><td class="num">19.5 mV</td>');
  });

  it("keeps only the rules a part does not pass when asked, and writes nothing when none has steps", () => {
    const both = [finding("offset", "pass", "", steps), finding("slew-rate", "fail", "", steps)];
    const failing = renderArithmetic(both, { failing: true });
    expect(failing).toContain("<summary>Arithmetic of the rules it does not pass</summary>");
    expect(failing).toContain("<caption>slew-rate</caption>");
    expect(failing).not.toContain("<caption>offset</caption>");
    expect(renderArithmetic([finding("offset", "pass", "", steps)], { failing: true })).toBe("");
    expect(renderArithmetic([finding("offset", "fail", "")])).toBe("");
  });
});

describe("renderRejectionReasons", () => {
  it("says a single reason as a line and several as a list, leaving out what passes or is only marginal", () => {
    expect(
      renderRejectionReasons([finding("offset", "pass", "ok"), finding("slew-rate", "fail", "0.1 V/µs short")]),
    ).toBe("slew-rate: 0.1 V/µs short");
    expect(
      renderRejectionReasons([
        finding("supply-range", "marginal", "0.05 V to spare"),
        finding("phase-reversal", "unrated", "needs 'phase_reversal', which is empty"),
        finding("offset", "fail", "adds <1 mV> too much"),
      ]),
    ).toBe(
      `<ul class="reasons"><li>phase-reversal: needs &#39;phase_reversal&#39;, which is empty</li><li>offset: adds &lt;1 mV&gt; too much</li></ul>`,
    );
  });
});

describe("renderPassedRules", () => {
  it("names the rules passed, in order, and says nothing when none is", () => {
    expect(
      renderPassedRules([
        finding("supply-range", "pass", ""),
        finding("offset", "fail", ""),
        finding("slew-rate", "pass", ""),
        finding("bandwidth", "marginal", ""),
        finding("zero-crossing", "pass", ""),
      ]),
    ).toBe('<p class="passes">It passes supply-range, slew-rate and zero-crossing.</p>');
    expect(renderPassedRules([finding("offset", "pass", "")])).toBe('<p class="passes">It passes offset.</p>');
    expect(renderPassedRules([finding("offset", "fail", "")])).toBe("");
  });
});
