import type { LibraryEntry } from '../../shared/libraryEntry';
import type { Mixture } from '../../shared/mixture';
import type { ScreenOptions, ScreenResult } from '../../shared/screening';
import { entryScore, type SignalMatchSummary } from '../score/entryScore';
import { peaksShiftGridBuild, peaksShiftGridLowerBound } from '../peaks/peaksShiftGrid';
import type { LibraryIndex } from './libraryIndexBuild';
import { libraryIndexCached } from './libraryIndexCached';
import { entryScoreScratch, libraryIndexEntryScore } from './libraryIndexEntryScore';
import { libraryIndexEntryMatch } from './libraryIndexEntryMatch';
import { crowdingSample, screenCrowding, type SignalWindow } from './screenCrowding';
import { screenResultAssemble, type EntryFound } from './screenResultAssemble';
import { shiftInRegions } from './shiftInRegions';
import { screenPrepare } from './screenPrepare';

/**
 * Screens a mixture against library entries by tolerance-windowed matching and returns ranked
 * candidates with their evidence. Defaults (ScreenOptions): tolerancePpm DEFAULT_TOLERANCE_PPM
 * per nucleus (1H 0.03, 13C 0.5), excludeSolvent true, excludeReference true, minScore 0.5,
 * snrThreshold 3, includeRetired false, anySolvent false (a mixture in a named solvent is screened
 * against entries recorded in that solvent, plus entries recorded as "other"), maxCandidates 100
 * (the best; candidatesAboveThreshold says how many reached minScore).
 *
 * Cost: the library's shift index is built once per library array (libraryIndexCached). A sparse
 * mixture's peaks visit only the index bins within their windows, and an entry is scored only
 * when the nuclei its hit signals hold could still reach minScore (E² bounds the score); a dense
 * mixture, which would reach nearly every entry, sends every entry to the scorer, which applies
 * the same bound from its own windows. Entries are scored without evidence
 * (libraryIndexEntryScore); only the reported best are matched again with it. The result also
 * says how crowded the mixture is for the tolerance (screenCrowding). See
 * matching/score/entryScore.ts for the score.
 */
export function screenMixture(mixture: Mixture, entries: LibraryEntry[], options: ScreenOptions = {}): ScreenResult {
  const prep = screenPrepare(mixture, entries, options);
  const { tol, minScore, shifts, intensities, set } = prep;
  const index = libraryIndexCached(entries, mixture.nucleus, mixture.mhz, { includeRetired: prep.includeRetired, ...(prep.solvent ? { solvent: prep.solvent } : {}) });
  const nEntries = index.entries.length;
  // Which entries to look at. A sparse mixture visits the library's shift bins within reach of its
  // peaks and keeps the entries whose hit nuclei could still reach minScore; a dense one (its peak
  // windows would visit the library's signals more than LIBRARY_PASS_MAX_VISITS times over) reaches
  // nearly every entry anyway, so every entry goes straight to the scorer, which applies the same
  // bound from its own windows. Both are exact: the choice changes the cost, never the result.
  // null: every entry.
  let survivors: number[] | null = null;
  let touchedCount = nEntries;
  if (libraryPassVisits(index, shifts, tol) <= LIBRARY_PASS_MAX_VISITS * index.sigEntry.length) {
    const touched = indexHits(index, shifts, tol, set.regions);
    const { hitRequired, hitExchangeable } = index.scratch;
    // Upper bound of E per touched entry (hidden signals counted as found); score ≤ E². The scratch
    // is cleared before any scoring, so an error below cannot leave it dirty.
    const kept: number[] = [];
    for (const e of touched) {
      const bound = (hitRequired[e] + hitExchangeable[e]) / (index.entryRequired[e] + hitExchangeable[e]);
      hitRequired[e] = 0;
      hitExchangeable[e] = 0;
      if (bound * bound >= minScore - 1e-12) kept.push(e);
    }
    survivors = kept.sort((a, b) => a - b);
    touchedCount = touched.length;
  }
  // Score every candidate without building evidence (typed arrays, no allocation per entry).
  const sc = entryScoreScratch(shifts.length);
  const grid = peaksShiftGridBuild(shifts);
  const hitE: number[] = [];
  const hitScore: number[] = [];
  const hitShare: number[] = [];
  let survived = 0;
  const count = survivors ? survivors.length : nEntries;
  for (let i = 0; i < count; i++) {
    const e = survivors ? survivors[i] : i;
    libraryIndexEntryScore(index, e, grid, intensities, tol, set.regions, minScore, sc);
    if (sc.pruned) continue;
    survived++;
    if (sc.score > 0 && sc.score >= minScore) {
      hitE.push(e);
      hitScore.push(sc.score);
      hitShare.push(sc.explainedShare);
    }
  }
  index.scratch.stats = { touched: touchedCount, survived };
  // The best maxCandidates in rank order (score, explained share, id), without sorting them all.
  const top = bestRanked(index.entries, hitE, hitScore, hitShare, prep.maxCandidates);
  // Evidence for the reported ones only, by the matcher that keeps it; its score is the same number.
  const found: EntryFound[] = top.map((k) => {
    const e = hitE[k];
    const matches = libraryIndexEntryMatch(index, e, shifts, intensities, tol);
    const summaries: SignalMatchSummary[] = matches.map((m) => ({
      nuclei: index.sigNuclei[m.signal],
      exchangeable: index.sigExchangeable[m.signal] === 1 || shiftInRegions(index.sigShift[m.signal], set.regions),
      matched: m.linesMatched > 0,
      deltaPpm: m.scoreDeltaPpm,
      intensity: m.intensity,
    }));
    const score = entryScore(summaries, { tolerancePpm: tol });
    if (score.score !== hitScore[k] || score.explainedShare !== hitShare[k]) {
      throw new Error(`internal error: the two scorers disagree on entry ${index.entries[e].id} (${hitScore[k]} vs ${score.score}); please report it with the mixture and library`);
    }
    return { entry: index.entries[e], matches: matches.map((m) => ({ ...m, signalIndex: index.sigSource[m.signal] })), score };
  });
  // How crowded the mixture is for this tolerance (sampled entries; the grid answers each window).
  const crowding = screenCrowding(
    crowdingSample(nEntries).map((e) => {
      const out: SignalWindow[] = [];
      for (let k = index.sigStart[e]; k < index.sigStart[e + 1]; k++) {
        out.push({ lo: index.sigLo[k] - tol, hi: index.sigHi[k] + tol, optional: index.sigExchangeable[k] === 1 || shiftInRegions(index.sigShift[k], set.regions) });
      }
      return out;
    }),
    (lo, hi) => {
      const i = peaksShiftGridLowerBound(grid, lo);
      return i < shifts.length && shifts[i] <= hi;
    },
    tol,
  );
  return screenResultAssemble(mixture, prep, nEntries, found, crowding, hitE.length);
}

/**
 * A mixture whose peak windows would visit the library's indexed signals more than this many
 * times over (summed over peaks, see libraryPassVisits) skips the library pass. Measured with
 * `npm run bench -- screen`: at 500 peaks the pass touched 99.8 % of the entries and pruned 6 %;
 * at 60 peaks it pruned 90 % for a tenth of the scorer's cost.
 */
const LIBRARY_PASS_MAX_VISITS = 2;

/** Signal visits the library pass would make: the bins' occupancy summed over each peak's window (O(peaks)). */
function libraryPassVisits(index: LibraryIndex, shifts: Float64Array, tol: number): number {
  const nBins = index.binStart.length - 1;
  if (nBins <= 0) return 0;
  let visits = 0;
  for (let p = 0; p < shifts.length; p++) {
    const b0 = Math.max(0, Math.floor((shifts[p] - tol - index.binOrigin) / index.binWidth));
    const b1 = Math.min(nBins - 1, Math.floor((shifts[p] + tol - index.binOrigin) / index.binWidth));
    if (b1 >= b0) visits += index.binStart[b1 + 1] - index.binStart[b0];
  }
  return visits;
}

/** Positions (in e) of the best `k` by entryRankCompare's order, best first. */
function bestRanked(entries: readonly LibraryEntry[], e: number[], score: number[], share: number[], k: number): number[] {
  const compare = (a: number, b: number) => score[b] - score[a] || share[b] - share[a] || (entries[e[a]].id < entries[e[b]].id ? -1 : entries[e[a]].id > entries[e[b]].id ? 1 : 0);
  let pool = e.map((_, i) => i);
  if (pool.length > k) {
    // Every entry of the best k scores at least the k-th largest score: sort the rest away cheaply.
    const sorted = Float64Array.from(score).sort();
    const cut = sorted[sorted.length - k];
    pool = pool.filter((i) => score[i] >= cut);
  }
  pool.sort(compare);
  return pool.slice(0, k);
}

/**
 * Entries with at least one signal whose line extent comes within tol of a peak, or whose centre
 * lies in an excluded region (counted as found, which keeps the bound an upper bound); fills scratch.hit*.
 */
function indexHits(index: LibraryIndex, shifts: Float64Array, tol: number, regions: ReadonlyArray<{ from: number; to: number }>): number[] {
  const sc = index.scratch;
  sc.run += 1;
  if (sc.run > 2_000_000_000) {
    sc.stamp.fill(0);
    sc.run = 1;
  }
  const run = sc.run;
  const touched: number[] = [];
  const nBins = index.binStart.length - 1;
  if (nBins <= 0) return touched;
  const { binStart, binSignals, sigLo, sigHi, sigEntry, sigNuclei, sigExchangeable, sigShift, binOrigin, binWidth } = index;
  for (const r of regions) {
    const b0 = Math.max(0, Math.floor((r.from - binOrigin) / binWidth));
    const b1 = Math.min(nBins - 1, Math.floor((r.to - binOrigin) / binWidth));
    for (let b = b0; b <= b1; b++) {
      for (let j = binStart[b]; j < binStart[b + 1]; j++) {
        const k = binSignals[j];
        if (sc.stamp[k] === run || sigShift[k] < r.from || sigShift[k] > r.to) continue;
        sc.stamp[k] = run;
        const e = sigEntry[k];
        if (sc.hitRequired[e] === 0 && sc.hitExchangeable[e] === 0) touched.push(e);
        sc.hitRequired[e] += sigNuclei[k];
      }
    }
  }
  for (let p = 0; p < shifts.length; p++) {
    const x = shifts[p];
    const b0 = Math.max(0, Math.floor((x - tol - binOrigin) / binWidth));
    const b1 = Math.min(nBins - 1, Math.floor((x + tol - binOrigin) / binWidth));
    for (let b = b0; b <= b1; b++) {
      for (let j = binStart[b]; j < binStart[b + 1]; j++) {
        const k = binSignals[j];
        if (sc.stamp[k] === run || sigLo[k] - tol > x || sigHi[k] + tol < x) continue;
        sc.stamp[k] = run;
        const e = sigEntry[k];
        if (sc.hitRequired[e] === 0 && sc.hitExchangeable[e] === 0) touched.push(e);
        if (sigExchangeable[k]) sc.hitExchangeable[e] += sigNuclei[k];
        else sc.hitRequired[e] += sigNuclei[k];
      }
    }
  }
  return touched;
}

