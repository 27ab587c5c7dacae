import fc from 'fast-check';
import { beforeAll, describe, expect, it } from 'vitest';
import { libraryCheck, smilesCountAtoms as warmUp } from '../../../matching/library';
import { OPENCHEMLIB_WARM_UP_MS, ethanolEntry } from './helpers';

describe('libraryCheck', () => {
  beforeAll(() => void warmUp('C'), OPENCHEMLIB_WARM_UP_MS);

  it('rejects a non-array and passes an empty library', () => {
    expect(() => libraryCheck('x' as unknown as unknown[])).toThrow(new TypeError('libraryCheck needs an array of entries'));
    expect(libraryCheck([])).toEqual([]);
  });

  it('reports schema problems and skips the other checks for that entry', () => {
    expect(libraryCheck([{ ...ethanolEntry(), formula: '' }])).toEqual([
      { entryId: 'test:ethanol', field: 'formula', check: 'schema', message: 'Too small: expected string to have >=1 characters' },
    ]);
  });

  it('reports every check with entry id and field', () => {
    const bad = ethanolEntry({ id: 'bad', signals: [{ nucleus: '1H', shift: 17.5, multiplicity: 't', j: [7], nuclei: 3 }, { nucleus: '1H', shift: 3.72, multiplicity: 'q', j: [7], nuclei: 2 }] });
    expect(libraryCheck([bad]).map((p) => `${p.entryId} ${p.field} ${p.check}`)).toEqual(['bad signals[0].shift shiftRange']);
  });

  it('reports duplicate ids, unknown nearDuplicateOf targets and unmarked near duplicates', () => {
    const a = ethanolEntry({ id: 'a' });
    expect(libraryCheck([a, { ...a }]).filter((p) => p.check === 'id')).toEqual([{ entryId: 'a', field: 'id', check: 'id', message: 'id "a" is used by 2 entries' }]);
    expect(libraryCheck([{ ...a, nearDuplicateOf: ['ghost'] }])).toEqual([
      { entryId: 'a', field: 'nearDuplicateOf[0]', check: 'nearDuplicate', message: 'nearDuplicateOf names "ghost", which is not in the library' },
    ]);
    expect(libraryCheck([a, ethanolEntry({ id: 'b' })])).toEqual([
      {
        entryId: 'b',
        field: 'nearDuplicateOf',
        check: 'nearDuplicate',
        message: 'near duplicate of "a" in CDCl3 (every 1H signal within 0 ppm, same nuclei ratios); mark it with nearDuplicateOf or tell them apart',
      },
    ]);
    expect(libraryCheck([a, ethanolEntry({ id: 'b', nearDuplicateOf: ['a'] })])).toEqual([]);
  });

  it('finds the same problems whatever the entry order', () => {
    const entries = [ethanolEntry({ id: 'a' }), ethanolEntry({ id: 'b' }), ethanolEntry({ id: 'c', formula: 'C2H4O' }), ethanolEntry({ id: 'd', solvent: 'D2O' })];
    const key = (list: unknown[]) => libraryCheck(list).map((p) => JSON.stringify(p)).sort();
    const expected = key(entries);
    fc.assert(fc.property(fc.shuffledSubarray(entries, { minLength: entries.length }), (shuffled) => {
      expect(key(shuffled)).toEqual(expected);
    }));
  });
});
