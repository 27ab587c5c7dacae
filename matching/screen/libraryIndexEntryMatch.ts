import { multipletsMatchPeaks, type MultipletLines, type MultipletPeakMatch } from '../score/multipletsMatchPeaks';
import type { LibraryIndex } from './libraryIndexBuild';

export interface SignalMatch extends MultipletPeakMatch {
  /** Signal position in the index (global). */
  signal: number;
}

/** Matches one indexed entry's multiplets to the sorted mixture peaks (see multipletsMatchPeaks). */
export function libraryIndexEntryMatch(index: LibraryIndex, e: number, shifts: Float64Array, intensities: Float64Array, tol: number): SignalMatch[] {
  const s0 = index.sigStart[e];
  const s1 = index.sigStart[e + 1];
  const multiplets: MultipletLines[] = index.sigLines.slice(s0, s1);
  const out = multipletsMatchPeaks(multiplets, shifts, intensities, tol, index.mhz) as SignalMatch[];
  // Tag in place (no copies): this runs for every entry that survives the prune.
  for (let i = 0; i < out.length; i++) out[i].signal = s0 + i;
  return out;
}
