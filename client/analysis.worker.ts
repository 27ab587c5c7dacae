// Web worker entry: runs an analysis off the page's thread (see analysisRun.web.ts).
import type { LibraryEntry } from '../shared/libraryEntry';
import type { StoredAnalysis } from '../localdb/analyses';
import { InputError } from '../matching/io';
import { analysisSteps, type AnalysisInput, type AnalysisStage } from './analysisCompute';

export type WorkerReply =
  | { job: number; type: 'stage'; stage: AnalysisStage }
  | { job: number; type: 'done'; result: StoredAnalysis }
  | { job: number; type: 'error'; message: string; what?: string; issues?: unknown[] };

interface WorkerScope {
  addEventListener(type: 'message', fn: (e: { data: { job: number; input: AnalysisInput; library: LibraryEntry[] } }) => void): void;
  postMessage(m: WorkerReply): void;
}

const scope = globalThis as unknown as WorkerScope;

scope.addEventListener('message', (e) => {
  const { job, input, library } = e.data;
  try {
    const steps = analysisSteps(input, library);
    scope.postMessage({ job, type: 'stage', stage: 'reading' });
    steps.read();
    scope.postMessage({ job, type: 'stage', stage: 'screening' });
    steps.screen();
    scope.postMessage({ job, type: 'stage', stage: 'fitting' });
    const result = steps.analyse();
    scope.postMessage({ job, type: 'done', result });
  } catch (err) {
    if (err instanceof InputError) scope.postMessage({ job, type: 'error', message: err.message, what: err.message.split(':')[0], issues: err.issues });
    else scope.postMessage({ job, type: 'error', message: err instanceof Error ? err.message : String(err) });
  }
});
