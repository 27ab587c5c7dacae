import { Platform } from 'react-native';
import Constants from 'expo-constants';
import { ApiErrorBodySchema } from '../shared/api/error';

/** Where the API lives: the page's own origin on the web, `extra.apiUrl` on a device. */
export function apiBaseUrl(): string {
  if (Platform.OS === 'web') return '';
  const extra = Constants.expoConfig?.extra as { apiUrl?: string } | undefined;
  return extra?.apiUrl ?? 'http://127.0.0.1:8080';
}

/** The server answered with an error body. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly details?: unknown,
  ) {
    super(message);
    this.name = 'ApiError';
  }
}

/** The server could not be reached at all (offline, server down). Offline is a state, not a failure. */
export class OfflineError extends Error {
  constructor(cause?: unknown) {
    super('The server cannot be reached right now.');
    this.name = 'OfflineError';
    this.cause = cause;
  }
}

export interface RequestOptions {
  method?: string;
  token?: string | null;
  body?: unknown;
  signal?: AbortSignal;
}

/** One fetch helper for every API call: JSON in, JSON out, errors typed. */
export async function apiRequest<T>(path: string, { method = 'GET', token, body, signal }: RequestOptions = {}): Promise<T> {
  let res: Response;
  try {
    res = await fetch(`${apiBaseUrl()}${path}`, {
      method,
      signal,
      headers: {
        Accept: 'application/json',
        ...(body !== undefined && !(body instanceof FormData) ? { 'Content-Type': 'application/json' } : {}),
        ...(token ? { Authorization: `Bearer ${token}` } : {}),
      },
      body: body === undefined ? undefined : body instanceof FormData ? body : JSON.stringify(body),
    });
  } catch (err) {
    throw new OfflineError(err);
  }
  const text = await res.text();
  let json: unknown = undefined;
  try {
    json = text ? JSON.parse(text) : undefined;
  } catch {
    // a proxy or a stopped server can answer with HTML
  }
  if (!res.ok) {
    const parsed = ApiErrorBodySchema.safeParse(json);
    if (parsed.success) throw new ApiError(res.status, parsed.data.error.code, parsed.data.error.message, parsed.data.error.details);
    if (res.status >= 500 || res.status === 0) throw new OfflineError(new Error(`HTTP ${res.status}`));
    throw new ApiError(res.status, 'http_error', `The server answered ${res.status}.`);
  }
  return json as T;
}
