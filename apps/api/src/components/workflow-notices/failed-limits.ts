import type { Check, Requirements } from '@polecourt/spec';

type LimitKey = Check['requirement'];

const WORDS: Partial<Record<LimitKey, { name: string; unit: string; floor?: boolean }>> = {
  maxOvershootPct: { name: 'percent overshoot', unit: ' %' },
  maxSettlingTime: { name: 'settling time', unit: ' s' },
  maxPeakTime: { name: 'peak time', unit: ' s' },
  maxRiseTime: { name: 'rise time (10-90 %)', unit: ' s' },
  minDampingRatio: { name: 'damping ratio', unit: '', floor: true },
  maxNaturalFrequency: { name: 'natural frequency', unit: ' rad/s' },
};

/** Four significant figures, without trailing zeros. */
const num = (v: number): string => String(Number(v.toPrecision(4)));

/**
 * One plain line per limit a model missed, for the "not compliant" message:
 * "settling time (2 % band): 0.41 s, limit 0.3 s". A limit tightened by the
 * requirement set's margin says so; a check with no value gives its reason.
 */
export function failedLimitLines(checks: readonly Check[], settlingBandPct: number | null): string[] {
  return checks
    .filter((c) => c.status === 'fail')
    .map((c) => {
      const w = WORDS[c.requirement as keyof Requirements] ?? { name: String(c.requirement), unit: '' };
      const name = c.requirement === 'maxSettlingTime' && settlingBandPct !== null ? `${w.name} (${num(settlingBandPct)} % band)` : w.name;
      const kind = w.floor ? 'floor' : 'limit';
      const limit =
        c.effectiveLimit !== undefined && c.effectiveLimit !== c.limit
          ? `${kind} ${num(c.limit)}${w.unit} (${num(c.effectiveLimit)}${w.unit} with the margin)`
          : `${kind} ${num(c.limit)}${w.unit}`;
      if (c.value === null) return `${name}: no value (${c.reason ?? 'not computed'}), ${limit}`;
      return `${name}: ${num(c.value)}${w.unit}, ${limit}`;
    });
}
