import { spdSolve } from './spdSolve';

export interface NnlsOptions {
  /** Largest number of outer iterations (default 3 × number of unknowns). */
  maxIterations?: number;
  /** A gradient component counts as positive above tolerance × max|h| (default 1e-12). */
  tolerance?: number;
}

export interface NnlsResult {
  x: Float64Array;
  /** Indices of the passive (free, x > 0) set at the solution. */
  passive: number[];
  iterations: number;
}

function checkSquare(G: ArrayLike<number>[], h: ArrayLike<number>): void {
  const n = h.length;
  if (G.length !== n) throw new RangeError(`normal matrix has ${G.length} rows but the right-hand side has ${n} entries`);
  for (let i = 0; i < n; i++) {
    if (G[i].length !== n) throw new RangeError(`normal matrix row ${i} has ${G[i].length} entries, expected ${n}`);
    for (let j = 0; j < n; j++) if (!Number.isFinite(G[i][j])) throw new RangeError(`normal matrix entry [${i}][${j}] is not finite`);
    if (!Number.isFinite(h[i])) throw new RangeError(`right-hand side entry ${i} is not finite`);
  }
}

/**
 * Non-negative least squares min ‖A·x − b‖², x ≥ 0, given the normal equations G = AᵀA and h = Aᵀb
 * (the active-set algorithm of C. L. Lawson & R. J. Hanson, Solving Least Squares Problems,
 * Prentice-Hall 1974, ch. 23, in the precomputed-cross-product form of R. Bro & S. de Jong,
 * J. Chemometrics 1997, 11, 393). Columns that are linear combinations of passive ones are
 * left at zero.
 */
export function nnlsSolve(G: ArrayLike<number>[], h: ArrayLike<number>, options: NnlsOptions = {}): NnlsResult {
  checkSquare(G, h);
  const n = h.length;
  const { maxIterations = 3 * Math.max(n, 1), tolerance = 1e-12 } = options;
  const x = new Float64Array(n);
  if (n === 0) return { x, passive: [], iterations: 0 };
  let hmax = 0;
  for (let i = 0; i < n; i++) hmax = Math.max(hmax, Math.abs(h[i]));
  const tol = tolerance * (hmax || 1);
  const inP = new Uint8Array(n);
  const blocked = new Uint8Array(n); // dependent on the passive set at the current step
  const w = new Float64Array(n);
  const gradient = () => {
    for (let j = 0; j < n; j++) {
      let s = h[j];
      for (let k = 0; k < n; k++) if (x[k] !== 0) s -= G[j][k] * x[k];
      w[j] = s;
    }
  };
  const solveP = (P: number[]): Float64Array | null => {
    const sub = P.map((i) => P.map((j) => G[i][j]));
    return spdSolve(sub, P.map((i) => h[i]));
  };
  gradient();
  let iterations = 0;
  while (iterations < maxIterations) {
    let t = -1;
    let best = tol;
    for (let j = 0; j < n; j++) if (!inP[j] && !blocked[j] && w[j] > best) { best = w[j]; t = j; }
    if (t < 0) break;
    iterations++;
    inP[t] = 1;
    let P = [...Array(n).keys()].filter((j) => inP[j]);
    let s = solveP(P);
    if (s === null) {
      inP[t] = 0;
      blocked[t] = 1;
      continue;
    }
    // Inner loop: step back towards the feasible region until every passive variable is positive.
    let guard = 0;
    while (s !== null && P.some((_, k) => s![k] <= 0) && guard++ < 10 * n) {
      let alpha = Infinity;
      let leaving = -1;
      P.forEach((j, k) => {
        if (s![k] <= 0) {
          const a = x[j] / (x[j] - s![k]);
          if (a < alpha) { alpha = a; leaving = j; }
        }
      });
      let xmax = 0;
      P.forEach((j, k) => {
        x[j] += alpha * (s![k] - x[j]);
        xmax = Math.max(xmax, Math.abs(x[j]));
      });
      x[leaving] = 0;
      for (const j of P) if (x[j] <= 1e-14 * xmax) { x[j] = 0; inP[j] = 0; }
      P = [...Array(n).keys()].filter((j) => inP[j]);
      s = P.length ? solveP(P) : new Float64Array(0);
    }
    if (s === null) break;
    x.fill(0);
    P.forEach((j, k) => {
      x[j] = s![k];
    });
    blocked.fill(0);
    gradient();
  }
  return { x, passive: [...Array(n).keys()].filter((j) => x[j] > 0), iterations };
}
