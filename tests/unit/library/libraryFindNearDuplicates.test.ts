import { describe, expect, it } from 'vitest';
import { libraryFindNearDuplicates } from '../../../matching/library';
import type { LibraryEntry } from '../../../shared/libraryEntry';
import { ethanolEntry } from './helpers';

const singlets = (id: string, shifts: [number, number][], over: Partial<LibraryEntry> = {}): LibraryEntry =>
  ethanolEntry({ id, smiles: undefined, signals: shifts.map(([shift, nuclei]) => ({ nucleus: '1H', shift, multiplicity: 's', j: [], nuclei })), ...over });

describe('libraryFindNearDuplicates', () => {
  it('rejects a negative or non-finite tolerance', () => {
    expect(() => libraryFindNearDuplicates([], { tolerancePpm: -0.01 })).toThrow(new RangeError('tolerancePpm must be a finite number ≥ 0, got -0.01'));
    expect(() => libraryFindNearDuplicates([], { tolerancePpm: Number.NaN })).toThrow(RangeError);
  });

  it('finds nothing in an empty or one-entry library', () => {
    expect(libraryFindNearDuplicates([])).toEqual([]);
    expect(libraryFindNearDuplicates([ethanolEntry()])).toEqual([]);
  });

  // Acetone (6H) and acetic acid (3H) both print 1.55 ppm in C6D6 (Gottlieb, Kotlyar & Nudelman,
  // J. Org. Chem. 1997, 62, 7512, Table 1): one singlet each, indistinguishable by shift.
  it('pairs one-singlet compounds at the same shift whatever their nuclei count', () => {
    const a = singlets('acetone', [[1.55, 6]], { solvent: 'C6D6' });
    const b = singlets('acetic', [[1.55, 3]], { solvent: 'C6D6' });
    expect(libraryFindNearDuplicates([a, b])).toEqual([{ a: 'acetic', b: 'acetone', solvent: 'C6D6', maxShiftDifference: 0, marked: false }]);
  });

  it('needs every signal within the tolerance, in proportion, in the same solvent', () => {
    const a = singlets('a', [[1.0, 3], [2.0, 2]]);
    expect(libraryFindNearDuplicates([a, singlets('b', [[1.02, 3], [2.03, 2]])])).toEqual([{ a: 'a', b: 'b', solvent: 'CDCl3', maxShiftDifference: 0.03, marked: false }]);
    expect(libraryFindNearDuplicates([a, singlets('b', [[1.02, 3], [2.04, 2]])])).toEqual([]);
    expect(libraryFindNearDuplicates([a, singlets('b', [[1.02, 3], [2.04, 2]])], { tolerancePpm: 0.05 })).toHaveLength(1);
    expect(libraryFindNearDuplicates([a, singlets('b', [[1.0, 6], [2.0, 4]])])).toHaveLength(1);
    expect(libraryFindNearDuplicates([a, singlets('b', [[1.0, 3], [2.0, 3]])])).toEqual([]);
    expect(libraryFindNearDuplicates([a, singlets('b', [[1.0, 3], [2.0, 2]], { solvent: 'D2O' })])).toEqual([]);
    expect(libraryFindNearDuplicates([a, singlets('b', [[1.0, 3], [2.0, 2], [7.0, 1]])])).toEqual([]);
  });

  it('ignores exchangeable signals, retired entries, and pairs marked in either direction', () => {
    const a = ethanolEntry({ id: 'a' });
    const b = ethanolEntry({ id: 'b', signals: ethanolEntry().signals.map((s) => (s.nucleus === '1H' && s.exchangeable ? { ...s, shift: 5.2 } : s)) });
    expect(libraryFindNearDuplicates([a, b])).toHaveLength(1);
    expect(libraryFindNearDuplicates([a, { ...b, retired: true }])).toEqual([]);
    expect(libraryFindNearDuplicates([a, { ...b, nearDuplicateOf: ['a'] }])).toEqual([]);
    expect(libraryFindNearDuplicates([{ ...a, nearDuplicateOf: ['b'] }, b], { includeMarked: true })).toEqual([{ a: 'a', b: 'b', solvent: 'CDCl3', maxShiftDifference: 0, marked: true }]);
  });
});
