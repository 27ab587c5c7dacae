/** Shared TanStack Query timings. Local reads are cheap; server pulls are throttled. */
export const STALE_TIME_LOCAL_MS = 0;
export const STALE_TIME_REMOTE_MS = 60_000;
