// The try page's engine (src/client/try/engine.ts) builds the engine over only
// the topologies a design needs, loaded on demand. It must answer exactly as the
// CLI's engine over the whole registry (src/engine.ts): the same schema problems
// and the same evaluation, for every demo design in every topology and "all".
import { describe, expect, it } from "vitest";
import * as cli from "../../../src/engine.ts";
import * as page from "../../../src/client/try/engine.ts";
import { loadCatalogue } from "../../../src/node/load-data.ts";
import { TOPOLOGY_META } from "../../../src/topologies/meta.ts";
import { DEMO_DESIGNS } from "./demo-designs.ts";
import { DEFAULT_INPUT } from "../../../src/client/try/defaults.ts";

const { catalogue } = loadCatalogue("data");
const TOPOLOGIES = [...TOPOLOGY_META.map((t) => t.id), "all"];

describe("the try page's engine", () => {
  it("names the same topologies and roles as the CLI's", () => {
    expect(page.TOPOLOGY_IDS).toEqual(cli.TOPOLOGY_IDS);
    expect(page.designSchema.def.shape.bom).toBeDefined();
  });

  it("refuses to read or evaluate a design before its topology's module is in, rather than skip its checks", () => {
    // Run first in this file: nothing is loaded yet.
    const raw = { ...(DEMO_DESIGNS[0]!.raw as object), topology: "difference-to-mid" };
    expect(page.areLoaded(["difference-to-mid"])).toBe(false);
    expect(() => page.parseDesignValue("d.json", raw)).toThrow(/topology difference-to-mid is not loaded yet/);
  });

  it("comes with the default design's topology, the one every visit without a link needs", () => {
    expect(page.BUNDLED_TOPOLOGY.id).toBe(DEFAULT_INPUT.topology);
    expect(page.areLoaded([DEFAULT_INPUT.topology])).toBe(true);
  });

  it("loads topologies on demand: every one for all, the named one otherwise, none for an unknown id", async () => {
    expect(page.topologiesFor("all")).toEqual(TOPOLOGY_META.map((t) => t.id));
    expect(page.topologiesFor("offset-to-mid-rail")).toEqual(["offset-to-mid-rail"]);
    expect(page.topologiesFor("no-such")).toEqual([]);
    await page.loadTopologies(["offset-to-mid-rail"]);
    expect(page.areLoaded(["offset-to-mid-rail"])).toBe(true);
    await page.loadTopologies(page.topologiesFor("all"));
    expect(page.areLoaded(page.topologiesFor("all"))).toBe(true);
  });

  it("rejects an unknown topology's load, so the page can say so", async () => {
    await expect(page.loadTopologies(["no-such"])).rejects.toThrow("unknown topology no-such");
  });

  // A held divider (issue 16): rectify-and-sign's window check and the other topologies' refusal
  // come from the topology modules, so the page must give the same problems once they are in.
  it.each([
    ["fits the window", 39000, 13000],
    ["leaves the window", 30000, 13000],
  ] as const)("reads a held divider that %s in every topology as the CLI does", async (_what, r1, r2) => {
    await page.loadTopologies(page.topologiesFor("all"));
    const base = DEMO_DESIGNS[0]!.raw as { signal: object; front_end: object };
    for (const topology of TOPOLOGIES) {
      const input = {
        ...base,
        topology,
        signal: { ...base.signal, peak_v: 10, source_ohm: 1000 },
        front_end: { ...base.front_end, window_v: 2.5, divider_r1_ohm: r1, divider_r2_ohm: r2 },
      };
      const theirs = cli.parseDesignValue("d.json", input);
      expect(page.parseDesignValue("d.json", input), topology).toEqual(theirs);
      const messages = theirs.problems.map((p) => p.message).join("\n");
      // Not vacuous: the checks that come from the modules do fire.
      if (topology === "offset-to-mid-rail") expect(messages).toMatch(/has no R1\/R2 divider to hold/);
      if (topology === "rectify-and-sign" && r1 === 30000) expect(messages).toMatch(/outside the window/);
    }
  });

  describe.each(TOPOLOGIES)("in %s", (topology) => {
    it.each(DEMO_DESIGNS.map((d) => [d.file, d.raw] as const))(
      "%s reads and evaluates as the CLI has it",
      (file, raw) => {
        const input = { ...(raw as object), topology };
        const mine = page.parseDesignValue(file, input);
        const theirs = cli.parseDesignValue(file, input);
        expect(mine).toEqual(theirs);
        if (!theirs.design || !mine.design) return;
        const a = page.evaluateDesign(mine.design, catalogue);
        const b = cli.evaluateDesign(theirs.design, catalogue);
        expect(a.ok).toBe(b.ok);
        expect(JSON.stringify(a)).toBe(JSON.stringify(b));
      },
    );
  });
});
