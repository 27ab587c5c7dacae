/**
 * Solves G·x = h for a symmetric positive-definite G by Cholesky factorisation. Returns null when
 * G is numerically singular (a pivot below 1e-12 of its diagonal), so callers can treat
 * dependent columns explicitly instead of receiving NaN.
 */
export function spdSolve(G: ArrayLike<number>[], h: ArrayLike<number>): Float64Array | null {
  const n = h.length;
  const L = Array.from({ length: n }, () => new Float64Array(n));
  for (let i = 0; i < n; i++) {
    for (let k = 0; k <= i; k++) {
      let s = G[i][k];
      for (let p = 0; p < k; p++) s -= L[i][p] * L[k][p];
      if (i === k) {
        if (!(s > 1e-12 * Math.abs(G[i][i])) || !(G[i][i] > 0)) return null;
        L[i][i] = Math.sqrt(s);
      } else {
        L[i][k] = s / L[k][k];
      }
    }
  }
  const z = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    let s = h[i];
    for (let p = 0; p < i; p++) s -= L[i][p] * z[p];
    z[i] = s / L[i][i];
  }
  const x = new Float64Array(n);
  for (let i = n - 1; i >= 0; i--) {
    let s = z[i];
    for (let p = i + 1; p < n; p++) s -= L[p][i] * x[p];
    x[i] = s / L[i][i];
  }
  return x;
}
