// The allowed directions between the project's layers (`npm run deps`, in CI).
// Each layer may use the ones before it, never the ones after:
//   src/core (and its rule kit) ← rules/ ← src/topologies ← src/engine.ts, src/simulation.ts
//   ← src/view ← src/node, src/build, src/cli, src/client, src/components, src/pages
// and nothing may form a cycle, between files or between folders. The pure layers
// (core, rules, topologies, composition, view) import nothing from Node.
// Tests, benchmarks and scripts use whatever they test.

const CORE = "^src/core/";
const RULES = "^rules/";
const TOPOLOGIES = "^src/topologies/";
const COMPOSITION = "^src/(engine|simulation)[.]ts$";
const VIEW = "^src/view/";
const NODE = "^src/node/";
const BUILD = "^src/build/";
const CLI = "^src/cli/";
const CLIENT = "^src/client/";
const ASTRO = "^src/(pages|components)/";

/** One rule per layer: what it may not reach. */
const layer = (name, from, forbidden, comment) => ({
  name,
  comment,
  severity: "error",
  from: { path: from },
  to: { path: forbidden },
});

/** @type {import('dependency-cruiser').IConfiguration} */
export default {
  forbidden: [
    {
      name: "no-file-cycles",
      comment: "A module may not (even indirectly) import itself: split the shared part out.",
      severity: "error",
      from: {},
      to: { circular: true },
    },
    {
      name: "no-folder-cycles",
      comment: "Two folders may not import each other (directly or through others).",
      severity: "error",
      scope: "folder",
      from: {},
      to: { circular: true },
    },
    layer(
      "core-stays-at-the-bottom",
      CORE,
      [RULES, TOPOLOGIES, COMPOSITION, VIEW, NODE, BUILD, CLI, CLIENT, ASTRO],
      "src/core is the base every other layer builds on; it imports none of them (the engine receives its rules).",
    ),
    layer(
      "rules-use-only-core",
      RULES,
      [TOPOLOGIES, COMPOSITION, VIEW, NODE, BUILD, CLI, CLIENT, ASTRO],
      "A rule depends on the rule kit and src/core's pure helpers only.",
    ),
    layer(
      "topologies-below-composition",
      TOPOLOGIES,
      [COMPOSITION, VIEW, NODE, BUILD, CLI, CLIENT, ASTRO],
      "A topology declares roles, rules and values; it does not know who shows them.",
    ),
    layer(
      "composition-below-view",
      COMPOSITION,
      [VIEW, NODE, BUILD, CLI, CLIENT, ASTRO],
      "src/engine.ts and src/simulation.ts hand the registries to the engine; they show nothing.",
    ),
    layer(
      "view-below-its-users",
      VIEW,
      [NODE, BUILD, CLI, CLIENT, ASTRO],
      "src/view is pure view models and renderers, used by pages, CLI and try page alike.",
    ),
    layer(
      "client-runs-in-the-browser",
      CLIENT,
      [NODE, BUILD, CLI, ASTRO],
      "The browser scripts cannot reach Node-only code or the pages.",
    ),
    layer("cli-not-the-site", CLI, [CLIENT, ASTRO, BUILD], "The command line uses the view layer, not the site."),
    layer(
      "node-below-its-users",
      NODE,
      [BUILD, CLI, CLIENT, ASTRO],
      "src/node reads files for the CLI and the build; it does not know them.",
    ),
    {
      name: "pure-layers-use-no-node",
      comment: "core, rules, topologies, the composition and view run in the browser too: no Node built-ins.",
      severity: "error",
      from: { path: [CORE, RULES, TOPOLOGIES, COMPOSITION, VIEW, CLIENT] },
      to: { dependencyTypes: ["core"] },
    },
    {
      name: "not-to-unresolvable",
      comment: "An import that resolves to nothing is a typo or a missing dependency.",
      severity: "error",
      from: {},
      to: { couldNotResolve: true, pathNot: "^astro:" },
    },
  ],
  options: {
    doNotFollow: { path: "node_modules" },
    exclude: { path: ["^node_modules", "^dist", "^[.]astro", "^[.]fixtures", "^test/fixtures"] },
    tsPreCompilationDeps: true,
    tsConfig: { fileName: "tsconfig.json" },
    enhancedResolveOptions: {
      exportsFields: ["exports"],
      conditionNames: ["import", "require", "node", "default", "types"],
      extensions: [".ts", ".mjs", ".js", ".astro", ".d.ts"],
    },
    reporterOptions: { text: { highlightFocused: true } },
  },
};
