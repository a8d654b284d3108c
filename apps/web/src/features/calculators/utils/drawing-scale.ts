/** A uniform metres-to-pixels mapping for a drawing, so it stays to scale. */
export interface DrawingScale {
  widthPx: number;
  heightPx: number;
  /** Pixels per metre, the same across and up. */
  pxPerM: number;
  x: (m: number) => number;
  /** Height above the seabed (m) to an SVG y (down the page). */
  y: (m: number) => number;
}

/**
 * Fits `spanM` across and `riseM` up into `widthPx` with `padPx` all round, using one scale in both
 * directions; the height follows from it (at least `minHeightPx`).
 */
export function drawingScale(
  spanM: number,
  riseM: number,
  widthPx = 640,
  padPx = 28,
  minHeightPx = 140,
): DrawingScale {
  const pxPerM = (widthPx - 2 * padPx) / Math.max(spanM, 1e-6);
  const heightPx = Math.max(minHeightPx, riseM * pxPerM + 2 * padPx);
  const bottom = heightPx - padPx;
  return {
    widthPx,
    heightPx,
    pxPerM,
    x: (m) => padPx + m * pxPerM,
    y: (m) => bottom - m * pxPerM,
  };
}

/** SVG path data through points already in pixels. */
export function pathThrough(points: ReadonlyArray<readonly [number, number]>): string {
  return points
    .map(([x, y], i) => `${i === 0 ? 'M' : 'L'}${x.toFixed(1)} ${y.toFixed(1)}`)
    .join(' ');
}
