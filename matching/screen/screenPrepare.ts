import type { LibraryEntry } from '../../shared/libraryEntry';
import type { Mixture } from '../../shared/mixture';
import { DEFAULT_TOLERANCE_PPM } from '../../shared/nucleus';
import type { ScreenOptions } from '../../shared/screening';
import type { Solvent } from '../../shared/solvent';
import { mixturePeaks, type MixturePeakSet } from '../peaks/mixturePeaks';

export interface ScreenPrepared {
  tol: number;
  minScore: number;
  maxCandidates: number;
  includeRetired: boolean;
  /** Entries must be recorded in this solvent (or "other"); undefined: any solvent. */
  solvent: Solvent | undefined;
  set: MixturePeakSet;
  shifts: Float64Array;
  intensities: Float64Array;
}

/**
 * Checks the inputs of a screening, applies the ScreenOptions defaults (tolerancePpm
 * DEFAULT_TOLERANCE_PPM[nucleus], excludeSolvent true, excludeReference true, minScore 0.5,
 * snrThreshold 3, includeRetired false, anySolvent false, maxCandidates 100) and prepares the
 * mixture peaks. Shared by screenMixture and the all-pairs baseline so both answer alike.
 */
export function screenPrepare(mixture: Mixture, entries: readonly LibraryEntry[], options: ScreenOptions): ScreenPrepared {
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
  return {
    tol,
    minScore,
    maxCandidates: options.maxCandidates ?? 100,
    includeRetired: options.includeRetired ?? false,
    solvent,
    set,
    shifts: Float64Array.from(set.used, (p) => p.shift),
    intensities: Float64Array.from(set.used, (p) => p.intensity),
  };
}
