import { describe, expect, it } from 'vitest';
import { entryToDecoy } from '../../../matching/confidence/entryToDecoy';
import { libraryToDecoys } from '../../../matching/confidence/libraryToDecoys';
import { randomSeeded } from '../../../matching/confidence/randomSeeded';
import { contaminantLibrary } from '../fit/contaminantLibrary';

const lib = contaminantLibrary();

describe('randomSeeded', () => {
  it('rejects a non-integer seed and repeats a sequence for the same seed', () => {
    expect(() => randomSeeded(1.5)).toThrow('seed must be an integer, got 1.5');
    const a = randomSeeded(42);
    const b = randomSeeded(42);
    const xs = Array.from({ length: 5 }, () => a());
    expect(Array.from({ length: 5 }, () => b())).toEqual(xs);
    expect(xs.every((x) => x >= 0 && x < 1)).toBe(true);
  });
  it('is close to uniform (mean 1/2, variance 1/12 of U(0,1); common practice)', () => {
    const r = randomSeeded(7);
    const xs = Array.from({ length: 20000 }, () => r());
    const mean = xs.reduce((s, x) => s + x, 0) / xs.length;
    const v = xs.reduce((s, x) => s + (x - mean) ** 2, 0) / xs.length;
    expect(mean).toBeCloseTo(0.5, 2);
    expect(v).toBeCloseTo(1 / 12, 2);
  });
});

describe('entryToDecoy / libraryToDecoys', () => {
  const ethanol = lib.find((e) => e.id === 'ethanol')!;
  it('rejects an empty range', () => {
    expect(() => entryToDecoy(ethanol, randomSeeded(1), [2, 2], 1, 600)).toThrow('decoy range must be two finite shifts, low < high, got [2, 2]');
    expect(() => libraryToDecoys(lib, { sets: 0, range: [0, 10], mhz: 600 })).toThrow('decoy sets must be a positive integer, got 0');
  });
  it('keeps every signal’s multiplicity, couplings and nuclei, and moves it inside the range', () => {
    const d = entryToDecoy(ethanol, randomSeeded(3), [0, 10], 2, 600);
    expect(d.id).toBe('decoy.2.ethanol');
    expect(d.signals.map((s) => (s.nucleus === '1H' ? [s.multiplicity, s.j, s.nuclei] : null))).toEqual(
      ethanol.signals.map((s) => (s.nucleus === '1H' ? [s.multiplicity, s.j, s.nuclei] : null)),
    );
    // The quartet (J 7 Hz, half spread 10.5 Hz) keeps all its lines inside [0, 10] ppm.
    for (const s of d.signals) expect(s.shift).toBeGreaterThanOrEqual(10.5 / 600 - 1e-12);
    expect(d.signals.some((s, i) => s.shift !== ethanol.signals[i].shift)).toBe(true);
  });
  it('gives reproducible, distinct sets from one seed', () => {
    const a = libraryToDecoys(lib, { sets: 3, seed: 9, range: [0, 10], mhz: 600 });
    const b = libraryToDecoys(lib, { sets: 3, seed: 9, range: [0, 10], mhz: 600 });
    expect(a).toEqual(b);
    expect(a.length).toBe(3);
    expect(a[0][0].signals[0].shift).not.toBe(a[1][0].signals[0].shift);
  });
});
