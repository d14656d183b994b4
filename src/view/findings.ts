// Findings as HTML strings: every rule's reason in a table, the arithmetic
// behind them, and the short list of what rejects a part. Strings, not Astro
// components: a 2,000-part catalogue puts tens of thousands of these in one
// build, and a component per row cost more than the text it wrote.
import type { Finding } from "../core/engine/types.ts";
import { formatQuantity } from "../core/units.ts";
import { escapeHtml } from "./escape.ts";
import { renderVerdict } from "./verdict.ts";

/** Where a rule is explained (the rules page, under the site's base path). */
export type RuleHref = (rule: string) => string;

export function renderRuleLink(rule: string, ruleHref: RuleHref): string {
  return `<a href="${escapeHtml(ruleHref(rule))}">${escapeHtml(rule)}</a>`;
}

/** One row per rule: its name, verdict and the sentence with the numbers. */
export function renderFindingsTable(findings: readonly Finding[], label: string, ruleHref: RuleHref): string {
  const rows = findings.map(
    (f) =>
      `<tr><th scope="row">${renderRuleLink(f.rule, ruleHref)}</th><td class="verdict-cell">${renderVerdict(f.verdict)}</td><td>${escapeHtml(f.reason)}</td></tr>`,
  );
  return `<table class="findings" aria-label="${escapeHtml(label)}"><thead><tr><th scope="col">Rule</th><th scope="col">Verdict</th><th scope="col">Reason</th></tr></thead><tbody>${rows.join("")}</tbody></table>`;
}

// Step values print as SI with a prefix, volts included ("19.5 mV"), unlike reasons' fixed 0.00 V.
const stepValue = (value: number, unit: string) => formatQuantity(value, unit === "V" ? "V-prefixed" : unit);

/**
 * Each rule's arithmetic as a small table, in a closed <details>; empty when no
 * rule has steps. `failing` keeps the rules the part does not pass: a rejection
 * is argued by them, and a part page repeats this for every role of every design.
 */
export function renderArithmetic(findings: readonly Finding[], { failing = false } = {}): string {
  const tables = findings
    .filter((f) => f.steps.length > 0 && (!failing || f.verdict !== "pass"))
    .map((f) => {
      const rows = f.steps.map(
        (s) =>
          `<tr><th scope="row">${escapeHtml(s.label)}</th><td class="num">${escapeHtml(stepValue(s.value, s.unit))}</td></tr>`,
      );
      const rule = escapeHtml(f.rule);
      return `<table aria-label="${rule}: arithmetic"><caption>${rule}</caption><tbody>${rows.join("")}</tbody></table>`;
    });
  if (tables.length === 0) return "";
  const summary = failing ? "Arithmetic of the rules it does not pass" : "Arithmetic";
  return `<details class="steps"><summary>${summary}</summary>${tables.join("")}</details>`;
}

/**
 * What rejects a part, one line per failing or unrated finding: rule name and
 * sentence, no link (the role lists its rules with links once, above).
 */
export function renderRejectionReasons(findings: readonly Finding[]): string {
  const blocking = findings.filter((f) => f.verdict === "fail" || f.verdict === "unrated");
  // allow_unrated turns an unrated part into a marginal fit, so a rejection always has one; this is a guard.
  const open = blocking.length > 0 ? blocking : findings.filter((f) => f.verdict !== "pass");
  const line = (f: Finding) => `${escapeHtml(f.rule)}: ${escapeHtml(f.reason)}`;
  if (open.length === 1 && open[0]) return line(open[0]);
  return `<ul class="reasons">${open.map((f) => `<li>${line(f)}</li>`).join("")}</ul>`;
}

/** "It passes supply-range, offset and slew-rate.": the rules a rejection is not about, by name. */
export function renderPassedRules(findings: readonly Finding[]): string {
  const names = findings.filter((f) => f.verdict === "pass").map((f) => escapeHtml(f.rule));
  if (names.length === 0) return "";
  const list = names.length === 1 ? names[0] : `${names.slice(0, -1).join(", ")} and ${names[names.length - 1]}`;
  return `<p class="passes">It passes ${list}.</p>`;
}
