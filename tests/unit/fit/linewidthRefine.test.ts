import { describe, expect, it } from 'vitest';
import { linewidthRefine } from '../../../matching/fit/linewidthRefine';

describe('linewidthRefine (golden-section search, Kiefer 1953; common practice)', () => {
  it('rejects a bad estimate', () => {
    expect(() => linewidthRefine(() => 0, 0)).toThrow('linewidth estimate must be a positive number of Hz, got 0');
  });
  it('finds the minimum of a unimodal function inside the bracket', () => {
    for (const truth of [0.45, 1.3, 2.7]) expect(linewidthRefine((w) => (Math.log(w) - Math.log(truth)) ** 2, 1)).toBeCloseTo(truth, 2);
  });
  it('widens the bracket around a large estimate', () => {
    expect(linewidthRefine((w) => (w - 8) ** 2, 6)).toBeCloseTo(8, 1);
  });
});
