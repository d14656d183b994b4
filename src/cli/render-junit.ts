// `check --format junit`: the JUnit-style XML that CI test-report views read.
// Each design is a suite; each role, each BOM part and the accuracy budget is
// a case. A failure carries the deciding reason in its message and every
// reason that is not a pass in its body. Marginal stays a pass (as the exit
// status does) and says so in the case's output, unless --strict.
import type { PartResult } from "../core/engine/evaluate-part.ts";
import { isFitResult } from "../core/engine/evaluate-part.ts";
import type { DesignResult, RoleResult } from "../core/engine/result.ts";
import { formatSI } from "../core/units.ts";
import { decidingFinding } from "../view/deciding.ts";
import { designState } from "./design-state.ts";
import { xmlAttr, xmlText } from "./formats/xml.ts";
import { findingLabel } from "./finding-label.ts";
import { noFit } from "./summary.ts";

type Outcome =
  | { kind: "pass"; output?: string }
  | { kind: "failure"; message: string; body: string }
  | { kind: "skipped"; message: string };
type Case = { name: string; outcome: Outcome };

const lines = (p: PartResult) =>
  p.findings
    .filter((f) => f.verdict !== "pass")
    .map((f) => `${findingLabel(f)}: ${f.verdict}: ${f.reason}`)
    .join("\n");

function roleCase(role: RoleResult): Case {
  const total = role.fitCount + role.rejected.length;
  const name = `role ${role.role} has a fit`;
  if (role.fitCount === 0) {
    if (role.optional && role.bom === undefined)
      return {
        name,
        outcome: { kind: "skipped", message: `optional role: no part fits and none is named in the BOM` },
      };
    const closest = role.rejected[0];
    return {
      name,
      outcome: { kind: "failure", message: noFit(role), body: closest ? `${closest.part.id}:\n${lines(closest)}` : "" },
    };
  }
  const best = role.fits[0];
  return {
    name,
    outcome: {
      kind: "pass",
      output: `${role.label}: ${role.fitCount} of ${total} parts fit; best ${best?.part.id ?? "?"} (${best?.verdict ?? "?"})`,
    },
  };
}

function bomCase(role: RoleResult, id: string): Case {
  const name = `BOM part ${id} fits the ${role.role}`;
  const p = role.resultOf(id);
  if (!p)
    return { name, outcome: { kind: "failure", message: `${id} is no candidate for the ${role.role}`, body: "" } };
  if (!isFitResult(p)) {
    const f = decidingFinding(p);
    return {
      name,
      outcome: {
        kind: "failure",
        message: f ? `${p.verdict}: ${findingLabel(f)}: ${f.reason}` : p.verdict,
        body: lines(p),
      },
    };
  }
  return { name, outcome: { kind: "pass", output: p.verdict === "marginal" ? `marginal:\n${lines(p)}` : "pass" } };
}

function budgetCase(r: DesignResult, strict: boolean): Case {
  const b = r.budget;
  const name = "accuracy budget fits the requirement";
  const sums = `worst case ${formatSI(b.worst_case_v, "V")}, root-sum-square ${formatSI(b.rss_v, "V")}, required ${formatSI(b.required_v, "V")}`;
  const terms = b.terms.map((t) => `${t.label}: ${formatSI(t.v, "V")}`).join("\n");
  if (b.missing.length > 0)
    return {
      name,
      outcome: { kind: "failure", message: `incomplete: no part for ${b.missing.join(", ")}`, body: terms },
    };
  if (b.verdict === "fail" || (strict && b.verdict === "marginal"))
    return { name, outcome: { kind: "failure", message: `${b.verdict}: ${sums}`, body: terms } };
  return { name, outcome: { kind: "pass", output: `${b.verdict}: ${sums}` } };
}

export function designCases(r: DesignResult, strict = false): Case[] {
  const cases: Case[] = [];
  for (const role of r.roles) {
    cases.push(roleCase(role));
    if (role.bom !== undefined) cases.push(bomCase(role, role.bom));
  }
  cases.push(budgetCase(r, strict));
  return cases;
}

function caseXml(suite: string, c: Case): string {
  const open = `    <testcase classname="${xmlAttr(suite)}" name="${xmlAttr(c.name)}" time="0"`;
  const o = c.outcome;
  if (o.kind === "skipped") return `${open}>\n      <skipped message="${xmlAttr(o.message)}"/>\n    </testcase>`;
  if (o.kind === "failure")
    return `${open}>\n      <failure message="${xmlAttr(o.message)}" type="railsieve">${xmlText(o.body)}</failure>\n    </testcase>`;
  return o.output === undefined
    ? `${open}/>`
    : `${open}>\n      <system-out>${xmlText(o.output)}</system-out>\n    </testcase>`;
}

export function renderJunit(results: readonly DesignResult[], strict = false): string {
  const suites: string[] = [];
  let tests = 0;
  let failures = 0;
  let skipped = 0;
  for (const r of results) {
    const cases = designCases(r, strict);
    const f = cases.filter((c) => c.outcome.kind === "failure").length;
    const s = cases.filter((c) => c.outcome.kind === "skipped").length;
    tests += cases.length;
    failures += f;
    skipped += s;
    const { state } = designState(r);
    const id = r.design.id;
    suites.push(
      [
        `  <testsuite name="${xmlAttr(id)}" tests="${cases.length}" failures="${f}" errors="0" skipped="${s}" time="0">`,
        "    <properties>",
        `      <property name="title" value="${xmlAttr(r.design.title)}"/>`,
        `      <property name="topology" value="${xmlAttr(r.topology)}"/>`,
        `      <property name="verdict" value="${state}"/>`,
        "    </properties>",
        ...cases.map((c) => caseXml(id, c)),
        "  </testsuite>",
      ].join("\n"),
    );
  }
  return [
    '<?xml version="1.0" encoding="UTF-8"?>',
    `<testsuites name="railsieve check" tests="${tests}" failures="${failures}" errors="0" skipped="${skipped}" time="0">`,
    ...suites,
    "</testsuites>",
    "",
  ].join("\n");
}
