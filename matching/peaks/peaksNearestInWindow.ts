/**
 * Index in [from, to) of the ascending shift closest to v, ties to the lower one (binary search);
 * −1 for an empty range. Both screening matchers (multipletsMatchPeaks and the fast scorer) pick
 * peaks with it, so they agree on every tie.
 */
export function peaksNearestInWindow(shifts: ArrayLike<number>, from: number, to: number, v: number): number {
  if (from >= to) return -1;
  let lo = from;
  let hi = to;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if (shifts[mid] < v) lo = mid + 1;
    else hi = mid;
  }
  if (lo === to) return to - 1;
  if (lo === from) return from;
  return v - shifts[lo - 1] <= shifts[lo] - v ? lo - 1 : lo;
}
