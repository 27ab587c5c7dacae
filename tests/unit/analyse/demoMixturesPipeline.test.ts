// The whole pipeline as a user runs it: every shipped demo mixture, the whole shipped library,
// default options. The oracle is each mixture's recipe (library-data/demo-mixtures/manifest.json):
// the demo samples are simulated from known amounts with seeded noise, so the analysis must name
// the analytes that were put in and give back their amounts, and must not report demo compounds
// that were not put in.
import fs from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { analyseMixture } from '../../../matching/analyse';
import { mixtureParseFile } from '../../../matching/io';
import { LibraryFileSchema, type LibraryEntry } from '../../../shared/libraryEntry';

const ROOT = path.resolve(__dirname, '../../..');
const DIR = path.join(ROOT, 'library-data', 'demo-mixtures');

interface ManifestComponent {
  entryId: string;
  role: string;
  analyteMoleFraction: number | null;
  concentrationMM: number | null;
  snr: number;
}
interface ManifestMixture {
  id: string;
  solvent: string;
  mhz: number;
  reference: string;
  files: { peaks: string; spectrum: string | null };
  internalStandard: { entryId: string; concentrationMM: number } | null;
  components: ManifestComponent[];
}

const manifest = JSON.parse(fs.readFileSync(path.join(DIR, 'manifest.json'), 'utf8')) as { mixtures: ManifestMixture[] };
const library: LibraryEntry[] = fs
  .readdirSync(path.join(ROOT, 'library-data'))
  .filter((f) => f.endsWith('.json'))
  .flatMap((f) => LibraryFileSchema.parse(JSON.parse(fs.readFileSync(path.join(ROOT, 'library-data', f), 'utf8'))).entries);

const cases = manifest.mixtures.flatMap((m) => [
  [m.id, m.files.peaks, m] as const,
  ...(m.files.spectrum ? [[m.id, m.files.spectrum, m] as const] : []),
]);

// Known limits, kept visible rather than skipped: `it.fails` turns red the day they are fixed.
// demo-05 as a picked 80 MHz peak list: in the crowded low-field list random decoy entries find
// as much support as the analytes (measured: 3 decoys in 20 sets outscore the best analyte, 11
// reach the weakest fitted target), so the analytes' q-values stay at 0.15. The same sample as a spectrum (.jdx) passes.
// (Its amounts passed once candidates with no line of their own were rejected: fitOwnLines.)
// See README, "Limits".
const KNOWN_LIMITS: Record<string, Set<'amounts' | 'qvalues'>> = {
  'demo-05-oil-benchtop-WV-O-0040.csv': new Set(['qvalues']),
};
const check = (file: string, what: 'amounts' | 'qvalues') => (KNOWN_LIMITS[file]?.has(what) ? it.fails : it);

describe.each(cases)('analyse %s (%s) against the whole shipped library', (_id, file, m) => {
  const report = () => {
    const mixture = mixtureParseFile(file, fs.readFileSync(path.join(DIR, file), 'utf8'), { solvent: m.solvent, mhz: m.mhz, reference: m.reference, demo: true } as never);
    return analyseMixture(mixture, library, m.internalStandard ? { standard: { entryId: m.internalStandard.entryId, concentrationMM: m.internalStandard.concentrationMM } } : {});
  };

  it('names every analyte that was put in, and no demo compound that was not', () => {
    const r = report();
    const fitted = new Set(r.fit.components.map((c) => c.entryId));
    const analytes = m.components.filter((c) => c.role === 'analyte');
    for (const a of analytes) expect(fitted.has(a.entryId), `${a.entryId} (S/N ${a.snr}) missing`).toBe(true);
    const putIn = new Set(m.components.map((c) => c.entryId));
    // A look-alike of a put-in compound is acceptable only when the report says plainly that the
    // two cannot be told apart (one indistinguishable set, member flagged not identifiable).
    const flaggedWithPutIn = (id: string) => {
      const row = r.amounts.find((a) => a.entryId === id);
      const set = r.indistinguishable?.find((x) => x.id === row?.indistinguishableSet);
      return row?.identifiable === false && set !== undefined && set.members.some((m) => m !== id && putIn.has(m));
    };
    const extraDemo = r.fit.components.filter((c) => c.entryId.startsWith('demo:') && !putIn.has(c.entryId) && c.share >= 0.01 && !flaggedWithPutIn(c.entryId));
    expect(extraDemo.map((c) => `${c.entryId} ${(100 * c.share).toFixed(1)}%`)).toEqual([]);
  });

  check(file, 'amounts')('gives back the analytes’ mole fractions (and qNMR concentrations where a standard is named)', () => {
    const r = report();
    const byId = new Map(r.amounts.map((a) => [a.entryId, a]));
    // Picked peak lists lose overlapped lines; 1D overlap-limited fitting has errors of several
    // percent (Lewis et al., Anal. Chem. 2007, 79, 9385, abstract: 16 % technical error in 1D).
    const tol = file.endsWith('.jdx') ? 0.03 : 0.08;
    for (const a of m.components.filter((c) => c.role === 'analyte')) {
      const got = byId.get(a.entryId);
      expect(got, a.entryId).toBeDefined();
      expect(Math.abs(got!.moleFraction - a.analyteMoleFraction!), `${a.entryId}: ${got!.moleFraction} vs ${a.analyteMoleFraction}`).toBeLessThanOrEqual(tol);
      if (m.internalStandard && a.concentrationMM) {
        expect(got!.concentrationMM, a.entryId).not.toBeNull();
        const rel = Math.abs(got!.concentrationMM! / a.concentrationMM - 1);
        expect(rel, `${a.entryId}: ${got!.concentrationMM} mM vs ${a.concentrationMM} mM`).toBeLessThanOrEqual(a.snr < 20 ? 0.3 : 0.1);
      }
    }
  });

  check(file, 'qvalues')('gives the analytes that were put in with S/N ≥ 20 a small q-value', () => {
    const r = report();
    const q = new Map(r.qValues.map((x) => [x.entryId, x.qValue]));
    for (const a of m.components.filter((c) => c.role === 'analyte' && c.snr >= 20)) {
      expect(q.get(a.entryId), `${a.entryId} q`).toBeLessThanOrEqual(0.05);
    }
  });
});
