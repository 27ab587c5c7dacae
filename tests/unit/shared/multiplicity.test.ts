import { describe, expect, it } from 'vitest';
import { multiplicityNeighbours } from '../../../shared/multiplicity';
import { LibraryEntrySchema } from '../../../shared/libraryEntry';

// First-order multiplicity names and their n+1 neighbour counts are common practice
// (d = 1 neighbour, t = 2, q = 3, quintet = 4, sextet = 5, septet = 6).
describe('multiplicityNeighbours', () => {
  it.each([
    ['s', []],
    ['br s', []],
    ['d', [1]],
    ['t', [2]],
    ['q', [3]],
    ['quint', [4]],
    ['sext', [5]],
    ['sept', [6]],
    ['dd', [1, 1]],
    ['dt', [1, 2]],
    ['td', [2, 1]],
    ['ddd', [1, 1, 1]],
    ['qd', [3, 1]],
    ['tt', [2, 2]],
  ])('when given "%s", then it reads %j', (m, expected) => {
    expect(multiplicityNeighbours(m)).toEqual(expected);
  });

  it('when given an unresolved multiplet, then it returns null', () => {
    expect(multiplicityNeighbours('m')).toBeNull();
    expect(multiplicityNeighbours('br')).toBeNull();
  });

  it('when given an unknown token, then it names it', () => {
    expect(() => multiplicityNeighbours('dx')).toThrow('unknown multiplicity "dx"');
  });
});

describe('LibraryEntrySchema', () => {
  const base = {
    id: 'x.1',
    name: 'ethanol',
    formula: 'C2H6O',
    category: 'reference',
    source: 'test',
    solvent: 'CDCl3',
    mhz: 400,
  };

  it('when a triplet carries no coupling constant, then the error names the j field', () => {
    const r = LibraryEntrySchema.safeParse({ ...base, signals: [{ nucleus: '1H', shift: 1.2, multiplicity: 't', j: [], nuclei: 3 }] });
    expect(r.success).toBe(false);
    expect(r.error!.issues[0].path).toEqual(['signals', 0, 'j']);
    expect(r.error!.issues[0].message).toBe('multiplicity "t" needs 1 coupling constant(s), got 0');
  });

  it('when an entry has no signals, then it is refused', () => {
    const r = LibraryEntrySchema.safeParse({ ...base, signals: [] });
    expect(r.success).toBe(false);
    expect(r.error!.issues[0].message).toBe('an entry needs at least one signal');
  });

  it('when 1H and 13C signals are mixed, then both parse with their own fields', () => {
    const r = LibraryEntrySchema.parse({
      ...base,
      signals: [
        { nucleus: '1H', shift: 1.22, multiplicity: 't', j: [7], nuclei: 3 },
        { nucleus: '13C', shift: 18.4, carbonType: 'CH3' },
      ],
    });
    expect(r.signals[1]).toEqual({ nucleus: '13C', shift: 18.4, carbonType: 'CH3', nuclei: 1 });
  });
});
