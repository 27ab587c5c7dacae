import type { LibraryIndex } from './libraryIndexBuild';

export interface SignalMatch {
  /** Signal position in the index (global). */
  signal: number;
  /** Matched peak indices (into the sorted peak arrays), ascending. */
  peaks: number[];
  linesMatched: number;
  linesExpected: number;
  deltaPpm: number;
  intensity: number;
}

/**
 * Assigns mixture peaks to the first-order lines of one entry's multiplets. Every (line, peak)
 * pair within the tolerance is a candidate; pairs are taken closest first, and a line takes at
 * most one peak and a peak serves at most one line of the entry. A multiplet found through a
 * single peak is read as an unresolved multiplet (peak lists often give only centres): its shift
 * error is taken from the centre and the peak's intensity stands for the whole multiplet. With
 * two or more lines the intensity is scaled up by the binomial weight of the lines found.
 */
export function libraryIndexEntryMatch(index: LibraryIndex, e: number, shifts: Float64Array, intensities: Float64Array, tol: number): SignalMatch[] {
  const s0 = index.sigStart[e];
  const s1 = index.sigStart[e + 1];
  const l0 = index.lineStart[s0];
  const nLines = index.lineStart[s1] - l0;
  const pairLine: number[] = [];
  const pairPeak: number[] = [];
  const pairDist: number[] = [];
  for (let l = l0; l < l0 + nLines; l++) {
    const c = index.linePpm[l];
    let lo = 0;
    let hi = shifts.length;
    const from = c - tol;
    while (lo < hi) {
      const mid = (lo + hi) >>> 1;
      if (shifts[mid] < from) lo = mid + 1;
      else hi = mid;
    }
    for (let p = lo; p < shifts.length && shifts[p] <= c + tol; p++) {
      pairLine.push(l);
      pairPeak.push(p);
      pairDist.push(Math.abs(shifts[p] - c));
    }
  }
  const order = pairDist.map((_, i) => i).sort((a, b) => pairDist[a] - pairDist[b] || pairPeak[a] - pairPeak[b]);
  const lineToPeak = new Int32Array(nLines).fill(-1);
  const peakTaken = new Set<number>();
  for (const i of order) {
    const l = pairLine[i] - l0;
    if (lineToPeak[l] >= 0 || peakTaken.has(pairPeak[i])) continue;
    lineToPeak[l] = pairPeak[i];
    peakTaken.add(pairPeak[i]);
  }
  const out: SignalMatch[] = [];
  for (let k = s0; k < s1; k++) {
    const a = index.lineStart[k];
    const b = index.lineStart[k + 1];
    const peaks: number[] = [];
    let sumI = 0;
    let sumW = 0;
    let sumD = 0;
    for (let l = a; l < b; l++) {
      const p = lineToPeak[l - l0];
      if (p < 0) continue;
      peaks.push(p);
      sumI += intensities[p];
      sumW += index.lineWeight[l];
      sumD += shifts[p] - index.linePpm[l];
    }
    const n = peaks.length;
    let deltaPpm = 0;
    let intensity = 0;
    if (n === 1) {
      const toCentre = shifts[peaks[0]] - index.sigShift[k];
      deltaPpm = Math.abs(toCentre) <= tol ? toCentre : sumD;
      intensity = sumI;
    } else if (n > 1) {
      deltaPpm = sumD / n;
      intensity = sumI / sumW;
    }
    peaks.sort((x, y) => x - y);
    out.push({ signal: k, peaks, linesMatched: n, linesExpected: b - a, deltaPpm, intensity });
  }
  return out;
}
