import { describe, expect, it } from 'vitest';
import { fitMixture } from '../../../matching/fit/fitMixture';
import { fitToAmounts } from '../../../matching/quant/fitToAmounts';
import { contaminantLibrary, synthPeaks, synthSpectrum } from '../fit/contaminantLibrary';

// Amounts per nucleus of contaminant-table compounds (Gottlieb 1997 / Fulmer 2010, Table 1, CDCl3);
// 1,4-dioxane (8H singlet, 3.71 ppm) plays the internal standard.
const lib = contaminantLibrary();
const get = (id: string) => lib.find((e) => e.id === id)!;
const parts = [
  { entry: get('acetone'), amount: 0.5 },
  { entry: get('ethanol'), amount: 1.5 },
  { entry: get('1-4-dioxane'), amount: 0.25 },
];

describe('fitToAmounts', () => {
  it('refuses a standard that the fit did not keep', () => {
    const fit = fitMixture(synthPeaks(parts), lib);
    expect(() => fitToAmounts(fit, { entryId: 'benzene', concentrationMM: 1 })).toThrow(/^internal standard "benzene" was not fitted in the mixture \(the fit drove its amount to zero\)$/);
  });
  it('gives mole fractions among the analytes and concentrations by c_A = (I_A/I_S)(N_S/N_A)c_S (BIPM ISRD-03 eq. 1)', () => {
    const fit = fitMixture(synthPeaks(parts), lib);
    const amounts = fitToAmounts(fit, { entryId: '1-4-dioxane', concentrationMM: 2 });
    const by = (id: string) => amounts.find((a) => a.entryId === id)!;
    // Hand computation: acetone I_A = 0.5·6, I_S = 0.25·8 → (3/2)(8/6)·2 mM = 4 mM; ethanol (7.5/2)(8/5)·2 = 12 mM.
    expect(by('acetone').concentrationMM).toBeCloseTo(4, 3);
    expect(by('ethanol').concentrationMM).toBeCloseTo(12, 3);
    expect(by('1-4-dioxane')).toMatchObject({ isStandard: true, concentrationMM: 2, moleFraction: 0 });
    expect(by('acetone').moleFraction).toBeCloseTo(0.25, 4);
    expect(by('ethanol').moleFraction).toBeCloseTo(0.75, 4);
  });
  it('gives mole fractions that sum to 1 without a standard, and uncertainties that grow with noise', () => {
    const quiet = fitToAmounts(fitMixture(synthSpectrum(parts, { noise: 0.005, seed: 3, points: 16384 }), lib, { linewidthHz: 1 }));
    const loud = fitToAmounts(fitMixture(synthSpectrum(parts, { noise: 0.03, seed: 3, points: 16384 }), lib, { linewidthHz: 1 }));
    expect(quiet.reduce((s, a) => s + a.moleFraction, 0)).toBeCloseTo(1, 12);
    expect(quiet.every((a) => a.concentrationMM === null)).toBe(true);
    const u = (list: typeof quiet) => list.find((a) => a.entryId === 'acetone')!.moleFractionUncertainty!;
    expect(u(loud)).toBeGreaterThan(3 * u(quiet));
  });
});
