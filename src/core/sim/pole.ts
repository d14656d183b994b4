// One closed-loop single-pole stage over one step, integrated exactly.
//
// The op amp is an integrator (A(s) = ωt/s, Fiore ch. 5); closed around a
// feedback factor β it follows its ideal output u with dy/dt = ωc·(u − y),
// ωc = ωt·β = 2π·GBW/noise gain, but never faster than the slew rate, and
// never outside its output range. Over a step the input u is a straight line,
// so each regime has a closed form: the linear regime's solution is
//   y(t) = u(t) − s/ωc + (y₀ − u₀ + s/ωc)·e^(−ωc·t)   (s = du/dt),
// the slewing regime a ramp at ±SR, the clipped regime a constant. The step is
// split at the instants the regime changes, so the result does not depend on
// the step length for linear inputs: this is an exponential integrator, stable
// at any ωc·h (a fast op amp at a slow signal is not stiff here).

/** Time spent slewing and clipped, accumulated while `counting`. */
export type PoleStats = { slewing_s: number; clipped_s: number; counting: boolean };

const TINY = 1e-300;

/** Advances y over h with u going linearly from u0 to u1; returns the new y. */
export function advancePole(
  y: number,
  u0: number,
  u1: number,
  h: number,
  wc: number,
  slew: number,
  lo: number,
  hi: number,
  stats: PoleStats | null,
): number {
  if (!(h > 0)) return y;
  const s = (u1 - u0) / h;
  // An ideal amplifier (no pole) follows u, still limited by slew and range.
  const w = Number.isFinite(wc) ? wc : 1e18;
  let t = 0;
  for (let guard = 0; guard < 12 && t < h; guard++) {
    const rem = h - t;
    const u = u0 + s * t;
    const r = w * (u - y);
    if (y >= hi && r >= 0) {
      y = hi;
      const dt = s >= 0 ? rem : Math.min(rem, (u - hi) / -s);
      if (stats?.counting) stats.clipped_s += dt;
      t += dt > 0 ? dt : rem;
      continue;
    }
    if (y <= lo && r <= 0) {
      y = lo;
      const dt = s <= 0 ? rem : Math.min(rem, (lo - u) / s);
      if (stats?.counting) stats.clipped_s += dt;
      t += dt > 0 ? dt : rem;
      continue;
    }
    if (r > slew || r < -slew) {
      const dir = r > 0 ? 1 : -1;
      const rate = dir * slew;
      // The error e = u − y changes at s − rate; slewing ends when ωc·|e| falls to SR.
      const e = u - y;
      const eEnd = rate / w;
      let dt = rem;
      const closing = (s - rate) * dir < 0;
      if (closing) dt = Math.min(dt, (e - eEnd) / (rate - s));
      const edge = dir > 0 ? hi : lo;
      dt = Math.min(dt, (edge - y) / rate);
      if (dt > h * 1e-12) {
        y += rate * dt;
        if (stats?.counting) stats.slewing_s += dt;
        t += dt;
        continue;
      }
      // Already at the boundary of the regime: fall through to the linear law.
    }
    const a = y - u + s / w;
    let dt = rem;
    if (Math.abs(s) > slew) {
      // The linear rate s − ωc·a·e^(−ωc·t) tends to s, beyond the slew rate: stop where it reaches it.
      const limit = s > 0 ? slew : -slew;
      const q = (s - limit) / (w * a);
      if (q > TINY && q < 1) dt = Math.min(dt, -Math.log(q) / w);
      if (dt <= h * 1e-12) {
        // At the slew rate already (rounding kept it out of the branch above): ramp.
        const ramp = Math.min(rem, ((limit > 0 ? hi : lo) - y) / limit);
        y += limit * ramp;
        if (stats?.counting) stats.slewing_s += ramp;
        t += ramp > 0 ? ramp : rem;
        continue;
      }
    }
    y = u + s * dt - s / w + a * Math.exp(-w * dt);
    if (y > hi) y = hi;
    else if (y < lo) y = lo;
    t += dt;
  }
  return y;
}
