// The `analyse` command run directly, on files made from the published contaminant table
// (Gottlieb 1997 / Fulmer 2010, Table 1, CDCl3 column) with known amounts.
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, beforeAll, describe, expect, it, vi } from 'vitest';
import { purityParse, run, standardParse } from '../../../cli/commands/analyse';
import { CAUTION_TEXT } from '../../../shared/caution';
import { contaminantLibrary, synthPeaks } from '../fit/contaminantLibrary';

const lib = contaminantLibrary();
const get = (id: string) => lib.find((e) => e.id === id)!;
let dir = '';
let libraryFile = '';
let mixtureFile = '';

beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'tessera-analyse-'));
  libraryFile = join(dir, 'library.json');
  writeFileSync(libraryFile, JSON.stringify({ format: 'tessera-library', version: 1, entries: lib }));
  const mix = synthPeaks([{ entry: get('ethanol'), amount: 2 }, { entry: get('ethyl-acetate'), amount: 1 }, { entry: get('1-4-dioxane'), amount: 0.5 }]);
  if (mix.kind !== 'peaks') throw new Error('peaks expected');
  mixtureFile = join(dir, 'mixture.csv');
  writeFileSync(mixtureFile, ['shift (ppm),height,width (Hz)', ...mix.peaks.map((p) => `${p.shift},${p.intensity},${p.widthHz}`)].join('\n'));
});

function capture() {
  const out: string[] = [];
  const err: string[] = [];
  vi.spyOn(console, 'log').mockImplementation((...a: unknown[]) => { out.push(a.join(' ')); });
  vi.spyOn(console, 'error').mockImplementation((...a: unknown[]) => { err.push(a.join(' ')); });
  return { out, err };
}
afterEach(() => vi.restoreAllMocks());

describe('tessera analyse', () => {
  it('parses --standard ID:CONC[:NUCLEI], ids with colons included', () => {
    expect(standardParse('dss:0.5:9')).toEqual({ entryId: 'dss', concentrationMM: 0.5, nuclei: 9 });
    expect(standardParse('reference:maleic-acid:D2O:2')).toEqual({ entryId: 'reference:maleic-acid:D2O', concentrationMM: 2 });
    expect(() => standardParse('dss')).toThrow('--standard must be ID:CONC_mM or ID:CONC_mM:NUCLEI (e.g. dss:0.5:9), got "dss"');
    expect(() => standardParse('dss:-1')).toThrow(/^--standard must be/);
  });
  it('parses --purity ID:MASS:STD_MASS:STD_PURITY', () => {
    expect(purityParse('reference:bz:D2O:12.05:10.12:0.9994')).toEqual({ entryId: 'reference:bz:D2O', analyteMassMg: 12.05, standardMassMg: 10.12, standardPurity: 0.9994 });
    expect(() => purityParse('bz:12:10:99.94')).toThrow(/^--purity must be ANALYTE_ID:MASS_mg:STANDARD_MASS_mg:STANDARD_PURITY/);
  });
  it('prints the purity line when masses are given', async () => {
    const { out } = capture();
    const code = await run(['--library', libraryFile, '--mixture', mixtureFile, '--mhz', '600.13', '--solvent', 'CDCl3', '--standard', '1-4-dioxane:2', '--purity', 'ethanol:20:10:0.999', '--decoys', '2']);
    expect(code).toBe(0);
    // w_A = (a_A/a_S)(M_A/M_S)(m_S/m_A)w_S = (2/0.5)(46.069/88.106)(10/20)(0.999) = 1.0447 (C 12.011, H 1.008, O 15.999)
    expect(out.join('\n')).toMatch(/Purity of ethanol: mass fraction 1\.044[67]/);
  });
  it('exits 2 with a message when a required flag is missing', async () => {
    const { err } = capture();
    expect(await run(['--mixture', 'x.csv'])).toBe(2);
    expect(err).toEqual(['error: --library L.json is required']);
  });
  it('exits 2 for a bad --decoys value, naming it', async () => {
    const { err } = capture();
    expect(await run(['--library', libraryFile, '--mixture', mixtureFile, '--decoys', '0'])).toBe(2);
    expect(err[0]).toBe('error: --decoys must be a whole number of decoy libraries between 1 and 200, got "0"');
  });
  it('exits 1 when the standard is not in the library', async () => {
    const { err } = capture();
    expect(await run(['--library', libraryFile, '--mixture', mixtureFile, '--mhz', '600.13', '--standard', 'nope:1'])).toBe(1);
    expect(err).toEqual(['error: internal standard "nope" is not in the library']);
  });
  it('prints the table with concentrations from the internal standard and the caution', async () => {
    const { out } = capture();
    const code = await run(['--library', libraryFile, '--mixture', mixtureFile, '--mhz', '600.13', '--solvent', 'CDCl3', '--standard', '1-4-dioxane:2', '--decoys', '4']);
    expect(code).toBe(0);
    const text = out.join('\n');
    expect(text).toContain(CAUTION_TEXT);
    // c = (I_A/I_S)(N_S/N_A)c_S: ethanol (2·5)/(0.5·8)·(8/5)·2 mM = 8 mM (BIPM ISRD-03 eq. 1).
    const row = text.split('\n').find((l) => l.startsWith('ethanol'))!;
    expect(row).toMatch(/\b8\.000\b/);
  });
  it('prints JSON with the curves', async () => {
    const { out } = capture();
    expect(await run(['--library', libraryFile, '--mixture', mixtureFile, '--mhz', '600.13', '--solvent', 'CDCl3', '--json', '--decoys', '2'])).toBe(0);
    const report = JSON.parse(out.join('\n'));
    expect(report.caution).toBe(CAUTION_TEXT);
    expect(report.fit.axis.length).toBeGreaterThan(100);
    expect(report.fit.components[0].curve.length).toBe(report.fit.axis.length);
    expect(report.fit.fittedSum.length).toBe(report.fit.axis.length);
    const ids = report.fit.components.map((c: { entryId: string }) => c.entryId).sort();
    expect(ids).toEqual(['1-4-dioxane', 'ethanol', 'ethyl-acetate']);
  });
});
