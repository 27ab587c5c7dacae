import type { LibraryEntry, Signal1H } from '../../shared/libraryEntry';
import { DEFAULT_TOLERANCE_PPM } from '../../shared/nucleus';

export interface NearDuplicateOptions {
  /** Largest shift difference, ppm, at which two signals count as the same. Default: DEFAULT_TOLERANCE_PPM['1H'] (0.03). */
  tolerancePpm?: number;
  /** Also report pairs that mark each other in `nearDuplicateOf`. Default false. */
  includeMarked?: boolean;
}

export interface NearDuplicatePair {
  a: string;
  b: string;
  solvent: LibraryEntry['solvent'];
  /** Largest shift difference over the paired signals, ppm. */
  maxShiftDifference: number;
  /** true when either entry names the other in nearDuplicateOf. */
  marked: boolean;
}

/** The signals a screen would see: non-exchangeable 1H, or every 1H signal for species that have only exchangeable ones (water). */
function pattern(entry: LibraryEntry): Signal1H[] {
  const protons = entry.signals.filter((s): s is Signal1H => s.nucleus === '1H');
  const fixed = protons.filter((s) => !s.exchangeable);
  return (fixed.length > 0 ? fixed : protons).slice().sort((x, y) => x.shift - y.shift);
}

/**
 * Pairs of current entries in one solvent that a 1H screen could not tell apart: the same number
 * of signals, paired in shift order within the tolerance, with proportional nuclei counts (a 3H
 * and a 6H singlet at one shift differ only in concentration). Multiplicity is ignored on purpose:
 * at bench-top fields or with broad lines a doublet and a singlet can look alike.
 * Sorted by solvent, then ids.
 */
export function libraryFindNearDuplicates(entries: readonly LibraryEntry[], options: NearDuplicateOptions = {}): NearDuplicatePair[] {
  const { tolerancePpm = DEFAULT_TOLERANCE_PPM['1H'], includeMarked = false } = options;
  if (!Number.isFinite(tolerancePpm) || tolerancePpm < 0) throw new RangeError(`tolerancePpm must be a finite number ≥ 0, got ${tolerancePpm}`);
  const bySolvent = new Map<string, { entry: LibraryEntry; signals: Signal1H[]; total: number }[]>();
  for (const entry of entries) {
    if (entry.retired) continue;
    const signals = pattern(entry);
    if (signals.length === 0) continue;
    const list = bySolvent.get(entry.solvent) ?? [];
    list.push({ entry, signals, total: signals.reduce((s, x) => s + x.nuclei, 0) });
    bySolvent.set(entry.solvent, list);
  }
  const pairs: NearDuplicatePair[] = [];
  for (const [solvent, list] of bySolvent) {
    for (let p = 0; p < list.length; p++) {
      for (let q = p + 1; q < list.length; q++) {
        const A = list[p];
        const B = list[q];
        if (A.signals.length !== B.signals.length || A.entry.id === B.entry.id) continue;
        let worst = 0;
        let same = true;
        for (let k = 0; k < A.signals.length && same; k++) {
          const d = Math.abs(A.signals[k].shift - B.signals[k].shift);
          worst = Math.max(worst, d);
          same = d <= tolerancePpm + 1e-9 && A.signals[k].nuclei * B.total === B.signals[k].nuclei * A.total;
        }
        if (!same) continue;
        const marked = (A.entry.nearDuplicateOf ?? []).includes(B.entry.id) || (B.entry.nearDuplicateOf ?? []).includes(A.entry.id);
        if (marked && !includeMarked) continue;
        const [a, b] = A.entry.id < B.entry.id ? [A.entry.id, B.entry.id] : [B.entry.id, A.entry.id];
        pairs.push({ a, b, solvent: solvent as LibraryEntry['solvent'], maxShiftDifference: Math.round(worst * 1e6) / 1e6, marked });
      }
    }
  }
  return pairs.sort((x, y) => x.solvent.localeCompare(y.solvent) || x.a.localeCompare(y.a) || x.b.localeCompare(y.b));
}
