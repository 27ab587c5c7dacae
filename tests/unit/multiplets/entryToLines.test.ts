import { describe, expect, it } from 'vitest';
import type { LibraryEntry } from '../../../shared/libraryEntry';
import { entryToLines } from '../../../matching/multiplets/entryToLines';

// Ethanol in CDCl3: CH3 t 1.25 (3H, J 7), CH2 q 3.72 (2H) — Gottlieb 1997 Table 1; 13C shifts invented for the check.
const entry: LibraryEntry = {
  id: 'ethanol', name: 'ethanol', synonyms: [], formula: 'C2H6O', category: 'contaminant', source: 'Gottlieb 1997', solvent: 'CDCl3', mhz: 300,
  signals: [
    { nucleus: '1H', shift: 1.25, multiplicity: 't', j: [7], nuclei: 3 },
    { nucleus: '1H', shift: 3.72, multiplicity: 'q', j: [7], nuclei: 2 },
    { nucleus: '13C', shift: 18.4, nuclei: 1 },
    { nucleus: '13C', shift: 58.3, nuclei: 1 },
  ],
};

describe('entryToLines', () => {
  it('rejects a bad frequency', () => {
    expect(() => entryToLines(entry, '1H', -1)).toThrow('mhz must be a positive number, got -1');
  });
  it('gives 1H lines whose areas sum to the nuclei, tagged with their signal', () => {
    const lines = entryToLines(entry, '1H', 600);
    expect(lines.length).toBe(7);
    expect(lines.reduce((s, l) => s + l.area, 0)).toBeCloseTo(5, 12);
    expect(lines.filter((l) => l.signal === 1).length).toBe(4);
  });
  it('gives each 13C signal one line of area = carbons', () => {
    expect(entryToLines(entry, '13C', 600)).toEqual([
      { shift: 18.4, area: 1, signal: 2 },
      { shift: 58.3, area: 1, signal: 3 },
    ]);
  });
});
