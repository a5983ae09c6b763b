// Polecourt's report numbers: "PCR-", the UTC year of signing, and the
// year's running count in six digits (PCR-2026-000123).
const PATTERN = /^PCR-(\d{4})-(\d{6,})$/;

export function formatReportNumber(year: number, sequence: number): string {
  return `PCR-${year}-${String(sequence).padStart(6, '0')}`;
}

export function parseReportNumber(number: string): { year: number; sequence: number } | null {
  const m = PATTERN.exec(number);
  return m ? { year: Number(m[1]), sequence: Number(m[2]) } : null;
}
