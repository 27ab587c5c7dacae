import { useEffect, useMemo, useState } from 'react';
import type { LibraryEntry } from '../shared/libraryEntry';
import type { LibraryProblem } from '../matching/library/libraryProblem';

type EntryChecks = (candidate: unknown, library: readonly LibraryEntry[]) => LibraryProblem[];

let loaded: EntryChecks | null = null;
let loading: Promise<EntryChecks> | null = null;

/**
 * The curation checks of matching/library, fetched on first use. They bring a chemistry toolkit
 * (openchemlib) that only the submission form needs, so it comes in a separate chunk of
 * the web export and stays out of the first download; the service worker precaches it with the
 * rest, so it loads offline too.
 */
function entryChecksLoad(): Promise<EntryChecks> {
  loading ??= import('../client/engineOnDemand').then((m) => (loaded = m.entryCheckAgainstLibrary));
  return loading;
}

/** Problems the checks find in `candidate`, live; null while the checks are being loaded. */
export function useEntryChecks(candidate: unknown, library: readonly LibraryEntry[]): LibraryProblem[] | null {
  const [checks, setChecks] = useState<EntryChecks | null>(loaded);
  const [loadError, setLoadError] = useState<string | null>(null);
  useEffect(() => {
    if (checks) return;
    let live = true;
    entryChecksLoad().then(
      (fn) => live && setChecks(() => fn),
      (err: unknown) => {
        loading = null;
        if (live) setLoadError(err instanceof Error ? err.message : String(err));
      },
    );
    return () => {
      live = false;
    };
  }, [checks]);
  return useMemo(() => {
    if (loadError) return [{ check: 'schema', field: 'entry', message: `the curation checks could not be loaded (${loadError}); the curator will still run them`, entryId: '' }];
    if (!checks) return null;
    try {
      return checks(candidate, library);
    } catch (err) {
      return [{ check: 'schema', field: 'entry', message: err instanceof Error ? err.message : 'cannot check', entryId: '' }];
    }
  }, [checks, loadError, candidate, library]);
}
