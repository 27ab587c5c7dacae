import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import pino from 'pino';
import request from 'supertest';
import type { DataSource } from 'typeorm';
import { createApp, type TesseraApp } from '../../server/app';
import { loadConfig, type Config } from '../../server/config';
import { createDataSource } from '../../server/data-source';
import { createOutboxMailer, type Mailer } from '../../server/mail/mailer';
import { repoRoot } from '../../server/paths';
import { DEMO_PASSWORD, seed } from '../../server/seed/seed';

export const ROOT = repoRoot(__dirname);
export const silent = pino({ level: 'silent' });

export interface TestServer {
  app: TesseraApp;
  ds: DataSource;
  config: Config;
  mailer: Mailer;
  dir: string;
  close(): Promise<void>;
}

/** An app on a fresh SQLite file in its own temp folder, seeded with the demo accounts and `libraryDir`. */
export async function startTestServer(opts: { libraryDir?: string; env?: Record<string, string>; mailer?: (ds: DataSource, c: Config) => Mailer } = {}): Promise<TestServer> {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'tessera-test-'));
  const config: Config = {
    ...loadConfig({ DATABASE_PATH: path.join(dir, 'test.sqlite'), JWT_SECRET: 'test-secret-test-secret-test-secret-123', WEB_DIR: path.join(dir, 'no-web'), LOG_LEVEL: 'silent', ...opts.env }, ROOT),
    bcryptRounds: 4,
  };
  const ds = createDataSource(config.databasePath);
  await ds.initialize();
  const mailer = opts.mailer ? opts.mailer(ds, config) : createOutboxMailer(ds, config.mailFrom, silent);
  const app = createApp({ dataSource: ds, config, mailer, logger: silent });
  await seed(ds, app.locals.services.auth, opts.libraryDir ?? path.join(dir, 'no-library'), silent);
  return {
    app,
    ds,
    config,
    mailer,
    dir,
    async close() {
      mailer.close();
      await ds.destroy();
      fs.rmSync(dir, { recursive: true, force: true });
    },
  };
}

export async function signIn(app: TesseraApp, role: 'student' | 'analyst' | 'curator' | 'admin') {
  const res = await request(app).post('/api/auth/sign-in').send({ email: `${role}@demo.tessera.test`, password: DEMO_PASSWORD });
  if (res.status !== 200) throw new Error(`sign-in as ${role} failed: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body as { accessToken: string; refreshToken: string; user: { id: string; role: string } };
}

/** A library folder with the given entries in one file. */
export function writeLibraryDir(dir: string, entries: unknown[], file = 'test-entries.json'): string {
  const lib = path.join(dir, 'library');
  fs.mkdirSync(lib, { recursive: true });
  fs.writeFileSync(path.join(lib, file), JSON.stringify({ format: 'tessera-library', version: 1, title: 'test', entries }));
  return lib;
}

/**
 * Invented demo entries for tests (not real data: the numbers are placeholders shaped like
 * 1H peak lists, marked category "demo").
 */
export function demoEntry(id: string, overrides: Record<string, unknown> = {}) {
  return {
    id,
    name: `Demo compound ${id}`,
    formula: 'C2H6O',
    category: 'demo',
    source: 'invented demo entry for tests',
    solvent: 'CDCl3',
    mhz: 400,
    signals: [
      { nucleus: '1H', shift: 1.22, multiplicity: 't', j: [7.0], nuclei: 3 },
      { nucleus: '1H', shift: 3.69, multiplicity: 'q', j: [7.0], nuclei: 2 },
      { nucleus: '1H', shift: 2.1, multiplicity: 's', nuclei: 1, exchangeable: true },
    ],
    ...overrides,
  };
}

/** Row counts of every table: "the database is unchanged" means these stay equal. */
export async function tableCounts(ds: DataSource): Promise<Record<string, number>> {
  const out: Record<string, number> = {};
  for (const t of ['user', 'library_entry', 'submission', 'audit_log', 'mail_message', 'password_reset']) {
    const rows: { n: number }[] = await ds.query(`SELECT COUNT(*) AS n FROM "${t}"`);
    out[t] = rows[0].n;
  }
  return out;
}
