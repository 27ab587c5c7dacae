// `tessera analyse`: screening, overlay fit, amounts and q-values for one mixture file.
import { parseArgs } from 'node:util';
import { analyseMixture } from '../../matching/analyse/analyseMixture';
import type { AnalysisOptions, AnalysisReport, InternalStandard, PurityInput } from '../../shared/analysis';
import { CAUTION_TEXT } from '../../shared/caution';
import type { CliCommand } from './index';
import { cliErrorReport, cliNumber, libraryFileRead, mixtureFileRead, SCREEN_OPTIONS, screenSettings, UsageError } from './screen';

const USAGE =
  'usage: tessera analyse --library L.json [--library more.json] --mixture M.csv|M.jdx [--standard ID:CONC_mM[:NUCLEI]]\n' +
  '                       [--purity ANALYTE_ID:MASS_mg:STD_MASS_mg:STD_PURITY] [--linewidth HZ] [--decoys N] [--seed N]\n' +
  '                       [--solvent CDCl3] [--nucleus 1H] [--mhz 600] [--tolerance 0.03] [--min-score 0.5] [--keep-solvent] [--json]';

/** "ID:CONC_mM[:NUCLEI]" → an internal standard; the id may itself hold colons. */
export function standardParse(raw: string): InternalStandard {
  const parts = raw.split(':');
  const bad = () => new UsageError(`--standard must be ID:CONC_mM or ID:CONC_mM:NUCLEI (e.g. dss:0.5:9), got "${raw}"`);
  if (parts.length < 2) throw bad();
  const num = (s: string) => (s.trim() === '' ? NaN : Number(s));
  // Try ID:CONC:NUCLEI first (last part an integer), else ID:CONC.
  const last = num(parts[parts.length - 1]);
  const prev = parts.length >= 3 ? num(parts[parts.length - 2]) : NaN;
  if (parts.length >= 3 && Number.isInteger(last) && last > 0 && prev > 0 && Number.isFinite(prev)) {
    return { entryId: parts.slice(0, -2).join(':'), concentrationMM: prev, nuclei: last };
  }
  if (!(last > 0) || !Number.isFinite(last)) throw bad();
  const entryId = parts.slice(0, -1).join(':');
  if (entryId === '') throw bad();
  return { entryId, concentrationMM: last };
}

/** "ID:MASS_mg:STD_MASS_mg:STD_PURITY" → a purity assay; the id may itself hold colons. */
export function purityParse(raw: string): PurityInput {
  const parts = raw.split(':');
  const nums = parts.slice(-3).map((s) => (s.trim() === '' ? NaN : Number(s)));
  const entryId = parts.slice(0, -3).join(':');
  if (parts.length < 4 || entryId === '' || !nums.every((v) => Number.isFinite(v) && v > 0) || nums[2] > 1) {
    throw new UsageError(`--purity must be ANALYTE_ID:MASS_mg:STANDARD_MASS_mg:STANDARD_PURITY (purity as a fraction ≤ 1, e.g. benzoic-acid:12.05:10.12:0.9994), got "${raw}"`);
  }
  return { entryId, analyteMassMg: nums[0], standardMassMg: nums[1], standardPurity: nums[2] };
}

function fixed(v: number | null, digits: number): string {
  return v === null ? '—' : v.toFixed(digits);
}

/** The table a person reads: fitted compounds with amounts, q-values and flags, then the caution. */
export function analysisReportTable(r: AnalysisReport): string {
  const out: string[] = [];
  const f = r.fit;
  out.push(`Mixture "${r.mixtureName}" (${r.nucleus}, ${f.kind}): ${r.screenedCandidates.length} candidates from screening, ${f.components.length} kept by the fit, R² = ${f.rSquared.toFixed(4)}, linewidth ${f.linewidthHz.toFixed(2)} Hz (${f.linewidthSource})`);
  if (f.components.length === 0) out.push('No candidate is needed to explain the mixture.');
  else {
    const withConc = r.amounts.some((a) => a.concentrationMM !== null);
    const head = ['entry', 'name', 'mole frac.', '±', ...(withConc ? ['mM', '±'] : []), 'share', 'Δδ ppm', 'S/N', 'q-value', 'notes'];
    const rows = f.components.map((c) => {
      const a = r.amounts.find((x) => x.entryId === c.entryId)!;
      const q = r.qValues.find((x) => x.entryId === c.entryId)!;
      const notes = [
        a.isStandard ? 'internal standard' : '',
        a.identifiable === false ? `own amount not identifiable (set ${a.indistinguishableSet})` : '',
        c.belowQuantitationLimit ? 'S/N < 10: not quantifiable' : '',
        q.score === 0 ? 'one line of evidence' : '',
      ]
        .filter(Boolean)
        .join('; ');
      return [
        c.entryId, c.name, a.inFractions ? a.moleFraction.toFixed(3) : '—', fixed(a.moleFractionUncertainty, 3),
        ...(withConc ? [fixed(a.concentrationMM, 3), fixed(a.concentrationUncertaintyMM, 3)] : []),
        `${(c.share * 100).toFixed(1)}%`, c.shiftOffsetPpm.toFixed(4), c.snr === null ? '—' : c.snr.toFixed(0), q.qValue.toFixed(3), notes,
      ];
    });
    const widths = head.map((h, i) => Math.max(h.length, ...rows.map((row) => row[i].length)));
    const fmt = (row: string[]) => row.map((v, i) => (i === row.length - 1 ? v : v.padEnd(widths[i]))).join('  ').trimEnd();
    out.push(fmt(head), fmt(widths.map((w) => '-'.repeat(w))), ...rows.map(fmt));
  }
  for (const set of r.indistinguishable ?? []) {
    const conc = set.concentrationMM !== null ? `, ${set.concentrationMM.toFixed(3)} mM${set.concentrationUncertaintyMM !== null ? ` ± ${set.concentrationUncertaintyMM.toFixed(3)}` : ''}` : '';
    out.push(`Set ${set.id} (${set.members.join(' + ')}): combined mole fraction ${set.moleFraction.toFixed(3)}${set.moleFractionUncertainty !== null ? ` ± ${set.moleFractionUncertainty.toFixed(3)}` : ''}${conc}: these cannot be told apart by this data, their own amounts are not identifiable (see the warning)`);
  }
  if (r.purity) {
    const p = r.purity;
    out.push(`Purity of ${p.entryId}: mass fraction ${p.massFraction.toFixed(4)}${p.uncertainty !== null ? ` ± ${p.uncertainty.toFixed(4)} (fit only)` : ''}, M = ${p.molarMassAnalyte.toFixed(3)} g/mol against the standard's ${p.molarMassStandard.toFixed(3)} g/mol`);
  }
  if (f.rejected.length > 0) {
    const shown = f.rejected.slice(0, 8).map((x) => `${x.entryId} (${x.message})`);
    out.push(`Rejected by the fit (${f.rejected.length}): ${shown.join('; ')}${f.rejected.length > 8 ? '; … (all in --json)' : ''}`);
  }
  if (f.unexplainedPeaks.length > 0) {
    const shown = f.unexplainedPeaks.slice(0, 12).map((p) => p.shift.toFixed(3));
    out.push(`Unexplained peaks (${f.unexplainedPeaks.length}): ${shown.join(', ')}${f.unexplainedPeaks.length > 12 ? ', …' : ''} ppm`);
  }
  out.push(`q-values from ${r.decoySets} decoy libraries (target–decoy); a compound seen through one line only gets q = 1.`);
  for (const w of r.warnings) out.push(`warning: ${w}`);
  out.push('', CAUTION_TEXT);
  return out.join('\n');
}

/** Exit codes: 0 done, 1 bad input file, 2 bad command line. */
export async function run(argv: string[]): Promise<number> {
  try {
    const { values } = parseArgs({
      args: argv,
      options: {
        ...SCREEN_OPTIONS,
        library: { type: 'string', multiple: true },
        mixture: { type: 'string' },
        standard: { type: 'string' },
        purity: { type: 'string' },
        linewidth: { type: 'string' },
        decoys: { type: 'string' },
        seed: { type: 'string' },
        json: { type: 'boolean' },
      },
      allowPositionals: false,
    });
    if (values.help) {
      console.log(USAGE);
      return 0;
    }
    if (!values.library || values.library.length === 0) throw new UsageError('--library L.json is required');
    if (!values.mixture) throw new UsageError('--mixture M.csv is required');
    const { meta, options: screen } = screenSettings(values);
    const options: AnalysisOptions = { screen };
    if (values.standard !== undefined) options.standard = standardParse(values.standard);
    if (values.purity !== undefined) {
      if (!options.standard) throw new UsageError('--purity needs --standard');
      options.purity = purityParse(values.purity);
    }
    const lw = cliNumber('linewidth', values.linewidth, (v) => v > 0 && v <= 100, 'a linewidth in Hz between 0 and 100');
    if (lw !== undefined) options.fit = { linewidthHz: lw };
    const sets = cliNumber('decoys', values.decoys, (v) => Number.isInteger(v) && v >= 1 && v <= 200, 'a whole number of decoy libraries between 1 and 200');
    if (sets !== undefined) options.decoySets = sets;
    const seed = cliNumber('seed', values.seed, (v) => Number.isInteger(v), 'an integer');
    if (seed !== undefined) options.seed = seed;
    const entries = values.library.flatMap((file) => libraryFileRead(file));
    const seen = new Set<string>();
    for (const e of entries) {
      if (seen.has(e.id)) throw new UsageError(`entry "${e.id}" appears in more than one --library file`);
      seen.add(e.id);
    }
    const mixture = mixtureFileRead(values.mixture, meta);
    const report = analyseMixture(mixture, entries, options);
    console.log(values.json ? JSON.stringify(report, null, 2) : analysisReportTable(report));
    return 0;
  } catch (e) {
    return cliErrorReport(e);
  }
}

export const analyseCommand: CliCommand = { summary: 'screen, fit and quantify one mixture, with q-values (table or --json)', run };
