import type { NnlsOptions, NnlsResult } from './nnlsSolve';

/** Scratch columns reused by every least-squares step of one solve (the QR overwrites copies). */
interface Work {
  R: Float64Array[];
  y: Float64Array;
  u: Float64Array;
}

/** Least squares on the columns `cols` of A (column arrays) by Householder QR; null if rank deficient. */
function leastSquares(A: Float64Array[], cols: number[], b: Float64Array, work: Work): Float64Array | null {
  const m = b.length;
  const p = cols.length;
  const R = cols.map((c, k) => {
    work.R[k].set(A[c]);
    return work.R[k];
  });
  const y = work.y;
  y.set(b);
  for (let k = 0; k < p; k++) {
    const v = R[k];
    let norm = 0;
    for (let i = k; i < m; i++) norm += v[i] * v[i];
    norm = Math.sqrt(norm);
    if (norm === 0) return null;
    const alpha = v[k] > 0 ? -norm : norm;
    const u = work.u.subarray(0, m - k);
    u[0] = v[k] - alpha;
    for (let i = k + 1; i < m; i++) u[i - k] = v[i];
    let uu = 0;
    for (let i = 0; i < u.length; i++) uu += u[i] * u[i];
    if (uu === 0) continue;
    const apply = (col: Float64Array) => {
      let d = 0;
      for (let i = k; i < m; i++) d += u[i - k] * col[i];
      const f = (2 * d) / uu;
      for (let i = k; i < m; i++) col[i] -= f * u[i - k];
    };
    for (let j = k; j < p; j++) apply(R[j]);
    apply(y);
  }
  const x = new Float64Array(p);
  let diagMax = 0;
  for (let k = 0; k < p; k++) diagMax = Math.max(diagMax, Math.abs(R[k][k]));
  for (let k = p - 1; k >= 0; k--) {
    if (Math.abs(R[k][k]) <= 1e-12 * diagMax) return null;
    let s = y[k];
    for (let j = k + 1; j < p; j++) s -= R[j][k] * x[j];
    x[k] = s / R[k][k];
  }
  return x;
}

/**
 * Plain Lawson–Hanson NNLS (Solving Least Squares Problems, 1974, ch. 23) on A given as column
 * arrays: every passive-set step is a Householder QR least-squares solve on the passive columns.
 */
export function nnlsSolveColumns(cols: Float64Array[], b: Float64Array, options: NnlsOptions = {}): NnlsResult {
  const n = cols.length;
  const m = b.length;
  const { maxIterations = 3 * Math.max(n, 1), tolerance = 1e-12 } = options;
  const x = new Float64Array(n);
  const inP = new Uint8Array(n);
  const blocked = new Uint8Array(n);
  const w = new Float64Array(n);
  const r = new Float64Array(m);
  const work: Work = { R: Array.from({ length: n }, () => new Float64Array(m)), y: new Float64Array(m), u: new Float64Array(m) };
  const gradient = () => {
    r.set(b);
    for (let j = 0; j < n; j++) if (x[j] !== 0) { const c = cols[j]; for (let i = 0; i < m; i++) r[i] -= c[i] * x[j]; }
    for (let j = 0; j < n; j++) { const c = cols[j]; let s = 0; for (let i = 0; i < m; i++) s += c[i] * r[i]; w[j] = s; }
  };
  gradient();
  let wmax0 = 0;
  for (let j = 0; j < n; j++) wmax0 = Math.max(wmax0, Math.abs(w[j]));
  const tol = tolerance * (wmax0 || 1);
  let iterations = 0;
  while (iterations < maxIterations) {
    let t = -1;
    let best = tol;
    for (let j = 0; j < n; j++) if (!inP[j] && !blocked[j] && w[j] > best) { best = w[j]; t = j; }
    if (t < 0) break;
    iterations++;
    inP[t] = 1;
    let P = [...Array(n).keys()].filter((j) => inP[j]);
    let s = leastSquares(cols, P, b, work);
    if (s === null) { inP[t] = 0; blocked[t] = 1; continue; }
    let guard = 0;
    while (s !== null && P.some((_, k) => s![k] <= 0) && guard++ < 10 * n) {
      let alpha = Infinity;
      let leaving = -1;
      P.forEach((j, k) => {
        if (s![k] <= 0) { const a = x[j] / (x[j] - s![k]); if (a < alpha) { alpha = a; leaving = j; } }
      });
      let xmax = 0;
      P.forEach((j, k) => { x[j] += alpha * (s![k] - x[j]); xmax = Math.max(xmax, Math.abs(x[j])); });
      x[leaving] = 0;
      for (const j of P) if (x[j] <= 1e-14 * xmax) { x[j] = 0; inP[j] = 0; }
      P = [...Array(n).keys()].filter((j) => inP[j]);
      s = P.length ? leastSquares(cols, P, b, work) : new Float64Array(0);
    }
    if (s === null) break;
    x.fill(0);
    P.forEach((j, k) => { x[j] = s![k]; });
    blocked.fill(0);
    gradient();
  }
  return { x, passive: [...Array(n).keys()].filter((j) => x[j] > 0), iterations };
}
