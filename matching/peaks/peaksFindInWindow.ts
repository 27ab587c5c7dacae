import { peaksLowerBound } from './peaksLowerBound';

/**
 * Indices [from, to) of the ascending shift array that lie within centre ± halfWidth, found by
 * binary search (O(log n) plus the hits).
 */
export function peaksFindInWindow(sortedShifts: ArrayLike<number>, centre: number, halfWidth: number): [number, number] {
  if (!(halfWidth >= 0)) throw new RangeError(`window half-width must be ≥ 0, got ${halfWidth}`);
  const from = peaksLowerBound(sortedShifts, centre - halfWidth);
  let to = from;
  const hi = centre + halfWidth;
  while (to < sortedShifts.length && sortedShifts[to] <= hi) to++;
  return [from, to];
}
