import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { peaksLowerBound } from '../../../matching/peaks/peaksLowerBound';
import { peaksShiftGridBuild, peaksShiftGridLowerBound } from '../../../matching/peaks/peaksShiftGrid';

// The grid must answer exactly what a binary search answers (the screen's scores depend on which
// peak is nearest), for clustered and repeated shifts and for queries outside the peaks' range.
describe('peaksShiftGrid', () => {
  it('gives the same lower bound as a binary search', () => {
    const shift = fc.oneof(fc.double({ min: -1, max: 12, noNaN: true }), fc.constantFrom(0, 5e-324, 1.2345, 7.26, 7.26000001));
    fc.assert(
      fc.property(fc.array(shift, { maxLength: 300 }), fc.array(fc.oneof(shift, fc.double({ min: -50, max: 50, noNaN: true })), { minLength: 1, maxLength: 50 }), (raw, queries) => {
        const shifts = Float64Array.from(raw).sort();
        const grid = peaksShiftGridBuild(shifts);
        for (const v of [...queries, ...raw, ...raw.map((x) => x + 1e-12), ...raw.map((x) => x - 1e-12)]) {
          expect(peaksShiftGridLowerBound(grid, v)).toBe(peaksLowerBound(shifts, v));
        }
      }),
      { numRuns: 200 },
    );
  });

  it('handles an empty list and refuses an unsorted one', () => {
    const empty = peaksShiftGridBuild(new Float64Array(0));
    expect(peaksShiftGridLowerBound(empty, 3)).toBe(0);
    expect(() => peaksShiftGridBuild(Float64Array.of(2, 1))).toThrow('peak shifts must be ascending (index 1)');
  });
});
