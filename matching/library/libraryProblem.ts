/** Which soundness check found a problem. */
export type LibraryCheckName = 'schema' | 'id' | 'formula' | 'shiftRange' | 'multiplicity' | 'nearDuplicate';

/** One problem with one library entry: which entry, which field (a path such as `signals[2].j`), what is wrong. */
export interface LibraryProblem {
  entryId: string;
  field: string;
  check: LibraryCheckName;
  message: string;
}

/** Id to show for a raw, possibly invalid entry. */
export const UNKNOWN_ENTRY_ID = '(no id)';
