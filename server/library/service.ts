import type { DataSource, EntityManager } from 'typeorm';
import type { LibraryEntry as EntryBody } from '../../shared/libraryEntry';
import { conflict, notFound } from '../errors/AppError';
import { LibraryEntry } from '../entities/LibraryEntry';

/** A stored revision as the shared shape: revision and retired come from the row, not the JSON. */
export function rowToEntry(row: LibraryEntry): EntryBody {
  const body = JSON.parse(row.body) as EntryBody;
  return { ...body, id: row.entryId, revision: row.revision, ...(row.status === 'retired' ? { retired: true } : {}) };
}

/** What goes into the body column: the entry without the fields the row's columns own. */
export function entryToBody(entry: EntryBody): string {
  const { revision: _r, retired: _t, ...rest } = entry;
  return JSON.stringify(rest);
}

export async function nextSeq(m: EntityManager): Promise<number> {
  const rows: { s: number | null }[] = await m.query('SELECT MAX("seq") AS s FROM "library_entry"');
  return (rows[0]?.s ?? 0) + 1;
}

/** Current approved entries, in name order. */
export async function libraryListCurrent(ds: DataSource | EntityManager): Promise<EntryBody[]> {
  const rows = await ds.getRepository(LibraryEntry).find({ where: { status: 'current' }, order: { name: 'ASC', entryId: 'ASC' } });
  return rows.map(rowToEntry);
}

/** The visible (current or retired) revision of one entry, or null. */
export async function libraryFindVisible(m: DataSource | EntityManager, entryId: string): Promise<LibraryEntry | null> {
  return m
    .getRepository(LibraryEntry)
    .createQueryBuilder('e')
    .where('e.entry_id = :id AND e.status <> :s', { id: entryId, s: 'superseded' })
    .getOne();
}

export async function libraryGetVisible(m: DataSource | EntityManager, entryId: string): Promise<LibraryEntry> {
  const row = await libraryFindVisible(m, entryId);
  if (!row) throw notFound(`no library entry "${entryId}"`);
  return row;
}

export async function libraryListRevisions(ds: DataSource, entryId: string): Promise<LibraryEntry[]> {
  const rows = await ds.getRepository(LibraryEntry).find({ where: { entryId }, order: { revision: 'DESC' } });
  if (rows.length === 0) throw notFound(`no library entry "${entryId}"`);
  return rows;
}

/**
 * Stores `entry` as the next revision of its id (revision 1 for a new id): the previous visible
 * revision becomes superseded and stays readable. Runs inside the caller's transaction.
 */
export async function libraryAddRevision(
  m: EntityManager,
  entry: EntryBody,
  meta: { submissionId: string | null; createdBy: string | null },
): Promise<LibraryEntry> {
  const previous = await libraryFindVisible(m, entry.id);
  const now = new Date();
  if (previous) {
    await m.getRepository(LibraryEntry).update({ entryId: previous.entryId, revision: previous.revision }, { status: 'superseded', updatedAt: now });
  }
  const row = Object.assign(new LibraryEntry(), {
    entryId: entry.id,
    revision: (previous?.revision ?? 0) + 1,
    name: entry.name,
    status: 'current',
    body: entryToBody(entry),
    seq: await nextSeq(m),
    submissionId: meta.submissionId,
    createdBy: meta.createdBy,
    createdAt: now,
    updatedAt: now,
  } satisfies Partial<LibraryEntry>);
  await m.getRepository(LibraryEntry).insert(row);
  return row;
}

/** Retires the entry: its last revision becomes a tombstone with a fresh seq so sync carries it. */
export async function libraryRetire(m: EntityManager, entryId: string): Promise<LibraryEntry> {
  const row = await libraryGetVisible(m, entryId);
  if (row.status === 'retired') throw conflict(`library entry "${entryId}" is already retired`);
  row.status = 'retired';
  row.seq = await nextSeq(m);
  row.updatedAt = new Date();
  await m.getRepository(LibraryEntry).update({ entryId: row.entryId, revision: row.revision }, { status: row.status, seq: row.seq, updatedAt: row.updatedAt });
  return row;
}
