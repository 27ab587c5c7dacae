import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { entryScore } from '../../../matching/score/entryScore';
import { peaksShiftGridBuild } from '../../../matching/peaks/peaksShiftGrid';
import { libraryIndexBuild } from '../../../matching/screen/libraryIndexBuild';
import { libraryIndexEntryMatch } from '../../../matching/screen/libraryIndexEntryMatch';
import { entryScoreScratch, libraryIndexEntryScore } from '../../../matching/screen/libraryIndexEntryScore';
import { shiftInRegions } from '../../../matching/screen/shiftInRegions';
import type { LibraryEntry, Signal } from '../../../shared/libraryEntry';
import { seededRandom } from '../../fixtures/screen/random';

// The fast scorer must give the very number the evidence-keeping path gives (multipletsMatchPeaks
// then entryScore): the screen ranks by the first and reports the second. The oracle here is that
// path itself, so the check is equality to the last bit, over shapes chosen to reach every branch:
// singlets, resolved multiplets (d … ddd), unresolved "m" bands, exchangeable OH, 13C lines,
// signals under a set-aside region, crowded and sparse mixtures, low and high field.

const MULTIPLETS: Array<() => Pick<Extract<Signal, { nucleus: '1H' }>, 'multiplicity' | 'j'>> = [
  () => ({ multiplicity: 's', j: [] }),
  () => ({ multiplicity: 'd', j: [7.1] }),
  () => ({ multiplicity: 't', j: [7.3] }),
  () => ({ multiplicity: 'q', j: [7.0] }),
  () => ({ multiplicity: 'dd', j: [15.6, 6.8] }),
  () => ({ multiplicity: 'ddd', j: [10.2, 6.1, 2.9] }),
  () => ({ multiplicity: 'sept', j: [6.9] }),
  () => ({ multiplicity: 'm', j: [] }),
];

function randomLibrary(rand: () => number, n: number, nucleus: '1H' | '13C'): LibraryEntry[] {
  return Array.from({ length: n }, (_, i) => ({
    id: `e${i}`,
    name: `e${i}`,
    synonyms: [],
    formula: 'C1',
    category: 'demo' as const,
    source: 'invented test entry',
    solvent: 'CDCl3' as const,
    mhz: 400,
    signals: Array.from({ length: 1 + Math.floor(rand() * 6) }, (): Signal => {
      const shift = Number((nucleus === '13C' ? 10 + rand() * 180 : 0.5 + rand() * 8).toFixed(3));
      if (nucleus === '13C') return { nucleus: '13C', shift, nuclei: 1 };
      const m = MULTIPLETS[Math.floor(rand() * MULTIPLETS.length)]();
      return { nucleus: '1H', shift, nuclei: 1 + Math.floor(rand() * 3), ...m, ...(rand() < 0.1 ? { exchangeable: true } : {}) };
    }),
  }));
}

describe('libraryIndexEntryScore', () => {
  it('gives the same score and explained share as multipletsMatchPeaks + entryScore, to the last bit', () => {
    const checked = { total: 0, zero: 0 };
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 1_000_000 }), fc.constantFrom(80, 400, 600), fc.constantFrom<'1H' | '13C'>('1H', '1H', '13C'), (seed, mhz, nucleus) => {
        const rand = seededRandom(seed);
        const lib = randomLibrary(rand, 40, nucleus);
        const index = libraryIndexBuild(lib, nucleus, mhz);
        const tol = nucleus === '13C' ? 0.5 : 0.03;
        // Peaks: lines of some entries (jittered) plus random ones; crowded or sparse.
        const raw: number[] = [];
        for (const e of lib) if (rand() < 0.2) for (const s of e.signals) raw.push(s.shift + (rand() - 0.5) * tol, s.shift + 7 / mhz + (rand() - 0.5) * 0.004);
        const extra = rand() < 0.5 ? 20 : 300;
        for (let k = 0; k < extra; k++) raw.push(nucleus === '13C' ? 10 + rand() * 180 : 0.5 + rand() * 8);
        const shifts = Float64Array.from(raw.sort((a, b) => a - b));
        const intensities = Float64Array.from(shifts, () => rand() * 10);
        const regions = rand() < 0.5 ? [{ from: 7.21, to: 7.31 }] : [];
        const sc = entryScoreScratch(shifts.length);
        const grid = peaksShiftGridBuild(shifts);
        for (let e = 0; e < index.entries.length; e++) {
          const matches = libraryIndexEntryMatch(index, e, shifts, intensities, tol);
          const ref = entryScore(
            matches.map((m) => ({
              nuclei: index.sigNuclei[m.signal],
              exchangeable: index.sigExchangeable[m.signal] === 1 || shiftInRegions(index.sigShift[m.signal], regions),
              matched: m.linesMatched > 0,
              deltaPpm: m.scoreDeltaPpm,
              intensity: m.intensity,
            })),
            { tolerancePpm: tol },
          );
          libraryIndexEntryScore(index, e, grid, intensities, tol, regions, 0, sc);
          // Without a threshold only an entry with no peak in any window is ruled out.
          if (sc.pruned) expect(ref.score).toBe(0);
          else {
            expect(sc.score).toBe(ref.score);
            if (ref.score > 0) expect(sc.explainedShare).toBe(ref.explainedShare);
            else checked.zero++;
          }
          checked.total++;
          // With a threshold, an entry is ruled out only when it could not have reached it.
          libraryIndexEntryScore(index, e, grid, intensities, tol, regions, 0.5, sc);
          if (sc.pruned) expect(ref.score).toBeLessThan(0.5);
          else expect(sc.score).toBe(ref.score);
        }
      }),
      { numRuns: 60 },
    );
    // The draw reached both outcomes many times over.
    expect(checked.total).toBeGreaterThan(1000);
    expect(checked.zero).toBeLessThan(checked.total);
  });

  it('rules out, before matching, an entry whose windows hold too few of its nuclei (E² bound)', () => {
    // One 3H singlet found, a 6H doublet far from any peak: E ≤ 3/9, E² ≈ 0.11 < 0.5.
    const lib = randomLibrary(seededRandom(1), 0, '1H');
    lib.push({ id: 'x', name: 'x', synonyms: [], formula: 'C1', category: 'demo', source: 'invented test entry', solvent: 'CDCl3', mhz: 400, signals: [
      { nucleus: '1H', shift: 2.1, nuclei: 3, multiplicity: 's', j: [] },
      { nucleus: '1H', shift: 1.2, nuclei: 6, multiplicity: 'd', j: [6.8] },
    ] });
    const index = libraryIndexBuild(lib, '1H', 400);
    const sc = entryScoreScratch(1);
    libraryIndexEntryScore(index, 0, peaksShiftGridBuild(Float64Array.of(2.1)), Float64Array.of(1), 0.03, [], 0.5, sc);
    expect(sc.pruned).toBe(true);
    libraryIndexEntryScore(index, 0, peaksShiftGridBuild(Float64Array.of(2.1)), Float64Array.of(1), 0.03, [], 0.1, sc);
    expect(sc.pruned).toBe(false);
    expect(sc.explainedShare).toBeCloseTo(3 / 9, 12);
  });
});
