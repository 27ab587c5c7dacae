import fs from 'node:fs';
import path from 'node:path';
import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { LibraryFileSchema, type LibraryEntry } from '../../../shared/libraryEntry';
import { buildContaminants } from '../../../scripts/buildContaminants';

// The oracle is the published tables themselves, through our copy (one row per group,
// with its paper): H. E. Gottlieb, V. Kotlyar, A. Nudelman, J. Org. Chem. 1997, 62, 7512, Table 1;
// G. R. Fulmer et al., Organometallics 2010, 29, 2176, Table 1.
const ROOT = path.join(__dirname, '../../..');
const TSV = fs.readFileSync(path.join(ROOT, 'library-data/sources/solvent-impurities-1h.tsv'), 'utf8');
const file = LibraryFileSchema.parse(JSON.parse(fs.readFileSync(path.join(ROOT, 'library-data/contaminants.json'), 'utf8')));
const rows = Papa.parse<Record<string, string>>(TSV, { header: true, delimiter: '\t', skipEmptyLines: true }).data;
const COLUMNS: Record<string, LibraryEntry['solvent']> = { CDCl3: 'CDCl3', '(CD3)2CO': 'acetone-d6', '(CD3)2SO': 'DMSO-d6', C6D6: 'C6D6', CD3CN: 'CD3CN', CD3OD: 'CD3OD', D2O: 'D2O' };
const CITES: Record<string, string> = { Gottlieb1997: 'Gottlieb, V. Kotlyar, A. Nudelman, J. Org. Chem. 1997, 62, 7512, Table 1', Fulmer2010: 'Fulmer et al., Organometallics 2010, 29, 2176, Table 1' };

function printed(value: string): number {
  const range = /^(-?[\d.]+)-([\d.]+)$/.exec(value);
  return range ? (Number(range[1]) + Number(range[2])) / 2 : Number(value);
}

describe('contaminants.json', () => {
  it('is what scripts/buildContaminants.ts makes of the committed TSV', () => {
    expect(JSON.parse(fs.readFileSync(path.join(ROOT, 'library-data/contaminants.json'), 'utf8'))).toEqual(buildContaminants(TSV));
  });

  it('holds only contaminant entries at 300 MHz that cite Gottlieb 1997 and/or Fulmer 2010 Table 1', () => {
    expect(file.entries.length).toBeGreaterThan(300);
    for (const e of file.entries) {
      expect(e.category, e.id).toBe('contaminant');
      expect(e.mhz, e.id).toBe(300);
      expect(e.source, e.id).toMatch(/Gottlieb, V\. Kotlyar, A\. Nudelman, J\. Org\. Chem\. 1997, 62, 7512, Table 1|Fulmer et al\., Organometallics 2010, 29, 2176, Table 1/);
    }
  });

  it('reproduces every printed shift, group and nuclei count of the TSV in its solvent, citing the row\'s paper', () => {
    let checked = 0;
    for (const row of rows) {
      for (const [column, solvent] of Object.entries(COLUMNS)) {
        const value = row[column]?.trim();
        if (!value) continue;
        const shift = printed(value);
        const papers = row.source.split(';').map((s) => CITES[s.trim()]);
        const hit = file.entries.find(
          (e) =>
            e.solvent === solvent &&
            papers.every((p) => e.source.includes(p)) &&
            e.signals.some((s) => s.nucleus === '1H' && s.label === row.group.trim() && Math.abs(s.shift - shift) < 1e-9 && (row.nH.trim() === '' || s.nuclei === Number(row.nH))),
        );
        expect(hit, `${row.compound} ${row.group} ${column} ${value}`).toBeDefined();
        checked++;
      }
    }
    expect(checked).toBeGreaterThan(400);
  });

  it('keeps a Gottlieb value and its Fulmer correction apart, marked as knowingly close', () => {
    const byId = new Map(file.entries.map((e) => [e.id, e]));
    // Acetic acid CH3 in C6D6: 1.55 (Gottlieb 1997 Table 1) vs 1.52 (Fulmer 2010 Table 1).
    expect(byId.get('contaminant:acetic-acid:C6D6')?.signals[0]).toMatchObject({ shift: 1.55, nuclei: 3 });
    expect(byId.get('contaminant:acetic-acid:C6D6:fulmer2010')?.signals[0]).toMatchObject({ shift: 1.52, nuclei: 3 });
    expect(byId.get('contaminant:acetic-acid:C6D6:fulmer2010')?.nearDuplicateOf).toContain('contaminant:acetic-acid:C6D6');
    // Ethyl acetate in CDCl3: 2.05 s, 4.12 q (J 7), 1.26 t (J 7) (Gottlieb 1997 Table 1).
    expect(byId.get('contaminant:ethyl-acetate:CDCl3')?.signals).toEqual([
      { nucleus: '1H', shift: 2.05, multiplicity: 's', j: [], nuclei: 3, label: 'CH3CO' },
      { nucleus: '1H', shift: 4.12, multiplicity: 'q', j: [7], nuclei: 2, label: 'OCH2CH3' },
      { nucleus: '1H', shift: 1.26, multiplicity: 't', j: [7], nuclei: 3, label: 'OCH2CH3' },
    ]);
    // Water in DMSO-d6 3.33 and HDO in D2O 4.79 (Gottlieb 1997 Table 1): exchangeable.
    expect(byId.get('contaminant:water:DMSO-d6')?.signals[0]).toMatchObject({ shift: 3.33, exchangeable: true });
    expect(byId.get('contaminant:residual-hdo:D2O')?.signals[0]).toMatchObject({ shift: 4.79, exchangeable: true });
  });

  it('refuses a TSV row it has no formula for, naming the line', () => {
    const row = ['unobtainium', 'CH', 's', '1', '', '1.00', '', '', '', '', '', '', 'Gottlieb1997', 'source-text', ''];
    const bad = TSV.replace(/\n$/, '') + '\n' + row.join('\t') + '\n';
    expect(() => buildContaminants(bad)).toThrow(/^solvent-impurities-1h\.tsv line 100, compound: no formula\/SMILES known for "unobtainium"/);
  });

  it('refuses a shift that is not a number, naming line and column', () => {
    const bad = TSV.replace('acetone\tCH3\ts\t6\t\t2.17', 'acetone\tCH3\ts\t6\t\t2,17');
    expect(() => buildContaminants(bad)).toThrow(/^solvent-impurities-1h\.tsv line \d+, CDCl3: "2,17" is not a shift in ppm$/);
  });
});
