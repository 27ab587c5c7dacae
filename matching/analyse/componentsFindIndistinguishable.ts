import type { FitComponent } from '../../shared/analysis';

/** Resolved lines of its own a compound needs to be told apart (one line fits any look-alike). */
export const MIN_DISTINCT_LINES = 2;

export interface RelatedSet {
  /** Fitted entry ids, largest amount per nucleus first. */
  members: string[];
  /** True when every member shows at least MIN_DISTINCT_LINES resolved lines no other fitted compound shares. */
  identifiable: boolean;
  /** Members below MIN_DISTINCT_LINES, in member order. */
  lacking: string[];
}

type Row = Pick<FitComponent, 'entryId' | 'amountPerNucleus' | 'resolvedLines' | 'distinctLines'>;

/**
 * Sets of fitted compounds that are said to be alike (each list in `related`: library near
 * duplicates, a screening ambiguity group; lists sharing a member are joined) and whether this
 * data tells them apart. Only fitted members count; a set needs two. Told apart means every member
 * has at least two resolved lines that no other fitted candidate's line comes within a linewidth
 * of (FitComponent.distinctLines): otherwise how the fit splits intensity between them rests on
 * shared signals, and only their sum is measured. A bare fit without distinctLines falls back to
 * resolvedLines.
 */
export function componentsFindIndistinguishable(components: readonly Row[], related: readonly (readonly string[])[]): RelatedSet[] {
  const byId = new Map(components.map((c) => [c.entryId, c]));
  const parent = new Map<string, string>();
  const root = (id: string): string => {
    let r = id;
    while (parent.get(r) !== r) r = parent.get(r)!;
    parent.set(id, r);
    return r;
  };
  for (const list of related) {
    const fitted = [...new Set(list)].filter((id) => byId.has(id));
    for (const id of fitted) if (!parent.has(id)) parent.set(id, id);
    for (let k = 1; k < fitted.length; k++) {
      const a = root(fitted[0]);
      const b = root(fitted[k]);
      if (a !== b) parent.set(b, a);
    }
  }
  const sets = new Map<string, string[]>();
  for (const id of parent.keys()) {
    const r = root(id);
    sets.set(r, [...(sets.get(r) ?? []), id]);
  }
  const out: RelatedSet[] = [];
  for (const ids of sets.values()) {
    if (ids.length < 2) continue;
    const members = ids.sort((a, b) => byId.get(b)!.amountPerNucleus - byId.get(a)!.amountPerNucleus || a.localeCompare(b));
    const lacking = members.filter((id) => {
      const c = byId.get(id)!;
      return (c.distinctLines ?? c.resolvedLines) < MIN_DISTINCT_LINES;
    });
    out.push({ members, identifiable: lacking.length === 0, lacking });
  }
  return out.sort((p, q) => byId.get(q.members[0])!.amountPerNucleus - byId.get(p.members[0])!.amountPerNucleus);
}
