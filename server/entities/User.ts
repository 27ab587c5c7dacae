import { Column, Entity, PrimaryColumn } from 'typeorm';
import type { Role } from '../../shared/user';

@Entity('user')
export class User {
  @PrimaryColumn({ type: 'varchar', length: 36 })
  id: string;

  /** Stored lower-cased; unique. */
  @Column({ type: 'varchar', length: 254, unique: true })
  email: string;

  @Column({ name: 'display_name', type: 'varchar', length: 100 })
  displayName: string;

  @Column({ type: 'varchar', length: 16 })
  role: Role;

  @Column({ name: 'password_hash', type: 'varchar', length: 100 })
  passwordHash: string;

  /** Demo accounts created by the seed, with the published demo password. */
  @Column({ type: 'boolean', default: false })
  demo: boolean;

  /** A disabled account cannot sign in or refresh; its access tokens stop working. */
  @Column({ type: 'boolean', default: false })
  disabled: boolean;

  @Column({ name: 'created_at', type: 'datetime' })
  createdAt: Date;

  @Column({ name: 'updated_at', type: 'datetime' })
  updatedAt: Date;
}
