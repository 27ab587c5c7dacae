import { describe, expect, it } from 'vitest';
import { multipletsMatchPeaks, signalToMultipletLines, UNRESOLVED_MULTIPLET_EXTENT_HZ } from '../../../matching/score';
import type { Signal1H } from '../../../shared/libraryEntry';

const m = (shift: number, nuclei = 2): Signal1H => ({ nucleus: '1H', shift, multiplicity: 'm', j: [], nuclei });

describe('multipletsMatchPeaks: unresolved multiplets', () => {
  it('rejects a non-positive tolerance or frequency', () => {
    const lines = [signalToMultipletLines(m(1.5), 400)];
    expect(() => multipletsMatchPeaks(lines, [1.5], [1], 0, 400)).toThrow('tolerancePpm must be positive, got 0');
    expect(() => signalToMultipletLines(m(1.5), 0)).toThrow('spectrometer frequency must be positive, got 0');
  });

  it('gives an "m" a half extent of 10 Hz in ppm at the mixture frequency', () => {
    // δ(ppm) = Δν(Hz) / MHz (common practice): 10 Hz is 0.125 ppm at 80 MHz, 0.0167 ppm at 600 MHz.
    expect(UNRESOLVED_MULTIPLET_EXTENT_HZ).toBe(20);
    expect(signalToMultipletLines(m(1.5), 80).halfExtentPpm).toBeCloseTo(0.125, 6);
    expect(signalToMultipletLines(m(1.5), 600).halfExtentPpm).toBeCloseTo(1 / 60, 6);
    expect(signalToMultipletLines({ ...m(1.5), widthHz: 40 }, 80).halfExtentPpm).toBeCloseTo(0.25, 6);
    expect(signalToMultipletLines({ nucleus: '1H', shift: 1.5, multiplicity: 't', j: [7], nuclei: 2 }, 80).halfExtentPpm).toBeUndefined();
  });

  it('finds a peak 0.1 ppm from the centre at 80 MHz but not at 600 MHz', () => {
    const at = (mhz: number) => multipletsMatchPeaks([signalToMultipletLines(m(1.48, 4), mhz)], [1.58], [8], 0.03, mhz)[0];
    const low = at(80);
    expect(low.peaks).toEqual([0]);
    expect(low.deltaPpm).toBeCloseTo(0.1, 9);
    // wider than the tolerance: scored in units of the extent, 0.1 · 0.03 / 0.125
    expect(low.scoreDeltaPpm).toBeCloseTo((0.1 * 0.03) / 0.125, 9);
    expect(at(600).linesMatched).toBe(0);
  });

  it('keeps the plain error at high field, where the extent lies inside the tolerance', () => {
    // 10 Hz at 400 MHz = 0.025 ppm < 0.03 ppm
    const r = multipletsMatchPeaks([signalToMultipletLines(m(1.34, 6), 400)], [1.359], [1], 0.03, 400)[0];
    expect(r.scoreDeltaPpm).toBeCloseTo(0.019, 9);
    expect(r.deltaPpm).toBeCloseTo(0.019, 9);
  });

  it('takes the peak nearest its centre, not every peak of its window', () => {
    const r = multipletsMatchPeaks([signalToMultipletLines(m(1.3), 600)], [1.28, 1.305, 1.31, 1.5], [1, 2, 1, 5], 0.03, 600)[0];
    expect(r.peaks).toEqual([1]);
    expect(r.intensity).toBe(2);
    expect(r.deltaPpm).toBeCloseTo(0.005, 9);
  });

  it('lets overlapping unresolved multiplets of one entry share a merged peak, in proportion to nuclei', () => {
    // At 80 MHz a 4H "m" at 1.48 and a 1H "m" at 1.62 are one hump: one picked peak stands for both.
    const r = multipletsMatchPeaks([signalToMultipletLines(m(1.48, 4), 80), signalToMultipletLines(m(1.62, 1), 80)], [1.6], [10], 0.03, 80);
    expect(r.map((x) => x.peaks)).toEqual([[0], [0]]);
    expect(r.map((x) => x.intensity)).toEqual([8, 2]);
    // at 600 MHz they are apart: the peak goes to the nearer centre only
    const hi = multipletsMatchPeaks([signalToMultipletLines(m(1.48, 4), 600), signalToMultipletLines(m(1.62, 1), 600)], [1.6], [10], 0.03, 600);
    expect(hi.map((x) => x.peaks)).toEqual([[], [0]]);
  });
});
