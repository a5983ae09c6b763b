// Pole (x) and zero (o) marks written straight into an RGBA pixel buffer. With thousands of
// marks the browser's path rasteriser is the slow part of a redraw; setting a few pixels per
// mark and handing the buffer over once (putImageData) costs a fraction of it.

export interface PixelBuffer {
  data: Uint8ClampedArray;
  width: number;
  height: number;
}

export interface MarkStyle {
  /** Half the mark's extent, in buffer pixels. */
  radius: number;
  /** Stroke thickness, in buffer pixels. */
  thickness: number;
  /** Opaque colour as [r, g, b, a], 0-255. */
  rgba: readonly [number, number, number, number];
}

function put(buf: PixelBuffer, x: number, y: number, rgba: MarkStyle['rgba']): void {
  if (x < 0 || y < 0 || x >= buf.width || y >= buf.height) return;
  const i = (y * buf.width + x) * 4;
  buf.data[i] = rgba[0];
  buf.data[i + 1] = rgba[1];
  buf.data[i + 2] = rgba[2];
  buf.data[i + 3] = rgba[3];
}

/**
 * An x centred on each (points[2k], points[2k+1]), in buffer pixels: two diagonals, each
 * widened horizontally to `thickness` pixels.
 */
export function drawCrosses(buf: PixelBuffer, points: ArrayLike<number>, style: MarkStyle): void {
  const r = Math.max(1, Math.round(style.radius));
  const w = Math.max(1, Math.round(style.thickness));
  const lo = -(w >> 1);
  for (let k = 0; k + 1 < points.length; k += 2) {
    // Pixel (i, j) covers [i, i + 1): the pixel holding the centre is the floor.
    const cx = Math.floor(points[k]!);
    const cy = Math.floor(points[k + 1]!);
    for (let d = -r; d <= r; d++) {
      for (let o = lo; o < lo + w; o++) {
        put(buf, cx + d + o, cy + d, style.rgba);
        put(buf, cx + d + o, cy - d, style.rgba);
      }
    }
  }
}

/** An o (a ring of the given radius and thickness) centred on each point, in buffer pixels. */
export function drawRings(buf: PixelBuffer, points: ArrayLike<number>, style: MarkStyle): void {
  const r = Math.max(1, style.radius);
  const half = Math.max(1, style.thickness) / 2;
  const reach = Math.ceil(r + half);
  const inner = Math.max(0, r - half) ** 2;
  const outer = (r + half) ** 2;
  for (let k = 0; k + 1 < points.length; k += 2) {
    const px = points[k]!;
    const py = points[k + 1]!;
    const cx = Math.floor(px);
    const cy = Math.floor(py);
    for (let j = cy - reach; j <= cy + reach; j++) {
      for (let i = cx - reach; i <= cx + reach; i++) {
        // Distance from the pixel's centre to the mark's centre.
        const d = (i + 0.5 - px) ** 2 + (j + 0.5 - py) ** 2;
        if (d >= inner && d <= outer) put(buf, i, j, style.rgba);
      }
    }
  }
}
