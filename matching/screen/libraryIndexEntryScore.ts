import { multipletOffsetBetter } from '../score/multipletOffsetBetter';
import { peaksNearestInWindow } from '../peaks/peaksNearestInWindow';
import { peaksShiftGridLowerBound, type PeaksShiftGrid } from '../peaks/peaksShiftGrid';
import type { LibraryIndex } from './libraryIndexBuild';

/**
 * Reusable buffers of libraryIndexEntryScore (one per screening run; grown on demand). Results of
 * the last call are in `score` and `explainedShare`.
 */
export interface EntryScoreScratch {
  score: number;
  explainedShare: number;
  /** Entries whose windows could not reach minScore (upper bound of E), counted by the caller. */
  pruned: boolean;
  /** Offset chosen by the last offsetSearch, ppm. */
  bestOffset: number;
  /** Peak stamps: peakUsed[p] === run marks peak p taken within the current entry. */
  peakUsed: Int32Array;
  run: number;
  propM: Int32Array;
  propL: Int32Array;
  propP: Int32Array;
  propD: Float64Array;
  order: Int32Array;
  lineTo: Int32Array;
  lineBase: Int32Array;
  from: Int32Array;
  to: Int32Array;
  optional: Uint8Array;
  unresolved: Uint8Array;
  pooled: Int32Array;
  members: Int32Array;
  linesMatched: Int32Array;
  delta: Float64Array;
  intensity: Float64Array;
}

/** Buffers for a mixture of `peaks` peaks; per-entry buffers start small and grow. */
export function entryScoreScratch(peaks: number): EntryScoreScratch {
  return {
    score: 0,
    explainedShare: 0,
    pruned: false,
    bestOffset: 0,
    peakUsed: new Int32Array(Math.max(1, peaks)),
    run: 0,
    propM: new Int32Array(64),
    propL: new Int32Array(64),
    propP: new Int32Array(64),
    propD: new Float64Array(64),
    order: new Int32Array(64),
    lineTo: new Int32Array(64),
    lineBase: new Int32Array(17),
    from: new Int32Array(16),
    to: new Int32Array(16),
    optional: new Uint8Array(16),
    unresolved: new Uint8Array(16),
    pooled: new Int32Array(16),
    members: new Int32Array(16),
    linesMatched: new Int32Array(16),
    delta: new Float64Array(16),
    intensity: new Float64Array(16),
  };
}

function growProposals(sc: EntryScoreScratch, need: number): void {
  if (need <= sc.propM.length) return;
  const n = Math.max(need, sc.propM.length * 2);
  const grow = <T extends Int32Array | Float64Array>(a: T, make: (n: number) => T): T => {
    const b = make(n);
    b.set(a);
    return b;
  };
  sc.propM = grow(sc.propM, (k) => new Int32Array(k));
  sc.propL = grow(sc.propL, (k) => new Int32Array(k));
  sc.propP = grow(sc.propP, (k) => new Int32Array(k));
  sc.propD = grow(sc.propD, (k) => new Float64Array(k));
  sc.order = new Int32Array(n);
}

function growSignals(sc: EntryScoreScratch, signals: number, lines: number): void {
  if (signals > sc.from.length) {
    const n = Math.max(signals, sc.from.length * 2);
    sc.lineBase = new Int32Array(n + 1);
    sc.from = new Int32Array(n);
    sc.to = new Int32Array(n);
    sc.optional = new Uint8Array(n);
    sc.unresolved = new Uint8Array(n);
    sc.pooled = new Int32Array(n);
    sc.members = new Int32Array(n);
    sc.linesMatched = new Int32Array(n);
    sc.delta = new Float64Array(n);
    sc.intensity = new Float64Array(n);
  }
  if (lines > sc.lineTo.length) sc.lineTo = new Int32Array(Math.max(lines, sc.lineTo.length * 2));
}


/**
 * The score of indexed entry `e` against the sorted mixture peaks, without building any evidence:
 * the same assignment as multipletsMatchPeaks (offset search per multiplet, smallest misfit first,
 * a line takes one peak and a peak serves one line, unresolved bands) and the same arithmetic as
 * entryScore, in the same order, so the number is identical to the last bit (a property test holds
 * it to that). It runs for every entry a screen cannot rule out, so it works in preallocated typed
 * arrays and allocates nothing. Before matching, an entry whose windows are empty for too many
 * nuclei is ruled out by the upper bound E² ≥ score (`scratch.pruned`, score 0).
 * `optionalRegions`: set-aside regions (solvent, water, reference); a signal centred in one counts
 * only when found, like an exchangeable one.
 */
export function libraryIndexEntryScore(
  index: LibraryIndex,
  e: number,
  grid: PeaksShiftGrid,
  intensities: Float64Array,
  tol: number,
  optionalRegions: ReadonlyArray<{ from: number; to: number }>,
  minScore: number,
  sc: EntryScoreScratch,
): void {
  const s0 = index.sigStart[e];
  const M = index.sigStart[e + 1] - s0;
  const { lineStart, linePpm, lineWeight, sigHalf, sigShift, sigNuclei, sigExchangeable } = index;
  growSignals(sc, M, lineStart[s0 + M] - lineStart[s0]);
  const shifts = grid.shifts;
  const P = shifts.length;
  sc.score = 0;
  sc.explainedShare = 0;
  sc.pruned = false;
  // Optional signals, windows, and the upper bound of E from the windows alone.
  let allOptional = true;
  for (let m = 0; m < M; m++) {
    const k = s0 + m;
    let opt = sigExchangeable[k] === 1;
    if (!opt) {
      const x = sigShift[k];
      for (let r = 0; r < optionalRegions.length; r++) {
        if (x >= optionalRegions[r].from && x <= optionalRegions[r].to) {
          opt = true;
          break;
        }
      }
    }
    sc.optional[m] = opt ? 1 : 0;
    if (!opt) allOptional = false;
  }
  let required = 0;
  let reach = 0;
  let reachOpt = 0;
  for (let m = 0; m < M; m++) {
    const k = s0 + m;
    const ls = lineStart[k];
    const n = lineStart[k + 1] - ls;
    const h = n === 1 ? sigHalf[k] : 0;
    const lo = linePpm[ls] - tol - h;
    const hi = linePpm[ls + n - 1] + tol + h;
    const from = peaksShiftGridLowerBound(grid, lo);
    let to = from;
    while (to < P && shifts[to] <= hi) to++;
    sc.from[m] = from;
    sc.to[m] = to;
    const req = sc.optional[m] === 0 || allOptional;
    if (req) required += sigNuclei[k];
    if (from < to) {
      if (req) reach += sigNuclei[k];
      else reachOpt += sigNuclei[k];
    }
  }
  const bound = (reach + reachOpt) / (required + reachOpt);
  if (!(bound > 0) || bound * bound < minScore - 1e-12) {
    sc.pruned = true;
    return;
  }
  // Proposals (multiplet, line, peak, misfit), in multipletsMatchPeaks' order.
  let np = 0;
  let anyUnresolved = false;
  sc.lineBase[0] = 0;
  for (let m = 0; m < M; m++) {
    const k = s0 + m;
    const ls = lineStart[k];
    const n = lineStart[k + 1] - ls;
    sc.lineBase[m + 1] = sc.lineBase[m] + n;
    sc.unresolved[m] = 0;
    const from = sc.from[m];
    const to = sc.to[m];
    if (from >= to) continue;
    const h = n === 1 ? sigHalf[k] : 0;
    if (h > 0) {
      sc.unresolved[m] = 1;
      anyUnresolved = true;
      growProposals(sc, np + (to - from));
      const c = linePpm[ls];
      for (let q = from; q < to; q++) {
        sc.propM[np] = m;
        sc.propL[np] = 0;
        sc.propP[np] = q;
        sc.propD[np] = Math.abs(shifts[q] - c);
        np++;
      }
      continue;
    }
    if (n === 1) {
      const q = peaksNearestInWindow(shifts, from, to, linePpm[ls]);
      const d = Math.abs(shifts[q] - linePpm[ls]);
      if (d <= tol) {
        growProposals(sc, np + 1);
        sc.propM[np] = m;
        sc.propL[np] = 0;
        sc.propP[np] = q;
        sc.propD[np] = d;
        np++;
      }
      continue;
    }
    let minGap = Infinity;
    for (let l = 1; l < n; l++) minGap = Math.min(minGap, linePpm[ls + l] - linePpm[ls + l - 1]);
    const lineTol = Math.min(tol, Math.max(1 / index.mhz, 0.3 * minGap));
    const found = offsetSearch(grid, from, to, linePpm, lineWeight, ls, n, tol, lineTol, sc);
    if (!found) continue;
    const bestOffset = sc.bestOffset;
    growProposals(sc, np + n);
    for (let kk = 0; kk < n; kk++) {
      const Lk = linePpm[ls + kk];
      const target = Lk + bestOffset;
      const q = peaksNearestInWindow(shifts, from, to, target);
      const d = Math.abs(shifts[q] - target);
      if (d <= lineTol && Math.abs(shifts[q] - Lk) <= tol) {
        sc.propM[np] = m;
        sc.propL[np] = kk;
        sc.propP[np] = q;
        sc.propD[np] = d;
        np++;
      }
    }
  }
  // Smallest misfit first (then peak, multiplet, line: a total order, so any sort agrees).
  const { propM, propL, propP, propD, order } = sc;
  for (let i = 0; i < np; i++) {
    let j = i;
    while (j > 0) {
      const a = order[j - 1];
      const c = propD[a] - propD[i] || propP[a] - propP[i] || propM[a] - propM[i] || propL[a] - propL[i];
      if (c <= 0) break;
      order[j] = a;
      j--;
    }
    order[j] = i;
  }
  sc.run += 1;
  if (sc.run > 2_000_000_000) {
    sc.peakUsed.fill(0);
    sc.run = 1;
  }
  const run = sc.run;
  const lines = sc.lineBase[M];
  for (let i = 0; i < lines; i++) sc.lineTo[i] = -1;
  for (let m = 0; m < M; m++) sc.pooled[m] = -1;
  for (let i = 0; i < np; i++) {
    const o = order[i];
    const p = propP[o];
    if (sc.peakUsed[p] === run) continue;
    const m = propM[o];
    if (sc.unresolved[m]) {
      if (sc.pooled[m] >= 0) continue;
      sc.pooled[m] = p;
    } else {
      const key = sc.lineBase[m] + propL[o];
      if (sc.lineTo[key] >= 0) continue;
      sc.lineTo[key] = p;
    }
    sc.peakUsed[p] = run;
  }
  // Per multiplet: lines matched, shift error, intensity (multipletsMatchPeaks' arithmetic).
  for (let m = 0; m < M; m++) {
    sc.linesMatched[m] = 0;
    sc.delta[m] = 0;
    sc.intensity[m] = 0;
    if (sc.unresolved[m]) continue;
    const k = s0 + m;
    const ls = lineStart[k];
    const n = lineStart[k + 1] - ls;
    let count = 0;
    let sumI = 0;
    let sumW = 0;
    let sumD = 0;
    let single = -1;
    let singleLine = 0;
    for (let kk = 0; kk < n; kk++) {
      const p = sc.lineTo[sc.lineBase[m] + kk];
      if (p < 0) continue;
      count++;
      single = p;
      singleLine = kk;
      sumI += intensities[p];
      sumW += lineWeight[ls + kk];
      sumD += shifts[p] - linePpm[ls + kk];
    }
    sc.linesMatched[m] = count;
    if (count === 1) {
      const toCentre = shifts[single] - sigShift[k];
      sc.delta[m] = Math.abs(toCentre) <= tol ? toCentre : shifts[single] - linePpm[ls + singleLine];
      sc.intensity[m] = intensities[single];
    } else if (count > 1) {
      sc.delta[m] = sumD / count;
      sc.intensity[m] = sumI / sumW;
    }
  }
  if (anyUnresolved) unresolvedBandsInto(index, s0, M, shifts, intensities, tol, sc);
  // entryScore's arithmetic, signal by signal.
  let req = 0;
  let matchedNuclei = 0;
  let extra = 0;
  let gSum = 0;
  let nr = 0;
  let rSum = 0;
  for (let m = 0; m < M; m++) {
    const n = sigNuclei[s0 + m];
    const isReq = sc.optional[m] === 0 || allOptional;
    if (isReq) req += n;
    if (sc.linesMatched[m] === 0) continue;
    matchedNuclei += n;
    if (!isReq) extra += n;
    const z = sc.delta[m] / tol;
    gSum += n * Math.exp(-z * z);
    nr++;
    rSum += sc.intensity[m] / n;
  }
  if (matchedNuclei === 0) return;
  const explainedShare = matchedNuclei / (req + extra);
  const shiftFactor = gSum / matchedNuclei;
  let intensityFactor = 1;
  if (nr >= 2) {
    const mean = rSum / nr;
    let cv = 0;
    if (mean > 0) {
      let variance = 0;
      for (let m = 0; m < M; m++) {
        if (sc.linesMatched[m] === 0) continue;
        variance += (sc.intensity[m] / sigNuclei[s0 + m] - mean) ** 2;
      }
      variance /= nr;
      cv = Math.sqrt(variance) / mean;
    }
    intensityFactor = Math.exp(-0.5 * (cv / 1) ** 2);
  }
  sc.explainedShare = explainedShare;
  sc.score = Math.min(1, Math.max(0, explainedShare * explainedShare * shiftFactor * intensityFactor));
}

/**
 * multipletsMatchPeaks' offset search for one resolved multiplet (lines ls … ls+n−1) over the
 * peaks [from, to): the offset that lines up the most line weight, ties to the smaller misfit,
 * then the smaller |offset|. Writes sc.bestOffset; false when no offset was proposed.
 */
function offsetSearch(
  grid: PeaksShiftGrid,
  from: number,
  to: number,
  linePpm: Float64Array,
  lineWeight: Float64Array,
  ls: number,
  n: number,
  tol: number,
  lineTol: number,
  sc: EntryScoreScratch,
): boolean {
  const shifts = grid.shifts;
  let bestCover = -1;
  let bestMisfit = Infinity;
  let bestOffset = 0;
  let pStart = from;
  for (let l = 0; l < n; l++) {
    const Ll = linePpm[ls + l];
    while (pStart < to && shifts[pStart] - Ll < -tol) pStart++;
    for (let p = pStart; p < to; p++) {
      const offset = shifts[p] - Ll;
      if (offset > tol) break;
      if (offset < -tol) continue;
      let cover = 0;
      let misfit = 0;
      // Start where the first target falls (every earlier peak lies below it, so the nearest
      // peaks come out as a walk from `from` finds them).
      const first = peaksShiftGridLowerBound(grid, linePpm[ls] + offset);
      let ptr = first < from ? from : first > to ? to : first;
      let left = 1;
      let kk = 0;
      for (; kk < n; kk++) {
        // An offset that can no longer tie the best is dropped (it could not win below).
        if (cover + left < bestCover - 1e-9) break;
        const Lk = linePpm[ls + kk];
        const w = lineWeight[ls + kk];
        left -= w;
        const target = Lk + offset;
        while (ptr < to && shifts[ptr] < target) ptr++;
        const q = ptr === to ? to - 1 : ptr === from ? from : target - shifts[ptr - 1] <= shifts[ptr] - target ? ptr - 1 : ptr;
        const d = Math.abs(shifts[q] - target);
        if (d <= lineTol && Math.abs(shifts[q] - Lk) <= tol) {
          cover += w;
          misfit += d;
        }
      }
      if (kk < n) continue;
      if (multipletOffsetBetter(cover, misfit, offset, bestCover, bestMisfit, bestOffset)) {
        bestCover = cover;
        bestMisfit = misfit;
        bestOffset = offset;
      }
    }
  }
  sc.bestOffset = bestOffset;
  return bestCover >= 0;
}

/** multipletsMatchPeaks' unresolvedBands on the scratch arrays (see there for the rules). */
function unresolvedBandsInto(index: LibraryIndex, s0: number, M: number, shifts: Float64Array, intensities: Float64Array, tol: number, sc: EntryScoreScratch): void {
  const { sigShift, sigHalf, sigNuclei } = index;
  let nm = 0;
  for (let m = 0; m < M; m++) if (sc.unresolved[m]) sc.members[nm++] = m;
  // Sort members by (centre, position): insertion sort, entries hold a handful.
  for (let i = 1; i < nm; i++) {
    const v = sc.members[i];
    let j = i;
    while (j > 0) {
      const u = sc.members[j - 1];
      const c = sigShift[s0 + u] - sigShift[s0 + v] || u - v;
      if (c <= 0) break;
      sc.members[j] = u;
      j--;
    }
    sc.members[j] = v;
  }
  let b0 = 0;
  while (b0 < nm) {
    let b1 = b0 + 1;
    const first = s0 + sc.members[b0];
    let reach = sigShift[first] + sigHalf[first];
    while (b1 < nm && sigShift[s0 + sc.members[b1]] - sigHalf[s0 + sc.members[b1]] <= reach) {
      const k = s0 + sc.members[b1];
      reach = Math.max(reach, sigShift[k] + sigHalf[k]);
      b1++;
    }
    let lo = Infinity;
    let nuclei = 0;
    for (let i = b0; i < b1; i++) {
      const k = s0 + sc.members[i];
      lo = Math.min(lo, sigShift[k] - sigHalf[k]);
      nuclei += sigNuclei[k];
    }
    // The band's distinct pooled peaks, ascending (each member pooled at most one).
    let sumI = 0;
    let sumX = 0;
    let sumPlain = 0;
    let count = 0;
    let last = -1;
    for (;;) {
      let next = Infinity;
      for (let i = b0; i < b1; i++) {
        const p = sc.pooled[sc.members[i]];
        if (p > last && p < next) next = p;
      }
      if (next === Infinity) break;
      sumI += intensities[next];
      sumX += intensities[next] * shifts[next];
      sumPlain += shifts[next];
      count++;
      last = next;
    }
    const centroid = count === 0 ? 0 : sumI > 0 ? sumX / sumI : sumPlain / count;
    const halfWidth = (reach - lo) / 2;
    const scaled = ((centroid - (lo + reach) / 2) * tol) / Math.max(tol, halfWidth);
    for (let i = b0; i < b1; i++) {
      const m = sc.members[i];
      if (count === 0) {
        sc.linesMatched[m] = 0;
        sc.delta[m] = 0;
        sc.intensity[m] = 0;
      } else {
        sc.linesMatched[m] = 1;
        sc.delta[m] = scaled;
        sc.intensity[m] = (sumI * sigNuclei[s0 + m]) / nuclei;
      }
    }
    b0 = b1;
  }
}
