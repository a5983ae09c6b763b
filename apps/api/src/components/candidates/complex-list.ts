// Number lists as written in a CSV cell of a candidate upload (see
// docs/candidate-upload-format.md): items separated by spaces or semicolons;
// a complex number is written -2+3j (or i); -2±3j and -2+-3j stand for the
// conjugate pair -2+3j, -2-3j. No spaces inside one number.

export interface ComplexValue {
  re: number;
  im: number;
}

const UNSIGNED = String.raw`(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?`;
const SIGNED = String.raw`[+-]?${UNSIGNED}`;
const REAL = new RegExp(`^${SIGNED}$`);
// re, then the sign of the imaginary part (± or +- meaning both), then |im|.
const COMPLEX = new RegExp(`^(${SIGNED})(±|\\+-|\\+|-)(${UNSIGNED})?[ij]$`);
const IMAGINARY = new RegExp(`^(±|\\+-|\\+|-)?(${UNSIGNED})?[ij]$`);

export class ListSyntaxError extends Error {}

export function splitItems(cell: string): string[] {
  return cell
    .split(/[\s;]+/)
    .map((s) => s.trim())
    .filter((s) => s.length > 0);
}

/** One item: one complex number, or two for a conjugate pair. */
export function parseComplexItem(item: string): ComplexValue[] {
  if (REAL.test(item)) return [{ re: Number(item), im: 0 }];
  let re = 0;
  let sign: string | undefined;
  let mag: string | undefined;
  const c = COMPLEX.exec(item);
  if (c) {
    re = Number(c[1]);
    sign = c[2];
    mag = c[3];
  } else {
    const i = IMAGINARY.exec(item);
    if (!i) throw new ListSyntaxError(`“${item}” is not a number; write a real number like -4 or a complex one like -2+3j (-2±3j for the pair).`);
    sign = i[1] ?? '+';
    mag = i[2];
  }
  const im = mag === undefined ? 1 : Number(mag);
  if (!Number.isFinite(re) || !Number.isFinite(im)) throw new ListSyntaxError(`“${item}” is too large a number.`);
  if (sign === '±' || sign === '+-') return [{ re, im }, { re, im: -im }];
  return [{ re, im: sign === '-' ? -im : im }];
}

export function parseComplexList(cell: string): ComplexValue[] {
  return splitItems(cell).flatMap(parseComplexItem);
}

export function parseRealList(cell: string): number[] {
  return splitItems(cell).map((item) => {
    if (!REAL.test(item)) throw new ListSyntaxError(`“${item}” is not a real number.`);
    const v = Number(item);
    if (!Number.isFinite(v)) throw new ListSyntaxError(`“${item}” is too large a number.`);
    return v;
  });
}

export function parseReal(cell: string): number {
  const t = cell.trim();
  if (!REAL.test(t)) throw new ListSyntaxError(`“${t}” is not a real number.`);
  const v = Number(t);
  if (!Number.isFinite(v)) throw new ListSyntaxError(`“${t}” is too large a number.`);
  return v;
}
