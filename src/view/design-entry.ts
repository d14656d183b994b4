// One design as the site sees it: the cleaned file and its one evaluation.
import type { Evaluation } from "../core/engine/result.ts";
import type { Design } from "../core/schemas/design.ts";

export type DesignEntry = { id: string; file: string; design: Design; evaluation: Evaluation };
