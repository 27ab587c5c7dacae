import { describe, expect, it } from 'vitest';
import { lorentzianFct } from 'ml-peak-shape-generator';
import type { Mixture } from '../../../shared/mixture';
import { DEFAULT_LINEWIDTH_HZ, mixtureEstimateLinewidth } from '../../../matching/lineshape/mixtureEstimateLinewidth';

describe('mixtureEstimateLinewidth', () => {
  it('falls back to the default for a peak list without widths', () => {
    const m: Mixture = { kind: 'peaks', name: 'm', nucleus: '1H', solvent: 'CDCl3', mhz: 600, reference: 'TMS', intensityKind: 'height', peaks: [{ shift: 1, intensity: 1 }] };
    expect(mixtureEstimateLinewidth(m)).toEqual({ widthHz: DEFAULT_LINEWIDTH_HZ, source: 'default' });
  });
  it('takes the median width of a peak list', () => {
    const m: Mixture = { kind: 'peaks', name: 'm', nucleus: '1H', solvent: 'CDCl3', mhz: 600, reference: 'TMS', intensityKind: 'height', peaks: [1, 1.5, 3].map((w, i) => ({ shift: i, intensity: 1, widthHz: w })) };
    expect(mixtureEstimateLinewidth(m)).toEqual({ widthHz: 1.5, source: 'mixture' });
  });
  it('recovers the FWHM of sampled Lorentzians in a spectrum (formulas.md (a) line shape)', () => {
    const mhz = 500;
    const ppm = Array.from({ length: 8000 }, (_, i) => i * 0.0005);
    for (const w of [0.6, 1.3, 2.2]) {
      const intensity = ppm.map((x) => 50 * lorentzianFct((x - 1.234) * mhz, w) + 20 * lorentzianFct((x - 2.71) * mhz, w));
      const est = mixtureEstimateLinewidth({ kind: 'spectrum', name: 'm', nucleus: '1H', solvent: 'CDCl3', mhz, reference: 'TMS', ppm, intensity });
      expect(est.source).toBe('mixture');
      expect(est.widthHz).toBeCloseTo(w, 4); // the other line's tail shifts the estimate slightly
    }
  });
});
