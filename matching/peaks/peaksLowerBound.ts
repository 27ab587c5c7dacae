/**
 * Index of the first element of an ascending array that is ≥ value (binary search);
 * array length when every element is smaller.
 */
export function peaksLowerBound(sortedShifts: ArrayLike<number>, value: number): number {
  let lo = 0;
  let hi = sortedShifts.length;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if (sortedShifts[mid] < value) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}
