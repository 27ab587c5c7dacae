import { lorentzianReach } from '../lineshape/lorentzianReach';
import { lorentzianFct } from 'ml-peak-shape-generator';
import { lorentzianUnitArea } from '../lineshape/lorentzianUnitArea';
import type { FitDesign, FitLine } from './fitTypes';

interface Segment {
  start: number;
  values: Float64Array;
}

/** Cut-off of the kernels used only to locate shift offsets (exact inner products use `cutoff`). */
const SEARCH_CUTOFF = 1e-3;
/** Points between exact restarts of the column recurrence. */
const RESTART = 512;

function lowerBound(axis: Float64Array, v: number): number {
  let lo = 0;
  let hi = axis.length;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (axis[mid] < v) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

/**
 * Fit design on a spectrum grid. A candidate's column is evaluated only where one of its lines
 * exceeds `cutoff` × that line's height, stored as merged segments, so normal equations cost the
 * overlap of supports instead of the full grid.
 */
export function fitDesignSpectrum(axis: Float64Array, y: Float64Array, cutoff: number): FitDesign {
  const n = axis.length;
  const step = n > 1 ? (axis[n - 1] - axis[0]) / (n - 1) : 0;
  let uniform = n > 1 && step > 0;
  for (let i = 0; uniform && i < n; i++) if (Math.abs(axis[i] - (axis[0] + i * step)) > 1e-9 * step) uniform = false;
  const cache = new WeakMap<FitLine[], Segment[]>();
  const column = (lines: FitLine[]): Segment[] => {
    const hit = cache.get(lines);
    if (hit) return hit;
    const ranges = lines
      .map((l) => {
        const r = lorentzianReach(l.w, cutoff);
        return { l, lo: lowerBound(axis, l.x - r), hi: lowerBound(axis, l.x + r) };
      })
      .filter((q) => q.hi > q.lo)
      .sort((p, q) => p.lo - q.lo);
    const segs: { lo: number; hi: number; members: typeof ranges }[] = [];
    for (const q of ranges) {
      const last = segs[segs.length - 1];
      if (last && q.lo <= last.hi) {
        last.hi = Math.max(last.hi, q.hi);
        last.members.push(q);
      } else segs.push({ lo: q.lo, hi: q.hi, members: [q] });
    }
    const out = segs.map((s) => {
      const values = new Float64Array(s.hi - s.lo);
      if (!uniform) {
        for (const q of s.members) {
          const { x, a, w } = q.l;
          const height = a * lorentzianUnitArea(0, w);
          for (let i = q.lo; i < q.hi; i++) values[i - s.lo] += height * lorentzianFct(axis[i] - x, w);
        }
        return { start: s.lo, values };
      }
      // On a uniform grid 1/L = 1 + k·(i − i_c)² is a quadratic in i: second differences are
      // constant, so each point costs two additions and a division. The recurrence restarts
      // from the exact value at every block of RESTART points so rounding cannot accumulate, and
      // all lines are added block by block, while the block is still in cache.
      const m = s.members.length;
      const height = new Float64Array(m);
      const kk = new Float64Array(m);
      s.members.forEach((q, t) => {
        height[t] = q.l.a * lorentzianUnitArea(0, q.l.w);
        kk[t] = (4 * step * step) / (q.l.w * q.l.w);
      });
      for (let b0 = s.lo; b0 < s.hi; b0 += RESTART) {
        const b1 = Math.min(s.hi, b0 + RESTART);
        for (let t = 0; t < m; t++) {
          const q = s.members[t];
          const lo = Math.max(q.lo, b0);
          const hi = Math.min(q.hi, b1);
          if (lo >= hi) continue;
          const k = kk[t];
          const hgt = height[t];
          const u = (axis[0] + lo * step - q.l.x) / step; // i − i_c at i = lo
          let inv = 1 + k * u * u;
          let d = k * (2 * u + 1);
          const dd = 2 * k;
          for (let i = lo - s.lo, end = hi - s.lo; i < end; i++) {
            values[i] += hgt / inv;
            inv += d;
            d += dd;
          }
        }
      }
      return { start: s.lo, values };
    });
    cache.set(lines, out);
    return out;
  };
  const dotSegs = (A: Segment[], B: Segment[]): number => {
    let s = 0;
    let j = 0;
    for (const a of A) {
      const aEnd = a.start + a.values.length;
      while (j < B.length && B[j].start + B[j].values.length <= a.start) j++;
      for (let k = j; k < B.length && B[k].start < aEnd; k++) {
        const b = B[k];
        const lo = Math.max(a.start, b.start);
        const hi = Math.min(aEnd, b.start + b.values.length);
        for (let i = lo; i < hi; i++) s += a.values[i - a.start] * b.values[i - b.start];
      }
    }
    return s;
  };
  let yy = 0;
  let total = 0;
  for (let i = 0; i < n; i++) {
    yy += y[i] * y[i];
    total += y[i];
  }
  const curve = (lines: FitLine[]): Float64Array => {
    const out = new Float64Array(n);
    for (const s of column(lines)) out.set(s.values, s.start);
    return out;
  };
  const addCurve = (lines: FitLine[], scale: number, target: Float64Array): void => {
    for (const s of column(lines)) {
      const v = s.values;
      const o = s.start;
      for (let i = 0; i < v.length; i++) target[o + i] += scale * v[i];
    }
  };
  /** g(δ) = ⟨r(δ), R⟩ for each offset δ, with kernels cut at SEARCH_CUTOFF (search only). */
  const profileOn = (lines: FitLine[], offsets: number[], R: Float64Array): Float64Array => {
    const g = new Float64Array(offsets.length);
    offsets.forEach((d, k) => {
      let s = 0;
      for (const l of lines) {
        const r = lorentzianReach(l.w, SEARCH_CUTOFF);
        const c = l.x + d;
        const height = l.a * lorentzianUnitArea(0, l.w);
        const hi = lowerBound(axis, c + r);
        for (let i = lowerBound(axis, c - r); i < hi; i++) s += height * lorentzianFct(axis[i] - c, l.w) * R[i];
      }
      g[k] = s;
    });
    return g;
  };
  // Asked for the same lines on every rejection pass: one sum per column.
  const intensityCache = new WeakMap<FitLine[], number>();
  return {
    kind: 'spectrum',
    yy,
    axis,
    mixtureCurve: y,
    // Signed sum: with a flat baseline noise cancels, the positive part alone would grow with it.
    totalIntensity: Math.max(total, 0),
    residualSamples: n,
    gridScale: 1,
    dotLL: (A, B) => dotSegs(column(A), column(B)),
    dotLV: (A, v) => {
      let s = 0;
      for (const seg of column(A)) for (let i = 0; i < seg.values.length; i++) s += seg.values[i] * v[seg.start + i];
      return s;
    },
    dotLY: (A) => {
      let s = 0;
      for (const seg of column(A)) for (let i = 0; i < seg.values.length; i++) s += seg.values[i] * y[seg.start + i];
      return s;
    },
    modelIntensity: (lines) => {
      const hit = intensityCache.get(lines);
      if (hit !== undefined) return hit;
      let s = 0;
      for (const seg of column(lines)) for (let i = 0; i < seg.values.length; i++) s += seg.values[i];
      intensityCache.set(lines, s);
      return s;
    },
    curve,
    addCurve,
    mixtureAt: (x) => {
      const i = lowerBound(axis, x);
      if (i <= 0) return y[0];
      if (i >= n) return y[n - 1];
      const t = (x - axis[i - 1]) / (axis[i] - axis[i - 1]);
      return y[i - 1] + t * (y[i] - y[i - 1]);
    },
    profile: (lines, offsets, others) => {
      const R = y.slice();
      for (const o of others) {
        if (o.c === 0) continue;
        for (const seg of column(o.lines)) for (let i = 0; i < seg.values.length; i++) R[seg.start + i] -= o.c * seg.values[i];
      }
      return profileOn(lines, offsets, R);
    },
    profileOn,
  };
}
