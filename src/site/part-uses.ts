// Where one part class stands in every design: the matrix on its part page.
import type { Part } from "../core/catalogue.ts";
import type { Verdict } from "../core/engine/types.ts";
import type { Role } from "../core/schemas/design.ts";
import { decidingFinding } from "./deciding.ts";
import type { DesignEntry } from "./design-entry.ts";
import { rolesTaking } from "./roles.ts";

export type UseCell =
  | { state: "unused" }
  | {
      state: "fit" | "rejected";
      verdict: Verdict;
      /** 1-based place among the role's fits; only for fits. */
      rank?: number;
      fits: number;
      /** Rule and sentence that decide the verdict (deciding.ts); absent for a clean pass. */
      rule?: string;
      reason?: string;
      bom: boolean;
      chosen: boolean;
    };

export type UseRow = { id: string; title: string; problems?: string[]; cells: { role: Role; cell: UseCell }[] };

export type PartUses = { roles: Role[]; rows: UseRow[] };

export function partUses(part: Part, designs: readonly DesignEntry[]): PartUses {
  const roles = rolesTaking(part.kind);
  const rows = designs.map((entry): UseRow => {
    const base = { id: entry.id, title: entry.design.title };
    if (!entry.evaluation.ok)
      return { ...base, problems: entry.evaluation.problems.map((p) => `${p.path}: ${p.message}`), cells: [] };
    const result = entry.evaluation.result;
    const cells = roles.map((role) => {
      const r = result.roles.find((x) => x.role === role);
      if (!r) return { role, cell: { state: "unused" } as UseCell };
      const fitIndex = r.fits.findIndex((p) => p.part.id === part.id);
      const found = fitIndex >= 0 ? r.fits[fitIndex] : r.rejected.find((p) => p.part.id === part.id);
      if (!found) return { role, cell: { state: "unused" } as UseCell };
      const first = decidingFinding(found);
      const cell: UseCell = {
        state: fitIndex >= 0 ? "fit" : "rejected",
        verdict: found.verdict,
        fits: r.fits.length,
        ...(fitIndex >= 0 ? { rank: fitIndex + 1 } : {}),
        ...(first ? { rule: first.rule, reason: first.reason } : {}),
        bom: found.bom,
        chosen: r.chosen === part.id,
      };
      return { role, cell };
    });
    return { ...base, cells };
  });
  return { roles, rows };
}
