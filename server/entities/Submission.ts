import { Column, Entity, Index, PrimaryColumn } from 'typeorm';
import type { SubmissionStatus, SubmissionKind, SubmissionSource } from '../../shared/api/submissions';

/** A proposed new entry or a change to an existing one, waiting for (or past) a curator's decision. */
@Entity('submission')
@Index('idx_submission_status_created', ['status', 'createdAt'])
export class Submission {
  /** Client-made UUID when pushed from the app (makes push idempotent), else server-made. */
  @PrimaryColumn({ type: 'varchar', length: 36 })
  id: string;

  @Index('idx_submission_submitter')
  @Column({ name: 'submitter_id', type: 'varchar', length: 36 })
  submitterId: string;

  @Column({ type: 'varchar', length: 16 })
  kind: SubmissionKind;

  /** Proposed entry id (= target entry for a change). */
  @Column({ name: 'entry_id', type: 'varchar', length: 80 })
  entryId: string;

  /** For a change: the revision the submitter started from (to show the curator what moved). */
  @Column({ name: 'base_revision', type: 'integer', nullable: true })
  baseRevision: number | null;

  @Column({ type: 'varchar', length: 200 })
  name: string;

  /** JSON of the proposed shared LibraryEntry. */
  @Column({ type: 'text' })
  body: string;

  @Column({ name: 'source_format', type: 'varchar', length: 16 })
  sourceFormat: SubmissionSource;

  @Column({ name: 'file_name', type: 'varchar', length: 255, nullable: true })
  fileName: string | null;

  @Column({ type: 'varchar', length: 24 })
  status: SubmissionStatus;

  /** JSON of the automatic curation checks (shared/api/submissions.ts CurationChecks). */
  @Column({ type: 'text' })
  checks: string;

  /** Summary of `checks` for sorting the queue. */
  @Column({ name: 'problem_count', type: 'integer', default: 0 })
  problemCount: number;

  @Column({ name: 'nearest_entry_id', type: 'varchar', length: 80, nullable: true })
  nearestEntryId: string | null;

  @Column({ name: 'student_work', type: 'boolean', default: false })
  studentWork: boolean;

  @Column({ type: 'text', nullable: true })
  note: string | null;

  @Column({ name: 'decision_comment', type: 'text', nullable: true })
  decisionComment: string | null;

  @Column({ name: 'decided_by', type: 'varchar', length: 36, nullable: true })
  decidedBy: string | null;

  @Column({ name: 'decided_at', type: 'datetime', nullable: true })
  decidedAt: Date | null;

  /** Optimistic lock: a decision names the version it saw; a stale one gets 409. */
  @Column({ type: 'integer' })
  version: number;

  @Column({ name: 'created_at', type: 'datetime' })
  createdAt: Date;

  @Column({ name: 'updated_at', type: 'datetime' })
  updatedAt: Date;
}
