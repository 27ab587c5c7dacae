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

  async createUser(m: EntityManager, input: { email: string; displayName: string; role: Role; password: string; demo?: boolean }): Promise<User> {
    const now = new Date();
    const user = Object.assign(new User(), {
      id: crypto.randomUUID(),
      email: input.email.trim().toLowerCase(),
      displayName: input.displayName,
      role: input.role,
      passwordHash: await this.hashPassword(input.password),
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
    const user = await this.ds.transaction(async (m) => {
      const u = await this.createUser(m, body);
      await audit(m, u.id, 'account.register', 'user', u.id, { role: u.role });
      return u;
    });
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
    const repo = this.ds.getRepository(RefreshToken);
    const row = await repo.findOneBy({ tokenHash: sha256(refreshToken) });
    if (!row) throw unauthorized('refresh token unknown: sign in again');
    if (row.revokedAt) {
      await this.revokeAll(row.userId);
      throw unauthorized('refresh token already used or revoked: sign in again');
    }
    if (row.expiresAt.getTime() <= Date.now()) throw unauthorized('refresh token expired: sign in again');
    const user = await this.ds.getRepository(User).findOneBy({ id: row.userId });
    if (!user || user.disabled) throw unauthorized('account not found or disabled');
    const result = await repo
      .createQueryBuilder()
      .update()
      .set({ revokedAt: new Date() })
      .where('id = :id AND revoked_at IS NULL', { id: row.id })
      .execute();
    // Two refreshes racing with one token: only the first wins.
    if (!result.affected) throw unauthorized('refresh token already used or revoked: sign in again');
    return this.issueSession(user);
  }

  async signOut(userId: string, refreshToken: string | undefined, everywhere: boolean): Promise<void> {
    if (everywhere) return this.revokeAll(userId);
    if (!refreshToken) return;
    await this.ds
      .getRepository(RefreshToken)
      .createQueryBuilder()
      .update()
      .set({ revokedAt: new Date() })
      .where('token_hash = :h AND user_id = :u AND revoked_at IS NULL', { h: sha256(refreshToken), u: userId })
      .execute();
  }

  async revokeAll(userId: string): Promise<void> {
    await this.ds
      .getRepository(RefreshToken)
      .createQueryBuilder()
      .update()
      .set({ revokedAt: new Date() })
      .where('user_id = :u AND revoked_at IS NULL', { u: userId })
      .execute();
  }

  /** Silent about unknown addresses so the route cannot be used to find out who has an account. */
  async requestPasswordReset(email: string): Promise<void> {
    const user = await this.ds.getRepository(User).findOneBy({ email });
    if (!user || user.disabled) return;
    const token = newSecret();
    const now = new Date();
    await this.ds.getRepository(PasswordReset).insert(
      Object.assign(new PasswordReset(), {
        id: crypto.randomUUID(),
        userId: user.id,
        tokenHash: sha256(token),
        expiresAt: new Date(now.getTime() + this.config.passwordResetTtlSeconds * 1000),
        usedAt: null,
        createdAt: now,
      }),
    );
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
    await this.ds.transaction(async (m) => {
      const used = await m
        .getRepository(PasswordReset)
        .createQueryBuilder()
        .update()
        .set({ usedAt: new Date() })
        .where('id = :id AND used_at IS NULL', { id: row.id })
        .execute();
      if (!used.affected) throw new AppError(400, 'invalid_token', 'token: unknown, used or expired; ask for a new reset e-mail', { issues: [{ field: 'token', message: 'already used' }] });
      await m.getRepository(User).update({ id: row.userId }, { passwordHash, updatedAt: new Date() });
      await m
        .getRepository(RefreshToken)
        .createQueryBuilder()
        .update()
        .set({ revokedAt: new Date() })
        .where('user_id = :u AND revoked_at IS NULL', { u: row.userId })
        .execute();
      await audit(m, row.userId, 'account.password_reset', 'user', row.userId, {});
    });
  }

  private async issueSession(user: User): Promise<SessionResponse> {
    const refreshToken = newSecret();
    const now = new Date();
    await this.ds.getRepository(RefreshToken).insert(
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
