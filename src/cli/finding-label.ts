// A finding's name in reports: its rule, and in a role of several stages
// (the two-stage rectifier) the stage it is about.
export function findingLabel(f: { rule: string; stage?: string }): string {
  return f.stage === undefined ? f.rule : `${f.rule} (${f.stage})`;
}
