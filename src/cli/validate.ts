// `railsieve validate`: every problem of the data folder, or a one-line summary.
import { loadDataSet } from "../node/load-data.ts";
import type { Io } from "./io.ts";
import { renderProblems } from "./load.ts";

export function runValidate(data: string, io: Io): number {
  const { catalogue, designs, problems } = loadDataSet(data);
  if (problems.length > 0) {
    io.err(renderProblems(problems).replace("nothing was checked", "the data is not valid"));
    return 2;
  }
  const count = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;
  io.out(
    `valid: ${count(catalogue.opAmps.length, "op amp", "op amps")}, ${count(catalogue.comparators.length, "comparator", "comparators")}, ${count(catalogue.diodes.length, "diode", "diodes")}, ${count(designs.length, "design", "designs")}\n`,
  );
  return 0;
}
