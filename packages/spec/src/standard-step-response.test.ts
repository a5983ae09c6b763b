import fc from 'fast-check';
import { describe, it } from 'vitest';
import { assertClose } from '../test/asserts.js';
import { createOdexSolver } from '../test/odex-solver.js';
import { standardStepResponse } from './standard-step-response.js';

describe('standardStepResponse', () => {
  it('matches odex (Hairer-Wanner ODEX, Gragg-Bulirsch-Stoer extrapolation) on y" + 2 zeta y\' + y = 1 (reference library)', () => {
    const solver = createOdexSolver(2);
    solver.absoluteTolerance = 1e-12;
    solver.relativeTolerance = 1e-12;
    for (const zeta of [0, 0.05, 0.3, 0.7, 0.999, 1, 1.001, 1.7, 4]) {
      for (const t of [0.1, 0.7, 2.3, 6, 15]) {
        const out = solver.solve((_x: number, y: number[]) => [y[1] as number, 1 - 2 * zeta * (y[1] as number) - (y[0] as number)], 0, [0, 0], t);
        const p = standardStepResponse(zeta, t);
        assertClose(p.y, out.y[0] as number, 1e-8, 1e-3);
        assertClose(p.dydt, out.y[1] as number, 1e-8, 1e-3);
      }
    }
  });

  it('gives dy/dt and dy/dzeta that match central differences (exact relation, property test)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 3, noNaN: true }), fc.double({ min: 0.05, max: 20, noNaN: true }), (zeta, t) => {
        // Richardson's extrapolation of central differences, error O(h^4): a
        // plain central difference at h = 1e-5 is off by h^2 y'''/6, which at
        // t near 20 reached the tolerance (zeta 0.367, t 18.5 failed). The
        // differences' own round-off, about eps / h = 2e-13, sets the 1e-11
        // floor of the comparison (relative 1e-6 of at least 1e-5).
        const h = 1e-3;
        const p = standardStepResponse(zeta, t);
        const central = (f: (x: number) => number, x: number, d: number): number => (f(x + d) - f(x - d)) / (2 * d);
        const richardson = (f: (x: number) => number, x: number): number => (4 * central(f, x, h / 2) - central(f, x, h)) / 3;
        const dt = richardson((x) => standardStepResponse(zeta, x).y, t);
        const dz = richardson((x) => standardStepResponse(x, t).y, zeta);
        assertClose(p.dydt, dt, 1e-6, 1e-5);
        assertClose(p.dydzeta, dz, 1e-6, 1e-5);
      }),
    );
  });

  it('has no jump where the power series hands over to the closed forms', () => {
    for (const zeta of [0.2, 0.9, 1.1, 2]) {
      const t = Math.sqrt(0.5 / Math.abs(1 - zeta * zeta));
      const a = standardStepResponse(zeta, t * (1 - 1e-13));
      const b = standardStepResponse(zeta, t * (1 + 1e-13));
      assertClose(a.y, b.y, 1e-11, 1e-11);
      assertClose(a.dydzeta, b.dydzeta, 1e-10, 1e-10);
    }
  });

  it('stays finite for a heavily overdamped response at long times', () => {
    const p = standardStepResponse(1e4, 1e5);
    assertClose(p.y, 1 - Math.exp(-1e5 / (1e4 + Math.sqrt(1e8 - 1))) * (1 + 0.5 / 1e8), 1e-6);
  });
});
