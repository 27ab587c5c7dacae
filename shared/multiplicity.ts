import { z } from 'zod';

/**
 * First-order multiplicity grammar. A multiplicity is "s", "m", "br s", "br" or a run of
 * splitting letters, one per coupling constant: d (1 neighbour), t (2), q (3), and the long names
 * quint (4), sext (5), sept (6). Examples: "dd", "dt", "td", "ddd", "qd", "tt".
 * Each splitting letter needs exactly one coupling constant, in the same order.
 */
const SPLITTING_NEIGHBOURS: Record<string, number> = { d: 1, t: 2, q: 3, quint: 4, sext: 5, sept: 6 };

export const MULTIPLICITY_EXAMPLES = ['s', 'd', 't', 'q', 'quint', 'sext', 'sept', 'dd', 'dt', 'td', 'ddd', 'dq', 'qd', 'tt', 'm', 'br s'] as const;

/**
 * Number of equivalent neighbours for each splitting of a multiplicity, in order
 * ("dt" → [1, 2]); [] for a singlet; null for "m"/"br" (unresolved: no first-order pattern).
 * Throws RangeError for an unknown token.
 */
export function multiplicityNeighbours(multiplicity: string): number[] | null {
  const m = multiplicity.trim().toLowerCase();
  if (m === 's' || m === 'br s' || m === 'bs' || m === 'br. s') return [];
  if (m === 'm' || m === 'br' || m === 'br m') return null;
  const body = m.startsWith('br ') ? m.slice(3) : m;
  const out: number[] = [];
  let rest = body;
  while (rest.length > 0) {
    const long = ['quint', 'sext', 'sept'].find((t) => rest.startsWith(t));
    const token = long ?? rest[0];
    const n = SPLITTING_NEIGHBOURS[token];
    if (n === undefined) throw new RangeError(`unknown multiplicity "${multiplicity}" (use s, d, t, q, quint, sext, sept, combinations like dd or dt, m, br s)`);
    out.push(n);
    rest = rest.slice(token.length);
  }
  return out;
}

export const MultiplicitySchema = z.string().trim().min(1).superRefine((value, ctx) => {
  try {
    multiplicityNeighbours(value);
  } catch (e) {
    ctx.addIssue({ code: 'custom', message: (e as Error).message });
  }
});
