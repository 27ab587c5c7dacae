import type { FitDesign, FitLine } from './fitTypes';

/** G = [⟨r_j, r_k⟩] and h = [⟨r_j, y⟩] for the candidates' current lines. */
export function fitNormalEquations(design: FitDesign, lines: FitLine[][]): { G: Float64Array[]; h: Float64Array } {
  const n = lines.length;
  const G = Array.from({ length: n }, () => new Float64Array(n));
  const h = new Float64Array(n);
  for (let j = 0; j < n; j++) {
    h[j] = design.dotLY(lines[j]);
    for (let k = 0; k <= j; k++) {
      const v = design.dotLL(lines[j], lines[k]);
      G[j][k] = v;
      G[k][j] = v;
    }
  }
  return { G, h };
}
