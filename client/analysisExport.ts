import type { StoredAnalysis } from '../localdb/analyses';
import { CAUTION_TEXT } from '../shared/caution';
import { analysisRows, statusText } from './analysisRows';

function csvCell(v: unknown): string {
  if (v === null || v === undefined) return '';
  const s = typeof v === 'number' ? (Number.isFinite(v) ? String(v) : '') : String(v);
  return /[",\n\r]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
}

export function csvJoin(rows: unknown[][]): string {
  return rows.map((r) => r.map(csvCell).join(',')).join('\r\n') + '\r\n';
}

/** The result table as CSV: one row a candidate, the caution as a comment line first. */
export function analysisToCsv(a: StoredAnalysis): string {
  const head = ['rank', 'entry_id', 'name', 'screen_score', 'q_value', 'status', 'fit_share', 'mole_fraction', 'mole_fraction_u', 'concentration_mM', 'concentration_u_mM', 'snr', 'shift_offset_ppm'];
  const rows = analysisRows(a).map((r) => [
    r.rank,
    r.entryId,
    r.name,
    r.screen.score,
    r.qValue,
    statusText(r),
    r.fit?.share ?? null,
    r.amount?.moleFraction ?? null,
    r.amount?.moleFractionUncertainty ?? null,
    r.amount?.concentrationMM ?? null,
    r.amount?.concentrationUncertaintyMM ?? null,
    r.amount?.snr ?? r.fit?.snr ?? null,
    r.fit?.shiftOffsetPpm ?? null,
  ]);
  return `# ${a.name}${a.demo ? ' (demo data)' : ''} — ${CAUTION_TEXT}\r\n` + csvJoin([head, ...rows]);
}

/** Everything needed to redo or audit the analysis: inputs, settings, screening and fit. */
export function analysisToJson(a: StoredAnalysis): string {
  return JSON.stringify({ format: 'tessera-analysis', version: 1, caution: CAUTION_TEXT, ...a }, null, 2);
}

export function exportFileName(a: StoredAnalysis, ext: string): string {
  const base = a.name.replace(/[^A-Za-z0-9._-]+/g, '-').replace(/^-+|-+$/g, '') || 'analysis';
  return `${base}-${a.createdAt.slice(0, 10)}.${ext}`;
}
