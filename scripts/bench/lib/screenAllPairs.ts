// Plain all-pairs screening: every entry is matched, and every line window is found by a linear
// scan over all mixture peaks. Same peaks, same line assignment and same score as screenMixture,
// no shift index and no pruning.
// It is the baseline the benchmark measures against and the oracle the tests compare with.
import { multipletToLines } from '../../../matching/multiplets/multipletToLines';
import { mixturePeaks } from '../../../matching/peaks';
import { entryScore, multipletsMatchPeaks } from '../../../matching/score';
import type { LibraryEntry } from '../../../shared/libraryEntry';
import type { Mixture } from '../../../shared/mixture';
import { DEFAULT_TOLERANCE_PPM } from '../../../shared/nucleus';

export function screenAllPairs(mixture: Mixture, entries: LibraryEntry[], options: { tolerancePpm?: number; minScore?: number } = {}): Array<{ entryId: string; score: number }> {
  const tol = options.tolerancePpm ?? DEFAULT_TOLERANCE_PPM[mixture.nucleus];
  const minScore = options.minScore ?? 0.5;
  const set = mixturePeaks(mixture, { tolerancePpm: tol });
  const shifts = Float64Array.from(set.used, (p) => p.shift);
  const intensities = Float64Array.from(set.used, (p) => p.intensity);
  const hidden = (x: number) => set.regions.some((r) => x >= r.from && x <= r.to);
  const out: Array<{ entryId: string; score: number; explained: number }> = [];
  for (const entry of entries) {
    if (entry.retired) continue;
    if (mixture.solvent !== 'other' && entry.solvent !== mixture.solvent && entry.solvent !== 'other') continue;
    const signals = entry.signals.filter((s) => s.nucleus === mixture.nucleus);
    if (signals.length === 0) continue;
    const multiplets = signals.map((s) => {
      const sim = s.nucleus === '1H' ? multipletToLines(s, mixture.mhz) : [{ shift: s.shift, area: s.nuclei }];
      return { centre: s.shift, ppm: Float64Array.from(sim, (l) => l.shift), weight: Float64Array.from(sim, (l) => l.area / s.nuclei) };
    });
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
    const matches = multipletsMatchPeaks(multiplets, shifts, intensities, tol, mixture.mhz, linear);
    const allOptional = signals.every((s) => s.nucleus === '1H' && s.exchangeable === true);
    const summaries = signals.map((s, k) => {
      const exch = s.nucleus === '1H' && s.exchangeable === true && !allOptional;
      return { nuclei: s.nuclei, exchangeable: exch || hidden(s.shift), matched: matches[k].linesMatched > 0, deltaPpm: matches[k].deltaPpm, intensity: matches[k].intensity };
    });
    const sc = entryScore(summaries, { tolerancePpm: tol });
    if (sc.score > 0 && sc.score >= minScore) out.push({ entryId: entry.id, score: sc.score, explained: sc.explainedShare });
  }
  out.sort((a, b) => b.score - a.score || b.explained - a.explained || (a.entryId < b.entryId ? -1 : a.entryId > b.entryId ? 1 : 0));
  return out.map(({ entryId, score }) => ({ entryId, score }));
}
