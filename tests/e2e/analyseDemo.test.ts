// Analysing a shipped demo mixture on the device: the compounds its recipe put in are found and
// their amounts come back. The expectation is read from library-data/demo-mixtures/manifest.json
// (written by the demo generator from the recipe), never typed here.
import fs from 'node:fs';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startServer, type RunningServer } from './support/server';
import { openBrowser, overflowsHorizontally, screenshot, signIn, type ViewportName } from './support/browser';
import { DEMO_DIR, MODULE_PATH, SPECTRA_MODULE_PATH, demoManifest, demoMixturesModuleText, demoSpectraModuleText } from './support/demoMixturesModule';

interface Component {
  entryId: string;
  name: string;
  role: string;
  analyteMoleFraction: number | null;
  concentrationMM: number | null;
  snr: number;
}

/** Quantifiable analytes of a demo mixture: S/N ≥ 10 (ICH Q2(R1) quantitation limit, common practice). */
function expected(id: string): { title: string; analytes: Component[]; standard: boolean } {
  const m = demoManifest().mixtures.find((x) => x.id === id);
  if (!m) throw new Error(`demo mixture ${id} is not in the manifest`);
  const comps = (m.components as Component[]).filter((c) => c.role === 'analyte' && c.analyteMoleFraction !== null);
  return { title: m.name, analytes: comps, standard: !!m.internalStandard };
}

const CASES: Array<{ viewport: ViewportName; mixture: string }> = [
  { viewport: 'phone', mixture: 'demo-01-honey-WV-H-0412' },
  { viewport: 'wide', mixture: 'demo-06-extract-WV-X-0102' },
];

describe('analyse a demo mixture', () => {
  let server: RunningServer;
  beforeAll(async () => {
    server = await startServer();
  });
  afterAll(async () => {
    await server?.stop();
  });

  it('the bundled demo peak lists and spectra are the ones in library-data (regenerate with writeDemoMixturesModule.ts)', () => {
    expect(fs.readFileSync(MODULE_PATH, 'utf8')).toBe(demoMixturesModuleText());
    expect(fs.readFileSync(SPECTRA_MODULE_PATH, 'utf8')).toBe(demoSpectraModuleText());
  });

  it.each(CASES)('when the analyst analyses $mixture at $viewport size, then its compounds rank at the top with their amounts', async ({ viewport, mixture }) => {
    const want = expected(mixture);
    expect(want.analytes.length).toBeGreaterThan(0);
    const { page, close } = await openBrowser(viewport);
    try {
      // No library from the server at all: the device starts from the snapshot shipped in the app.
      await page.route(/\/api\/(sync|library)/, (route) => route.abort('internetdisconnected'));
      await signIn(page, server.url, 'analyst@demo.tessera.test');
      await page.getByLabel('Entries on this device').waitFor({ timeout: 30_000 });
      await expect.poll(() => page.getByText(/offline or the server is down/).count(), { timeout: 15_000 }).toBeGreaterThan(0);
      await page.goto(`${server.url}/analyse`);
      await page.getByLabel('Mixture from: demo mixtures').click();
      await page.getByLabel(`Demo mixture ${want.title}`, { exact: true }).click();
      await screenshot(page, `analyse-${viewport}`);
      await page.getByRole('button', { name: 'Run analysis' }).click();
      await page.getByLabel('Candidates').first().waitFor({ timeout: 90_000 });
      await page.getByLabel('Caution').first().waitFor();
      // The engine ran in the web worker Metro bundled for it, not on the page's thread.
      const scripts = await page.evaluate(() => performance.getEntriesByType('resource').map((e) => e.name));
      expect(scripts.some((u) => /\/analysis-[0-9a-f]+\.js$/.test(u))).toBe(true);
      expect(await overflowsHorizontally(page)).toBe(false);
      await screenshot(page, `result-${viewport}`);

      // Confirmed rows are drawn first by rank; read each analyte's row and amount.
      const found: Record<string, number> = {};
      for (const a of want.analytes) {
        const row = page.getByLabel(`Candidate ${a.name}`, { exact: true });
        await expect.poll(() => row.count(), { message: `${a.name} is among the candidates` }).toBe(1);
        expect(await row.innerText()).toContain('confirmed by fit');
        const amount = (await page.getByLabel(`Amount of ${a.name}`, { exact: true }).innerText()).trim();
        found[a.entryId] = Number(amount.split(' ')[0]);
        expect(Number.isFinite(found[a.entryId]), `amount of ${a.name}: "${amount}"`).toBe(true);
      }
      // The recipe states mole fractions among its analytes; the app's are among every fitted
      // compound, so compare after renormalising over the recipe's analytes. Peak lists lose
      // overlapped lines: ±0.06 is the error the engine's own demo test allows for them (1D
      // overlap-limited fitting, Lewis et al., Anal. Chem. 2007, 79, 9385).
      const sum = Object.values(found).reduce((s, v) => s + v, 0);
      for (const a of want.analytes) {
        expect(Math.abs(found[a.entryId] / sum - a.analyteMoleFraction!), `${a.name}`).toBeLessThanOrEqual(0.06);
      }
      // With an internal standard: concentrations by the qNMR equation, within the engine demo
      // test's 12 % for peak lists (three times that below S/N 20, near the quantitation limit).
      if (want.standard) {
        for (const a of want.analytes) {
          const text = (await page.getByLabel(`Concentration of ${a.name}`, { exact: true }).innerText()).trim();
          const c = Number(text.split(' ')[0]);
          expect(Math.abs(c / a.concentrationMM! - 1), `${a.name}: ${text}`).toBeLessThanOrEqual(a.snr < 20 ? 0.36 : 0.12);
        }
      }

      // Drag across the overlay plot to zoom into a region; then back to the whole spectrum.
      const plot = page.getByLabel('Overlay plot', { exact: true });
      await plot.scrollIntoViewIfNeeded();
      const before = await page.getByLabel('Visible range').first().innerText();
      const box = (await plot.boundingBox())!;
      await page.mouse.move(box.x + box.width * 0.3, box.y + box.height / 2);
      await page.mouse.down();
      await page.mouse.move(box.x + box.width * 0.5, box.y + box.height / 2, { steps: 5 });
      await page.mouse.up();
      await page.getByRole('button', { name: 'Whole spectrum' }).first().waitFor({ timeout: 5_000 });
      const [hi, lo] = (await page.getByLabel('Visible range').first().innerText()).match(/-?\d+\.\d+/g)!.map(Number);
      expect(hi).toBeGreaterThan(lo); // ppm decreases to the right
      expect(await page.getByLabel('Visible range').first().innerText()).not.toBe(before);
      await page.getByRole('button', { name: 'Whole spectrum' }).first().click();

      const download = page.waitForEvent('download');
      await page.getByRole('button', { name: 'Export CSV' }).click();
      const csv = fs.readFileSync((await (await download).path())!, 'utf8');
      expect(csv).toContain('Identification is tentative');
      for (const a of want.analytes) expect(csv).toContain(a.entryId);

      await page.getByRole('button', { name: 'Printable report' }).click();
      await page.getByRole('heading', { name: 'Tessera analysis report' }).waitFor({ timeout: 10_000 });
      expect(await page.getByLabel('Caution').count()).toBeGreaterThan(0);
      await screenshot(page, `report-${viewport}`);

      // Reopened from the history instantly, from the device database.
      await page.goto(`${server.url}/history`);
      await page.getByLabel(`Open analysis ${want.title}`).click();
      await page.getByLabel('Candidates').first().waitFor({ timeout: 10_000 });
      await screenshot(page, `history-${viewport}`);
    } finally {
      await close();
    }
  });

  it('when the browser cannot start a web worker, then the page fetches the engine chunk only then and analyses on its own thread', async () => {
    const want = expected('demo-01-honey-WV-H-0412');
    const { page, close } = await openBrowser('phone');
    try {
      // The local database runs in a worker of its own; only the analysis worker is refused.
      await page.addInitScript(() => {
        const Real = window.Worker;
        const Refusing = function (this: unknown, url: string | URL, options?: WorkerOptions) {
          if (/analysis/.test(String(url))) throw new Error('this browser cannot start the analysis worker');
          return new Real(url, options);
        } as unknown as typeof Worker;
        Refusing.prototype = Real.prototype;
        window.Worker = Refusing;
      });
      await signIn(page, server.url, 'analyst@demo.tessera.test');
      await page.getByLabel('Entries on this device').waitFor({ timeout: 30_000 });
      const loaded = () => page.evaluate(() => performance.getEntriesByType('resource').map((e) => e.name));
      // Signed in and the library shown: neither the worker's engine nor the on-demand chunk yet.
      expect((await loaded()).some((u) => /\/(analysis|engineOnDemand)-[0-9a-f]+\.js$/.test(u))).toBe(false);
      await page.goto(`${server.url}/analyse`);
      await page.getByLabel('Mixture from: demo mixtures').click();
      await page.getByLabel(`Demo mixture ${want.title}`, { exact: true }).click();
      await page.getByRole('button', { name: 'Run analysis' }).click();
      await page.getByLabel('Candidates').first().waitFor({ timeout: 90_000 });
      const scripts = await loaded();
      expect(scripts.some((u) => /\/engineOnDemand-[0-9a-f]+\.js$/.test(u))).toBe(true);
      expect(scripts.some((u) => /\/analysis-[0-9a-f]+\.js$/.test(u))).toBe(false);
      for (const a of want.analytes) {
        expect(await page.getByLabel(`Candidate ${a.name}`, { exact: true }).innerText()).toContain('confirmed by fit');
      }
    } finally {
      await close();
    }
  });

  it('when the analyst picks a demo spectrum, then its text is fetched on demand and the analysis names its analytes', async () => {
    const m = demoManifest().mixtures.find((x) => x.files.spectrum);
    expect(m, 'a demo mixture with a spectrum').toBeDefined();
    const want = expected(m!.id);
    const { page, close } = await openBrowser('wide');
    try {
      await signIn(page, server.url, 'analyst@demo.tessera.test');
      await page.getByLabel('Entries on this device').waitFor({ timeout: 30_000 });
      await page.goto(`${server.url}/analyse`);
      await page.getByLabel('Mixture from: demo mixtures').click();
      const loaded = () => page.evaluate(() => performance.getEntriesByType('resource').map((e) => e.name));
      expect((await loaded()).some((u) => /\/demoSpectrumFiles-[0-9a-f]+\.js$/.test(u))).toBe(false);
      await page.getByLabel(`Demo mixture ${want.title} (spectrum)`, { exact: true }).click();
      await page.getByRole('button', { name: 'Run analysis' }).click();
      await page.getByLabel('Candidates').first().waitFor({ timeout: 90_000 });
      expect((await loaded()).some((u) => /\/demoSpectrumFiles-[0-9a-f]+\.js$/.test(u))).toBe(true);
      for (const a of want.analytes) {
        expect(await page.getByLabel(`Candidate ${a.name}`, { exact: true }).innerText(), a.name).toContain('confirmed by fit');
      }
      await screenshot(page, 'result-demo-spectrum-wide');
    } finally {
      await close();
    }
  });

  it('when a pasted peak list states its settings and has bad lines, then the settings follow it, each bad line is named and nothing is kept in the history', async () => {
    const { page, close } = await openBrowser('phone');
    try {
      await signIn(page, server.url, 'student@demo.tessera.test');
      await page.getByLabel('Entries on this device').waitFor({ timeout: 30_000 });
      await page.goto(`${server.url}/analyse`);
      // Its "#" comment states solvent and frequency: the settings take them.
      await page.getByRole('textbox', { name: 'Peak list' }).fill('# solvent CDCl3, 80 MHz\n3.21, 100\n1.x3, 45\n4.11, -30');
      expect(await page.getByLabel('Settings from the pasted text').innerText()).toContain('Read from the pasted text: CDCl3, 80 MHz.');
      expect(await page.getByLabel('Spectrometer (MHz)').inputValue()).toBe('80');
      await page.getByRole('button', { name: 'Run analysis' }).click();
      const problems = page.getByLabel('Analysis problems');
      await problems.waitFor({ timeout: 30_000 });
      const text = await problems.innerText();
      expect(text).toContain('nothing was saved');
      expect(text).toMatch(/Line 3/);
      expect(text).toMatch(/Line 4/);
      await screenshot(page, 'analyse-bad-input-phone');
      await page.goto(`${server.url}/history`);
      await page.getByText(/No analyses yet/).waitFor({ timeout: 10_000 });
    } finally {
      await close();
    }
  });

  it('when the analyst chooses a JCAMP-DX spectrum file, then its own solvent and frequency replace the settings and it and a batch of demo peak lists give results', async () => {
    // The honey sample's simulated spectrum (400 MHz); the app's job here is the file path, the
    // engine's demo tests cover the harder spectra.
    const m = demoManifest().mixtures.find((x) => x.id === 'demo-01-honey-WV-H-0412' && x.files.spectrum)!;
    const { page, close } = await openBrowser('wide');
    try {
      await signIn(page, server.url, 'analyst@demo.tessera.test');
      await page.getByLabel('Entries on this device').waitFor({ timeout: 30_000 });
      await page.goto(`${server.url}/analyse`);
      await page.getByLabel('Mixture from: a file').click();
      // Settings that disagree with the file: choosing it must replace them with what it states
      // (.SOLVENT NAME and .OBSERVE FREQUENCY in its JCAMP-DX header).
      await page.getByLabel('Solvent: CDCl3').click();
      await page.getByLabel('Spectrometer (MHz)').fill('80');
      const chooser = page.waitForEvent('filechooser');
      await page.getByRole('button', { name: 'Choose a mixture file' }).click();
      await (await chooser).setFiles(path.join(DEMO_DIR, m.files.spectrum!));
      await expect.poll(() => page.getByLabel('Chosen file').innerText(), { timeout: 10_000 }).toContain(m.files.spectrum!);
      expect(await page.getByLabel('Settings from the file').innerText()).toContain(`Read from the file: 1H, ${m.solvent}, ${m.mhz} MHz.`);
      expect(await page.getByLabel('Spectrometer (MHz)').inputValue()).toBe(String(m.mhz));
      await page.getByRole('button', { name: 'Run analysis' }).click();
      await page.getByLabel('Candidates').first().waitFor({ timeout: 90_000 });
      const analytes = (m.components as Array<{ name: string; role: string }>).filter((c) => c.role === 'analyte');
      for (const a of analytes) expect(await page.getByLabel(`Candidate ${a.name}`, { exact: true }).innerText()).toContain('confirmed by fit');
      // The run used the file's solvent and frequency, not the settings typed before choosing it.
      expect(await page.getByText(/^1H · .* MHz · tolerance/).innerText()).toContain(`1H · ${m.solvent} · ${m.mhz} MHz`);
      await screenshot(page, 'result-spectrum-wide');

      const d2o = demoManifest().mixtures.filter((x) => x.solvent === 'D2O' && x.files.peaks);
      await page.goto(`${server.url}/batch`);
      await page.getByLabel('Solvent of the run: D2O').click();
      await page.getByRole('button', { name: 'Demo mixtures in this solvent' }).click();
      await expect.poll(() => page.getByLabel('Batch files').innerText()).toContain(`${d2o.length} files`);
      // A run frequency the files contradict: each demo peak list states its own in "#" comments,
      // and that one is used for it.
      await page.getByLabel('Spectrometer (MHz)').fill('600');
      await page.getByRole('button', { name: 'Run the batch' }).click();
      const table = page.getByLabel('Batch summary');
      await table.waitFor({ timeout: 120_000 });
      const text = await table.innerText();
      for (const x of d2o) expect(text).toContain(x.name);
      const own = await page.getByLabel('Files with their own settings').innerText();
      for (const x of d2o) expect(own).toContain(`${x.files.peaks} (${x.mhz} MHz)`);
      await screenshot(page, 'batch-result-wide');
    } finally {
      await close();
    }
  });
});
