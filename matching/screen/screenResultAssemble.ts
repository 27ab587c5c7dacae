import { CAUTION_TEXT } from '../../shared/caution';
import type { LibraryEntry } from '../../shared/libraryEntry';
import type { Mixture } from '../../shared/mixture';
import type { ScreenCandidate, ScreenCrowding, ScreenResult, SignalEvidence, UnmatchedSignal } from '../../shared/screening';
import type { EntryScore } from '../score/entryScore';
import type { MultipletPeakMatch } from '../score/multipletsMatchPeaks';
import { candidatesRelate } from './candidatesRelate';
import { entryRankCompare } from './entryRankCompare';
import { shiftInRegions } from './shiftInRegions';
import type { ScreenPrepared } from './screenPrepare';

export interface EntryFound {
  entry: LibraryEntry;
  /** One per screened signal of the entry: its position in entry.signals and how it matched. */
  matches: Array<MultipletPeakMatch & { signalIndex: number }>;
  score: EntryScore;
}

/**
 * Turns scored entries into the ScreenResult: ranking (score, then explained share, then id),
 * the maxCandidates cut, evidence and unmatched multiplets per candidate, ambiguity groups and
 * shadowing among the reported candidates (worked out in score order), unexplained peaks and the
 * caution. The final list puts candidates that are not shadowed first, each part in score order.
 */
export function screenResultAssemble(mixture: Mixture, prep: ScreenPrepared, entriesScreened: number, scored: EntryFound[], crowding: ScreenCrowding, aboveThreshold = scored.length): ScreenResult {
  let found = scored;
  found.sort((a, b) => entryRankCompare(a.entry.id, a.score, b.entry.id, b.score));
  // Groups and shadowing are worked out among the reported candidates only.
  if (found.length > prep.maxCandidates) found = found.slice(0, prep.maxCandidates);
  const peakSets = found.map((f) => [...new Set(f.matches.flatMap((m) => m.peaks))].sort((x, y) => x - y));
  const relations = candidatesRelate(found.map((f, i) => ({ entryId: f.entry.id, peaks: peakSets[i], explainedShare: f.score.explainedShare, ...(f.entry.nearDuplicateOf ? { nearDuplicateOf: f.entry.nearDuplicateOf } : {}) })));
  const built: ScreenCandidate[] = found.map((f, i) => candidateBuild(f, i, prep.set.regions));
  built.forEach((c, i) => {
    c.ambiguityGroup = relations.groupOf[i];
    c.shadowedBy = relations.shadowedBy[i];
  });
  // A candidate whose every peak other candidates already explain is weak evidence however well it
  // scores (one singlet on another compound's multiplet): the unshadowed ones are listed first.
  const candidates = [...built.filter((c) => c.shadowedBy.length === 0), ...built.filter((c) => c.shadowedBy.length > 0)];
  candidates.forEach((c, i) => {
    c.rank = i + 1;
  });
  const groups = relations.groups;
  const explained = new Set<number>();
  for (const c of candidates) for (const ev of c.evidence) for (const p of ev.peakIndices) explained.add(p);
  return {
    mixtureName: mixture.name,
    nucleus: mixture.nucleus,
    mhz: mixture.mhz,
    tolerancePpm: prep.tol,
    minScore: prep.minScore,
    noise: prep.set.noise,
    entriesScreened,
    candidates,
    candidatesAboveThreshold: aboveThreshold,
    ambiguityGroups: groups,
    peaksUsed: prep.set.used,
    peaksExcluded: prep.set.excluded,
    unexplainedPeaks: prep.set.used.map((p) => p.index).filter((i) => !explained.has(i)),
    crowding,
    caution: CAUTION_TEXT,
  };
}

function candidateBuild(f: EntryFound, rankIndex: number, regions: ReadonlyArray<{ from: number; to: number }>): ScreenCandidate {
  const entry = f.entry;
  const ratios = f.matches.filter((m) => m.linesMatched > 0).map((m) => m.intensity / entry.signals[m.signalIndex].nuclei);
  const sorted = [...ratios].sort((a, b) => a - b);
  const mid = sorted.length >> 1;
  const median = sorted.length === 0 ? 0 : sorted.length % 2 ? sorted[mid] : (sorted[mid - 1] + sorted[mid]) / 2;
  const evidence: SignalEvidence[] = [];
  const unmatched: UnmatchedSignal[] = [];
  for (const m of f.matches) {
    const i = m.signalIndex;
    const s = entry.signals[i];
    const common = {
      signalIndex: i,
      ...(s.label !== undefined ? { label: s.label } : {}),
      shift: s.shift,
      ...(s.nucleus === '1H' ? { multiplicity: s.multiplicity } : {}),
      nuclei: s.nuclei,
      exchangeable: s.nucleus === '1H' && s.exchangeable === true,
      hidden: shiftInRegions(s.shift, regions),
    };
    if (m.linesMatched === 0) {
      unmatched.push(common);
      continue;
    }
    const perNucleus = m.intensity / s.nuclei;
    evidence.push({
      ...common,
      peakIndices: m.peaks,
      linePpm: m.linePpm,
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
