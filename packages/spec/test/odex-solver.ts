import { createRequire } from 'node:module';

// odex (E. Hairer and G. Wanner's ODEX, Gragg-Bulirsch-Stoer extrapolation)
// ships TypeScript source that does not compile under our strict settings, so
// it is loaded through require with the small typed surface the tests use.
export interface OdexSolver {
  absoluteTolerance: number;
  relativeTolerance: number;
  maxSteps: number;
  denseOutput: boolean;
  solve(
    f: (x: number, y: number[]) => number[],
    x0: number,
    y0: number[],
    x1: number,
    output?: (n: number, xOld: number, x: number, y: number[], dense?: (i: number, x: number) => number) => boolean | void,
  ): { y: number[]; outcome: number };
  grid(dt: number, out: (x: number, y: number[]) => boolean | void): (n: number, xOld: number, x: number, y: number[], dense?: (i: number, x: number) => number) => boolean | void;
}

const odex = createRequire(import.meta.url)('odex') as { Solver: new (n: number) => OdexSolver };

export function createOdexSolver(dimension: number): OdexSolver {
  return new odex.Solver(dimension);
}
