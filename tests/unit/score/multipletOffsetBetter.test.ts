import { describe, expect, it } from 'vitest';
import { multipletOffsetBetter } from '../../../matching/score/multipletOffsetBetter';

describe('multipletOffsetBetter', () => {
  it('prefers more line weight, then less misfit, then the smaller offset, and keeps the first on a full tie', () => {
    expect(multipletOffsetBetter(0.75, 0.01, 0.02, 0.5, 0, 0)).toBe(true);
    expect(multipletOffsetBetter(0.5, 0, 0, 0.75, 0.01, 0.02)).toBe(false);
    // Equal line sets summed in another order differ by rounding only: a tie, decided by misfit.
    expect(multipletOffsetBetter(0.1 + 0.2 + 0.3, 0.001, 0.01, 0.3 + 0.2 + 0.1, 0.002, 0)).toBe(true);
    expect(multipletOffsetBetter(0.6, 0.002, 0, 0.6, 0.001, 0.01)).toBe(false);
    expect(multipletOffsetBetter(0.6, 0.001, -0.004, 0.6, 0.001, 0.005)).toBe(true);
    expect(multipletOffsetBetter(0.6, 0.001, 0.005, 0.6, 0.001, -0.005)).toBe(false);
    // The search starts from bestCover −1: any proposal beats it.
    expect(multipletOffsetBetter(0, 0, 0.03, -1, Infinity, 0)).toBe(true);
  });
});
