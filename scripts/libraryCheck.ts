// `npm run library:check`: every library file in library-data/ (*.json with format "tessera-library")
// through every soundness check, across files (ids are global, near duplicates are per solvent).
// Prints a table of problems and exits 1 when there are any. Usage: [--dir <folder>]
import fs from 'node:fs';
import path from 'node:path';
import { LIBRARY_FORMAT, LIBRARY_FORMAT_VERSION } from '../shared/libraryEntry';
import { libraryCheck, type LibraryProblem } from '../matching/library';

interface Row extends LibraryProblem {
  file: string;
}

function loadFolder(dir: string): { rows: Row[]; entries: unknown[]; files: { name: string; count: number }[] } {
  const rows: Row[] = [];
  const entries: unknown[] = [];
  const origin: string[] = [];
  const files: { name: string; count: number }[] = [];
  const names = fs.readdirSync(dir).filter((n) => n.endsWith('.json')).sort();
  for (const name of names) {
    const fileRow = (field: string, message: string) => rows.push({ file: name, entryId: '(file)', field, check: 'schema', message });
    let data: unknown;
    try {
      data = JSON.parse(fs.readFileSync(path.join(dir, name), 'utf8'));
    } catch (e) {
      fileRow('(file)', `not valid JSON: ${(e as Error).message}`);
      continue;
    }
    const file = data as { format?: unknown; version?: unknown; entries?: unknown };
    if (file === null || typeof file !== 'object' || file.format !== LIBRARY_FORMAT) {
      fileRow('format', `format must be "${LIBRARY_FORMAT}"`);
      continue;
    }
    if (file.version !== LIBRARY_FORMAT_VERSION) fileRow('version', `version must be ${LIBRARY_FORMAT_VERSION}, got ${JSON.stringify(file.version)}`);
    if (!Array.isArray(file.entries)) {
      fileRow('entries', 'entries must be an array');
      continue;
    }
    files.push({ name, count: file.entries.length });
    for (const e of file.entries) {
      entries.push(e);
      origin.push(name);
    }
  }
  const fileOf = new Map<string, string>();
  entries.forEach((e, i) => {
    const id = (e as { id?: unknown })?.id;
    if (typeof id === 'string' && !fileOf.has(id)) fileOf.set(id, origin[i]);
  });
  for (const p of libraryCheck(entries)) rows.push({ ...p, file: fileOf.get(p.entryId) ?? '?' });
  return { rows, entries, files };
}

function table(rows: Row[]): string {
  const cols: (keyof Row)[] = ['file', 'entryId', 'field', 'check', 'message'];
  const heads = ['file', 'entry', 'field', 'check', 'problem'];
  const widths = cols.map((c, i) => Math.min(60, Math.max(heads[i].length, ...rows.map((r) => String(r[c]).length))));
  const line = (cells: string[]) => cells.map((c, i) => (i === cells.length - 1 ? c : c.padEnd(widths[i]))).join('  ');
  return [line(heads), line(widths.map((w) => '-'.repeat(w))), ...rows.map((r) => line(cols.map((c) => String(r[c]))))].join('\n');
}

function main(): number {
  const i = process.argv.indexOf('--dir');
  const dir = path.resolve(i >= 0 ? process.argv[i + 1] ?? '' : path.join(__dirname, '..', 'library-data'));
  if (!fs.existsSync(dir)) {
    console.error(`library folder not found: ${dir}`);
    return 2;
  }
  const { rows, entries, files } = loadFolder(dir);
  for (const f of files) console.log(`${f.name}: ${f.count} entries`);
  console.log(`checked ${entries.length} entries: schema, formula (openchemlib), shift range, multiplicity, unique ids, near duplicates`);
  if (rows.length === 0) {
    console.log('no problems');
    return 0;
  }
  console.log(table(rows));
  console.log(`${rows.length} problem(s)`);
  return 1;
}

process.exit(main());
