#!/usr/bin/env node
// `npm test`: every check the project has, in order, then ONE summary line "N passed, N failed".
//   1. type check (tsc --noEmit) and lint    — one check each
//   2. vitest: unit + server projects        — every test counts
//   3. server build and web export           — one check each
//   4. vitest: e2e project (headless Chromium) — every test counts
// Chromium: Debian's package. Installed with apt-get when missing and running as root; otherwise
// the run stops with the command to install it.
import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import fs from 'node:fs';
import path from 'node:path';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
const artifacts = path.join(root, 'test-artifacts');
fs.mkdirSync(artifacts, { recursive: true });
const CHROMIUM = process.env.CHROMIUM_PATH || '/usr/bin/chromium';

let passed = 0;
let failed = 0;
const failures = [];

function run(label, cmd, args, env = {}) {
  console.log(`\n▶ ${label}`);
  const res = spawnSync(cmd, args, { cwd: root, stdio: 'inherit', env: { ...process.env, ...env } });
  return res.status === 0;
}

function check(label, ok) {
  if (ok) passed += 1;
  else {
    failed += 1;
    failures.push(label);
  }
}

function vitest(label, projects, outFile) {
  const out = path.join(artifacts, outFile);
  fs.rmSync(out, { force: true });
  const args = ['vitest', 'run', ...projects.flatMap((p) => ['--project', p]), '--reporter=default', '--reporter=json', `--outputFile.json=${out}`];
  const ok = run(label, 'npx', args);
  let report;
  try {
    report = JSON.parse(fs.readFileSync(out, 'utf8'));
  } catch {
    check(`${label}: no report (vitest did not run)`, false);
    return;
  }
  passed += report.numPassedTests ?? 0;
  failed += report.numFailedTests ?? 0;
  for (const file of report.testResults ?? []) {
    for (const a of file.assertionResults ?? []) if (a.status === 'failed') failures.push(`${path.relative(root, file.name)} › ${a.fullName}`);
    // A file that failed to load has no assertions but must still count as a failure.
    if (file.status === 'failed' && (file.assertionResults ?? []).length === 0) {
      failed += 1;
      failures.push(`${path.relative(root, file.name)} (failed to load: ${String(file.message ?? '').split('\n')[0]})`);
    }
  }
  if (!ok && (report.numFailedTests ?? 0) === 0 && !(report.testResults ?? []).some((f) => f.status === 'failed')) {
    check(`${label}: vitest exited with an error`, false);
  }
}

function ensureChromium() {
  if (fs.existsSync(CHROMIUM)) return true;
  const isRoot = typeof process.getuid === 'function' && process.getuid() === 0;
  if (!isRoot) {
    console.error(`\nChromium is missing at ${CHROMIUM}. Install Debian's package and run again:\n  sudo apt-get update && sudo apt-get install -y chromium\n(or set CHROMIUM_PATH to an existing Chromium).`);
    return false;
  }
  console.log('\n▶ installing Debian chromium (apt-get)');
  const env = { DEBIAN_FRONTEND: 'noninteractive' };
  return run('apt-get update', 'apt-get', ['update', '-qq'], env) && run('apt-get install chromium', 'apt-get', ['install', '-y', '-qq', 'chromium'], env) && fs.existsSync(CHROMIUM);
}

const haveChromium = ensureChromium();
if (!haveChromium) process.exit(1);

check('type check', run('type check (tsc --noEmit)', 'npx', ['tsc', '--noEmit', '-p', 'tsconfig.json']));
check('lint', run('lint (eslint)', 'npx', ['eslint', '.', '--max-warnings=200']));
vitest('unit and server suites', ['unit', 'server'], 'vitest-unit-server.json');
const serverBuilt = run('server build (tsc -p tsconfig.server.json)', 'npx', ['tsc', '-p', 'tsconfig.server.json']);
check('server build', serverBuilt);
const webBuilt = run('web export (expo export --platform web)', process.execPath, ['scripts/buildWeb.mjs']);
check('web export', webBuilt);
if (serverBuilt && webBuilt) vitest('browser suites (headless Chromium)', ['e2e'], 'vitest-e2e.json');
else check('browser suites skipped: a build failed', false);

if (failures.length) {
  console.log('\nFailed:');
  for (const f of failures) console.log(`  ✗ ${f}`);
}
console.log(`\n${passed} passed, ${failed} failed`);
process.exit(failed === 0 ? 0 : 1);
