// SI-prefixed number parsing and engineering formatting. Everything inside the
// engine is in base SI units (V, A, Ω, F, Hz, s); text appears only at the edge.

// Keyed by UTF-16 code unit: the prefix is always the cell's last character.
const PREFIX_EXPONENT: ReadonlyMap<number, number> = new Map(
  Object.entries({
    p: -12,
    n: -9,
    u: -6,
    µ: -6, // U+00B5 micro sign
    μ: -6, // U+03BC Greek mu, which some keyboards produce instead
    m: -3,
    k: 3,
    K: 3,
    M: 6,
    G: 9,
    T: 12,
  }).map(([prefix, exponent]) => [prefix.charCodeAt(0), exponent]),
);

export type ParsedNumber = { ok: true; value: number } | { ok: false };

/** Parses "0.5", "500m", "2.2k", "1.5M", "10u", "10µ", "1e-6". No units, no spaces inside. */
export function parseSI(text: string): ParsedNumber {
  const value = siValue(text);
  return value === undefined ? { ok: false } : { ok: true, value };
}

/**
 * parseSI without the result object, for loops over every cell of a catalogue.
 * The grammar is /^[+-]?(\d+(\.\d*)?|\.\d+)([eE][+-]?\d+)?[pnuµμmkKMGT]?$/ after a trim.
 * Matching that regex took twice as long as this scan, which relies on Number()
 * accepting exactly that grammar once the text holds only digits, signs, '.' and
 * 'e'/'E': its hex, binary, octal and Infinity forms need other letters, and any
 * text it refuses gives NaN, which fails the finiteness test below.
 */
export function siValue(text: string): number | undefined {
  const t = text.trim();
  const last = t.length - 1;
  if (last < 0) return undefined;
  const exponent = PREFIX_EXPONENT.get(t.charCodeAt(last));
  const end = exponent === undefined ? t.length : last;
  if (end === 0) return undefined;
  for (let i = 0; i < end; i++) {
    const c = t.charCodeAt(i);
    // 0-9, '+', '-', '.', 'e', 'E'
    if (!((c >= 48 && c <= 57) || c === 43 || c === 45 || c === 46 || c === 101 || c === 69)) return undefined;
  }
  const mantissa = Number(end === t.length ? t : t.slice(0, end));
  const value = exponent === undefined ? mantissa : scaleByPowerOfTen(mantissa, exponent);
  return Number.isFinite(value) ? value : undefined;
}

// Dividing by 10^n (rather than multiplying by 10^-n) keeps "1u" exactly 1e-6.
function scaleByPowerOfTen(value: number, exponent: number): number {
  return exponent < 0 ? value / 10 ** -exponent : value * 10 ** exponent;
}

const FORMAT_PREFIXES = [
  { exponent: 9, symbol: "G" },
  { exponent: 6, symbol: "M" },
  { exponent: 3, symbol: "k" },
  { exponent: 0, symbol: "" },
  { exponent: -3, symbol: "m" },
  { exponent: -6, symbol: "µ" },
  { exponent: -9, symbol: "n" },
  { exponent: -12, symbol: "p" },
  { exponent: -15, symbol: "f" },
] as const;

const MINUS = "\u2212";

export type FormatOptions = {
  /** Significant digits (default 3). */
  digits?: number;
  /** Always show the sign ("+2.50 V"). */
  signed?: boolean;
  /** Use a fixed number of decimals instead of significant digits, in the chosen prefix. */
  decimals?: number;
  /** Use this prefix exponent instead of choosing one (e.g. 0 to keep volts in V). */
  exponent?: number;
};

/**
 * Formats a value in base SI units with an engineering prefix: 1.2e6 Hz → "1.20 MHz",
 * 2.5e-7 A → "250 nA", -0.1 V → "−100 mV". Never prints NaN, Infinity or −0.
 */
export function formatSI(value: number, unit: string, options: FormatOptions = {}): string {
  if (Number.isNaN(value)) return "not rated";
  if (!Number.isFinite(value)) return `${value < 0 ? MINUS : ""}∞ ${unit}`.trim();
  const digits = options.digits ?? 3;
  const magnitude = Math.abs(value);
  let exponent = options.exponent;
  if (exponent === undefined) {
    const rounded = magnitude === 0 ? 0 : Number(magnitude.toPrecision(digits));
    const raw = rounded === 0 ? 0 : Math.floor(Math.log10(rounded) / 3) * 3;
    exponent = Math.min(9, Math.max(-15, raw));
  }
  const prefix = FORMAT_PREFIXES.find((p) => p.exponent === exponent) ?? FORMAT_PREFIXES[3];
  const scaled = magnitude / 10 ** exponent;
  let body: string;
  if (options.decimals !== undefined) body = scaled.toFixed(options.decimals);
  else body = toSignificant(scaled, digits);
  const isZero = Number(body) === 0;
  // A value that rounds to zero carries no sign: "−0.00 V" reads as a bug.
  const sign = isZero ? "" : value < 0 ? MINUS : options.signed ? "+" : "";
  return `${sign}${body} ${prefix.symbol}${unit}`.trim();
}

function toSignificant(value: number, digits: number): string {
  if (value === 0) return (0).toFixed(Math.max(0, digits - 1));
  const decimals = Math.max(0, digits - 1 - Math.floor(Math.log10(Number(value.toPrecision(digits)))));
  // toFixed takes at most 100 decimals; anything that small prints as zero anyway.
  return value.toFixed(Math.min(decimals, 20));
}

/**
 * A fraction as a percentage with up to three significant figures and no SI
 * prefix: 0.001 → "0.1 %", never "100 m%" (a milli-percent reads as nonsense).
 */
export function formatPercent(fraction: number): string {
  if (!Number.isFinite(fraction)) return formatSI(fraction * 100, "%");
  const pct = Number((fraction * 100).toPrecision(3));
  const body = Math.abs(pct) < 1e-6 ? "0" : String(Math.abs(pct));
  return `${pct < 0 && body !== "0" ? MINUS : ""}${body} %`;
}

/** Volts with two decimals, the convention of every reason sentence ("+2.60 V", "−4.18 V"). */
export function formatVolts(value: number, options: { signed?: boolean } = {}): string {
  const decimals = Math.abs(value) >= 99.995 ? 0 : 2;
  return formatSI(value, "V", { exponent: 0, decimals, signed: options.signed ?? false });
}

/**
 * A quantity in its display unit: V/s is shown in V/µs, as datasheets do; "V" is a
 * rail-level voltage (two decimals) and "V-prefixed" a small one ("12.6 mV").
 */
export function formatQuantity(value: number, unit: string, digits = 3): string {
  // Kept in V/µs even when small ("0.500 V/µs", not "500 mV/µs"), as datasheets print it.
  if (unit === "V/s") return formatSI(value / 1e6, "V/µs", { digits, exponent: 0 });
  if (unit === "V") return formatSI(value, "V", { exponent: 0, decimals: 2 });
  if (unit === "V-prefixed") return formatSI(value, "V", { digits });
  return formatSI(value, unit, { digits });
}

/** Drops zeros that only pad the significant digits: "1.20 MHz" → "1.2 MHz", "10.0 kΩ" → "10 kΩ". */
export function trimZeros(text: string): string {
  return text.replace(/^([^\s.]*\d)\.(\d*?)0+(?=\s|$)/, (_m, whole: string, frac: string) =>
    frac === "" ? whole : `${whole}.${frac}`,
  );
}
