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
 * ICH Q2(R1) detection; common practice) with the same test, the tallest 200, merged within
 * `apartPpm` because noise on a peak top makes several maxima.
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
  for (let p = 1; p < n - 1; p++) {
    if (y[p] > floor && y[p] >= y[p - 1] && y[p] > y[p + 1] && fitted[p] < fraction * y[p]) out.push({ shift: design.axis[p], intensity: y[p], fitted: fitted[p] });
  }
  out.sort((p, q) => q.intensity - p.intensity);
  const distinct: UnexplainedPeak[] = [];
  for (const p of out) if (distinct.length < 200 && distinct.every((k) => Math.abs(k.shift - p.shift) > apartPpm)) distinct.push(p);
  return distinct;
}
