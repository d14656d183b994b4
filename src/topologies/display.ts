// Wording shared by the topologies' derived values (DisplayGroup rows).
import type { Derived, DisplayRow } from "../core/engine/result.ts";
import { formatSI, formatVolts, trimZeros } from "../core/units.ts";

/** SI with a prefix and no padding zeros: "100 kΩ", "1 µF", "19.5 mV". */
export const si = (value: number, unit: string) => trimZeros(formatSI(value, unit));
export const signed = (v: number) => formatVolts(v, { signed: true });
export const ratio = (k: number) => String(Number(k.toPrecision(4)));

/** The rails every check used: V+, and V− with how it was made. */
export function railRows(derived: Derived): DisplayRow[] {
  const rows: DisplayRow[] = [{ label: "V+", value: signed(derived.rails.positive_v) }];
  const n = derived.negative;
  if (n.kind === "charge-pump") {
    rows.push(
      {
        label: "Pump diode",
        value: `${n.diode.id}, ${formatVolts(n.diode.vf_v)} at ${si(n.diode.current_a, "A")}${n.vf_c === undefined ? "" : ` and ${n.vf_c} °C (the cold end)`}`,
        partId: n.diode.id,
        role: "pump-diode",
      },
      ...(n.load
        ? [
            {
              label: "Load on V− = stated + each part's supply current",
              value: [
                `${si(n.load.stated_a, "A")} stated`,
                ...n.load.draws.map((d) => `${d.channels} × ${si(d.per_channel_a, "A")} (${d.part}, ${d.role})`),
              ]
                .join(" + ")
                .concat(` = ${si(n.load.total_a, "A")}`),
            },
          ]
        : []),
      { label: "V− with no load = −(drive − 2·Vf)", value: signed(n.no_load_v) },
      { label: "Droop = I / (f · C_flying)", value: si(n.droop_v, "V") },
      { label: "V− at load, average", value: signed(n.dc_v) },
      { label: "Ripple = I / (f · C_reservoir), peak to peak", value: si(n.ripple_v, "V") },
      { label: "V− used by every check = average + ripple / 2", value: signed(n.worst_v) },
      { label: "Load at which the pump collapses", value: si(n.collapse_a, "A") },
    );
  } else {
    rows.push({
      label: n.kind === "ground" ? "V− (ground)" : "V− (fixed supply)",
      value: signed(derived.rails.negative_v),
    });
  }
  return rows;
}
