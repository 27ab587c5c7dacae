import { multiplicityNeighbours } from '../../shared/multiplicity';

export interface MultipletLines {
  /** Line positions, ppm, ascending. */
  ppm: number[];
  /** Relative intensities (binomial, tree of splittings), summing to 1. */
  weight: number[];
}

/**
 * First-order line positions of a multiplet at a given spectrometer frequency: each splitting by
 * n equivalent spin-½ neighbours with coupling J gives n+1 lines at (k − n/2)·J, k = 0…n, with
 * binomial weights C(n,k) (Pascal's triangle); several splittings apply one after another (tree).
 * "m" and "br" have no first-order pattern and give one line at the centre.
 * Coincident lines are merged (dd with J1 = J2 becomes 1:2:1).
 */
export function multipletLinePositions(shift: number, multiplicity: string, jHz: readonly number[], mhz: number): MultipletLines {
  if (!Number.isFinite(shift)) throw new RangeError(`shift must be a finite number, got ${shift}`);
  if (!(mhz > 0)) throw new RangeError(`spectrometer frequency must be positive, got ${mhz}`);
  const neighbours = multiplicityNeighbours(multiplicity);
  if (neighbours === null || neighbours.length === 0) return { ppm: [shift], weight: [1] };
  if (neighbours.length !== jHz.length) {
    throw new RangeError(`multiplicity "${multiplicity}" needs ${neighbours.length} coupling constant(s), got ${jHz.length}`);
  }
  let lines: Array<[number, number]> = [[0, 1]]; // offset Hz, weight
  neighbours.forEach((n, s) => {
    const j = jHz[s];
    if (!(j > 0) || !Number.isFinite(j)) throw new RangeError(`coupling constant ${s + 1} must be a positive number of Hz, got ${j}`);
    const next: Array<[number, number]> = [];
    const c = binomialRow(n);
    for (const [o, w] of lines) for (let k = 0; k <= n; k++) next.push([o + (k - n / 2) * j, (w * c[k]) / 2 ** n]);
    lines = next;
  });
  lines.sort((a, b) => a[0] - b[0]);
  const ppm: number[] = [];
  const weight: number[] = [];
  for (const [o, w] of lines) {
    const p = shift + o / mhz;
    if (ppm.length > 0 && Math.abs(p - ppm[ppm.length - 1]) < 1e-9) weight[weight.length - 1] += w;
    else {
      ppm.push(p);
      weight.push(w);
    }
  }
  return { ppm, weight };
}

function binomialRow(n: number): number[] {
  const row = [1];
  for (let k = 1; k <= n; k++) row.push((row[k - 1] * (n - k + 1)) / k);
  return row;
}
