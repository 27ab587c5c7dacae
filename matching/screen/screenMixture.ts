import { CAUTION_TEXT } from '../../shared/caution';
import type { LibraryEntry } from '../../shared/libraryEntry';
import type { Mixture } from '../../shared/mixture';
import { DEFAULT_TOLERANCE_PPM } from '../../shared/nucleus';
import type { ScreenCandidate, ScreenOptions, ScreenResult, SignalEvidence, UnmatchedSignal } from '../../shared/screening';
import { mixturePeaks } from '../peaks/mixturePeaks';
import { entryScore, type SignalMatchSummary } from '../score/entryScore';
import { candidatesRelate } from './candidatesRelate';
import { libraryIndexCached } from './libraryIndexCached';
import { libraryIndexEntryMatch, type SignalMatch } from './libraryIndexEntryMatch';

/**
 * Screens a mixture against library entries by tolerance-windowed matching and returns ranked
 * candidates with their evidence. Defaults (ScreenOptions): tolerancePpm DEFAULT_TOLERANCE_PPM
 * per nucleus (1H 0.03, 13C 0.5), excludeSolvent true, excludeReference true, minScore 0.5,
 * snrThreshold 3, includeRetired false, anySolvent false (a mixture in a named solvent is screened
 * against entries recorded in that solvent, plus entries recorded as "other"), maxCandidates all.
 *
 * Cost: the library's shift index is built once per library array (libraryIndexCached); each
 * peak visits only the index bins within its window, and an entry is matched in full only when
 * the nuclei its hit signals hold could still reach minScore (E is an upper bound of the score).
 * See matching/score/entryScore.ts for the score.
 */
export function screenMixture(mixture: Mixture, entries: LibraryEntry[], options: ScreenOptions = {}): ScreenResult {
  if (!mixture || (mixture.kind !== 'peaks' && mixture.kind !== 'spectrum')) throw new TypeError('mixture must be a peak list or a spectrum (kind "peaks" or "spectrum")');
  if (!Array.isArray(entries)) throw new TypeError('entries must be an array of library entries');
  if (!(mixture.mhz > 0)) throw new RangeError(`mixture spectrometer frequency must be positive, got ${mixture.mhz}`);
  const tol = options.tolerancePpm ?? DEFAULT_TOLERANCE_PPM[mixture.nucleus];
  const minScore = options.minScore ?? 0.5;
  if (!(tol > 0) || !Number.isFinite(tol)) throw new RangeError(`tolerancePpm must be a positive number, got ${tol}`);
  if (!(minScore >= 0 && minScore <= 1)) throw new RangeError(`minScore must be between 0 and 1, got ${minScore}`);
  if (options.maxCandidates !== undefined && !(Number.isInteger(options.maxCandidates) && options.maxCandidates > 0)) {
    throw new RangeError(`maxCandidates must be a positive integer, got ${options.maxCandidates}`);
  }

  const set = mixturePeaks(mixture, {
    tolerancePpm: tol,
    excludeSolvent: options.excludeSolvent ?? true,
    waterHalfWidthPpm: options.waterHalfWidthPpm,
    excludeReference: options.excludeReference ?? true,
    snrThreshold: options.snrThreshold ?? 3,
  });
  // Shifts move with the solvent (Fulmer 2010: median spread 0.3 ppm across solvents), so a named
  // solvent screens only entries recorded in it (and solvent-neutral "other" entries).
  const solvent = !(options.anySolvent ?? false) && mixture.solvent !== 'other' ? mixture.solvent : undefined;
  const index = libraryIndexCached(entries, mixture.nucleus, mixture.mhz, { includeRetired: options.includeRetired ?? false, ...(solvent ? { solvent } : {}) });
  const shifts = Float64Array.from(set.used, (p) => p.shift);
  const intensities = Float64Array.from(set.used, (p) => p.intensity);

  const touched = indexHits(index, shifts, tol, set.regions);
  const found: Array<{ e: number; matches: SignalMatch[]; score: ReturnType<typeof entryScore> }> = [];
  const { hitRequired, hitExchangeable } = index.scratch;
  for (const e of touched) {
    // Upper bound of E (hidden signals counted as found); score ≤ E².
    const bound = (hitRequired[e] + hitExchangeable[e]) / (index.entryRequired[e] + hitExchangeable[e]);
    hitRequired[e] = 0;
    hitExchangeable[e] = 0;
    if (bound * bound < minScore - 1e-12) continue;
    const matches = libraryIndexEntryMatch(index, e, shifts, intensities, tol);
    const summaries: SignalMatchSummary[] = matches.map((m) => ({
      nuclei: index.sigNuclei[m.signal],
      exchangeable: index.sigExchangeable[m.signal] === 1 || inRegions(index.sigShift[m.signal], set.regions),
      matched: m.linesMatched > 0,
      deltaPpm: m.deltaPpm,
      intensity: m.intensity,
    }));
    const score = entryScore(summaries, { tolerancePpm: tol });
    if (score.score > 0 && score.score >= minScore) found.push({ e, matches, score });
  }
  found.sort(
    (a, b) =>
      b.score.score - a.score.score ||
      b.score.explainedShare - a.score.explainedShare ||
      (index.entries[a.e].id < index.entries[b.e].id ? -1 : index.entries[a.e].id > index.entries[b.e].id ? 1 : 0),
  );

  const peakSets = found.map((f) => [...new Set(f.matches.flatMap((m) => m.peaks))].sort((x, y) => x - y));
  const relations = candidatesRelate(found.map((f, i) => ({ entryId: index.entries[f.e].id, peaks: peakSets[i], explainedShare: f.score.explainedShare })));
  let candidates: ScreenCandidate[] = found.map((f, i) => candidateBuild(index.entries[f.e], f, i, index.sigSource, set.regions));
  candidates.forEach((c, i) => {
    c.ambiguityGroup = relations.groupOf[i];
    c.shadowedBy = relations.shadowedBy[i];
  });
  let groups = relations.groups;
  if (options.maxCandidates !== undefined && candidates.length > options.maxCandidates) {
    candidates = candidates.slice(0, options.maxCandidates);
    const kept = new Set(candidates.map((c) => c.ambiguityGroup));
    groups = groups.filter((g) => kept.has(g.id));
  }
  const explained = new Set<number>();
  for (const c of candidates) for (const ev of c.evidence) for (const p of ev.peakIndices) explained.add(p);
  return {
    mixtureName: mixture.name,
    nucleus: mixture.nucleus,
    mhz: mixture.mhz,
    tolerancePpm: tol,
    minScore,
    noise: set.noise,
    entriesScreened: index.entries.length,
    candidates,
    ambiguityGroups: groups,
    peaksUsed: set.used,
    peaksExcluded: set.excluded,
    unexplainedPeaks: set.used.map((p) => p.index).filter((i) => !explained.has(i)),
    caution: CAUTION_TEXT,
  };
}

function inRegions(shift: number, regions: ReadonlyArray<{ from: number; to: number }>): boolean {
  for (const r of regions) if (shift >= r.from && shift <= r.to) return true;
  return false;
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

function candidateBuild(
  entry: LibraryEntry,
  f: { matches: SignalMatch[]; score: ReturnType<typeof entryScore> },
  rankIndex: number,
  sigSource: Int32Array,
  regions: ReadonlyArray<{ from: number; to: number }>,
): ScreenCandidate {
  const ratios = f.matches.filter((m) => m.linesMatched > 0).map((m) => m.intensity / entry.signals[sigSource[m.signal]].nuclei);
  const sorted = [...ratios].sort((a, b) => a - b);
  const mid = sorted.length >> 1;
  const median = sorted.length === 0 ? 0 : sorted.length % 2 ? sorted[mid] : (sorted[mid - 1] + sorted[mid]) / 2;
  const evidence: SignalEvidence[] = [];
  const unmatched: UnmatchedSignal[] = [];
  for (const m of f.matches) {
    const i = sigSource[m.signal];
    const s = entry.signals[i];
    const common = {
      signalIndex: i,
      ...(s.label !== undefined ? { label: s.label } : {}),
      shift: s.shift,
      ...(s.nucleus === '1H' ? { multiplicity: s.multiplicity } : {}),
      nuclei: s.nuclei,
      exchangeable: s.nucleus === '1H' && s.exchangeable === true,
      hidden: inRegions(s.shift, regions),
    };
    if (m.linesMatched === 0) {
      unmatched.push(common);
      continue;
    }
    const perNucleus = m.intensity / s.nuclei;
    evidence.push({
      ...common,
      peakIndices: m.peaks,
      linesMatched: m.linesMatched,
      linesExpected: m.linesExpected,
      deltaPpm: m.deltaPpm,
      intensity: m.intensity,
      intensityPerNucleus: perNucleus,
      ratio: median > 0 ? perNucleus / median : 1,
    });
  }
  return {
    rank: rankIndex + 1,
    entryId: entry.id,
    name: entry.name,
    category: entry.category,
    contaminant: entry.category === 'contaminant',
    score: f.score.score,
    explainedShare: f.score.explainedShare,
    shiftFactor: f.score.shiftFactor,
    intensityFactor: f.score.intensityFactor,
    intensityCv: f.score.intensityCv,
    evidence,
    unmatched,
    ambiguityGroup: null,
    shadowedBy: [],
  };
}
