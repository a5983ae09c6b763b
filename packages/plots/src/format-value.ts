/** A number for a label: three significant figures, no trailing zeros (9.48, 0.591, 1200). */
export function formatValue(value: number): string {
  if (!Number.isFinite(value)) return String(value);
  const rounded = Number(value.toPrecision(3));
  return String(Object.is(rounded, -0) ? 0 : rounded);
}
