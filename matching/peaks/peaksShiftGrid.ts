import { peaksLowerBound } from './peaksLowerBound';

/**
 * A direct-address index over ascending peak shifts: the axis is cut into equal cells (about one
 * peak per cell on average), and each cell keeps the first peak at or above it. A lower-bound
 * query is then one cell read plus a short walk instead of a binary search, which matters when a
 * screen asks it a few hundred thousand times. The cell of a shift is computed by one monotone
 * formula both when building and when asking, so the answer is exact (the same index
 * peaksLowerBound gives), whatever the rounding.
 */
export interface PeaksShiftGrid {
  shifts: Float64Array;
  origin: number;
  /** 1 / cell width, ppm⁻¹. */
  perPpm: number;
  /** cellFirst[c] = first peak whose cell is ≥ c; length cells + 1. */
  cellFirst: Int32Array;
}

/** Builds the grid over `shifts` (ascending, finite). */
export function peaksShiftGridBuild(shifts: Float64Array): PeaksShiftGrid {
  const n = shifts.length;
  for (let i = 1; i < n; i++) if (!(shifts[i] >= shifts[i - 1])) throw new RangeError(`peak shifts must be ascending (index ${i})`);
  if (n === 0) return { shifts, origin: 0, perPpm: 1, cellFirst: Int32Array.of(0) };
  const origin = shifts[0];
  const span = shifts[n - 1] - origin;
  const cells = Math.max(1, Math.min(4 * n, 1 << 22));
  // A span too small for the cell count (denormal differences) gives one cell: still exact, only slower.
  const fine = cells / span;
  const perPpm = span > 0 && Number.isFinite(fine) ? fine : 0;
  const cellOf = (v: number) => Math.floor((v - origin) * perPpm);
  const last = cellOf(shifts[n - 1]);
  const cellFirst = new Int32Array(last + 2);
  let p = 0;
  for (let c = 0; c <= last + 1; c++) {
    while (p < n && cellOf(shifts[p]) < c) p++;
    cellFirst[c] = p;
  }
  return { shifts, origin, perPpm, cellFirst };
}

/** Index of the first shift ≥ v (shifts.length when none), as peaksLowerBound. */
export function peaksShiftGridLowerBound(grid: PeaksShiftGrid, v: number): number {
  const { shifts, cellFirst } = grid;
  const c = Math.floor((v - grid.origin) * grid.perPpm);
  if (!(c >= 0)) return v <= grid.origin ? 0 : peaksLowerBound(shifts, v);
  if (c >= cellFirst.length) return shifts.length;
  let i = cellFirst[c];
  while (i < shifts.length && shifts[i] < v) i++;
  return i;
}
