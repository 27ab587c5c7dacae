import { createContext, useCallback, useContext, useEffect, useMemo, useState, type ReactNode } from 'react';
import { SessionResponseSchema, type SessionResponse, type SignInBody } from '../../shared/api/auth';
import { apiRequest } from '../../client/api';
import { settingGet, settingSet } from '../../localdb/settings';

const SESSION_KEY = 'session';

interface SessionState {
  /** null while the stored session is being read. */
  loading: boolean;
  session: SessionResponse | null;
  signIn(body: SignInBody): Promise<void>;
  signOut(): Promise<void>;
  /** Replace the tokens after a refresh. */
  update(session: SessionResponse): Promise<void>;
}

const SessionContext = createContext<SessionState | null>(null);

/** Keeps the signed-in session in the local database so it survives reloads and offline use. */
export function SessionProvider({ children }: { children: ReactNode }) {
  const [loading, setLoading] = useState(true);
  const [session, setSession] = useState<SessionResponse | null>(null);

  useEffect(() => {
    let alive = true;
    settingGet(SESSION_KEY)
      .then((raw) => {
        if (!alive || !raw) return;
        const parsed = SessionResponseSchema.safeParse(JSON.parse(raw));
        if (parsed.success) setSession(parsed.data);
      })
      .catch(() => undefined)
      .finally(() => alive && setLoading(false));
    return () => {
      alive = false;
    };
  }, []);

  const update = useCallback(async (next: SessionResponse) => {
    await settingSet(SESSION_KEY, JSON.stringify(next));
    setSession(next);
  }, []);

  const signIn = useCallback(
    async (body: SignInBody) => {
      const res = SessionResponseSchema.parse(await apiRequest<unknown>('/api/auth/sign-in', { method: 'POST', body }));
      await update(res);
    },
    [update],
  );

  const signOut = useCallback(async () => {
    await settingSet(SESSION_KEY, null);
    setSession(null);
  }, []);

  const value = useMemo(() => ({ loading, session, signIn, signOut, update }), [loading, session, signIn, signOut, update]);
  return <SessionContext.Provider value={value}>{children}</SessionContext.Provider>;
}

export function useSession(): SessionState {
  const ctx = useContext(SessionContext);
  if (!ctx) throw new Error('useSession must be used inside <SessionProvider>');
  return ctx;
}
