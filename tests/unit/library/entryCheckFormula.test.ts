import { beforeAll, describe, expect, it } from 'vitest';
import { entryCheckFormula, smilesCountAtoms as warmUp } from '../../../matching/library';
import type { LibraryEntry } from '../../../shared/libraryEntry';
import { OPENCHEMLIB_WARM_UP_MS, ethanolEntry } from './helpers';

const problem = (field: string, message: string) => ({ entryId: 'test:ethanol', field, check: 'formula', message });
const H = (shift: number, nuclei: number, exchangeable?: boolean): LibraryEntry['signals'][number] => ({ nucleus: '1H', shift, multiplicity: 's', j: [], nuclei, ...(exchangeable ? { exchangeable } : {}) });

// Ethanol, C2H6O: CH3 3H, CH2 2H, OH 1H (Gottlieb, Kotlyar & Nudelman, J. Org. Chem. 1997, 62, 7512, Table 1);
// openchemlib is the oracle for the formula of the SMILES.
describe('entryCheckFormula', () => {
  beforeAll(() => void warmUp('C'), OPENCHEMLIB_WARM_UP_MS);

  it('accepts ethanol with and without its OH signal in CDCl3, and without it in D2O', () => {
    expect(entryCheckFormula(ethanolEntry())).toEqual([]);
    expect(entryCheckFormula(ethanolEntry({ signals: [H(1.25, 3), H(3.72, 2)] }))).toEqual([]);
    expect(entryCheckFormula(ethanolEntry({ solvent: 'D2O', signals: [H(1.17, 3), H(3.65, 2)] }))).toEqual([]);
  });

  it('flags an unreadable formula or SMILES', () => {
    expect(entryCheckFormula(ethanolEntry({ formula: 'C2H6O+' }))).toEqual([problem('formula', 'formula "C2H6O+": unexpected "+" at position 6')]);
    expect(entryCheckFormula(ethanolEntry({ smiles: 'C1CO' }))).toEqual([problem('smiles', expect.stringMatching(/^smiles "C1CO" cannot be read: SmilesParser: dangling ring closure/))]);
  });

  it('flags a formula that disagrees with the SMILES', () => {
    expect(entryCheckFormula(ethanolEntry({ formula: 'C2H4O' }))).toEqual([problem('formula', 'formula C2H4O does not match the smiles (openchemlib gives C2H6O)')]);
  });

  it('flags a wrong H count against the formula', () => {
    const e = ethanolEntry({ signals: [H(1.25, 3), H(3.72, 3)] });
    expect(entryCheckFormula(e)).toEqual([
      problem('signals', '1H signals not marked exchangeable hold 6 nuclei; formula C2H6O has 6 H, 1 of them on N/O/S (exchangeable, from the smiles), so 5 are expected'),
    ]);
  });

  it('flags more nuclei than hydrogens, and more exchangeable nuclei than H on N/O/S', () => {
    expect(entryCheckFormula(ethanolEntry({ signals: [H(1.25, 3), H(3.72, 2), H(1.3, 2, true)] }))).toEqual([problem('signals', '1H signals hold 7 nuclei but formula C2H6O has only 6 H')]);
    expect(entryCheckFormula(ethanolEntry({ formula: 'C2H6O2', smiles: 'OCCO', signals: [H(3.7, 4), H(2.0, 2, true)] }))).toEqual([]);
    expect(entryCheckFormula(ethanolEntry({ smiles: 'COC', signals: [H(3.3, 5), H(2, 1, true)] }))).toEqual([
      problem('signals', '1H signals not marked exchangeable hold 5 nuclei; formula C2H6O has 6 H, 0 of them on N/O/S (exchangeable, from the smiles), so 6 are expected'),
    ]);
  });

  it('flags an OH listed in D2O, where it exchanges, but not the HDO signal of water itself', () => {
    expect(entryCheckFormula(ethanolEntry({ solvent: 'D2O', signals: [H(1.17, 3), H(3.65, 2), H(4.8, 1, true)] }))).toEqual([
      problem('signals[2].exchangeable', 'exchangeable 1H exchange with D2O and give no signal of their own; remove the signal'),
    ]);
    expect(entryCheckFormula(ethanolEntry({ formula: 'H2O', smiles: 'O', solvent: 'CD3OD', signals: [H(4.87, 2, true)] }))).toEqual([]);
  });

  it('without a SMILES, checks bounds only', () => {
    const noSmiles = (signals: LibraryEntry['signals']) => ethanolEntry({ smiles: undefined, signals });
    expect(entryCheckFormula(noSmiles([H(1.25, 3), H(3.72, 2)]))).toEqual([]);
    expect(entryCheckFormula(noSmiles([H(1.25, 3), H(3.72, 1)]))).toEqual([
      problem('signals', '1H signals not marked exchangeable hold 4 nuclei; formula C2H6O has 6 H and at most 1 can be on N/O/S, so at least 5 are expected'),
    ]);
  });

  it('flags 13C nuclei beyond the carbons and carbon types beyond the hydrogens', () => {
    const c = (shift: number, carbonType: 'CH3' | 'CH2', nuclei = 1): LibraryEntry['signals'][number] => ({ nucleus: '13C', shift, carbonType, nuclei });
    expect(entryCheckFormula(ethanolEntry({ signals: [...ethanolEntry().signals, c(18.4, 'CH3'), c(58.3, 'CH2')] }))).toEqual([]);
    expect(entryCheckFormula(ethanolEntry({ signals: [...ethanolEntry().signals, c(18.4, 'CH3', 2), c(58.3, 'CH2')] }))).toEqual([
      problem('signals', '13C signals hold 3 nuclei but formula C2H6O has only 2 C'),
      problem('signals', '13C carbon types carry 8 H but formula C2H6O has only 6 H'),
    ]);
  });
});
