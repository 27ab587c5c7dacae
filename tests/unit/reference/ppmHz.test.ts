import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { hzToPpm, ppmToHz } from '../../../matching/reference';

describe('ppmToHz / hzToPpm', () => {
  it('rejects a zero, negative or non-finite frequency and non-finite values', () => {
    expect(() => ppmToHz(1, 0)).toThrow('spectrometer frequency must be a positive number of MHz, got 0');
    expect(() => hzToPpm(1, -400)).toThrow('spectrometer frequency must be a positive number of MHz, got -400');
    expect(() => ppmToHz(Number.NaN, 600)).toThrow('ppm must be a finite number, got NaN');
    expect(() => hzToPpm(Infinity, 600)).toThrow('Hz must be a finite number, got Infinity');
  });

  // Worked examples, formulas.md (b): Δν[Hz] = Δδ[ppm] × ν_ref[MHz] (IUPAC definition of δ; Harris et al. 2001).
  it('reproduces the worked ppm ↔ Hz examples', () => {
    expect(ppmToHz(0.01, 600.13)).toBeCloseTo(6.0013, 4);
    expect(ppmToHz(0.05, 600.13)).toBeCloseTo(30.0065, 4);
    expect(ppmToHz(0.01, 400.13)).toBeCloseTo(4.0013, 4);
    expect(ppmToHz(2.0, 600.13)).toBeCloseTo(1200.26, 2);
    expect(hzToPpm(7.0, 600.13)).toBeCloseTo(0.011664, 6);
  });

  it('round-trips any shift at any frequency (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: -20, max: 250, noNaN: true }), fc.double({ min: 20, max: 1200, noNaN: true }), (ppm, mhz) => {
        expect(hzToPpm(ppmToHz(ppm, mhz), mhz)).toBeCloseTo(ppm, 9);
      }),
    );
  });
});
