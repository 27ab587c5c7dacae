import { describe, expect, it } from 'vitest';
import { mixturePeaks } from '../../../matching/peaks';
import type { PeakListMixture, SpectrumMixture } from '../../../shared/mixture';

const m: PeakListMixture = {
  kind: 'peaks',
  name: 'm',
  nucleus: '1H',
  solvent: 'CDCl3',
  mhz: 400,
  reference: 'TMS',
  intensityKind: 'height',
  peaks: [
    { shift: 7.26, intensity: 5 }, // residual CHCl3, Gottlieb 1997 Table 1
    { shift: 2.17, intensity: 6 }, // acetone, Gottlieb 1997 Table 1
    { shift: 1.57, intensity: 1 }, // water in CDCl3 (1.56), Gottlieb 1997 Table 1
    { shift: 0.01, intensity: 9 }, // TMS
  ],
};

describe('mixturePeaks', () => {
  it('returns nothing to use for an empty peak list', () => {
    expect(mixturePeaks({ ...m, peaks: [] })).toEqual({ used: [], excluded: [], regions: expect.any(Array), noise: null });
  });

  it('sets aside solvent, water and reference peaks with their reason, keeps the rest sorted by shift', () => {
    const r = mixturePeaks(m);
    expect(r.used.map((p) => [p.index, p.sourceIndex, p.shift, p.snr])).toEqual([[0, 1, 2.17, null]]);
    expect(r.excluded.map((p) => [p.shift, p.reason])).toEqual([
      [0.01, 'reference'],
      [1.57, 'water'],
      [7.26, 'solvent'],
    ]);
    expect(r.noise).toBeNull();
  });

  it('keeps everything when exclusion is switched off', () => {
    const r = mixturePeaks(m, { excludeSolvent: false, excludeReference: false });
    expect(r.used.map((p) => p.shift)).toEqual([0.01, 1.57, 2.17, 7.26]);
    expect(r.excluded).toEqual([]);
  });

  it('rejects a non-positive tolerance', () => {
    expect(() => mixturePeaks(m, { tolerancePpm: 0 })).toThrow('tolerancePpm must be positive, got 0');
  });

  it('picks a spectrum once per object and S/N threshold, and a changed spectrum (a new object) afresh', () => {
    // One Lorentzian line (FWHM 1 Hz at 400 MHz) at 2.17 ppm with a little deterministic ripple.
    const ppm = Array.from({ length: 2048 }, (_, i) => 3 - i / 1024);
    const line = (at: number) => ppm.map((x, i) => 100 / (1 + ((x - at) / (0.5 / 400)) ** 2) + 0.1 * Math.sin(i * 1.7));
    const s: SpectrumMixture = { kind: 'spectrum', name: 's', nucleus: '1H', solvent: 'CDCl3', mhz: 400, reference: 'none', ppm, intensity: line(2.17) };
    const first = mixturePeaks(s);
    expect(first.used.map((p) => p.shift.toFixed(2))).toEqual(['2.17']);
    expect(mixturePeaks(s)).toEqual(first);
    expect(mixturePeaks(s, { snrThreshold: 1e6 }).used).toEqual([]);
    const moved = { ...s, intensity: line(2.5) };
    expect(mixturePeaks(moved).used.map((p) => p.shift.toFixed(2))).toEqual(['2.50']);
  });
});
