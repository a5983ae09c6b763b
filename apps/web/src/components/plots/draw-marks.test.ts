import { describe, expect, it } from 'vitest';

import { type PixelBuffer, drawCrosses, drawRings } from './draw-marks';

const INK = [10, 20, 30, 255] as const;
const buffer = (width: number, height: number): PixelBuffer => ({ data: new Uint8ClampedArray(width * height * 4), width, height });
const at = (b: PixelBuffer, x: number, y: number) => Array.from(b.data.subarray((y * b.width + x) * 4, (y * b.width + x) * 4 + 4));
const painted = (b: PixelBuffer) => {
  let n = 0;
  for (let i = 3; i < b.data.length; i += 4) if (b.data[i] !== 0) n++;
  return n;
};

describe('drawCrosses(buffer, points, style)', () => {
  it('sets the two diagonals of each x and nothing else', () => {
    const b = buffer(20, 20);
    drawCrosses(b, [10.4, 10.6], { radius: 3, thickness: 1, rgba: INK });
    for (let d = -3; d <= 3; d++) {
      expect(at(b, 10 + d, 10 + d)).toEqual([...INK]);
      expect(at(b, 10 + d, 10 - d)).toEqual([...INK]);
    }
    expect(painted(b)).toBe(13); // 2 x 7 pixels, the centre shared
    expect(at(b, 11, 10)).toEqual([0, 0, 0, 0]);
  });

  it('widens each stroke to the thickness and draws every mark given', () => {
    const b = buffer(40, 20);
    drawCrosses(b, [5, 5, 30, 12], { radius: 2, thickness: 2, rgba: INK });
    expect(at(b, 4, 5)).toEqual([...INK]);
    expect(at(b, 30, 12)).toEqual([...INK]);
    expect(at(b, 28, 10)).toEqual([...INK]);
    expect(painted(b)).toBe(2 * 18); // per mark: 2 diagonals x 5 rows x 2 pixels, 2 shared at the centre
  });

  it('clips marks at the buffer edge without wrapping into the next row', () => {
    const b = buffer(10, 10);
    drawCrosses(b, [0, 0], { radius: 3, thickness: 1, rgba: INK });
    expect(at(b, 3, 3)).toEqual([...INK]);
    expect(at(b, 9, 2)).toEqual([0, 0, 0, 0]);
    expect(painted(b)).toBe(4);
  });
});

describe('drawRings(buffer, points, style)', () => {
  it('sets a ring at the radius and leaves the centre and the outside clear', () => {
    const b = buffer(20, 20);
    drawRings(b, [10.5, 10.5], { radius: 4, thickness: 1.5, rgba: INK });
    expect(at(b, 14, 10)).toEqual([...INK]);
    expect(at(b, 6, 10)).toEqual([...INK]);
    expect(at(b, 10, 6)).toEqual([...INK]);
    expect(at(b, 10, 10)).toEqual([0, 0, 0, 0]);
    expect(at(b, 17, 10)).toEqual([0, 0, 0, 0]);
    // Symmetric about the centre (pixel x mirrors to 20 - x about 10.5).
    for (let y = 1; y < 20; y++) for (let x = 1; x < 20; x++) expect(at(b, x, y)[3]).toBe(at(b, 20 - x, 20 - y)[3]);
  });
});
