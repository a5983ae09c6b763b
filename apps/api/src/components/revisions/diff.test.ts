import { describe, expect, it } from 'vitest';

import { diffRequirements } from './diff.js';

describe('diffRequirements(before, after)', () => {
  it.each([
    ['maxOvershootPct', 10, 8, 'tightened'],
    ['maxOvershootPct', 8, 10, 'loosened'],
    ['maxSettlingTime', 1, 1.2, 'loosened'],
    ['maxPeakTime', 0.5, 0.4, 'tightened'],
    ['maxRiseTime', 0.3, 0.2, 'tightened'],
    ['maxNaturalFrequency', 80, 60, 'tightened'],
    ['minDampingRatio', 0.5, 0.6, 'tightened'],
    ['minDampingRatio', 0.6, 0.5, 'loosened'],
    ['settlingBandPct', 2, 5, 'loosened'],
    ['dominanceRatio', 5, 10, 'tightened'],
    ['marginPct', 0, 5, 'tightened'],
    ['maxOvershootPct', 10, 10, 'same'],
  ] as const)('%s from %d to %d is %s', (field, before, after, change) => {
    expect(diffRequirements({ [field]: before }, { [field]: after })).toEqual([{ field, before, after, change }]);
  });

  it('says added and removed for limits present on one side only, and leaves out fields on neither', () => {
    expect(diffRequirements({ maxPeakTime: 1 }, { maxRiseTime: 0.2 })).toEqual([
      { field: 'maxPeakTime', before: 1, after: null, change: 'removed' },
      { field: 'maxRiseTime', before: null, after: 0.2, change: 'added' },
    ]);
  });

  it('against nothing, every limit is added', () => {
    expect(diffRequirements(null, { maxOvershootPct: 5 })).toEqual([{ field: 'maxOvershootPct', before: null, after: 5, change: 'added' }]);
  });
});
