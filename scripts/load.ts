/**
 * Load: 200 concurrent sync pulls (GET /api/sync/changes from no cursor, the heaviest pull: the
 * whole library) against the compiled server on 127.0.0.1, with autocannon. Prints throughput,
 * p99 latency and errors, beside a baseline measured in the same run on GET /api/health (no
 * database, no JSON of entries), so the figures are read as a ratio on this machine.
 *
 *   node scripts/runTs.mjs scripts/load.ts [seconds=10] [connections=200] [extraEntries=500]
 */
import crypto from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';
import { buildServer, exited, freePort, ROOT, signInAs, startServer, tempDir } from '../tests/server/support/serverProcess';

const autocannon = require('autocannon') as (opts: Record<string, unknown>) => Promise<AutocannonResult>;

interface AutocannonResult {
  requests: { average: number; total: number };
  latency: { p50: number; p99: number; average: number; max: number };
  throughput: { average: number };
  errors: number;
  timeouts: number;
  non2xx: number;
  '2xx': number;
}

const seconds = Number(process.argv[2] ?? 10);
const connections = Number(process.argv[3] ?? 200);
const extra = Number(process.argv[4] ?? 500);

/** Invented demo entries to give the pull a library of realistic size. */
function syntheticLibrary(n: number) {
  return {
    format: 'tessera-library',
    version: 1,
    title: 'invented demo entries for the load script',
    entries: Array.from({ length: n }, (_, i) => ({
      id: `demo.load-${i}`,
      name: `Demo load compound ${i}`,
      formula: 'C4H8O2',
      category: 'demo',
      source: 'invented demo entry (load script)',
      solvent: 'CDCl3',
      mhz: 400,
      signals: [
        { nucleus: '1H', shift: 1.0 + (i % 97) / 100, multiplicity: 't', j: [7.1], nuclei: 3 },
        { nucleus: '1H', shift: 2.0 + (i % 89) / 100, multiplicity: 's', nuclei: 3 },
        { nucleus: '1H', shift: 4.0 + (i % 53) / 100, multiplicity: 'q', j: [7.1], nuclei: 2 },
      ],
    })),
  };
}

async function run(url: string, token: string, title: string): Promise<AutocannonResult> {
  const r = await autocannon({ url, connections, duration: seconds, headers: { authorization: `Bearer ${token}` }, timeout: 30 });
  const rps = r.requests.average;
  console.log(
    `${title.padEnd(34)} ${rps.toFixed(0).padStart(7)} req/s   p50 ${String(r.latency.p50).padStart(5)} ms   p99 ${String(r.latency.p99).padStart(5)} ms   ` +
      `errors ${r.errors}  timeouts ${r.timeouts}  non-2xx ${r.non2xx}  (${r.requests.total} requests, ${(r.throughput.average / 1e6).toFixed(1)} MB/s)`,
  );
  return r;
}

async function main(): Promise<void> {
  buildServer();
  const dir = tempDir('tessera-load-');
  const lib = path.join(dir, 'library');
  fs.mkdirSync(lib);
  for (const f of fs.readdirSync(path.join(ROOT, 'library-data')).filter((f) => f.endsWith('.json'))) fs.copyFileSync(path.join(ROOT, 'library-data', f), path.join(lib, f));
  if (extra > 0) fs.writeFileSync(path.join(lib, 'zz-load-synthetic.json'), JSON.stringify(syntheticLibrary(extra)));
  const server = await startServer({ DATABASE_PATH: path.join(dir, 'load.sqlite'), WEB_DIR: path.join(dir, 'none'), LIBRARY_DATA_DIR: lib, JWT_SECRET: crypto.randomBytes(32).toString('hex') }, await freePort());
  try {
    const token = await signInAs(server.url, 'student@demo.tessera.test');
    const first = (await (await fetch(`${server.url}/api/sync/changes?limit=1000`, { headers: { authorization: `Bearer ${token}` } })).json()) as { changes: unknown[]; hasMore: boolean };
    const full = JSON.stringify(first).length;
    console.log(`library: ${first.changes.length}${first.hasMore ? '+' : ''} entries; one full pull (limit 1000) is ${(full / 1024).toFixed(0)} KiB`);
    console.log(`${connections} concurrent connections, ${seconds} s each`);
    const base = await run(`${server.url}/api/health`, token, 'baseline GET /api/health');
    const page = await run(`${server.url}/api/sync/changes?limit=200`, token, 'sync pull, first page (200)');
    const whole = await run(`${server.url}/api/sync/changes?limit=1000`, token, 'sync pull, whole library (1000)');
    const cursor = (await (await fetch(`${server.url}/api/sync/changes?limit=1000`, { headers: { authorization: `Bearer ${token}` } })).json()) as { nextCursor: string };
    const idle = await run(`${server.url}/api/sync/changes?cursor=${cursor.nextCursor}`, token, 'sync pull, up to date (empty)');
    console.log(
      `ratios to baseline throughput: first page ${(page.requests.average / base.requests.average).toFixed(3)}, ` +
        `whole library ${(whole.requests.average / base.requests.average).toFixed(3)}, up to date ${(idle.requests.average / base.requests.average).toFixed(3)}`,
    );
    const errors = [base, page, whole, idle].reduce((s, r) => s + r.errors + r.timeouts + r.non2xx, 0);
    console.log(`total errors + timeouts + non-2xx: ${errors}`);
    process.exitCode = errors === 0 ? 0 : 1;
  } finally {
    server.child.kill('SIGTERM');
    await exited(server.child);
  }
}

main().catch((e) => {
  console.error(e);
  process.exit(1);
});
