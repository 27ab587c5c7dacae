import { describe, expect, it } from 'vitest';
import { entryCheckSchema } from '../../../matching/library';
import { ethanolEntry } from './helpers';

describe('entryCheckSchema', () => {
  it('names "(no id)" when the entry is not even an object', () => {
    expect(entryCheckSchema(null)).toEqual([{ entryId: '(no id)', field: '(entry)', check: 'schema', message: expect.any(String) }]);
  });

  it('reports each bad field with its path', () => {
    const raw = { ...ethanolEntry(), mhz: -5, signals: [{ nucleus: '1H', shift: 1.25, multiplicity: 't', j: [], nuclei: 3 }] };
    expect(entryCheckSchema(raw)).toEqual([
      { entryId: 'test:ethanol', field: 'mhz', check: 'schema', message: 'spectrometer frequency must be at least 10 MHz (the 1H frequency, e.g. 60 or 400)' },
      { entryId: 'test:ethanol', field: 'signals[0].j', check: 'schema', message: 'multiplicity "t" needs 1 coupling constant(s), got 0' },
    ]);
  });

  it('passes a sound entry', () => {
    expect(entryCheckSchema(ethanolEntry())).toEqual([]);
  });
});
