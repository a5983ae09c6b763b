// Plain shapes shared by the plot generators. Everything returned is
// JSON-like data (numbers, strings, arrays), so the web client and the PDF
// writer read the same geometry the same way.

export interface Complex {
  re: number;
  im: number;
}

/** A rectangle of the s-plane: real parts reMin..reMax, imaginary parts imMin..imMax. */
export interface Viewport {
  reMin: number;
  reMax: number;
  imMin: number;
  imMax: number;
}

export interface Margin {
  top: number;
  right: number;
  bottom: number;
  left: number;
}

/** The plotting area inside the pixel box, in pixels from the box's top left. */
export interface Frame {
  x: number;
  y: number;
  width: number;
  height: number;
}

export interface Point {
  x: number;
  y: number;
}

/**
 * A text placed at (x, y). `anchor` is where (x, y) sits on the text's line:
 * its start, middle or end; `baseline` whether (x, y) is the top, middle or
 * bottom of the line box.
 */
export interface Label {
  x: number;
  y: number;
  text: string;
  anchor: 'start' | 'middle' | 'end';
  baseline: 'top' | 'middle' | 'bottom';
  /** Degrees, clockwise, about (x, y). */
  rotate?: number;
}

export interface Tick {
  value: number;
  /** Pixel position along the axis (x for the horizontal axis, y for the vertical one). */
  position: number;
  label: string;
}

export interface Axis {
  ticks: Tick[];
  /** The tick spacing: 1, 2 or 5 times a power of ten. */
  step: number;
  title: Label;
}

export interface SampledPoint {
  t: number;
  y: number;
}
