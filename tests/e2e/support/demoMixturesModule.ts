// Builds components/demoMixtureFiles.ts (peak lists) and components/demoSpectrumFiles.ts (spectra)
// from library-data/demo-mixtures: Metro bundles JSON but not .csv or .jdx, so the demo files travel
// inside generated modules (the app must analyse demos with no connection). Regenerate with:
//   node scripts/runTs.mjs tests/e2e/support/writeDemoMixturesModule.ts
// tests/e2e/analyseDemo.test.ts fails when the module is out of date.
import fs from 'node:fs';
import path from 'node:path';

export const ROOT_DIR = path.resolve(__dirname, '..', '..', '..');
export const DEMO_DIR = path.join(ROOT_DIR, 'library-data', 'demo-mixtures');
export const MODULE_PATH = path.join(ROOT_DIR, 'components', 'demoMixtureFiles.ts');
/** The demo spectra (JCAMP-DX text, ~0.5 MB): a module of their own, which the app loads on demand. */
export const SPECTRA_MODULE_PATH = path.join(ROOT_DIR, 'components', 'demoSpectrumFiles.ts');

interface ManifestMixture {
  id: string;
  name: string;
  demo: boolean;
  sample: string;
  files: { peaks: string | null; spectrum: string | null };
  solvent: string;
  reference: string;
  mhz: number;
  internalStandard?: { entryId: string; concentrationMM: number } | null;
}

export function demoManifest(): { mixtures: Array<ManifestMixture & Record<string, unknown>> } {
  return JSON.parse(fs.readFileSync(path.join(DEMO_DIR, 'manifest.json'), 'utf8'));
}

export function demoMixturesModuleText(): string {
  const items = demoManifest()
    .mixtures.filter((m) => m.files.peaks)
    .map((m) => ({
      id: m.id,
      title: m.name,
      description: m.sample,
      fileName: m.files.peaks!,
      solvent: m.solvent,
      mhz: m.mhz,
      standard: m.internalStandard ?? null,
      content: fs.readFileSync(path.join(DEMO_DIR, m.files.peaks!), 'utf8'),
      spectrumFileName: m.files.spectrum,
    }));
  return [
    '// GENERATED from library-data/demo-mixtures by tests/e2e/support/demoMixturesModule.ts — do not edit.',
    '// Invented demo data (Wrenfold Vale scenario): the peak lists of the demo mixtures, bundled for offline use.',
    'export const DEMO_MIXTURE_FILES = ' + JSON.stringify(items, null, 1) + ' as const;',
    '',
  ].join('\n');
}

export function demoSpectraModuleText(): string {
  const files: Record<string, string> = {};
  for (const m of demoManifest().mixtures) if (m.files.spectrum) files[m.files.spectrum] = fs.readFileSync(path.join(DEMO_DIR, m.files.spectrum), 'utf8');
  return [
    '// GENERATED from library-data/demo-mixtures by tests/e2e/support/demoMixturesModule.ts — do not edit.',
    '// Invented demo data (Wrenfold Vale scenario): the demo spectra (JCAMP-DX), by file name; loaded on demand.',
    'export const DEMO_SPECTRUM_FILES: Record<string, string> = ' + JSON.stringify(files) + ';',
    '',
  ].join('\n');
}
