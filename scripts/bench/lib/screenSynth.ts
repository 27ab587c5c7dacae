// Seeded synthetic library entries and mixtures for the screening benchmark, shaped like real 1H
// data rather than spread uniformly: a uniform 500-peak mixture over 0.8–4.6 ppm puts a peak in
// every ±0.03 ppm window, so every random entry "matches" and no index can help.
import { multipletToLines } from '../../../matching/multiplets/multipletToLines';
import type { LibraryEntry, Signal1H } from '../../../shared/libraryEntry';
import type { PeakListMixture } from '../../../shared/mixture';
import { randomSeeded } from '../../../matching/confidence/randomSeeded';

export function seeded(seed: number): () => number {
  return randomSeeded(seed);
}

type Rand = () => number;
const pick = <T>(rand: Rand, xs: readonly T[]): T => xs[Math.floor(rand() * xs.length)];
const between = (rand: Rand, lo: number, hi: number) => lo + rand() * (hi - lo);

/**
 * Kinds of 1H environment with their shift range, share of all signals and typical patterns
 * (multiplicity, couplings in Hz, nuclei). Shares and ranges follow the usual layout of 1H spectra
 * of small organic molecules: aliphatic-heavy, with O/N-CH, olefinic, aromatic and a few aldehyde
 * signals; vicinal aliphatic J ≈ 7 Hz, aromatic ortho ≈ 8 Hz and meta ≈ 2 Hz, olefinic cis ≈ 10–12
 * and trans ≈ 15–16 Hz, geminal 12–17 Hz (common practice, values from memory).
 */
const ENVIRONMENTS: Array<{ share: number; lo: number; hi: number; patterns: Array<(r: Rand) => Omit<Signal1H, 'nucleus' | 'shift'>> }> = [
  { share: 0.14, lo: 0.8, hi: 1.05, patterns: [(r) => ({ multiplicity: 't', j: [between(r, 6.8, 7.5)], nuclei: 3 }), (r) => ({ multiplicity: 'd', j: [between(r, 6.2, 7.0)], nuclei: 3 }), () => ({ multiplicity: 's', j: [], nuclei: 3 })] },
  { share: 0.04, lo: 0.5, hi: 0.8, patterns: [() => ({ multiplicity: 's', j: [], nuclei: 3 }), () => ({ multiplicity: 'm', j: [], nuclei: 2 })] },
  { share: 0.17, lo: 1.05, hi: 1.9, patterns: [() => ({ multiplicity: 'm', j: [], nuclei: 2 }), (r) => ({ multiplicity: 'quint', j: [between(r, 6.8, 7.6)], nuclei: 2 }), () => ({ multiplicity: 's', j: [], nuclei: 9 }), (r) => ({ multiplicity: 'd', j: [between(r, 6.5, 7.2)], nuclei: 6 }), (r) => ({ multiplicity: 'sext', j: [between(r, 7, 7.5)], nuclei: 2 })] },
  { share: 0.15, lo: 1.9, hi: 2.7, patterns: [() => ({ multiplicity: 's', j: [], nuclei: 3 }), (r) => ({ multiplicity: 't', j: [between(r, 7, 7.6)], nuclei: 2 }), (r) => ({ multiplicity: 'q', j: [between(r, 7, 7.4)], nuclei: 2 }), (r) => ({ multiplicity: 'dd', j: [between(r, 14, 17), between(r, 5, 9)], nuclei: 1 }), () => ({ multiplicity: 'm', j: [], nuclei: 1 })] },
  { share: 0.07, lo: 2.7, hi: 3.3, patterns: [(r) => ({ multiplicity: 't', j: [between(r, 7, 7.8)], nuclei: 2 }), (r) => ({ multiplicity: 'dd', j: [between(r, 13, 14.5), between(r, 4, 9)], nuclei: 1 }), () => ({ multiplicity: 's', j: [], nuclei: 3 })] },
  { share: 0.15, lo: 3.3, hi: 4.5, patterns: [() => ({ multiplicity: 's', j: [], nuclei: 3 }), (r) => ({ multiplicity: 'q', j: [between(r, 7, 7.2)], nuclei: 2 }), (r) => ({ multiplicity: 't', j: [between(r, 6, 7)], nuclei: 2 }), (r) => ({ multiplicity: 'dd', j: [between(r, 10, 12), between(r, 3, 6)], nuclei: 1 }), () => ({ multiplicity: 'm', j: [], nuclei: 1 }), (r) => ({ multiplicity: 'ddd', j: [between(r, 9, 11), between(r, 5, 7), between(r, 2.5, 4)], nuclei: 1 })] },
  { share: 0.07, lo: 4.6, hi: 6.5, patterns: [(r) => ({ multiplicity: 'd', j: [between(r, 15, 16)], nuclei: 1 }), (r) => ({ multiplicity: 'dt', j: [between(r, 10, 12), between(r, 6.5, 7.5)], nuclei: 1 }), (r) => ({ multiplicity: 'dd', j: [between(r, 15, 17), between(r, 10, 11)], nuclei: 1 }), (r) => ({ multiplicity: 'd', j: [between(r, 3.5, 8)], nuclei: 1 })] },
  { share: 0.19, lo: 6.6, hi: 8.3, patterns: [(r) => ({ multiplicity: 'd', j: [between(r, 7.6, 8.6)], nuclei: 2 }), (r) => ({ multiplicity: 't', j: [between(r, 7.4, 7.9)], nuclei: 1 }), (r) => ({ multiplicity: 'dd', j: [between(r, 7.8, 8.5), between(r, 1.5, 2.5)], nuclei: 1 }), () => ({ multiplicity: 'm', j: [], nuclei: 2 }), () => ({ multiplicity: 's', j: [], nuclei: 1 }), (r) => ({ multiplicity: 'td', j: [between(r, 7.4, 7.8), between(r, 1.2, 1.8)], nuclei: 1 })] },
  { share: 0.02, lo: 9.4, hi: 10.0, patterns: [() => ({ multiplicity: 's', j: [], nuclei: 1 }), (r) => ({ multiplicity: 't', j: [between(r, 1.5, 2.5)], nuclei: 1 }), (r) => ({ multiplicity: 'd', j: [between(r, 7, 8)], nuclei: 1 })] },
];

function synthSignal(rand: Rand): Signal1H {
  let r = rand();
  let env = ENVIRONMENTS[0];
  for (const e of ENVIRONMENTS) {
    env = e;
    r -= e.share;
    if (r < 0) break;
  }
  const p = pick(rand, env.patterns)(rand);
  return { nucleus: '1H', shift: Number(between(rand, env.lo, env.hi).toFixed(3)), ...p, j: p.j.map((j) => Number(j.toFixed(1))) };
}

/** Invented entries (2–8 multiplets each, realistic shifts, multiplicities and J), recorded at 600 MHz in CDCl3. */
export function synthLibrary(n: number, rand: Rand): LibraryEntry[] {
  return Array.from({ length: n }, (_, i) => ({
    id: `bench-${i}`,
    name: `bench compound ${i}`,
    synonyms: [],
    formula: 'C1',
    category: 'demo' as const,
    source: 'synthetic benchmark entry',
    solvent: 'CDCl3' as const,
    mhz: 600,
    signals: Array.from({ length: 2 + Math.floor(rand() * 7) }, () => synthSignal(rand)),
  }));
}

/** Lines closer than 1 Hz become one peak, as a peak picker sees them. */
function linesMerge(lines: Array<{ shift: number; intensity: number }>, mhz: number): Array<{ shift: number; intensity: number }> {
  const sorted = [...lines].sort((a, b) => a.shift - b.shift);
  const out: Array<{ shift: number; intensity: number }> = [];
  for (const l of sorted) {
    const last = out[out.length - 1];
    if (last && (l.shift - last.shift) * mhz < 1) last.intensity += l.intensity;
    else out.push({ ...l });
  }
  return out;
}

export interface SynthMixture {
  mixture: PeakListMixture;
  components: number;
}

/**
 * A picked peak list of `total` peaks: the first-order lines at `mhz` of library compounds drawn
 * from `pool` (one shift offset of ±0.005 ppm per compound, 5 % intensity noise, lines closer than
 * 1 Hz merged as a peak picker would; an unresolved "m" is picked as 3–5 peaks over ~12 Hz), then
 * 4 % unrelated peaks and low noise peaks up to `total`. Whole compounds are added while their peaks fit in 90 %.
 */
export function synthMixture(pool: readonly LibraryEntry[], rand: Rand, total = 500, mhz = 600): SynthMixture {
  const target = Math.round(total * 0.9);
  const used = new Set<number>();
  let peaks: Array<{ shift: number; intensity: number }> = [];
  let tries = 0;
  // Whole compounds only: one that would overflow the target is left out (a few more are tried).
  while (tries < 20 && used.size < pool.length) {
    const k = Math.floor(rand() * pool.length);
    if (used.has(k)) continue;
    const amount = Math.exp(between(rand, Math.log(0.2), Math.log(3)));
    const offset = (rand() - 0.5) * 0.01;
    const lines: Array<{ shift: number; intensity: number }> = [];
    for (const s of pool[k].signals) {
      if (s.nucleus !== '1H') continue;
      const sim = multipletToLines(s, mhz);
      if (sim.length === 1 && (s.multiplicity === 'm' || s.multiplicity.startsWith('br'))) {
        const n = 3 + Math.floor(rand() * 3);
        for (let q = 0; q < n; q++) lines.push({ shift: s.shift + offset + ((q - (n - 1) / 2) * 12) / (n - 1) / mhz, intensity: (amount * s.nuclei) / n });
      } else for (const l of sim) lines.push({ shift: l.shift + offset, intensity: amount * l.area * (0.95 + rand() * 0.1) });
    }
    const merged = linesMerge([...peaks, ...lines], mhz);
    if (merged.length > target) {
      tries++;
      continue;
    }
    used.add(k);
    peaks = merged;
  }
  const unrelated = Math.round(total * 0.04);
  for (let q = 0; q < unrelated; q++) peaks.push({ shift: between(rand, 0.5, 10), intensity: between(rand, 0.2, 2) });
  while (peaks.length < total) peaks.push({ shift: between(rand, 0.5, 10), intensity: between(rand, 0.01, 0.05) });
  return {
    mixture: { kind: 'peaks', name: 'bench mixture', nucleus: '1H', solvent: 'CDCl3', mhz, reference: 'none', intensityKind: 'integral', peaks },
    components: used.size,
  };
}
