import { nnlsSolve } from './nnlsSolve';
import type { FitDesign, FitLine } from './fitTypes';

export interface Evidence {
  uniqueness: number;
  coverage: number;
  resolvedLines: number;
}

/**
 * How much of candidate j's support is its own. uniqueness = (SSE without j, others refitted) −
 * (SSE with j), divided by c_j²·G_jj: 1 when nobody else can take over its contribution, 0 when
 * other candidates' lines already explain it. coverage = nuclei-weighted share of its signals that
 * the mixture (minus the other candidates) supports, each clipped to [0, 1]. resolvedLines counts
 * the lines individually supported (mixture minus others ≥ half the model there) that lie at least
 * one linewidth apart: one singlet is one line of evidence.
 */
export function fitEvidence(
  design: FitDesign,
  G: Float64Array[],
  h: Float64Array,
  c: Float64Array,
  lines: FitLine[][],
  signals: FitLine[][][],
  j: number,
): Evidence {
  const n = c.length;
  if (!(c[j] > 0)) return { uniqueness: 0, coverage: 0, resolvedLines: 0 };
  const sse = (x: ArrayLike<number>, idx: number[]) => {
    let s = design.yy;
    idx.forEach((p, a) => {
      s -= 2 * h[p] * x[a];
      idx.forEach((q, b) => {
        s += x[a] * G[p][q] * x[b];
      });
    });
    return s;
  };
  const all = [...Array(n).keys()];
  const rest = all.filter((k) => k !== j);
  const sub = nnlsSolve(
    rest.map((p) => Float64Array.from(rest.map((q) => G[p][q]))),
    Float64Array.from(rest.map((p) => h[p])),
  ).x;
  const gain = sse(sub, rest) - sse(c, all);
  const own = c[j] * c[j] * G[j][j];
  const uniqueness = own > 0 ? Math.max(0, Math.min(1, gain / own)) : 0;
  let covered = 0;
  let weight = 0;
  const supported: FitLine[] = [];
  for (const sig of signals[j]) {
    const nuclei = sig.reduce((s, l) => s + l.a, 0);
    let cross = design.dotLY(sig);
    for (let k = 0; k < n; k++) if (k !== j && c[k] > 0) cross -= c[k] * design.dotLL(sig, lines[k]);
    const model = c[j] * design.dotLL(sig, lines[j]);
    const support = model > 0 ? Math.max(0, Math.min(1, cross / model)) : 0;
    covered += nuclei * support;
    weight += nuclei;
    // Each line of the pattern has to be there on its own: a doublet with one line on a peak
    // and the other on empty baseline is one line of evidence, not two.
    for (const line of sig) {
      const one = [line];
      let lineCross = design.dotLY(one);
      for (let k = 0; k < n; k++) if (k !== j && c[k] > 0) lineCross -= c[k] * design.dotLL(one, lines[k]);
      const lineModel = c[j] * design.dotLL(one, lines[j]);
      if (lineModel > 0 && lineCross >= 0.5 * lineModel) supported.push(line);
    }
  }
  supported.sort((p, q) => p.x - q.x);
  let resolved = 0;
  let last = -Infinity;
  for (const l of supported) {
    if (l.x - last >= l.w) {
      resolved++;
      last = l.x;
    }
  }
  return { uniqueness, coverage: weight > 0 ? covered / weight : 0, resolvedLines: resolved };
}
