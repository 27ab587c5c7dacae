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
 * group (ids G1, G2, … in rank order of their best member). A candidate whose matched peaks are
 * all matched by another candidate outside its group is possibly shadowed by it: its signals may
 * just be the other compound's multiplets.
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
  const shadowedBy = candidates.map((c, i) => {
    if (c.peaks.length === 0) return [];
    let common: number[] = byPeak.get(c.peaks[0]) ?? [];
    for (const p of c.peaks.slice(1)) {
      const here = new Set(byPeak.get(p) ?? []);
      common = common.filter((j) => here.has(j));
      if (common.length <= 1) break;
    }
    const out: string[] = [];
    for (const j of common) {
      if (j === i || (groupOf[i] !== null && groupOf[i] === groupOf[j])) continue;
      out.push(candidates[j].entryId);
    }
    return out;
  });
  return { groups, groupOf, shadowedBy };
}
