// The design a visitor starts from without a link: the worked example of
// SPEC §5 (±10 V into a 5 V, 10-bit ADC with a pumped negative rail), with a
// 0.5 mA pump load besides the parts it carries, a stiff pump (20 kHz, 10 µF flying capacitor) and a 2.2 V
// window (the rectifier's stage 1 swings to −(W + Vf) with every amplifier on the rail, SPEC §11.5), and 0.1 %
// resistors (0.01 % for the rectifier) so that every role has a fit at first.
import { draftFromInput } from "./draft.ts";
import type { Draft } from "./fields.ts";

export const DEFAULT_INPUT = {
  id: "new-design",
  title: "±10 V signal into a 5 V, 10-bit ADC",
  topology: "rectify-and-sign",
  supply: {
    positive_v: 5,
    negative: {
      kind: "charge-pump",
      drive_v: 5,
      frequency_hz: 20000,
      flying_cap_f: 10e-6,
      reservoir_cap_f: 22e-6,
      load_a: 0.0005,
    },
  },
  signal: { peak_v: 10, max_frequency_hz: 200, source_ohm: 1000 },
  front_end: {
    window_v: 2.2,
    divider_total_ohm: 100000,
    resistor_tolerance: 0.001,
    // The rectifier's five resistors as a 0.01 % matched network: its half-waves' gains then agree (SPEC §11.2).
    rectifier_tolerance: 0.0001,
    series: "E24",
    rectifier_load_ohm: 10000,
  },
  adc: { bits: 10, reference_v: 5, reference_tolerance: 0.002 },
  logic: { vdd_v: 5, vih_v: 3.0, vil_v: 1.5, level_shift: "diode-clamp", pull_down_ohm: 10000 },
  accuracy: { required_v: 0.1 },
  temperature: { min_c: 0, max_c: 50 },
  // Each rectifier stage's offset takes 30 % of the requirement: the summer carries 4·Vos (SPEC §11.2).
  policy: { offset_share: 0.3 },
} as const;

/** Values for fields the default design does not use, shown when a visitor switches to them. */
const UNUSED_BY_DEFAULT: Readonly<Draft> = { "supply.negative.v": "-5" };

export const DEFAULT_DRAFT: Readonly<Draft> = Object.freeze({ ...draftFromInput(DEFAULT_INPUT), ...UNUSED_BY_DEFAULT });
