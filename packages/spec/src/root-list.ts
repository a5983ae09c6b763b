import type { Complex } from './types.js';

// Every list of roots the engine builds starts at this one array literal and
// grows by push. V8's allocation-site feedback then makes even an empty list
// an array of objects, so a design without zeros has the same array shape as
// one with them, and optimised engine code is not thrown away (and compiled
// again) when the two alternate in a batch.
export function newRootList(): Complex[] {
  return [];
}
