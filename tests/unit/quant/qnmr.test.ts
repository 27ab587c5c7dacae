import { describe, expect, it } from 'vitest';
import { formulaMolarMass } from '../../../matching/quant/formulaMolarMass';
import { qnmrConcentration } from '../../../matching/quant/qnmrConcentration';
import { qnmrPurity } from '../../../matching/quant/qnmrPurity';

const sig4 = (v: number) => Number(v.toPrecision(4));

describe('qNMR internal-standard equation (BIPM ISRD-03, Westwood et al., Rapport BIPM-2018/05, eq. 1)', () => {
  it('checks its inputs, naming the field', () => {
    expect(() => qnmrConcentration({ integralRatio: 1, nucleiAnalyte: 0, nucleiStandard: 9, concentrationStandard: 0.5 })).toThrow('nucleiAnalyte must be a positive number, got 0');
    expect(() => qnmrConcentration({ integralRatio: -1, nucleiAnalyte: 3, nucleiStandard: 9, concentrationStandard: 0.5 })).toThrow('integralRatio must be a non-negative number, got -1');
    expect(() =>
      qnmrPurity({ integralRatio: 1, nucleiAnalyte: 2, nucleiStandard: 2, molarMassAnalyte: 1, molarMassStandard: 1, massAnalyte: 1, massStandard: 1, purityStandard: 99.94 }),
    ).toThrow('purityStandard is a mass fraction (0–1), got 99.94');
  });
  it('gives 1.800 mM lactate against 0.500 mM DSS (formulas.md (d), worked example 2)', () => {
    // I_A/I_S = 1.20, N_S = 9 (Si(CH3)3), N_A = 3 (CH3 doublet): 1.20 × 9/3 × 0.500 mM
    expect(sig4(qnmrConcentration({ integralRatio: 1.2, nucleiAnalyte: 3, nucleiStandard: 9, concentrationStandard: 0.5 }))).toBe(1.8);
  });
  it('gives w_A = 0.9935 for benzoic acid against maleic acid (formulas.md (d), worked example 1)', () => {
    const w = qnmrPurity({
      integralRatio: 1.125, nucleiAnalyte: 2, nucleiStandard: 2, molarMassAnalyte: 122.123, molarMassStandard: 116.072,
      massAnalyte: 12.05, massStandard: 10.12, purityStandard: 0.9994,
    });
    expect(sig4(w)).toBe(0.9935);
    expect(w).toBeCloseTo(0.99347, 5);
  });
});

describe('formulaMolarMass (openchemlib standard atomic weights)', () => {
  it('rejects what is not a plain formula, naming the position', () => {
    expect(() => formulaMolarMass('')).toThrow('formula must be a non-empty string');
    expect(() => formulaMolarMass('C7H6O2·H2O')).toThrow('formula "C7H6O2·H2O": unexpected "·" at position 7 (element symbols and counts only)');
    expect(() => formulaMolarMass('C2Xx')).toThrow('formula "C2Xx": unknown element "Xx" at position 3');
  });
  it('gives benzoic acid 122.12 and maleic acid 116.07 g/mol (formulas.md (d): 122.123, 116.072 from C 12.011, H 1.008, O 15.999)', () => {
    expect(formulaMolarMass('C7H6O2')).toBeCloseTo(122.123, 2);
    expect(formulaMolarMass('C4H4O4')).toBeCloseTo(116.072, 2);
  });
  it('counts repeated and two-letter symbols (CH2Cl2 = 12.011 + 2·1.008 + 2·35.45 = 84.93, IUPAC conventional weights, from memory)', () => {
    expect(formulaMolarMass('CH2Cl2')).toBeCloseTo(84.93, 1);
  });
  it('reproduces the purity example with molar masses from the formulas to 4 significant figures', () => {
    const w = qnmrPurity({
      integralRatio: 1.125, nucleiAnalyte: 2, nucleiStandard: 2, molarMassAnalyte: formulaMolarMass('C7H6O2'), molarMassStandard: formulaMolarMass('C4H4O4'),
      massAnalyte: 12.05, massStandard: 10.12, purityStandard: 0.9994,
    });
    expect(sig4(w)).toBe(0.9935);
  });
});
