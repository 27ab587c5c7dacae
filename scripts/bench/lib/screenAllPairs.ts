// Plain all-pairs screening: every entry is matched in full, and every multiplet's peak window is
// found by a linear scan over all mixture peaks (entries × lines × peaks comparisons). Same
// preparation, line assignment, score and result assembly as screenMixture; no shift index, no
// pruning. It is the baseline the benchmark measures against and the oracle the tests compare with.
import { multipletToLines } from '../../../matching/multiplets/multipletToLines';
import { entryScore, multipletsMatchPeaks } from '../../../matching/score';
import { screenPrepare, screenResultAssemble, shiftInRegions, type EntryFound } from '../../../matching/screen';
import type { LibraryEntry } from '../../../shared/libraryEntry';
import type { Mixture } from '../../../shared/mixture';
import type { ScreenOptions, ScreenResult } from '../../../shared/screening';

export function screenAllPairs(mixture: Mixture, entries: LibraryEntry[], options: ScreenOptions = {}): ScreenResult {
  const prep = screenPrepare(mixture, entries, options);
  const { tol, minScore, shifts, intensities, set } = prep;
  // Linear scan over every peak instead of a binary search: the all-pairs part.
  const linear = (lo: number, hi: number): [number, number] => {
    let from = -1;
    let to = -1;
    for (let p = 0; p < shifts.length; p++) {
      if (shifts[p] >= lo && shifts[p] <= hi) {
        if (from < 0) from = p;
        to = p + 1;
      }
    }
    return from < 0 ? [0, 0] : [from, to];
  };
  const found: EntryFound[] = [];
  let screened = 0;
  for (const entry of entries) {
    if (entry.retired && !prep.includeRetired) continue;
    if (prep.solvent !== undefined && entry.solvent !== prep.solvent && entry.solvent !== 'other') continue;
    const signals = entry.signals.map((s, i) => ({ s, i })).filter(({ s }) => s.nucleus === mixture.nucleus);
    if (signals.length === 0) continue;
    screened++;
    const multiplets = signals.map(({ s }) => {
      const sim = s.nucleus === '1H' ? multipletToLines(s, mixture.mhz) : [{ shift: s.shift, area: s.nuclei }];
      return { centre: s.shift, ppm: Float64Array.from(sim, (l) => l.shift), weight: Float64Array.from(sim, (l) => l.area / s.nuclei) };
    });
    const matches = multipletsMatchPeaks(multiplets, shifts, intensities, tol, mixture.mhz, linear);
    const allOptional = signals.every(({ s }) => s.nucleus === '1H' && s.exchangeable === true);
    const summaries = signals.map(({ s }, k) => ({
      nuclei: s.nuclei,
      exchangeable: (s.nucleus === '1H' && s.exchangeable === true && !allOptional) || shiftInRegions(s.shift, set.regions),
      matched: matches[k].linesMatched > 0,
      deltaPpm: matches[k].deltaPpm,
      intensity: matches[k].intensity,
    }));
    const score = entryScore(summaries, { tolerancePpm: tol });
    if (score.score > 0 && score.score >= minScore) found.push({ entry, matches: matches.map((m, k) => ({ ...m, signalIndex: signals[k].i })), score });
  }
  return screenResultAssemble(mixture, prep, screened, found);
}
