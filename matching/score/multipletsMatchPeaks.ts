import { peaksLowerBound } from '../peaks/peaksLowerBound';

export interface MultipletLines {
  /** Library centre shift, ppm. */
  centre: number;
  /** First-order line positions, ppm, ascending. */
  ppm: ArrayLike<number>;
  /** Relative line intensities, summing to 1. */
  weight: ArrayLike<number>;
}

export interface MultipletPeakMatch {
  /** Matched peak indices (into the ascending shift array), ascending. */
  peaks: number[];
  linesMatched: number;
  linesExpected: number;
  /** Observed − expected shift of the multiplet, ppm (0 when nothing matched). */
  deltaPpm: number;
  /** Intensity of the whole multiplet estimated from the matched peaks (0 when nothing matched). */
  intensity: number;
}

/** Peak indices [from, to) with shift in [lo, hi]; replaceable so a baseline can scan linearly. */
export type PeakWindow = (lo: number, hi: number) => [number, number];

/**
 * Matches the multiplets of one library entry to mixture peaks.
 *
 * A multiplet moves as a whole (its lines keep their J spacing), so for each multiplet every
 * (line, peak) pair within the tolerance proposes a common offset, and the offset that lines up
 * the most line weight (within a line tolerance of max(1 Hz, 0.3 × the smallest spacing)) wins;
 * ties go to the smaller total misfit. Closest-first pairing alone would slide a jittered quartet
 * by one line. A multiplet found through one peak only is read as unresolved (peak lists often
 * give centres): its shift error is taken from the centre and the peak stands for the whole
 * multiplet; with two or more lines the summed intensity is scaled up by the binomial weight found.
 * Within the entry a line takes at most one peak and a peak serves at most one line, smallest
 * misfit first. Every accepted peak lies within the tolerance of its line.
 */
export function multipletsMatchPeaks(
  multiplets: readonly MultipletLines[],
  shifts: ArrayLike<number>,
  intensities: ArrayLike<number>,
  tolerancePpm: number,
  mhz: number,
  window?: PeakWindow,
): MultipletPeakMatch[] {
  const tol = tolerancePpm;
  if (!(tol > 0)) throw new RangeError(`tolerancePpm must be positive, got ${tol}`);
  if (!(mhz > 0)) throw new RangeError(`spectrometer frequency must be positive, got ${mhz}`);
  type Proposal = { m: number; l: number; p: number; misfit: number };
  const proposals: Proposal[] = [];
  multiplets.forEach((mult, m) => {
    const L = mult.ppm;
    const n = L.length;
    let from: number;
    let to: number;
    if (window) [from, to] = window(L[0] - tol, L[n - 1] + tol);
    else {
      from = peaksLowerBound(shifts, L[0] - tol);
      to = from;
      const hi = L[n - 1] + tol;
      while (to < shifts.length && shifts[to] <= hi) to++;
    }
    if (from >= to) return;
    if (n === 1) {
      // One line (singlet, unresolved multiplet, 13C): the nearest peak, if within the tolerance.
      const q = nearest(shifts, from, to, L[0]);
      const d = Math.abs(shifts[q] - L[0]);
      if (d <= tol) proposals.push({ m, l: 0, p: q, misfit: d });
      return;
    }
    let minGap = Infinity;
    for (let l = 1; l < n; l++) minGap = Math.min(minGap, L[l] - L[l - 1]);
    const lineTol = n > 1 ? Math.min(tol, Math.max(1 / mhz, 0.3 * minGap)) : tol;
    let best: { cover: number; misfit: number; offset: number } | null = null;
    for (let l = 0; l < n; l++) {
      for (let p = from; p < to; p++) {
        const offset = shifts[p] - L[l];
        if (Math.abs(offset) > tol) continue;
        let cover = 0;
        let misfit = 0;
        for (let k = 0; k < n; k++) {
          const q = nearest(shifts, from, to, L[k] + offset);
          const d = q < 0 ? Infinity : Math.abs(shifts[q] - (L[k] + offset));
          if (d <= lineTol && Math.abs(shifts[q] - L[k]) <= tol) {
            cover += mult.weight[k];
            misfit += d;
          }
        }
        if (!best || cover > best.cover + 1e-12 || (Math.abs(cover - best.cover) <= 1e-12 && (misfit < best.misfit - 1e-15 || (Math.abs(misfit - best.misfit) <= 1e-15 && Math.abs(offset) < Math.abs(best.offset))))) {
          best = { cover, misfit, offset };
        }
      }
    }
    if (!best) return;
    for (let k = 0; k < n; k++) {
      const q = nearest(shifts, from, to, L[k] + best.offset);
      if (q < 0) continue;
      const d = Math.abs(shifts[q] - (L[k] + best.offset));
      if (d <= lineTol && Math.abs(shifts[q] - L[k]) <= tol) proposals.push({ m, l: k, p: q, misfit: d });
    }
  });
  proposals.sort((a, b) => a.misfit - b.misfit || a.p - b.p || a.m - b.m || a.l - b.l);
  const usedPeak = new Set<number>();
  const lineBase: number[] = [];
  let nLines = 0;
  for (const mult of multiplets) {
    lineBase.push(nLines);
    nLines += mult.ppm.length;
  }
  const usedLine = new Uint8Array(nLines);
  const got: Array<Array<{ l: number; p: number }>> = multiplets.map(() => []);
  for (const q of proposals) {
    const key = lineBase[q.m] + q.l;
    if (usedPeak.has(q.p) || usedLine[key]) continue;
    usedPeak.add(q.p);
    usedLine[key] = 1;
    got[q.m].push({ l: q.l, p: q.p });
  }
  return multiplets.map((mult, m) => {
    const hits = got[m];
    const peaks = hits.map((h) => h.p).sort((a, b) => a - b);
    const out: MultipletPeakMatch = { peaks, linesMatched: hits.length, linesExpected: mult.ppm.length, deltaPpm: 0, intensity: 0 };
    if (hits.length === 1) {
      const p = hits[0].p;
      const toCentre = shifts[p] - mult.centre;
      out.deltaPpm = Math.abs(toCentre) <= tol ? toCentre : shifts[p] - mult.ppm[hits[0].l];
      out.intensity = intensities[p];
    } else if (hits.length > 1) {
      let sumI = 0;
      let sumW = 0;
      let sumD = 0;
      for (const h of hits) {
        sumI += intensities[h.p];
        sumW += mult.weight[h.l];
        sumD += shifts[h.p] - mult.ppm[h.l];
      }
      out.deltaPpm = sumD / hits.length;
      out.intensity = sumI / sumW;
    }
    return out;
  });
}

/** Index in [from, to) of the shift closest to v, or −1 for an empty range. */
function nearest(shifts: ArrayLike<number>, from: number, to: number, v: number): number {
  if (from >= to) return -1;
  let lo = from;
  let hi = to;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if (shifts[mid] < v) lo = mid + 1;
    else hi = mid;
  }
  if (lo === to) return to - 1;
  if (lo === from) return from;
  return v - shifts[lo - 1] <= shifts[lo] - v ? lo - 1 : lo;
}
