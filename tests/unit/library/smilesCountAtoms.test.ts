import { beforeAll, describe, expect, it } from 'vitest';
import { smilesCountAtoms } from '../../../matching/library';
import { OPENCHEMLIB_WARM_UP_MS } from './helpers';

describe('smilesCountAtoms', () => {
  beforeAll(() => void smilesCountAtoms('C'), OPENCHEMLIB_WARM_UP_MS);

  it('rejects empty and unreadable SMILES', () => {
    expect(() => smilesCountAtoms('  ')).toThrow(new TypeError('smiles must be a non-empty string'));
    expect(() => smilesCountAtoms('C1CC')).toThrow(/^smiles "C1CC" cannot be read: SmilesParser: dangling ring closure/);
  });

  // H on N/O/S exchange with D2O/CD3OD (common practice); C–H does not.
  it('counts protium and exchangeable hydrogens', () => {
    expect(smilesCountAtoms('CCO')).toMatchObject({ protium: 6, exchangeable: 1 });
    expect(smilesCountAtoms('NCC(=O)O')).toMatchObject({ protium: 5, exchangeable: 3 });
    expect(smilesCountAtoms('CSC')).toMatchObject({ protium: 6, exchangeable: 0 });
    expect(smilesCountAtoms('CS')).toMatchObject({ protium: 4, exchangeable: 1 });
    expect(smilesCountAtoms('C[N+](C)(C)CC(=O)[O-]')).toMatchObject({ protium: 11, exchangeable: 0 });
    expect(smilesCountAtoms('[H][H]')).toMatchObject({ protium: 2, exchangeable: 0 });
  });

  it('leaves deuterium out of the protium count', () => {
    expect(smilesCountAtoms('[2H]OC([2H])[2H]')).toMatchObject({ protium: 1, exchangeable: 0, elements: { C: 1, H: 1, D: 3, O: 1 } });
    expect(smilesCountAtoms('[2H]O')).toMatchObject({ protium: 1, exchangeable: 1 });
  });

  // Oracle: openchemlib writes the molecular formula of maleic acid, C4H4O4.
  it('reports the formula openchemlib writes', () => {
    expect(smilesCountAtoms('OC(=O)/C=C\\C(=O)O')).toMatchObject({ formula: 'C4H4O4', elements: { C: 4, H: 4, O: 4 } });
  });
});
