import { beforeAll, describe, expect, it } from 'vitest';
import { entryCheckAgainstLibrary, smilesCountAtoms as warmUp } from '../../../matching/library';
import { OPENCHEMLIB_WARM_UP_MS, ethanolEntry } from './helpers';

describe('entryCheckAgainstLibrary', () => {
  beforeAll(() => void warmUp('C'), OPENCHEMLIB_WARM_UP_MS);

  it('rejects a library that is not an array', () => {
    expect(() => entryCheckAgainstLibrary(ethanolEntry(), null as never)).toThrow(new TypeError('entryCheckAgainstLibrary needs the library as an array of entries'));
  });

  it('returns schema problems first, and nothing for a sound new entry', () => {
    expect(entryCheckAgainstLibrary({ ...ethanolEntry(), solvent: 'CCl4' }, [])).toEqual([
      { entryId: 'test:ethanol', field: 'solvent', check: 'schema', message: expect.stringMatching(/^Invalid option/) },
    ]);
    expect(entryCheckAgainstLibrary(ethanolEntry(), [])).toEqual([]);
  });

  it('reports the candidate\'s own problems and an unmarked near duplicate, not the library\'s', () => {
    const library = [ethanolEntry({ id: 'lib:ethanol' }), ethanolEntry({ id: 'lib:broken', formula: 'C9H6O', signals: [{ nucleus: '1H', shift: 7.2, multiplicity: 's', j: [], nuclei: 5 }] }), ethanolEntry({ id: 'lib:other-solvent', solvent: 'D2O', signals: ethanolEntry().signals.slice(0, 2) })];
    const candidate = ethanolEntry({ id: 'new:ethanol', formula: 'C2H4O' });
    expect(entryCheckAgainstLibrary(candidate, library)).toEqual([
      { entryId: 'new:ethanol', field: 'formula', check: 'formula', message: 'formula C2H4O does not match the smiles (openchemlib gives C2H6O)' },
      {
        entryId: 'new:ethanol',
        field: 'nearDuplicateOf',
        check: 'nearDuplicate',
        message: 'near duplicate of "lib:ethanol" in CDCl3 (every 1H signal within 0 ppm, same nuclei ratios); mark it with nearDuplicateOf or tell them apart',
      },
    ]);
  });

  it('accepts a marked near duplicate and a revision of an existing id; flags an unknown mark', () => {
    const library = [ethanolEntry({ id: 'lib:ethanol' })];
    expect(entryCheckAgainstLibrary(ethanolEntry({ id: 'new:ethanol', nearDuplicateOf: ['lib:ethanol'] }), library)).toEqual([]);
    expect(entryCheckAgainstLibrary(ethanolEntry({ id: 'lib:ethanol' }), library)).toEqual([]);
    expect(entryCheckAgainstLibrary(ethanolEntry({ id: 'new:x', signals: [{ nucleus: '1H', shift: 9, multiplicity: 's', j: [], nuclei: 5 }], nearDuplicateOf: ['lib:nope'] }), library)).toEqual([
      { entryId: 'new:x', field: 'nearDuplicateOf[0]', check: 'nearDuplicate', message: 'nearDuplicateOf names "lib:nope", which is not in the library' },
    ]);
  });
});
