// Converts library-data/sources/solvent-impurities-1h.tsv (our copy of Gottlieb, Kotlyar &
// Nudelman, J. Org. Chem. 1997, 62, 7512, Table 1, and Fulmer et al., Organometallics 2010, 29,
// 2176, Table 1) into library-data/contaminants.json: one entry per compound per solvent, category
// "contaminant". Run: node scripts/runTs.mjs scripts/buildContaminants.ts [--check]
// With --check it writes nothing and exits 1 when the committed JSON differs from a fresh build.
import fs from 'node:fs';
import path from 'node:path';
import Papa from 'papaparse';
import { LibraryFileSchema, type LibraryEntryInput, type LibraryFile } from '../shared/libraryEntry';
import type { Solvent } from '../shared/solvent';
import { multiplicityNeighbours } from '../shared/multiplicity';
import { libraryFindNearDuplicates, libraryCheck } from '../matching/library';

const ROOT = path.resolve(__dirname, '..');
const TSV = path.join(ROOT, 'library-data/sources/solvent-impurities-1h.tsv');
const OUT = path.join(ROOT, 'library-data/contaminants.json');

const CITATION: Record<string, string> = {
  Gottlieb1997: 'H. E. Gottlieb, V. Kotlyar, A. Nudelman, J. Org. Chem. 1997, 62, 7512, Table 1',
  Fulmer2010: 'G. R. Fulmer et al., Organometallics 2010, 29, 2176, Table 1',
};

/** TSV solvent column → our solvent name. */
const COLUMNS: [string, Solvent][] = [
  ['CDCl3', 'CDCl3'],
  ['(CD3)2CO', 'acetone-d6'],
  ['(CD3)2SO', 'DMSO-d6'],
  ['C6D6', 'C6D6'],
  ['CD3CN', 'CD3CN'],
  ['CD3OD', 'CD3OD'],
  ['D2O', 'D2O'],
];

interface Compound {
  slug: string;
  name: string;
  formula: string;
  smiles?: string;
  /** This TSV name carries another paper's values for the compound named here (see the TSV notes on conflicts). */
  variantOf?: string;
  variantTag?: string;
  /** Nuclei per group where the table prints none. */
  nuclei?: Record<string, number>;
  note?: string;
}

// Formulas and SMILES are the structures the table names (isotopologues for residual solvent
// signals); openchemlib checks each pair in libraryCheck.
const COMPOUNDS: Record<string, Compound> = {
  'residual CHCl3 (in CDCl3)': { slug: 'residual-chcl3', name: 'residual CHCl3 (in CDCl3)', formula: 'CHCl3', smiles: 'ClC(Cl)Cl' },
  'residual acetone-d5 (CHD2COCD3, in acetone-d6)': { slug: 'residual-acetone-d5', name: 'residual acetone-d5 (CHD2COCD3)', formula: 'C3HD5O', smiles: '[2H]C([2H])([2H])C(=O)C([2H])[2H]' },
  'residual DMSO-d5 (CHD2SOCD3, in DMSO-d6)': { slug: 'residual-dmso-d5', name: 'residual DMSO-d5 (CHD2SOCD3)', formula: 'C2HD5OS', smiles: '[2H]C([2H])([2H])S(=O)C([2H])[2H]' },
  'residual C6D5H (in C6D6)': { slug: 'residual-c6d5h', name: 'residual C6D5H (in C6D6)', formula: 'C6HD5', smiles: '[2H]c1c([2H])c([2H])c([2H])c([2H])c1' },
  'residual CHD2CN (in CD3CN)': { slug: 'residual-chd2cn', name: 'residual CHD2CN (in CD3CN)', formula: 'C2HD2N', smiles: '[2H]C([2H])C#N' },
  'residual CHD2OD (in CD3OD)': { slug: 'residual-chd2od', name: 'residual CHD2OD (in CD3OD)', formula: 'CHD3O', smiles: '[2H]OC([2H])[2H]' },
  'residual HDO (in D2O)': { slug: 'residual-hdo', name: 'residual HDO (in D2O)', formula: 'HDO', smiles: '[2H]O' },
  'water (H2O / HOD)': { slug: 'water', name: 'water (H2O / HOD)', formula: 'H2O', smiles: 'O' },
  'water: separate HDO peak (Gottlieb footnote a)': { slug: 'water-hdo-peak', name: 'water: separate HDO peak', formula: 'HDO', smiles: '[2H]O' },
  'acetic acid': { slug: 'acetic-acid', name: 'acetic acid', formula: 'C2H4O2', smiles: 'CC(=O)O' },
  'acetic acid (Fulmer 2010 C6D6 value)': { slug: 'acetic-acid', name: 'acetic acid (Fulmer 2010 C6D6 value)', formula: 'C2H4O2', smiles: 'CC(=O)O', variantOf: 'acetic acid', variantTag: 'fulmer2010' },
  acetone: { slug: 'acetone', name: 'acetone', formula: 'C3H6O', smiles: 'CC(C)=O' },
  acetonitrile: { slug: 'acetonitrile', name: 'acetonitrile', formula: 'C2H3N', smiles: 'CC#N' },
  'acetonitrile (Fulmer 2010 C6D6 value)': { slug: 'acetonitrile', name: 'acetonitrile (Fulmer 2010 C6D6 value)', formula: 'C2H3N', smiles: 'CC#N', variantOf: 'acetonitrile', variantTag: 'fulmer2010' },
  benzene: { slug: 'benzene', name: 'benzene', formula: 'C6H6', smiles: 'c1ccccc1' },
  'tert-butyl alcohol': { slug: 'tert-butyl-alcohol', name: 'tert-butyl alcohol', formula: 'C4H10O', smiles: 'CC(C)(C)O' },
  'tert-butyl alcohol (Fulmer 2010 OH values)': { slug: 'tert-butyl-alcohol', name: 'tert-butyl alcohol (Fulmer 2010 OH values)', formula: 'C4H10O', smiles: 'CC(C)(C)O', variantOf: 'tert-butyl alcohol', variantTag: 'fulmer2010' },
  'tert-butyl methyl ether': { slug: 'tert-butyl-methyl-ether', name: 'tert-butyl methyl ether', formula: 'C5H12O', smiles: 'COC(C)(C)C' },
  'BHT (2,6-di-tert-butyl-4-methylphenol)': { slug: 'bht', name: 'BHT (2,6-di-tert-butyl-4-methylphenol)', formula: 'C15H24O', smiles: 'Cc1cc(C(C)(C)C)c(O)c(C(C)(C)C)c1' },
  chloroform: { slug: 'chloroform', name: 'chloroform', formula: 'CHCl3', smiles: 'ClC(Cl)Cl' },
  cyclohexane: { slug: 'cyclohexane', name: 'cyclohexane', formula: 'C6H12', smiles: 'C1CCCCC1' },
  '1,2-dichloroethane': { slug: '1-2-dichloroethane', name: '1,2-dichloroethane', formula: 'C2H4Cl2', smiles: 'ClCCCl' },
  dichloromethane: { slug: 'dichloromethane', name: 'dichloromethane', formula: 'CH2Cl2', smiles: 'ClCCl' },
  'diethyl ether': { slug: 'diethyl-ether', name: 'diethyl ether', formula: 'C4H10O', smiles: 'CCOCC' },
  diglyme: { slug: 'diglyme', name: 'diglyme', formula: 'C6H14O3', smiles: 'COCCOCCOC' },
  '1,2-dimethoxyethane': { slug: '1-2-dimethoxyethane', name: '1,2-dimethoxyethane', formula: 'C4H10O2', smiles: 'COCCOC' },
  'N,N-dimethylacetamide': { slug: 'n-n-dimethylacetamide', name: 'N,N-dimethylacetamide', formula: 'C4H9NO', smiles: 'CC(=O)N(C)C' },
  'N,N-dimethylformamide': { slug: 'n-n-dimethylformamide', name: 'N,N-dimethylformamide', formula: 'C3H7NO', smiles: 'CN(C)C=O' },
  'dimethyl sulfoxide': { slug: 'dimethyl-sulfoxide', name: 'dimethyl sulfoxide', formula: 'C2H6OS', smiles: 'CS(C)=O' },
  '1,4-dioxane': { slug: '1-4-dioxane', name: '1,4-dioxane', formula: 'C4H8O2', smiles: 'C1COCCO1' },
  ethanol: { slug: 'ethanol', name: 'ethanol', formula: 'C2H6O', smiles: 'CCO' },
  'ethyl acetate': { slug: 'ethyl-acetate', name: 'ethyl acetate', formula: 'C4H8O2', smiles: 'CCOC(C)=O' },
  'ethyl methyl ketone (2-butanone)': { slug: 'ethyl-methyl-ketone', name: 'ethyl methyl ketone (2-butanone)', formula: 'C4H8O', smiles: 'CCC(C)=O' },
  'ethylene glycol': { slug: 'ethylene-glycol', name: 'ethylene glycol', formula: 'C2H6O2', smiles: 'OCCO' },
  'grease (long-chain aliphatic hydrocarbons)': {
    slug: 'grease',
    name: 'grease (long-chain aliphatic hydrocarbons)',
    formula: 'C16H34',
    smiles: 'CCCCCCCCCCCCCCCC',
    nuclei: { CH3: 6, CH2: 28 },
    note: 'The table prints no formula or nuclei counts for grease; n-hexadecane (C16H34: 6 CH3 H, 28 CH2 H) stands in so that relative intensities are plausible (our assumption).',
  },
  'grease (Gottlieb 1997 values)': {
    slug: 'grease',
    name: 'grease (Gottlieb 1997 values)',
    formula: 'C16H34',
    smiles: 'CCCCCCCCCCCCCCCC',
    nuclei: { CH3: 6, CH2: 28 },
    variantOf: 'grease (long-chain aliphatic hydrocarbons)',
    variantTag: 'gottlieb1997',
    note: 'n-hexadecane stands in for the nuclei counts (our assumption).',
  },
  'n-hexane': { slug: 'n-hexane', name: 'n-hexane', formula: 'C6H14', smiles: 'CCCCCC' },
  'HMPA (hexamethylphosphoramide)': { slug: 'hmpa', name: 'HMPA (hexamethylphosphoramide)', formula: 'C6H18N3OP', smiles: 'CN(C)P(=O)(N(C)C)N(C)C' },
  methanol: { slug: 'methanol', name: 'methanol', formula: 'CH4O', smiles: 'CO' },
  nitromethane: { slug: 'nitromethane', name: 'nitromethane', formula: 'CH3NO2', smiles: 'C[N+](=O)[O-]' },
  'n-pentane': { slug: 'n-pentane', name: 'n-pentane', formula: 'C5H12', smiles: 'CCCCC' },
  '2-propanol': { slug: '2-propanol', name: '2-propanol', formula: 'C3H8O', smiles: 'CC(C)O' },
  pyridine: { slug: 'pyridine', name: 'pyridine', formula: 'C5H5N', smiles: 'c1ccncc1' },
  'silicone grease (poly(dimethylsiloxane))': {
    slug: 'silicone-grease',
    name: 'silicone grease (poly(dimethylsiloxane))',
    formula: 'C2H6OSi',
    nuclei: { CH3: 6 },
    note: 'Formula and nuclei count are those of one (CH3)2SiO repeat unit (our assumption; the table prints none); no SMILES for a polymer.',
  },
  tetrahydrofuran: { slug: 'tetrahydrofuran', name: 'tetrahydrofuran', formula: 'C4H8O', smiles: 'C1CCOC1' },
  toluene: { slug: 'toluene', name: 'toluene', formula: 'C7H8', smiles: 'Cc1ccccc1' },
  triethylamine: { slug: 'triethylamine', name: 'triethylamine', formula: 'C6H15N', smiles: 'CCN(CC)CC' },
  '18-crown-6': { slug: '18-crown-6', name: '18-crown-6', formula: 'C12H24O6', smiles: 'C1COCCOCCOCCOCCOCCO1' },
  ethane: { slug: 'ethane', name: 'ethane', formula: 'C2H6', smiles: 'CC' },
  ethylene: { slug: 'ethylene', name: 'ethylene', formula: 'C2H4', smiles: 'C=C' },
  hexamethylbenzene: { slug: 'hexamethylbenzene', name: 'hexamethylbenzene', formula: 'C12H18', smiles: 'Cc1c(C)c(C)c(C)c(C)c1C' },
  'hexamethyldisiloxane (HMDSO)': { slug: 'hmdso', name: 'hexamethyldisiloxane (HMDSO)', formula: 'C6H18OSi2', smiles: 'C[Si](C)(C)O[Si](C)(C)C' },
  'hydrogen (H2)': { slug: 'hydrogen', name: 'hydrogen (H2)', formula: 'H2', smiles: '[H][H]' },
  imidazole: { slug: 'imidazole', name: 'imidazole', formula: 'C3H4N2', smiles: 'c1c[nH]cn1' },
  methane: { slug: 'methane', name: 'methane', formula: 'CH4', smiles: 'C' },
  propane: { slug: 'propane', name: 'propane', formula: 'C3H8', smiles: 'CCC' },
  propylene: { slug: 'propylene', name: 'propylene', formula: 'C3H6', smiles: 'C=CC' },
  pyrrole: { slug: 'pyrrole', name: 'pyrrole', formula: 'C4H5N', smiles: 'c1cc[nH]c1' },
  pyrrolidine: { slug: 'pyrrolidine', name: 'pyrrolidine', formula: 'C4H9N', smiles: 'C1CCNC1' },
};

/** Printed multiplicities our first-order grammar cannot hold, and what we store instead. */
const MULTIPLICITY_MAP: Record<string, { multiplicity: string; note?: string }> = {
  's (br)': { multiplicity: 'br s' },
  'br t': { multiplicity: 'br s', note: 'printed "br t" (NH broadened by 14N); stored as a broad singlet' },
  dm: { multiplicity: 'd', note: 'printed "dm"; stored as a doublet, the small couplings unresolved' },
  's / 1:1:1 t': { multiplicity: 's', note: 'may show as a 1:1:1 triplet from 2J(H,D) in acetone-d6; stored as a singlet' },
};

export interface TsvRow {
  line: number;
  compound: string;
  group: string;
  multiplicity: string;
  nH: string;
  J_Hz: string;
  source: string;
  verified: string;
  notes: string;
  [column: string]: string | number;
}

function fail(line: number, field: string, message: string): never {
  throw new Error(`solvent-impurities-1h.tsv line ${line}, ${field}: ${message}`);
}

export function readTsv(text: string): TsvRow[] {
  const parsed = Papa.parse<Record<string, string>>(text, { header: true, delimiter: '\t', skipEmptyLines: true });
  if (parsed.errors.length > 0) {
    const e = parsed.errors[0];
    throw new Error(`solvent-impurities-1h.tsv line ${(e.row ?? 0) + 2}: ${e.message}`);
  }
  for (const col of ['compound', 'group', 'multiplicity', 'nH', 'J_Hz', 'source', 'verified', 'notes', ...COLUMNS.map(([c]) => c)]) {
    if (!parsed.meta.fields?.includes(col)) throw new Error(`solvent-impurities-1h.tsv line 1: missing column "${col}"`);
  }
  return parsed.data.map((r, i) => ({ ...r, line: i + 2 }) as TsvRow);
}

/** A printed shift: "2.05", or a range "0.84-0.87" stored as its midpoint. */
export function parseShift(text: string, line: number, column: string): { shift: number; range?: string } | null {
  const t = text.trim();
  if (t === '') return null;
  const range = /^(-?\d+(?:\.\d+)?)-(-?\d+(?:\.\d+)?)$/.exec(t);
  if (range) {
    const [lo, hi] = [Number(range[1]), Number(range[2])];
    if (!(lo < hi)) fail(line, column, `range "${t}" must run low-high`);
    return { shift: Math.round(((lo + hi) / 2) * 10000) / 10000, range: t };
  }
  if (!/^-?\d+(\.\d+)?$/.test(t)) fail(line, column, `"${t}" is not a shift in ppm`);
  return { shift: Number(t) };
}

function parseJ(text: string, needed: number, line: number): number[] {
  if (needed === 0) return [];
  const values = text
    .split(',')
    .map((part) => /^\s*(\d+(?:\.\d+)?)/.exec(part)?.[1])
    .filter((v): v is string => v !== undefined)
    .map(Number);
  if (values.length < needed) fail(line, 'J_Hz', `multiplicity needs ${needed} coupling constant(s), the row gives "${text}"`);
  return values.slice(0, needed);
}

const isExchangeable = (row: TsvRow, compound: Compound) => /^(OH|NH|OD-H)$/.test(row.group.trim()) || compound.slug.startsWith('water') || compound.slug === 'residual-hdo';

interface BuiltSignal {
  signal: LibraryEntryInput['signals'][number];
  row: TsvRow;
  notes: string[];
}

function rowSignal(row: TsvRow, compound: Compound, column: string): BuiltSignal | null {
  const value = parseShift(String(row[column] ?? ''), row.line, column);
  if (!value) return null;
  const printed = row.multiplicity.trim();
  const mapped = MULTIPLICITY_MAP[printed] ?? { multiplicity: printed };
  let neighbours: number[] | null;
  try {
    neighbours = multiplicityNeighbours(mapped.multiplicity);
  } catch (e) {
    fail(row.line, 'multiplicity', (e as Error).message);
  }
  const nuclei = row.nH.trim() !== '' ? Number(row.nH) : compound.nuclei?.[row.group.trim()];
  if (!Number.isInteger(nuclei) || (nuclei as number) <= 0) fail(row.line, 'nH', `no nuclei count for group "${row.group}"`);
  const notes: string[] = [];
  if (mapped.note) notes.push(`${row.group.trim()}: ${mapped.note}.`);
  if (value.range) notes.push(`${row.group.trim()}: published as the range ${value.range} ppm; stored at its midpoint.`);
  return {
    row,
    notes,
    signal: {
      nucleus: '1H',
      shift: value.shift,
      multiplicity: mapped.multiplicity,
      j: parseJ(row.J_Hz, neighbours?.length ?? 0, row.line),
      nuclei: nuclei as number,
      label: row.group.trim().slice(0, 40),
      ...(isExchangeable(row, compound) ? { exchangeable: true } : {}),
    },
  };
}

function entryFrom(compound: Compound, solvent: Solvent, built: BuiltSignal[], idSuffix: string): LibraryEntryInput {
  const sources = [...new Set(built.flatMap((b) => b.row.source.split(';').map((s) => s.trim())))].filter(Boolean);
  for (const s of sources) if (!CITATION[s]) fail(built[0].row.line, 'source', `unknown source "${s}"`);
  const recalled = built.some((b) => b.row.verified.trim() === 'memory');
  const rowNotes = [...new Set(built.map((b) => b.row.notes.trim()).filter(Boolean))];
  const notes = [...(compound.note ? [compound.note] : []), ...built.flatMap((b) => b.notes), ...rowNotes.map((n) => `Table note: ${n}`)];
  return {
    id: `contaminant:${compound.slug}:${solvent}${idSuffix}`,
    name: compound.name,
    synonyms: [],
    formula: compound.formula,
    ...(compound.smiles ? { smiles: compound.smiles } : {}),
    category: 'contaminant',
    source:
      sources.map((s) => CITATION[s]).join('; ') +
      ' (copied in library-data/sources/solvent-impurities-1h.tsv)' +
      (recalled ? '; value recalled (memory), not checked against the printed table' : ''),
    solvent,
    mhz: 300,
    temperatureC: 24,
    signals: built.map((b) => b.signal),
    notes: notes.join(' '),
  };
}

/** Builds the contaminant library from the TSV text. Throws an Error naming the line on bad input. */
export function buildContaminants(text: string): LibraryFile {
  const rows = readTsv(text);
  for (const row of rows) if (!COMPOUNDS[row.compound]) fail(row.line, 'compound', `no formula/SMILES known for "${row.compound}"; add it to COMPOUNDS in scripts/buildContaminants.ts`);
  const primaries = [...new Set(rows.map((r) => r.compound))].filter((name) => !COMPOUNDS[name].variantOf);
  const entries: LibraryEntryInput[] = [];
  for (const name of primaries) {
    const compound = COMPOUNDS[name];
    const own = rows.filter((r) => r.compound === name);
    const variants = [...new Set(rows.filter((r) => COMPOUNDS[r.compound].variantOf === name).map((r) => r.compound))];
    for (const [column, solvent] of COLUMNS) {
      const primary = own.map((r) => rowSignal(r, compound, column));
      const present = primary.filter((b): b is BuiltSignal => b !== null);
      if (present.length > 0) entries.push(entryFrom(compound, solvent, present, ''));
      // A variant row replaces the primary row with the same group (Gottlieb and Fulmer disagree
      // there); an entry is made only where the replacement changes something.
      for (const variantName of variants) {
        const variant = COMPOUNDS[variantName];
        const vRows = rows.filter((r) => r.compound === variantName);
        let changed = false;
        const used = new Set<TsvRow>();
        const merged = own.map((r, i) => {
          const match = vRows.find((v) => !used.has(v) && v.group.trim() === r.group.trim());
          if (!match) return primary[i];
          used.add(match);
          const replacement = rowSignal(match, variant, column);
          const a = primary[i]?.signal.shift;
          const b = replacement?.signal.shift;
          if (replacement && a !== b) changed = true;
          return replacement ?? primary[i];
        });
        for (const v of vRows) if (!used.has(v)) fail(v.line, 'group', `variant row has no "${v.group}" row in "${name}" to replace`);
        const kept = merged.filter((b): b is BuiltSignal => b !== null);
        if (changed && kept.length > 0) {
          entries.push(entryFrom({ ...variant, slug: compound.slug }, solvent, kept, `:${variant.variantTag}`));
        } else if (!changed && present.length > 0) {
          // Both papers print the same values here: the primary entry cites both (checked values only).
          const agreeing = vRows.filter((v) => v.verified.trim() === 'source-text' && String(v[column] ?? '').trim() !== '');
          if (agreeing.length > 0) {
            const entry = entries.find((e) => e.id === `contaminant:${compound.slug}:${solvent}`)!;
            const extra = [...new Set(agreeing.flatMap((v) => v.source.split(';').map((s) => s.trim())))].map((s) => CITATION[s]).filter((c) => !entry.source.includes(c));
            if (extra.length > 0) entry.source = entry.source.replace(' (copied in', `; ${extra.join('; ')} (copied in`);
          }
        }
      }
    }
  }
  // Published signals that coincide (acetone, acetic acid and acetonitrile at 1.55 ppm in C6D6; a
  // Gottlieb row and its Fulmer correction) are facts of the table: mark them known-close.
  const parsed = LibraryFileSchema.parse({ format: 'tessera-library', version: 1, entries });
  for (const pair of libraryFindNearDuplicates(parsed.entries)) {
    for (const [self, other] of [[pair.a, pair.b], [pair.b, pair.a]]) {
      const e = entries.find((x) => x.id === self)!;
      e.nearDuplicateOf = [...new Set([...(e.nearDuplicateOf ?? []), other])].sort();
    }
  }
  return LibraryFileSchema.parse({
    format: 'tessera-library',
    version: 1,
    title: 'Residual solvent, water and common impurity 1H signals (Gottlieb 1997 Table 1; Fulmer 2010 Table 1)',
    entries,
  });
}

function main(): number {
  const file = buildContaminants(fs.readFileSync(TSV, 'utf8'));
  const problems = libraryCheck(file.entries);
  if (problems.length > 0) {
    for (const p of problems) console.error(`${p.entryId} ${p.field}: ${p.message}`);
    console.error(`${problems.length} problem(s); nothing written`);
    return 1;
  }
  const text = JSON.stringify(file, null, 2) + '\n';
  if (process.argv.includes('--check')) {
    const same = fs.existsSync(OUT) && fs.readFileSync(OUT, 'utf8') === text;
    console.log(same ? 'contaminants.json is up to date' : 'contaminants.json differs from a fresh build; run scripts/buildContaminants.ts');
    return same ? 0 : 1;
  }
  fs.writeFileSync(OUT, text);
  console.log(`wrote ${path.relative(ROOT, OUT)}: ${file.entries.length} entries`);
  return 0;
}

if (typeof require !== "undefined" && require.main === module) process.exit(main());
