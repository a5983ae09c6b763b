import { regionRadialInterval, type Box, type RadialBound, type RadialLimits } from './region-radial-interval.js';

// Angular sweep of the admissible region's upper half: rays at
// theta = k * thetaMax / N (integer times step), each giving the interval of
// admissible radii. Where a ray leaves or enters the region, or where the
// limit that makes an end changes (a corner), the angle is located by
// bisection and inserted, so corners are kept exactly and straight edges stay
// straight. Returns the runs of consecutive admissible rays, in theta order.

export interface SweepPoint {
  theta: number;
  lo: number;
  hi: number;
  loBy: RadialBound;
  hiBy: RadialBound;
}

const RAYS = 240;
const BISECTIONS = 60;

function at(limits: RadialLimits, theta: number, box: Box | null): SweepPoint {
  return { theta, ...regionRadialInterval(limits, theta, box) };
}

function admissible(p: SweepPoint): boolean {
  return p.hi > p.lo;
}

function bisect(a: number, b: number, sameAsA: (theta: number) => boolean): [number, number] {
  for (let i = 0; i < BISECTIONS; i++) {
    const m = 0.5 * (a + b);
    if (m === a || m === b) break;
    if (sameAsA(m)) a = m;
    else b = m;
  }
  return [a, b];
}

export function regionSweep(limits: RadialLimits, thetaMax: number, box: Box | null): SweepPoint[][] {
  const runs: SweepPoint[][] = [];
  let run: SweepPoint[] | null = null;
  if (thetaMax <= 0) {
    // Only the negative real axis is left (zeta >= 1): a degenerate region.
    const p = at(limits, 0, box);
    return p.hi >= p.lo && Number.isFinite(p.lo) ? [[p]] : [];
  }
  let prev: SweepPoint | null = null;
  for (let k = 0; k <= RAYS; k++) {
    const p = at(limits, k === RAYS ? thetaMax : (thetaMax * k) / RAYS, box);
    if (prev !== null) {
      const wasIn = admissible(prev);
      const isIn = admissible(p);
      if (wasIn !== isIn) {
        const [a, b] = bisect(prev.theta, p.theta, (t) => admissible(at(limits, t, box)) === wasIn);
        const edge = at(limits, wasIn ? a : b, box);
        const r = Number.isFinite(edge.hi) ? 0.5 * (edge.lo + edge.hi) : edge.lo;
        const closing = { ...edge, lo: r, hi: r };
        if (wasIn && run !== null) {
          run.push(closing);
          runs.push(run);
          run = null;
        } else {
          run = [closing];
        }
      } else if (isIn) {
        const corners: SweepPoint[] = [];
        const before = prev;
        if (before.loBy !== p.loBy) {
          const [, b] = bisect(before.theta, p.theta, (t) => at(limits, t, box).loBy === before.loBy);
          corners.push(at(limits, b, box));
        }
        if (before.hiBy !== p.hiBy) {
          const [, b] = bisect(before.theta, p.theta, (t) => at(limits, t, box).hiBy === before.hiBy);
          corners.push(at(limits, b, box));
        }
        corners.sort((x, y) => x.theta - y.theta);
        run?.push(...corners);
      }
    }
    if (admissible(p)) {
      if (run === null) run = [];
      run.push(p);
    } else if (run !== null) {
      runs.push(run);
      run = null;
    }
    prev = p;
  }
  if (run !== null) runs.push(run);
  return runs;
}
