// A small CSV writer (RFC 4180 quoting) that also defuses spreadsheet
// formulas: a cell starting with = + - @, a tab or a carriage return gets a
// leading single quote, as the OWASP "CSV Injection" page advises, so a
// candidate named =cmd|' /C calc'!A0 is shown as text, never run.
const FORMULA_START = /^[=+\-@\t\r]/;
const NEEDS_QUOTES = /[",\r\n]|^\s|\s$/;

export function csvCell(value: string | number | null | undefined): string {
  let s = value === null || value === undefined ? '' : String(value);
  if (FORMULA_START.test(s)) s = `'${s}`;
  return NEEDS_QUOTES.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
}

export function csvLine(cells: (string | number | null | undefined)[]): string {
  return cells.map(csvCell).join(',');
}

export function csvDocument(header: string[], rows: (string | number | null | undefined)[][]): string {
  return [csvLine(header), ...rows.map(csvLine)].join('\r\n') + '\r\n';
}
