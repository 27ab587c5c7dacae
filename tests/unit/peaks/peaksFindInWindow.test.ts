import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { peaksFindInWindow, peaksLowerBound } from '../../../matching/peaks';

describe('peaksLowerBound / peaksFindInWindow', () => {
  it('handles an empty array and one element', () => {
    expect(peaksLowerBound([], 1)).toBe(0);
    expect(peaksFindInWindow([], 1, 0.1)).toEqual([0, 0]);
    expect(peaksFindInWindow([1], 1, 0)).toEqual([0, 1]);
    expect(peaksFindInWindow([1], 1.2, 0.1)).toEqual([1, 1]);
  });

  it('rejects a negative half-width', () => {
    expect(() => peaksFindInWindow([1, 2], 1, -0.1)).toThrow('window half-width must be ≥ 0, got -0.1');
  });

  it('includes both window edges', () => {
    expect(peaksFindInWindow([0.9, 1, 1.1, 1.2], 1.05, 0.05)).toEqual([1, 3]);
  });

  it('agrees with a linear scan (property)', () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: -1, max: 12, noNaN: true }), { maxLength: 60 }), fc.double({ min: -1, max: 12, noNaN: true }), fc.double({ min: 0, max: 1, noNaN: true }), (xs, c, w) => {
        const sorted = [...xs].sort((a, b) => a - b);
        const [from, to] = peaksFindInWindow(sorted, c, w);
        const expected = sorted.map((x, i) => [x, i] as const).filter(([x]) => x >= c - w && x <= c + w).map(([, i]) => i);
        expect(Array.from({ length: to - from }, (_, k) => from + k)).toEqual(expected);
      }),
    );
  });
});
