/** Pure helpers of the spectrum plot: tick placement, data range, per-pixel decimation. */

export interface Range {
  lo: number;
  hi: number;
}

/** "Nice" tick values (1, 2, 5 × 10ⁿ) covering [lo, hi], about `count` of them. */
export function niceTicks(lo: number, hi: number, count = 6): number[] {
  if (!(hi > lo)) return [lo];
  const raw = (hi - lo) / Math.max(1, count);
  const mag = 10 ** Math.floor(Math.log10(raw));
  const step = [1, 2, 5, 10].map((m) => m * mag).find((s) => s >= raw) ?? 10 * mag;
  const out: number[] = [];
  for (let v = Math.ceil(lo / step) * step; v <= hi + step * 1e-9; v += step) out.push(Math.abs(v) < step * 1e-9 ? 0 : v);
  return out;
}

export function tickDecimals(ticks: number[]): number {
  if (ticks.length < 2) return 2;
  const step = Math.abs(ticks[1] - ticks[0]);
  return Math.max(0, Math.min(4, -Math.floor(Math.log10(step) + 1e-9)));
}

export function xExtent(series: Array<ArrayLike<number>>): Range | null {
  let lo = Infinity;
  let hi = -Infinity;
  for (const xs of series) for (let i = 0; i < xs.length; i++) {
    const v = xs[i];
    if (v < lo) lo = v;
    if (v > hi) hi = v;
  }
  return Number.isFinite(lo) && Number.isFinite(hi) ? { lo, hi: hi > lo ? hi : lo + 1 } : null;
}

/**
 * The points of one trace inside the visible ppm range, reduced to the first, lowest, highest and
 * last value in each pixel column, so a 100 000-point spectrum draws as a few thousand segments
 * without losing narrow peaks. Returns pixel pairs [px, value].
 */
export function decimate(x: ArrayLike<number>, y: ArrayLike<number>, range: Range, width: number): Array<[number, number]> {
  const n = Math.min(x.length, y.length);
  const span = range.hi - range.lo;
  if (n === 0 || !(span > 0) || width <= 0) return [];
  const idx: number[] = [];
  for (let i = 0; i < n; i++) if (x[i] >= range.lo && x[i] <= range.hi) idx.push(i);
  if (idx.length > 1 && x[idx[0]] > x[idx[idx.length - 1]]) idx.reverse(); // draw left (high ppm) to right
  else idx.sort((a, b) => x[b] - x[a]);
  const out: Array<[number, number]> = [];
  let col = -1;
  let first = 0, min = 0, max = 0, last = 0, minPx = 0, maxPx = 0;
  const flush = () => {
    if (col < 0) return;
    out.push([col, first]);
    if (minPx <= maxPx) {
      out.push([minPx, min], [maxPx, max]);
    } else {
      out.push([maxPx, max], [minPx, min]);
    }
    out.push([col + 0.999, last]);
  };
  for (const i of idx) {
    const px = ((range.hi - x[i]) / span) * width;
    const c = Math.floor(px);
    const v = y[i];
    if (c !== col) {
      flush();
      col = c;
      first = min = max = last = v;
      minPx = maxPx = px;
    } else {
      if (v < min) { min = v; minPx = px; }
      if (v > max) { max = v; maxPx = px; }
      last = v;
    }
  }
  flush();
  return out;
}

/** Lowest and highest value of the traces inside the visible range (0 always included). */
export function yExtent(traces: Array<{ x: ArrayLike<number>; y: ArrayLike<number> }>, range: Range): Range {
  let lo = 0;
  let hi = 0;
  for (const t of traces) {
    const n = Math.min(t.x.length, t.y.length);
    for (let i = 0; i < n; i++) {
      if (t.x[i] < range.lo || t.x[i] > range.hi) continue;
      if (t.y[i] < lo) lo = t.y[i];
      if (t.y[i] > hi) hi = t.y[i];
    }
  }
  if (!(hi > lo)) hi = lo + 1;
  const pad = (hi - lo) * 0.05;
  return { lo: lo - (lo < 0 ? pad : 0), hi: hi + pad };
}
