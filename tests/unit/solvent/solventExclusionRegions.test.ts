import { readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { solventExclusionRegions, SOLVENT_RESIDUAL_SIGNALS } from '../../../matching/solvent';

describe('solventExclusionRegions', () => {
  it('has no regions for an unnamed solvent', () => {
    expect(solventExclusionRegions('other', '1H')).toEqual([]);
  });

  it('rejects bad widths and frequencies', () => {
    expect(() => solventExclusionRegions('CDCl3', '1H', { mhz: 0 })).toThrow('spectrometer frequency must be positive, got 0');
    expect(() => solventExclusionRegions('CDCl3', '1H', { halfWidthPpm: -1 })).toThrow('halfWidthPpm must be ≥ 0, got -1');
  });

  // Gottlieb et al., J. Org. Chem. 1997, 62, 7512, Table 1: CHCl3 7.26, H2O 1.56 in CDCl3.
  it('covers residual CHCl3 and water in CDCl3', () => {
    const r = solventExclusionRegions('CDCl3', '1H', { halfWidthPpm: 0.03 });
    const chcl3 = r.find((x) => x.kind === 'solvent')!;
    expect(chcl3.from).toBeCloseTo(7.23, 10);
    expect(chcl3.to).toBeCloseTo(7.29, 10);
    const water = r.find((x) => x.kind === 'water')!;
    expect([water.from, water.to]).toEqual([expect.closeTo(1.51, 10), expect.closeTo(1.61, 10)]);
    expect(chcl3.label).toBe('residual CHCl3 7.26 ppm (Gottlieb 1997; Fulmer 2010, Table 1)');
  });

  // The CHD2 quintet (2·1 D, spin 1 → 5 lines) spans ±2J; J(H,D) 1.9 Hz is from memory.
  it('widens a deuterium-split quintet by its own extent at the given frequency', () => {
    const [dmso] = solventExclusionRegions('DMSO-d6', '1H', { mhz: 100, halfWidthPpm: 0 });
    expect(dmso.to - dmso.from).toBeCloseTo((2 * 2 * 1.9) / 100, 10);
  });

  // Every 1H residual and water shift equals the published table (copy in tests/fixtures/screen).
  it('matches the published residual-solvent and water rows of Gottlieb 1997 / Fulmer 2010 Table 1', () => {
    const tsv = readFileSync(path.join(__dirname, '../../fixtures/screen/solvent-impurities-1h.tsv'), 'utf8').split('\n').filter((l) => l && !l.startsWith('#'));
    const head = tsv[0].split('\t');
    const col: Record<string, number> = { CDCl3: head.indexOf('CDCl3'), 'acetone-d6': head.indexOf('(CD3)2CO'), 'DMSO-d6': head.indexOf('(CD3)2SO'), C6D6: head.indexOf('C6D6'), CD3CN: head.indexOf('CD3CN'), CD3OD: head.indexOf('CD3OD'), D2O: head.indexOf('D2O') };
    const published = (prefix: string, solvent: string) => tsv.filter((l) => l.startsWith(prefix)).map((l) => Number(l.split('\t')[col[solvent]])).filter((v) => v > 0);
    const oneH = SOLVENT_RESIDUAL_SIGNALS.filter((r) => r.nucleus === '1H');
    expect(oneH.length).toBe(15);
    for (const r of oneH) {
      const candidates = r.kind === 'water' ? [...published('water', r.solvent), ...published('residual HDO', r.solvent)] : published('residual', r.solvent);
      expect(candidates, `${r.solvent} ${r.what}`).toContain(r.shift);
    }
  });

  it('gives 13C regions for the solvent carbons (values from memory)', () => {
    const r = solventExclusionRegions('CDCl3', '13C', { mhz: 400 });
    expect(r).toHaveLength(1);
    expect(r[0].from).toBeLessThan(77.16);
    expect(r[0].to).toBeGreaterThan(77.16);
    expect(solventExclusionRegions('D2O', '13C')).toEqual([]);
  });
});
