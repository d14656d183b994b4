// A Vite plugin for the browser's build only: the try page runs every rule and
// topology, but never shows what the rules page prints of them (a rule's
// `checks`, `formula` and `source`, a topology's `description` and `reading`).
// That text is a fifth of the try page's first download, so the browser's copy
// of each rule and topology module gets a short pointer in its place. The
// rules page, the design pages and the CLI are built from the sources as they are.
// Only the object literal handed to defineRule / defineTopology is touched, and
// only those keys; test/build/strip-docs.test.ts checks both.
import ts from "typescript";
import type { Plugin } from "vite";

const DOC_KEYS: Readonly<Record<string, readonly string[]>> = {
  defineRule: ["checks", "formula", "source"],
  defineTopology: ["description", "reading"],
};

/** What stands in for the text in the browser's copy: it points to where the text is, should it ever be shown. */
export const DOC_STUB = "(see the rules page)";

const MODULES = /\/(?:rules|src\/topologies)\/[^/]+\.ts$/;

/** The module's source with the documentation strings of its defineRule / defineTopology calls replaced. */
export function stripDocs(code: string, file = "module.ts"): string {
  const source = ts.createSourceFile(file, code, ts.ScriptTarget.Latest, true, ts.ScriptKind.TS);
  const cuts: { start: number; end: number }[] = [];
  const visit = (node: ts.Node): void => {
    if (ts.isCallExpression(node) && ts.isIdentifier(node.expression)) {
      const keys = DOC_KEYS[node.expression.text];
      const arg = node.arguments[0];
      if (keys && arg && ts.isObjectLiteralExpression(arg)) {
        for (const p of arg.properties) {
          if (ts.isPropertyAssignment(p) && ts.isIdentifier(p.name) && keys.includes(p.name.text)) {
            cuts.push({ start: p.initializer.getStart(source), end: p.initializer.getEnd() });
          }
        }
      }
    }
    ts.forEachChild(node, visit);
  };
  visit(source);
  let out = code;
  for (const { start, end } of cuts.sort((a, b) => b.start - a.start)) {
    out = `${out.slice(0, start)}${JSON.stringify(DOC_STUB)}${out.slice(end)}`;
  }
  return out;
}

export function stripDocsPlugin(): Plugin {
  return {
    name: "railsieve-strip-docs",
    enforce: "pre",
    transform(code, id) {
      if (this.environment.name !== "client" || !MODULES.test(id.split("?")[0] ?? "")) return undefined;
      return { code: stripDocs(code, id), map: null };
    },
  };
}
