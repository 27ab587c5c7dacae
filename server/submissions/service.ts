import crypto from 'node:crypto';
import { In, Not, type DataSource } from 'typeorm';
import type { Logger } from 'pino';
import type { SubmissionKind, SubmissionSource, SubmissionSummary, SubmissionView } from '../../shared/api/submissions';
import type { SyncPushResult } from '../../shared/api/sync';
import type { LibraryEntry as EntryBody } from '../../shared/libraryEntry';
import type { AuthUser } from '../auth/access';
import type { Config } from '../config';
import { tx } from '../data-source';
import { AuditLog } from '../entities/AuditLog';
import { LibraryEntry } from '../entities/LibraryEntry';
import { Submission } from '../entities/Submission';
import { User } from '../entities/User';
import { AppError, forbidden, notFound, type Issue } from '../errors/AppError';
import type { Mailer } from '../mail/mailer';
import { curationChecks } from './checks';
import { librarySnapshot } from './librarySnapshot';
import { toSummary, userNames, viewOf } from './views';

/** A validated proposal, ready to be judged against the library and stored. */
export interface Proposal {
  id?: string;
  kind: SubmissionKind;
  baseRevision?: number;
  entry: EntryBody;
  note?: string;
  sourceFormat: SubmissionSource;
  fileName?: string;
}

export type ProposalOutcome =
  | { outcome: 'created'; row: Submission }
  | { outcome: 'duplicate'; row: Submission }
  | { outcome: 'conflict' | 'rejected'; error: { status: number; code: string; message: string; issues: Issue[] } };

const SUBMITTER_ROLES = new Set(['student', 'analyst', 'curator']);

export class SubmissionService {
  constructor(
    private readonly ds: DataSource,
    private readonly config: Config,
    private readonly mailer: Mailer,
    private readonly logger: Logger,
  ) {}

  /**
   * Stores proposals in one transaction with a fixed number of queries however many there are:
   * existing ids, library state of the entry ids, then one bulk insert each for submissions and
   * audit rows. Checks run in memory against the cached library snapshot.
   */
  async store(user: AuthUser, proposals: Proposal[]): Promise<ProposalOutcome[]> {
    if (!SUBMITTER_ROLES.has(user.role)) throw forbidden(`role ${user.role} may not submit entries`);
    const library = await librarySnapshot(this.ds);
    const now = new Date();
    const prepared = proposals.map((p) => {
      const entry: EntryBody = user.role === 'student' ? { ...p.entry, studentWork: true } : p.entry;
      const { revision: _r, retired: _t, ...clean } = entry;
      return { p, entry: clean as EntryBody, checks: curationChecks(clean as EntryBody, library, now) };
    });

    const outcomes = await tx(this.ds, async (m) => {
      const ids = prepared.map((x) => x.p.id).filter((x): x is string => !!x);
      const existing = ids.length ? await m.getRepository(Submission).findBy({ id: In(ids) }) : [];
      const existingById = new Map(existing.map((s) => [s.id, s]));
      const entryIds = [...new Set(prepared.map((x) => x.entry.id))];
      const libRows = await m
        .getRepository(LibraryEntry)
        .createQueryBuilder('e')
        .select(['e.entryId', 'e.revision', 'e.status'])
        .where('e.entry_id IN (:...ids)', { ids: entryIds })
        .getMany();
      const everHeld = new Set(libRows.map((r) => r.entryId));
      const visible = new Map(libRows.filter((r) => r.status !== 'superseded').map((r) => [r.entryId, r]));

      const out: ProposalOutcome[] = [];
      const inserts: Submission[] = [];
      const batchIds = new Set<string>();
      for (const { p, entry, checks } of prepared) {
        const fail = (outcome: 'conflict' | 'rejected', status: number, code: string, message: string, field: string) =>
          out.push({ outcome, error: { status, code, message, issues: [{ field, message }] } });
        if (p.id) {
          const prior = existingById.get(p.id);
          if (prior) {
            if (prior.submitterId === user.id) out.push({ outcome: 'duplicate', row: prior });
            else fail('conflict', 409, 'id_taken', `id: submission ${p.id} belongs to another account`, 'id');
            continue;
          }
          if (batchIds.has(p.id)) {
            const first = inserts.find((r) => r.id === p.id)!;
            out.push({ outcome: 'duplicate', row: first });
            continue;
          }
        }
        const target = visible.get(entry.id);
        if (p.kind === 'new' && everHeld.has(entry.id)) {
          fail('conflict', 409, 'entry_exists', `entry.id: the library already has "${entry.id}"${target?.status === 'retired' ? ' (retired)' : ''}; submit a change or pick another id`, 'entry.id');
          continue;
        }
        if (p.kind === 'change' && (!target || target.status !== 'current')) {
          fail('conflict', target ? 409 : 404, target ? 'entry_retired' : 'entry_missing', `entry.id: "${entry.id}" is ${target ? 'retired' : 'not in the library'}; a change needs a current entry`, 'entry.id');
          continue;
        }
        if (p.kind === 'change' && p.baseRevision !== undefined && target && p.baseRevision > target.revision) {
          fail('rejected', 400, 'invalid_request', `baseRevision: ${p.baseRevision} is newer than the current revision ${target.revision}`, 'baseRevision');
          continue;
        }
        const row = Object.assign(new Submission(), {
          id: p.id ?? crypto.randomUUID(),
          submitterId: user.id,
          kind: p.kind,
          entryId: entry.id,
          baseRevision: p.kind === 'change' ? (p.baseRevision ?? target!.revision) : null,
          name: entry.name,
          body: JSON.stringify(entry),
          sourceFormat: p.sourceFormat,
          fileName: p.fileName ?? null,
          status: 'pending',
          checks: JSON.stringify(checks),
          problemCount: checks.problems.length,
          nearestEntryId: checks.nearestEntryId,
          studentWork: entry.studentWork === true,
          note: p.note ?? null,
          decisionComment: null,
          decidedBy: null,
          decidedAt: null,
          version: 1,
          createdAt: now,
          updatedAt: now,
        } satisfies Partial<Submission>);
        batchIds.add(row.id);
        inserts.push(row);
        out.push({ outcome: 'created', row });
      }
      if (inserts.length) {
        // SQLite caps bound parameters; 25 columns × 30 rows stays well under it.
        for (let i = 0; i < inserts.length; i += 30) await m.getRepository(Submission).insert(inserts.slice(i, i + 30));
        for (let i = 0; i < inserts.length; i += 100) {
          await m.getRepository(AuditLog).insert(
            inserts.slice(i, i + 100).map((r) => ({ at: now, actorId: user.id, action: 'submission.create', subjectType: 'submission', subjectId: r.id, details: JSON.stringify({ kind: r.kind, entryId: r.entryId, source: r.sourceFormat }) })),
          );
        }
      }
      return out;
    });

    const created = outcomes.flatMap((o) => (o.outcome === 'created' ? [o.row] : []));
    if (created.length) await this.mailCurators(user, created);
    return outcomes;
  }

  /** Stores one proposal or throws its error (the JSON and upload routes). */
  async storeOne(user: AuthUser, p: Proposal): Promise<{ created: boolean; submission: SubmissionView }> {
    const [o] = await this.store(user, [p]);
    if (o.outcome === 'created' || o.outcome === 'duplicate') return { created: o.outcome === 'created', submission: await viewOf(this.ds, o.row) };
    throw new AppError(o.error.status, o.error.code, o.error.message, { issues: o.error.issues });
  }

  async summaries(rows: Submission[]): Promise<SubmissionSummary[]> {
    const names = await userNames(this.ds, rows);
    return rows.map((r) => toSummary(r, names));
  }

  /** The caller's own submission, or any for curators and admins. */
  async getVisible(user: AuthUser, id: string): Promise<SubmissionView> {
    const row = await this.ds.getRepository(Submission).findOneBy({ id });
    if (!row || (row.submitterId !== user.id && user.role !== 'curator' && user.role !== 'admin')) throw notFound(`no submission ${id}`);
    return viewOf(this.ds, row);
  }

  async listMine(user: AuthUser, q: { status?: Submission['status']; limit: number; offset: number }) {
    const [rows, total] = await this.ds.getRepository(Submission).findAndCount({
      where: { submitterId: user.id, ...(q.status ? { status: q.status } : {}) },
      order: { createdAt: 'DESC', id: 'ASC' },
      take: q.limit,
      skip: q.offset,
    });
    return { items: await this.summaries(rows), total };
  }

  private async mailCurators(by: AuthUser, rows: Submission[]): Promise<void> {
    const curators = await this.ds.getRepository(User).find({ where: { role: 'curator', disabled: false, id: Not(by.id) }, select: { email: true } });
    const lines = rows.map((r) => `- ${r.name} (${r.entryId}), ${r.kind === 'new' ? 'new entry' : 'change'}${r.studentWork ? ', student work' : ''}, ${r.problemCount} check finding(s)`).join('\n');
    for (const c of curators) {
      await this.mailer.send({
        kind: 'new_submission',
        to: c.email,
        subject: rows.length === 1 ? `Tessera: new submission "${rows[0].name}"` : `Tessera: ${rows.length} new submissions`,
        text: `${by.displayName} submitted:\n${lines}\n\nReview them at ${this.config.publicUrl}/review\n`,
      });
    }
    this.logger.debug({ count: rows.length }, 'curators notified');
  }
}

export function outcomeToResult(index: number, id: string | null, o: ProposalOutcome, summary?: SubmissionSummary): SyncPushResult {
  if (o.outcome === 'created' || o.outcome === 'duplicate') return { index, id, outcome: o.outcome, submission: summary };
  return { index, id, outcome: o.outcome, error: { code: o.error.code, message: o.error.message, issues: o.error.issues } };
}
