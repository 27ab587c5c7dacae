import type { LibraryEntry } from '../../shared/libraryEntry';
import type { Nucleus } from '../../shared/nucleus';
import { multipletToLines, type SimLine } from './multipletToLines';

/** A simulated line tagged with the index of the entry signal it came from. */
export interface EntryLine extends SimLine {
  signal: number;
}

/**
 * All simulated lines of an entry in one nucleus at spectrometer 1H frequency `mhz`: 1H signals
 * through first-order splitting, 13C signals (proton-decoupled) as one line of area = carbons.
 */
export function entryToLines(entry: LibraryEntry, nucleus: Nucleus, mhz: number): EntryLine[] {
  if (!Number.isFinite(mhz) || mhz <= 0) throw new RangeError(`mhz must be a positive number, got ${mhz}`);
  const out: EntryLine[] = [];
  entry.signals.forEach((s, i) => {
    if (s.nucleus !== nucleus) return;
    if (s.nucleus === '1H') {
      for (const line of multipletToLines(s, mhz)) out.push({ ...line, signal: i });
    } else {
      out.push({ shift: s.shift, area: s.nuclei ?? 1, signal: i });
    }
  });
  return out;
}
