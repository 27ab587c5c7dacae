import { LINE_WIDTH_HZ_RANGE } from '../../shared/spectrometer';

/**
 * Golden-section search of the linewidth (Hz) that minimises `sseAt`, on a log scale, over a
 * bracket spanning the estimate and the usual 0.3–3 Hz of solution lines (common practice), within
 * the widths a line may have (LINE_WIDTH_HZ_RANGE).
 */
export function linewidthRefine(sseAt: (widthHz: number) => number, estimateHz: number, iterations = 18): number {
  if (!(estimateHz > 0) || !Number.isFinite(estimateHz)) throw new RangeError(`linewidth estimate must be a positive number of Hz, got ${estimateHz}`);
  const phi = (Math.sqrt(5) - 1) / 2;
  let lo = Math.log(Math.max(LINE_WIDTH_HZ_RANGE[0], Math.min(estimateHz / 3, 0.3)));
  let hi = Math.log(Math.min(LINE_WIDTH_HZ_RANGE[1], Math.max(estimateHz * 3, 3)));
  let p = hi - phi * (hi - lo);
  let q = lo + phi * (hi - lo);
  let fp = sseAt(Math.exp(p));
  let fq = sseAt(Math.exp(q));
  for (let it = 0; it < iterations; it++) {
    if (fp < fq) {
      hi = q;
      q = p;
      fq = fp;
      p = hi - phi * (hi - lo);
      fp = sseAt(Math.exp(p));
    } else {
      lo = p;
      p = q;
      fp = fq;
      q = lo + phi * (hi - lo);
      fq = sseAt(Math.exp(q));
    }
  }
  return Math.exp((lo + hi) / 2);
}
