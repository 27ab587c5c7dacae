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
  for (let round = 0; round < rounds; round++) {
    let moved = 0;
    for (let j = 0; j < n; j++) {
      const others = lines.map((l, k) => ({ lines: l, c: k === j ? 0 : c[k] })).filter((_, k) => k !== j);
      const g = design.profile(base[j], grid, others);
      let best = -1;
      for (let k = 0; k < g.length; k++) if (g[k] > 0 && (best < 0 || g[k] > g[best])) best = k;
      if (best < 0) continue;
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
    }
    ({ G, h: rhs } = fitNormalEquations(design, lines));
    c = nnlsSolve(G, rhs).x;
    if (moved === 0) break;
  }
  return { offsets, lines };
}
