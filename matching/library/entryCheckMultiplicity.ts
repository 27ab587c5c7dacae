import type { LibraryEntry } from '../../shared/libraryEntry';
import { multiplicityNeighbours } from '../../shared/multiplicity';
import { LibraryProblem } from './libraryProblem';

/**
 * 1H signals whose multiplicity disagrees with their coupling constants: one J per splitting
 * letter (shared multiplicityNeighbours), and no "dd"-style pair of equal J, which is a triplet
 * by the first-order rules (n equivalent neighbours give n+1 lines; common practice).
 * Works on entries that skipped the schema too (the server re-checks stored rows).
 */
export function entryCheckMultiplicity(entry: LibraryEntry): LibraryProblem[] {
  const problems: LibraryProblem[] = [];
  entry.signals.forEach((signal, i) => {
    if (signal.nucleus !== '1H') return;
    const j = signal.j ?? [];
    const push = (field: string, message: string) => problems.push({ entryId: entry.id, field: `signals[${i}].${field}`, check: 'multiplicity', message });
    let neighbours: number[] | null;
    try {
      neighbours = multiplicityNeighbours(signal.multiplicity);
    } catch (e) {
      push('multiplicity', (e as Error).message);
      return;
    }
    if (neighbours === null) return; // "m", "br": unresolved, any J list is informative only
    if (neighbours.length !== j.length) {
      push('j', `multiplicity "${signal.multiplicity}" needs ${neighbours.length} coupling constant(s), got ${j.length}`);
      return;
    }
    for (let k = 1; k < neighbours.length; k++) {
      if (neighbours[k] === 1 && neighbours[k - 1] === 1 && j[k] === j[k - 1]) {
        push('j', `multiplicity "${signal.multiplicity}" has two equal doublet couplings (${j[k]} Hz): that is a triplet ("t")`);
        return;
      }
    }
  });
  return problems;
}
