import { describe, expect, it } from 'vitest';
import { spectrumNoiseEstimate, spectrumPickPeaks } from '../../../matching/spectrum';
import { gaussian, seededRandom } from '../../fixtures/screen/random';
import { synthSpectrum } from '../../fixtures/screen/synthSpectrum';

describe('spectrumNoiseEstimate', () => {
  it('needs three points and finite values', () => {
    expect(() => spectrumNoiseEstimate([1, 2])).toThrow('noise estimate needs at least 3 points, got 2');
    expect(() => spectrumNoiseEstimate([1, Number.NaN, 2])).toThrow('intensity 1 is not a finite number');
  });

  it('is 0 for a flat line', () => {
    expect(spectrumNoiseEstimate([5, 5, 5, 5])).toBe(0);
  });

  // For Gaussian noise 1.4826·MAD estimates σ (common practice); σ = 12.0 as in formulas.md (f).
  it('recovers the σ of Gaussian noise within 3 %, also with peaks and a sloping baseline present', () => {
    const rand = seededRandom(7);
    const y = Array.from({ length: 40000 }, (_, i) => 12 * gaussian(rand) + 0.001 * i + (i % 4000 === 0 ? 1500 : 0));
    expect(spectrumNoiseEstimate(y)).toBeGreaterThan(12 * 0.97);
    expect(spectrumNoiseEstimate(y)).toBeLessThan(12 * 1.03);
  });
});

describe('spectrumPickPeaks', () => {
  it('rejects short or mismatched data and a bad threshold', () => {
    expect(() => spectrumPickPeaks({ ppm: [1, 2, 3, 4], intensity: [1, 2, 3, 4], mhz: 400 })).toThrow('a spectrum needs at least 5 points, got 4');
    expect(() => spectrumPickPeaks({ ppm: [1, 2, 3, 4, 5], intensity: [1, 2, 3], mhz: 400 })).toThrow('ppm has 5 points but intensity has 3');
    expect(() => spectrumPickPeaks({ ppm: [1, 2, 3, 4, 5], intensity: [1, 2, 3, 4, 5], mhz: 400 }, { snrThreshold: 0 })).toThrow('snrThreshold must be positive, got 0');
    expect(() => spectrumPickPeaks({ ppm: [1, 2, 2, 4, 5], intensity: [1, 2, 3, 4, 5], mhz: 400 })).toThrow('ppm axis must be strictly monotonic (point 2)');
  });

  // Worked example formulas.md (a): H = 1000, Γ = 1.00 Hz at 2.000 ppm, 600 MHz → FWHM 1 Hz,
  // area π·H·Γ/2 = 1570.796 Hz·units = 2.61799 ppm·units. The valley-to-valley integral stops
  // where the line falls to 2σ = 4 (|ν − ν0| ≈ 7.9 Hz), which holds (2/π)·atan(2·7.9) ≈ 96 % of the
  // area (same section); noise moves the cut a little, so ≥ 93 %. S/N = H/σ = 1000/2 = 500.
  it('recovers position, height, FWHM, integral and S/N of a Lorentzian line', () => {
    const rand = seededRandom(3);
    const s = synthSpectrum([{ shift: 2.0, height: 1000 }], { from: 1.5, to: 2.5, hzPerPoint: 0.1, mhz: 600, widthHz: 1, noise: () => 2 * gaussian(rand) });
    const r = spectrumPickPeaks(s);
    // Gaussian noise passes 3σ at ~0.1 % of points, so a few weak maxima may be kept too; only one stands out.
    const strong = r.peaks.filter((q) => q.snr >= 5);
    expect(strong).toHaveLength(1);
    const p = strong[0];
    expect(p.shift).toBeCloseTo(2.0, 4);
    expect(p.height).toBeGreaterThan(990);
    expect(p.height).toBeLessThan(1010);
    expect(p.widthHz).toBeGreaterThan(0.95);
    expect(p.widthHz).toBeLessThan(1.05);
    expect(p.integral / 2.61799).toBeGreaterThan(0.93);
    expect(p.integral / 2.61799).toBeLessThan(1.01);
    expect(p.snr).toBeGreaterThan(500 * 0.95);
    expect(p.snr).toBeLessThan(500 * 1.05);
  });

  // S/N ≥ 3 to count a peak (ICH Q2(R1) detection limit; common practice).
  it('keeps peaks at S/N ≥ 3 and reports weaker maxima separately', () => {
    const rand = seededRandom(11);
    const s = synthSpectrum(
      [
        { shift: 3.0, height: 60 }, // S/N ≈ 60
        { shift: 4.0, height: 10 }, // S/N ≈ 10
        { shift: 5.0, height: 1.2 }, // S/N ≈ 1.2: below
      ],
      { from: 2.5, to: 5.5, hzPerPoint: 0.25, mhz: 400, widthHz: 1.5, noise: () => gaussian(rand) },
    );
    const r = spectrumPickPeaks(s);
    const near = (x: number) => r.peaks.some((p) => Math.abs(p.shift - x) < 0.002);
    expect(near(3.0) && near(4.0)).toBe(true);
    expect(near(5.0)).toBe(false);
    expect(r.peaks.every((p) => p.snr >= 3)).toBe(true);
    expect(r.belowThreshold.every((p) => p.snr < 3 || p.widthHz < 1.5 * 0.25)).toBe(true);
  });

  it('reads a high-to-low ppm axis the same way', () => {
    const s = synthSpectrum([{ shift: 2.0, height: 100 }], { from: 1.9, to: 2.1, hzPerPoint: 0.2, mhz: 400, widthHz: 1 });
    const rev = { ...s, ppm: [...s.ppm].reverse(), intensity: [...s.intensity].reverse() };
    expect(spectrumPickPeaks(rev).peaks.map((p) => p.shift)).toEqual(spectrumPickPeaks(s).peaks.map((p) => p.shift));
  });
});
