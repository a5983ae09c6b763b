/** Pixel coordinates are written with two decimals: exact enough on screen and paper, short in a path. */
export function formatCoordinate(value: number): string {
  const rounded = Math.round(value * 100) / 100;
  return String(Object.is(rounded, -0) ? 0 : rounded);
}
