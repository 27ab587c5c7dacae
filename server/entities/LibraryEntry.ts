import { Column, Entity, Index, PrimaryColumn } from 'typeorm';

/**
 * Lifecycle of one revision row:
 *   current    — the approved revision clients see;
 *   superseded — an older revision, still readable through the revisions route;
 *   retired    — the last revision of a retired entry: a tombstone that sync carries.
 * Exactly one row per entry id is current or retired.
 */
export type EntryStatus = 'current' | 'superseded' | 'retired';

/** One revision of a library entry; `body` is the shared LibraryEntry as JSON. */
@Entity('library_entry')
@Index('idx_library_entry_status_seq', ['status', 'seq'])
export class LibraryEntry {
  @PrimaryColumn({ name: 'entry_id', type: 'varchar', length: 80 })
  entryId: string;

  @PrimaryColumn({ type: 'integer' })
  revision: number;

  @Column({ type: 'varchar', length: 200 })
  name: string;

  @Column({ type: 'varchar', length: 16 })
  status: EntryStatus;

  /** JSON of shared/libraryEntry.ts LibraryEntry (without revision/retired; those come from columns). */
  @Column({ type: 'text' })
  body: string;

  /**
   * Library-wide change counter: each change visible to sync (approve, retire) takes max+1.
   * The sync cursor is an opaque wrapper around it.
   */
  @Column({ type: 'integer', unique: true })
  seq: number;

  @Column({ name: 'submission_id', type: 'varchar', length: 36, nullable: true })
  submissionId: string | null;

  @Column({ name: 'created_by', type: 'varchar', length: 36, nullable: true })
  createdBy: string | null;

  @Column({ name: 'created_at', type: 'datetime' })
  createdAt: Date;

  @Column({ name: 'updated_at', type: 'datetime' })
  updatedAt: Date;
}
