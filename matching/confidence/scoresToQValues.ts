export interface ScoredTarget {
  id: string;
  score: number;
}

/**
 * Target–decoy q-values (Elias & Gygi, Nat. Methods 2007; q-value as the smallest FDR at which a
 * hit is accepted, Käll et al., J. Proteome Res. 2008). `decoyScores` come from `decoySets`
 * separate decoy libraries of the same size as the target library, so at threshold s
 * FDR(s) = ((d(s) + 1)/decoySets) / t(s), with d, t the decoys and targets scoring ≥ s; the +1
 * keeps small sets from reporting zero (a correction of the Levitsky et al., J. Proteome Res.
 * 2017 kind; form from memory). q(s) = min FDR(s') over s' ≤ s, capped at 1.
 */
export function scoresToQValues(targets: ScoredTarget[], decoyScores: number[], decoySets: number): Map<string, number> {
  if (!Number.isInteger(decoySets) || decoySets < 1) throw new RangeError(`decoySets must be a positive integer, got ${decoySets}`);
  for (const t of targets) if (!(t.score >= 0) || !Number.isFinite(t.score)) throw new RangeError(`target "${t.id}" has an invalid score ${t.score}`);
  for (const d of decoyScores) if (!(d >= 0) || !Number.isFinite(d)) throw new RangeError(`decoy score ${d} is invalid`);
  const ts = targets.map((t) => t.score).sort((a, b) => b - a);
  const ds = [...decoyScores].sort((a, b) => b - a);
  const atLeast = (sorted: number[], s: number) => {
    let lo = 0;
    let hi = sorted.length;
    while (lo < hi) {
      const mid = (lo + hi) >> 1;
      if (sorted[mid] >= s) lo = mid + 1;
      else hi = mid;
    }
    return lo;
  };
  // FDR at each distinct target score, then the running minimum from the lowest score upwards.
  const thresholds = [...new Set(ts)].sort((a, b) => a - b);
  const fdr = thresholds.map((s) => Math.min(1, (atLeast(ds, s) + 1) / decoySets / atLeast(ts, s)));
  const q = new Map<number, number>();
  let running = 1;
  thresholds.forEach((s, i) => {
    running = Math.min(running, fdr[i]);
    q.set(s, running);
  });
  // q(s) is the minimum over thresholds s' ≤ s: the running minimum from low scores up.
  return new Map(targets.map((t) => [t.id, q.get(t.score)!]));
}
