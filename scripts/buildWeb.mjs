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
if (res.status !== 0) process.exit(res.status ?? 1);

// The service worker (public/sw.js) precaches every file of the export listed here, so the app
// loads with the server down after one visit. Source maps are left out.
const outDir = path.join(root, 'dist', 'web');
const files = [];
const walk = (dir) => {
  for (const f of fs.readdirSync(dir, { withFileTypes: true })) {
    const p = path.join(dir, f.name);
    if (f.isDirectory()) walk(p);
    else if (!f.name.endsWith('.map') && f.name !== 'precache.json') files.push('/' + path.relative(outDir, p).split(path.sep).join('/'));
  }
};
walk(outDir);
fs.writeFileSync(path.join(outDir, 'precache.json'), JSON.stringify({ files: ['/', ...files.filter((f) => f !== '/index.html')] }));
console.log(`precache list: ${files.length} files`);
