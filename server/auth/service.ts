import crypto from 'node:crypto';
import bcrypt from 'bcryptjs';
import type { DataSource, EntityManager } from 'typeorm';
import type { PublicUser, Role } from '../../shared/user';
import type { RegisterBody, SessionResponse } from '../../shared/api/auth';
import type { Config } from '../config';
import { AppError, unauthorized } from '../errors/AppError';
import { PasswordReset } from '../entities/PasswordReset';
import { RefreshToken } from '../entities/RefreshToken';
import { User } from '../entities/User';
import type { Mailer } from '../mail/mailer';
import { audit } from '../admin/audit';
import { tx } from '../data-source';
import { signAccessToken } from './access';

const sha256 = (s: string) => crypto.createHash('sha256').update(s).digest('hex');
const newSecret = () => crypto.randomBytes(32).toString('base64url');

export const toPublicUser = (u: User): PublicUser => ({ id: u.id, email: u.email, displayName: u.displayName, role: u.role });

export class AuthService {
  /** Compared against when the e-mail is unknown so both paths take as long. */
  private readonly dummyHash: string;

  constructor(
    private readonly ds: DataSource,
    private readonly config: Config,
    private readonly mailer: Mailer,
  ) {
    this.dummyHash = bcrypt.hashSync('not-a-password', config.bcryptRounds);
  }

  hashPassword(password: string): Promise<string> {
    return bcrypt.hash(password, this.config.bcryptRounds);
  }

  /** Hash the password (slow) before taking the write lock, then call this inside tx. */
  async createUser(m: EntityManager, input: { email: string; displayName: string; role: Role; passwordHash: string; demo?: boolean }): Promise<User> {
    const now = new Date();
    const user = Object.assign(new User(), {
      id: crypto.randomUUID(),
      email: input.email.trim().toLowerCase(),
      displayName: input.displayName,
      role: input.role,
      passwordHash: input.passwordHash,
      demo: input.demo ?? false,
      disabled: false,
      createdAt: now,
      updatedAt: now,
    });
    await m.getRepository(User).insert(user);
    return user;
  }

  async register(body: RegisterBody): Promise<SessionResponse> {
    const existing = await this.ds.getRepository(User).findOneBy({ email: body.email });
    if (existing) throw new AppError(409, 'email_taken', 'email: an account with this address exists; sign in or reset the password', { issues: [{ field: 'email', message: 'already registered' }] });
    const passwordHash = await this.hashPassword(body.password);
    const user = await tx(this.ds, async (m) => {
      if (await m.getRepository(User).findOneBy({ email: body.email })) return null;
      const u = await this.createUser(m, { ...body, passwordHash });
      await audit(m, u.id, 'account.register', 'user', u.id, { role: u.role });
      return u;
    });
    if (!user) throw new AppError(409, 'email_taken', 'email: an account with this address exists; sign in or reset the password', { issues: [{ field: 'email', message: 'already registered' }] });
    return this.issueSession(user);
  }

  async signIn(email: string, password: string): Promise<SessionResponse> {
    const user = await this.ds.getRepository(User).findOneBy({ email: email.trim().toLowerCase() });
    const ok = await bcrypt.compare(password, user?.passwordHash ?? this.dummyHash);
    if (!user || !ok) throw new AppError(401, 'bad_credentials', 'e-mail or password is wrong');
    if (user.disabled) throw new AppError(403, 'account_disabled', 'this account is disabled; ask an admin');
    return this.issueSession(user);
  }

  /** Rotates: the presented token is revoked and a new pair issued. Reusing a revoked token revokes the whole account's sessions (it was probably stolen). */
  async refresh(refreshToken: string): Promise<SessionResponse> {
    const hash = sha256(refreshToken);
    const outcome = await tx(this.ds, async (m) => {
      const repo = m.getRepository(RefreshToken);
      const row = await repo.findOneBy({ tokenHash: hash });
      if (!row) return { error: 'refresh token unknown: sign in again' } as const;
      if (row.revokedAt) {
        await revokeAllIn(m, row.userId);
        return { error: 'refresh token already used or revoked: sign in again' } as const;
      }
      if (row.expiresAt.getTime() <= Date.now()) return { error: 'refresh token expired: sign in again' } as const;
      const user = await m.getRepository(User).findOneBy({ id: row.userId });
      if (!user || user.disabled) return { error: 'account not found or disabled' } as const;
      await repo.update({ id: row.id }, { revokedAt: new Date() });
      return { session: await this.issueSessionIn(m, user) } as const;
    });
    // Thrown outside so the reuse revocation above commits.
    if ('error' in outcome) throw unauthorized(outcome.error);
    return outcome.session;
  }

  async signOut(userId: string, refreshToken: string | undefined, everywhere: boolean): Promise<void> {
    if (!everywhere && !refreshToken) return;
    await tx(this.ds, async (m) => {
      if (everywhere) return revokeAllIn(m, userId);
      await m
        .getRepository(RefreshToken)
        .createQueryBuilder()
        .update()
        .set({ revokedAt: new Date() })
        .where('token_hash = :h AND user_id = :u AND revoked_at IS NULL', { h: sha256(refreshToken!), u: userId })
        .execute();
    });
  }

  revokeAll(userId: string): Promise<void> {
    return tx(this.ds, (m) => revokeAllIn(m, userId));
  }

  /** Silent about unknown addresses so the route cannot be used to find out who has an account. */
  async requestPasswordReset(email: string): Promise<void> {
    const user = await this.ds.getRepository(User).findOneBy({ email });
    if (!user || user.disabled) return;
    const token = newSecret();
    const now = new Date();
    await tx(this.ds, (m) => m.getRepository(PasswordReset).insert(
      Object.assign(new PasswordReset(), {
        id: crypto.randomUUID(),
        userId: user.id,
        tokenHash: sha256(token),
        expiresAt: new Date(now.getTime() + this.config.passwordResetTtlSeconds * 1000),
        usedAt: null,
        createdAt: now,
      }),
    ));
    const minutes = Math.round(this.config.passwordResetTtlSeconds / 60);
    await this.mailer.send({
      kind: 'password_reset',
      to: user.email,
      subject: 'Tessera: reset your password',
      text:
        `Someone (hopefully you) asked to reset the password of ${user.email}.\n\n` +
        `Open ${this.config.publicUrl}/reset-password?token=${token}\n` +
        `or enter this code in the app: ${token}\n\n` +
        `The code works once, for ${minutes} minutes. If you did not ask, ignore this message.\n`,
    });
  }

  async confirmPasswordReset(token: string, password: string): Promise<void> {
    const row = await this.ds.getRepository(PasswordReset).findOneBy({ tokenHash: sha256(token) });
    if (!row || row.usedAt || row.expiresAt.getTime() <= Date.now()) {
      throw new AppError(400, 'invalid_token', 'token: unknown, used or expired; ask for a new reset e-mail', { issues: [{ field: 'token', message: 'unknown, used or expired' }] });
    }
    const passwordHash = await this.hashPassword(password);
    await tx(this.ds, async (m) => {
      const used = await m
        .getRepository(PasswordReset)
        .createQueryBuilder()
        .update()
        .set({ usedAt: new Date() })
        .where('id = :id AND used_at IS NULL', { id: row.id })
        .execute();
      if (!used.affected) throw new AppError(400, 'invalid_token', 'token: unknown, used or expired; ask for a new reset e-mail', { issues: [{ field: 'token', message: 'already used' }] });
      await m.getRepository(User).update({ id: row.userId }, { passwordHash, updatedAt: new Date() });
      await revokeAllIn(m, row.userId);
      await audit(m, row.userId, 'account.password_reset', 'user', row.userId, {});
    });
  }

  private issueSession(user: User): Promise<SessionResponse> {
    return tx(this.ds, (m) => this.issueSessionIn(m, user));
  }

  private async issueSessionIn(m: EntityManager, user: User): Promise<SessionResponse> {
    const refreshToken = newSecret();
    const now = new Date();
    await m.getRepository(RefreshToken).insert(
      Object.assign(new RefreshToken(), {
        id: crypto.randomUUID(),
        userId: user.id,
        tokenHash: sha256(refreshToken),
        expiresAt: new Date(now.getTime() + this.config.refreshTokenTtlSeconds * 1000),
        revokedAt: null,
        createdAt: now,
      }),
    );
    const pub = toPublicUser(user);
    return { accessToken: signAccessToken(pub, this.config.jwtSecret, this.config.accessTokenTtlSeconds), refreshToken, user: pub };
  }
}

export async function revokeAllIn(m: EntityManager, userId: string): Promise<void> {
  await m
    .getRepository(RefreshToken)
    .createQueryBuilder()
    .update()
    .set({ revokedAt: new Date() })
    .where('user_id = :u AND revoked_at IS NULL', { u: userId })
    .execute();
}
