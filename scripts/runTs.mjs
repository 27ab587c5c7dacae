#!/usr/bin/env node
// Runs a TypeScript entry point with ts-node (transpile-only, CommonJS, decorator metadata on).
// tsx is not used: esbuild writes no decorator metadata and TypeORM needs it.
import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import path from 'node:path';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
const [entry, ...args] = process.argv.slice(2);
if (!entry) {
  console.error('usage: node scripts/runTs.mjs <file.ts> [args…]');
  process.exit(2);
}
const result = spawnSync(
  process.execPath,
  ['-r', 'ts-node/register/transpile-only', path.resolve(root, entry), ...args],
  { stdio: 'inherit', env: { ...process.env, TS_NODE_PROJECT: path.join(root, 'tsconfig.server.json') } },
);
process.exit(result.status ?? 1);
