import type { DataSource } from 'typeorm';
import type { SyncChangesResponse } from '../../shared/api/sync';
import { LibraryEntry } from '../entities/LibraryEntry';
import { badRequest } from '../errors/AppError';
import { rowToEntry } from '../library/service';

/** Cursors wrap the library change counter; clients must treat them as opaque strings. */
export function cursorEncode(seq: number): string {
  return Buffer.from(`c1:${seq}`, 'utf8').toString('base64url');
}

export function cursorDecode(cursor: string | undefined): number {
  if (cursor === undefined || cursor === '') return 0;
  const m = /^c1:(\d{1,15})$/.exec(/^[A-Za-z0-9_-]+$/.test(cursor) ? Buffer.from(cursor, 'base64url').toString('utf8') : '');
  if (!m) throw badRequest('cursor: not a cursor this server issued; start again without one', [{ field: 'cursor', message: 'unknown cursor' }]);
  return Number(m[1]);
}

/**
 * One indexed range query per page: visible revisions (current, or retired = tombstone) whose
 * change number is past the cursor, in change order. An entry changed twice since the cursor
 * appears once, at its latest state, because superseded revisions are not visible.
 */
export async function syncChanges(ds: DataSource, cursor: string | undefined, limit: number): Promise<SyncChangesResponse> {
  const after = cursorDecode(cursor);
  const rows = await ds
    .getRepository(LibraryEntry)
    .createQueryBuilder('e')
    .where("e.status IN ('current', 'retired') AND e.seq > :after", { after })
    .orderBy('e.seq', 'ASC')
    .take(limit + 1)
    .getMany();
  const page = rows.slice(0, limit);
  const last = page.length ? page[page.length - 1].seq : after;
  return {
    changes: page.map((r) => ({ entryId: r.entryId, revision: r.revision, retired: r.status === 'retired', entry: rowToEntry(r) })),
    nextCursor: cursorEncode(last),
    hasMore: rows.length > limit,
  };
}
