import type { UnexplainedPeak } from '../../shared/analysis';
import type { Mixture } from '../../shared/mixture';
import type { FitDesign, FitLine } from './fitTypes';

export interface UnexplainedOptions {
  /** RMS noise of a spectrum (maxima below 3σ are not peaks), or null. */
  noise: number | null;
  /** A peak is unexplained when the fit reaches less than this fraction of it. */
  fraction: number;
  /** Maxima closer than this (ppm) count as one peak. */
  apartPpm: number;
}

/**
 * Mixture peaks the fitted sum does not explain: for a peak list, each listed peak where the fit
 * reaches less than `fraction` of the mixture there; for a spectrum, local maxima above 3σ (S/N 3,
 * ICH Q2(R1) detection; common practice) with the same test, the tallest 200; maxima within
 * `apartPpm`, or without a dip below half height between them, count once (noise on a peak top).
 */
export function fitUnexplainedPeaks(mixture: Mixture, design: FitDesign, lines: FitLine[][], c: ArrayLike<number>, fitted: Float64Array, options: UnexplainedOptions): UnexplainedPeak[] {
  const { noise, fraction, apartPpm } = options;
  const out: UnexplainedPeak[] = [];
  if (mixture.kind === 'peaks') {
    // A zero-width unit line turns an overlap into the value of a curve at one shift.
    const probe = (x: number) => [{ x, a: 1, w: 0 }];
    for (const p of mixture.peaks) {
      const here = design.dotLY(probe(p.shift));
      let model = 0;
      lines.forEach((l, a) => {
        model += c[a] * design.dotLL(l, probe(p.shift));
      });
      if (here > 0 && model < fraction * here) out.push({ shift: p.shift, intensity: p.intensity, fitted: (model / here) * p.intensity });
    }
    return out;
  }
  const y = design.mixtureCurve;
  const n = y.length;
  let ymax = 0;
  for (const v of y) ymax = Math.max(ymax, v);
  const floor = Math.max(3 * (noise ?? 0), 1e-3 * ymax);
  // A line sampled with ≥ 2 points per width has raised neighbours; a lone noise spike has not.
  const spacing = n > 1 ? Math.abs(design.axis[n - 1] - design.axis[0]) / (n - 1) : 0;
  const wellSampled = spacing > 0 && apartPpm / 2 >= 2 * spacing;
  const found: number[] = [];
  for (let p = 1; p < n - 1; p++) {
    if (!(y[p] > floor && y[p] >= y[p - 1] && y[p] > y[p + 1] && fitted[p] < fraction * y[p])) continue;
    if (wellSampled && !(y[p - 1] > floor / 2 && y[p + 1] > floor / 2)) continue;
    found.push(p);
  }
  found.sort((p, q) => y[q] - y[p]);
  // Two maxima are one peak when they are close, or when the mixture between them never falls
  // below half the lower one (noise on a broad top).
  const samePeak = (p: number, k: number) => {
    if (Math.abs(design.axis[p] - design.axis[k]) <= apartPpm) return true;
    const half = 0.5 * Math.min(y[p], y[k]);
    for (let i = Math.min(p, k); i <= Math.max(p, k); i++) if (y[i] < half) return false;
    return true;
  };
  const distinct: number[] = [];
  for (const p of found) {
    if (distinct.length >= 200) break;
    if (!distinct.some((k) => samePeak(p, k))) distinct.push(p);
  }
  for (const p of distinct) out.push({ shift: design.axis[p], intensity: y[p], fitted: fitted[p] });
  return out;
}
