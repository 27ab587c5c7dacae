#!/usr/bin/env node
// Exports the web app into dist/web (Metro, single-page output). Pass --clear after babel changes.
import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import fs from 'node:fs';
import path from 'node:path';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
fs.mkdirSync(path.join(root, 'node_modules', '.cache'), { recursive: true });
const extra = process.argv.slice(2);
const res = spawnSync('npx', ['expo', 'export', '--platform', 'web', '--output-dir', 'dist/web', ...extra], {
  cwd: root,
  stdio: 'inherit',
  env: { ...process.env, EXPO_NO_TELEMETRY: '1', CI: '1' },
});
process.exit(res.status ?? 1);
