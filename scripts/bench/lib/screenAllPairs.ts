// Plain all-pairs screening: every entry is matched in full, and for every multiplet line of every
// entry every mixture peak is compared (entries × lines × peaks comparisons, no shift index, no
// pruning, the lines simulated afresh in each call). Same preparation, line assignment, score and
// result assembly as screenMixture. It is the baseline the benchmark measures against and the
// oracle the tests compare with.
import { entryScore, multipletsMatchPeaks, signalToMultipletLines, type MultipletLines } from '../../../matching/score';
import { crowdingSample, screenCrowding, screenPrepare, screenResultAssemble, shiftInRegions, type EntryFound, type SignalWindow } from '../../../matching/screen';
import type { LibraryEntry } from '../../../shared/libraryEntry';
import type { Mixture } from '../../../shared/mixture';
import type { ScreenOptions, ScreenResult } from '../../../shared/screening';

/**
 * Peak indices [from, to) of the multiplet's window (its lines ± tolerance, plus half extent), by
 * comparing every line with every peak: from = the first peak at or above some line − reach, to =
 * one past the last peak at or below some line + reach.
 */
function scanAll(mult: MultipletLines, shifts: Float64Array, tol: number): [number, number] {
  const h = mult.ppm.length === 1 ? (mult.halfExtentPpm ?? 0) : 0;
  let from = shifts.length;
  let to = 0;
  for (let l = 0; l < mult.ppm.length; l++) {
    const x = mult.ppm[l];
    for (let p = 0; p < shifts.length; p++) {
      // same arithmetic as multipletsMatchPeaks' window, so both agree to the last bit
      if (shifts[p] >= x - tol - h && p < from) from = p;
      if (shifts[p] <= x + tol + h && p + 1 > to) to = p + 1;
    }
  }
  return from < to ? [from, to] : [0, 0];
}

export function screenAllPairs(mixture: Mixture, entries: LibraryEntry[], options: ScreenOptions = {}): ScreenResult {
  const prep = screenPrepare(mixture, entries, options);
  const { tol, minScore, shifts, intensities, set } = prep;
  const found: EntryFound[] = [];
  let screened = 0;
  // Windows of every screened entry's signals, for the crowding figures (same sample as screenMixture).
  const windows: SignalWindow[][] = [];
  for (const entry of entries) {
    if (entry.retired && !prep.includeRetired) continue;
    if (prep.solvent !== undefined && entry.solvent !== prep.solvent && entry.solvent !== 'other') continue;
    const signals = entry.signals.map((s, i) => ({ s, i })).filter(({ s }) => s.nucleus === mixture.nucleus);
    if (signals.length === 0) continue;
    screened++;
    const multiplets = signals.map(({ s }) => signalToMultipletLines(s, mixture.mhz));
    const scans = multiplets.map((m) => scanAll(m, shifts, tol));
    let w = 0;
    const matches = multipletsMatchPeaks(multiplets, shifts, intensities, tol, mixture.mhz, () => scans[w++]);
    const allOptional = signals.every(({ s }) => s.nucleus === '1H' && s.exchangeable === true);
    windows.push(
      multiplets.map((m, k) => {
        const h = m.halfExtentPpm ?? 0;
        const s = signals[k].s;
        return {
          lo: Math.min(s.shift, m.ppm[0]) - h - tol,
          hi: Math.max(s.shift, m.ppm[m.ppm.length - 1]) + h + tol,
          optional: (s.nucleus === '1H' && s.exchangeable === true && !allOptional) || shiftInRegions(s.shift, set.regions),
        };
      }),
    );
    const summaries = signals.map(({ s }, k) => ({
      nuclei: s.nuclei,
      exchangeable: (s.nucleus === '1H' && s.exchangeable === true && !allOptional) || shiftInRegions(s.shift, set.regions),
      matched: matches[k].linesMatched > 0,
      deltaPpm: matches[k].scoreDeltaPpm,
      intensity: matches[k].intensity,
    }));
    const score = entryScore(summaries, { tolerancePpm: tol });
    if (score.score > 0 && score.score >= minScore) found.push({ entry, matches: matches.map((m, k) => ({ ...m, signalIndex: signals[k].i })), score });
  }
  const crowding = screenCrowding(
    crowdingSample(windows.length).map((i) => windows[i]),
    (lo, hi) => shifts.some((x) => x >= lo && x <= hi),
    tol,
  );
  return screenResultAssemble(mixture, prep, screened, found, crowding);
}
