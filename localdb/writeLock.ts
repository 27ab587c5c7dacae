let tail: Promise<unknown> = Promise.resolve();

/**
 * Runs database writes one after another. The expo driver shares one connection, so two
 * transactions started together interleave and fail ("Transaction is not started yet").
 */
export function withWriteLock<T>(work: () => Promise<T>): Promise<T> {
  const run = tail.then(work, work);
  tail = run.catch(() => undefined);
  return run;
}
