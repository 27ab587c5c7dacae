import { createContext, useCallback, useContext, useEffect, useMemo, useRef, useState, type ReactNode } from 'react';
import { SessionResponseSchema, type SessionResponse, type SignInBody } from '../../shared/api/auth';
import { ApiError, apiRequest, type RequestOptions } from '../../client/api';
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
  /** An API call as the signed-in user; an expired access token is refreshed once and the call repeated. */
  request<T>(path: string, options?: Omit<RequestOptions, 'token'>): Promise<T>;
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
    const current = sessionRef.current;
    await settingSet(SESSION_KEY, null);
    setSession(null);
    if (current) apiRequest('/api/auth/sign-out', { method: 'POST', token: current.accessToken, body: { refreshToken: current.refreshToken } }).catch(() => undefined);
  }, []);

  const sessionRef = useRef<SessionResponse | null>(null);
  sessionRef.current = session;
  const refreshing = useRef<Promise<SessionResponse> | null>(null);

  const request = useCallback(
    async <T,>(path: string, options: Omit<RequestOptions, 'token'> = {}): Promise<T> => {
      const current = sessionRef.current;
      try {
        return await apiRequest<T>(path, { ...options, token: current?.accessToken });
      } catch (err) {
        if (!(err instanceof ApiError) || err.status !== 401 || !current) throw err;
        // One refresh at a time: refresh tokens rotate, a second parallel refresh would fail.
        refreshing.current ??= apiRequest<unknown>('/api/auth/refresh', { method: 'POST', body: { refreshToken: current.refreshToken } })
          .then((raw) => SessionResponseSchema.parse(raw))
          .finally(() => {
            refreshing.current = null;
          });
        let next: SessionResponse;
        try {
          next = await refreshing.current;
        } catch (refreshErr) {
          if (refreshErr instanceof ApiError && refreshErr.status === 401) await signOut();
          throw refreshErr;
        }
        await update(next);
        return apiRequest<T>(path, { ...options, token: next.accessToken });
      }
    },
    [signOut, update],
  );

  const value = useMemo(() => ({ loading, session, signIn, signOut, update, request }), [loading, session, signIn, signOut, update, request]);
  return <SessionContext.Provider value={value}>{children}</SessionContext.Provider>;
}

export function useSession(): SessionState {
  const ctx = useContext(SessionContext);
  if (!ctx) throw new Error('useSession must be used inside <SessionProvider>');
  return ctx;
}
