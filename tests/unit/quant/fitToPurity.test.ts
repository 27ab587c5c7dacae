import { describe, expect, it } from 'vitest';
import { fitMixture } from '../../../matching/fit/fitMixture';
import { fitToPurity } from '../../../matching/quant/fitToPurity';
import { contaminantLibrary, synthPeaks } from '../fit/contaminantLibrary';

// Acetone (C3H6O, 6H singlet 2.17 ppm) assayed against 1,4-dioxane (C4H8O2, 8H singlet 3.71 ppm) as
// internal standard (shifts: Gottlieb 1997 Table 1, CDCl3).
const lib = contaminantLibrary();
const get = (id: string) => lib.find((e) => e.id === id)!;
const fit = fitMixture(synthPeaks([{ entry: get('acetone'), amount: 0.5 }, { entry: get('1-4-dioxane'), amount: 0.25 }]), lib);
const std = { entryId: '1-4-dioxane', concentrationMM: 1 };

describe('fitToPurity (BIPM ISRD-03 eq. 1)', () => {
  it('needs both compounds fitted', () => {
    expect(() => fitToPurity(fit, std, { entryId: 'benzene', analyteMassMg: 20, standardMassMg: 10, standardPurity: 0.999 }, lib)).toThrow(
      'analyte "benzene" was not fitted in the mixture, so its purity cannot be computed',
    );
  });
  it('reproduces a hand computation to 4 significant figures', () => {
    // (I_A/I_S)(N_S/N_A) = a_A/a_S = 2; M_A/M_S = 58.080/88.106 (C 12.011, H 1.008, O 15.999);
    // m_S/m_A = 10.0/20.0; w_S = 0.999 → w_A = 2 × 0.659206 × 0.5 × 0.999 = 0.6585.
    const p = fitToPurity(fit, std, { entryId: 'acetone', analyteMassMg: 20, standardMassMg: 10, standardPurity: 0.999 }, lib);
    expect(Number(p.massFraction.toPrecision(4))).toBe(0.6585);
    expect(p.molarMassAnalyte).toBeCloseTo(58.08, 2);
    expect(p.molarMassStandard).toBeCloseTo(88.106, 2);
  });
  it('names the entry whose formula cannot be read', () => {
    const bad = lib.map((e) => (e.id === 'acetone' ? { ...e, formula: 'C3H6O·x' } : e));
    expect(() => fitToPurity(fit, std, { entryId: 'acetone', analyteMassMg: 20, standardMassMg: 10, standardPurity: 0.999 }, bad)).toThrow(
      'entry "acetone": formula "C3H6O·x": unexpected "·" at position 6 (element symbols and counts only)',
    );
  });
});
