// `tessera batch`: screen every mixture file of a folder against one library; one summary CSV.
import { readdirSync, renameSync, statSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { parseArgs } from 'node:util';
import Papa from 'papaparse';
import { InputError } from '../../matching/io';
import { screenMixture } from '../../matching/screen';
import { CAUTION_TEXT } from '../../shared/caution';
import type { Mixture } from '../../shared/mixture';
import type { CliCommand } from './index';
import { cliErrorReport, librariesRead, mixtureFileRead, SCREEN_OPTIONS, screenSettings, UsageError } from './screen';

const MIXTURE_FILE = /\.(csv|tsv|txt|jdx|dx|jcamp)$/i;

export const BATCH_COLUMNS = [
  'file',
  'mixture',
  'peaks_used',
  'peaks_set_aside',
  'window_hit_share',
  'rank',
  'entry_id',
  'name',
  'score',
  'explained_share',
  'contaminant',
  'ambiguity_group',
  'shadowed_by',
] as const;

/**
 * Every file is read and checked before anything is screened or written: one bad file stops the
 * run with every problem listed and no summary written, so a half-finished CSV never passes for a
 * complete one. One row per candidate; a mixture without candidates still gets one row.
 */
export async function run(argv: string[]): Promise<number> {
  try {
    const { values } = parseArgs({ args: argv, options: { ...SCREEN_OPTIONS, folder: { type: 'string' }, out: { type: 'string' } }, allowPositionals: false });
    if (values.help) {
      console.log('usage: tessera batch --library L.json [--library L2.json] --folder DIR --out summary.csv [--solvent CDCl3] [--nucleus 1H] [--mhz 600] [--tolerance 0.03] [--min-score 0.5] [--keep-solvent]');
      return 0;
    }
    if (!values.library?.length) throw new UsageError('--library L.json is required');
    if (!values.folder) throw new UsageError('--folder DIR is required');
    if (!values.out) throw new UsageError('--out summary.csv is required');
    const { meta, options } = screenSettings(values);
    const entries = librariesRead(values.library);
    let names: string[];
    try {
      names = readdirSync(values.folder).filter((n) => MIXTURE_FILE.test(n) && statSync(path.join(values.folder!, n)).isFile()).sort();
    } catch (e) {
      throw new UsageError(`cannot read folder ${values.folder}: ${(e as NodeJS.ErrnoException).code ?? (e as Error).message}`);
    }
    if (names.length === 0) throw new UsageError(`no mixture files (.csv, .tsv, .txt, .jdx, .dx) in ${values.folder}`);
    const mixtures: Array<{ file: string; mixture: Mixture }> = [];
    const failures: string[] = [];
    for (const name of names) {
      try {
        mixtures.push({ file: name, mixture: mixtureFileRead(path.join(values.folder, name), meta) });
      } catch (e) {
        if (e instanceof InputError || e instanceof RangeError) failures.push(`${name}: ${e.message}`);
        else throw e;
      }
    }
    if (failures.length > 0) {
      for (const f of failures) console.error(`error: ${f}`);
      console.error(`${failures.length} of ${names.length} files could not be read; nothing written.`);
      return 1;
    }
    const rows: Array<Record<(typeof BATCH_COLUMNS)[number], string | number>> = [];
    for (const { file, mixture } of mixtures) {
      const r = screenMixture(mixture, entries, options);
      const base = { file, mixture: r.mixtureName, peaks_used: r.peaksUsed.length, peaks_set_aside: r.peaksExcluded.length, window_hit_share: r.crowding.windowHitShare.toFixed(3) };
      if (r.candidates.length === 0) rows.push({ ...base, rank: '', entry_id: '', name: '', score: '', explained_share: '', contaminant: '', ambiguity_group: '', shadowed_by: '' });
      for (const c of r.candidates) {
        rows.push({
          ...base,
          rank: c.rank,
          entry_id: c.entryId,
          name: c.name,
          score: c.score.toFixed(4),
          explained_share: c.explainedShare.toFixed(4),
          contaminant: c.contaminant ? 'yes' : 'no',
          ambiguity_group: c.ambiguityGroup ?? '',
          shadowed_by: c.shadowedBy.join(' '),
        });
      }
      console.log(`${file}: ${r.candidates.length} candidate(s)${r.candidates[0] ? `, best ${r.candidates[0].name} (${r.candidates[0].score.toFixed(3)})` : ''}${r.crowding.warning ? ' — crowded: many entries reach the threshold by chance' : ''}`);
    }
    const csv = `# ${CAUTION_TEXT}\n${Papa.unparse({ fields: [...BATCH_COLUMNS], data: rows.map((row) => BATCH_COLUMNS.map((c) => row[c])) }, { newline: '\n' })}\n`;
    const tmp = `${values.out}.tmp-${process.pid}`;
    try {
      writeFileSync(tmp, csv);
      renameSync(tmp, values.out);
    } catch (e) {
      throw new UsageError(`cannot write ${values.out}: ${(e as NodeJS.ErrnoException).code ?? (e as Error).message}`);
    }
    console.log(`wrote ${values.out}: ${mixtures.length} mixtures, ${rows.length} rows`);
    console.log(CAUTION_TEXT);
    return 0;
  } catch (e) {
    return cliErrorReport(e);
  }
}

export const batchCommand: CliCommand = { summary: 'screen every mixture file in a folder; write one summary CSV', run };
