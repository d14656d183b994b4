// One design result through the simulator: the topology's chain builder (its
// `simulation` hook) makes the chain, both frequencies run, and the report
// compares the larger error with the static budget's worst case.
import type { Catalogue } from "../catalogue-index.ts";
import type { DesignResult } from "./result.ts";
import type { Chain, ChainBuild } from "../sim/chain.ts";
import { reportOf, type SimulationReport } from "../sim/report.ts";
import { simulateChain, type ChainRun } from "../sim/simulate.ts";

export type ChainBuilder = (result: DesignResult, catalogue: Catalogue) => ChainBuild;

export type DesignSimulation =
  | {
      ran: true;
      topology: string;
      chain: Chain;
      parts: Record<string, string>;
      run: ChainRun;
      report: SimulationReport;
    }
  | { ran: false; topology: string; reason: string };

export function simulateResult(
  result: DesignResult,
  catalogue: Catalogue,
  builder: ChainBuilder | undefined,
): DesignSimulation {
  const topology = result.topology;
  if (!builder) return { ran: false, topology, reason: `topology ${topology} has no simulation model yet` };
  const built = builder(result, catalogue);
  if (!built.ok) return { ran: false, topology, reason: built.reason };
  const run = simulateChain(built.chain, result.design.signal.max_frequency_hz);
  const worst = result.budget.missing.length > 0 ? null : result.budget.worst_case_v;
  return { ran: true, topology, chain: built.chain, parts: built.parts, run, report: reportOf(topology, run, worst) };
}
