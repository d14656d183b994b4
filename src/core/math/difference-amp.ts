// The four-resistor difference amplifier with its REF terminal (SPEC §12.2):
// R1 from V−in to the inverting input, R2 from there to the output, R3 from
// V+in to the non-inverting input, R4 from there to REF. Ideal superposition
// (Franco, Design with Operational Amplifiers and Analog Integrated Circuits,
// ch. 2; from memory):
//   out = V+in·R4/(R3+R4)·(1 + R2/R1) + REF·R3/(R3+R4)·(1 + R2/R1) − V−in·R2/R1,
// which with R3 = R1, R4 = R2 is G·(V+in − V−in) + REF, G = R2/R1.
import { seriesValues, type SeriesName } from "./e-series.ts";

export type DifferenceAmp = {
  /** Input resistors (R1 = R3), on the board. */
  r_in_ohm: number;
  /** Feedback and REF resistors (R2 = R4). */
  r_fb_ohm: number;
  /** Source resistance of each leg (bridge arm, series resistor), in series with R1 and R3. */
  source_ohm: number;
  /** G = R2/(R1 + source). */
  gain: number;
};

/** Output of the amplifier for given resistors (a tolerance corner) and inputs. */
export function differenceOut(
  r1: number,
  r2: number,
  r3: number,
  r4: number,
  vPlus: number,
  vMinus: number,
  ref: number,
): number {
  const noise = 1 + r2 / r1;
  return ((vPlus * r4) / (r3 + r4)) * noise + ((ref * r3) / (r3 + r4)) * noise - (vMinus * r2) / r1;
}

/**
 * Worst-case common-mode rejection from resistor tolerance t with the four
 * resistors at their worst corners: CMRR ≈ (1 + G)/(4t) (Franco, ch. 2;
 * textbook, from memory). G = 1, t = 0.1 % gives 500, 54.0 dB.
 */
export function worstCaseCmrr(gain: number, t: number): number {
  return t > 0 ? (1 + gain) / (4 * t) : Infinity;
}

export const toDecibels = (ratio: number) => 20 * Math.log10(ratio);

/** The voltage at the op amp's inputs: (V+in·R4 + REF·R3)/(R3 + R4) with nominal resistors. */
export function pinCommonMode(amp: DifferenceAmp, vPlus: number, ref: number): number {
  const r3 = amp.r_in_ohm + amp.source_ohm;
  return (vPlus * amp.r_fb_ohm + ref * r3) / (r3 + amp.r_fb_ohm);
}

/** The largest G = R2/(R1 + source) not above `target`, R1 near `scaleOhm`; undefined when none is. */
export function chooseDifferenceAmp(
  target: number,
  scaleOhm: number,
  series: SeriesName,
  sourceOhm = 0,
): DifferenceAmp | undefined {
  const values = seriesValues(series);
  let best: DifferenceAmp | undefined;
  let i = 0;
  while (i < values.length - 1 && (values[i] ?? 0) < scaleOhm) i++;
  for (const r1 of values.slice(Math.max(0, i - 2), i + 3)) {
    for (const r2 of values) {
      const gain = r2 / (r1 + sourceOhm);
      if (gain > target * (1 + 1e-12)) break;
      if (!best || gain > best.gain * (1 + 1e-12)) best = { r_in_ohm: r1, r_fb_ohm: r2, source_ohm: sourceOhm, gain };
    }
  }
  return best;
}

/**
 * Worst input-referred error of the gain and REF path from tolerance t, with
 * no common mode: every corner of the four resistors, at both ends of ±peak,
 * against the nominal G·Vd + REF the firmware assumes.
 */
export function differenceToleranceError(amp: DifferenceAmp, t: number, peak: number, ref: number): number {
  let worst = 0;
  for (let corner = 0; corner < 16; corner++) {
    const s = (bit: number) => (corner & (1 << bit) ? 1 + t : 1 - t);
    const r1 = amp.r_in_ohm * s(0) + amp.source_ohm;
    const r2 = amp.r_fb_ohm * s(1);
    const r3 = amp.r_in_ohm * s(2) + amp.source_ohm;
    const r4 = amp.r_fb_ohm * s(3);
    for (const vd of [-peak, peak]) {
      const out = differenceOut(r1, r2, r3, r4, vd / 2, -vd / 2, ref);
      worst = Math.max(worst, Math.abs(out - (amp.gain * vd + ref)) / amp.gain);
    }
  }
  return worst;
}

/** Exact worst common-mode gain over the corners, |Δout|/Vcm with Vd = 0 and REF = 0 (checks the textbook bound). */
export function worstCommonModeGain(amp: DifferenceAmp, t: number): number {
  let worst = 0;
  for (let corner = 0; corner < 16; corner++) {
    const s = (bit: number) => (corner & (1 << bit) ? 1 + t : 1 - t);
    const out = differenceOut(
      amp.r_in_ohm * s(0) + amp.source_ohm,
      amp.r_fb_ohm * s(1),
      amp.r_in_ohm * s(2) + amp.source_ohm,
      amp.r_fb_ohm * s(3),
      1,
      1,
      0,
    );
    worst = Math.max(worst, Math.abs(out));
  }
  return worst;
}

/**
 * Worst input-referred error from each leg's source resistance at Rs·(1 ± t),
 * independently (a bridge's two arms), the four resistors nominal, at ±peak and
 * at the largest common mode `cm` (SPEC §11.1): unequal legs change the gain and
 * let the common mode through.
 */
export function differenceSourceError(amp: DifferenceAmp, t: number, peak: number, ref: number, cm: number): number {
  let worst = 0;
  for (const s1 of [1 - t, 1 + t]) {
    for (const s3 of [1 - t, 1 + t]) {
      const r1 = amp.r_in_ohm + amp.source_ohm * s1;
      const r3 = amp.r_in_ohm + amp.source_ohm * s3;
      for (const vcm of [-cm, cm]) {
        for (const vd of [-peak, peak]) {
          const out = differenceOut(r1, amp.r_fb_ohm, r3, amp.r_fb_ohm, vcm + vd / 2, vcm - vd / 2, ref);
          worst = Math.max(worst, Math.abs(out - (amp.gain * vd + ref)) / amp.gain);
        }
      }
    }
  }
  return worst;
}
