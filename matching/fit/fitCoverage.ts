import type { FitDesign, FitLine } from './fitTypes';

/**
 * Nuclei-weighted share of candidate j's signals that the mixture supports once the other
 * candidates are taken away: per signal ⟨r_s, y − Σ_{k≠j} c_k r_k⟩ / (c_j·⟨r_s, r_j⟩), clipped to
 * [0, 1]. A coarse measure, so a short-tailed design is precise enough.
 */
export function fitCoverage(design: FitDesign, c: ArrayLike<number>, lines: FitLine[][], signals: FitLine[][], j: number): number {
  if (!(c[j] > 0)) return 0;
  let covered = 0;
  let weight = 0;
  for (const sig of signals) {
    const nuclei = sig.reduce((s, l) => s + l.a, 0);
    let cross = design.dotLY(sig);
    for (let k = 0; k < lines.length; k++) if (k !== j && c[k] > 0) cross -= c[k] * design.dotLL(sig, lines[k]);
    const model = c[j] * design.dotLL(sig, lines[j]);
    covered += nuclei * (model > 0 ? Math.max(0, Math.min(1, cross / model)) : 0);
    weight += nuclei;
  }
  return weight > 0 ? covered / weight : 0;
}
