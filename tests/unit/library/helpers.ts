import type { LibraryEntry } from '../../../shared/libraryEntry';

/** A sound entry to break one field at a time: ethanol in CDCl3 with the Gottlieb 1997 Table 1 shifts. */
export function ethanolEntry(over: Partial<LibraryEntry> = {}): LibraryEntry {
  return {
    id: 'test:ethanol',
    name: 'ethanol',
    synonyms: [],
    formula: 'C2H6O',
    smiles: 'CCO',
    category: 'user',
    source: 'H. E. Gottlieb, V. Kotlyar, A. Nudelman, J. Org. Chem. 1997, 62, 7512, Table 1',
    solvent: 'CDCl3',
    mhz: 300,
    signals: [
      { nucleus: '1H', shift: 1.25, multiplicity: 't', j: [7], nuclei: 3, label: 'CH3' },
      { nucleus: '1H', shift: 3.72, multiplicity: 'q', j: [7], nuclei: 2, label: 'CH2' },
      { nucleus: '1H', shift: 1.32, multiplicity: 's', j: [], nuclei: 1, label: 'OH', exchangeable: true },
    ],
    ...over,
  };
}

/**
 * openchemlib's first SMILES parse initialises the library and takes seconds on a loaded machine;
 * doing it in beforeAll (with its own generous timeout) keeps that out of the tests' own time.
 */
export const OPENCHEMLIB_WARM_UP_MS = 60000;
