// Cross-column checks shared by op amps and comparators.
type Ctx = { addIssue: (issue: { code: "custom"; path: string[]; message: string }) => void };

type SupplyRow = {
  supply_min_v: number;
  supply_max_v: number;
  icm_neg_headroom_v: number;
  icm_pos_headroom_v: number;
  out_neg_headroom_v?: number | undefined;
  out_pos_headroom_v?: number | undefined;
};

export function checkSupplyAndHeadroom(row: SupplyRow, ctx: Ctx): void {
  if (row.supply_min_v > row.supply_max_v) {
    ctx.addIssue({
      code: "custom",
      path: ["supply_min_v"],
      message: `minimum supply is above the maximum (got ${row.supply_min_v} V > ${row.supply_max_v} V, expected supply_min_v ≤ supply_max_v)`,
    });
  }
  checkPair(row.icm_neg_headroom_v, row.icm_pos_headroom_v, row.supply_max_v, "icm", "input", ctx);
  if (row.out_neg_headroom_v !== undefined && row.out_pos_headroom_v !== undefined) {
    checkPair(row.out_neg_headroom_v, row.out_pos_headroom_v, row.supply_max_v, "out", "output", ctx);
  }
}

function checkPair(neg: number, pos: number, supplyMax: number, prefix: string, what: string, ctx: Ctx): void {
  const used = neg + pos;
  if (used < supplyMax) return;
  ctx.addIssue({
    code: "custom",
    path: [`${prefix}_pos_headroom_v`],
    message: `${what} headroom leaves no room inside the supply (got ${neg} V + ${pos} V = ${round(used)} V, expected less than supply_max_v ${supplyMax} V)`,
  });
}

function round(v: number): number {
  return Math.round(v * 1e6) / 1e6;
}

export function checkPushPullLevels(
  row: { output: string; out_neg_headroom_v?: number | undefined; out_pos_headroom_v?: number | undefined },
  ctx: Ctx,
): void {
  if (row.output !== "push-pull") return;
  for (const column of ["out_neg_headroom_v", "out_pos_headroom_v"] as const) {
    if (row[column] === undefined) {
      ctx.addIssue({
        code: "custom",
        path: [column],
        message:
          "required value is missing for a push-pull output (got '', expected a number such as 0.5, 500m or 2.2k)",
      });
    }
  }
}
