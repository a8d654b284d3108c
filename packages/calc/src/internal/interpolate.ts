/**
 * Piecewise-linear interpolation of `ys` over ascending `xs` at `x`; beyond the ends it
 * extends the first or last segment. Both arrays must have the same length ≥ 2.
 */
export function interpolateLinear(xs: readonly number[], ys: readonly number[], x: number): number {
  const last = xs.length - 1;
  let i = 0;
  if (x >= (xs[last - 1] ?? 0)) i = last - 1;
  else while (i < last - 1 && x > (xs[i + 1] ?? 0)) i += 1;
  const x0 = xs[i] ?? 0;
  const x1 = xs[i + 1] ?? 0;
  const y0 = ys[i] ?? 0;
  const y1 = ys[i + 1] ?? 0;
  return y0 + ((y1 - y0) * (x - x0)) / (x1 - x0);
}

/** Index of the first item of ascending `xs` that is ≥ `x` (within 1e-9), or -1. */
export function firstAtLeast(xs: readonly number[], x: number): number {
  for (let i = 0; i < xs.length; i += 1) if ((xs[i] ?? 0) >= x - 1e-9) return i;
  return -1;
}

/** Index of the item of `xs` equal to `x` within `tolerance`, or -1. */
export function indexOfClose(xs: readonly number[], x: number, tolerance = 1e-6): number {
  for (let i = 0; i < xs.length; i += 1) if (Math.abs((xs[i] ?? 0) - x) <= tolerance) return i;
  return -1;
}
