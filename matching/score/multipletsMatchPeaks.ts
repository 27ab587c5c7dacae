import { multipletOffsetBetter } from './multipletOffsetBetter';
import { peaksNearestInWindow } from '../peaks/peaksNearestInWindow';
import { peaksLowerBound } from '../peaks/peaksLowerBound';

export interface MultipletLines {
  /** Library centre shift, ppm. */
  centre: number;
  /** First-order line positions, ppm, ascending. */
  ppm: ArrayLike<number>;
  /** Relative line intensities, summing to 1. */
  weight: ArrayLike<number>;
  /**
   * Half the extent of an unresolved multiplet ("m", "br"; one line in `ppm`), ppm at the mixture's
   * frequency; 0 or absent for resolved multiplets, whose extent their lines give.
   */
  halfExtentPpm?: number;
  /** Nuclei of the signal; shares a merged band's intensity among unresolved multiplets. Default 1. */
  nuclei?: number;
}

export interface MultipletPeakMatch {
  /** Matched peak indices (into the ascending shift array), ascending. */
  peaks: number[];
  /** For each matched peak (same order), the position of the line it was matched to, ppm. */
  linePpm: number[];
  linesMatched: number;
  linesExpected: number;
  /** Observed − expected shift of the multiplet, ppm (0 when nothing matched). */
  deltaPpm: number;
  /** Intensity of the whole multiplet estimated from the matched peaks (0 when nothing matched). */
  intensity: number;
  /**
   * Shift error the score uses, ppm: deltaPpm, except for an unresolved multiplet, whose window is
   * widened by its half extent h: there the error is scaled by tol / max(tol, h), i.e. unchanged
   * at high field (h ≤ tol) and measured in units of the extent at low field.
   */
  scoreDeltaPpm: number;
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
  // Proposals (multiplet, line, peak, misfit) in flat arrays: this runs for every candidate entry.
  const propM: number[] = [];
  const propL: number[] = [];
  const propP: number[] = [];
  const propD: number[] = [];
  const unresolved = new Uint8Array(multiplets.length);
  for (let m = 0; m < multiplets.length; m++) {
    const mult = multiplets[m];
    const L = mult.ppm;
    const W = mult.weight;
    const n = L.length;
    let from: number;
    let to: number;
    const h = n === 1 ? (mult.halfExtentPpm ?? 0) : 0;
    if (window) [from, to] = window(L[0] - tol - h, L[n - 1] + tol + h);
    else {
      from = peaksLowerBound(shifts, L[0] - tol - h);
      to = from;
      const hi = L[n - 1] + tol + h;
      while (to < shifts.length && shifts[to] <= hi) to++;
    }
    if (from >= to) continue;
    if (h > 0) {
      // Unresolved multiplet: its lines are unknown, so every peak inside its widened window is a
      // candidate (misfit = distance to the centre, so a peak goes to the nearest centre).
      unresolved[m] = 1;
      for (let q = from; q < to; q++) {
        propM.push(m);
        propL.push(0);
        propP.push(q);
        propD.push(Math.abs(shifts[q] - L[0]));
      }
      continue;
    }
    if (n === 1) {
      // One line (singlet, unresolved multiplet, 13C): the nearest peak, if within the tolerance.
      const q = peaksNearestInWindow(shifts, from, to, L[0]);
      const d = Math.abs(shifts[q] - L[0]);
      if (d <= tol) {
        propM.push(m);
        propL.push(0);
        propP.push(q);
        propD.push(d);
      }
      continue;
    }
    let minGap = Infinity;
    for (let l = 1; l < n; l++) minGap = Math.min(minGap, L[l] - L[l - 1]);
    const lineTol = Math.min(tol, Math.max(1 / mhz, 0.3 * minGap));
    let bestCover = -1;
    let bestMisfit = Infinity;
    let bestOffset = 0;
    // Lines ascend, so the peaks within tol of line l start at a pointer that only moves forward,
    // and for one offset the targets L[k] + offset ascend too: nearest peaks by a moving pointer
    // (same choice as peaksNearestInWindow(), ties to the lower peak) instead of a binary search each.
    let pStart = from;
    for (let l = 0; l < n; l++) {
      while (pStart < to && shifts[pStart] - L[l] < -tol) pStart++;
      for (let p = pStart; p < to; p++) {
        const offset = shifts[p] - L[l];
        if (offset > tol) break;
        if (offset < -tol) continue;
        let cover = 0;
        let misfit = 0;
        let ptr = from;
        for (let k = 0; k < n; k++) {
          const target = L[k] + offset;
          while (ptr < to && shifts[ptr] < target) ptr++;
          const q = ptr === to ? to - 1 : ptr === from ? from : target - shifts[ptr - 1] <= shifts[ptr] - target ? ptr - 1 : ptr;
          const d = Math.abs(shifts[q] - target);
          if (d <= lineTol && Math.abs(shifts[q] - L[k]) <= tol) {
            cover += W[k];
            misfit += d;
          }
        }
        if (multipletOffsetBetter(cover, misfit, offset, bestCover, bestMisfit, bestOffset)) {
          bestCover = cover;
          bestMisfit = misfit;
          bestOffset = offset;
        }
      }
    }
    if (bestCover < 0) continue;
    for (let k = 0; k < n; k++) {
      const target = L[k] + bestOffset;
      const q = peaksNearestInWindow(shifts, from, to, target);
      const d = Math.abs(shifts[q] - target);
      if (d <= lineTol && Math.abs(shifts[q] - L[k]) <= tol) {
        propM.push(m);
        propL.push(k);
        propP.push(q);
        propD.push(d);
      }
    }
  }
  const order = propD.map((_, i) => i);
  if (order.length > 1) order.sort((a, b) => propD[a] - propD[b] || propP[a] - propP[b] || propM[a] - propM[b] || propL[a] - propL[b]);
  const lineBase = new Int32Array(multiplets.length + 1);
  for (let m = 0; m < multiplets.length; m++) lineBase[m + 1] = lineBase[m] + multiplets[m].ppm.length;
  const lineTo = new Int32Array(lineBase[multiplets.length]).fill(-1);
  const usedPeaks: number[] = [];
  // An unresolved multiplet takes the free peak of its window nearest its centre. (Taking every
  // peak of the window would sum other compounds' lines into it in a crowded region.)
  let anyUnresolved = false;
  for (let m = 0; m < multiplets.length; m++) if (unresolved[m]) anyUnresolved = true;
  const pooled: number[][] = anyUnresolved ? multiplets.map(() => []) : [];
  for (const i of order) {
    const key = lineBase[propM[i]] + propL[i];
    if (usedPeaks.includes(propP[i])) continue;
    if (unresolved[propM[i]]) {
      if (pooled[propM[i]].length > 0) continue;
      pooled[propM[i]].push(propP[i]);
    } else if (lineTo[key] >= 0) continue;
    else lineTo[key] = propP[i];
    usedPeaks.push(propP[i]);
  }
  const out: MultipletPeakMatch[] = new Array(multiplets.length);
  for (let m = 0; m < multiplets.length; m++) {
    const mult = multiplets[m];
    const pairs: Array<[number, number]> = [];
    let sumI = 0;
    let sumW = 0;
    let sumD = 0;
    for (let k = 0; k < mult.ppm.length; k++) {
      const p = lineTo[lineBase[m] + k];
      if (p < 0) continue;
      pairs.push([p, k]);
      sumI += intensities[p];
      sumW += mult.weight[k];
      sumD += shifts[p] - mult.ppm[k];
    }
    if (pairs.length > 1) pairs.sort((a, b) => a[0] - b[0]);
    const peaks = pairs.map((q) => q[0]);
    if (unresolved[m]) continue;
    const r: MultipletPeakMatch = { peaks, linePpm: pairs.map((q) => mult.ppm[q[1]]), linesMatched: peaks.length, linesExpected: mult.ppm.length, deltaPpm: 0, intensity: 0, scoreDeltaPpm: 0 };
    if (peaks.length === 1) {
      const single = peaks[0];
      const toCentre = shifts[single] - mult.centre;
      r.deltaPpm = Math.abs(toCentre) <= tol ? toCentre : shifts[single] - mult.ppm[pairs[0][1]];
      r.intensity = intensities[single];
    } else if (peaks.length > 1) {
      r.deltaPpm = sumD / peaks.length;
      r.intensity = sumI / sumW;
    }
    r.scoreDeltaPpm = r.deltaPpm;
    out[m] = r;
  }
  if (anyUnresolved) unresolvedBands(multiplets, unresolved, pooled, shifts, intensities, tol, out);
  return out;
}

/**
 * Results of the unresolved multiplets. Unresolved multiplets of one entry whose extents overlap are
 * not separated at this field (at 80 MHz two "m" 0.15 ppm apart are one hump), so they form a band:
 * every member gets the band's peaks (each member's nearest peak: one merged peak can stand for
 * the whole band), the band's summed intensity is shared in proportion to nuclei, and the score's shift error is the centroid's distance beyond the band's edges.
 * deltaPpm stays the plain observed centroid − the member's centre (intensity-weighted; the plain
 * mean when every intensity is 0).
 */
function unresolvedBands(
  multiplets: readonly MultipletLines[],
  unresolved: Uint8Array,
  pooled: number[][],
  shifts: ArrayLike<number>,
  intensities: ArrayLike<number>,
  tol: number,
  out: MultipletPeakMatch[],
): void {
  const members: number[] = [];
  for (let m = 0; m < multiplets.length; m++) if (unresolved[m]) members.push(m);
  if (members.length === 0) return;
  members.sort((a, b) => multiplets[a].centre - multiplets[b].centre || a - b);
  const half = (m: number) => multiplets[m].halfExtentPpm ?? 0;
  let b0 = 0;
  while (b0 < members.length) {
    let b1 = b0 + 1;
    let reach = multiplets[members[b0]].centre + half(members[b0]);
    while (b1 < members.length && multiplets[members[b1]].centre - half(members[b1]) <= reach) {
      reach = Math.max(reach, multiplets[members[b1]].centre + half(members[b1]));
      b1++;
    }
    const band = members.slice(b0, b1);
    const lo = Math.min(...band.map((m) => multiplets[m].centre - half(m)));
    const peaks = [...new Set(band.flatMap((m) => pooled[m]))].sort((a, b) => a - b);
    let sumI = 0;
    let sumX = 0;
    let sumPlain = 0;
    for (const p of peaks) {
      sumI += intensities[p];
      sumX += intensities[p] * shifts[p];
      sumPlain += shifts[p];
    }
    const centroid = peaks.length === 0 ? 0 : sumI > 0 ? sumX / sumI : sumPlain / peaks.length;
    // The tolerance already allows for where a picked maximum falls inside a narrow multiplet, so
    // the error stays (centroid − middle) while the band's half width H is within it (high field);
    // only a wider band (low field) has its error measured in units of H: · tol / max(tol, H).
    const halfWidth = (reach - lo) / 2;
    const scaled = ((centroid - (lo + reach) / 2) * tol) / Math.max(tol, halfWidth);
    let nuclei = 0;
    for (const m of band) nuclei += multiplets[m].nuclei ?? 1;
    for (const m of band) {
      const c = multiplets[m].centre;
      out[m] =
        peaks.length === 0
          ? { peaks: [], linePpm: [], linesMatched: 0, linesExpected: 1, deltaPpm: 0, intensity: 0, scoreDeltaPpm: 0 }
          : { peaks: [...peaks], linePpm: peaks.map(() => c), linesMatched: 1, linesExpected: 1, deltaPpm: centroid - c, intensity: (sumI * (multiplets[m].nuclei ?? 1)) / nuclei, scoreDeltaPpm: scaled };
    }
    b0 = b1;
  }
}

