import { mkdtempSync, readFileSync, writeFileSync, existsSync, copyFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import Papa from 'papaparse';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { run as batch } from '../../../cli/commands/batch';
import { run as screen, screenResultTable } from '../../../cli/commands/screen';
import { spectrumToJcamp } from '../../../matching/io';
import { CAUTION_TEXT } from '../../../shared/caution';
import { synthSpectrum } from '../../fixtures/screen/synthSpectrum';

const FIX = path.join(__dirname, '../../fixtures/screen');
const LIB = path.join(FIX, 'library-small.json');
const MIX = path.join(FIX, 'mixture-etoac-toluene.csv');

let out: string[];
let err: string[];
beforeEach(() => {
  out = [];
  err = [];
  vi.spyOn(console, 'log').mockImplementation((...a: unknown[]) => void out.push(a.join(' ')));
  vi.spyOn(console, 'error').mockImplementation((...a: unknown[]) => void err.push(a.join(' ')));
});
afterEach(() => vi.restoreAllMocks());

function tmp(): string {
  return mkdtempSync(path.join(os.tmpdir(), 'tessera-cli-'));
}

describe('tessera screen', () => {
  it('exits 2 with a message when a required flag is missing or a value is bad', async () => {
    expect(await screen(['--mixture', MIX])).toBe(2);
    expect(err).toEqual(['error: --library L.json is required']);
    err.length = 0;
    expect(await screen(['--library', LIB, '--mixture', MIX, '--tolerance', 'abc'])).toBe(2);
    expect(err).toEqual(['error: --tolerance must be a positive number of ppm (at most 10), got "abc"']);
    err.length = 0;
    expect(await screen(['--library', LIB, '--mixture', MIX, '--solvent', 'CCl4'])).toBe(2);
    expect(err[0]).toBe('error: --solvent must be one of CDCl3, acetone-d6, DMSO-d6, C6D6, CD3CN, CD3OD, D2O, other, got "CCl4"');
    err.length = 0;
    expect(await screen(['--library', LIB, '--mixture', MIX, '--colour'])).toBe(2);
    expect(err[0]).toMatch(/^error: Unknown option '--colour'/);
  });

  it('exits 1 naming the file and the bad line', async () => {
    const dir = tmp();
    const bad = path.join(dir, 'bad.csv');
    writeFileSync(bad, 'shift;intensity\n2,17;6\nx;1\n');
    expect(await screen(['--library', LIB, '--mixture', bad, '--mhz', '600'])).toBe(1);
    expect(err).toEqual(['error: peak list: line 3: shift "x" is not a number']);
    expect(out).toEqual([]);
  });

  it('exits 1 with the schema path when the library is invalid', async () => {
    const dir = tmp();
    const lib = path.join(dir, 'lib.json');
    writeFileSync(lib, JSON.stringify({ format: 'tessera-library', version: 1, entries: [{ id: 'x' }] }));
    expect(await screen(['--library', lib, '--mixture', MIX, '--mhz', '600'])).toBe(1);
    expect(err[0]).toMatch(/^error: library .*lib\.json has \d+ problems: entries\.0\.name: /);
    writeFileSync(lib, '{ not json');
    expect(await screen(['--library', lib, '--mixture', MIX])).toBe(1);
    expect(err[1]).toMatch(/^error: library .*lib\.json: not valid JSON/);
  });

  // Shifts of the fixture: Gottlieb et al., J. Org. Chem. 1997, 62, 7512, Table 1 (CDCl3).
  it('prints a ranked table with the caution', async () => {
    expect(await screen(['--library', LIB, '--mixture', MIX, '--solvent', 'CDCl3', '--mhz', '600'])).toBe(0);
    const text = out.join('\n');
    const rows = text.split('\n').filter((l) => /^\d+\s/.test(l));
    // tert-butyl alcohol 1.28 lies 0.02 ppm from the ethyl acetate triplet centre 1.26 (Gottlieb 1997): reported, flagged
    expect(rows.map((r) => r.split(/\s{2,}/)[5])).toEqual(['contam-ethyl-acetate-cdcl3', 'contam-toluene-cdcl3', 'contam-tert-butyl-alcohol-cdcl3']);
    expect(rows[2]).toMatch(/shadowed by contam-ethyl-acetate-cdcl3$/);
    expect(text).toContain('Set aside: 0.000 (reference), 1.560 (water), 7.250 (solvent), 7.260 (solvent)');
    expect(text.trimEnd().endsWith(CAUTION_TEXT)).toBe(true);
  });

  it('prints JSON with evidence and the caution', async () => {
    expect(await screen(['--library', LIB, '--mixture', MIX, '--solvent', 'CDCl3', '--mhz', '600', '--json', '--tolerance', '0.02'])).toBe(0);
    const r = JSON.parse(out.join('\n'));
    expect(r.tolerancePpm).toBe(0.02);
    expect(r.candidates[0]).toMatchObject({ entryId: 'contam-ethyl-acetate-cdcl3', contaminant: true });
    expect(r.candidates[0].evidence).toHaveLength(3);
    expect(r.caution).toBe(CAUTION_TEXT);
  });

  it('notes the assumed frequency for a peak list without --mhz', async () => {
    expect(await screen(['--library', LIB, '--mixture', MIX])).toBe(0);
    expect(err).toEqual(['note: mixture-etoac-toluene.csv does not say its spectrometer frequency; assuming 400 MHz (use --mhz)']);
  });

  it('reports an ambiguity group for two entries that are one singlet at 2.17 ppm', async () => {
    const dir = tmp();
    const m = path.join(dir, 'acetone.csv');
    writeFileSync(m, 'shift,intensity\n2.17,6\n');
    expect(await screen(['--library', LIB, '--mixture', m, '--solvent', 'CDCl3', '--mhz', '400'])).toBe(0);
    expect(out.join('\n')).toContain('Group G1: contam-acetone-cdcl3, demo-acetone-twin explain the same peaks and cannot be told apart here.');
  });
});

describe('screen table', () => {
  it('warns about a crowded mixture, and still lists the best when more reach the threshold than are shown', async () => {
    const dir = tmp();
    const m = path.join(dir, 'comb.csv');
    // A line every 0.02 ppm over 0.5–10 ppm: every ±0.03 ppm window holds a peak.
    writeFileSync(m, 'shift,intensity\n' + Array.from({ length: 476 }, (_, i) => `${(0.5 + i * 0.02).toFixed(2)},1`).join('\n') + '\n');
    expect(await screen(['--library', LIB, '--mixture', m, '--solvent', 'CDCl3', '--mhz', '600', '--json'])).toBe(0);
    const r = JSON.parse(out.join('\n'));
    expect(r.crowding.warning).toMatch(/^crowded mixture for ±0.03 ppm/);
    const text = screenResultTable({ ...r, candidatesAboveThreshold: r.candidates.length + 7 });
    expect(text).toContain('Warning: crowded mixture for ±0.03 ppm');
    expect(text).toContain(`${r.candidates.length + 7} entries reach the threshold; the best ${r.candidates.length} are shown.`);
    expect(text.split('\n').filter((l) => /^\d+\s+\d\.\d{3}\s/.test(l))).toHaveLength(r.candidates.length);
  });
});

describe('tessera batch', () => {
  it('refuses a missing --out and an empty folder', async () => {
    expect(await batch(['--library', LIB, '--folder', FIX])).toBe(2);
    expect(err).toEqual(['error: --out summary.csv is required']);
    const dir = tmp();
    expect(await batch(['--library', LIB, '--folder', dir, '--out', path.join(dir, 's.csv')])).toBe(2);
    expect(err[1]).toBe(`error: no mixture files (.csv, .tsv, .txt, .jdx, .dx) in ${dir}`);
  });

  it('screens every file of a folder into one summary CSV', async () => {
    const dir = tmp();
    copyFileSync(MIX, path.join(dir, 'a-etoac-toluene.csv'));
    writeFileSync(path.join(dir, 'b-nothing.csv'), 'shift,intensity\n9.9,1\n');
    const spectrum = synthSpectrum([{ shift: 2.17, height: 100 }], { from: 1.5, to: 3, hzPerPoint: 0.4, mhz: 400, widthHz: 1, solvent: 'CDCl3', name: 'acetone spectrum' });
    writeFileSync(path.join(dir, 'c-acetone.jdx'), spectrumToJcamp(spectrum));
    const summary = path.join(dir, 'summary.csv');
    expect(await batch(['--library', LIB, '--folder', dir, '--out', summary, '--mhz', '600', '--solvent', 'CDCl3'])).toBe(0);
    const text = readFileSync(summary, 'utf8');
    expect(text.split('\n')[0]).toBe(`# ${CAUTION_TEXT}`);
    const rows = Papa.parse<Record<string, string>>(text, { header: true, comments: '#', skipEmptyLines: true }).data;
    expect(rows.filter((r) => r.file === 'a-etoac-toluene.csv').map((r) => [r.entry_id, r.shadowed_by])).toEqual([
      ['contam-ethyl-acetate-cdcl3', ''],
      ['contam-toluene-cdcl3', ''],
      ['contam-tert-butyl-alcohol-cdcl3', 'contam-ethyl-acetate-cdcl3'],
    ]);
    expect(rows.filter((r) => r.file === 'b-nothing.csv')).toEqual([expect.objectContaining({ rank: '', entry_id: '' })]);
    // One peak at 9.9 ppm: no library window holds it by chance.
    expect(rows.find((r) => r.file === 'b-nothing.csv')!.window_hit_share).toBe('0.000');
    const acetone = rows.filter((r) => r.file === 'c-acetone.jdx');
    expect(acetone.map((r) => r.entry_id).sort()).toEqual(['contam-acetone-cdcl3', 'demo-acetone-twin']);
    expect(acetone.every((r) => r.ambiguity_group === 'G1')).toBe(true);
    expect(out.at(-1)).toBe(CAUTION_TEXT);
  });

  it('writes nothing when one file is bad, and names it', async () => {
    const dir = tmp();
    copyFileSync(MIX, path.join(dir, 'a.csv'));
    writeFileSync(path.join(dir, 'b.csv'), 'shift,intensity\n2.17,-6\n');
    const summary = path.join(dir, 'summary.csv');
    expect(await batch(['--library', LIB, '--folder', dir, '--out', summary, '--mhz', '600'])).toBe(1);
    expect(err).toEqual(['error: b.csv: peak list: line 2: intensity must be ≥ 0, got -6', '1 of 2 files could not be read; nothing written.']);
    expect(existsSync(summary)).toBe(false);
  });
});

describe('tessera screen with several libraries', () => {
  it('reads every --library and refuses an id found twice', async () => {
    const dir = tmp();
    const m = path.join(dir, 'acetone.csv');
    writeFileSync(m, 'shift,intensity\n2.17,6\n');
    expect(await screen(['--library', LIB, '--library', LIB, '--mixture', m, '--mhz', '400'])).toBe(1);
    expect(err.at(-1)).toMatch(/^error: library .*library-small\.json: id: entry id "contam-acetone-cdcl3" is also in .*library-small\.json$/);
  });
});
