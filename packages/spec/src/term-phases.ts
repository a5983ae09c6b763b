// The phases of a packed response's terms at one time t: for term k,
// e^{sigma_k t} and e^{sigma_k t} (cos omega_k t, sin omega_k t), kept in one
// array as [e, c, s] per term. evalPhases (eval-response.ts) sums the terms
// from them without calling exp, cos or sin.
//
// Phases come directly from Math.exp/cos/sin, or from the phases at another
// time, which is what makes the metrics scan cheap:
//  - multiplyPhases: the phases at t + h are those at t times those at h (the
//    scan takes many steps of one length);
//  - advancePhases: for a step dt short against every term
//    (|sigma + j omega| dt <= 0.02), e^{(sigma + j omega) dt} by its Taylor
//    polynomial of degree 6, whose remainder |z|^7 / 7! < 3e-16 is below
//    round-off (Newton iterations take such steps).
// Each derived step adds about two ulps to a phase, so packResponse's
// chainLimit caps the steps between direct computations at what keeps the
// error of the whole sum below 1e-13 of the final value.
import type { PackedResponse } from './pack-response.js';

export interface TermPhases {
  /** The response these are phases of: derived steps need the same one. */
  of: PackedResponse | null;
  t: number;
  /** Derived steps since the last direct computation. */
  chain: number;
  /** [e, c, s] per term. */
  v: Float64Array;
}

const TAYLOR_REACH = 0.02;
const INVERSE = new Float64Array([0, 1, 1 / 2, 1 / 3, 1 / 4, 1 / 5, 1 / 6]);

export function newTermPhases(): TermPhases {
  return { of: null, t: 0, chain: 0, v: new Float64Array(3 * 8) };
}

function fit(ph: TermPhases, count: number): Float64Array {
  if (ph.v.length < 3 * count) ph.v = new Float64Array(3 * count);
  return ph.v;
}

export function phasesAt(p: PackedResponse, t: number, ph: TermPhases): void {
  const v = fit(ph, p.count);
  for (let k = 0; k < p.count; k++) {
    const sigma = p.sigma[k] as number;
    const omega = p.omega[k] as number;
    const e = sigma === 0 ? 1 : Math.exp(sigma * t);
    v[3 * k] = e;
    if (omega === 0) {
      v[3 * k + 1] = e;
      v[3 * k + 2] = 0;
    } else {
      v[3 * k + 1] = e * Math.cos(omega * t);
      v[3 * k + 2] = e * Math.sin(omega * t);
    }
  }
  ph.of = p;
  ph.t = t;
  ph.chain = 0;
}

/** `to` = the phases at t = from.t + by.t, where `by` holds the phases at the step by.t. */
export function multiplyPhases(p: PackedResponse, from: TermPhases, by: TermPhases, to: TermPhases, t: number): void {
  if (from.of !== p || by.of !== p || from.chain >= p.chainLimit) {
    phasesAt(p, t, to);
    return;
  }
  const a = from.v;
  const b = by.v;
  const v = fit(to, p.count);
  for (let k = 0; k < p.count; k++) {
    const i = 3 * k;
    const ac = a[i + 1] as number;
    const as = a[i + 2] as number;
    const bc = b[i + 1] as number;
    const bs = b[i + 2] as number;
    v[i] = (a[i] as number) * (b[i] as number);
    v[i + 1] = ac * bc - as * bs;
    v[i + 2] = ac * bs + as * bc;
  }
  to.of = p;
  to.t = t;
  to.chain = from.chain + 1;
}

/** `to` (which may be `from`) = the phases at t, from those at from.t. */
export function advancePhases(p: PackedResponse, from: TermPhases, t: number, to: TermPhases): void {
  const dt = t - from.t;
  if (from.of !== p || from.chain >= p.chainLimit || p.maxSpeed * Math.abs(dt) > TAYLOR_REACH) {
    phasesAt(p, t, to);
    return;
  }
  const a = from.v;
  const v = fit(to, p.count);
  for (let k = 0; k < p.count; k++) {
    const zr = (p.sigma[k] as number) * dt;
    const zi = (p.omega[k] as number) * dt;
    // e^z = 1 + z (1 + z/2 (1 + z/3 (1 + z/4 (1 + z/5 (1 + z/6))))), and e^{Re z} alike
    let mr = 1;
    let mi = 0;
    let er = 1;
    for (let n = 6; n >= 1; n--) {
      const ur = zr * (INVERSE[n] as number);
      const ui = zi * (INVERSE[n] as number);
      const nr = 1 + ur * mr - ui * mi;
      mi = ur * mi + ui * mr;
      mr = nr;
      er = 1 + ur * er;
    }
    const i = 3 * k;
    const ac = a[i + 1] as number;
    const as = a[i + 2] as number;
    v[i] = (a[i] as number) * er;
    v[i + 1] = ac * mr - as * mi;
    v[i + 2] = ac * mi + as * mr;
  }
  to.of = p;
  to.t = t;
  to.chain = from.chain + 1;
}
