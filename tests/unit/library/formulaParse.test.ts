import fc from 'fast-check';
import { Molecule } from 'openchemlib';
import { beforeAll, describe, expect, it } from 'vitest';
import { formulaParse, smilesCountAtoms as warmUp } from '../../../matching/library';
import { OPENCHEMLIB_WARM_UP_MS } from './helpers';

describe('formulaParse', () => {
  beforeAll(() => void warmUp('C'), OPENCHEMLIB_WARM_UP_MS);

  it('rejects empty and malformed formulas with the position', () => {
    expect(() => formulaParse('')).toThrow(new RangeError('formula is empty'));
    expect(() => formulaParse('C2H6O)')).toThrow(new RangeError('formula "C2H6O)": unexpected ")" at position 6'));
    expect(() => formulaParse('c2h6o')).toThrow(new RangeError('formula "c2h6o": unexpected "c" at position 1'));
    expect(() => formulaParse('C2Xx6')).toThrow(new RangeError('formula "C2Xx6": unknown element "Xx" at position 3'));
    expect(() => formulaParse('C0H4')).toThrow(new RangeError('formula "C0H4": count 0 for "C" at position 1'));
    expect(() => formulaParse(42 as unknown as string)).toThrow(TypeError);
  });

  it('reads single atoms, implicit counts, two-letter symbols and isotopes', () => {
    expect(formulaParse('H2O')).toEqual({ H: 2, O: 1 });
    expect(formulaParse('CHCl3')).toEqual({ C: 1, H: 1, Cl: 3 });
    expect(formulaParse('C3HD5O')).toEqual({ C: 3, H: 1, D: 5, O: 1 });
    expect(formulaParse('C6H15NaO3SSi')).toEqual({ C: 6, H: 15, Na: 1, O: 3, S: 1, Si: 1 });
    expect(formulaParse('CH2CH2')).toEqual({ C: 2, H: 4 }); // repeated symbols add up
  });

  // Oracle: openchemlib (general-purpose cheminformatics library) — the formula it writes for a
  // SMILES must parse to the atoms it holds, counted atom by atom (implicit H included).
  it.each([
    'CCO',
    'OC(=O)/C=C\\C(=O)O',
    'C[Si](C)(C)CCCS(=O)(=O)[O-].[Na+]',
    'CN(C)P(=O)(N(C)C)N(C)C',
    'Cc1cc(C(C)(C)C)c(O)c(C(C)(C)C)c1',
    'ClC(Cl)Cl',
    'COc1ccc(cc1)-c1cc(=O)c2c(O)cc(O)cc2o1',
  ])('agrees with openchemlib atom counts for %s', (smiles) => {
    const mol = Molecule.fromSmiles(smiles);
    const counted: Record<string, number> = {};
    for (let i = 0; i < mol.getAllAtoms(); i++) {
      const label = mol.getAtomLabel(i);
      counted[label] = (counted[label] ?? 0) + 1;
      const h = mol.getImplicitHydrogens(i);
      if (h > 0) counted.H = (counted.H ?? 0) + h;
    }
    expect(formulaParse(mol.getMolecularFormula().formula)).toEqual(counted);
  });

  it('reads back any formula written from element counts (property)', () => {
    const symbols = ['C', 'H', 'D', 'N', 'O', 'S', 'P', 'F', 'Cl', 'Br', 'Na', 'Si'];
    fc.assert(
      fc.property(fc.dictionary(fc.constantFrom(...symbols), fc.integer({ min: 1, max: 60 }), { minKeys: 1 }), (counts) => {
        const text = Object.entries(counts).map(([el, n]) => (n === 1 ? el : `${el}${n}`)).join('');
        expect(formulaParse(text)).toEqual(counts);
      }),
    );
  });
});
