import { describe, expect, it } from 'vitest';
import { multipletToLines } from '../../../matching/multiplets/multipletToLines';
import { CROWDED_WINDOW_SHARE, crowdingSample, screenCrowding } from '../../../matching/screen/screenCrowding';
import { screenMixture } from '../../../matching/screen';
import type { PeakListMixture } from '../../../shared/mixture';
import { tableLibrary, tableMixture } from '../../fixtures/screen/contaminantTable';

import type { LibraryEntry } from '../../../shared/libraryEntry';

const split = (s: LibraryEntry['signals'][number], mhz: number) => (s.nucleus === '1H' ? multipletToLines(s, mhz) : [{ shift: s.shift, area: s.nuclei }]);

describe('screenCrowding', () => {
  it('counts windows with a peak at the displaced positions, leaving optional signals out', () => {
    // Peaks at 1.6 and 2.6; windows 1.0–1.02 and 2.0–2.02, displaced by ±0.6 (20 × 0.03).
    const shifts = [1.6, 2.6];
    const hasPeak = (lo: number, hi: number) => shifts.some((x) => x >= lo && x <= hi);
    const c = screenCrowding(
      [
        [
          { lo: 0.99, hi: 1.01, optional: false },
          { lo: 1.99, hi: 2.01, optional: false },
          { lo: 5, hi: 5.01, optional: true },
        ],
      ],
      hasPeak,
      0.03,
    );
    // +0.6: both windows hit (1.59–1.61, 2.59–2.61); −0.6: none.
    expect(c.windowHitShare).toBeCloseTo(0.5, 12);
    expect(c.entriesAllHitShare).toBeCloseTo(0.5, 12);
    expect(c.entriesSampled).toBe(1);
    expect(c.warning).toMatch(/^crowded mixture for ±0.03 ppm: 50 % of library signal windows/);
  });

  it('samples every entry of a small library and 500 evenly spaced ones of a large one', () => {
    expect(crowdingSample(3)).toEqual([0, 1, 2]);
    const big = crowdingSample(10_000);
    expect(big).toHaveLength(500);
    expect(big[0]).toBe(0);
    expect(big[1]).toBe(20);
    expect(new Set(big).size).toBe(500);
  });

  // Gottlieb et al., J. Org. Chem. 1997, 62, 7512, Table 1 (CDCl3): a few solvents in a sample are a sparse mixture.
  it('finds a few table compounds in CDCl3 uncrowded, even when every library entry is present', () => {
    const lib = tableLibrary('CDCl3');
    const few = tableMixture('CDCl3', [{ name: 'acetone', amount: 1 }, { name: 'toluene', amount: 0.5 }, { name: 'ethyl acetate', amount: 0.7 }], split);
    const r = screenMixture(few, lib);
    expect(r.crowding.warning).toBeNull();
    expect(r.crowding.windowHitShare).toBeLessThan(CROWDED_WINDOW_SHARE);
    // A five-entry library whose entries are all in the mixture: present compounds fill their own
    // windows, but chance is measured away from them, so the mixture is not called crowded.
    const five = lib.filter((e) => ['acetone', 'toluene', 'ethyl acetate', 'dichloromethane', 'methanol'].includes(e.name));
    const all = tableMixture('CDCl3', five.map((e) => ({ name: e.name, amount: 1 })), split);
    const r5 = screenMixture(all, five);
    expect(r5.candidates.length).toBeGreaterThanOrEqual(4);
    expect(r5.crowding.warning).toBeNull();
  });

  it('warns when a peak sits in nearly every window (a line every 0.02 ppm over 0.5–10 ppm)', () => {
    const lib = tableLibrary('CDCl3');
    const comb: PeakListMixture = {
      kind: 'peaks', name: 'comb', nucleus: '1H', solvent: 'CDCl3', mhz: 600, reference: 'none', intensityKind: 'integral',
      peaks: Array.from({ length: 476 }, (_, i) => ({ shift: 0.5 + i * 0.02, intensity: 1 })),
    };
    const r = screenMixture(comb, lib);
    // Displaced windows near the ends of the axis fall outside the comb, hence not quite all.
    expect(r.crowding.windowHitShare).toBeGreaterThan(0.9);
    expect(r.crowding.warning).toMatch(/crowded mixture for ±0.03 ppm/);
    // …and an analysis of it carries the warning too (checked where analyses are tested).
  });
});
