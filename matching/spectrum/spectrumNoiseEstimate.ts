/**
 * Robust noise standard deviation of a spectrum's intensities, from the median absolute deviation
 * of first differences: σ ≈ 1.4826 · MAD(Δy) / √2. Differencing removes a slowly varying
 * baseline, and the median ignores the few points inside peaks, so no signal-free region has to be
 * named. (1.4826 = 1/Φ⁻¹(3/4) makes MAD a consistent σ estimate for Gaussian noise; Δy of
 * independent noise has variance 2σ²; both common practice.)
 * Returns 0 for noise-free data; throws RangeError for fewer than 3 points.
 */
export function spectrumNoiseEstimate(intensity: ArrayLike<number>): number {
  const n = intensity.length;
  if (n < 3) throw new RangeError(`noise estimate needs at least 3 points, got ${n}`);
  const d = new Float64Array(n - 1);
  for (let i = 1; i < n; i++) {
    const v = intensity[i] - intensity[i - 1];
    if (!Number.isFinite(v)) throw new RangeError(`intensity ${i} is not a finite number`);
    d[i - 1] = v;
  }
  const med = median(d);
  for (let i = 0; i < d.length; i++) d[i] = Math.abs(d[i] - med);
  return (1.4826 * median(d)) / Math.SQRT2;
}

function median(a: Float64Array): number {
  const s = Float64Array.from(a).sort();
  const m = s.length >> 1;
  return s.length % 2 ? s[m] : (s[m - 1] + s[m]) / 2;
}
