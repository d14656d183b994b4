// `railsieve explain PART-ID DESIGN.json`: every rule's arithmetic for one part.
import type { PartResult } from "../core/engine/evaluate-part.ts";
import type { RoleResult } from "../core/engine/result.ts";
import { formatSI } from "../core/units.ts";
import { flag, UsageError, type ParsedArgs } from "./args.ts";
import { evaluateFiles } from "./check.ts";
import { paint, type Io } from "./io.ts";
import { VERDICT_MARK } from "./render-text.ts";
import { wrap } from "./wrap.ts";

export function runExplain(args: ParsedArgs, data: string, io: Io): number {
  const [partId, designPath, ...extra] = args.positional;
  if (partId === undefined || designPath === undefined || extra.length > 0) {
    throw new UsageError("explain needs a part id and one design file");
  }
  const [result] = evaluateFiles({ ...args, positional: [designPath] }, data);
  if (!result) return 2;
  const wanted = flag(args, "role");
  const roles = result.roles.filter((r) => wanted === undefined || r.role === wanted);
  if (wanted !== undefined && roles.length === 0) {
    throw new UsageError(
      `design ${result.design.id} has no role '${wanted}' (expected one of ${result.roles.map((r) => r.role).join(", ")})`,
    );
  }
  const entries = roles.flatMap((role) => {
    const p = [...role.fits, ...role.rejected].find((x) => x.part.id === partId);
    return p ? [{ role, p }] : [];
  });
  if (entries.length === 0) {
    const anywhere = result.roles.some((r) => [...r.fits, ...r.rejected].some((x) => x.part.id === partId));
    throw new UsageError(
      anywhere
        ? `part '${partId}' does not serve the role '${wanted}' in ${result.design.id}`
        : `no part '${partId}' in the catalogue takes a role in ${result.design.id} (check the id with 'railsieve validate')`,
    );
  }
  io.out(entries.map(({ role, p }) => renderExplain(role, p, io)).join("\n"));
  return entries.every(({ p }) => p.verdict === "pass" || p.verdict === "marginal") ? 0 : 1;
}

export function renderExplain(role: RoleResult, p: PartResult, io: Pick<Io, "color">): string {
  const lines = [
    paint(io, "bold", `${p.part.id} as ${role.role} (${role.label})`),
    `  ${p.part.name}`,
    `  verdict: ${paint(io, p.verdict, p.verdict)}`,
  ];
  for (const f of p.findings) {
    lines.push("", `  ${VERDICT_MARK[f.verdict]} ${paint(io, f.verdict, f.rule)}: ${f.verdict}`);
    for (const s of f.steps) lines.push(`      ${s.label.padEnd(46)} ${formatStep(s.value, s.unit)}`);
    lines.push(wrap(f.reason, 80, "      ", "    → "));
  }
  return `${lines.join("\n")}\n`;
}

function formatStep(value: number, unit: string): string {
  if (unit === "") return String(Number(value.toPrecision(5)));
  if (unit === "V/s") return formatSI(value / 1e6, "V/µs", { digits: 4 });
  return formatSI(value, unit, { digits: 4 });
}
