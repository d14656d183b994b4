// The engine: one design against one catalogue, over the topologies it is
// given. It knows no topology, role or rule by name; src/engine.ts hands it
// the registries. Pure.
import type { Catalogue, Part } from "../catalogue-index.ts";
import { kindsThatCan, kindWords, type PartKind } from "../kinds.ts";
import type { Rails, Stage } from "../rule-kit/types.ts";
import type { Design, DesignShape, Role } from "../schemas/design.ts";
import { buildBudget } from "./budget.ts";
import { compare } from "./compare.ts";
import { designVerdict } from "./design-verdict.ts";
import type { DesignProblem, DesignResult, Evaluation, RoleResult } from "./result.ts";
import { runRole, type RoleSpec } from "./run-role.ts";
import type { RoleCondition, RoleDef, StagePlan, TopologyDef } from "./topology.ts";

/** The pseudo-topology that compares every registered one side by side. */
export const ALL_TOPOLOGIES = "all";

export type Engine = {
  readonly topologies: readonly TopologyDef[];
  /** Registered ids, then "all". */
  readonly topologyIds: readonly string[];
  /** Every role of every topology, first definition of each id (registry order). */
  readonly roles: readonly RoleDef[];
  topology(id: string): TopologyDef | undefined;
  /** The topology a design is evaluated in when it asks for "all" alone: the first registered. */
  rolesOf(design: Design, topology?: string): Role[];
  /** Kinds that can fill a role, the ones made for it first. */
  kindsOf(role: RoleDef): PartKind[];
  checkBom(design: Design, catalogue: Catalogue, topologies?: readonly string[]): DesignProblem[];
  evaluateDesign(design: Design, catalogue: Catalogue, override?: string): Evaluation;
};

/** A design's value at a dot path, as text (what a form holds and what a condition compares). */
export function valueAt(design: unknown, path: string): string | undefined {
  let v: unknown = design;
  for (const key of path.split(".")) {
    if (typeof v !== "object" || v === null) return undefined;
    v = (v as Record<string, unknown>)[key];
  }
  return v === undefined || v === null ? undefined : String(v);
}

/** Whether a role's conditions hold for a value lookup (a Design or a form's draft). */
export function roleApplies(role: Pick<RoleDef, "when">, lookup: (path: string) => string | undefined): boolean {
  return (role.when ?? []).every((c: RoleCondition) => c.is.includes(lookup(c.path) ?? ""));
}

/**
 * The checks topologies add to the design schema (DesignNames.check): each
 * topology's own, for the topologies `among` gives for a design (the one it
 * names, or every one for "all"), in registry order.
 */
export function topologyDesignChecks(among: (design: DesignShape) => readonly TopologyDef[]) {
  return (design: DesignShape) =>
    among(design)
      .flatMap((t) => t.checkDesign?.(design as Design) ?? [])
      .map((p) => ({ path: p.path.split("."), message: p.message }));
}

/** Checks the registries once: a role's rules must measure every kind that can fill it. */
function checkWiring(topologies: readonly TopologyDef[]): void {
  const ids = new Set<string>();
  for (const t of topologies) {
    if (t.id === ALL_TOPOLOGIES || ids.has(t.id)) throw new Error(`topology id ${t.id} is taken`);
    ids.add(t.id);
    for (const role of t.roles) {
      const kinds = kindsThatCan(role.wants);
      for (const rule of role.rules) {
        const missing = kinds.filter((k) => !(rule.kinds as readonly string[]).includes(k));
        if (missing.length > 0) {
          throw new Error(
            `topology ${t.id}, role ${role.id}: rule ${rule.id} does not measure ${missing.join(", ")}, which can ${role.wants}`,
          );
        }
      }
    }
  }
}

export function createEngine(topologies: readonly TopologyDef[]): Engine {
  checkWiring(topologies);
  const byId = new Map(topologies.map((t) => [t.id, t]));
  const first = topologies[0];
  if (!first) throw new Error("the engine needs at least one topology");
  const roles: RoleDef[] = [];
  for (const t of topologies) for (const r of t.roles) if (!roles.some((x) => x.id === r.id)) roles.push(r);
  const expand = (t: string): string[] => (t === ALL_TOPOLOGIES ? topologies.map((x) => x.id) : [t]);
  const own = (design: Design) => (design.topology === ALL_TOPOLOGIES ? first.id : design.topology);

  const specOf = (role: RoleDef): RoleSpec => {
    const kinds = kindsThatCan(role.wants);
    return {
      kind: kinds[0] ?? "op-amp",
      kinds,
      label: role.label,
      rules: role.rules,
      ...(role.optional ? { optional: true } : {}),
      ...(role.count !== undefined ? { count: role.count } : {}),
    };
  };

  function rolesOf(design: Design, topology: string = own(design)): Role[] {
    const t = byId.get(topology);
    if (!t) return [];
    return t.roles.filter((r) => roleApplies(r, (p) => valueAt(design, p))).map((r) => r.id);
  }

  function roleDef(id: string, among: readonly string[]): RoleDef | undefined {
    for (const t of among) {
      const r = byId.get(t)?.roles.find((x) => x.id === id);
      if (r) return r;
    }
    return undefined;
  }

  /** BOM entries must name a part of a kind the role takes, for a role the design has. */
  function checkBom(design: Design, catalogue: Catalogue, among: readonly string[] = [own(design)]): DesignProblem[] {
    const problems: DesignProblem[] = [];
    const have = among.flatMap((t) => rolesOf(design, t));
    for (const [role, id] of Object.entries(design.bom) as [Role, string][]) {
      const path = `bom.${role}`;
      const def = roleDef(role, among);
      if (!def || !have.includes(role)) {
        problems.push({
          path,
          message: `role is not used by this design (got '${role}', expected one of ${have.join(", ")})`,
        });
        continue;
      }
      const kinds: readonly string[] = kindsThatCan(def.wants);
      const part = catalogue.byId.get(id);
      const wanted = kindsThatCan(def.wants)
        .map((k) => kindWords(k).a)
        .join(" or ");
      if (!part) {
        const sample = catalogue.parts.find((p) => kinds.includes(p.kind))?.id;
        problems.push({
          path,
          message: `names no part in the catalogue (got '${id}', expected the id of ${wanted}${sample ? ` such as '${sample}'` : ""})`,
        });
      } else if (!kinds.includes(part.kind)) {
        problems.push({
          path,
          message: `names a part of the wrong kind (got '${id}', ${kindWords(part.kind).a}, expected ${wanted})`,
        });
      }
    }
    return problems;
  }

  function evaluateTopology(design: Design, catalogue: Catalogue, t: TopologyDef): Evaluation {
    // A BOM may name roles of several topologies when they are compared; each
    // topology only sees the roles it has.
    const mine = rolesOf(design, t.id);
    const bom = Object.fromEntries(Object.entries(design.bom).filter(([role]) => mine.includes(role)));
    const scoped: Design = { ...design, bom };
    const ran: RoleResult[] = [];
    const role = (id: string, stages: Stage | readonly StagePlan[], rails: Rails): RoleResult => {
      const def = t.roles.find((r) => r.id === id);
      if (!def) throw new Error(`role ${id} is not part of ${t.id}`);
      const candidates: readonly Part[] = catalogue.byCapability[def.wants];
      const result = runRole(scoped, id, specOf(def), stages, rails, candidates);
      // A topology that settles its roles over several passes (a pumped rail carrying its parts) keeps the last.
      const before = ran.findIndex((r) => r.role === id);
      if (before >= 0) ran[before] = result;
      else ran.push(result);
      return result;
    };
    const evaluated = t.evaluate({ design: scoped, catalogue, role });
    if (!evaluated.ok) return evaluated;
    const o = evaluated.outcome;
    const order = t.roles.map((r) => r.id);
    ran.sort((a, b) => order.indexOf(a.role) - order.indexOf(b.role));
    const budget = buildBudget(scoped, {
      fixed: o.terms,
      roleTerms: t.roleTerms,
      roles: ran,
      codesSpannedBits: o.codesSpannedBits,
      ...(o.noise ? { noise: o.noise } : {}),
    });
    const result: DesignResult = {
      design: scoped,
      topology: t.id,
      derived: o.derived,
      display: o.display,
      roles: ran,
      notes: o.notes,
      budget,
      verdict: designVerdict(ran, budget),
      conversion: o.conversion,
    };
    return { ok: true, result };
  }

  /**
   * Evaluates a design in its own topology, or in `override` when given. For
   * "all" the result is the recommended topology's, with `comparison` holding every one.
   */
  function evaluateDesign(design: Design, catalogue: Catalogue, override?: string): Evaluation {
    const topology = override ?? design.topology;
    // The BOM is checked against the topologies the design file names; a
    // topology asked for on the command line just ignores the roles it lacks.
    const among = [...new Set([...expand(design.topology), ...expand(topology)])];
    const problems = checkBom(design, catalogue, among);
    if (problems.length > 0) return { ok: false, problems };
    if (topology !== ALL_TOPOLOGIES) {
      const t = byId.get(topology);
      if (!t) return { ok: false, problems: [{ path: "topology", message: `unknown topology (got '${topology}')` }] };
      return evaluateTopology(design, catalogue, t);
    }
    // Topologies that cannot serve this design (a single-ended front end for a
    // differential source) are left out of the comparison, with the reason.
    const skipped: { topology: string; reason: string }[] = [];
    const applicable = topologies.filter((t) => {
      const why = t.appliesTo?.(design) ?? null;
      if (why !== null) skipped.push({ topology: t.id, reason: why });
      return why === null;
    });
    if (applicable.length === 0) {
      return {
        ok: false,
        problems: [
          {
            path: "topology",
            message: `no topology serves this design (${skipped.map((s) => `${s.topology}: ${s.reason}`).join("; ")})`,
          },
        ],
      };
    }
    const evaluations = applicable.map((t) => evaluateTopology(design, catalogue, t));
    const failed = evaluations.flatMap((e) => (e.ok ? [] : e.problems));
    if (failed.length > 0) return { ok: false, problems: failed };
    const results = evaluations.flatMap((e) => (e.ok ? [e.result] : []));
    const comparison = { ...compare(results, catalogue), ...(skipped.length > 0 ? { skipped } : {}) };
    const primary = results.find((r) => r.topology === comparison.recommended) ?? results[0];
    if (!primary) throw new Error("no topology evaluated");
    return { ok: true, result: { ...primary, comparison } };
  }

  return {
    topologies,
    topologyIds: [...topologies.map((t) => t.id), ALL_TOPOLOGIES],
    roles,
    topology: (id) => byId.get(id),
    rolesOf,
    kindsOf: (role) => kindsThatCan(role.wants),
    checkBom,
    evaluateDesign,
  };
}
