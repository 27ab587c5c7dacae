import { LibraryEntrySchema, type LibraryEntry } from '../shared/libraryEntry';
import { getLocalDb } from './dataSource';
import { LocalLibraryEntry } from './entities/LocalLibraryEntry';
import { withWriteLock } from './writeLock';

/** Every library entry stored on the device, by name. Rows that no longer parse are skipped. */
export async function localLibraryList(): Promise<LibraryEntry[]> {
  const db = await getLocalDb();
  const rows = await db.getRepository(LocalLibraryEntry).find({ order: { name: 'ASC' } });
  const out: LibraryEntry[] = [];
  for (const row of rows) {
    const parsed = LibraryEntrySchema.safeParse(JSON.parse(row.body));
    if (parsed.success) out.push(parsed.data);
  }
  return out;
}

export async function localLibraryGet(id: string): Promise<LibraryEntry | null> {
  const db = await getLocalDb();
  const row = await db.getRepository(LocalLibraryEntry).findOneBy({ id });
  return row ? LibraryEntrySchema.parse(JSON.parse(row.body)) : null;
}

export async function localLibraryCount(): Promise<number> {
  const db = await getLocalDb();
  return db.getRepository(LocalLibraryEntry).count();
}

/** Insert or replace entries in one transaction; retired entries are removed. */
export async function localLibraryUpsert(entries: LibraryEntry[]): Promise<void> {
  if (entries.length === 0) return;
  const db = await getLocalDb();
  const now = new Date().toISOString();
  await withWriteLock(() => db.transaction(async (m) => {
    const repo = m.getRepository(LocalLibraryEntry);
    const retired = entries.filter((e) => e.retired).map((e) => e.id);
    if (retired.length) await repo.delete(retired);
    const live = entries.filter((e) => !e.retired);
    for (let i = 0; i < live.length; i += 200) {
      await repo.save(
        live.slice(i, i + 200).map((e) =>
          repo.create({ id: e.id, name: e.name, category: e.category, solvent: e.solvent, revision: e.revision ?? 1, body: JSON.stringify(e), updatedAt: now }),
        ),
      );
    }
  }));
}

/** Removes every entry whose id is not in `keep` (after a complete pull from the beginning). Returns how many went. */
export async function localLibraryRetainOnly(keep: ReadonlySet<string>): Promise<number> {
  const db = await getLocalDb();
  const repo = db.getRepository(LocalLibraryEntry);
  const ids = (await repo.find({ select: { id: true } })).map((r) => r.id).filter((id) => !keep.has(id));
  if (ids.length) await withWriteLock(() => repo.delete(ids));
  return ids.length;
}
