import { LibraryEntrySchema } from '../../shared/libraryEntry';
import { LibraryProblem, UNKNOWN_ENTRY_ID } from './libraryProblem';

function pathText(path: readonly PropertyKey[]): string {
  let out = '';
  for (const part of path) out += typeof part === 'number' ? `[${part}]` : `${out === '' ? '' : '.'}${String(part)}`;
  return out === '' ? '(entry)' : out;
}

/** Problems the shared LibraryEntrySchema finds in one raw entry (empty when it parses). */
export function entryCheckSchema(raw: unknown): LibraryProblem[] {
  const parsed = LibraryEntrySchema.safeParse(raw);
  if (parsed.success) return [];
  const id = raw !== null && typeof raw === 'object' && typeof (raw as { id?: unknown }).id === 'string' && (raw as { id: string }).id.trim() !== ''
    ? (raw as { id: string }).id
    : UNKNOWN_ENTRY_ID;
  return parsed.error.issues.map((issue) => ({ entryId: id, field: pathText(issue.path), check: 'schema' as const, message: issue.message }));
}
