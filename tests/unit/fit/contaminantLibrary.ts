// Test library and mixture synthesis from the published contaminant table:
// H. E. Gottlieb, V. Kotlyar, A. Nudelman, J. Org. Chem. 1997, 62, 7512 (Table 1) and
// G. R. Fulmer et al., Organometallics 2010, 29, 2176 (Table 1), CDCl3 column, rows copied
// verbatim into tests/fixtures/fit/contaminants-1h.tsv.
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { lorentzianFct } from 'ml-peak-shape-generator';
import type { LibraryEntry } from '../../../shared/libraryEntry';
import type { Mixture } from '../../../shared/mixture';

// Molecular formulas from the structures (derived).
const FORMULA: Record<string, string> = {
  'acetic acid': 'C2H4O2', acetone: 'C3H6O', acetonitrile: 'C2H3N', benzene: 'C6H6', 'tert-butyl methyl ether': 'C5H12O',
  dichloromethane: 'CH2Cl2', 'diethyl ether': 'C4H10O', '1,4-dioxane': 'C4H8O2', ethanol: 'C2H6O', 'ethyl acetate': 'C4H8O2',
  'HMPA (hexamethylphosphoramide)': 'C6H18N3OP', methanol: 'CH4O', '2-propanol': 'C3H8O', toluene: 'C7H8', triethylamine: 'C6H15N',
};

export function contaminantLibrary(options: { withExchangeable?: boolean } = {}): LibraryEntry[] {
  const text = readFileSync(join(__dirname, '../../fixtures/fit/contaminants-1h.tsv'), 'utf8');
  const [header, ...rows] = text.trim().split('\n').map((l) => l.split('\t'));
  const col = header.indexOf('CDCl3');
  const byName = new Map<string, LibraryEntry>();
  for (const r of rows) {
    const name = r[0];
    const shift = Number(r[col]);
    if (r[col] === '' || !Number.isFinite(shift)) continue;
    const exchangeable = r[1] === 'OH';
    if (exchangeable && !options.withExchangeable) continue;
    const j = r[4] ? [Number.parseFloat(r[4])] : [];
    const id = name.split(' (')[0].replace(/[^A-Za-z0-9]+/g, '-').toLowerCase();
    const entry = byName.get(name) ?? {
      id, name, synonyms: [], formula: FORMULA[name], category: 'contaminant' as const, source: 'Gottlieb 1997 / Fulmer 2010, Table 1',
      solvent: 'CDCl3' as const, mhz: 300, signals: [],
    };
    entry.signals.push({ nucleus: '1H', shift, multiplicity: r[2], j, nuclei: Number(r[3]), label: r[1], ...(exchangeable ? { exchangeable } : {}) });
    byName.set(name, entry);
  }
  return [...byName.values()];
}

// Pascal's triangle rows, formulas.md (c) (Silverstein 2005 ch. 3; common practice).
const PASCAL: Record<string, number[]> = { s: [1], d: [1, 1], t: [1, 2, 1], q: [1, 3, 3, 1], quint: [1, 4, 6, 4, 1], sext: [1, 5, 10, 10, 5, 1], sept: [1, 6, 15, 20, 15, 6, 1] };

/** Lines (ppm, area in nuclei) of an entry, drawn independently of the engine for s/d/t/q/... signals. */
export function referenceLines(entry: LibraryEntry, mhz: number, shiftOffset = 0): { x: number; a: number }[] {
  const out: { x: number; a: number }[] = [];
  for (const s of entry.signals) {
    if (s.nucleus !== '1H') continue;
    const row = PASCAL[s.multiplicity];
    if (!row) throw new Error(`test synthesis handles simple multiplets only, got ${s.multiplicity}`);
    const total = row.reduce((p, q) => p + q, 0);
    const n = row.length - 1;
    row.forEach((c, k) => out.push({ x: s.shift + shiftOffset + ((k - n / 2) * (s.j[0] ?? 0)) / mhz, a: (s.nuclei * c) / total }));
  }
  return out;
}

/** Seeded uniform RNG (mulberry32) and a Box–Muller normal deviate. */
export function testRng(seed: number) {
  let a = seed >>> 0;
  const uniform = () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
  const normal = () => Math.sqrt(-2 * Math.log(1 - uniform())) * Math.cos(2 * Math.PI * uniform());
  return { uniform, normal };
}

export interface SynthOptions {
  mhz?: number;
  points?: number;
  range?: [number, number];
  fwhmHz?: number;
  noise?: number; // σ as a fraction of the tallest point
  seed?: number;
  offsets?: Record<string, number>;
}

/** Spectrum of Σ amount_per_nucleus × lines, unit-area Lorentzians in ppm (FWHM fwhmHz). */
export function synthSpectrum(parts: { entry: LibraryEntry; amount: number }[], o: SynthOptions = {}): Mixture {
  const { mhz = 600.13, points = 16384, range = [-0.5, 9.5], fwhmHz = 1, noise = 0, seed = 7, offsets = {} } = o;
  const w = fwhmHz / mhz;
  const ppm = Array.from({ length: points }, (_, i) => range[0] + ((range[1] - range[0]) * i) / (points - 1));
  const y = new Array<number>(points).fill(0);
  for (const { entry, amount } of parts) {
    for (const l of referenceLines(entry, mhz, offsets[entry.id] ?? 0)) {
      const h = (2 * amount * l.a) / (Math.PI * w); // height of a Lorentzian of area amount·a (formulas.md (a))
      for (let i = 0; i < points; i++) y[i] += h * lorentzianFct(ppm[i] - l.x, w);
    }
  }
  if (noise > 0) {
    const rng = testRng(seed);
    const top = Math.max(...y);
    for (let i = 0; i < points; i++) y[i] += noise * top * rng.normal();
  }
  return { kind: 'spectrum', name: 'synthetic', nucleus: '1H', solvent: 'CDCl3', mhz, reference: 'TMS', ppm, intensity: y };
}

/** Peak list (heights) of the same model: one peak per line, merged when they coincide. */
export function synthPeaks(parts: { entry: LibraryEntry; amount: number }[], o: SynthOptions = {}): Mixture {
  const { mhz = 600.13, fwhmHz = 1, offsets = {} } = o;
  const w = fwhmHz / mhz;
  const peaks = parts.flatMap(({ entry, amount }) =>
    referenceLines(entry, mhz, offsets[entry.id] ?? 0).map((l) => ({ shift: l.x, intensity: (2 * amount * l.a) / (Math.PI * w), widthHz: fwhmHz })),
  );
  return { kind: 'peaks', name: 'synthetic', nucleus: '1H', solvent: 'CDCl3', mhz, reference: 'TMS', intensityKind: 'height', peaks };
}
