import type { AnalysisSettings } from '../localdb/analyses';

/** The stages an analysis reports as it runs (shown by RunProgress). */
export type AnalysisStage = 'reading' | 'screening' | 'fitting' | 'saving';

export const STAGE_TEXT: Record<AnalysisStage, string> = {
  reading: 'Reading the mixture',
  screening: 'Screening the library',
  fitting: 'Fitting and quantifying candidates',
  saving: 'Keeping the result on this device',
};

/**
 * What the person gave an analysis. Kept apart from analysisCompute (which brings the engine) so
 * that the web app's first download does not carry the engine: the web runs it in a worker.
 */
export interface AnalysisInput {
  /** A file's name (its extension picks the reader) or "pasted.txt" for pasted text. */
  fileName: string;
  content: string;
  name?: string;
  demo?: boolean;
  settings: AnalysisSettings;
}
