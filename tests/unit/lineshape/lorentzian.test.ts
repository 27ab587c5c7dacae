import { describe, expect, it } from 'vitest';
import { getLorentzianArea, lorentzianFct } from 'ml-peak-shape-generator';
import { lorentzianOverlap } from '../../../matching/lineshape/lorentzianOverlap';
import { lorentzianReach } from '../../../matching/lineshape/lorentzianReach';
import { lorentzianUnitArea } from '../../../matching/lineshape/lorentzianUnitArea';
import { t2ToFwhm } from '../../../matching/lineshape/t2ToFwhm';
import { nucleusFrequency } from '../../../matching/lineshape/nucleusFrequency';

// Worked example of formulas.md (a): ν0 = 1200 Hz, H = 1000, Γ = 1.00 Hz
// (Atkins & de Paula, Physical Chemistry, magnetic resonance chapter; area by integration).
const H = 1000;
const G = 1;
const L = (dnu: number) => H * lorentzianFct(dnu, G);

describe('Lorentzian identities', () => {
  it('has height H at the centre and H/2 at ±Γ/2 (definition of FWHM)', () => {
    expect(L(0)).toBe(1000);
    expect(L(0.5)).toBeCloseTo(500, 10);
    expect(L(-0.5)).toBeCloseTo(500, 10);
  });
  it('matches the tabulated values at ±1, ±2, ±5 Hz (formulas.md (a))', () => {
    expect(L(1)).toBeCloseTo(200, 10);
    expect(L(2)).toBeCloseTo(58.8235, 4);
    expect(L(5)).toBeCloseTo(9.90099, 5);
  });
  it('has area π·H·Γ/2 = 1570.796 (formulas.md (a)) in ml-peak-shape-generator and by quadrature', () => {
    expect(getLorentzianArea({ height: H, fwhm: G })).toBeCloseTo(1570.796, 3);
    // ∫ over ±a is (2/π)·atan(2a/Γ) of the area: check the ±1 FWHM fraction 0.704833 numerically.
    let s = 0;
    const dx = 1e-4;
    for (let x = -1 + dx / 2; x < 1; x += dx) s += L(x) * dx;
    expect(s / 1570.796).toBeCloseTo(0.704833, 5);
  });
  it('scales to unit area: height 2/(π·Γ)', () => {
    expect(lorentzianUnitArea(0, 2)).toBeCloseTo(1 / Math.PI, 14);
    let s = 0;
    for (let x = -2000; x < 2000; x += 0.01) s += lorentzianUnitArea(x, 1) * 0.01;
    expect(s).toBeCloseTo(1 - (2 / Math.PI) * Math.atan(1 / 4000) * 1, 6);
  });
  it('relates width and relaxation: Γ = 1/(πT2*) — 1 Hz ↔ 0.318310 s, 0.5 s ↔ 0.63662 Hz (formulas.md (a))', () => {
    expect(t2ToFwhm(0.31831)).toBeCloseTo(1, 5);
    expect(t2ToFwhm(0.5)).toBeCloseTo(0.63662, 5);
    expect(() => t2ToFwhm(0)).toThrow('T2* must be a positive number of seconds, got 0');
  });
  it('gives the overlap of two Lorentzians as a Lorentzian of summed width (convolution theorem), checked by quadrature', () => {
    for (const [d, g1, g2] of [[0, 1, 1], [0.7, 1, 2.5], [3, 0.4, 0.9]]) {
      let s = 0;
      const dx = 0.001;
      for (let x = -3000; x < 3000; x += dx) s += lorentzianUnitArea(x, g1) * lorentzianUnitArea(x - d, g2) * dx;
      expect(lorentzianOverlap(d, g1, g2)).toBeCloseTo(s, 6);
    }
  });
  it('reaches below cut-off × height beyond (Γ/2)·√(1/cutoff − 1)', () => {
    const r = lorentzianReach(1, 1e-6);
    expect(lorentzianFct(r, 1)).toBeCloseTo(1e-6, 12);
    expect(() => lorentzianReach(1, 0)).toThrow('cutoff must be in (0, 1), got 0');
  });
  it('gives the 13C frequency 150.9028 MHz when 1H is 600.13 MHz (formulas.md (b); Harris et al. 2001)', () => {
    expect(nucleusFrequency('13C', 600.13)).toBeCloseTo(150.9028, 4);
  });
});
