import type { NnlsOptions, NnlsResult } from './nnlsSolve';
import { nnlsSolveColumns } from './nnlsSolveColumns';

/**
 * Plain Lawson–Hanson NNLS (Solving Least Squares Problems, 1974, ch. 23) working on the full
 * matrix A (rows of A given as arrays): every passive-set step is a Householder QR least-squares
 * solve on the passive columns. It is the reference the faster normal-equation fit is compared to.
 */
export function nnlsSolveDense(A: ArrayLike<number>[], b: ArrayLike<number>, options: NnlsOptions = {}): NnlsResult {
  const m = b.length;
  if (A.length !== m) throw new RangeError(`matrix has ${A.length} rows but the right-hand side has ${m} entries`);
  const n = m ? A[0].length : 0;
  const cols = Array.from({ length: n }, () => new Float64Array(m));
  for (let i = 0; i < m; i++) {
    if (A[i].length !== n) throw new RangeError(`matrix row ${i} has ${A[i].length} entries, expected ${n}`);
    for (let j = 0; j < n; j++) {
      const v = A[i][j];
      if (!Number.isFinite(v)) throw new RangeError(`matrix entry [${i}][${j}] is not finite`);
      cols[j][i] = v;
    }
    if (!Number.isFinite(b[i])) throw new RangeError(`right-hand side entry ${i} is not finite`);
  }
  return nnlsSolveColumns(cols, Float64Array.from(b), options);
}

