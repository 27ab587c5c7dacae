import type { LibraryEntry } from '../shared/libraryEntry';
import type { InputIssue } from '../shared/inputIssue';
import type { StoredAnalysis } from '../localdb/analyses';
import { InputError } from '../matching/io/InputError';
import type { AnalysisInput, AnalysisStage } from './analysisStages';
import type { WorkerReply } from './analysis.worker';

export { STAGE_TEXT, type AnalysisInput, type AnalysisStage } from './analysisStages';

/**
 * The engine on this thread, fetched only when no worker can run (client/engineOnDemand.ts, a
 * separate chunk of the export), so the page's first download does not carry a second copy of the
 * engine next to the worker's.
 */
async function analysisRunHere(input: AnalysisInput, library: LibraryEntry[], onStage: (s: AnalysisStage) => void): Promise<StoredAnalysis> {
  const { analysisRunHere: here } = await import('./engineOnDemand');
  return here(input, library, onStage);
}

let worker: Worker | null = null;
let broken = false;
let nextJob = 1;

function getWorker(): Worker | null {
  if (broken) return null;
  try {
    // Metro bundles the worker entry from this exact `new Worker(new URL(...))` form.
    worker ??= new Worker(new URL('./analysis.worker', window.location.href));
    return worker;
  } catch {
    broken = true;
    return null;
  }
}

/**
 * Runs one analysis in a web worker, so the page stays responsive while the engine fits and
 * builds decoys; stages are reported as the worker reaches them. Falls back to this thread
 * when no worker can start.
 */
export async function analysisRun(input: AnalysisInput, library: LibraryEntry[], onStage: (s: AnalysisStage) => void): Promise<StoredAnalysis> {
  const w = getWorker();
  if (!w) return analysisRunHere(input, library, onStage);
  const job = nextJob++;
  return new Promise<StoredAnalysis>((resolve, reject) => {
    const onMessage = (e: MessageEvent<WorkerReply>) => {
      const m = e.data;
      if (!m || m.job !== job) return;
      if (m.type === 'stage') onStage(m.stage);
      else {
        w.removeEventListener('message', onMessage);
        w.removeEventListener('error', onError);
        if (m.type === 'done') resolve(m.result);
        else reject(m.issues ? new InputError(input.fileName, m.issues as InputIssue[]) : new Error(m.message));
      }
    };
    const onError = () => {
      // The worker script itself failed (e.g. it could not load): run here instead.
      w.removeEventListener('message', onMessage);
      w.removeEventListener('error', onError);
      broken = true;
      worker = null;
      analysisRunHere(input, library, onStage).then(resolve, reject);
    };
    w.addEventListener('message', onMessage);
    w.addEventListener('error', onError);
    w.postMessage({ job, input, library });
  });
}
