import { REQUIREMENT_FIELDS, type DiffChange, type RequirementField, type RevisionDiffRow } from '@polecourt/contracts';

// Which way is stricter for each field: for an upper limit a smaller value is
// tighter; for the damping floor, the dominance ratio and the margin a larger
// one; a narrower settling band is tighter.
const STRICTER_WHEN: Record<RequirementField, 'smaller' | 'larger'> = {
  maxOvershootPct: 'smaller',
  maxSettlingTime: 'smaller',
  settlingBandPct: 'smaller',
  maxPeakTime: 'smaller',
  maxRiseTime: 'smaller',
  minDampingRatio: 'larger',
  maxNaturalFrequency: 'smaller',
  dominanceRatio: 'larger',
  marginPct: 'larger',
};

function changeOf(field: RequirementField, before: number | null, after: number | null): DiffChange {
  if (before === null) return 'added';
  if (after === null) return 'removed';
  if (before === after) return 'same';
  const smaller = after < before;
  return (STRICTER_WHEN[field] === 'smaller') === smaller ? 'tightened' : 'loosened';
}

/** Limit by limit, in the contract's field order; fields absent from both sides are left out. */
export function diffRequirements(before: Record<string, number> | null, after: Record<string, number>): RevisionDiffRow[] {
  const rows: RevisionDiffRow[] = [];
  for (const field of REQUIREMENT_FIELDS) {
    const b = before?.[field] ?? null;
    const a = after[field] ?? null;
    if (b === null && a === null) continue;
    rows.push({ field, before: b, after: a, change: changeOf(field, b, a) });
  }
  return rows;
}
