import { describe, expect, it } from 'vitest';
import { componentEvidenceScore } from '../../../matching/confidence/componentEvidenceScore';
import { scoresToQValues } from '../../../matching/confidence/scoresToQValues';

describe('scoresToQValues (target–decoy; Elias & Gygi 2007, q-values after Käll et al. 2008)', () => {
  it('checks its inputs', () => {
    expect(() => scoresToQValues([], [], 0)).toThrow('decoySets must be a positive integer, got 0');
    expect(() => scoresToQValues([{ id: 'a', score: NaN }], [], 1)).toThrow('target "a" has an invalid score NaN');
  });
  it('computes FDR = ((d + 1)/R)/t and its running minimum by hand', () => {
    // Targets 0.9, 0.8, 0.5, 0; decoys (R = 2 sets of 4) 0.85, 0.6, 0, 0, 0, 0, 0, 0.
    const q = scoresToQValues(
      [{ id: 'a', score: 0.9 }, { id: 'b', score: 0.8 }, { id: 'c', score: 0.5 }, { id: 'z', score: 0 }],
      [0.85, 0.6, 0, 0, 0, 0, 0, 0],
      2,
    );
    // s = 0.9: d = 0, t = 1 → (1/2)/1 = 0.5; s = 0.8: d = 1, t = 2 → (2/2)/2 = 0.5;
    // s = 0.5: d = 2, t = 3 → (3/2)/3 = 0.5; s = 0: d = 8, t = 4 → capped 1.
    expect(q.get('a')).toBeCloseTo(0.5, 12);
    expect(q.get('b')).toBeCloseTo(0.5, 12);
    expect(q.get('c')).toBeCloseTo(0.5, 12);
    expect(q.get('z')).toBe(1);
  });
  it('makes q monotone: a higher score never gets a larger q', () => {
    const q = scoresToQValues(
      [{ id: 'a', score: 0.9 }, { id: 'b', score: 0.7 }, { id: 'c', score: 0.6 }, { id: 'd', score: 0.5 }],
      [0.95, 0.1, 0.1, 0.1],
      1,
    );
    // FDR(0.9) = 2/1 → 1; FDR(0.5) = 2/4 = 0.5, inherited by every higher score.
    expect([q.get('a'), q.get('b'), q.get('c'), q.get('d')]).toEqual([0.5, 0.5, 0.5, 0.5]);
  });
  it('gives 1/(R·t) when no decoy reaches the targets', () => {
    const q = scoresToQValues([{ id: 'a', score: 0.8 }, { id: 'b', score: 0.7 }], [0, 0], 20);
    expect(q.get('b')).toBeCloseTo(1 / 40, 12);
  });
});

describe('componentEvidenceScore', () => {
  it('gives one line of support no evidence and grows with resolved lines', () => {
    expect(componentEvidenceScore({ uniqueness: 1, coverage: 1, resolvedLines: 1 })).toBe(0);
    expect(componentEvidenceScore({ uniqueness: 1, coverage: 1, resolvedLines: 2 })).toBe(0.5);
    expect(componentEvidenceScore({ uniqueness: 0.5, coverage: 0.8, resolvedLines: 4 })).toBeCloseTo(0.3, 12);
    expect(() => componentEvidenceScore({ uniqueness: 2, coverage: 1, resolvedLines: 2 })).toThrow('uniqueness must be between 0 and 1, got 2');
  });
});
