import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

/** Append-only record of decisions and account changes. */
@Entity('audit_log')
@Index('idx_audit_log_subject', ['subjectType', 'subjectId'])
export class AuditLog {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Column({ type: 'datetime' })
  at: Date;

  @Column({ name: 'actor_id', type: 'varchar', length: 36, nullable: true })
  actorId: string | null;

  @Column({ type: 'varchar', length: 64 })
  action: string;

  @Column({ name: 'subject_type', type: 'varchar', length: 32 })
  subjectType: string;

  @Column({ name: 'subject_id', type: 'varchar', length: 80 })
  subjectId: string;

  /** JSON; never holds secrets. */
  @Column({ type: 'text' })
  details: string;
}
