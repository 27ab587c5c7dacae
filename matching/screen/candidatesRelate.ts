import type { AmbiguityGroup } from '../../shared/screening';

export interface RelatableCandidate {
  entryId: string;
  /** Matched mixture peak indices, ascending. */
  peaks: readonly number[];
  explainedShare: number;
}

export interface CandidateRelations {
  groups: AmbiguityGroup[];
  /** Group id per candidate (same order as the input), or null. */
  groupOf: Array<string | null>;
  /** For each candidate, ids of other candidates whose matched peaks include all of its own. */
  shadowedBy: string[][];
}

/**
 * Ambiguity among ranked candidates. Candidates that explain exactly the same mixture peaks and
 * the same share of their nuclei (±0.01) cannot be told apart by this peak list: they form one
 * group (ids G1, G2, … in rank order of their best member). A candidate is possibly shadowed when
 * its signals may just be other compounds' multiplets: every peak it matched is matched by one
 * other candidate outside its group (any rank), or jointly by candidates ranked above it (input
 * order is rank order). shadowedBy names those candidates.
 */
export function candidatesRelate(candidates: readonly RelatableCandidate[]): CandidateRelations {
  const groupOf: Array<string | null> = candidates.map(() => null);
  const groups: AmbiguityGroup[] = [];
  const byKey = new Map<string, number[]>();
  candidates.forEach((c, i) => {
    if (c.peaks.length === 0) return;
    const key = `${c.peaks.join(',')}|${Math.round(c.explainedShare * 100)}`;
    const list = byKey.get(key);
    if (list) list.push(i);
    else byKey.set(key, [i]);
  });
  for (const members of byKey.values()) {
    if (members.length < 2) continue;
    const id = `G${groups.length + 1}`;
    groups.push({ id, members: members.map((i) => candidates[i].entryId), peakIndices: [...candidates[members[0]].peaks] });
    for (const i of members) groupOf[i] = id;
  }
  // Map iteration follows first insertion, i.e. rank order of each group's best member.
  const byPeak = new Map<number, number[]>();
  candidates.forEach((c, i) => {
    for (const p of c.peaks) {
      const list = byPeak.get(p);
      if (list) list.push(i);
      else byPeak.set(p, [i]);
    }
  });
  const outside = (i: number, j: number) => j !== i && (groupOf[i] === null || groupOf[i] !== groupOf[j]);
  const shadowedBy = candidates.map((c, i) => {
    if (c.peaks.length === 0) return [];
    // One candidate holding every peak of this one.
    let common: number[] = (byPeak.get(c.peaks[0]) ?? []).filter((j) => outside(i, j));
    for (const p of c.peaks.slice(1)) {
      if (common.length === 0) break;
      const here = new Set(byPeak.get(p) ?? []);
      common = common.filter((j) => here.has(j));
    }
    if (common.length > 0) return common.map((j) => candidates[j].entryId);
    // Several better-ranked candidates holding them together.
    const above = new Set<number>();
    for (const p of c.peaks) {
      const holders = (byPeak.get(p) ?? []).filter((j) => j < i && outside(i, j));
      if (holders.length === 0) return [];
      for (const j of holders) above.add(j);
    }
    return [...above].sort((a, b) => a - b).map((j) => candidates[j].entryId);
  });
  return { groups, groupOf, shadowedBy };
}
