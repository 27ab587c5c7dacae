import { Column, Entity, PrimaryColumn } from 'typeorm';

/**
 * Work made on the device that the server has not confirmed yet (library submissions). The id is
 * a client UUID that the server uses to make the push idempotent: pushing twice creates one item.
 */
@Entity('outbox')
export class LocalOutboxItem {
  @PrimaryColumn({ type: 'varchar', length: 40 })
  id: string;

  @Column({ type: 'varchar', length: 20 })
  kind: string;

  /** The account that made it; only that account's sync sends it. */
  @Column({ type: 'varchar', length: 80, nullable: true })
  userId: string | null;

  /** pending → sent (server has it) → approved / rejected / changes_requested; or failed (refused on push). */
  @Column({ type: 'varchar', length: 20 })
  status: string;

  @Column({ type: 'varchar', length: 200 })
  title: string;

  @Column({ type: 'text' })
  body: string;

  @Column({ type: 'varchar', length: 80, nullable: true })
  serverId: string | null;

  /** Why the server refused or a curator decided as they did. */
  @Column({ type: 'text', nullable: true })
  message: string | null;

  @Column({ type: 'varchar', length: 40 })
  createdAt: string;

  @Column({ type: 'varchar', length: 40 })
  updatedAt: string;
}
