import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { nnlsSolve } from '../../../matching/fit/nnlsSolve';
import { nnlsSolveDense } from '../../../matching/fit/nnlsSolveDense';

const normal = (A: number[][], b: number[]) => {
  const n = A[0].length;
  const G = Array.from({ length: n }, (_, i) => Array.from({ length: n }, (_, j) => A.reduce((s, r) => s + r[i] * r[j], 0)));
  const h = Array.from({ length: n }, (_, i) => A.reduce((s, r, k) => s + r[i] * b[k], 0));
  return { G, h };
};
const objective = (A: number[][], b: number[], x: ArrayLike<number>) => A.reduce((s, r, k) => s + (r.reduce((t, a, j) => t + a * x[j], 0) - b[k]) ** 2, 0);

/** Unconstrained least squares on the columns in `set` by Gauss–Jordan on the normal equations. */
function lsOn(G: number[][], h: number[], set: number[]): number[] | null {
  const m = set.map((i) => [...set.map((j) => G[i][j]), h[i]]);
  const p = set.length;
  for (let c = 0; c < p; c++) {
    let piv = c;
    for (let r = c + 1; r < p; r++) if (Math.abs(m[r][c]) > Math.abs(m[piv][c])) piv = r;
    if (Math.abs(m[piv][c]) < 1e-12) return null;
    [m[c], m[piv]] = [m[piv], m[c]];
    for (let r = 0; r < p; r++) if (r !== c) { const f = m[r][c] / m[c][c]; for (let k = c; k <= p; k++) m[r][k] -= f * m[c][k]; }
  }
  return m.map((row, i) => row[p] / row[i]);
}

/** Brute force: the NNLS optimum is the best feasible unconstrained solution over all 2^n passive sets. */
function bruteForce(A: number[][], b: number[]): number[] {
  const n = A[0].length;
  const { G, h } = normal(A, b);
  let best = new Array(n).fill(0);
  let bestF = objective(A, b, best);
  for (let mask = 1; mask < 1 << n; mask++) {
    const set = [...Array(n).keys()].filter((i) => mask & (1 << i));
    const z = lsOn(G, h, set);
    if (!z || z.some((v) => v < 0)) continue;
    const x = new Array(n).fill(0);
    set.forEach((i, k) => { x[i] = z[k]; });
    const f = objective(A, b, x);
    if (f < bestF) { bestF = f; best = x; }
  }
  return best;
}

describe('nnlsSolve (Lawson & Hanson 1974, ch. 23)', () => {
  it('checks shapes and finiteness', () => {
    expect(() => nnlsSolve([[1, 0]], [1])).toThrow('normal matrix row 0 has 2 entries, expected 1');
    expect(() => nnlsSolve([[1]], [1, 2])).toThrow('normal matrix has 1 rows but the right-hand side has 2 entries');
    expect(() => nnlsSolve([[NaN]], [1])).toThrow('normal matrix entry [0][0] is not finite');
    expect(() => nnlsSolveDense([[1, 2]], [1, 2])).toThrow('matrix has 1 rows but the right-hand side has 2 entries');
  });
  it('returns the empty solution for no unknowns and zero for a non-positive gradient', () => {
    expect(Array.from(nnlsSolve([], []).x)).toEqual([]);
    expect(Array.from(nnlsSolve([[2]], [-1]).x)).toEqual([0]);
  });
  it('equals the unconstrained solution when it is positive (known solution)', () => {
    // A = I, b = (1, 2, 3) → x = b.
    const A = [[1, 0, 0], [0, 1, 0], [0, 0, 1]];
    const { G, h } = normal(A, [1, 2, 3]);
    expect(Array.from(nnlsSolve(G, h).x)).toEqual([1, 2, 3]);
  });
  it('puts an active constraint at zero (textbook case: unconstrained x2 < 0)', () => {
    // A = [[1,0],[1,1],[0,1]]... b chosen so the LS solution is (2, −1): NNLS gives x2 = 0, x1 = argmin = (b1+b2)/2.
    const A = [[1, 0], [1, 1], [0, 1]];
    const b = [2, 1, -1];
    const { G, h } = normal(A, b);
    const r = nnlsSolve(G, h);
    expect(r.x[1]).toBe(0);
    expect(r.x[0]).toBeCloseTo(1.5, 12);
    expect(r.passive).toEqual([0]);
    // KKT: the gradient of the zero variable points outward (Lawson & Hanson 1974, Theorem 23.4).
    const w1 = h[1] - G[1][0] * r.x[0];
    expect(w1).toBeLessThanOrEqual(1e-12);
  });
  it('leaves a duplicate column at zero instead of failing', () => {
    const A = [[1, 1], [2, 2], [0, 0]];
    const r = nnlsSolve(normal(A, [1, 2, 0]).G, normal(A, [1, 2, 0]).h);
    expect(r.x[0] + r.x[1]).toBeCloseTo(1, 12);
  });
  it('matches brute-force enumeration of active sets on random small problems, in both forms', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 5 }),
        fc.integer({ min: 0, max: 4 }),
        fc.array(fc.double({ min: -3, max: 3, noNaN: true }), { minLength: 60, maxLength: 60 }),
        (n, extra, pool) => {
          const m = n + extra + 1;
          const A = Array.from({ length: m }, (_, i) => Array.from({ length: n }, (_, j) => pool[(i * n + j) % 50] + (i === j ? 2 : 0)));
          const b = Array.from({ length: m }, (_, i) => pool[50 + (i % 10)]);
          const ref = bruteForce(A, b);
          const { G, h } = normal(A, b);
          const x = nnlsSolve(G, h).x;
          const xd = nnlsSolveDense(A, b).x;
          const f = objective(A, b, ref);
          expect(objective(A, b, x)).toBeLessThanOrEqual(f + 1e-9 * (1 + f));
          expect(objective(A, b, xd)).toBeLessThanOrEqual(f + 1e-9 * (1 + f));
          for (let j = 0; j < n; j++) {
            expect(x[j]).toBeGreaterThanOrEqual(0);
            expect(x[j]).toBeCloseTo(ref[j], 6);
            expect(xd[j]).toBeCloseTo(ref[j], 6);
          }
        },
      ),
      { seed: 20261201, numRuns: 300 },
    );
  });
});
