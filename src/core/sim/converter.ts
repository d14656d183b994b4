// The converter and the firmware's reading. Q = V_ref/2^N (IEEE Std 1241-2010;
// the V_ref/(2^N − 1) convention of some texts is not used), codes clamp to
// 0 … 2^N − 1, and the firmware reads sign·(code + 0.5)·volts_per_code − offset.
import type { ConverterModel, ReadingModel } from "./chain.ts";

export function quantize(v: number, adc: ConverterModel): number {
  const full = 2 ** adc.bits;
  const code = Math.floor((v / adc.reference_v) * full);
  return code < 0 ? 0 : code >= full ? full - 1 : code;
}

export function reading(code: number, sign: number, r: ReadingModel): number {
  return (r.signed ? sign : 1) * (code + 0.5) * r.volts_per_code - r.offset_v;
}
