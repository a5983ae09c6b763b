// Exact step-response metrics, grid-free: "sign bracketing of the analytic
// derivative on a pole-derived step, then safeguarded Newton (Newton with a
// bisection fallback) on the analytic expression for every time".
//
// On r(t) = y(t)/y_f (y_f = G(0)) from the modal form:
// 1. Horizon. T is where the bound B(t) of |r - 1| (transient-horizon.ts)
//    drops below min(band, 10 %) for good, so no band crossing and no 10 % or
//    90 % crossing lies beyond T. If the largest overshoot found so far is
//    smaller than B(T), the scan goes on until B falls below it (at least
//    1e-9), so a late peak and a slow tail are both caught.
// 2. Bracketing. The step is 1/|p| of the fastest pole still significant at t
//    (its term above 1e-10 of y_f), about a third of the half-period of its
//    oscillation and one time constant of its decay, growing as fast modes
//    die out. In each step a sign change of r' brackets one extremum; when r'
//    keeps its sign but r'' changes it, r' is checked at the root of r'' so a
//    pair of close extrema inside one step is caught too.
// 3. Refinement. Each extremum (root of r', Newton with r'') and each level
//    crossing (r = 0.1, 0.9, 1 +- band, Newton with r') is refined to about
//    1e-15 relative inside its bracket. Between consecutive extrema r is
//    monotone, so a crossing is bracketed exactly by comparing end values.
// Definitions: overshoot = max(0, max r - 1) x 100; undershoot =
// max(0, -min r) x 100; peak time = time of the global maximum (null without
// overshoot); settling time = the last time |r - 1| equals the band (0 if r
// never leaves it); rise time = first 90 % crossing minus first 10 %
// crossing. y(0+) counts (a biproper model may overshoot at t = 0+).
import type { Model, StepMetrics } from './types.js';
import { stability } from './is-stable.js';
import { dcGain } from './dc-gain.js';
import { conditionedModalForm, MAX_ROUNDING } from './conditioned-modal-form.js';
import { packResponse, type PackedResponse } from './pack-response.js';
import { evalPhases } from './eval-response.js';
import { advancePhases, multiplyPhases, newTermPhases, phasesAt, type TermPhases } from './term-phases.js';
import { transientBound, transientHorizon } from './transient-horizon.js';
import { closestPoles } from './closest-poles.js';
import { rootConsistency } from './root-consistency.js';
import { formatNumber, formatRoot } from './format-complex.js';

/** Overshoot or undershoot below 1e-9 of y_f is round-off, reported as none. */
const FLOOR = 1e-9;
/** A term smaller than this (relative to y_f) no longer sets the step. */
const SIGNIFICANT = 1e-10;
const STEP_FACTOR = 1;
/** Refuse, with a note, a scan that would take more steps than this. */
const MAX_STEPS = 2_000_000;

const buf = new Float64Array(4);
// Phases of the scan (now, next step, one step) and of the refinements: one
// set per module, since a scan runs to its end before the next one starts.
const scanNow = newTermPhases();
const scanNext = newTermPhases();
const scanStep = newTermPhases();
const probe = newTermPhases();

export function computeStepMetrics(model: Model, settlingBandPct: number): { metrics: StepMetrics | null; notes: string[] } {
  const st = stability(model);
  if (!st.stable) return { metrics: null, notes: [st.reason ?? 'the model is not stable'] };
  const yf = dcGain(model);
  if (yf === null || yf === 0) {
    return {
      metrics: null,
      notes: ['the final value is zero (a zero at the origin), so overshoot, settling and rise time relative to it are undefined'],
    };
  }
  if (model.form === 'polynomial') {
    const rc = rootConsistency(model);
    if (!rc.ok) {
      return {
        metrics: null,
        notes: [
          `the ${rc.field === 'denominator' ? 'poles' : 'zeros'} found for these coefficients do not reproduce the model closely enough for exact metrics (the ${rc.field} from them is off by ${formatNumber(rc.worst, 2)} of its value at w = ${formatNumber(rc.at)} rad/s); a root of high multiplicity or a tight cluster of roots cannot be separated in double precision: enter the model in zero-pole-gain form`,
        ],
      };
    }
  }
  const notes: string[] = [];
  const { form, spread } = conditionedModalForm(model, yf);
  const p = packResponse(form, 1 / yf);
  // The modal sum cancels when residues dwarf the final value (high order,
  // clustered poles): its round-off is about eps * sum |C_k|. Past 1e-8 of
  // y_f the metrics would be noise, so say so instead of printing them.
  // A residue that is not a finite number would make every metric garbage:
  // refuse rather than print numbers (no such model is known; this guards).
  if (!Number.isFinite(spread)) {
    return {
      metrics: null,
      notes: ['the modal form of this model could not be computed in double precision (a residue is not a finite number); check the pole and zero placement or reduce the model'],
    };
  }
  if (spread * Number.EPSILON > MAX_ROUNDING) {
    return {
      metrics: null,
      notes: [
        `the modal form of this model is too ill-conditioned for exact metrics (its terms reach ${formatNumber(spread)} times the final value and cancel); check the pole and zero placement or reduce the model${nearlyRepeated(model)}`,
      ],
    };
  }
  const band = settlingBandPct / 100;
  const tSettle = transientHorizon(p, Math.min(band, 0.1));
  if (estimateSteps(p, tSettle) > MAX_STEPS) {
    return {
      metrics: null,
      notes: ['the response is too lightly damped for an exact scan (more than 2 million oscillation steps before it settles)'],
    };
  }
  // sign of the first derivative of r that is not zero at 0+: the one of
  // order n - m, equal to gain / y_f (denominator monic)
  const s = new Scan(p, band, model.poles.length - model.zeros.length, Math.sign(model.gain / yf));
  s.run(tSettle);
  // a later peak could still beat the largest overshoot found: scan on
  const target = Math.max(s.rMax - 1, FLOOR);
  if (transientBound(p, tSettle) >= target) {
    const tPeak = transientHorizon(p, target);
    if (tPeak > tSettle && estimateSteps(p, tPeak) <= MAX_STEPS) s.run(tPeak);
  }
  const overshoot = s.rMax - 1 > FLOOR ? (s.rMax - 1) * 100 : 0;
  const undershoot = -s.rMin > FLOOR ? -s.rMin * 100 : 0;
  // entryLevel: 0 = never outside the band; NaN cannot remain (r ends inside)
  const settlingTime =
    s.entryLevel === 0
      ? 0
      : Number.isNaN(s.entryLevel)
        ? s.t
        : refine(p, 0, s.entryLevel, s.entryA, s.entryB, s.entryRA - s.entryLevel, s.entryRB - s.entryLevel);
  const r0 = s.r0;
  if (model.zeros.length === model.poles.length && model.poles.length > 0) {
    notes.push(`the model has direct feedthrough: the response jumps to ${formatNumber(r0 * 100)} % of its final value at t = 0+`);
  }
  if (yf < 0) notes.push('the DC gain is negative: metrics are taken on y / y_f, so they read as for a positive step response');
  return {
    metrics: {
      finalValue: yf,
      overshootPct: overshoot,
      undershootPct: undershoot,
      peakTime: overshoot > 0 ? s.tMax : null,
      settlingTime,
      settlingBandPct,
      riseTime: s.t90 - s.t10,
    },
    notes,
  };
}

// Upper estimate of the bracketing steps: each term sets the step while it is
// significant, for at most the horizon.
function estimateSteps(p: PackedResponse, horizon: number): number {
  let steps = 0;
  for (let k = 0; k < p.count; k++) {
    if (!p.transient[k]) continue;
    const m = p.degree[k] as number;
    const off = p.offset[k] as number;
    let c = 0;
    for (let n = 0; n < m; n++) c += p.bound[off + n] as number;
    const rate = -(p.sigma[k] as number);
    const alive = Math.min(horizon, (Math.log(Math.max(c, SIGNIFICANT) / SIGNIFICANT) + 2 * m) / rate);
    steps += (alive * (p.speed[k] as number)) / STEP_FACTOR;
  }
  return steps;
}

class Scan {
  readonly p: PackedResponse;
  readonly band: number;
  t = 0;
  r: number;
  d: number;
  dd: number;
  fastest: number;
  /** Direction of r on the current step: +1 rising, -1 falling. */
  dir: number;
  r0: number;
  rMax: number;
  tMax = 0;
  rMin: number;
  t10 = Number.NaN;
  t90 = Number.NaN;
  /** Last piece that enters the band: [entryA, entryB], crossing r = entryLevel (0: none). */
  entryA = 0;
  entryB = 0;
  entryRA = 0;
  entryRB = 0;
  entryLevel = 0;

  /** The phases at t, and those of the current step length. */
  now: TermPhases = scanNow;
  next: TermPhases = scanNext;
  stepLength = Number.NaN;

  constructor(p: PackedResponse, band: number, relativeDegree: number, leadSign: number) {
    this.p = p;
    this.band = band;
    phasesAt(p, 0, this.now);
    this.fastest = evalPhases(p, this.now, 4, buf, SIGNIFICANT);
    this.r = buf[0] as number;
    this.d = buf[1] as number;
    this.dd = buf[2] as number;
    this.r0 = this.r;
    this.rMax = this.r;
    this.rMin = this.r;
    if (this.r >= 0.1) this.t10 = 0;
    if (this.r >= 0.9) this.t90 = 0;
    // r'(0+) is often exactly zero in theory (relative degree >= 2) and
    // round-off in practice: then the first derivative that is not zero
    // decides, which for relative degree >= 2 is the leading one (r'' and
    // r''' are round-off too from degree 4 on; a wrong direction here made
    // a spurious extremum at 0+ that refine then chased to 0).
    const noise = 1e-10 * levelScale(p);
    this.dir = Math.sign(this.d);
    if (Math.abs(this.d) <= noise) {
      this.dir = relativeDegree >= 2 ? leadSign : Math.sign(this.dd) || Math.sign(buf[3] as number) || 1;
      this.d = this.dir * Number.MIN_VALUE; // keeps brackets consistent with dir
    }
    // r''(0+) is zero in theory from relative degree 3 on: its round-off
    // sign would send the first step looking for a dip of r' that is not there
    if (relativeDegree >= 3) this.dd = leadSign * Number.MIN_VALUE;
  }

  run(tEnd: number): void {
    const p = this.p;
    while (this.t < tEnd) {
      const h = this.fastest > 0 ? STEP_FACTOR / this.fastest : tEnd - this.t;
      const a = this.t;
      const b = Math.min(a + h, tEnd);
      const ra = this.r;
      const dda = this.dd;
      // steps mostly repeat one length: the next phases are the current ones
      // times the phases of that length (term-phases.ts)
      if (b - a !== this.stepLength) {
        this.stepLength = b - a;
        phasesAt(p, this.stepLength, scanStep);
      }
      multiplyPhases(p, this.now, scanStep, this.next, b);
      const fastest = evalPhases(p, this.next, 3, buf, SIGNIFICANT);
      const rb = buf[0] as number;
      const db = buf[1] as number;
      const ddb = buf[2] as number;
      const dirB = db > 0 ? 1 : db < 0 ? -1 : this.dir;
      if (dirB !== this.dir) {
        const c = refine(p, 1, 0, a, b, this.d, db);
        const rc = valueAt(p, c);
        this.piece(a, ra, c, rc);
        this.extremum(c, rc, this.dir);
        this.piece(c, rc, b, rb);
      } else if (Math.sign(dda) * Math.sign(ddb) < 0 && mayDip(this.d, db, dda, ddb, b - a)) {
        // r' may dip across zero and back inside this step
        const m = refine(p, 2, 0, a, b, dda, ddb);
        probeAt(p, m, 2);
        const dm = buf[1] as number;
        if (Math.sign(dm) === -this.dir && dm !== 0) {
          const c1 = refine(p, 1, 0, a, m, this.d, dm);
          const c2 = refine(p, 1, 0, m, b, dm, db);
          const r1 = valueAt(p, c1);
          const r2 = valueAt(p, c2);
          this.piece(a, ra, c1, r1);
          this.extremum(c1, r1, this.dir);
          this.piece(c1, r1, c2, r2);
          this.extremum(c2, r2, -this.dir);
          this.piece(c2, r2, b, rb);
        } else this.piece(a, ra, b, rb);
      } else this.piece(a, ra, b, rb);
      const now = this.now;
      this.now = this.next;
      this.next = now;
      this.t = b;
      this.r = rb;
      this.d = db;
      this.dd = ddb;
      this.dir = dirB;
      this.fastest = fastest;
    }
  }

  private extremum(t: number, r: number, dirBefore: number): void {
    if (dirBefore > 0 && r > this.rMax) {
      this.rMax = r;
      this.tMax = t;
    } else if (dirBefore < 0 && r < this.rMin) {
      this.rMin = r;
    }
  }

  // r is monotone on [a, b]
  private piece(a: number, ra: number, b: number, rb: number): void {
    const p = this.p;
    if (Number.isNaN(this.t10) && rb >= 0.1) this.t10 = ra >= 0.1 ? a : refine(p, 0, 0.1, a, b, ra - 0.1, rb - 0.1);
    if (Number.isNaN(this.t90) && rb >= 0.9) this.t90 = ra >= 0.9 ? a : refine(p, 0, 0.9, a, b, ra - 0.9, rb - 0.9);
    const outA = Math.abs(ra - 1) >= this.band;
    const outB = Math.abs(rb - 1) >= this.band;
    if (outA && !outB) {
      this.entryA = a;
      this.entryB = b;
      this.entryRA = ra;
      this.entryRB = rb;
      this.entryLevel = ra > 1 ? 1 + this.band : 1 - this.band;
    } else if (outB) this.entryLevel = Number.NaN; // outside again: a later entry must follow
  }
}

function levelScale(p: PackedResponse): number {
  let s = 0;
  for (let k = 0; k < p.count; k++) {
    const off = p.offset[k] as number;
    s += Math.abs((p.cos[1] as Float64Array)[off] as number) + Math.abs((p.cos[2] as Float64Array)[off] as number);
  }
  return s;
}

// The response's levels < `levels` at t into buf, the probe's phases moved
// there from where they last were (a short move costs no exp, cos or sin).
function probeAt(p: PackedResponse, t: number, levels: number): void {
  advancePhases(p, probe, t, probe);
  evalPhases(p, probe, levels, buf);
}

// r at a point just refined: the probe's phases sit next to it.
function valueAt(p: PackedResponse, t: number): number {
  probeAt(p, t, 1);
  return buf[0] as number;
}

// Root of F_level(t) = target in [a, b] (a sign change is assumed; fa, fb
// are F_level - target at the ends), by safeguarded Newton with F_{level+1}
// as the slope (Press et al., Numerical Recipes, rtsafe): a Newton step that
// would leave the bracket or not halve the error is replaced by bisection.
// Starts from the secant point; stops when the Newton step falls below
// 1e-12 of t, after which quadratic convergence leaves an error far below it
// (of the bracket's far end, so a root at t = 0 ends the search too).
export function refine(p: PackedResponse, level: number, target: number, a: number, b: number, fa: number, fb: number): number {
  if (fa === 0) return a;
  if (fb === 0) return b;
  let lo = fa < 0 ? a : b;
  let hi = fa < 0 ? b : a;
  let x = a - (fa * (b - a)) / (fb - fa);
  if (!(x > Math.min(a, b) && x < Math.max(a, b))) x = 0.5 * (a + b);
  let dxOld = Math.abs(b - a);
  let dx = dxOld;
  const scale = Math.max(Math.abs(a), Math.abs(b));
  // the first point directly; later ones from the last (term-phases.ts)
  phasesAt(p, x, probe);
  evalPhases(p, probe, level + 2, buf);
  let f = (buf[level] as number) - target;
  let df = buf[level + 1] as number;
  if (f === 0) return x;
  if (f < 0) lo = x;
  else hi = x;
  for (let it = 0; it < 100; it++) {
    if (((x - hi) * df - f) * ((x - lo) * df - f) > 0 || Math.abs(2 * f) > Math.abs(dxOld * df)) {
      dxOld = dx;
      dx = 0.5 * (hi - lo);
      x = lo + dx;
      if (Math.abs(dx) <= 2e-16 * scale) return x;
    } else {
      dxOld = dx;
      dx = f / df;
      x -= dx;
      if (Math.abs(dx) <= 1e-12 * scale) return x;
    }
    probeAt(p, x, level + 2);
    f = (buf[level] as number) - target;
    df = buf[level + 1] as number;
    if (f === 0) return x;
    if (f < 0) lo = x;
    else hi = x;
  }
  return x;
}

// Could r' change sign twice inside [0, h]? The cubic Hermite interpolant of
// r' from its end values and slopes answers cheaply when it stays clearly on
// one side (at least 10 % of the end values); only otherwise is the exact
// check (root of r'', r' there) paid for.
function mayDip(d0: number, d1: number, s0: number, s1: number, h: number): boolean {
  const m0 = s0 * h;
  const m1 = s1 * h;
  const margin = 0.1 * Math.max(Math.abs(d0), Math.abs(d1));
  const sign = Math.sign(d0);
  for (let k = 1; k < 8; k++) {
    const u = k / 8;
    const u2 = u * u;
    const u3 = u2 * u;
    const v = (2 * u3 - 3 * u2 + 1) * d0 + (u3 - 2 * u2 + u) * m0 + (-2 * u3 + 3 * u2) * d1 + (u3 - u2) * m1;
    if (sign * v < margin) return true;
  }
  return false;
}

/** Poles closer than this (relative) are named in the ill-conditioning note. */
const NEARLY_REPEATED = 1e-3;

// Nearly repeated poles are the usual cause of cancelling terms; poles closer
// than 1e-5 are clustered into one repeated pole, so entering them as equal
// gives exact metrics.
function nearlyRepeated(model: Model): string {
  const c = closestPoles(model.poles);
  if (!c || !(c.relative < NEARLY_REPEATED)) return '';
  const digits = Math.min(15, Math.ceil(-Math.log10(c.relative)) + 2);
  if (c.a.re === c.b.re && c.a.im === -c.b.im) {
    return `; the two poles of the pair at ${formatRoot(c.a, digits)} are only ${c.relative.toExponential(1)} of their size apart (it nearly sits on the real axis): if it stands for a repeated real pole, enter it as one`;
  }
  return `; the poles at ${formatRoot(c.a, digits)} and ${formatRoot(c.b, digits)} are only ${c.relative.toExponential(1)} of their size apart: if they stand for one repeated pole, enter them as equal`;
}
