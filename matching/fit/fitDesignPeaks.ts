import { lorentzianFct } from 'ml-peak-shape-generator';
import { lorentzianOverlap } from '../lineshape/lorentzianOverlap';
import { lorentzianReach } from '../lineshape/lorentzianReach';
import { lorentzianUnitArea } from '../lineshape/lorentzianUnitArea';
import type { FitDesign, FitLine } from './fitTypes';

const SEARCH_CUTOFF = 1e-3;
const MAX_CURVE_POINTS = 32768;

function lineSum(A: FitLine[], B: FitLine[]): number {
  let s = 0;
  for (const p of A) for (const q of B) s += p.a * q.a * lorentzianOverlap(p.x - q.x, p.w, q.w);
  return s;
}

/**
 * Fit design for a peak list: the mixture is the sum of Lorentzians `peaks` (areas a), and every
 * inner product is an integral over the whole shift axis, in closed form (lorentzianOverlap), so
 * the normal equations need no grid. `span` widens the curve axis to cover the candidates' lines.
 */
export function fitDesignPeaks(peaks: FitLine[], span: [number, number], tolerance: number): FitDesign {
  const sorted = [...peaks].sort((p, q) => p.x - q.x);
  const yy = lineSum(sorted, sorted);
  const minW = Math.min(...sorted.map((p) => p.w), Infinity);
  let lo = span[0];
  let hi = span[1];
  for (const p of sorted) {
    lo = Math.min(lo, p.x);
    hi = Math.max(hi, p.x);
  }
  const margin = 0.05 * Math.max(hi - lo, 1);
  lo -= margin;
  hi += margin;
  const step = Math.max((hi - lo) / (MAX_CURVE_POINTS - 1), (Number.isFinite(minW) ? minW : (hi - lo) / 1000) / 4);
  const n = Math.max(2, Math.floor((hi - lo) / step) + 1);
  const axis = new Float64Array(n);
  for (let i = 0; i < n; i++) axis[i] = lo + i * step;
  const addCurve = (lines: FitLine[], scale: number, out: Float64Array): void => {
    // Display curves only: tails below 1e-6 of a line's height are left out.
    for (const l of lines) {
      const height = scale * l.a * lorentzianUnitArea(0, l.w);
      const r = lorentzianReach(l.w, 1e-6);
      const i0 = Math.max(0, Math.floor((l.x - r - lo) / step));
      const i1 = Math.min(n, Math.ceil((l.x + r - lo) / step) + 1);
      for (let i = i0; i < i1; i++) out[i] += height * lorentzianFct(axis[i] - l.x, l.w);
    }
  };
  const curve = (lines: FitLine[]): Float64Array => {
    const out = new Float64Array(n);
    addCurve(lines, 1, out);
    return out;
  };
  const near = (x: number, reach: number, list: FitLine[]): FitLine[] => list.filter((p) => Math.abs(p.x - x) <= reach);
  return {
    kind: 'peaks',
    yy,
    axis,
    mixtureCurve: curve(sorted),
    totalIntensity: sorted.reduce((s, p) => s + p.a, 0),
    // The display grid stands in for samples when the residual variance is estimated.
    residualSamples: n,
    gridScale: step,
    dotLL: lineSum,
    dotLY: (A) => lineSum(A, sorted),
    modelIntensity: (lines) => lines.reduce((s, l) => s + l.a, 0),
    curve,
    addCurve,
    mixtureAt: (x) => {
      let v = 0;
      for (const p of sorted) v += p.a * lorentzianUnitArea(x - p.x, p.w);
      return v;
    },
    profile: (lines, offsets, others) => {
      const g = new Float64Array(offsets.length);
      const otherLines: FitLine[] = [];
      for (const o of others) if (o.c !== 0) for (const l of o.lines) otherLines.push({ x: l.x, a: o.c * l.a, w: l.w });
      for (const l of lines) {
        const reach = tolerance + lorentzianReach(l.w + minW, SEARCH_CUTOFF);
        const P = near(l.x, reach, sorted);
        const O = near(l.x, reach, otherLines);
        offsets.forEach((d, k) => {
          const c = l.x + d;
          let s = 0;
          for (const p of P) s += p.a * lorentzianOverlap(c - p.x, l.w, p.w);
          for (const o of O) s -= o.a * lorentzianOverlap(c - o.x, l.w, o.w);
          g[k] += l.a * s;
        });
      }
      return g;
    },
  };
}
