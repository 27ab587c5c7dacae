import { nnlsSolve } from './nnlsSolve';
import { linesAt, type FitDesign, type FitLine } from './fitTypes';

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
 * the mixture (minus the other candidates) supports, each clipped to [0, 1]. resolvedLines counts
 * the lines individually supported (mixture minus others ≥ half the model at the line centre) that lie at least
 * one linewidth apart: one singlet is one line of evidence. distinctLines counts those of them
 * that are also at least one linewidth from every line of the other fitted candidates. On a grid design, `rest` may hold the
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
  const supported: FitLine[] = [];
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
    // Each line of the pattern has to be there on its own: a doublet with one line on a peak
    // and the other on empty baseline is one line of evidence, not two.
    // Checked at the line's centre: the mixture minus the other candidates there.
    for (const line of sig) {
      let here = design.mixtureAt(line.x);
      for (let k = 0; k < n; k++) if (k !== j && c[k] > 0) here -= c[k] * linesAt(lines[k], line.x);
      const own = c[j] * linesAt(lines[j], line.x);
      if (own > 0 && here >= 0.5 * own) supported.push(line);
    }
  }
  const resolvedAmong = (set: FitLine[]) => {
    set.sort((p, q) => p.x - q.x);
    let count = 0;
    let last = -Infinity;
    for (const l of set) {
      if (l.x - last >= l.w) {
        count++;
        last = l.x;
      }
    }
    return count;
  };
  // A supported line closer than one linewidth to a line of another fitted candidate is shared
  // evidence: two Lorentzians nearer than their FWHM are not resolved (common practice), so the
  // mixture cannot say whose line it is.
  const distinct = supported.filter((line) => {
    for (let k = 0; k < n; k++) {
      if (k === j || !(c[k] > 0)) continue;
      for (const o of lines[k]) if (Math.abs(o.x - line.x) < Math.max(o.w, line.w)) return false;
    }
    return true;
  });
  return { uniqueness, coverage: weight > 0 ? covered / weight : 0, resolvedLines: resolvedAmong(supported), distinctLines: resolvedAmong(distinct) };
}
