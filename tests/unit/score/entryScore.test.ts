import { describe, expect, it } from 'vitest';
import { entryScore, type SignalMatchSummary } from '../../../matching/score';

const sig = (nuclei: number, matched: boolean, deltaPpm = 0, intensity = nuclei, exchangeable = false): SignalMatchSummary => ({ nuclei, matched, deltaPpm, intensity, exchangeable });

describe('entryScore', () => {
  it('rejects empty entries and bad options', () => {
    expect(() => entryScore([], { tolerancePpm: 0.03 })).toThrow('an entry needs at least one signal to be scored');
    expect(() => entryScore([sig(1, true)], { tolerancePpm: 0 })).toThrow('tolerancePpm must be positive, got 0');
    expect(() => entryScore([sig(0, true)], { tolerancePpm: 0.03 })).toThrow('nuclei must be positive, got 0');
  });

  it('is 0 when nothing matches and 1 for a perfect match', () => {
    expect(entryScore([sig(3, false)], { tolerancePpm: 0.03 }).score).toBe(0);
    const r = entryScore([sig(3, true), sig(2, true)], { tolerancePpm: 0.03 });
    expect(r).toEqual({ score: 1, explainedShare: 1, shiftFactor: 1, intensityFactor: 1, intensityCv: 0 });
  });

  it('squares the nuclei share explained', () => {
    const r = entryScore([sig(3, true), sig(2, true), sig(1, false)], { tolerancePpm: 0.03 });
    expect(r.explainedShare).toBeCloseTo(5 / 6, 12);
    expect(r.score).toBeCloseTo((5 / 6) ** 2, 12);
  });

  it('does not penalise a missing exchangeable signal, and counts a found one', () => {
    expect(entryScore([sig(3, true), sig(1, false, 0, 0, true)], { tolerancePpm: 0.03 }).score).toBe(1);
    expect(entryScore([sig(3, true), sig(1, true, 0, 1, true), sig(2, false)], { tolerancePpm: 0.03 }).explainedShare).toBeCloseTo(4 / 6, 12);
  });

  // Gaussian in Δδ/tolerance: exp(−¼) at Δδ = tol/2, exp(−1) at the window edge; nuclei-weighted mean.
  it('penalises shift deviation smoothly', () => {
    expect(entryScore([sig(3, true, 0.015)], { tolerancePpm: 0.03 }).shiftFactor).toBeCloseTo(Math.exp(-0.25), 12);
    expect(entryScore([sig(3, true, -0.03)], { tolerancePpm: 0.03 }).shiftFactor).toBeCloseTo(Math.exp(-1), 12);
    expect(entryScore([sig(3, true, 0.03), sig(1, true, 0)], { tolerancePpm: 0.03 }).shiftFactor).toBeCloseTo((3 * Math.exp(-1) + 1) / 4, 12);
  });

  // A signal's integral is proportional to its number of nuclei (qNMR principle, BIPM ISRD-03 eq. 1):
  // a 3H : 2H pair at 3:2 is consistent, at 1:1 it is not.
  it('checks intensity per nucleus across the entry', () => {
    const ok = entryScore([sig(3, true, 0, 300), sig(2, true, 0, 200)], { tolerancePpm: 0.03 });
    expect(ok.intensityCv).toBeCloseTo(0, 12);
    const bad = entryScore([sig(3, true, 0, 200), sig(2, true, 0, 200)], { tolerancePpm: 0.03 });
    // r = 66.7 and 100: mean 83.3, population sd 16.7 → CV 0.2; factor exp(−½ (0.2/1)²)
    expect(bad.intensityCv).toBeCloseTo(0.2, 12);
    expect(bad.intensityFactor).toBeCloseTo(Math.exp(-0.5 * 0.04), 12);
    expect(entryScore([sig(3, true, 0, 200), sig(2, true, 0, 200)], { tolerancePpm: 0.03, cvScale: 0.5 }).intensityFactor).toBeCloseTo(Math.exp(-0.5 * 0.16), 12);
  });

  it('does not change when every intensity is scaled', () => {
    const a = entryScore([sig(3, true, 0.01, 310), sig(2, true, 0, 190)], { tolerancePpm: 0.03 });
    const b = entryScore([sig(3, true, 0.01, 3.1), sig(2, true, 0, 1.9)], { tolerancePpm: 0.03 });
    expect(b.score).toBeCloseTo(a.score, 12);
  });
});
