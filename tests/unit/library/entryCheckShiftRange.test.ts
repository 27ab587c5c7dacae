import { describe, expect, it } from 'vitest';
import { entryCheckShiftRange } from '../../../matching/library';
import { ethanolEntry } from './helpers';

describe('entryCheckShiftRange', () => {
  it('accepts the range ends themselves', () => {
    const e = ethanolEntry({ signals: [{ nucleus: '1H', shift: -1, multiplicity: 's', j: [], nuclei: 1 }, { nucleus: '13C', shift: 230, nuclei: 1 }] });
    expect(entryCheckShiftRange(e)).toEqual([]);
  });

  it('flags a 1H shift above 16 ppm and a 13C shift below -10 ppm', () => {
    const e = ethanolEntry({
      signals: [
        { nucleus: '1H', shift: 1.25, multiplicity: 't', j: [7], nuclei: 3 },
        { nucleus: '1H', shift: 17.2, multiplicity: 's', j: [], nuclei: 2 },
        { nucleus: '13C', shift: -12, nuclei: 1 },
      ],
    });
    expect(entryCheckShiftRange(e)).toEqual([
      { entryId: 'test:ethanol', field: 'signals[1].shift', check: 'shiftRange', message: '1H shift 17.2 ppm is outside the usual range -1 to 16 ppm' },
      { entryId: 'test:ethanol', field: 'signals[2].shift', check: 'shiftRange', message: '13C shift -12 ppm is outside the usual range -10 to 230 ppm' },
    ]);
  });
});
