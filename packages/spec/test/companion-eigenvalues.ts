// Reference roots: eigenvalues of the companion matrix, computed by
// ml-matrix's EigenvalueDecomposition (Hessenberg reduction + shifted QR).
// ml-matrix does not balance the matrix, so the variable is scaled first
// (s = g x with g = |a_n / a_0|^(1/n)) to keep the entries near one.
import { EigenvalueDecomposition, Matrix } from 'ml-matrix';
import type { Complex } from '../src/types.js';

export function companionEigenvalues(coeffs: readonly number[]): Complex[] {
  const lead = coeffs[0] as number;
  const n = coeffs.length - 1;
  const g = Math.abs((coeffs[n] as number) / lead) ** (1 / n) || 1;
  const m = Matrix.zeros(n, n);
  for (let j = 0; j < n; j++) m.set(0, j, -(coeffs[j + 1] as number) / lead / g ** (j + 1));
  for (let i = 1; i < n; i++) m.set(i, i - 1, 1);
  const evd = new EigenvalueDecomposition(m);
  return evd.realEigenvalues.map((re, i) => ({ re: re * g, im: (evd.imaginaryEigenvalues[i] as number) * g }));
}
