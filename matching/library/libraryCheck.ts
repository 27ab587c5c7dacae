import type { LibraryEntry } from '../../shared/libraryEntry';
import { LibraryEntrySchema } from '../../shared/libraryEntry';
import { entryCheckFormula } from './entryCheckFormula';
import { entryCheckMultiplicity } from './entryCheckMultiplicity';
import { entryCheckSchema } from './entryCheckSchema';
import { entryCheckShiftRange } from './entryCheckShiftRange';
import { libraryFindNearDuplicates, NearDuplicateOptions } from './libraryFindNearDuplicates';
import { LibraryProblem } from './libraryProblem';

export type LibraryCheckOptions = NearDuplicateOptions;

/**
 * Every soundness check over a set of raw entries: schema, then (for entries that parse) formula,
 * shift range and multiplicity, then across entries unique ids, known `nearDuplicateOf` targets and
 * unmarked near duplicates. Returns the problems in entry order; an empty list means sound.
 */
export function libraryCheck(rawEntries: readonly unknown[], options: LibraryCheckOptions = {}): LibraryProblem[] {
  if (!Array.isArray(rawEntries)) throw new TypeError('libraryCheck needs an array of entries');
  const problems: LibraryProblem[] = [];
  const parsed: LibraryEntry[] = [];
  for (const raw of rawEntries) {
    const schemaProblems = entryCheckSchema(raw);
    if (schemaProblems.length > 0) {
      problems.push(...schemaProblems);
      continue;
    }
    const entry = LibraryEntrySchema.parse(raw);
    parsed.push(entry);
    problems.push(...entryCheckFormula(entry), ...entryCheckShiftRange(entry), ...entryCheckMultiplicity(entry));
  }

  const seen = new Map<string, number>();
  for (const e of parsed) seen.set(e.id, (seen.get(e.id) ?? 0) + 1);
  for (const [id, n] of seen) if (n > 1) problems.push({ entryId: id, field: 'id', check: 'id', message: `id "${id}" is used by ${n} entries` });
  for (const e of parsed) {
    (e.nearDuplicateOf ?? []).forEach((other, i) => {
      if (!seen.has(other)) problems.push({ entryId: e.id, field: `nearDuplicateOf[${i}]`, check: 'nearDuplicate', message: `nearDuplicateOf names "${other}", which is not in the library` });
    });
  }
  for (const pair of libraryFindNearDuplicates(parsed, options)) {
    problems.push({
      entryId: pair.b,
      field: 'nearDuplicateOf',
      check: 'nearDuplicate',
      message: `near duplicate of "${pair.a}" in ${pair.solvent} (every 1H signal within ${pair.maxShiftDifference} ppm, same nuclei ratios); mark it with nearDuplicateOf or tell them apart`,
    });
  }
  return problems;
}
