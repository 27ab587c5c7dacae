import type { Mixture } from '../../shared/mixture';
import { spectrumPickPeaks } from '../spectrum/spectrumPickPeaks';

export interface ReferenceFindOptions {
  /** Half-width of the search window around 0 ppm. Default 0.2 ppm (1H), 2 ppm (13C). */
  windowPpm?: number;
}

/**
 * Where the reference compound's 0-ppm signal sits in a mixture, or null when no peak lies within
 * the window. The peak closest to 0 wins: TMS/DSS/TSP sit at the edge of the usual range, and a
 * second nearby peak (silicone grease at 0.07 in CDCl3) is usually farther from 0 than the
 * reference itself.
 */
export function mixtureReferenceFind(mixture: Mixture, options: ReferenceFindOptions = {}): number | null {
  const windowPpm = options.windowPpm ?? (mixture.nucleus === '13C' ? 2 : 0.2);
  if (!(windowPpm > 0)) throw new RangeError(`reference window must be positive, got ${windowPpm}`);
  const shifts = mixture.kind === 'peaks' ? mixture.peaks.filter((p) => p.intensity > 0).map((p) => p.shift) : spectrumPickPeaks(mixture).peaks.map((p) => p.shift);
  let best: number | null = null;
  for (const s of shifts) {
    if (Math.abs(s) <= windowPpm && (best === null || Math.abs(s) < Math.abs(best))) best = s;
  }
  return best;
}
