import { REPORT_MEANING_LABELS, type ReportRecord } from '@polecourt/contracts';

/** The verdict as the product says it: a word, always shown beside its colour. */
export function verdictWord(verdict: ReportRecord['verdict']): string {
  return verdict === 'compliant' ? 'Compliant' : 'Not compliant';
}

export function meaningWord(meaning: ReportRecord['meaning']): string {
  return REPORT_MEANING_LABELS[meaning];
}

/** A stored time as UTC, the way the report prints it. */
export function utc(iso: string): string {
  const d = new Date(iso);
  return Number.isNaN(d.getTime()) ? iso : `${d.toISOString().slice(0, 16).replace('T', ' ')} UTC`;
}

export function shortHash(hash: string): string {
  return hash.length > 16 ? `${hash.slice(0, 12)}…` : hash;
}
