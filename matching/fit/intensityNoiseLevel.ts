/**
 * Robust RMS noise of a sampled spectrum: the median absolute first difference divided by
 * 0.6745·√2 (for white Gaussian noise the difference of two samples has σ√2, and the median
 * absolute deviation of a normal variable is 0.6745σ). Peaks occupy few points, so they barely
 * move the median.
 */
export function intensityNoiseLevel(y: ArrayLike<number>): number {
  if (y.length < 3) throw new RangeError(`need at least 3 points to estimate noise, got ${y.length}`);
  const d = new Float64Array(y.length - 1);
  for (let i = 1; i < y.length; i++) d[i - 1] = Math.abs(y[i] - y[i - 1]);
  d.sort();
  const m = d.length >> 1;
  const med = d.length % 2 ? d[m] : (d[m - 1] + d[m]) / 2;
  return med / (0.6745 * Math.SQRT2);
}
