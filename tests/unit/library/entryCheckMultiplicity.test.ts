import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { entryCheckMultiplicity } from '../../../matching/library';
import { ethanolEntry } from './helpers';

// First-order rules (Tessera formulas.md (c); textbook common practice): one coupling constant per
// splitting letter; n equivalent neighbours give n+1 lines, so two equal doublet splittings are a triplet.
describe('entryCheckMultiplicity', () => {
  it('accepts m and br s with or without J, and every first-order pattern with matching J', () => {
    const e = ethanolEntry({
      signals: [
        { nucleus: '1H', shift: 1, multiplicity: 'm', j: [7.1], nuclei: 2 },
        { nucleus: '1H', shift: 2, multiplicity: 'br s', j: [], nuclei: 1 },
        { nucleus: '1H', shift: 3, multiplicity: 'ddd', j: [17.6, 9.2, 6.9], nuclei: 1 },
        { nucleus: '1H', shift: 4, multiplicity: 'td', j: [7.3, 5.8], nuclei: 2 },
        { nucleus: '1H', shift: 5, multiplicity: 'sept', j: [6], nuclei: 1 },
        { nucleus: '13C', shift: 60, nuclei: 1 },
      ],
    });
    expect(entryCheckMultiplicity(e)).toEqual([]);
  });

  it('flags a J count that does not fit the multiplicity (entries that skipped the schema)', () => {
    const e = ethanolEntry({ signals: [{ nucleus: '1H', shift: 6.1, multiplicity: 'dd', j: [5.7], nuclei: 1 }, { nucleus: '1H', shift: 2, multiplicity: 's', j: [7], nuclei: 3 }] });
    expect(entryCheckMultiplicity(e)).toEqual([
      { entryId: 'test:ethanol', field: 'signals[0].j', check: 'multiplicity', message: 'multiplicity "dd" needs 2 coupling constant(s), got 1' },
      { entryId: 'test:ethanol', field: 'signals[1].j', check: 'multiplicity', message: 'multiplicity "s" needs 0 coupling constant(s), got 1' },
    ]);
  });

  it('flags an unknown multiplicity and a dd with two equal couplings', () => {
    const e = ethanolEntry({ signals: [{ nucleus: '1H', shift: 6.1, multiplicity: 'x', j: [], nuclei: 1 }, { nucleus: '1H', shift: 3.2, multiplicity: 'dd', j: [7, 7], nuclei: 2 }] });
    expect(entryCheckMultiplicity(e)).toEqual([
      { entryId: 'test:ethanol', field: 'signals[0].multiplicity', check: 'multiplicity', message: 'unknown multiplicity "x" (use s, d, t, q, quint, sext, sept, combinations like dd or dt, m, br s)' },
      { entryId: 'test:ethanol', field: 'signals[1].j', check: 'multiplicity', message: 'multiplicity "dd" has two equal doublet couplings (7 Hz): that is a triplet ("t")' },
    ]);
  });

  it('accepts any first-order pattern with one distinct J per splitting and rejects one J too few (property)', () => {
    const letters = ['d', 't', 'q', 'quint', 'sext', 'sept'];
    fc.assert(
      fc.property(fc.array(fc.constantFrom(...letters), { minLength: 1, maxLength: 4 }), (parts) => {
        const multiplicity = parts.join('');
        const j = parts.map((_, k) => 16 - 3 * k); // distinct couplings, so no "dd" with equal J
        const ok = ethanolEntry({ signals: [{ nucleus: '1H', shift: 2, multiplicity, j, nuclei: 1 }] });
        expect(entryCheckMultiplicity(ok)).toEqual([]);
        const short = ethanolEntry({ signals: [{ nucleus: '1H', shift: 2, multiplicity, j: j.slice(1), nuclei: 1 }] });
        expect(entryCheckMultiplicity(short).map((p) => p.field)).toEqual(['signals[0].j']);
      }),
    );
  });
});
