import type { LibraryEntry } from '../../shared/libraryEntry';
import { entryToDecoy } from './entryToDecoy';
import { randomSeeded } from './randomSeeded';

export interface DecoyOptions {
  /** Number of decoy copies of the library (default 20). */
  sets?: number;
  /** Seed of the generator (default 1). */
  seed?: number;
  /** Spectral range the signals are scattered over, ppm. */
  range: [number, number];
  /** 1H spectrometer frequency, MHz (couplings are in Hz). */
  mhz: number;
}

/** `sets` decoy libraries, each one decoy per entry, from one seeded generator. */
export function libraryToDecoys(entries: LibraryEntry[], options: DecoyOptions): LibraryEntry[][] {
  const { sets = 20, seed = 1, range, mhz } = options;
  if (!Number.isInteger(sets) || sets < 1) throw new RangeError(`decoy sets must be a positive integer, got ${sets}`);
  const random = randomSeeded(seed);
  return Array.from({ length: sets }, (_, s) => entries.map((e) => entryToDecoy(e, random, range, s + 1, mhz)));
}
