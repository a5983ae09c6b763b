// Numbers as Polecourt shows and reads them: 3 to 4 significant figures with their unit on
// screen, and inputs accepted the way engineers type them (0.5, 5e-1, -.25, 1.5E3).

/** A number with `digits` significant figures (4 by default), no trailing zeros, ASCII minus. */
export function formatNumber(value: number | null | undefined, digits = 4): string {
  if (value === null || value === undefined || Number.isNaN(value)) return '—';
  if (!Number.isFinite(value)) return value > 0 ? '∞' : '-∞';
  if (value === 0) return '0';
  const abs = Math.abs(value);
  // Very large or very small values read better in exponent form than as a string of zeros.
  if (abs >= 1e6 || abs < 1e-4) {
    const [mantissa = '0', exponent = '0'] = value.toExponential(digits - 1).split('e');
    return `${String(Number(mantissa))}e${exponent.replace('+', '')}`;
  }
  const rounded = Number(value.toPrecision(digits));
  return String(Object.is(rounded, -0) ? 0 : rounded);
}

/** A number and its unit, e.g. "0.1899 s", "9.393 %", "32 rad/s"; a dash for no value. */
export function formatQuantity(value: number | null | undefined, unit: string, digits = 4): string {
  const text = formatNumber(value, digits);
  if (text === '—' || unit === '') return text;
  return `${text} ${unit}`;
}

/** A complex number as "-2 + 3j", "-2 - 3j", "4j" or "-15" (real). */
export function formatComplex(c: { re: number; im: number }, digits = 4): string {
  if (c.im === 0) return formatNumber(c.re, digits);
  const re = c.re === 0 ? '' : `${formatNumber(c.re, digits)} `;
  const sign = c.im < 0 ? '-' : c.re === 0 ? '' : '+';
  const im = formatNumber(Math.abs(c.im), digits);
  return `${re}${sign}${sign && re ? ' ' : ''}${im}j`;
}

const NUMBER_PATTERN = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$/;

/**
 * A typed number, or null when the text is not one. Accepts the usual decimal and exponent
 * forms and a typographic minus (pasted from documents); refuses hex, "Infinity" and blanks,
 * which Number() would quietly turn into something.
 */
export function parseNumberInput(text: string): number | null {
  const cleaned = text.trim().replace(/[\u2212\u2012\u2013]/g, '-');
  if (!NUMBER_PATTERN.test(cleaned)) return null;
  const value = Number(cleaned);
  return Number.isFinite(value) ? value : null;
}

export type NumberListResult = { ok: true; values: number[] } | { ok: false; message: string };

/** A list typed as "1, 19, 73, 195" (commas, semicolons or spaces between the items). */
export function parseNumberList(text: string): NumberListResult {
  const items = text
    .split(/[\s,;]+/)
    .map((s) => s.trim())
    .filter((s) => s !== '');
  if (items.length === 0) return { ok: false, message: 'Type at least one number, e.g. 1, 19, 73, 195.' };
  const values: number[] = [];
  for (const [i, item] of items.entries()) {
    const value = parseNumberInput(item);
    if (value === null) return { ok: false, message: `Item ${i + 1} (“${item}”) is not a number.` };
    values.push(value);
  }
  return { ok: true, values };
}

/** A percentage with its sign spelled out, for margins: "+21.73 %", "-4.2 %". */
export function formatSignedPercent(value: number | null | undefined, digits = 4): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return '—';
  const text = formatNumber(Math.abs(value), digits);
  return `${value < 0 ? '-' : value > 0 ? '+' : ''}${text} %`;
}
