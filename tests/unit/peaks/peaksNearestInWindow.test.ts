import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { peaksNearestInWindow } from '../../../matching/peaks';

describe('peaksNearestInWindow', () => {
  it('is the closest peak of the window, the lower one on a tie (checked against a scan)', () => {
    fc.assert(
      fc.property(fc.array(fc.integer({ min: 0, max: 40 }), { minLength: 1, maxLength: 30 }), fc.nat(), fc.nat(), fc.integer({ min: -5, max: 45 }), (raw, a, b, v) => {
        // Integers on a 0.25 grid make exact ties common.
        const shifts = raw.map((x) => x / 4).sort((x, y) => x - y);
        const from = a % shifts.length;
        const to = from + 1 + (b % (shifts.length - from));
        const x = v / 4;
        let best = from;
        for (let i = from + 1; i < to; i++) if (Math.abs(shifts[i] - x) < Math.abs(shifts[best] - x)) best = i;
        const got = peaksNearestInWindow(shifts, from, to, x);
        expect(Math.abs(shifts[got] - x)).toBe(Math.abs(shifts[best] - x));
        // On a tie the lower shift wins (and among equal shifts, the first at or above x).
        expect(shifts[got]).toBeLessThanOrEqual(shifts[best]);
      }),
      { numRuns: 500 },
    );
  });

  it('gives −1 for an empty window', () => {
    expect(peaksNearestInWindow([1, 2, 3], 2, 2, 2)).toBe(-1);
  });
});
