import { Column, Entity, Index, PrimaryColumn } from 'typeorm';

/** A refresh token, stored only as its SHA-256. Rotated on every refresh; revocable. */
@Entity('refresh_token')
export class RefreshToken {
  @PrimaryColumn({ type: 'varchar', length: 36 })
  id: string;

  @Index('idx_refresh_token_user')
  @Column({ name: 'user_id', type: 'varchar', length: 36 })
  userId: string;

  @Column({ name: 'token_hash', type: 'varchar', length: 64, unique: true })
  tokenHash: string;

  @Column({ name: 'expires_at', type: 'datetime' })
  expiresAt: Date;

  @Column({ name: 'revoked_at', type: 'datetime', nullable: true })
  revokedAt: Date | null;

  @Column({ name: 'created_at', type: 'datetime' })
  createdAt: Date;
}
