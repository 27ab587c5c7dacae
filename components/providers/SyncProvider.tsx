import { createContext, useCallback, useContext, useEffect, useMemo, useRef, useState, type ReactNode } from 'react';
import { Platform } from 'react-native';
import { useQueryClient } from '@tanstack/react-query';
import { syncRun, SYNC_LAST_KEY, type SyncOutcome, type SyncProgress } from '../../client/sync';
import { settingGet } from '../../localdb/settings';
import { useSession } from './SessionProvider';
import { libraryKeys } from '../../queries/library';
import { outboxKeys } from '../../queries/outbox';

interface SyncState {
  running: boolean;
  progress: SyncProgress | null;
  lastAt: string | null;
  lastOutcome: SyncOutcome | null;
  error: unknown;
  /** Start a round (or join the one running). Never rejects; the error lands in `error`. */
  syncNow(): Promise<void>;
}

const SyncContext = createContext<SyncState | null>(null);

/** Runs sync on start, when the browser comes back online, and on demand; one round at a time. */
export function SyncProvider({ children }: { children: ReactNode }) {
  const { session, request } = useSession();
  const qc = useQueryClient();
  const [running, setRunning] = useState(false);
  const [progress, setProgress] = useState<SyncProgress | null>(null);
  const [lastAt, setLastAt] = useState<string | null>(null);
  const [lastOutcome, setLastOutcome] = useState<SyncOutcome | null>(null);
  const [error, setError] = useState<unknown>(null);
  const inFlight = useRef<Promise<void> | null>(null);
  const role = session?.user.role ?? null;
  const userId = session?.user.id ?? null;

  useEffect(() => {
    settingGet(SYNC_LAST_KEY).then(setLastAt, () => undefined);
  }, []);

  const again = useRef(false);
  const syncNow = useCallback((): Promise<void> => {
    if (!role || !userId) return Promise.resolve();
    // Asked while a round runs (e.g. a submission saved during the start-up sync): that round may
    // be past its push, so one more round follows it.
    if (inFlight.current) {
      again.current = true;
      return inFlight.current;
    }
    const runRound = async (): Promise<void> => {
      setRunning(true);
      setError(null);
      try {
        const outcome = await syncRun(request, { id: userId!, role }, setProgress);
        setLastOutcome(outcome);
        setLastAt(outcome.finishedAt);
      } catch (err) {
        setError(err);
        again.current = false; // offline: the next trigger (reconnect, sync now) retries
      } finally {
        setProgress(null);
        // Whatever part of the round finished is in the local database now. Only the local
        // reads: re-reading server-side screens (review, admin) here would swap a form under
        // the person filling it.
        void qc.invalidateQueries({ queryKey: libraryKeys.all });
        void qc.invalidateQueries({ queryKey: outboxKeys.all });
      }
      if (again.current) {
        again.current = false;
        await runRound();
      }
    };
    const round = runRound().finally(() => {
      inFlight.current = null;
      setRunning(false);
    });
    inFlight.current = round;
    return round;
  }, [request, role, userId, qc]);

  useEffect(() => {
    if (!role) return;
    void syncNow();
    if (Platform.OS !== 'web' || typeof window === 'undefined') return;
    const onOnline = () => void syncNow();
    window.addEventListener('online', onOnline);
    return () => window.removeEventListener('online', onOnline);
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [role, userId]);

  const value = useMemo(() => ({ running, progress, lastAt, lastOutcome, error, syncNow }), [running, progress, lastAt, lastOutcome, error, syncNow]);
  return <SyncContext.Provider value={value}>{children}</SyncContext.Provider>;
}

export function useSync(): SyncState {
  const ctx = useContext(SyncContext);
  if (!ctx) throw new Error('useSync must be used inside <SyncProvider>');
  return ctx;
}
