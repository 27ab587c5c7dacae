import type { DataSource } from 'typeorm';
import type { Logger } from 'pino';
import type { DecisionBody, ReviewDetailResponse, ReviewQueueQuery } from '../../shared/api/review';
import type { SubmissionStatus } from '../../shared/api/submissions';
import type { LibraryEntry as EntryBody } from '../../shared/libraryEntry';
import { audit } from '../admin/audit';
import type { AuthUser } from '../auth/access';
import type { Config } from '../config';
import { tx } from '../data-source';
import { LibraryEntry } from '../entities/LibraryEntry';
import { Submission } from '../entities/Submission';
import { User } from '../entities/User';
import { AppError, conflict, notFound } from '../errors/AppError';
import { libraryAddRevision, libraryFindVisible, libraryRetire, rowToEntry } from '../library/service';
import type { Mailer } from '../mail/mailer';
import { curationChecks } from '../submissions/checks';
import { librarySnapshot } from '../submissions/librarySnapshot';
import { toSummary, userNames, viewOf } from '../submissions/views';

const STATUS_OF = { approve: 'approved', reject: 'rejected', request_changes: 'changes_requested' } as const satisfies Record<DecisionBody['decision'], SubmissionStatus>;

const likeEscape = (s: string) => s.replace(/[\\%_]/g, (c) => `\\${c}`);

export class ReviewService {
  constructor(
    private readonly ds: DataSource,
    private readonly config: Config,
    private readonly mailer: Mailer,
    private readonly logger: Logger,
  ) {}

  async queue(q: ReviewQueueQuery) {
    const qb = this.ds.getRepository(Submission).createQueryBuilder('s');
    if (q.status !== 'all') qb.andWhere('s.status = :status', { status: q.status });
    if (q.kind) qb.andWhere('s.kind = :kind', { kind: q.kind });
    if (q.studentWork !== undefined) qb.andWhere('s.student_work = :sw', { sw: q.studentWork ? 1 : 0 });
    if (q.q) qb.andWhere("(s.name LIKE :q ESCAPE '\\' OR s.entry_id LIKE :q ESCAPE '\\')", { q: `%${likeEscape(q.q)}%` });
    if (q.sort === 'newest') qb.orderBy('s.created_at', 'DESC');
    else if (q.sort === 'name') qb.orderBy('s.name', 'ASC').addOrderBy('s.created_at', 'ASC');
    else if (q.sort === 'problems') qb.orderBy('s.problem_count', 'DESC').addOrderBy('s.created_at', 'ASC');
    else qb.orderBy('s.created_at', 'ASC');
    qb.addOrderBy('s.id', 'ASC').take(q.limit).skip(q.offset);
    const [rows, total] = await qb.getManyAndCount();
    const names = await userNames(this.ds, rows);
    return { items: rows.map((r) => toSummary(r, names)), total };
  }

  /** Checks re-run against today's library, beside the nearest entry and the revision a change replaces. */
  async detail(id: string): Promise<ReviewDetailResponse> {
    const row = await this.ds.getRepository(Submission).findOneBy({ id });
    if (!row) throw notFound(`no submission ${id}`);
    const library = await librarySnapshot(this.ds);
    const entry = JSON.parse(row.body) as EntryBody;
    const checks = curationChecks(entry, library);
    const top = checks.similar[0];
    const nearestEntry = top ? library.byId.get(top.entryId) : undefined;
    return {
      submission: await viewOf(this.ds, row, checks),
      nearest: top && nearestEntry ? { similarity: top, entry: nearestEntry } : null,
      current: row.kind === 'change' ? (library.byId.get(row.entryId) ?? null) : null,
    };
  }

  /**
   * One decision per submission version: the update names the version the curator saw, so of two
   * curators deciding at once the second finds it moved and gets 409 with the first decision.
   */
  async decide(curator: AuthUser, id: string, body: DecisionBody) {
    const result = await tx(this.ds, async (m) => {
      const repo = m.getRepository(Submission);
      const row = await repo.findOneBy({ id });
      if (!row) return { kind: 'missing' } as const;
      if (row.status !== 'pending' || row.version !== body.version) return { kind: 'stale', row } as const;
      let added: LibraryEntry | null = null;
      if (body.decision === 'approve') {
        const entry = JSON.parse(row.body) as EntryBody;
        const visible = await libraryFindVisible(m, entry.id);
        if (row.kind === 'new') {
          const ever = await m.getRepository(LibraryEntry).countBy({ entryId: entry.id });
          if (ever > 0) return { kind: 'library', message: `entry.id: the library already has "${entry.id}"; ask for changes (a new id or a change submission)` } as const;
        } else if (!visible || visible.status !== 'current') {
          return { kind: 'library', message: `entry.id: "${entry.id}" is ${visible ? 'retired' : 'not in the library'}; it cannot take a new revision` } as const;
        }
        added = await libraryAddRevision(m, entry, { submissionId: row.id, createdBy: curator.id });
      }
      const now = new Date();
      const changes = { status: STATUS_OF[body.decision], decisionComment: body.comment || null, decidedBy: curator.id, decidedAt: now, version: row.version + 1, updatedAt: now };
      const upd = await repo
        .createQueryBuilder()
        .update()
        .set(changes)
        .where('id = :id AND version = :v', { id, v: row.version })
        .execute();
      if (upd.affected !== 1) throw new Error('submission version moved inside the write lock');
      Object.assign(row, changes);
      await audit(m, curator.id, `submission.${body.decision}`, 'submission', id, {
        comment: body.comment,
        entryId: row.entryId,
        ...(added ? { revision: added.revision } : {}),
      });
      if (added) await audit(m, curator.id, 'entry.revision', 'entry', added.entryId, { revision: added.revision, submissionId: id });
      return { kind: 'done', row, added } as const;
    });

    if (result.kind === 'missing') throw notFound(`no submission ${id}`);
    if (result.kind === 'library') throw new AppError(409, 'library_conflict', result.message, { issues: [{ field: 'entry.id', message: result.message }] });
    if (result.kind === 'stale') {
      const view = await viewOf(this.ds, result.row);
      const what = result.row.status === 'pending' ? `it changed (now version ${result.row.version})` : `it was already decided: ${result.row.status}${view.decidedBy ? ` by ${view.decidedBy.displayName}` : ''}`;
      throw conflict(`submission ${id}: ${what}`, { submission: view });
    }
    const view = await viewOf(this.ds, result.row);
    await this.mailSubmitter(result.row, view.decidedBy?.displayName ?? 'a curator');
    return { submission: view, entry: result.added ? rowToEntry(result.added) : null };
  }

  async retire(curator: AuthUser, entryId: string, revision: number, comment: string): Promise<EntryBody> {
    const result = await tx(this.ds, async (m) => {
      const row = await libraryFindVisible(m, entryId);
      if (!row) return { kind: 'missing' } as const;
      if (row.status === 'retired') return { kind: 'stale', row, why: 'is already retired' } as const;
      if (row.revision !== revision) return { kind: 'stale', row, why: `moved to revision ${row.revision}` } as const;
      const retired = await libraryRetire(m, entryId);
      await audit(m, curator.id, 'entry.retire', 'entry', entryId, { revision: retired.revision, comment });
      return { kind: 'done', row: retired } as const;
    });
    if (result.kind === 'missing') throw notFound(`no library entry "${entryId}"`);
    if (result.kind === 'stale') throw conflict(`library entry "${entryId}" ${result.why}`, { entry: rowToEntry(result.row) });
    return rowToEntry(result.row);
  }

  private async mailSubmitter(row: Submission, curatorName: string): Promise<void> {
    const submitter = await this.ds.getRepository(User).findOneBy({ id: row.submitterId });
    if (!submitter || submitter.disabled) return;
    const verdict = { approved: 'approved', rejected: 'rejected', changes_requested: 'sent back for changes', pending: 'pending' }[row.status];
    await this.mailer.send({
      kind: 'decision',
      to: submitter.email,
      subject: `Tessera: your submission "${row.name}" was ${verdict}`,
      text:
        `${curatorName} ${verdict} your submission "${row.name}" (${row.entryId}).\n` +
        (row.decisionComment ? `\nComment:\n${row.decisionComment}\n` : '') +
        `\nSee it at ${this.config.publicUrl}/submissions/${row.id}\n`,
    });
    this.logger.debug({ id: row.id, status: row.status }, 'submitter notified');
  }
}
