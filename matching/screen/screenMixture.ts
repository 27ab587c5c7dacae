import type { LibraryEntry } from '../../shared/libraryEntry';
import type { Mixture } from '../../shared/mixture';
import type { ScreenOptions, ScreenResult } from '../../shared/screening';
import { entryScore, type EntryScore, type SignalMatchSummary } from '../score/entryScore';
import { libraryIndexCached } from './libraryIndexCached';
import { libraryIndexEntryMatch, type SignalMatch } from './libraryIndexEntryMatch';
import { entryRankCompare } from './entryRankCompare';
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
 * Cost: the library's shift index is built once per library array (libraryIndexCached); each
 * peak visits only the index bins within its window, and an entry is matched in full only when
 * the nuclei its hit signals hold could still reach minScore (E is an upper bound of the score).
 * See matching/score/entryScore.ts for the score.
 */
export function screenMixture(mixture: Mixture, entries: LibraryEntry[], options: ScreenOptions = {}): ScreenResult {
  const prep = screenPrepare(mixture, entries, options);
  const { tol, minScore, shifts, intensities, set } = prep;
  const index = libraryIndexCached(entries, mixture.nucleus, mixture.mhz, { includeRetired: prep.includeRetired, ...(prep.solvent ? { solvent: prep.solvent } : {}) });
  const touched = indexHits(index, shifts, tol, set.regions);
  // Light records while scoring; only the reported best get their evidence built.
  const scored: Array<{ e: number; matches: SignalMatch[]; score: EntryScore }> = [];
  const { hitRequired, hitExchangeable } = index.scratch;
  // Upper bound of E per touched entry (hidden signals counted as found); score ≤ E². Survivors are
  // picked, and the scratch cleared, before any matching, so an error below cannot leave it dirty.
  const survivors: number[] = [];
  for (const e of touched) {
    const bound = (hitRequired[e] + hitExchangeable[e]) / (index.entryRequired[e] + hitExchangeable[e]);
    hitRequired[e] = 0;
    hitExchangeable[e] = 0;
    if (bound * bound >= minScore - 1e-12) survivors.push(e);
  }
  index.scratch.stats = { touched: touched.length, survived: survivors.length };
  for (const e of survivors) {
    const matches = libraryIndexEntryMatch(index, e, shifts, intensities, tol);
    const summaries: SignalMatchSummary[] = new Array(matches.length);
    for (let i = 0; i < matches.length; i++) {
      const m = matches[i];
      summaries[i] = {
        nuclei: index.sigNuclei[m.signal],
        exchangeable: index.sigExchangeable[m.signal] === 1 || shiftInRegions(index.sigShift[m.signal], set.regions),
        matched: m.linesMatched > 0,
        deltaPpm: m.scoreDeltaPpm,
        intensity: m.intensity,
      };
    }
    const score = entryScore(summaries, { tolerancePpm: tol });
    if (score.score > 0 && score.score >= minScore) scored.push({ e, matches, score });
  }
  scored.sort((a, b) => entryRankCompare(index.entries[a.e].id, a.score, index.entries[b.e].id, b.score));
  const found: EntryFound[] = scored.slice(0, prep.maxCandidates).map((f) => ({
    entry: index.entries[f.e],
    matches: f.matches.map((m) => ({ ...m, signalIndex: index.sigSource[m.signal] })),
    score: f.score,
  }));
  return screenResultAssemble(mixture, prep, index.entries.length, found, scored.length);
}

/**
 * Entries with at least one signal whose line extent comes within tol of a peak, or whose centre
 * lies in an excluded region (counted as found, which keeps the bound an upper bound); fills scratch.hit*.
 */
function indexHits(index: ReturnType<typeof libraryIndexCached>, shifts: Float64Array, tol: number, regions: ReadonlyArray<{ from: number; to: number }>): number[] {
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

