import fs from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { fitMixture } from '../../../matching/fit';
import { mixtureParseFile } from '../../../matching/io';
import type { LibraryEntry } from '../../../shared/libraryEntry';
import { buildDemoMixtures, DemoMixtureManifestSchema, loadLibrary, readRecipes, type DemoMixture } from '../../../scripts/buildDemoMixtures';

// The demo mixtures are simulated from known amounts, so the oracle is the recipe itself: an
// overlay fit (Lawson–Hanson NNLS) of the written files must give back the amounts put in.
const DIR = path.join(__dirname, '../../../library-data/demo-mixtures');
const manifest = DemoMixtureManifestSchema.parse(JSON.parse(fs.readFileSync(path.join(DIR, 'manifest.json'), 'utf8')));
const library = loadLibrary();

function read(m: DemoMixture, file: string) {
  return mixtureParseFile(file, fs.readFileSync(path.join(DIR, file), 'utf8'), { solvent: m.solvent, mhz: m.mhz, reference: m.reference, demo: true });
}

function fitted(m: DemoMixture, file: string, extra: LibraryEntry[] = []) {
  const candidates = [...m.components.map((c) => library.get(c.entryId)!), ...extra];
  const fit = fitMixture(read(m, file), candidates);
  const amount = new Map(fit.components.map((c) => [c.entryId, c]));
  return { fit, amount };
}

describe('demo mixtures', () => {
  it('are about ten invented samples, marked as demo, with peak lists for all and JCAMP-DX spectra for some', () => {
    expect(manifest.mixtures.length).toBeGreaterThanOrEqual(10);
    expect(manifest.note).toMatch(/Invented demo data/);
    expect(manifest.mixtures.filter((m) => m.files.spectrum !== null).length).toBeGreaterThanOrEqual(2);
    for (const m of manifest.mixtures) {
      expect(m.id).toMatch(/^demo-/);
      expect(m.name).toMatch(/^Demo mixture/);
      expect(fs.readFileSync(path.join(DIR, m.files.peaks), 'utf8')).toMatch(/^# Demo mixture .* INVENTED DEMO DATA/);
      if (m.files.spectrum) expect(fs.readFileSync(path.join(DIR, m.files.spectrum), 'utf8')).toContain('##$TESSERA DEMO=true');
      for (const c of m.components) expect(library.get(c.entryId)?.solvent, `${m.id} ${c.entryId}`).toBe(m.solvent);
    }
  });

  it('cover the hard cases: overlap, a minor component near S/N 10, a 0.02 ppm shift, an internal standard', () => {
    const all = manifest.mixtures;
    expect(all.some((m) => m.hardCases.some((h) => /overlap/.test(h)))).toBe(true);
    expect(all.some((m) => m.components.some((c) => c.role === 'analyte' && c.snr >= 8 && c.snr <= 12))).toBe(true);
    expect(all.some((m) => m.components.some((c) => c.shiftOffsetPpm === 0.02))).toBe(true);
    expect(all.filter((m) => m.internalStandard !== null).length).toBeGreaterThanOrEqual(1);
  });

  // Only the manifest is compared: the peak lists and JCAMP files also depend on the engine's
  // picker and writer, and `buildDemoMixtures.ts --check` compares those byte for byte.
  it('have the composition scripts/buildDemoMixtures.ts makes from recipes.json (seeded noise), and every file', () => {
    const { manifest: fresh, files } = buildDemoMixtures();
    expect(fresh).toEqual(manifest);
    for (const name of Object.keys(files)) expect(fs.existsSync(path.join(DIR, name)), name).toBe(true);
  }, 60000);

  it('refuse a recipe with a bad field, naming mixture and field', () => {
    const recipes = JSON.parse(fs.readFileSync(path.join(DIR, 'recipes.json'), 'utf8'));
    recipes.mixtures[1].mhz = -400;
    expect(() => readRecipes(JSON.stringify(recipes))).toThrow('recipes.json: mixtures[1].mhz: spectrometer frequency must be at least 10 MHz');
  });

  describe.each(manifest.mixtures.filter((m) => m.components.some((c) => c.role === 'analyte')).map((m) => [m.id, m] as const))('%s', (_id, m) => {
    const files = [
      // Spectra: every point is there, so the fit is tight. Picked peak lists lose overlapped lines;
      // a few percent of the mole fraction is the expected error (1D overlap-limited fitting, cf.
      // Lewis et al., Anal. Chem. 2007, 79, 9385, abstract: 16 % technical error in 1D).
      ...(m.files.spectrum ? [[m.files.spectrum, 0.01, 0.02] as const] : []),
      [m.files.peaks, 0.06, 0.12] as const,
    ];
    it.each(files)('%s gives back the analyte mole fractions, shifts and qNMR concentrations', (file, fractionTolerance, concentrationTolerance) => {
      const { amount } = fitted(m, file);
      const analytes = m.components.filter((c) => c.role === 'analyte');
      const total = analytes.reduce((s, c) => s + (amount.get(c.entryId)?.amountPerNucleus ?? 0), 0);
      for (const c of analytes) {
        const got = amount.get(c.entryId);
        expect(got, c.entryId).toBeDefined();
        expect(Math.abs(got!.amountPerNucleus / total - c.analyteMoleFraction!), c.entryId).toBeLessThanOrEqual(fractionTolerance);
        expect(Math.abs(got!.shiftOffsetPpm - c.shiftOffsetPpm), c.entryId).toBeLessThanOrEqual(0.006);
      }
      if (m.internalStandard) {
        // c_A = (I_A/I_S)·(N_S/N_A)·c_S (Tessera formulas.md (d); BIPM ISRD-03, Rapport BIPM-2018/05, eq. 1):
        // amounts per nucleus already carry N, so c_A = (a_A/a_S)·c_S.
        const standard = amount.get(m.internalStandard.entryId)!;
        for (const c of analytes) {
          const concentration = (amount.get(c.entryId)!.amountPerNucleus / standard.amountPerNucleus) * m.internalStandard.concentrationMM;
          expect(Math.abs(concentration / c.concentrationMM! - 1), c.entryId).toBeLessThanOrEqual(concentrationTolerance * (c.snr < 20 ? 3 : 1));
        }
      }
    });
  });

  it('the blank control explains its peaks without any demo compound of weight', () => {
    const m = manifest.mixtures.find((x) => x.id.startsWith('demo-11'))!;
    const demo = [...library.values()].filter((e) => e.category === 'demo' && e.solvent === m.solvent);
    const { fit } = fitted(m, m.files.peaks, demo);
    // An absent compound may pick up a sliver of noise; it must not explain real intensity.
    const demoFound = fit.components.filter((c) => c.entryId.startsWith('demo:'));
    for (const c of demoFound) expect({ id: c.entryId, weak: c.share < 0.01 && c.coverage < 0.5 }).toEqual({ id: c.entryId, weak: true });
    const found = fit.components.map((c) => c.entryId);
    expect(found).toEqual(expect.arrayContaining(['contaminant:acetic-acid:D2O', 'contaminant:ethanol:D2O']));
  });
});
