// Builds the invented demo mixtures of the Wrenfold Vale Growers' Co-operative scenario into
// library-data/demo-mixtures/: a simulated 1H spectrum per sample from the library entries (engine
// multiplets + Lorentzian lineshape), seeded Gaussian noise, a peak list picked from it by the
// engine (CSV), JCAMP-DX written by the engine for some, and manifest.json with the known
// composition. Run: node scripts/runTs.mjs scripts/buildDemoMixtures.ts [--check]
// With --check it writes nothing and exits 1 when a committed file differs from a fresh build.
import fs from 'node:fs';
import path from 'node:path';
import { z } from 'zod';
import { LibraryFileSchema, type LibraryEntry } from '../shared/libraryEntry';
import { SolventSchema, ShiftReferenceSchema } from '../shared/solvent';
import { SpectrometerMhzSchema } from '../shared/spectrometer';
import { entryToLines } from '../matching/multiplets';
import { lorentzianUnitArea } from '../matching/lineshape';
import { spectrumPickPeaks } from '../matching/spectrum';
import { spectrumToJcamp } from '../matching/io';
import { randomSeeded } from '../matching/confidence/randomSeeded';

const ROOT = path.resolve(__dirname, '..');
const OUT_DIR = path.join(ROOT, 'library-data/demo-mixtures');
const RECIPES = path.join(OUT_DIR, 'recipes.json');

const RoleSchema = z.enum(['analyte', 'internal-standard', 'shift-reference', 'solvent', 'contaminant']);

/** One recipe of library-data/demo-mixtures/recipes.json. */
export const DemoMixtureSpecSchema = z.object({
  id: z.string().regex(/^demo-[A-Za-z0-9-]+$/, 'mixture ids start with "demo-" and hold letters, digits and -'),
  name: z.string().startsWith('Demo mixture'),
  sample: z.string().min(1),
  hardCases: z.array(z.string()),
  solvent: SolventSchema,
  reference: ShiftReferenceSchema,
  mhz: SpectrometerMhzSchema,
  linewidthHz: z.number().positive().max(20),
  ppmRange: z.tuple([z.number(), z.number()]),
  points: z.number().int().min(256).max(262144),
  seed: z.number().int(),
  noise: z.object({ snr: z.number().positive(), anchorEntryId: z.string().optional() }),
  writeSpectrum: z.boolean(),
  internalStandard: z.object({ entryId: z.string(), concentrationMM: z.number().positive() }).optional(),
  components: z.array(z.object({ entryId: z.string(), role: RoleSchema, amount: z.number().positive(), shiftOffsetPpm: z.number().min(-1).max(1).optional() })).min(1),
});
export type DemoMixtureSpec = z.infer<typeof DemoMixtureSpecSchema>;

/** Reads and validates the recipes; throws an Error naming the mixture and field. */
export function readRecipes(text: string): DemoMixtureSpec[] {
  const json = JSON.parse(text) as { mixtures?: unknown };
  if (!Array.isArray(json.mixtures)) throw new Error('recipes.json: mixtures must be an array');
  return json.mixtures.map((m, i) => {
    const r = DemoMixtureSpecSchema.safeParse(m);
    if (!r.success) {
      const issue = r.error.issues[0];
      throw new Error(`recipes.json: mixtures[${i}].${issue.path.join('.')}: ${issue.message}`);
    }
    return r.data;
  });
}

export const DemoMixtureComponentSchema = z.object({
  entryId: z.string(),
  name: z.string(),
  role: RoleSchema,
  /** Relative amount of substance (mol, arbitrary unit shared by the mixture's components). */
  amount: z.number().positive(),
  /** Offset applied to every signal of the entry before simulating, ppm (0 = as in the library). */
  shiftOffsetPpm: z.number(),
  /** Mole fraction among the analytes (internal standard, reference, solvent and contaminants excluded). */
  analyteMoleFraction: z.number().min(0).max(1).nullable(),
  /** Concentration from the internal standard, mmol/L, when the mixture has one. */
  concentrationMM: z.number().nonnegative().nullable(),
  /** Height of its tallest point in the noise-free spectrum / noise σ. */
  snr: z.number().nonnegative(),
});

export const DemoMixtureSchema = z.object({
  id: z.string(),
  name: z.string(),
  demo: z.literal(true),
  sample: z.string().describe('the invented sample and why it was run'),
  hardCases: z.array(z.string()),
  files: z.object({ peaks: z.string(), spectrum: z.string().nullable() }),
  solvent: SolventSchema,
  reference: ShiftReferenceSchema,
  mhz: z.number().positive(),
  linewidthHz: z.number().positive(),
  ppmRange: z.tuple([z.number(), z.number()]),
  points: z.number().int().positive(),
  noiseSigma: z.number().positive(),
  seed: z.number().int(),
  internalStandard: z.object({ entryId: z.string(), concentrationMM: z.number().positive() }).nullable(),
  components: z.array(DemoMixtureComponentSchema),
});
export type DemoMixture = z.infer<typeof DemoMixtureSchema>;

export const DemoMixtureManifestSchema = z.object({
  format: z.literal('tessera-demo-mixtures'),
  version: z.literal(1),
  note: z.string(),
  mixtures: z.array(DemoMixtureSchema),
});
export type DemoMixtureManifest = z.infer<typeof DemoMixtureManifestSchema>;

/** mulberry32: a small, well-known 32-bit seeded generator, so every build gives the same noise. */
function seededUniform(seed: number): () => number {
  return randomSeeded(seed);
}

/** Standard normal deviates by the Box–Muller transform. */
function seededGaussian(seed: number): () => number {
  const u = seededUniform(seed);
  return () => Math.sqrt(-2 * Math.log(1 - u())) * Math.cos(2 * Math.PI * u());
}

/** Intensity scale: a 1-nucleus line of 1 Hz width and amount 1 peaks at 1000·2/π ≈ 637. */
const SCALE = 1000;

function shifted(entry: LibraryEntry, offset: number): LibraryEntry {
  return offset === 0 ? entry : { ...entry, signals: entry.signals.map((s) => ({ ...s, shift: Math.round((s.shift + offset) * 1e6) / 1e6 })) };
}

/** Noise-free spectrum of one component on the axis, through the engine's first-order lines and unit-area Lorentzians. */
function componentSpectrum(entry: LibraryEntry, amount: number, axis: Float64Array, mhz: number, linewidthHz: number): Float64Array {
  const y = new Float64Array(axis.length);
  for (const line of entryToLines(entry, '1H', mhz)) {
    const w = line.widthHz ?? linewidthHz;
    const k = amount * line.area * SCALE;
    for (let i = 0; i < axis.length; i++) y[i] += k * lorentzianUnitArea((axis[i] - line.shift) * mhz, w);
  }
  return y;
}

function maxOf(a: Float64Array): number {
  let m = 0;
  for (const v of a) m = Math.max(m, v);
  return m;
}

const fmt = (v: number, digits: number) => Number(v.toFixed(digits)).toString();

export interface BuiltMixture {
  record: DemoMixture;
  files: Record<string, string>;
}

export function buildDemoMixture(spec: DemoMixtureSpec, library: Map<string, LibraryEntry>): BuiltMixture {
  const [hi, lo] = spec.ppmRange;
  if (!(hi > lo)) throw new RangeError(`${spec.id}: ppmRange must run high → low`);
  const axis = new Float64Array(spec.points);
  for (let i = 0; i < spec.points; i++) axis[i] = hi - ((hi - lo) * i) / (spec.points - 1);
  const parts = spec.components.map((c) => {
    const entry = library.get(c.entryId);
    if (!entry) throw new Error(`${spec.id}: component "${c.entryId}" is not in library-data`);
    if (entry.solvent !== spec.solvent) throw new Error(`${spec.id}: component "${c.entryId}" is measured in ${entry.solvent}, the mixture in ${spec.solvent}`);
    return { c, entry, y: componentSpectrum(shifted(entry, c.shiftOffsetPpm ?? 0), c.amount, axis, spec.mhz, spec.linewidthHz) };
  });
  const clean = new Float64Array(spec.points);
  for (const p of parts) for (let i = 0; i < clean.length; i++) clean[i] += p.y[i];
  // Noise is set from one component's tallest point (the "near S/N 10" case) or from the whole spectrum.
  const anchor = spec.noise.anchorEntryId ? parts.find((p) => p.c.entryId === spec.noise.anchorEntryId) : null;
  if (spec.noise.anchorEntryId && !anchor) throw new Error(`${spec.id}: noise anchor "${spec.noise.anchorEntryId}" is not a component`);
  const sigma = (anchor ? maxOf(anchor.y) : maxOf(clean)) / spec.noise.snr;
  const gauss = seededGaussian(spec.seed);
  const intensity = Array.from(clean, (v) => Number((v + sigma * gauss()).toPrecision(7)));
  const ppm = Array.from(axis);

  const picked = spectrumPickPeaks({ ppm, intensity, mhz: spec.mhz }, { snrThreshold: 3 });
  const caption = [
    `# ${spec.name} — INVENTED DEMO DATA (Tessera demo scenario, Wrenfold Vale Growers' Co-operative); simulated, not measured`,
    `# solvent ${spec.solvent}, ${spec.mhz} MHz, reference ${spec.reference}; peaks picked at S/N >= 3 from the simulated spectrum`,
  ];
  const csv = [...caption, 'shift (ppm),height,width (Hz)', ...picked.peaks.map((p) => `${fmt(p.shift, 4)},${fmt(p.height, 2)},${fmt(p.widthHz, 2)}`)].join('\n') + '\n';
  const files: Record<string, string> = { [`${spec.id}.csv`]: csv };
  if (spec.writeSpectrum) {
    files[`${spec.id}.jdx`] = spectrumToJcamp({ kind: 'spectrum', name: `${spec.name} (invented demo data)`, nucleus: '1H', solvent: spec.solvent, mhz: spec.mhz, reference: spec.reference, demo: true, ppm, intensity });
  }

  const analytes = spec.components.filter((c) => c.role === 'analyte');
  const analyteTotal = analytes.reduce((s, c) => s + c.amount, 0);
  const standard = spec.internalStandard ? spec.components.find((c) => c.entryId === spec.internalStandard!.entryId) : undefined;
  if (spec.internalStandard && standard?.role !== 'internal-standard') throw new Error(`${spec.id}: internal standard "${spec.internalStandard.entryId}" must be a component with role internal-standard`);
  const record: DemoMixture = {
    id: spec.id,
    name: spec.name,
    demo: true,
    sample: spec.sample,
    hardCases: spec.hardCases,
    files: { peaks: `${spec.id}.csv`, spectrum: spec.writeSpectrum ? `${spec.id}.jdx` : null },
    solvent: spec.solvent,
    reference: spec.reference,
    mhz: spec.mhz,
    linewidthHz: spec.linewidthHz,
    ppmRange: spec.ppmRange,
    points: spec.points,
    noiseSigma: Number(sigma.toPrecision(6)),
    seed: spec.seed,
    internalStandard: spec.internalStandard ?? null,
    components: parts.map(({ c, entry, y }) => ({
      entryId: c.entryId,
      name: entry.name,
      role: c.role,
      amount: c.amount,
      shiftOffsetPpm: c.shiftOffsetPpm ?? 0,
      analyteMoleFraction: c.role === 'analyte' ? Number((c.amount / analyteTotal).toFixed(6)) : null,
      concentrationMM: standard && spec.internalStandard && c.role === 'analyte' ? Number(((c.amount / standard.amount) * spec.internalStandard.concentrationMM).toFixed(6)) : null,
      snr: Number((maxOf(y) / sigma).toFixed(2)),
    })),
  };
  return { record, files };
}

export function loadLibrary(): Map<string, LibraryEntry> {
  const dir = path.join(ROOT, 'library-data');
  const map = new Map<string, LibraryEntry>();
  for (const f of fs.readdirSync(dir).filter((n) => n.endsWith('.json')).sort()) {
    for (const e of LibraryFileSchema.parse(JSON.parse(fs.readFileSync(path.join(dir, f), 'utf8'))).entries) map.set(e.id, e);
  }
  return map;
}

export function buildDemoMixtures(): { manifest: DemoMixtureManifest; files: Record<string, string> } {
  const library = loadLibrary();
  const files: Record<string, string> = {};
  const mixtures: DemoMixture[] = [];
  for (const spec of readRecipes(fs.readFileSync(RECIPES, 'utf8'))) {
    const built = buildDemoMixture(spec, library);
    mixtures.push(built.record);
    Object.assign(files, built.files);
  }
  const manifest = DemoMixtureManifestSchema.parse({
    format: 'tessera-demo-mixtures',
    version: 1,
    note: "Invented demo data for the Tessera demo scenario (Wrenfold Vale Growers' Co-operative bench lab). Spectra are simulated from library entries with seeded noise; amounts are relative amounts of substance.",
    mixtures,
  });
  files['manifest.json'] = JSON.stringify(manifest, null, 2) + '\n';
  return { manifest, files };
}

function main(): number {
  const { files } = buildDemoMixtures();
  if (process.argv.includes('--check')) {
    const stale = Object.entries(files).filter(([name, text]) => !fs.existsSync(path.join(OUT_DIR, name)) || fs.readFileSync(path.join(OUT_DIR, name), 'utf8') !== text);
    for (const [name] of stale) console.log(`differs from a fresh build: ${name}`);
    console.log(stale.length === 0 ? 'demo mixtures are up to date' : 'run scripts/buildDemoMixtures.ts');
    return stale.length === 0 ? 0 : 1;
  }
  fs.mkdirSync(OUT_DIR, { recursive: true });
  for (const [name, text] of Object.entries(files)) fs.writeFileSync(path.join(OUT_DIR, name), text);
  console.log(`wrote ${Object.keys(files).length} files to ${path.relative(ROOT, OUT_DIR)}`);
  return 0;
}

if (typeof require !== 'undefined' && require.main === module) process.exit(main());
