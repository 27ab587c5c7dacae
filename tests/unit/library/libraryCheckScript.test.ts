import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { ethanolEntry } from './helpers';

const ROOT = path.join(__dirname, '../../..');
const tmp = fs.mkdtempSync(path.join(os.tmpdir(), 'tessera-library-check-'));
afterAll(() => fs.rmSync(tmp, { recursive: true, force: true }));

function run(dir: string) {
  const r = spawnSync(process.execPath, [path.join(ROOT, 'scripts/runTs.mjs'), 'scripts/libraryCheck.ts', '--dir', dir], { cwd: ROOT, encoding: 'utf8' });
  return { code: r.status, out: r.stdout + r.stderr };
}

// The repository's own library is checked in-process by shippedLibrary.test.ts; this runs the script once (ts-node start-up is slow).
describe('npm run library:check', () => {
  it('when a folder holds a broken entry and a non-library file, then it prints a table of problems and exits 1', () => {
    const dir = path.join(tmp, 'bad');
    fs.mkdirSync(dir);
    const wrongH = ethanolEntry({ id: 'test:wrong-h', signals: [{ nucleus: '1H', shift: 1.25, multiplicity: 't', j: [7], nuclei: 3 }, { nucleus: '1H', shift: 3.72, multiplicity: 'q', j: [7], nuclei: 3 }] });
    fs.writeFileSync(path.join(dir, 'a.json'), JSON.stringify({ format: 'tessera-library', version: 1, entries: [wrongH] }));
    fs.writeFileSync(path.join(dir, 'b.json'), JSON.stringify({ hello: 'world' }));
    const { code, out } = run(dir);
    expect(code).toBe(1);
    expect(out).toMatch(/^file\s+entry\s+field\s+check\s+problem$/m);
    expect(out).toMatch(/^a\.json\s+test:wrong-h\s+signals\s+formula\s+1H signals not marked exchangeable hold 6 nuclei; formula C2H6O has 6 H, 1 of them on N\/O\/S \(exchangeable, from the smiles\), so 5 are expected$/m);
    expect(out).toMatch(/^b\.json\s+\(file\)\s+format\s+schema\s+format must be "tessera-library"$/m);
    expect(out).toContain('2 problem(s)');
  }, 30000);
});
