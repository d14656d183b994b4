// Runs the CLI in-process and captures what it prints.
import { main } from "../../src/cli/main.ts";

export async function run(...argv: string[]): Promise<{ code: number; out: string; err: string }> {
  let out = "";
  let err = "";
  const code = await main(argv, { out: (t) => (out += t), err: (t) => (err += t), color: false });
  return { code, out, err };
}
