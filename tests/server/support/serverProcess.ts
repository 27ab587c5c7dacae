import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import fs from 'node:fs';
import net from 'node:net';
import path from 'node:path';

/** Helpers scripts/durability.ts and scripts/load.ts share: build once, start the compiled server, wait for it. */
export const ROOT = path.resolve(__dirname, '../../..');
export const SERVER_ENTRY = path.join(ROOT, 'dist-server/server/index.js');

export function buildServer(): void {
  const t = Date.now();
  const r = spawnSync(process.execPath, [path.join(ROOT, 'node_modules/typescript/bin/tsc'), '-p', path.join(ROOT, 'tsconfig.server.json')], { encoding: 'utf8' });
  // tsc still emits on type errors; those may be in files being edited elsewhere in the tree.
  if (r.status !== 0) {
    if (!fs.existsSync(SERVER_ENTRY)) throw new Error(`server build failed:\n${r.stdout}${r.stderr}`);
    console.warn(`warning: the server build reported type errors (output emitted anyway):\n${r.stdout.split('\n').slice(0, 5).join('\n')}`);
  }
  console.log(`built the server in ${((Date.now() - t) / 1000).toFixed(1)} s`);
}

export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const srv = net.createServer();
    srv.listen(0, '127.0.0.1', () => {
      const port = (srv.address() as net.AddressInfo).port;
      srv.close(() => resolve(port));
    });
    srv.on('error', reject);
  });
}

export interface Started {
  child: ChildProcess;
  url: string;
}

export async function startServer(env: Record<string, string>, port: number): Promise<Started> {
  const child = spawn(process.execPath, [SERVER_ENTRY], {
    env: { ...process.env, LOG_LEVEL: 'warn', HOST: '127.0.0.1', PORT: String(port), AUTH_RATE_LIMIT: '100000', ...env },
    stdio: ['ignore', 'ignore', 'pipe'],
  });
  let stderr = '';
  child.stderr!.on('data', (d) => (stderr += d));
  const url = `http://127.0.0.1:${port}`;
  const deadline = Date.now() + 30_000;
  for (;;) {
    if (child.exitCode !== null) throw new Error(`server exited with ${child.exitCode}: ${stderr}`);
    try {
      const r = await fetch(`${url}/api/health`);
      if (r.ok) return { child, url };
    } catch {
      // not listening yet
    }
    if (Date.now() > deadline) throw new Error(`server did not answer within 30 s: ${stderr}`);
    await new Promise((r) => setTimeout(r, 50));
  }
}

export function exited(child: ChildProcess): Promise<void> {
  return child.exitCode !== null || child.signalCode !== null ? Promise.resolve() : new Promise((r) => child.once('exit', () => r()));
}

export async function signInAs(url: string, email: string, password = 'tessera-demo'): Promise<string> {
  const r = await fetch(`${url}/api/auth/sign-in`, { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ email, password }) });
  if (!r.ok) throw new Error(`sign-in as ${email} failed: ${r.status} ${await r.text()}`);
  return ((await r.json()) as { accessToken: string }).accessToken;
}

export function tempDir(prefix: string): string {
  return fs.mkdtempSync(path.join(require('node:os').tmpdir(), prefix));
}
