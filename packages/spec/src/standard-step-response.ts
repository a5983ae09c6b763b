// Unit-step response of the standard second-order system
// omega_n^2 / (s^2 + 2 zeta omega_n s + omega_n^2) with omega_n = 1, its slope
// dy/dt and its sensitivity dy/dzeta, in closed form:
//   y = 1 - e^{-zeta t} (C + zeta t S),  dy/dt = e^{-zeta t} t S,
//   dy/dzeta = e^{-zeta t} t^3 G,
// with v = (1 - zeta^2) t^2, C = cos/cosh(sqrt|v|), S = sin/sinh(x)/x and
// G = (x cos x - sin x)/x^3 (or its hyperbolic twin). One formula covers the
// underdamped, critically damped and overdamped cases: near zeta = 1 the power
// series in v are used, so nothing cancels; for large overdamped arguments the
// cosh/sinh are split into the two real-pole exponentials so nothing overflows.
export interface StandardStepPoint {
  y: number;
  dydt: number;
  dydzeta: number;
}

const SERIES_LIMIT = 0.5;

export function standardStepResponse(zeta: number, t: number): StandardStepPoint {
  const u = 1 - zeta * zeta;
  const v = u * t * t;
  if (Math.abs(v) < SERIES_LIMIT) {
    // C = sum (-v)^k/(2k)!, S = sum (-v)^k/(2k+1)!, G = -sum (-v)^k (2k+2)/(2k+3)!
    let c = 0;
    let s = 0;
    let g = 0;
    let p = 1; // (-v)^k
    let f2k = 1; // (2k)!
    for (let k = 0; k < 12; k++) {
      const f2k1 = f2k * (2 * k + 1);
      const f2k3 = f2k1 * (2 * k + 2) * (2 * k + 3);
      c += p / f2k;
      s += p / f2k1;
      g -= (p * (2 * k + 2)) / f2k3;
      p *= -v;
      f2k = f2k1 * (2 * k + 2);
    }
    const ez = Math.exp(-zeta * t);
    return { y: 1 - ez * (c + zeta * t * s), dydt: ez * t * s, dydzeta: ez * t * t * t * g };
  }
  if (u > 0) {
    const w = Math.sqrt(u);
    const ez = Math.exp(-zeta * t);
    const cw = Math.cos(w * t);
    const sw = Math.sin(w * t);
    return {
      y: 1 - ez * (cw + (zeta * sw) / w),
      dydt: (ez * sw) / w,
      dydzeta: (ez * (w * t * cw - sw)) / (w * w * w),
    };
  }
  const q = Math.sqrt(-u);
  // zeta - q = 1 / (zeta + q) exactly, written so that it does not cancel.
  const e1 = Math.exp(-t / (zeta + q));
  const e2 = Math.exp(-(zeta + q) * t);
  const ch = 0.5 * (e1 + e2); // e^{-zeta t} cosh(q t)
  const sh = 0.5 * (e1 - e2); // e^{-zeta t} sinh(q t)
  return {
    y: 1 - (ch + (zeta * sh) / q),
    dydt: sh / q,
    dydzeta: (sh - q * t * ch) / (q * q * q),
  };
}
