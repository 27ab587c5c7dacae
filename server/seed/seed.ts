import fs from 'node:fs';
import path from 'node:path';
import type { Logger } from 'pino';
import type { DataSource } from 'typeorm';
import { LibraryFileSchema, type LibraryEntry as EntryBody } from '../../shared/libraryEntry';
import type { Role } from '../../shared/user';
import type { AuthService } from '../auth/service';
import { LibraryEntry } from '../entities/LibraryEntry';
import { User } from '../entities/User';
import { libraryAddRevision } from '../library/service';
import { tx } from '../data-source';

/** Invented demo accounts, one per role, all with the same published password. */
export const DEMO_PASSWORD = 'tessera-demo';
export const DEMO_USERS: { email: string; displayName: string; role: Role }[] = [
  { email: 'student@demo.tessera.test', displayName: 'Demo Student', role: 'student' },
  { email: 'analyst@demo.tessera.test', displayName: 'Demo Analyst', role: 'analyst' },
  { email: 'curator@demo.tessera.test', displayName: 'Demo Curator', role: 'curator' },
  { email: 'admin@demo.tessera.test', displayName: 'Demo Admin', role: 'admin' },
];

export class SeedError extends Error {}

/** Reads and validates every `*.json` library file; throws SeedError naming file and field. */
export function readLibraryFiles(dir: string): EntryBody[] {
  if (!fs.existsSync(dir)) return [];
  const files = fs.readdirSync(dir).filter((f) => f.endsWith('.json')).sort();
  const seen = new Map<string, string>();
  const entries: EntryBody[] = [];
  for (const f of files) {
    const file = path.join(dir, f);
    let json: unknown;
    try {
      json = JSON.parse(fs.readFileSync(file, 'utf8'));
    } catch (e) {
      throw new SeedError(`${f}: not valid JSON (${(e as Error).message})`);
    }
    const parsed = LibraryFileSchema.safeParse(json);
    if (!parsed.success) {
      const i = parsed.error.issues[0];
      throw new SeedError(`${f}: ${i.path.join('.') || '(file)'}: ${i.message}`);
    }
    for (const entry of parsed.data.entries) {
      const other = seen.get(entry.id);
      if (other) throw new SeedError(`${f}: entry id "${entry.id}" is also in ${other}`);
      seen.set(entry.id, f);
      entries.push(entry);
    }
  }
  return entries;
}

export interface SeedResult {
  usersCreated: number;
  entriesCreated: number;
}

/**
 * First start: the demo accounts (when there are no accounts at all). Every start: library-data
 * entries whose id the database has never held (a retired entry is not brought back).
 * All in one transaction: a bad file seeds nothing.
 */
export async function seed(ds: DataSource, auth: AuthService, libraryDir: string, logger: Logger): Promise<SeedResult> {
  const entries = readLibraryFiles(libraryDir);
  const demoHash = await auth.hashPassword(DEMO_PASSWORD);
  return tx(ds, async (m) => {
    let usersCreated = 0;
    if ((await m.getRepository(User).count()) === 0) {
      for (const u of DEMO_USERS) {
        await auth.createUser(m, { ...u, passwordHash: demoHash, demo: true });
        usersCreated++;
      }
    }
    const known = new Set(
      (await m.getRepository(LibraryEntry).createQueryBuilder('e').select('DISTINCT e.entry_id', 'id').getRawMany<{ id: string }>()).map((r) => r.id),
    );
    let entriesCreated = 0;
    for (const entry of entries) {
      if (known.has(entry.id)) continue;
      await libraryAddRevision(m, entry, { submissionId: null, createdBy: null });
      entriesCreated++;
    }
    if (usersCreated || entriesCreated) logger.info({ usersCreated, entriesCreated }, 'seeded');
    return { usersCreated, entriesCreated };
  });
}
