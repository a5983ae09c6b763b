import { parse as parseCsv } from 'csv-parse/sync';

import { AppError } from '../../lib/app-error.js';
import { ListSyntaxError, parseComplexList, parseReal, parseRealList } from './complex-list.js';

// Turns an uploaded file into candidate rows. The format is told by content,
// not by the file name: a file whose first character (after a byte-order
// mark and white space) is { or [ is JSON, anything else CSV.

/** One row of an upload before checking: its position, and either raw input or syntax errors. */
export interface RawRow {
  row: number;
  name: string | null;
  input?: { name?: unknown; notes?: unknown; design?: unknown };
  errors?: Record<string, string>;
  /** CSV rows name their errors by column; JSON rows by field path under design. */
  source: 'json' | 'csv';
}

/** Rows per file: one upload is one transaction, and a long one holds up other writers. */
export const MAX_UPLOAD_ROWS = 5000;

export const CSV_COLUMNS = ['name', 'notes', 'gain', 'poles', 'zeros', 'numerator', 'denominator'] as const;

const uploadError = (message: string) => AppError.badRequest('invalid_upload', message, { file: message });

export function readUpload(buffer: Buffer): RawRow[] {
  const text = buffer.toString('utf8').replace(/^\uFEFF/, '');
  const first = text.trimStart()[0];
  if (first === undefined) throw uploadError('The file is empty.');
  const rows = first === '{' || first === '[' ? jsonRows(text) : csvRows(text);
  if (rows.length > MAX_UPLOAD_ROWS) throw uploadError(`The file has ${rows.length} candidates; upload at most ${MAX_UPLOAD_ROWS} per file.`);
  return rows;
}

function jsonRows(text: string): RawRow[] {
  let data: unknown;
  try {
    data = JSON.parse(text);
  } catch (err) {
    throw uploadError(`The file looks like JSON but cannot be read: ${(err as Error).message}`);
  }
  let list: unknown[];
  if (Array.isArray(data)) list = data;
  else if (data && typeof data === 'object' && Array.isArray((data as { candidates?: unknown }).candidates)) list = (data as { candidates: unknown[] }).candidates;
  else if (data && typeof data === 'object') list = [data];
  else throw uploadError('A JSON upload is one candidate object, a list of them, or {"candidates": [...]}.');
  if (list.length === 0) throw uploadError('The file has no candidates.');
  return list.map((item, i) => {
    const row = i + 1;
    if (!item || typeof item !== 'object' || Array.isArray(item)) {
      return { row, name: null, source: 'json', errors: { _: 'Each candidate must be an object {name, notes, design}.' } };
    }
    const o = item as Record<string, unknown>;
    const unknown = Object.keys(o).filter((k) => !['name', 'notes', 'design'].includes(k));
    const name = typeof o.name === 'string' ? o.name : null;
    if (unknown.length) return { row, name, source: 'json', errors: { [unknown[0]!]: `“${unknown[0]}” is not a field of a candidate; use name, notes and design.` } };
    return { row, name, source: 'json', input: { name: o.name, notes: o.notes, design: o.design } };
  });
}

function csvRows(text: string): RawRow[] {
  let records: { info: { lines: number }; record: string[] }[];
  try {
    records = parseCsv(text, { skip_empty_lines: true, relax_column_count: true, info: true, trim: true }) as unknown as typeof records;
  } catch (err) {
    throw uploadError(`The CSV file cannot be read: ${(err as Error).message}`);
  }
  const [header, ...body] = records;
  if (!header) throw uploadError('The file is empty.');
  const columns = header.record.map((h) => h.trim().toLowerCase());
  const unknown = columns.filter((c) => !(CSV_COLUMNS as readonly string[]).includes(c));
  if (unknown.length) {
    throw uploadError(`Unknown column “${unknown[0]}” in the header; the columns are ${CSV_COLUMNS.join(', ')}.`);
  }
  if (!columns.includes('name')) throw uploadError('The header needs a name column.');
  const dup = columns.find((c, i) => columns.indexOf(c) !== i);
  if (dup) throw uploadError(`The column “${dup}” appears twice in the header.`);
  if (body.length === 0) throw uploadError('The file has a header but no candidates.');
  return body.map(({ info, record }) => csvRow(info.lines, columns, record));
}

function csvRow(row: number, columns: string[], cells: string[]): RawRow {
  const get = (c: string): string => {
    const i = columns.indexOf(c);
    return i >= 0 ? (cells[i] ?? '').trim() : '';
  };
  const name = get('name') || null;
  if (cells.length > columns.length) {
    return { row, name, source: 'csv', errors: { _: `This row has ${cells.length} cells but the header has ${columns.length} columns (quote a cell that contains a comma).` } };
  }
  const errors: Record<string, string> = {};
  const attempt = <T>(column: string, f: (cell: string) => T): T | undefined => {
    try {
      return f(get(column));
    } catch (err) {
      if (!(err instanceof ListSyntaxError)) throw err;
      errors[column] = err.message;
      return undefined;
    }
  };
  const zpk = ['gain', 'poles', 'zeros'].some((c) => get(c) !== '');
  const polynomial = ['numerator', 'denominator'].some((c) => get(c) !== '');
  let design: Record<string, unknown> | undefined;
  if (zpk && polynomial) {
    errors.design = 'Use either gain and poles (and zeros), or numerator and denominator, not both.';
  } else if (!zpk && !polynomial) {
    errors.design = 'Give either gain and poles (and zeros), or numerator and denominator.';
  } else if (zpk) {
    if (get('gain') === '') errors.gain = 'A gain is needed with poles and zeros.';
    const gain = get('gain') === '' ? undefined : attempt('gain', parseReal);
    const poles = attempt('poles', parseComplexList);
    const zeros = attempt('zeros', parseComplexList);
    design = { gain, poles, zeros };
  } else {
    if (get('numerator') === '') errors.numerator = 'A numerator is needed with the denominator.';
    if (get('denominator') === '') errors.denominator = 'A denominator is needed with the numerator.';
    design = { numerator: attempt('numerator', parseRealList), denominator: attempt('denominator', parseRealList) };
  }
  if (Object.keys(errors).length) return { row, name, source: 'csv', errors };
  return { row, name, source: 'csv', input: { name: get('name'), notes: get('notes'), design } };
}
