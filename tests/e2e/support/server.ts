import { spawn, type ChildProcess } from 'node:child_process';
import fs from 'node:fs';
import net from 'node:net';
import os from 'node:os';
import path from 'node:path';

export const ROOT = path.resolve(__dirname, '..', '..', '..');

/** A free TCP port on 127.0.0.1. */
export async function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const srv = net.createServer();
    srv.once('error', reject);
    srv.listen(0, '127.0.0.1', () => {
      const port = (srv.address() as net.AddressInfo).port;
      srv.close(() => resolve(port));
    });
  });
}

export interface RunningServer {
  url: string;
  port: number;
  dataDir: string;
  stop(): Promise<void>;
  start(): Promise<void>;
  log(): string;
}

/**
 * Runs the built server (dist-server) on a free port with its own temporary database, serving the
 * web export in dist/web. `stop()` and `start()` can be called repeatedly (same port, same data).
 */
export async function startServer(extraEnv: Record<string, string> = {}): Promise<RunningServer> {
  const entry = path.join(ROOT, 'dist-server', 'server', 'index.js');
  if (!fs.existsSync(entry)) throw new Error(`${entry} is missing: run "npm run build:server" first`);
  if (!fs.existsSync(path.join(ROOT, 'dist', 'web', 'index.html'))) throw new Error('dist/web is missing: run "npm run build:web" first');
  const port = await freePort();
  const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'tessera-e2e-'));
  const url = `http://127.0.0.1:${port}`;
  let child: ChildProcess | null = null;
  let output = '';

  async function start(): Promise<void> {
    child = spawn(process.execPath, [entry], {
      cwd: ROOT,
      env: {
        ...process.env,
        PORT: String(port),
        HOST: '127.0.0.1',
        DATABASE_PATH: path.join(dataDir, 'tessera.sqlite'),
        WEB_DIR: path.join(ROOT, 'dist', 'web'),
        LOG_LEVEL: 'warn',
        AUTH_RATE_LIMIT: '1000',
        ...extraEnv,
      },
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    child.stdout?.on('data', (d) => (output += String(d)));
    child.stderr?.on('data', (d) => (output += String(d)));
    const deadline = Date.now() + 60_000;
    for (;;) {
      if (child.exitCode !== null) throw new Error(`server exited with ${child.exitCode}:\n${output}`);
      try {
        const res = await fetch(`${url}/api/library`);
        if (res.status < 500) return;
      } catch {
        // not listening yet
      }
      if (Date.now() > deadline) throw new Error(`server did not start within 60 s:\n${output}`);
      await new Promise((r) => setTimeout(r, 200));
    }
  }

  async function stop(): Promise<void> {
    const c = child;
    child = null;
    if (!c || c.exitCode !== null) return;
    await new Promise<void>((resolve) => {
      c.once('exit', () => resolve());
      c.kill('SIGTERM');
      const timer: { unref?(): void } = setTimeout(() => c.kill('SIGKILL'), 5000) as never;
      timer.unref?.();
    });
  }

  await start();
  return { url, port, dataDir, stop, start, log: () => output };
}
