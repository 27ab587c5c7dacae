import type { StoredAnalysis } from '../localdb/analyses';
import { CAUTION_TEXT } from '../shared/caution';
import { csvJoin } from './analysisExport';

export interface BatchSummary {
  compounds: Array<{ entryId: string; name: string }>;
  rows: Array<{ sample: string; analysisId: string | null; error: string | null; amounts: Record<string, number | null> }>;
}

/** Sample × compound table: each confirmed (non-standard) compound's mole fraction per sample. */
export function batchSummary(results: Array<{ fileName: string; analysis: StoredAnalysis | null; error: string | null }>): BatchSummary {
  const compounds = new Map<string, string>();
  for (const r of results) for (const a of r.analysis?.report.amounts ?? []) if (!a.isStandard) compounds.set(a.entryId, a.name);
  const list = [...compounds].map(([entryId, name]) => ({ entryId, name })).sort((a, b) => a.name.localeCompare(b.name));
  return {
    compounds: list,
    rows: results.map((r) => {
      const amounts: Record<string, number | null> = {};
      for (const c of list) amounts[c.entryId] = r.analysis?.report.amounts.find((a) => a.entryId === c.entryId)?.moleFraction ?? null;
      return { sample: r.analysis?.name ?? r.fileName, analysisId: r.analysis?.id ?? null, error: r.error, amounts };
    }),
  };
}

export function batchToCsv(s: BatchSummary): string {
  const head = ['sample', ...s.compounds.map((c) => `${c.name} [${c.entryId}] mole fraction`), 'problem'];
  const rows = s.rows.map((r) => [r.sample, ...s.compounds.map((c) => r.amounts[c.entryId]), r.error ?? '']);
  return `# ${CAUTION_TEXT}\r\n` + csvJoin([head, ...rows]);
}
