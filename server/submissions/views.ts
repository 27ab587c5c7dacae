import { In, type DataSource, type EntityManager } from 'typeorm';
import type { CurationChecks, SubmissionSummary, SubmissionView } from '../../shared/api/submissions';
import type { LibraryEntry as EntryBody } from '../../shared/libraryEntry';
import { Submission } from '../entities/Submission';
import { User } from '../entities/User';

export type UserNames = Map<string, { id: string; displayName: string }>;

/** Display names for every user the rows mention, in one query. */
export async function userNames(m: DataSource | EntityManager, rows: Submission[]): Promise<UserNames> {
  const ids = [...new Set(rows.flatMap((r) => [r.submitterId, r.decidedBy]).filter((x): x is string => !!x))];
  if (ids.length === 0) return new Map();
  const users = await m.getRepository(User).find({ where: { id: In(ids) }, select: { id: true, displayName: true } });
  return new Map(users.map((u) => [u.id, { id: u.id, displayName: u.displayName }]));
}

const who = (names: UserNames, id: string) => names.get(id) ?? { id, displayName: '(removed account)' };

export function toSummary(r: Submission, names: UserNames): SubmissionSummary {
  return {
    id: r.id,
    kind: r.kind,
    entryId: r.entryId,
    baseRevision: r.baseRevision,
    name: r.name,
    status: r.status,
    sourceFormat: r.sourceFormat,
    fileName: r.fileName,
    studentWork: r.studentWork,
    problemCount: r.problemCount,
    nearestEntryId: r.nearestEntryId,
    submitter: who(names, r.submitterId),
    decisionComment: r.decisionComment,
    decidedAt: r.decidedAt ? r.decidedAt.toISOString() : null,
    version: r.version,
    createdAt: r.createdAt.toISOString(),
    updatedAt: r.updatedAt.toISOString(),
  };
}

export function toView(r: Submission, names: UserNames, checks?: CurationChecks): SubmissionView {
  return {
    ...toSummary(r, names),
    entry: JSON.parse(r.body) as EntryBody,
    note: r.note,
    checks: checks ?? (JSON.parse(r.checks) as CurationChecks),
    decidedBy: r.decidedBy ? who(names, r.decidedBy) : null,
  };
}

export async function viewOf(m: DataSource | EntityManager, r: Submission, checks?: CurationChecks): Promise<SubmissionView> {
  return toView(r, await userNames(m, [r]), checks);
}
