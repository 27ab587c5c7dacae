import type { Mixture } from '../shared/mixture';
import type { ScreenResult } from '../shared/screening';
import type { AnalysisReport } from '../shared/analysis';
import type { Nucleus } from '../shared/nucleus';
import type { Solvent } from '../shared/solvent';
import { getLocalDb } from './dataSource';
import { LocalAnalysis } from './entities/LocalAnalysis';
import { withWriteLock } from './writeLock';

/** What the person chose on the analyse screen. */
export interface AnalysisSettings {
  nucleus: Nucleus;
  solvent: Solvent;
  mhz: number;
  tolerancePpm: number;
  standard?: { entryId: string; concentrationMM: number } | null;
}

/** One analysis as kept on the device: inputs and every result needed to redraw it. */
export interface StoredAnalysis {
  id: string;
  name: string;
  createdAt: string;
  demo: boolean;
  settings: AnalysisSettings;
  mixture: Mixture;
  screen: ScreenResult;
  report: AnalysisReport;
  libraryCount: number;
}

export interface AnalysisListItem {
  id: string;
  name: string;
  createdAt: string;
  nucleus: string;
  demo: boolean;
  summary: string;
}

export function analysisSummary(a: StoredAnalysis): string {
  const top = a.report.fit.components
    .slice()
    .sort((x, y) => y.share - x.share)
    .slice(0, 3)
    .map((c) => c.name);
  return top.length ? top.join(', ') : 'no compound confirmed';
}

export async function analysisSave(a: StoredAnalysis): Promise<void> {
  const db = await getLocalDb();
  const repo = db.getRepository(LocalAnalysis);
  const row = repo.create({ id: a.id, name: a.name, createdAt: a.createdAt, nucleus: a.mixture.nucleus, demo: a.demo ? 1 : 0, summary: analysisSummary(a), body: JSON.stringify(a) });
  await withWriteLock(() => repo.save(row));
}

/** Newest first, without the bodies (the list stays fast with hundreds of analyses). */
export async function analysisList(): Promise<AnalysisListItem[]> {
  const db = await getLocalDb();
  const rows = await db.getRepository(LocalAnalysis).find({ select: { id: true, name: true, createdAt: true, nucleus: true, demo: true, summary: true }, order: { createdAt: 'DESC' } });
  return rows.map((r) => ({ id: r.id, name: r.name, createdAt: r.createdAt, nucleus: r.nucleus, demo: r.demo === 1, summary: r.summary }));
}

export async function analysisGet(id: string): Promise<StoredAnalysis | null> {
  const db = await getLocalDb();
  const row = await db.getRepository(LocalAnalysis).findOneBy({ id });
  return row ? (JSON.parse(row.body) as StoredAnalysis) : null;
}

export async function analysisDelete(id: string): Promise<void> {
  const db = await getLocalDb();
  await withWriteLock(() => db.getRepository(LocalAnalysis).delete({ id }));
}
