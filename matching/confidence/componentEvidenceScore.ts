import type { FitComponent } from '../../shared/analysis';

/**
 * Evidence score of a fitted compound, 0–1: uniqueness × coverage × (1 − 1/resolved lines).
 * Uniqueness drops when other candidates' multiplets can take over its intensity, coverage when
 * its signals are missing, and the last factor is 0 for support by one line (one singlet can be
 * explained by any unrelated peak), ½ for two, ¾ for four. This is the score that target and
 * decoy compounds compete on.
 */
export function componentEvidenceScore(component: Pick<FitComponent, 'uniqueness' | 'coverage' | 'resolvedLines'>): number {
  const { uniqueness, coverage, resolvedLines } = component;
  for (const [k, v] of Object.entries({ uniqueness, coverage })) {
    if (!(v >= 0 && v <= 1)) throw new RangeError(`${k} must be between 0 and 1, got ${v}`);
  }
  if (!(resolvedLines >= 0) || !Number.isFinite(resolvedLines)) throw new RangeError(`resolvedLines must be a non-negative number, got ${resolvedLines}`);
  if (resolvedLines <= 1) return 0;
  return uniqueness * coverage * (1 - 1 / resolvedLines);
}
