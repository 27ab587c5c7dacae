import { Column, Entity, Index, PrimaryColumn } from 'typeorm';

/**
 * Every message the server sends. With the local fake transport (no SMTP settings) this table is
 * the outbox and keeps the full text; through real SMTP only the envelope and status are kept.
 */
@Entity('mail_message')
@Index('idx_mail_message_created', ['createdAt'])
export class MailMessage {
  @PrimaryColumn({ type: 'varchar', length: 36 })
  id: string;

  @Column({ type: 'varchar', length: 32 })
  kind: string;

  @Column({ name: 'to_address', type: 'varchar', length: 254 })
  toAddress: string;

  @Column({ type: 'varchar', length: 300 })
  subject: string;

  @Column({ name: 'body_text', type: 'text', nullable: true })
  bodyText: string | null;

  @Column({ type: 'varchar', length: 16 })
  transport: 'outbox' | 'smtp';

  @Column({ type: 'varchar', length: 16 })
  status: 'stored' | 'sent' | 'failed';

  @Column({ type: 'text', nullable: true })
  error: string | null;

  @Column({ name: 'created_at', type: 'datetime' })
  createdAt: Date;
}
