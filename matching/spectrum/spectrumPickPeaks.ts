import { gsd } from 'ml-gsd';
import { spectrumNoiseEstimate } from './spectrumNoiseEstimate';

export interface PickPeaksOptions {
  /** Minimum signal-to-noise ratio (height / noise σ) for a peak to count. Default 3 (ICH Q2(R1) detection limit; common practice). */
  snrThreshold?: number;
  /** Spectrometer 1H frequency, MHz, for widths in Hz. Default: the spectrum's own `mhz`. */
  mhz?: number;
}

export interface PickedPeak {
  shift: number;
  /** Height above the baseline. */
  height: number;
  /** Trapezoid area above the baseline between the surrounding valleys, in ppm × intensity units. */
  integral: number;
  /** Full width at half height, Hz (interpolated). */
  widthHz: number;
  snr: number;
}

export interface PickPeaksResult {
  /** Peaks at or above the S/N threshold, by ascending shift. */
  peaks: PickedPeak[];
  /** Local maxima above 1.5 σ but below the threshold, or narrower than 1.5 sampling intervals (reported, never used). */
  belowThreshold: PickedPeak[];
  /** Noise standard deviation (robust estimate). */
  noise: number;
  /** Baseline level (median intensity). */
  baseline: number;
}

interface SpectrumLike {
  ppm: ArrayLike<number>;
  intensity: ArrayLike<number>;
  mhz: number;
}

/**
 * Picks the peaks of a 1D spectrum: local maxima found by ml-gsd (Savitzky–Golay derivatives),
 * kept when height/σ ≥ snrThreshold, with σ from spectrumNoiseEstimate and the baseline taken as
 * the median intensity (a spectrum is mostly baseline). Width and integral are measured on the
 * data, not on a fitted shape, so they do not depend on the line shape being Lorentzian.
 */
export function spectrumPickPeaks(spectrum: SpectrumLike, options: PickPeaksOptions = {}): PickPeaksResult {
  const snrThreshold = options.snrThreshold ?? 3;
  const mhz = options.mhz ?? spectrum.mhz;
  if (!(snrThreshold > 0)) throw new RangeError(`snrThreshold must be positive, got ${snrThreshold}`);
  if (!(mhz > 0)) throw new RangeError(`spectrometer frequency must be positive, got ${mhz}`);
  const n = spectrum.ppm.length;
  if (n !== spectrum.intensity.length) throw new RangeError(`ppm has ${n} points but intensity has ${spectrum.intensity.length}`);
  if (n < 5) throw new RangeError(`a spectrum needs at least 5 points, got ${n}`);
  // gsd needs x ascending; NMR axes often run high → low.
  const asc = spectrum.ppm[n - 1] > spectrum.ppm[0];
  const x = new Float64Array(n);
  const y = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const j = asc ? i : n - 1 - i;
    x[i] = spectrum.ppm[j];
    y[i] = spectrum.intensity[j];
    if (!Number.isFinite(x[i]) || !Number.isFinite(y[i])) throw new RangeError(`point ${j} is not a finite number`);
    if (i > 0 && !(x[i] > x[i - 1])) throw new RangeError(`ppm axis must be strictly monotonic (point ${j})`);
  }
  const baseline = Float64Array.from(y).sort()[n >> 1];
  let maxAbs = 0;
  for (let i = 0; i < n; i++) maxAbs = Math.max(maxAbs, Math.abs(y[i] - baseline));
  // Noise-free synthetic data would give σ = 0 and infinite S/N; a floor keeps S/N finite.
  const noise = Math.max(spectrumNoiseEstimate(y), maxAbs * 1e-9, Number.MIN_VALUE);
  const found = gsd(
    { x, y },
    { noiseLevel: baseline + 1.5 * noise, minMaxRatio: 0, smoothY: false, sgOptions: { windowSize: 5, polynomial: 3 } },
  );
  const peaks: PickedPeak[] = [];
  const below: PickedPeak[] = [];
  const seen = new Set<number>();
  for (const p of found) {
    // gsd also reports inflections on the flanks of large lines; climb to the true maximum and
    // keep each maximum once.
    let i = nearestIndex(x, p.x);
    while (i + 1 < n && y[i + 1] > y[i]) i++;
    while (i > 0 && y[i - 1] > y[i]) i--;
    if (seen.has(i)) continue;
    seen.add(i);
    const height = y[i] - baseline;
    if (!(height > 0)) continue;
    // S/N on the height a peak stands above its deeper neighbourhood (prominence), so a noise
    // wiggle on the tail of a big line does not count as a peak of its own.
    const snr = Math.min(height, prominence(y, i)) / noise;
    const peak: PickedPeak = { shift: vertex(x, y, i), height, snr, ...shape(x, y, i, baseline, noise, mhz) };
    // A line sampled as NMR needs it spans ≥ 2 points per FWHM (BIPM ISRD-03: ≤ 0.4 Hz/point for
    // < 1 Hz lines); a one-point spike narrower than 1.5 intervals is noise, not a line.
    const spacingHz = ((x[n - 1] - x[0]) / (n - 1)) * mhz;
    const real = snr >= snrThreshold && peak.widthHz >= 1.5 * spacingHz;
    (real ? peaks : below).push(peak);
  }
  peaks.sort((a, b) => a.shift - b.shift);
  below.sort((a, b) => a.shift - b.shift);
  return { peaks, belowThreshold: below, noise, baseline };
}

/** Height of y[i] above the higher of the two lowest points reached before a higher point on each side. */
function prominence(y: Float64Array, i: number): number {
  const floor = (dir: 1 | -1): number => {
    let min = y[i];
    for (let k = i + dir; k >= 0 && k < y.length; k += dir) {
      if (y[k] > y[i]) break;
      if (y[k] < min) min = y[k];
    }
    return min;
  };
  return y[i] - Math.max(floor(-1), floor(1));
}

/** Position of the parabola through the maximum and its two neighbours. */
function vertex(x: Float64Array, y: Float64Array, i: number): number {
  if (i === 0 || i === x.length - 1) return x[i];
  const denom = y[i - 1] - 2 * y[i] + y[i + 1];
  if (denom >= 0) return x[i];
  const t = (0.5 * (y[i - 1] - y[i + 1])) / denom;
  return x[i] + t * ((x[i + 1] - x[i - 1]) / 2);
}

function nearestIndex(x: Float64Array, v: number): number {
  let lo = 0;
  let hi = x.length - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (x[mid] < v) lo = mid;
    else hi = mid;
  }
  return v - x[lo] <= x[hi] - v ? lo : hi;
}

/** Half-height width and valley-to-valley integral around the maximum at index i. */
function shape(x: Float64Array, y: Float64Array, i: number, baseline: number, noise: number, mhz: number): { widthHz: number; integral: number } {
  const h = y[i] - baseline;
  const half = baseline + h / 2;
  const cross = (dir: 1 | -1): number => {
    let k = i;
    while (k + dir >= 0 && k + dir < x.length && y[k + dir] > half) k += dir;
    const k2 = k + dir;
    if (k2 < 0 || k2 >= x.length) return x[k];
    const t = (y[k] - half) / (y[k] - y[k2] || 1);
    return x[k] + t * (x[k2] - x[k]);
  };
  const widthPpm = Math.max(cross(1) - cross(-1), x[Math.min(i + 1, x.length - 1)] - x[i]);
  // Walk to the valley on each side: stop at the baseline (within 2σ), or where the curve climbs
  // well above the lowest point seen (5σ: a neighbouring line, not noise), ending at that low point.
  const valley = (dir: 1 | -1): number => {
    let k = i;
    let low = i;
    while (k + dir >= 0 && k + dir < x.length) {
      const next = y[k + dir];
      if (next - baseline <= 2 * noise) return k + dir;
      if (next > y[low] + 5 * noise) return low;
      k += dir;
      if (y[k] < y[low]) low = k;
    }
    return k;
  };
  const a = valley(-1);
  const b = valley(1);
  let integral = 0;
  for (let k = a; k < b; k++) integral += ((y[k] - baseline + y[k + 1] - baseline) / 2) * (x[k + 1] - x[k]);
  return { widthHz: Math.max(widthPpm * mhz, Number.MIN_VALUE), integral };
}
