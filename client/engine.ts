// The one place the app calls the engine for an analysis.
import type { LibraryEntry } from '../shared/libraryEntry';
import type { Mixture } from '../shared/mixture';
import type { AnalysisOptions, AnalysisReport } from '../shared/analysis';
import type { ScreenOptions, ScreenResult } from '../shared/screening';
import { screenMixture } from '../matching/screen';
import { analyseMixture } from '../matching/analyse';

/** Screening alone: the per-signal evidence the result screen shows for each candidate. */
export function engineScreen(mixture: Mixture, library: LibraryEntry[], options: ScreenOptions): ScreenResult {
  return screenMixture(mixture, library, options);
}

/** Screening → overlay fit → amounts → target–decoy q-values (matching/analyse). */
export function engineAnalyse(mixture: Mixture, library: LibraryEntry[], options: AnalysisOptions): AnalysisReport {
  return analyseMixture(mixture, library, options);
}
