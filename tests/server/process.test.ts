import { spawn } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { freePort } from './support/serverProcess';
import { ROOT } from './helpers';

/** server/index.ts as a real process (through ts-node, as scripts/runTs.mjs runs it). */
function runServer(env: Record<string, string>) {
  const child = spawn(process.execPath, ['-r', 'ts-node/register/transpile-only', path.join(ROOT, 'server/index.ts')], {
    env: { ...process.env, TS_NODE_PROJECT: path.join(ROOT, 'tsconfig.server.json'), LOG_LEVEL: 'warn', ...env },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  let out = '';
  child.stdout.on('data', (d) => (out += d));
  child.stderr.on('data', (d) => (out += d));
  const exit = new Promise<number | null>((resolve) => child.on('exit', (code) => resolve(code)));
  return { child, output: () => out, exit };
}

describe.concurrent('server process', () => {
  it('when started, then it prints the URL and the demo sign-ins, serves, and on SIGTERM exits cleanly with the data kept', async () => {
    const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'tessera-proc-'));
    const port = await freePort();
    const env = { PORT: String(port), DATABASE_PATH: path.join(dir, 'db', 'tessera.sqlite'), WEB_DIR: path.join(dir, 'no-web') };
    const p = runServer(env);
    const deadline = Date.now() + 60_000;
    while (!p.output().includes('Tessera is running at') && Date.now() < deadline && p.child.exitCode === null) await new Promise((r) => setTimeout(r, 100));
    const out = p.output();
    expect(out).toContain(`Tessera is running at http://127.0.0.1:${port}`);
    for (const who of ['student', 'analyst', 'curator', 'admin']) expect(out).toContain(`${who}@demo.tessera.test`);
    expect(out).toContain('password "tessera-demo"');
    const health = await fetch(`http://127.0.0.1:${port}/api/health`);
    expect(health.status).toBe(200);
    p.child.kill('SIGTERM');
    expect(await p.exit).toBe(0);
    // Created on first start, with the generated secret beside it.
    expect(fs.existsSync(env.DATABASE_PATH)).toBe(true);
    expect(fs.existsSync(`${env.DATABASE_PATH}.jwt-secret`)).toBe(true);
  }, 90_000);

  it('when a setting is bad, then it refuses to start and names the variable', async () => {
    const p = runServer({ PORT: 'abc' });
    expect(await p.exit).toBe(2);
    expect(p.output()).toContain('bad configuration: PORT: must be a whole number (got "abc")');
  }, 60_000);
});
