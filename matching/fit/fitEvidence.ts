import { nnlsSolve } from './nnlsSolve';
import { fitOwnLines } from './fitOwnLines';
import type { FitDesign, FitLine } from './fitTypes';

export interface Evidence {
  uniqueness: number;
  coverage: number;
  resolvedLines: number;
  distinctLines: number;
}

/**
 * How much of candidate j's support is its own. uniqueness = (SSE without j, others refitted) −
 * (SSE with j), divided by c_j²·G_jj: 1 when nobody else can take over its contribution, 0 when
 * other candidates' lines already explain it. coverage = nuclei-weighted share of its signals that
 * the mixture (minus the other candidates) supports, each clipped to [0, 1]. resolvedLines and
 * distinctLines are fitOwnLines: one singlet is one line of evidence. On a grid design, `rest` may hold the
 * mixture minus the other candidates' fitted curves, which makes coverage one pass per signal.
 */
export function fitEvidence(
  design: FitDesign,
  G: Float64Array[],
  h: Float64Array,
  c: Float64Array,
  lines: FitLine[][],
  signals: FitLine[][][],
  j: number,
  rough: FitDesign = design,
  rest?: Float64Array,
): Evidence {
  const n = c.length;
  if (!(c[j] > 0)) return { uniqueness: 0, coverage: 0, resolvedLines: 0, distinctLines: 0 };
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
  const others = all.filter((k) => k !== j);
  const sub = nnlsSolve(
    others.map((p) => Float64Array.from(others.map((q) => G[p][q]))),
    Float64Array.from(others.map((p) => h[p])),
  ).x;
  const gain = sse(sub, others) - sse(c, all);
  const own = c[j] * c[j] * G[j][j];
  const uniqueness = own > 0 ? Math.max(0, Math.min(1, gain / own)) : 0;
  let covered = 0;
  let weight = 0;
  // On a grid, `rest` (the mixture minus the other candidates) is one vector: one pass per signal.
  if (!rough.dotLV) rest = undefined;
  for (const sig of signals[j]) {
    const nuclei = sig.reduce((s, l) => s + l.a, 0);
    let cross: number;
    // Coverage is a coarse measure: the shorter-tailed design `rough` is precise enough for it.
    if (rest) cross = rough.dotLV!(sig, rest);
    else {
      cross = design.dotLY(sig);
      for (let k = 0; k < n; k++) if (k !== j && c[k] > 0) cross -= c[k] * design.dotLL(sig, lines[k]);
    }
    const model = c[j] * (rest ? rough.dotLL(sig, lines[j]) : design.dotLL(sig, lines[j]));
    const support = model > 0 ? Math.max(0, Math.min(1, cross / model)) : 0;
    covered += nuclei * support;
    weight += nuclei;
  }
  return { uniqueness, coverage: weight > 0 ? covered / weight : 0, ...fitOwnLines(design, c, lines, j) };
}
