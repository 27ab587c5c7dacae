import type { StoredAnalysis } from '../localdb/analyses';
import type { ScreenCandidate } from '../shared/screening';
import type { AmountResult, FitComponent, RejectedCandidate } from '../shared/analysis';

/** One candidate as the result table shows it: screening, fit, amounts and q-value side by side. */
export interface CandidateRow {
  entryId: string;
  name: string;
  rank: number;
  screen: ScreenCandidate;
  fit: FitComponent | null;
  rejected: RejectedCandidate | null;
  amount: AmountResult | null;
  qValue: number | null;
  confirmed: boolean;
}

export function analysisRows(a: StoredAnalysis): CandidateRow[] {
  const fit = new Map(a.report.fit.components.map((c) => [c.entryId, c]));
  const rej = new Map(a.report.fit.rejected.map((c) => [c.entryId, c]));
  const amt = new Map(a.report.amounts.map((c) => [c.entryId, c]));
  const q = new Map(a.report.qValues.map((c) => [c.entryId, c.qValue]));
  return a.screen.candidates.map((c) => ({
    entryId: c.entryId,
    name: c.name,
    rank: c.rank,
    screen: c,
    fit: fit.get(c.entryId) ?? null,
    rejected: rej.get(c.entryId) ?? null,
    amount: amt.get(c.entryId) ?? null,
    qValue: q.get(c.entryId) ?? null,
    confirmed: fit.has(c.entryId),
  }));
}

export function fmt(v: number | null | undefined, digits = 3): string {
  if (v === null || v === undefined || !Number.isFinite(v)) return '—';
  return Math.abs(v) >= 1000 ? v.toFixed(0) : v.toPrecision(digits);
}

export function withUncertainty(v: number | null | undefined, u: number | null | undefined, digits = 3): string {
  if (v === null || v === undefined) return '—';
  return u === null || u === undefined ? fmt(v, digits) : `${fmt(v, digits)} ± ${fmt(u, 2)}`;
}

export function statusText(r: CandidateRow): string {
  if (r.confirmed) return r.amount?.isStandard ? 'internal standard' : r.amount?.belowQuantitationLimit ? 'present, below quantitation limit' : 'confirmed by fit';
  if (r.rejected) return `not confirmed: ${r.rejected.message}`;
  return 'screened only';
}
