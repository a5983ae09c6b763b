import fc from 'fast-check';
import type { Requirements } from '../src/types.js';

// Random valid requirement sets for property tests: every limit optional, at
// least one present, values in the ranges engineers write.
export const requirementsArb: fc.Arbitrary<Requirements> = fc
  .record(
    {
      maxOvershootPct: fc.double({ min: 0.5, max: 60, noNaN: true }),
      maxSettlingTime: fc.double({ min: 0.2, max: 5, noNaN: true }),
      settlingBandPct: fc.constantFrom(1, 2, 5, 10),
      maxPeakTime: fc.double({ min: 0.1, max: 3, noNaN: true }),
      maxRiseTime: fc.double({ min: 0.05, max: 2, noNaN: true }),
      minDampingRatio: fc.double({ min: 0.05, max: 0.98, noNaN: true }),
      maxNaturalFrequency: fc.double({ min: 1, max: 40, noNaN: true }),
      marginPct: fc.constantFrom(0, 0, 5, 20),
    },
    { requiredKeys: [] },
  )
  .filter(
    (r) =>
      r.maxOvershootPct !== undefined ||
      r.maxSettlingTime !== undefined ||
      r.maxPeakTime !== undefined ||
      r.maxRiseTime !== undefined ||
      r.minDampingRatio !== undefined ||
      r.maxNaturalFrequency !== undefined,
  );
