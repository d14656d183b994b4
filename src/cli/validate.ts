// `railsieve validate`: every problem of the data folder, or a one-line summary.
import { KINDS, kindSpec, kindWords } from "../core/kinds.ts";
import { loadDataSet } from "../node/load-data.ts";
import type { Io } from "./io.ts";
import { renderProblems } from "./load.ts";

export function runValidate(data: string, io: Io): number {
  const { catalogue, designs, problems, empty } = loadDataSet(data);
  if (problems.length > 0) {
    io.err(renderProblems(problems).replace("nothing was checked", "the data is not valid"));
    return 2;
  }
  const count = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;
  const kinds = KINDS.map((k) => count(catalogue.byKind[k.kind].length, k.words.one, k.words.many));
  io.out(`valid: ${[...kinds, count(designs.length, "design", "designs")].join(", ")}\n`);
  // Said once: a folder may leave a kind out, and every role that needs one then has no fit.
  if (empty.length > 0) {
    const files = empty.map((k) => kindSpec(k).file).join(", ");
    const many = empty.map((k) => kindWords(k).many).join(", ");
    io.out(`note: no ${files} in this folder, so it has no ${many}\n`);
  }
  return 0;
}
