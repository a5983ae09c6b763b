import { describe, expect, it } from 'vitest';
import { polyRoots } from './poly-roots.js';
import { polyFromRoots } from './poly-from-roots.js';
import type { Complex } from './types.js';
import { assertClose } from '../test/asserts.js';
import { maxMatchedError } from '../test/match-roots.js';
import { companionEigenvalues } from '../test/companion-eigenvalues.js';
import { seededRandom } from '../test/seeded-random.js';

const r = (re: number, im = 0): Complex => ({ re, im });
const pair = (re: number, im: number): Complex[] => [r(re, im), r(re, -im)];

function expectExactConjugates(roots: Complex[]): void {
  for (const z of roots) {
    if (z.im === 0) continue;
    expect(roots.some((w) => w.re === z.re && w.im === -z.im), `conjugate of ${z.re}+${z.im}j`).toBe(true);
  }
}

describe('polyRoots on polynomials built from known roots', () => {
  // name                         roots                                            relTol
  const cases: [string, Complex[], number][] = [
    ['three real',                [r(-1), r(-2), r(-3)],                           1e-13],
    ['pair and real',             [...pair(-2, 3), r(-15)],                        1e-13],
    ['double real',               [r(-1), r(-1), r(-3)],                           1e-12],
    ['triple real',               [r(-2), r(-2), r(-2), r(-7), ...pair(-1, 4)],    1e-10],
    ['repeated pair',             [...pair(-1, 2), ...pair(-1, 2), r(-5)],         1e-10],
    ['magnitudes 1e-3 .. 1e6',    [r(-1e-3), r(-1), r(-1e3), r(-1e6)],             1e-12],
    ['pairs far apart',           [...pair(-0.01, 0.2), ...pair(-300, 4000), r(-2)], 1e-12],
    ['right half-plane',          [r(0.5), ...pair(1, 3), r(-4)],                  1e-13],
    ['on the imaginary axis',     [...pair(0, 2), r(-1), r(-6)],                   1e-13],
  ];
  it.each(cases)('%s', (_name, roots, tol) => {
    const found = polyRoots(polyFromRoots(roots, 2.5));
    expect(found).toHaveLength(roots.length);
    // each root relative to its own size: magnitudes differ by nine decades
    for (const z of found) {
      const err = Math.min(...roots.map((e) => Math.hypot(z.re - e.re, z.im - e.im) / Math.hypot(e.re, e.im)));
      expect(err, `root ${z.re} ${z.im}`).toBeLessThanOrEqual(tol);
    }
    expect(maxMatchedError(found, roots, 1e-300)).toBeLessThanOrEqual(tol);
    expectExactConjugates(found);
  });

  it('repeated roots come out identical (clustered), not spread by eps^(1/m)', () => {
    const found = polyRoots(polyFromRoots([r(-2), r(-2), r(-2), r(-5)]));
    const twos = found.filter((z) => Math.abs(z.re + 2) < 1e-3);
    expect(twos).toHaveLength(3);
    expect(new Set(twos.map((z) => z.re)).size).toBe(1);
    expect(twos.every((z) => z.im === 0)).toBe(true);
    assertClose(twos[0]?.re, -2, 1e-12);
  });

  it.each([7, 8, 12, 16, 20, 24])(
    '(s+1)^%i from its binomial coefficients is one root of that multiplicity at -1, not a ring of radius eps^(1/m)',
    (n) => {
      // binomial theorem: (s+1)^n = sum C(n,k) s^(n-k); every C(n,k) is exact in double for n <= 24
      const c = [1];
      for (let i = 0; i < n; i++) {
        c.push(0);
        for (let k = c.length - 1; k > 0; k--) c[k] = (c[k] as number) + (c[k - 1] as number);
      }
      const found = polyRoots(c);
      expect(found).toHaveLength(n);
      for (const z of found) {
        expect(z.im).toBe(0);
        assertClose(z.re, -1, 1e-12);
      }
    },
  );

  it('roots at the origin are split off exactly', () => {
    expect(polyRoots([1, 3, 2, 0, 0])).toEqual([r(0), r(0), r(-1), r(-2)]);
  });

  it('returns the order types.ts states: real part descending, positive imaginary first', () => {
    const found = polyRoots(polyFromRoots([r(-9), ...pair(-1, 2), r(-0.5)]));
    expect(found.map((z) => Math.sign(z.im))).toEqual([0, 1, -1, 0]);
    assertClose(found[0]?.re, -0.5, 1e-14);
    assertClose(found[3]?.re, -9, 1e-14);
  });

  it('handles degree 0, 1 and leading zeros', () => {
    expect(polyRoots([3])).toEqual([]);
    expect(polyRoots([0, 0, 2, 4])).toEqual([r(-2)]);
    expect(polyRoots([0, 0])).toEqual([]);
  });
});

describe('polyRoots against ml-matrix EigenvalueDecomposition of the companion matrix', () => {
  it.each([8, 15, 25])('random real coefficients, degree %i', (n) => {
    const rand = seededRandom(1000 + n);
    const coeffs = [1, ...Array.from({ length: n }, () => 2 * rand() - 1)];
    const found = polyRoots(coeffs);
    const reference = companionEigenvalues(coeffs);
    expect(maxMatchedError(found, reference, 1)).toBeLessThan(1e-9);
    expectExactConjugates(found);
  });

  // Poles on a half circle (a Butterworth pattern) are well conditioned in
  // coefficient form only up to order 20 or so; graded magnitudes (the usual
  // shape of a high-order closed loop) stay well conditioned at order 40-60
  // and test the Newton-polygon starting circles. The eigenvalue reference
  // (without balancing) loses accuracy on graded coefficients, so graded
  // sets are checked against their known roots only.
  const butterworth = (n: number, radius: number): Complex[] => {
    const out: Complex[] = [];
    for (let k = 0; k < n / 2; k++) {
      const theta = (Math.PI * (2 * k + 1)) / (2 * n);
      out.push(...pair(-radius * Math.sin(theta), radius * Math.cos(theta)));
    }
    return out;
  };
  const graded = (pairs: number, decadesPerPair: number, zeta: number): Complex[] => {
    const out: Complex[] = [];
    for (let k = 0; k < pairs; k++) {
      const wn = 10 ** (k * decadesPerPair);
      out.push(...pair(-zeta * wn, Math.sqrt(1 - zeta * zeta) * wn));
    }
    return out;
  };
  const highOrder: [string, Complex[], number][] = [
    ['half-circle pattern, order 16',                 butterworth(16, 10),                                         1e-9],
    ['graded magnitudes, order 40',                   graded(20, 0.2, 0.5),                                        1e-11],
    ['graded magnitudes, order 60',                   graded(30, 0.12, 0.3),                                       1e-9],
    ['graded, order 40 with a triple real root',      [...graded(18, 0.2, 0.6), r(-3), r(-3), r(-3), r(-0.05)],   1e-9],
    ['graded, order 42 with a double pair',           [...graded(19, 0.2, 0.4), ...pair(-2, 5), ...pair(-2, 5)],    1e-9],
  ];
  it.each(highOrder)('%s', (_name, roots, tol) => {
    const coeffs = polyFromRoots(roots);
    const found = polyRoots(coeffs);
    expect(maxMatchedError(found, roots, 1e-300)).toBeLessThan(tol);
    expectExactConjugates(found);
  });

  it('half-circle pattern of radius 10, order 16: agrees with the eigenvalues', () => {
    const coeffs = polyFromRoots(butterworth(16, 10));
    expect(maxMatchedError(polyRoots(coeffs), companionEigenvalues(coeffs), 1e-300)).toBeLessThan(1e-8);
  });

  it('an ill-conditioned order-40 polynomial: no worse than the eigenvalues (x10), nothing merged wrongly', () => {
    const rand = seededRandom(40);
    const roots: Complex[] = [];
    while (roots.length < 40) {
      const sigma = -Math.exp(6 * rand() - 2);
      if (rand() < 0.6 && roots.length + 2 <= 40) roots.push(...pair(sigma, Math.exp(6 * rand() - 2)));
      else roots.push(r(sigma));
    }
    const coeffs = polyFromRoots(roots);
    const found = polyRoots(coeffs);
    const referenceError = maxMatchedError(companionEigenvalues(coeffs), roots, 1);
    expect(maxMatchedError(found, roots, 1)).toBeLessThan(10 * referenceError);
    expectExactConjugates(found);
  });
});
