import { Column, Entity, PrimaryColumn } from 'typeorm';

/** A one-time password reset token, stored only as its SHA-256. */
@Entity('password_reset')
export class PasswordReset {
  @PrimaryColumn({ type: 'varchar', length: 36 })
  id: string;

  @Column({ name: 'user_id', type: 'varchar', length: 36 })
  userId: string;

  @Column({ name: 'token_hash', type: 'varchar', length: 64, unique: true })
  tokenHash: string;

  @Column({ name: 'expires_at', type: 'datetime' })
  expiresAt: Date;

  @Column({ name: 'used_at', type: 'datetime', nullable: true })
  usedAt: Date | null;

  @Column({ name: 'created_at', type: 'datetime' })
  createdAt: Date;
}
