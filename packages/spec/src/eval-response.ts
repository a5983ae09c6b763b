// Evaluates a packed modal response and its derivatives at one time, without
// allocating: out[level] for level < levels. Returns the largest |p| among the
// transient terms still bigger than `significant` at t (their value bound),
// which sets the bracketing step of the metrics scan; 0 when none is.
// evalPhases sums the terms from their phases at t (term-phases.ts);
// evalResponse computes those phases directly first.
import { PACKED_LEVELS, type PackedResponse } from './pack-response.js';
import { newTermPhases, phasesAt, type TermPhases } from './term-phases.js';

const scratch = newTermPhases();

export function evalResponse(p: PackedResponse, t: number, levels: number, out: Float64Array, significant = 0): number {
  phasesAt(p, t, scratch);
  return evalPhases(p, scratch, levels, out, significant);
}

export function evalPhases(p: PackedResponse, ph: TermPhases, levels: number, out: Float64Array, significant = 0): number {
  for (let l = 0; l < levels; l++) out[l] = 0;
  let fastest = 0;
  const t = ph.t;
  const v = ph.v;
  const flat = p.flat;
  const count = p.count;
  for (let k = 0; k < count; k++) {
    const e = v[3 * k] as number;
    if (e === 0) continue;
    const m = p.degree[k] as number;
    const off = p.offset[k] as number;
    const base = 2 * PACKED_LEVELS * off;
    if ((p.omega[k] as number) !== 0) {
      const c = v[3 * k + 1] as number;
      const s = v[3 * k + 2] as number;
      if (m === 1) {
        for (let l = 0; l < levels; l++) {
          const i = base + 2 * l;
          out[l] = (out[l] as number) + (flat[i] as number) * c + (flat[i + 1] as number) * s;
        }
      } else {
        for (let l = 0; l < levels; l++) {
          let i = base + 2 * (l * m + m - 1);
          let pa = flat[i] as number;
          let pb = flat[i + 1] as number;
          for (let n = m - 2; n >= 0; n--) {
            i -= 2;
            pa = pa * t + (flat[i] as number);
            pb = pb * t + (flat[i + 1] as number);
          }
          out[l] = (out[l] as number) + pa * c + pb * s;
        }
      }
    } else if (m === 1) {
      for (let l = 0; l < levels; l++) out[l] = (out[l] as number) + (flat[base + 2 * l] as number) * e;
    } else {
      for (let l = 0; l < levels; l++) {
        let i = base + 2 * (l * m + m - 1);
        let pa = flat[i] as number;
        for (let n = m - 2; n >= 0; n--) {
          i -= 2;
          pa = pa * t + (flat[i] as number);
        }
        out[l] = (out[l] as number) + pa * e;
      }
    }
    if (significant > 0 && p.transient[k] && (p.speed[k] as number) > fastest) {
      let b = p.bound[off + m - 1] as number;
      for (let n = m - 2; n >= 0; n--) b = b * t + (p.bound[off + n] as number);
      if (e * b > significant) fastest = p.speed[k] as number;
    }
  }
  return fastest;
}
