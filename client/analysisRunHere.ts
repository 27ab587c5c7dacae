import type { LibraryEntry } from '../shared/libraryEntry';
import type { StoredAnalysis } from '../localdb/analyses';
import { analysisSteps } from './analysisCompute';
import type { AnalysisInput, AnalysisStage } from './analysisStages';

/** Give the UI a frame to paint the progress before the next synchronous engine step. */
const yieldToUi = () => new Promise<void>((r) => setTimeout(r, 16));

/**
 * Runs one analysis on this thread in stages, yielding between them so the screen shows which
 * stage is running. Used on devices and as the web's fallback when a worker cannot start.
 * Throws InputError (with lines) on bad input.
 */
export async function analysisRunHere(input: AnalysisInput, library: LibraryEntry[], onStage: (s: AnalysisStage) => void): Promise<StoredAnalysis> {
  const steps = analysisSteps(input, library);
  onStage('reading');
  await yieldToUi();
  steps.read();
  onStage('screening');
  await yieldToUi();
  steps.screen();
  onStage('fitting');
  await yieldToUi();
  const result = steps.analyse();
  onStage('saving');
  return result;
}
