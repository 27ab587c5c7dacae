import type { LibraryEntry, Signal } from '../../shared/libraryEntry';
import { multiplicityNeighbours } from '../../shared/multiplicity';

/** Half the spread of a first-order pattern, ppm: Σ n_i·J_i/2 over its splittings. */
function halfSpread(signal: Signal, mhz: number): number {
  if (signal.nucleus !== '1H') return 0;
  const n = multiplicityNeighbours(signal.multiplicity) ?? [];
  return n.reduce((s, k, i) => s + (k * (signal.j[i] ?? 0)) / 2, 0) / mhz;
}

/**
 * A decoy of an entry: every signal keeps its multiplicity, couplings and nuclei but moves to an
 * independent uniform random position inside `range` (ppm), so the decoy has the entry's pattern
 * complexity and none of its chemistry (target–decoy strategy, Elias & Gygi, Nat. Methods 2007,
 * adapted from peptide sequences to shift patterns). The id is "decoy.<set>.<entry id>".
 */
export function entryToDecoy(entry: LibraryEntry, random: () => number, range: [number, number], set: number, mhz: number): LibraryEntry {
  const [lo, hi] = range;
  if (!(Number.isFinite(lo) && Number.isFinite(hi) && hi > lo)) throw new RangeError(`decoy range must be two finite shifts, low < high, got [${lo}, ${hi}]`);
  const signals = entry.signals.map((s) => {
    const half = Math.min(halfSpread(s, mhz), (hi - lo) / 2);
    const shift = lo + half + random() * (hi - lo - 2 * half);
    return { ...s, shift };
  });
  const { nearDuplicateOf: _near, smiles: _smiles, ...rest } = entry;
  return { ...rest, id: `decoy.${set}.${entry.id}`.slice(0, 80), name: `decoy of ${entry.name}`, signals };
}
