import fs from 'node:fs';
import path from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { libraryCheck, smilesCountAtoms as warmUp } from '../../../matching/library';
import { OPENCHEMLIB_WARM_UP_MS } from './helpers';
import { LibraryFileSchema, type LibraryEntry } from '../../../shared/libraryEntry';

const DIR = path.join(__dirname, '../../../library-data');
const files = fs.readdirSync(DIR).filter((f) => f.endsWith('.json')).sort();
const raw = files.flatMap((f) => (JSON.parse(fs.readFileSync(path.join(DIR, f), 'utf8')) as { entries: unknown[] }).entries);
const entries: LibraryEntry[] = files.flatMap((f) => LibraryFileSchema.parse(JSON.parse(fs.readFileSync(path.join(DIR, f), 'utf8'))).entries);

describe('the library shipped in library-data/', () => {
  beforeAll(() => void warmUp('C'), OPENCHEMLIB_WARM_UP_MS);

  it('holds the demo, reference and contaminant files, each in the library file format', () => {
    expect(files).toEqual(expect.arrayContaining(['contaminants.json', 'demo-entries.json']));
    for (const f of files) expect(() => LibraryFileSchema.parse(JSON.parse(fs.readFileSync(path.join(DIR, f), 'utf8'))), f).not.toThrow();
  });

  it('passes every soundness check, across files', () => {
    expect(libraryCheck(raw)).toEqual([]);
  }, 60000); // openchemlib's first load takes seconds on a busy machine

  it('marks every demo entry as invented, with a name nobody takes for a real compound', () => {
    const demo = entries.filter((e) => e.category === 'demo');
    expect(demo.length).toBeGreaterThanOrEqual(40);
    for (const e of demo) {
      expect(e.id, e.id).toMatch(/^demo:/);
      expect(e.name, e.id).toMatch(/^Demo: /);
      expect(e.source, e.id).toContain('invented demo entry');
      expect(e.notes, e.id).toContain('Invented for the Tessera demo');
    }
    const demoIds = entries.filter((e) => e.id.startsWith('demo:')).map((e) => e.category);
    expect(new Set(demoIds)).toEqual(new Set(['demo']));
  });

  it('covers several solvents, 13C lists with carbon types, knowingly similar pairs and a qNMR standard', () => {
    const demo = entries.filter((e) => e.category === 'demo');
    expect(new Set(demo.map((e) => e.solvent))).toEqual(new Set(['CDCl3', 'D2O', 'DMSO-d6', 'CD3OD']));
    expect(demo.filter((e) => e.signals.some((s) => s.nucleus === '13C' && s.carbonType)).length).toBeGreaterThanOrEqual(5);
    expect(demo.filter((e) => (e.nearDuplicateOf ?? []).length > 0).length).toBeGreaterThanOrEqual(4);
    expect(demo.every((e) => e.signals.some((s) => s.nucleus === '1H' && s.multiplicity !== 's' && s.j.length > 0))).toBe(true);
    const standards = entries.filter((e) => e.category === 'reference');
    expect(standards.map((e) => e.id)).toContain('reference:maleic-acid:D2O');
    for (const e of standards) expect(e.source, e.id).toMatch(/from memory|common practice/);
  });
});
