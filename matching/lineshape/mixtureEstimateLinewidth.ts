import type { Mixture } from '../../shared/mixture';
import { LINE_WIDTH_HZ_RANGE } from '../../shared/spectrometer';
import { nucleusFrequency } from './nucleusFrequency';

/** Linewidth used when neither the user nor the mixture gives one: 1 Hz (common practice: 0.5–2 Hz). */
export const DEFAULT_LINEWIDTH_HZ = 1;

export interface LinewidthEstimate {
  widthHz: number;
  source: 'mixture' | 'default';
}

function median(values: number[]): number {
  const v = [...values].sort((a, b) => a - b);
  const m = v.length >> 1;
  return v.length % 2 ? v[m] : (v[m - 1] + v[m]) / 2;
}

/**
 * Linewidth (FWHM, Hz) of the mixture: the median of the peak widths of a peak list, or for a
 * spectrum the median width of the tallest maxima, each from the parabola that 1/intensity
 * follows near a Lorentzian maximum (the maximum and two points near half height), kept within
 * LINE_WIDTH_HZ_RANGE. Falls back to DEFAULT_LINEWIDTH_HZ.
 */
export function mixtureEstimateLinewidth(mixture: Mixture): LinewidthEstimate {
  const mhz = nucleusFrequency(mixture.nucleus, mixture.mhz);
  if (mixture.kind === 'peaks') {
    const widths = mixture.peaks.map((p) => p.widthHz).filter((w): w is number => w !== undefined && w > 0);
    return widths.length ? { widthHz: median(widths), source: 'mixture' } : { widthHz: DEFAULT_LINEWIDTH_HZ, source: 'default' };
  }
  const { ppm, intensity: y } = mixture;
  const n = y.length;
  let top = 0;
  for (const v of y) top = Math.max(top, v);
  const maxima: number[] = [];
  for (let i = 2; i < n - 2; i++) if (y[i] > 0.05 * top && y[i] >= y[i - 1] && y[i] > y[i + 1]) maxima.push(i);
  maxima.sort((a, b) => y[b] - y[a]);
  const widths: number[] = [];
  for (const i of maxima.slice(0, 30)) {
    // 1/L(x) = (1/H)·(1 + 4(x − x0)²/Γ²) is a parabola in x; through three points around the
    // maximum it gives Γ exactly for a sampled, isolated Lorentzian.
    // The outer points are taken near half height (not the next samples) so that noise on a
    // finely sampled line does not dominate the curvature.
    let k = 1;
    while (k < 200 && i - k > 0 && i + k < n - 1 && y[i - k] > 0.6 * y[i] && y[i + k] > 0.6 * y[i]) k++;
    const x0 = ppm[i - k], x1 = ppm[i], x2 = ppm[i + k];
    const u0 = 1 / y[i - k], u1 = 1 / y[i], u2 = 1 / y[i + k];
    if (!(y[i - k] > 0 && y[i + k] > 0)) continue;
    const d01 = (u1 - u0) / (x1 - x0);
    const d12 = (u2 - u1) / (x2 - x1);
    const a = (d12 - d01) / (x2 - x0);
    if (!(a > 0)) continue;
    const b = d01 - a * (x0 + x1);
    const c = u0 - a * x0 * x0 - b * x0;
    const minimum = c - (b * b) / (4 * a); // 1/H
    if (!(minimum > 0)) continue;
    // 1/L = (1/H)·(1 + 4(x − x0)²/Γ²) → a = 4/(H·Γ²)
    const gamma = Math.sqrt((4 * minimum) / a);
    const w = gamma * mhz;
    if (w > 0 && Number.isFinite(w)) widths.push(w);
  }
  // A spectrum sampled far finer or coarser than its lines still gets a width a line can have.
  const [lo, hi] = LINE_WIDTH_HZ_RANGE;
  return widths.length ? { widthHz: Math.min(hi, Math.max(lo, median(widths))), source: 'mixture' } : { widthHz: DEFAULT_LINEWIDTH_HZ, source: 'default' };
}
