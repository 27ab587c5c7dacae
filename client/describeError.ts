import { ApiError, OfflineError } from './api';

/** Turns any error into one sentence for a person. */
export function describeError(err: unknown): string {
  if (err instanceof OfflineError) return 'You are offline or the server is down; working from the copy on this device.';
  if (err instanceof ApiError) return err.message;
  if (err instanceof Error) return err.message;
  return 'Something went wrong.';
}

export function isOffline(err: unknown): boolean {
  return err instanceof OfflineError;
}
