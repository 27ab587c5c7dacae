import type { LibraryEntry } from '../../shared/libraryEntry';
import type { Solvent } from '../../shared/solvent';
import { formulaParse } from './formulaParse';
import { LibraryProblem } from './libraryProblem';
import { smilesCountAtoms, SmilesAtomCounts } from './smilesCountAtoms';

/** Protic deuterated solvents: OH/NH/SH of the solute become OD/ND/SD and drop out of the 1H spectrum. */
export const EXCHANGING_SOLVENTS: readonly Solvent[] = ['D2O', 'CD3OD'];

const HYDROGENS_PER_CARBON_TYPE = { C: 0, CH: 1, CH2: 2, CH3: 3 } as const;

function sameCounts(a: Record<string, number>, b: Record<string, number>): boolean {
  const keys = new Set([...Object.keys(a), ...Object.keys(b)]);
  for (const k of keys) if ((a[k] ?? 0) !== (b[k] ?? 0)) return false;
  return true;
}

/**
 * Nuclei counts against the molecular formula. With a SMILES (read by openchemlib) the formula
 * must match it and the 1H signals not marked exchangeable must hold exactly the hydrogens not
 * on N/O/S; exchangeable signals may be missing (broad, or exchanged away) but never exceed the
 * exchangeable hydrogens, and in D2O/CD3OD they are not seen at all (except for water itself).
 * Without a SMILES only bounds can be checked: at most every H, at least those that cannot sit on N/O/S.
 * 13C nuclei may not exceed the carbons, nor carbon types the hydrogens.
 */
export function entryCheckFormula(entry: LibraryEntry): LibraryProblem[] {
  const problems: LibraryProblem[] = [];
  const push = (field: string, message: string) => problems.push({ entryId: entry.id, field, check: 'formula', message });
  let elements: Record<string, number>;
  try {
    elements = formulaParse(entry.formula);
  } catch (e) {
    push('formula', (e as Error).message);
    return problems;
  }
  let fromSmiles: SmilesAtomCounts | null = null;
  if (entry.smiles !== undefined) {
    try {
      fromSmiles = smilesCountAtoms(entry.smiles);
    } catch (e) {
      push('smiles', (e as Error).message);
      return problems;
    }
    if (!sameCounts(elements, fromSmiles.elements)) {
      push('formula', `formula ${entry.formula} does not match the smiles (openchemlib gives ${fromSmiles.formula})`);
      return problems;
    }
  }

  const h = elements.H ?? 0;
  const protons = entry.signals.flatMap((s, i) => (s.nucleus === '1H' ? [{ s, i }] : []));
  const fixed = protons.filter(({ s }) => !s.exchangeable).reduce((sum, { s }) => sum + s.nuclei, 0);
  const flagged = protons.filter(({ s }) => s.exchangeable).reduce((sum, { s }) => sum + s.nuclei, 0);
  const exchanging = EXCHANGING_SOLVENTS.includes(entry.solvent);

  if (fixed + flagged > h) {
    push('signals', `1H signals hold ${fixed + flagged} nuclei but formula ${entry.formula} has only ${h} H`);
  } else if (fromSmiles) {
    const ex = fromSmiles.exchangeable;
    if (fixed !== h - ex) {
      push('signals', `1H signals not marked exchangeable hold ${fixed} nuclei; formula ${entry.formula} has ${h} H, ${ex} of them on N/O/S (exchangeable, from the smiles), so ${h - ex} are expected`);
    } else if (flagged > ex) {
      push('signals', `1H signals marked exchangeable hold ${flagged} nuclei but the smiles has only ${ex} H on N/O/S`);
    } else if (exchanging && flagged > 0 && h - ex > 0) {
      const first = protons.find(({ s }) => s.exchangeable)!;
      push(`signals[${first.i}].exchangeable`, `exchangeable 1H exchange with ${entry.solvent} and give no signal of their own; remove the signal`);
    }
  } else {
    const maxExchangeable = Math.min(h, (elements.O ?? 0) + (elements.S ?? 0) + 3 * (elements.N ?? 0));
    if (fixed < h - maxExchangeable) {
      push('signals', `1H signals not marked exchangeable hold ${fixed} nuclei; formula ${entry.formula} has ${h} H and at most ${maxExchangeable} can be on N/O/S, so at least ${h - maxExchangeable} are expected`);
    }
  }

  const carbons = entry.signals.flatMap((s, i) => (s.nucleus === '13C' ? [{ s, i }] : []));
  if (carbons.length > 0) {
    const c = elements.C ?? 0;
    const total = carbons.reduce((sum, { s }) => sum + s.nuclei, 0);
    if (total > c) push('signals', `13C signals hold ${total} nuclei but formula ${entry.formula} has only ${c} C`);
    const typedH = carbons.reduce((sum, { s }) => sum + (s.carbonType ? HYDROGENS_PER_CARBON_TYPE[s.carbonType] * s.nuclei : 0), 0);
    if (typedH > h + (elements.D ?? 0)) push('signals', `13C carbon types carry ${typedH} H but formula ${entry.formula} has only ${h + (elements.D ?? 0)} H`);
  }
  return problems;
}
