import type { ScreenCrowding } from '../../shared/screening';

/** At most this many library entries, evenly spaced, are looked at for the crowding figures. */
export const CROWDING_SAMPLE_ENTRIES = 500;

/**
 * Share of (displaced) signal windows holding a peak above which a screen says the mixture is
 * crowded. A product setting, not a published value: with two windows in five hit by chance, an
 * entry of three signals finds all of them by chance one time in sixteen (0.4³), one of two
 * signals one time in six, so the explained share E no longer tells present compounds from absent
 * ones and the shift and intensity factors are left to do it alone.
 */
export const CROWDED_WINDOW_SHARE = 0.4;

/**
 * Displacements of the windows, in tolerances: chance is measured where the entry's own compound,
 * if present, puts no peaks (20 tolerances = ±0.6 ppm for 1H at ±0.03), as decoys measure it.
 */
export const CROWDING_DISPLACEMENTS = [-20, 20] as const;

/** One signal's window: the extent of its lines ± the tolerance (as the matcher searches it). */
export interface SignalWindow {
  lo: number;
  hi: number;
  /** Exchangeable, or centred in a set-aside region: counts only when found, so left out here. */
  optional: boolean;
}

/** Positions of the entries sampled out of `n` screened entries (all of them up to CROWDING_SAMPLE_ENTRIES). */
export function crowdingSample(n: number): number[] {
  if (n <= CROWDING_SAMPLE_ENTRIES) return Array.from({ length: n }, (_, i) => i);
  return Array.from({ length: CROWDING_SAMPLE_ENTRIES }, (_, i) => Math.floor((i * n) / CROWDING_SAMPLE_ENTRIES));
}

/**
 * How crowded the mixture is for this tolerance, seen from the library: the share of signal
 * windows that hold a mixture peak, and the share of entries that find a peak in every required
 * window — what a random entry gets by chance. Both are measured on the sampled entries' windows
 * displaced by CROWDING_DISPLACEMENTS tolerances, so the compounds really present (which would
 * fill their own windows) do not count, however small the library. In a crowded mixture (the
 * first share ≥ CROWDED_WINDOW_SHARE) a high score is weak evidence, and the result says so.
 */
export function screenCrowding(sampled: ReadonlyArray<readonly SignalWindow[]>, hasPeak: (lo: number, hi: number) => boolean, tolerancePpm: number): ScreenCrowding {
  let windows = 0;
  let hit = 0;
  let entries = 0;
  let allHit = 0;
  for (const signals of sampled) {
    for (const k of CROWDING_DISPLACEMENTS) {
      const d = k * tolerancePpm;
      let required = 0;
      let found = 0;
      for (const w of signals) {
        if (w.optional) continue;
        required++;
        if (hasPeak(w.lo + d, w.hi + d)) found++;
      }
      if (required === 0) continue;
      entries++;
      windows += required;
      hit += found;
      if (found === required) allHit++;
    }
  }
  const windowHitShare = windows > 0 ? hit / windows : 0;
  const entriesAllHitShare = entries > 0 ? allHit / entries : 0;
  const pct = (x: number) => `${Math.round(100 * x)} %`;
  return {
    windowHitShare,
    entriesAllHitShare,
    entriesSampled: entries / CROWDING_DISPLACEMENTS.length,
    warning:
      windows > 0 && windowHitShare >= CROWDED_WINDOW_SHARE
        ? `crowded mixture for ±${tolerancePpm} ppm: ${pct(windowHitShare)} of library signal windows hold a mixture peak and ${pct(entriesAllHitShare)} of library entries find a peak for every signal by chance, so many reach the threshold without being present; narrow the tolerance if the referencing allows, and take confirmation from the fit and its q-values`
        : null,
  };
}
