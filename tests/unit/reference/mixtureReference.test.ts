import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { mixtureReference, mixtureReferenceFind } from '../../../matching/reference';
import { screenMixture } from '../../../matching/screen';
import type { PeakListMixture } from '../../../shared/mixture';
import { synthSpectrum } from '../../fixtures/screen/synthSpectrum';
import { tableLibrary } from '../../fixtures/screen/contaminantTable';

const base: PeakListMixture = {
  kind: 'peaks',
  name: 'm',
  nucleus: '1H',
  solvent: 'CDCl3',
  mhz: 600,
  reference: 'TMS',
  intensityKind: 'integral',
  peaks: [
    { shift: 0.0, intensity: 9 },
    { shift: 2.05, intensity: 3 }, // ethyl acetate CH3CO, Gottlieb 1997 Table 1 (CDCl3)
    { shift: 4.12, intensity: 2 }, // OCH2
    { shift: 1.26, intensity: 3 }, // CH2CH3
  ],
};

describe('mixtureReference', () => {
  it('refuses a mixture that names no reference', () => {
    expect(() => mixtureReference({ ...base, reference: 'none' })).toThrow('cannot reference a mixture without a reference compound (reference is "none")');
  });

  it('fails with a clear message when no reference peak is near 0', () => {
    const noTms = { ...base, peaks: base.peaks.slice(1) };
    expect(() => mixtureReference(noTms)).toThrow('no TMS reference peak found within ±0.2 ppm of 0');
    expect(mixtureReferenceFind(noTms)).toBeNull();
  });

  it('moves the peak closest to 0 to exactly 0.00 ppm and shifts everything with it', () => {
    const off = { ...base, peaks: base.peaks.map((p) => ({ ...p, shift: p.shift + 0.043 })) };
    const fixed = mixtureReference(off);
    expect(fixed.peaks.map((p) => p.shift)).toEqual(base.peaks.map((p) => expect.closeTo(p.shift, 12)));
    expect(off.peaks[0].shift).toBeCloseTo(0.043, 12); // input untouched
  });

  it('prefers the peak closest to 0 (TMS) over silicone grease at 0.07 (Gottlieb 1997 Table 1, CDCl3)', () => {
    const m = { ...base, peaks: [{ shift: 0.07, intensity: 1 }, { shift: -0.02, intensity: 9 }, ...base.peaks.slice(1)] };
    expect(mixtureReferenceFind(m)).toBe(-0.02);
  });

  it('references a spectrum axis', () => {
    const s = synthSpectrum([{ shift: 0.03, height: 100 }, { shift: 2.2, height: 50 }], { from: -1, to: 3, hzPerPoint: 0.4, mhz: 600, widthHz: 1, solvent: 'CDCl3' });
    const r = mixtureReference(s);
    expect(r.ppm[0]).toBeCloseTo(-1.03, 4);
    expect(r.ppm.length).toBe(s.ppm.length);
  });

  // Property from the issue: shifting every peak by the same amount and then referencing gives the
  // same screening result as the original (δ is defined relative to the reference; IUPAC 2001).
  it('shift then reference restores the screening result (property)', () => {
    const lib = tableLibrary('CDCl3');
    const expected = screenMixture(base, lib).candidates.map((c) => [c.entryId, c.score]);
    expect(expected[0][0]).toBe('contam-ethyl-acetate-cdcl3');
    fc.assert(
      fc.property(fc.double({ min: -0.15, max: 0.15, noNaN: true }), (d) => {
        const moved = { ...base, peaks: base.peaks.map((p) => ({ ...p, shift: p.shift + d })) };
        const got = screenMixture(mixtureReference(moved), lib).candidates.map((c) => [c.entryId, c.score]);
        expect(got.map((g) => g[0])).toEqual(expected.map((e) => e[0]));
        got.forEach((g, i) => expect(g[1]).toBeCloseTo(expected[i][1] as number, 9));
      }),
      { numRuns: 50 },
    );
  });
});
