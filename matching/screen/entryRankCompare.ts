import type { EntryScore } from '../score/entryScore';

/** Rank order: score, then explained share (both descending), then entry id. */
export function entryRankCompare(idA: string, a: EntryScore, idB: string, b: EntryScore): number {
  return b.score - a.score || b.explainedShare - a.explainedShare || (idA < idB ? -1 : idA > idB ? 1 : 0);
}
