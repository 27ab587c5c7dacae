/**
 * Durability: a client pushes submissions in a loop while the server is killed with SIGKILL at
 * random moments and restarted, ROUNDS times (default 50). Afterwards every submission the server
 * acknowledged must be stored exactly once and SQLite's integrity_check must say ok.
 * Like a real offline client, pushes that got no answer are sent again after the restart.
 *
 *   node scripts/runTs.mjs scripts/durability.ts [rounds]
 */
import crypto from 'node:crypto';
import path from 'node:path';
import { buildServer, exited, freePort, signInAs, startServer, tempDir } from '../tests/server/support/serverProcess';

// better-sqlite3 ships no types here; this is all the script needs of it.
interface Sqlite {
  prepare(sql: string): { all(): unknown[] };
  pragma(sql: string): unknown;
  close(): void;
}
const Database = require('better-sqlite3') as new (file: string, options?: { readonly?: boolean }) => Sqlite;

const ROUNDS = Number(process.argv[2] ?? 50);

function demoEntry(n: number) {
  // Invented demo entries, one per pushed submission, so "exactly once" is checkable by entry id too.
  return {
    id: `demo.durability-${n}`,
    name: `Demo durability compound ${n}`,
    formula: 'C2H6O',
    category: 'demo',
    source: 'invented demo entry (durability script)',
    solvent: 'CDCl3',
    mhz: 400,
    signals: [
      { nucleus: '1H', shift: 1.2 + (n % 50) / 100, multiplicity: 't', j: [7], nuclei: 3 },
      { nucleus: '1H', shift: 3.6 + (n % 30) / 100, multiplicity: 'q', j: [7], nuclei: 2 },
    ],
  };
}

async function main(): Promise<void> {
  buildServer();
  const dir = tempDir('tessera-durability-');
  const db = path.join(dir, 'durability.sqlite');
  const env = { DATABASE_PATH: db, WEB_DIR: path.join(dir, 'none'), JWT_SECRET: crypto.randomBytes(32).toString('hex') };
  const acknowledged = new Set<string>();
  const unanswered: { id: string; entry: ReturnType<typeof demoEntry> }[] = [];
  let next = 0;
  let pushes = 0;
  let failedPushes = 0;
  let kills = 0;
  const started = Date.now();

  for (let round = 0; round < ROUNDS; round++) {
    const port = await freePort();
    const server = await startServer(env, port);
    const token = await signInAs(server.url, 'analyst@demo.tessera.test');
    let alive = true;
    const killAfter = 200 + Math.random() * 1800;
    const killer = setTimeout(() => {
      alive = false;
      server.child.kill('SIGKILL');
      kills++;
    }, killAfter);

    // Several concurrent clients so the kill lands mid-transaction as well as between requests.
    const client = async () => {
      while (alive) {
        const batch = unanswered.splice(0, 3);
        const size = 1 + Math.floor(Math.random() * 4);
        for (let i = 0; i < size; i++) batch.push({ id: crypto.randomUUID(), entry: demoEntry(next++) });
        try {
          const r = await fetch(`${server.url}/api/sync/push`, {
            method: 'POST',
            headers: { 'content-type': 'application/json', authorization: `Bearer ${token}` },
            body: JSON.stringify({ submissions: batch }),
          });
          pushes++;
          if (r.status !== 200) throw new Error(`push answered ${r.status}: ${await r.text()}`);
          const body = (await r.json()) as { results: { id: string; outcome: string }[] };
          for (const res of body.results) {
            if (res.outcome === 'created' || res.outcome === 'duplicate') acknowledged.add(res.id);
            else throw new Error(`unexpected outcome ${res.outcome} for ${res.id}`);
          }
        } catch (e) {
          if (process.env.DEBUG_DURABILITY) console.error(e);
          if (alive) throw e;
          failedPushes++;
          unanswered.push(...batch); // no answer: the client tries again after the restart
        }
      }
    };
    await Promise.all([client(), client(), client()]);
    clearTimeout(killer);
    await exited(server.child);
    process.stdout.write(`\rround ${round + 1}/${ROUNDS}: ${acknowledged.size} acknowledged`);
  }
  // One last clean start lets the retries of the final round land, then a clean stop.
  const server = await startServer(env, await freePort());
  const token = await signInAs(server.url, 'analyst@demo.tessera.test');
  while (unanswered.length) {
    const batch = unanswered.splice(0, 50);
    const r = await fetch(`${server.url}/api/sync/push`, { method: 'POST', headers: { 'content-type': 'application/json', authorization: `Bearer ${token}` }, body: JSON.stringify({ submissions: batch }) });
    const body = (await r.json()) as { results: { id: string; outcome: string }[] };
    for (const res of body.results) if (res.outcome === 'created' || res.outcome === 'duplicate') acknowledged.add(res.id);
  }
  server.child.kill('SIGTERM');
  await exited(server.child);
  console.log('');

  const conn = new Database(db, { readonly: true });
  const rows = conn.prepare("SELECT id, entry_id FROM submission WHERE entry_id LIKE 'demo.durability-%'").all() as { id: string; entry_id: string }[];
  const byId = new Map<string, number>();
  const byEntry = new Map<string, number>();
  for (const r of rows) {
    byId.set(r.id, (byId.get(r.id) ?? 0) + 1);
    byEntry.set(r.entry_id, (byEntry.get(r.entry_id) ?? 0) + 1);
  }
  const missing = [...acknowledged].filter((id) => !byId.has(id)).length;
  const duplicatedIds = [...byId.values()].filter((n) => n > 1).length;
  const duplicatedEntries = [...byEntry.values()].filter((n) => n > 1).length;
  const integrity = (conn.pragma('integrity_check') as { integrity_check: string }[]).map((r) => r.integrity_check).join('; ');
  conn.close();

  console.log(`rounds (kill -9 each): ${ROUNDS}, kills: ${kills}, seconds: ${((Date.now() - started) / 1000).toFixed(1)}`);
  console.log(`push requests answered: ${pushes}, lost to a kill and retried: ${failedPushes}`);
  console.log(`submissions acknowledged: ${acknowledged.size}`);
  console.log(`stored rows: ${rows.length}, acknowledged but missing: ${missing}, ids stored more than once: ${duplicatedIds}, entries stored more than once: ${duplicatedEntries}`);
  console.log(`PRAGMA integrity_check: ${integrity}`);
  const ok = missing === 0 && duplicatedIds === 0 && duplicatedEntries === 0 && integrity === 'ok' && rows.length === acknowledged.size;
  console.log(ok ? 'DURABILITY OK' : 'DURABILITY FAILED');
  process.exit(ok ? 0 : 1);
}

main().catch((e) => {
  console.error(e);
  process.exit(1);
});
