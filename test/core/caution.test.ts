// SPEC §9/§12.4: the caution shows when the signal or the stated fault passes the
// project's 30 V extra-low-voltage line (the line the guide has always used).
import { describe, expect, it } from "vitest";
import { highestInputV, needsCaution } from "../../src/core/caution.ts";
import { design } from "../helpers/designs.ts";

describe("needsCaution", () => {
  it("a 2.5 V signal with no fault stated needs none", () => {
    expect(needsCaution(design())).toBe(false);
  });
  it("a 2.5 V signal whose input may see a 48 V fault needs it", () => {
    const d = design({ signal: { fault_v: 48 } });
    expect(highestInputV(d)).toBe(48);
    expect(needsCaution(d)).toBe(true);
  });
  it("a 24 V fault stays under the line", () => {
    expect(needsCaution(design({ signal: { fault_v: 24 } }))).toBe(false);
  });
});
