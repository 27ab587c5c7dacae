import type { AmbiguityGroup } from '../../shared/screening';

/** At most this many names in one shadowedBy list (best-ranked first): dense mixtures have many. */
const MAX_SHADOWERS = 10;

export interface RelatableCandidate {
  entryId: string;
  /** Matched mixture peak indices, ascending. */
  peaks: readonly number[];
  explainedShare: number;
  /** Entry ids the library marks as knowingly close to this one (LibraryEntry.nearDuplicateOf). */
  nearDuplicateOf?: readonly string[];
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
 * the same share of their nuclei (±0.01) cannot be told apart by this peak list, nor can entries
 * marked nearDuplicateOf each other that share at least half of the smaller one's peaks: they form
 * one group (ids G1, G2, … in rank order of their best member; peakIndices = the peaks all share). A candidate is possibly shadowed when
 * its signals may just be other compounds' multiplets: every peak it matched is matched by one
 * other candidate outside its group (any rank; up to 10 named, best-ranked first), or jointly by
 * candidates ranked above it (input order is rank order; for each peak its best-ranked holder is
 * named).
 */
export function candidatesRelate(candidates: readonly RelatableCandidate[]): CandidateRelations {
  const groupOf: Array<string | null> = candidates.map(() => null);
  const groups: AmbiguityGroup[] = [];
  // Union–find over candidates: same peaks and share, or marked near duplicates on shared peaks.
  const parent = candidates.map((_, i) => i);
  const root = (i: number): number => (parent[i] === i ? i : (parent[i] = root(parent[i])));
  const join = (i: number, j: number) => {
    const a = root(i);
    const b = root(j);
    if (a !== b) parent[Math.max(a, b)] = Math.min(a, b);
  };
  const byKey = new Map<string, number>();
  candidates.forEach((c, i) => {
    if (c.peaks.length === 0) return;
    const key = `${c.peaks.join(',')}|${Math.round(c.explainedShare * 100)}`;
    const first = byKey.get(key);
    if (first === undefined) byKey.set(key, i);
    else join(first, i);
  });
  // Curators mark knowingly close entries (diastereomers, say) with nearDuplicateOf: when both are
  // reported on mostly the same peaks (at least half of the smaller set), the data cannot decide
  // between them, so they are one group rather than one shadowing the other. Cost: the marked
  // pairs among the reported candidates only.
  const position = new Map(candidates.map((c, i) => [c.entryId, i]));
  candidates.forEach((c, i) => {
    for (const other of c.nearDuplicateOf ?? []) {
      const j = position.get(other);
      if (j === undefined || j === i || c.peaks.length === 0 || candidates[j].peaks.length === 0) continue;
      const mine = new Set(c.peaks);
      let shared = 0;
      for (const p of candidates[j].peaks) if (mine.has(p)) shared++;
      if (shared >= 0.5 * Math.min(c.peaks.length, candidates[j].peaks.length)) join(i, j);
    }
  });
  const membersOf = new Map<number, number[]>();
  candidates.forEach((_, i) => {
    const r = root(i);
    const list = membersOf.get(r);
    if (list) list.push(i);
    else membersOf.set(r, [i]);
  });
  // Roots are the best-ranked members and Map iteration follows first insertion: ids in rank order.
  for (const members of membersOf.values()) {
    if (members.length < 2) continue;
    const id = `G${groups.length + 1}`;
    const common = members.slice(1).reduce((acc, i) => acc.filter((p) => candidates[i].peaks.includes(p)), [...candidates[members[0]].peaks]);
    groups.push({ id, members: members.map((i) => candidates[i].entryId), peakIndices: common });
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
  const peakSets = candidates.map((c) => new Set(c.peaks));
  const shadowedBy = candidates.map((c, i) => {
    if (c.peaks.length === 0) return [];
    // One candidate holding every peak of this one: look among the holders of its rarest peak.
    let rarest = byPeak.get(c.peaks[0]) ?? [];
    for (const p of c.peaks) {
      const h = byPeak.get(p) ?? [];
      if (h.length < rarest.length) rarest = h;
    }
    const whole: number[] = [];
    for (const j of rarest) {
      if (!outside(i, j)) continue;
      if (c.peaks.every((p) => peakSets[j].has(p))) whole.push(j);
      if (whole.length >= MAX_SHADOWERS) break;
    }
    if (whole.length > 0) return whole.map((j) => candidates[j].entryId);
    // Else several better-ranked candidates together: for each peak its best-ranked other holder.
    const cover = new Set<number>();
    for (const p of c.peaks) {
      const holder = (byPeak.get(p) ?? []).find((j) => j < i && outside(i, j));
      if (holder === undefined) return [];
      cover.add(holder);
    }
    return [...cover].sort((a, b) => a - b).map((j) => candidates[j].entryId);
  });
  return { groups, groupOf, shadowedBy };
}
