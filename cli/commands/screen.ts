// `tessera screen`: screen one mixture file against a library file and print a ranked table or JSON.
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { parseArgs } from 'node:util';
import { InputError, mixtureParseFile, textCommentMeta, type MixtureMeta } from '../../matching/io';
import { screenMixture } from '../../matching/screen';
import { CAUTION_TEXT } from '../../shared/caution';
import { LibraryFileSchema, type LibraryEntry } from '../../shared/libraryEntry';
import { NucleusSchema } from '../../shared/nucleus';
import type { ScreenOptions, ScreenResult } from '../../shared/screening';
import { SolventSchema } from '../../shared/solvent';
import { SPECTROMETER_MHZ_RANGE } from '../../shared/spectrometer';
import type { CliCommand } from './index';

/** Peak lists rarely say their field strength; multiplet line spacing is all it changes. */
export const CLI_DEFAULT_MHZ = 400;

export const SCREEN_OPTIONS = {
  library: { type: 'string', multiple: true },
  solvent: { type: 'string' },
  nucleus: { type: 'string' },
  mhz: { type: 'string' },
  tolerance: { type: 'string' },
  'min-score': { type: 'string' },
  'keep-solvent': { type: 'boolean' },
  help: { type: 'boolean' },
} as const;

/** A command-line problem: printed as is, exit code 2. */
export class UsageError extends Error {}

export function cliNumber(name: string, raw: string | undefined, check: (v: number) => boolean, what: string): number | undefined {
  if (raw === undefined) return undefined;
  const v = Number(raw);
  if (raw.trim() === '' || !Number.isFinite(v) || !check(v)) throw new UsageError(`--${name} must be ${what}, got "${raw}"`);
  return v;
}

/** Reads and validates a tessera-library JSON file; every schema problem names its path. */
export function libraryFileRead(file: string): LibraryEntry[] {
  let text: string;
  try {
    text = readFileSync(file, 'utf8');
  } catch (e) {
    throw new UsageError(`cannot read library ${file}: ${(e as NodeJS.ErrnoException).code ?? (e as Error).message}`);
  }
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch (e) {
    throw new InputError(`library ${file}`, [{ message: `not valid JSON (${(e as Error).message})` }]);
  }
  const parsed = LibraryFileSchema.safeParse(json);
  if (!parsed.success) {
    throw new InputError(
      `library ${file}`,
      parsed.error.issues.map((i) => ({ field: i.path.join('.') || 'file', message: i.message })),
    );
  }
  return parsed.data.entries;
}

export interface ScreenSettings {
  meta: MixtureMeta;
  options: ScreenOptions;
}

/** Turns the shared flags into importer metadata and screening options (validated). */
export function screenSettings(values: { solvent?: string; nucleus?: string; mhz?: string; tolerance?: string; 'min-score'?: string; 'keep-solvent'?: boolean }): ScreenSettings {
  const meta: MixtureMeta = {};
  if (values.solvent !== undefined) {
    const s = SolventSchema.safeParse(values.solvent);
    if (!s.success) throw new UsageError(`--solvent must be one of ${SolventSchema.options.join(', ')}, got "${values.solvent}"`);
    meta.solvent = s.data;
  }
  if (values.nucleus !== undefined) {
    const n = NucleusSchema.safeParse(values.nucleus);
    if (!n.success) throw new UsageError(`--nucleus must be one of ${NucleusSchema.options.join(', ')}, got "${values.nucleus}"`);
    meta.nucleus = n.data;
  }
  meta.mhz = cliNumber('mhz', values.mhz, (v) => v >= SPECTROMETER_MHZ_RANGE[0] && v <= SPECTROMETER_MHZ_RANGE[1], `the 1H frequency in MHz, between ${SPECTROMETER_MHZ_RANGE[0]} and ${SPECTROMETER_MHZ_RANGE[1]}`);
  if (meta.mhz === undefined) delete meta.mhz;
  const options: ScreenOptions = {};
  const tol = cliNumber('tolerance', values.tolerance, (v) => v > 0 && v <= 10, 'a positive number of ppm (at most 10)');
  if (tol !== undefined) options.tolerancePpm = tol;
  const min = cliNumber('min-score', values['min-score'], (v) => v >= 0 && v <= 1, 'a number between 0 and 1');
  if (min !== undefined) options.minScore = min;
  if (values['keep-solvent']) options.excludeSolvent = false;
  return { meta, options };
}

/** Reads a mixture file; a text peak list without --mhz is assumed to be CLI_DEFAULT_MHZ (noted on stderr). */
export function mixtureFileRead(file: string, meta: MixtureMeta): ReturnType<typeof mixtureParseFile> {
  let text: string;
  try {
    text = readFileSync(file, 'utf8');
  } catch (e) {
    throw new UsageError(`cannot read mixture ${file}: ${(e as NodeJS.ErrnoException).code ?? (e as Error).message}`);
  }
  const isJcamp = text.trimStart().startsWith('##');
  const stated = meta.mhz !== undefined || isJcamp || textCommentMeta(text).mhz !== undefined;
  const withMhz = stated ? meta : { ...meta, mhz: CLI_DEFAULT_MHZ };
  if (withMhz !== meta) console.error(`note: ${path.basename(file)} does not say its spectrometer frequency; assuming ${CLI_DEFAULT_MHZ} MHz (use --mhz)`);
  return mixtureParseFile(path.basename(file), text, withMhz);
}

function pct(v: number): string {
  return `${Math.round(v * 100)}%`;
}

/** The ranked table a person reads. */
export function screenResultTable(r: ScreenResult): string {
  const out: string[] = [];
  out.push(`Mixture "${r.mixtureName}" (${r.nucleus}, ${r.mhz} MHz): ${r.peaksUsed.length} peaks used, ${r.peaksExcluded.length} set aside, ${r.entriesScreened} entries screened, tolerance ±${r.tolerancePpm} ppm, threshold ${r.minScore}`);
  if (r.crowding.warning) out.push(`Warning: ${r.crowding.warning}.`);
  if (r.candidates.length === 0) out.push('No candidate reaches the threshold.');
  else {
    if (r.candidatesAboveThreshold > r.candidates.length) out.push(`${r.candidatesAboveThreshold} entries reach the threshold; the best ${r.candidates.length} are shown.`);
    const rows = r.candidates.map((c) => {
      const flags = [c.contaminant ? 'contaminant' : '', c.ambiguityGroup ? `group ${c.ambiguityGroup}` : '', c.shadowedBy.length ? `shadowed by ${c.shadowedBy.join(', ')}` : '']
        .filter(Boolean)
        .join('; ');
      const maxDelta = c.evidence.reduce((a, e) => Math.max(a, Math.abs(e.deltaPpm)), 0);
      return [String(c.rank), c.score.toFixed(3), pct(c.explainedShare), `${c.evidence.length}/${c.evidence.length + c.unmatched.length}`, maxDelta.toFixed(3), c.entryId, c.name, flags];
    });
    const head = ['#', 'score', 'explained', 'signals', 'max|Δδ|', 'entry', 'name', 'notes'];
    const widths = head.map((h, i) => Math.max(h.length, ...rows.map((row) => row[i].length)));
    const fmt = (row: string[]) => row.map((v, i) => (i === row.length - 1 ? v : v.padEnd(widths[i]))).join('  ').trimEnd();
    out.push(fmt(head), fmt(widths.map((w) => '-'.repeat(w))), ...rows.map(fmt));
  }
  for (const g of r.ambiguityGroups) out.push(`Group ${g.id}: ${g.members.join(', ')} explain the same peaks and cannot be told apart here.`);
  if (r.unexplainedPeaks.length > 0) {
    const shown = r.unexplainedPeaks.slice(0, 12).map((i) => r.peaksUsed[i].shift.toFixed(3));
    out.push(`Unexplained peaks (${r.unexplainedPeaks.length}): ${shown.join(', ')}${r.unexplainedPeaks.length > 12 ? ', …' : ''} ppm`);
  }
  const bySolvent = r.peaksExcluded.filter((p) => p.reason !== 'below-snr');
  if (bySolvent.length > 0) out.push(`Set aside: ${bySolvent.map((p) => `${p.shift.toFixed(3)} (${p.reason})`).join(', ')}`);
  out.push('', CAUTION_TEXT);
  return out.join('\n');
}

/** Reads one or more library files (--library may repeat); an id found twice is an error. */
export function librariesRead(files: readonly string[]): LibraryEntry[] {
  const entries: LibraryEntry[] = [];
  const seen = new Map<string, string>();
  for (const file of files) {
    for (const e of libraryFileRead(file)) {
      const first = seen.get(e.id);
      if (first !== undefined) throw new InputError(`library ${file}`, [{ field: 'id', message: `entry id "${e.id}" is also in ${first}` }]);
      seen.set(e.id, file);
      entries.push(e);
    }
  }
  return entries;
}

/** Exit codes: 0 done, 1 bad input file, 2 bad command line. */
export async function run(argv: string[]): Promise<number> {
  try {
    const { values } = parseArgs({ args: argv, options: { ...SCREEN_OPTIONS, mixture: { type: 'string' }, json: { type: 'boolean' } }, allowPositionals: false });
    if (values.help) {
      console.log('usage: tessera screen --library L.json [--library L2.json] --mixture M.csv|M.jdx [--solvent CDCl3] [--nucleus 1H] [--mhz 600] [--tolerance 0.03] [--min-score 0.5] [--keep-solvent] [--json]');
      return 0;
    }
    if (!values.library?.length) throw new UsageError('--library L.json is required');
    if (!values.mixture) throw new UsageError('--mixture M.csv is required');
    const { meta, options } = screenSettings(values);
    const entries = librariesRead(values.library);
    const mixture = mixtureFileRead(values.mixture, meta);
    const result = screenMixture(mixture, entries, options);
    console.log(values.json ? JSON.stringify(result, null, 2) : screenResultTable(result));
    return 0;
  } catch (e) {
    return cliErrorReport(e);
  }
}

/** Prints an error for a person and picks the exit code. */
export function cliErrorReport(e: unknown): number {
  if (e instanceof InputError) {
    console.error(`error: ${e.message}`);
    return 1;
  }
  if (e instanceof UsageError || (e as { code?: string }).code?.startsWith('ERR_PARSE_ARGS')) {
    console.error(`error: ${(e as Error).message}`);
    return 2;
  }
  if (e instanceof RangeError || e instanceof TypeError) {
    console.error(`error: ${e.message}`);
    return 1;
  }
  throw e;
}

export const screenCommand: CliCommand = { summary: 'screen one mixture against a library (ranked table or --json)', run };
