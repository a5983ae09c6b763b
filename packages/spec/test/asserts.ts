import { expect } from 'vitest';

/** |actual - expected| <= relTol * max(|expected|, absFloor). */
export function assertClose(actual: number | null | undefined, expected: number, relTol: number, absFloor = 1e-12): void {
  expect(actual, `expected a number close to ${expected}`).toBeTypeOf('number');
  const a = actual as number;
  const scale = Math.max(Math.abs(expected), absFloor);
  const err = Math.abs(a - expected) / scale;
  if (!(err <= relTol)) {
    throw new Error(`assertClose: got ${a}, expected ${expected} (relative error ${err.toExponential(3)} > ${relTol})`);
  }
}
