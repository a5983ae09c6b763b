// Collinearity by the cross product (the area of the triangle a, p, b is zero
// exactly when p lies on the line ab): elementary analytic geometry, no source needed beyond that.
import { describe, expect, it } from 'vitest';

import { dropCollinear } from './drop-collinear.js';

describe('dropCollinear', () => {
  it('keeps only the corners of a square sampled densely along its sides', () => {
    const pts = [];
    for (let k = 0; k <= 100; k++) pts.push({ re: -20, im: k / 10 }); // up the left side
    for (let k = 1; k <= 100; k++) pts.push({ re: -20 + k / 10, im: 10 }); // along the top
    for (let k = 1; k <= 100; k++) pts.push({ re: -10, im: 10 - k / 10 }); // down the right side
    const out = dropCollinear(pts);
    expect(out).toEqual([
      { re: -20, im: 0 },
      { re: -20, im: 10 },
      { re: -10, im: 10 },
      { re: -10, im: 0 },
    ]);
  });

  it('keeps samples of a ray from the origin only at its ends, despite rounding in cos and sin', () => {
    const theta = 0.93;
    const pts = Array.from({ length: 200 }, (_, k) => ({ re: -(k + 1) * Math.cos(theta), im: (k + 1) * Math.sin(theta) }));
    expect(dropCollinear(pts)).toEqual([pts[0], pts[199]]);
  });

  it('keeps every point of a circular arc', () => {
    const pts = Array.from({ length: 50 }, (_, k) => ({ re: -5 * Math.cos(k / 49), im: 5 * Math.sin(k / 49) }));
    expect(dropCollinear(pts)).toHaveLength(50);
  });

  it('keeps a point where the line turns back on itself', () => {
    const pts = [
      { re: 0, im: 0 },
      { re: 2, im: 0 },
      { re: 1, im: 0 },
    ];
    expect(dropCollinear(pts)).toEqual(pts);
  });

  it('leaves short lines alone and does not change its input', () => {
    const two = [
      { re: 1, im: 1 },
      { re: 2, im: 2 },
    ];
    expect(dropCollinear(two)).toEqual(two);
    const three = [{ re: 0, im: 0 }, { re: 1, im: 1 }, { re: 2, im: 2 }];
    const copy = JSON.parse(JSON.stringify(three));
    dropCollinear(three);
    expect(three).toEqual(copy);
  });
});
