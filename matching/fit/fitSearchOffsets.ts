import { nnlsSolve } from './nnlsSolve';
import { fitNormalEquations } from './fitNormalEquations';
import { shiftLines, type FitDesign, type FitLine } from './fitTypes';

export interface OffsetSearch {
  offsets: number[];
  lines: FitLine[][];
}

/**
 * Common shift offset per candidate inside ±tolerance (ppm): coordinate search in rounds. For each
 * candidate in turn, the others held at their current amounts, the offset maximising the
 * correlation with what the others leave unexplained is taken (grid of `step`, then a parabola
 * through the best three); amounts are re-solved after each round.
 */
export function fitSearchOffsets(design: FitDesign, base: FitLine[][], tolerance: number, step: number, rounds = 3): OffsetSearch {
  const n = base.length;
  const offsets = new Array<number>(n).fill(0);
  const lines = base.map((l) => l);
  if (tolerance <= 0 || n === 0) return { offsets, lines };
  const m = Math.max(1, Math.ceil(tolerance / step));
  const grid = Array.from({ length: 2 * m + 1 }, (_, k) => ((k - m) / m) * tolerance);
  const h = grid[1] - grid[0];
  let { G, h: rhs } = fitNormalEquations(design, lines);
  let c = nnlsSolve(G, rhs).x;
  // On a grid, one residual y − Σ c_k r_k is kept up to date (a candidate's own part added back
  // while it is searched, its new position taken out after): O(points) per candidate instead of
  // O(points × candidates) for rebuilding "what the others leave" each time.
  const profileOn = design.profileOn;
  let R: Float64Array | null = null;
  for (let round = 0; round < rounds; round++) {
    let moved = 0;
    if (profileOn) {
      R = design.mixtureCurve.slice();
      for (let k = 0; k < n; k++) if (c[k] !== 0) design.addCurve(lines[k], -c[k], R);
    }
    for (let j = 0; j < n; j++) {
      let g: Float64Array;
      if (R && profileOn) {
        if (c[j] !== 0) design.addCurve(lines[j], c[j], R);
        g = profileOn(base[j], grid, R);
      } else {
        const others = lines.map((l, k) => ({ lines: l, c: k === j ? 0 : c[k] })).filter((_, k) => k !== j);
        g = design.profile(base[j], grid, others);
      }
      const settle = () => {
        if (R && c[j] !== 0) design.addCurve(lines[j], -c[j], R);
      };
      let best = -1;
      for (let k = 0; k < g.length; k++) if (g[k] > 0 && (best < 0 || g[k] > g[best])) best = k;
      if (best < 0) {
        settle();
        continue;
      }
      let d = grid[best];
      if (best > 0 && best < g.length - 1) {
        const denom = g[best - 1] - 2 * g[best] + g[best + 1];
        if (denom < 0) d += (h * (g[best - 1] - g[best + 1])) / (2 * denom);
      }
      d = Math.max(-tolerance, Math.min(tolerance, d));
      if (Math.abs(d - offsets[j]) > h / 20) {
        moved++;
        offsets[j] = d;
        lines[j] = shiftLines(base[j], d);
      }
      settle();
    }
    ({ G, h: rhs } = fitNormalEquations(design, lines));
    c = nnlsSolve(G, rhs).x;
    if (moved === 0) break;
  }
  return { offsets, lines };
}
