import { describe, expect, it } from 'vitest';
import { amountsCombineSet } from '../../../matching/quant/amountsCombineSet';
import type { AmountResult, FitComponent } from '../../../shared/analysis';

const comp = (entryId: string, amountPerNucleus: number, amountUncertainty: number | null): FitComponent => ({
  entryId, name: entryId, amountPerNucleus, amountUncertainty, integral: amountPerNucleus, nuclei: 1, share: 0.1, shiftOffsetPpm: 0,
  uniqueness: 1, coverage: 1, resolvedLines: 3, snr: null, belowQuantitationLimit: false, curve: [],
});
const amount = (entryId: string, moleFraction: number, u: number | null, conc: number | null, uc: number | null): AmountResult => ({
  entryId, name: entryId, moleFraction, inFractions: true, moleFractionUncertainty: u, concentrationMM: conc, concentrationUncertaintyMM: uc,
  snr: null, belowQuantitationLimit: false, isStandard: false,
});

describe('amountsCombineSet', () => {
  it('refuses an empty set and members without a fitted row', () => {
    expect(() => amountsCombineSet([], [], [])).toThrow('a combined amount needs at least one member');
    expect(() => amountsCombineSet(['a'], [], [])).toThrow('"a" is not a fitted component');
    expect(() => amountsCombineSet(['a'], [comp('a', 1, 0.1)], [])).toThrow('"a" has no amount row');
  });

  it('sums amounts, fractions and concentrations; uncertainties in quadrature (3-4-5 by hand)', () => {
    const r = amountsCombineSet(['a', 'b'], [comp('a', 2, 0.3), comp('b', 0.5, 0.4)], [amount('a', 0.4, 0.03, 4, 0.6), amount('b', 0.1, 0.04, 1, 0.8)]);
    expect(r.amountPerNucleus).toBeCloseTo(2.5, 12);
    expect(r.amountUncertainty).toBeCloseTo(0.5, 12);
    expect(r.moleFraction).toBeCloseTo(0.5, 12);
    expect(r.moleFractionUncertainty).toBeCloseTo(0.05, 12);
    expect(r.concentrationMM).toBeCloseTo(5, 12);
    expect(r.concentrationUncertaintyMM).toBeCloseTo(1, 12);
  });

  it('gives null where a member’s value is unknown', () => {
    const r = amountsCombineSet(['a', 'b'], [comp('a', 2, null), comp('b', 0.5, 0.4)], [amount('a', 0.4, null, null, null), amount('b', 0.1, 0.04, 1, 0.8)]);
    expect(r.amountUncertainty).toBeNull();
    expect(r.moleFractionUncertainty).toBeNull();
    expect(r.concentrationMM).toBeNull();
    expect(r.concentrationUncertaintyMM).toBeNull();
  });
});
