// The visitor's design as a design file (SPEC §5), ready to drop into
// data/designs/<id>.json: keys in the order the spec shows them, numbers in SI
// units, the policy only as far as the visitor overrode it, the BOM only when
// it names a part. Nothing of the results goes in.
import type { Problem } from "../../core/problems.ts";
import type { Design } from "../../core/schemas/design.ts";
import { checkDraft, policyOverrides } from "./draft.ts";
import type { Draft } from "./fields.ts";

export type DesignFileOut = { ok: true; name: string; text: string } | { ok: false; problems: Problem[] };

/** The file object for a cleaned design; `overrides` lists the policy keys to write. */
export function designFileObject(design: Design, overrides: readonly string[]): Record<string, unknown> {
  const policy = Object.fromEntries(Object.entries(design.policy).filter(([key]) => overrides.includes(key)));
  const bom = Object.fromEntries(Object.entries(design.bom).filter(([, id]) => id !== undefined));
  return {
    id: design.id,
    title: design.title,
    topology: design.topology,
    supply: { positive_v: design.supply.positive_v, negative: design.supply.negative },
    signal: design.signal,
    front_end: design.front_end,
    adc: design.adc,
    logic: design.logic,
    accuracy: design.accuracy,
    temperature: design.temperature,
    policy,
    ...(Object.keys(bom).length > 0 ? { bom } : {}),
  };
}

export function designFileText(design: Design, overrides: readonly string[]): string {
  return `${JSON.stringify(designFileObject(design, overrides), null, 2)}\n`;
}

/** The file for what the form holds, or the problems that stop it being written. */
export function designFileFromDraft(draft: Readonly<Draft>): DesignFileOut {
  const checked = checkDraft(draft);
  if (!checked.design) return { ok: false, problems: checked.problems };
  return { ok: true, name: `${checked.design.id}.json`, text: designFileText(checked.design, policyOverrides(draft)) };
}
