// Own lines of a fitted candidate, on a closed-form peak-list design. Resolution by one FWHM: two
// Lorentzians closer than their full width at half height are not resolved (common practice).
import { describe, expect, it } from 'vitest';
import { fitDesignPeaks } from '../../../matching/fit/fitDesignPeaks';
import { fitOwnLines } from '../../../matching/fit/fitOwnLines';
import type { FitLine } from '../../../matching/fit/fitTypes';

const w = 1 / 400; // 1 Hz at 400 MHz, in ppm
const line = (x: number, a = 1): FitLine => ({ x, a, w });
const design = (peaks: FitLine[]) => fitDesignPeaks(peaks, [0, 10], 0.03);

describe('fitOwnLines', () => {
  it('counts a doublet on two peaks as two lines, and one with a line on empty baseline as one', () => {
    const doublet = [line(2.0), line(2.02)];
    expect(fitOwnLines(design(doublet), [1], [doublet], 0)).toEqual({ resolvedLines: 2, distinctLines: 2 });
    expect(fitOwnLines(design([line(2.0)]), [1], [doublet], 0)).toEqual({ resolvedLines: 1, distinctLines: 1 });
  });

  it('counts lines nearer than one linewidth as one', () => {
    const close = [line(2.0), line(2.0 + 0.5 * w)];
    expect(fitOwnLines(design(close), [1], [close], 0).resolvedLines).toBe(1);
  });

  it('does not count as distinct a supported line within a linewidth of another fitted line, unless that candidate is ignored', () => {
    const a = [line(1.0), line(3.0)];
    const b = [line(3.0 + 0.5 * w, 0.5), line(5.0, 0.5)];
    const d = design([...a, ...b]);
    expect(fitOwnLines(d, [1, 1], [a, b], 0)).toEqual({ resolvedLines: 2, distinctLines: 1 });
    expect(fitOwnLines(d, [1, 1], [a, b], 0, new Set([1]))).toEqual({ resolvedLines: 2, distinctLines: 2 });
    // A candidate that is not fitted (amount 0) shares nothing.
    expect(fitOwnLines(d, [1, 0], [a, b], 0).distinctLines).toBe(2);
  });

  it('gives a candidate that is not fitted no lines', () => {
    const a = [line(1.0)];
    expect(fitOwnLines(design(a), [0], [a], 0)).toEqual({ resolvedLines: 0, distinctLines: 0 });
  });
});
