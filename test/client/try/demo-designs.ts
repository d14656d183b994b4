// The demo design files as written (data/designs), for round-trip tests.
import { readdirSync, readFileSync } from "node:fs";
import { join, resolve } from "node:path";

const DIR = resolve(import.meta.dirname, "../../../data/designs");

export const DEMO_DESIGNS: { file: string; raw: unknown }[] = readdirSync(DIR)
  .filter((f) => f.endsWith(".json"))
  .sort()
  .map((file) => ({ file, raw: JSON.parse(readFileSync(join(DIR, file), "utf8")) as unknown }));
