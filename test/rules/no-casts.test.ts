// A rule receives the part type its kinds declare (issue 14): a type assertion
// in rules/ would hide a wrong kind from the compiler, so none is allowed.
// Read with the TypeScript parser, so words like "as" in strings do not count.
import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";
import ts from "typescript";
import { describe, expect, it } from "vitest";

const dir = join(import.meta.dirname, "../../rules");

/** Each `x as T`, `<T>x` and `x!` in the source, by line; `as const` narrows a literal and is not a cast. */
function casts(file: string, text: string): string[] {
  const source = ts.createSourceFile(file, text, ts.ScriptTarget.Latest, true);
  const found: string[] = [];
  const visit = (node: ts.Node): void => {
    const isConstAssertion =
      ts.isAsExpression(node) && ts.isTypeReferenceNode(node.type) && node.type.typeName.getText() === "const";
    if ((ts.isAsExpression(node) && !isConstAssertion) || ts.isTypeAssertionExpression(node)) {
      const { line } = source.getLineAndCharacterOfPosition(node.getStart());
      found.push(`${file}:${line + 1}: ${node.getText()}`);
    }
    ts.forEachChild(node, visit);
  };
  visit(source);
  return found;
}

describe("rules/ holds no type assertions", () => {
  const files = readdirSync(dir).filter((f) => f.endsWith(".ts"));
  it("finds the rule files", () => expect(files.length).toBeGreaterThan(10));
  it.each(files)("%s", (file) => {
    expect(casts(file, readFileSync(join(dir, file), "utf8"))).toEqual([]);
  });
  it("would catch one, and not a const assertion or the word in a string", () => {
    expect(casts("x.ts", "const a = s as LeakageStage;")).toEqual(["x.ts:1: s as LeakageStage"]);
    expect(casts("x.ts", "const b = <OpAmp>part;")).toHaveLength(1);
    expect(casts("x.ts", 'const c = [1, 2] as const; const d = "used as a comparator";')).toEqual([]);
  });
});
