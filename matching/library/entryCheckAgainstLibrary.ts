import type { LibraryEntry } from '../../shared/libraryEntry';
import { LibraryEntrySchema } from '../../shared/libraryEntry';
import { entryCheckFormula } from './entryCheckFormula';
import { entryCheckMultiplicity } from './entryCheckMultiplicity';
import { entryCheckSchema } from './entryCheckSchema';
import { entryCheckShiftRange } from './entryCheckShiftRange';
import { libraryFindNearDuplicates, type NearDuplicateOptions } from './libraryFindNearDuplicates';
import { LibraryProblem } from './libraryProblem';

/**
 * The checks for one submitted entry against the current library, for the server to run on every
 * submission: its own checks, `nearDuplicateOf` targets that exist, and near duplicates among the
 * other entries (an entry with the same id is the one being revised and is left out). Only the
 * candidate's problems are returned, so the library's own state never blocks a submission.
 */
export function entryCheckAgainstLibrary(candidate: unknown, library: readonly LibraryEntry[], options: NearDuplicateOptions = {}): LibraryProblem[] {
  if (!Array.isArray(library)) throw new TypeError('entryCheckAgainstLibrary needs the library as an array of entries');
  const schemaProblems = entryCheckSchema(candidate);
  if (schemaProblems.length > 0) return schemaProblems;
  const entry = LibraryEntrySchema.parse(candidate);
  const problems = [...entryCheckFormula(entry), ...entryCheckShiftRange(entry), ...entryCheckMultiplicity(entry)];
  const others = library.filter((e) => e.id !== entry.id);
  const known = new Set(others.map((e) => e.id));
  (entry.nearDuplicateOf ?? []).forEach((other, i) => {
    if (!known.has(other)) problems.push({ entryId: entry.id, field: `nearDuplicateOf[${i}]`, check: 'nearDuplicate', message: `nearDuplicateOf names "${other}", which is not in the library` });
  });
  const sameSolvent = others.filter((e) => e.solvent === entry.solvent);
  for (const pair of libraryFindNearDuplicates([entry, ...sameSolvent], options)) {
    if (pair.a !== entry.id && pair.b !== entry.id) continue;
    const other = pair.a === entry.id ? pair.b : pair.a;
    problems.push({
      entryId: entry.id,
      field: 'nearDuplicateOf',
      check: 'nearDuplicate',
      message: `near duplicate of "${other}" in ${pair.solvent} (every 1H signal within ${pair.maxShiftDifference} ppm, same nuclei ratios); mark it with nearDuplicateOf or tell them apart`,
    });
  }
  return problems;
}
