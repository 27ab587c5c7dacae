import type { LibraryEntry } from '../../shared/libraryEntry';
import { USUAL_SHIFT_RANGE_PPM } from '../../shared/nucleus';
import { LibraryProblem } from './libraryProblem';

/** Signals whose shift lies outside the nucleus's usual range (shared USUAL_SHIFT_RANGE_PPM). */
export function entryCheckShiftRange(entry: LibraryEntry): LibraryProblem[] {
  const problems: LibraryProblem[] = [];
  entry.signals.forEach((signal, i) => {
    const [low, high] = USUAL_SHIFT_RANGE_PPM[signal.nucleus];
    if (signal.shift < low || signal.shift > high) {
      problems.push({
        entryId: entry.id,
        field: `signals[${i}].shift`,
        check: 'shiftRange',
        message: `${signal.nucleus} shift ${signal.shift} ppm is outside the usual range ${low} to ${high} ppm`,
      });
    }
  });
  return problems;
}
