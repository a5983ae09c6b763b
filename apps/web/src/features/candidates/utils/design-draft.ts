// The candidate entry form's state and its translation to the engine's design, with every
// complaint (the form's own, the engine's designSchema/parseDesign, the server's `fields`)
// put under the input it is about.
//
// Complex poles and zeros are typed once: each row with a non-zero imaginary part stands for
// the conjugate pair, and the design gets the row and then its conjugate. `slots` remembers
// which row each position of the design's list came from, so an engine path such as
// `poles[3].im` finds its way back to "pole 2, imaginary part".
import { candidateInputBaseSchema } from '@polecourt/contracts';
import { type Complex, type DesignInput, type Model, SpecInputError, designSchema, parseDesign } from '@polecourt/spec';

import { parseNumberInput, parseNumberList } from '@/lib/format';

export type DesignForm = 'zpk' | 'polynomial';
export type RootKind = 'poles' | 'zeros';

export interface RootRow {
  key: string;
  re: string;
  im: string;
}

export interface DesignDraft {
  name: string;
  notes: string;
  form: DesignForm;
  poles: RootRow[];
  zeros: RootRow[];
  gain: string;
  numerator: string;
  denominator: string;
}

/** Error keys: name, notes, gain, numerator, denominator, poles, zeros, design, and `poles.<rowKey>.re|im|row`. */
export type DraftErrors = Record<string, string>;

export interface Slot {
  kind: RootKind;
  rowKey: string;
  /** 1-based number of the row as the form shows it. */
  rowNumber: number;
  conjugate: boolean;
}

let nextKey = 0;
export function newRow(re = '', im = ''): RootRow {
  nextKey += 1;
  return { key: `r${nextKey}`, re, im };
}

export function emptyDraft(): DesignDraft {
  return { name: '', notes: '', form: 'zpk', poles: [newRow()], zeros: [], gain: '', numerator: '', denominator: '' };
}

export function rowFieldKey(kind: RootKind, rowKey: string, part: 're' | 'im' | 'row'): string {
  return `${kind}.${rowKey}.${part}`;
}

const WORD: Record<RootKind, string> = { poles: 'Pole', zeros: 'Zero' };

/** The imaginary part a row stands for; an empty box means a real value. */
function imagOf(row: RootRow): number | null {
  return row.im.trim() === '' ? 0 : parseNumberInput(row.im);
}

/** The conjugate shown beside a complex row, or null while the row is real or not yet a number. */
export function conjugateOf(row: RootRow): Complex | null {
  const re = parseNumberInput(row.re);
  const im = imagOf(row);
  if (re === null || im === null || im === 0) return null;
  return { re, im: -im };
}

function expandRoots(kind: RootKind, rows: RootRow[], errors: DraftErrors, slots: Slot[]): Complex[] {
  const out: Complex[] = [];
  rows.forEach((row, i) => {
    const re = parseNumberInput(row.re);
    const im = imagOf(row);
    const label = `${WORD[kind]} ${i + 1}`;
    if (re === null) {
      errors[rowFieldKey(kind, row.key, 're')] =
        row.re.trim() === '' ? `${label}: type the real part.` : `${label}: the real part “${row.re.trim()}” is not a number.`;
    }
    if (im === null) errors[rowFieldKey(kind, row.key, 'im')] = `${label}: the imaginary part “${row.im.trim()}” is not a number.`;
    if (re === null || im === null) return;
    out.push({ re, im });
    slots.push({ kind, rowKey: row.key, rowNumber: i + 1, conjugate: false });
    if (im !== 0) {
      out.push({ re, im: -im });
      slots.push({ kind, rowKey: row.key, rowNumber: i + 1, conjugate: true });
    }
  });
  return out;
}

function listError(field: 'numerator' | 'denominator', text: string, errors: DraftErrors): number[] | null {
  const parsed = parseNumberList(text);
  if (parsed.ok) return parsed.values;
  errors[field] = parsed.message;
  return null;
}

/** Converts a zod issue path (['poles', 1, 'im']) to the engine's notation ('poles[1].im'). */
export function pathToString(path: readonly PropertyKey[]): string {
  let out = '';
  for (const part of path) {
    if (typeof part === 'number') out += `[${part}]`;
    else out += out === '' ? String(part) : `.${String(part)}`;
  }
  return out;
}

/**
 * Where an engine or server path belongs on the form. `path` is relative to the design
 * ('poles[1].im') or to the request body ('design.poles[1].im', 'name').
 */
export function placeError(path: string, message: string, slots: readonly Slot[], errors: DraftErrors): void {
  const rel = path.startsWith('design.') ? path.slice('design.'.length) : path.startsWith('design[') ? path.slice('design'.length) : path;
  if (rel === 'name' || rel === 'notes') {
    errors[rel] ??= message;
    return;
  }
  const root = /^(poles|zeros)\[(\d+)\](?:\.(re|im))?/.exec(rel);
  if (root) {
    const kind = root[1] as RootKind;
    const index = Number(root[2]);
    const part = (root[3] as 're' | 'im' | undefined) ?? 'row';
    const slot = slots.filter((s) => s.kind === kind)[index];
    if (slot) {
      const where = `${WORD[kind]} ${slot.rowNumber}${slot.conjugate ? ' (its conjugate)' : ''}`;
      const what = part === 're' ? ', real part' : part === 'im' ? ', imaginary part' : '';
      errors[rowFieldKey(kind, slot.rowKey, part)] ??= `${where}${what}: ${message}`;
      return;
    }
    errors[kind] ??= message;
    return;
  }
  const coefficient = /^(numerator|denominator)(?:\[(\d+)\])?/.exec(rel);
  if (coefficient) {
    const field = coefficient[1] as 'numerator' | 'denominator';
    const at = coefficient[2] === undefined ? '' : `Coefficient ${Number(coefficient[2]) + 1}: `;
    errors[field] ??= `${at}${message}`;
    return;
  }
  if (rel === 'poles' || rel === 'zeros' || rel === 'gain') {
    errors[rel] ??= message;
    return;
  }
  errors.design ??= message;
}

export interface BuiltDesign {
  design: DesignInput | null;
  /** The engine's normalised model (both forms filled in), when the design is valid. */
  model: Model | null;
  errors: DraftErrors;
  slots: Slot[];
}

/** The design the form describes, checked the way the server will check it. */
export function buildDesign(draft: DesignDraft): BuiltDesign {
  const errors: DraftErrors = {};
  const slots: Slot[] = [];
  let design: DesignInput | null = null;
  if (draft.form === 'zpk') {
    const poles = expandRoots('poles', draft.poles, errors, slots);
    const zeros = expandRoots('zeros', draft.zeros, errors, slots);
    const gain = parseNumberInput(draft.gain);
    if (gain === null) errors.gain = draft.gain.trim() === '' ? 'Type the gain.' : `The gain “${draft.gain.trim()}” is not a number.`;
    if (draft.poles.length === 0) errors.poles = 'Add at least one pole.';
    if (Object.keys(errors).length === 0 && gain !== null) design = { poles, zeros, gain };
  } else {
    const numerator = listError('numerator', draft.numerator, errors);
    const denominator = listError('denominator', draft.denominator, errors);
    if (numerator && denominator) design = { numerator, denominator };
  }
  if (!design) return { design: null, model: null, errors, slots };

  // The engine's own checks, in the browser: shape first (designSchema), then the rules (parseDesign).
  const shape = designSchema.safeParse(design);
  if (!shape.success) {
    for (const issue of shape.error.issues) placeError(pathToString(issue.path), issue.message, slots, errors);
    return { design: null, model: null, errors, slots };
  }
  let model: Model;
  try {
    model = parseDesign(design);
  } catch (error) {
    if (!(error instanceof Error) || error.name !== 'SpecInputError') throw error;
    placeError((error as SpecInputError).path, error.message, slots, errors);
    return { design: null, model: null, errors, slots };
  }
  return { design, model, errors, slots };
}

/** The name and notes as the contract checks them, with the same messages. */
export function textErrors(draft: DesignDraft): DraftErrors {
  const errors: DraftErrors = {};
  const result = candidateInputBaseSchema.safeParse({ name: draft.name, notes: draft.notes });
  if (!result.success) for (const issue of result.error.issues) errors[pathToString(issue.path) || 'name'] ??= issue.message;
  return errors;
}
