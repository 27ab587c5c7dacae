#!/usr/bin/env node
// `npm start`: builds what is missing or out of date (server → dist-server, web app → dist/web),
// then runs the Express server, which creates and seeds data/tessera.sqlite on first start.
import { spawnSync, spawn } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import fs from 'node:fs';
import path from 'node:path';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');

function newestMtime(dirs) {
  let newest = 0;
  const walk = (p) => {
    let st;
    try {
      st = fs.statSync(p);
    } catch {
      return;
    }
    if (st.isDirectory()) {
      if (path.basename(p) === 'node_modules') return;
      for (const f of fs.readdirSync(p)) walk(path.join(p, f));
    } else newest = Math.max(newest, st.mtimeMs);
  };
  for (const d of dirs) walk(path.join(root, d));
  return newest;
}

function stale(output, inputs) {
  let out;
  try {
    out = fs.statSync(path.join(root, output)).mtimeMs;
  } catch {
    return true;
  }
  return newestMtime(inputs) > out;
}

function run(cmd, args) {
  const res = spawnSync(cmd, args, { cwd: root, stdio: 'inherit' });
  if (res.status !== 0) process.exit(res.status ?? 1);
}

const serverInputs = ['server', 'shared', 'matching', 'library-data', 'tsconfig.server.json'];
if (stale('dist-server/server/index.js', serverInputs)) {
  console.log('Building the server…');
  run('npx', ['tsc', '-p', 'tsconfig.server.json']);
  fs.utimesSync(path.join(root, 'dist-server/server/index.js'), new Date(), new Date());
}
const webInputs = ['app', 'components', 'queries', 'localdb', 'client', 'hooks', 'constants', 'shared', 'matching', 'library-data', 'public', 'app.json', 'babel.config.js', 'metro.config.js'];
if (stale('dist/web/index.html', webInputs)) {
  console.log('Building the web app (the first build takes a minute or two)…');
  run(process.execPath, ['scripts/buildWeb.mjs']);
}

const child = spawn(process.execPath, ['--enable-source-maps', 'dist-server/server/index.js'], { cwd: root, stdio: 'inherit' });
for (const sig of ['SIGINT', 'SIGTERM']) process.on(sig, () => child.kill(sig));
child.on('exit', (code) => process.exit(code ?? 0));
