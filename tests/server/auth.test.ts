import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { SessionResponseSchema } from '../../shared/api/auth';
import { MailMessage } from '../../server/entities/MailMessage';
import { signIn, startTestServer, type TestServer } from './helpers';

const bearer = (t: string) => ({ Authorization: `Bearer ${t}` });

describe('accounts', () => {
  let s: TestServer;
  beforeAll(async () => {
    s = await startTestServer();
  });
  afterAll(() => s.close());

  it('when registering with a short password, then 400 names the password field and no account is made', async () => {
    const res = await request(s.app).post('/api/auth/register').send({ email: 'new@example.test', password: 'short', displayName: 'New' });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toBe('register: password: password must be at least 10 characters');
    expect((await request(s.app).post('/api/auth/sign-in').send({ email: 'new@example.test', password: 'short' })).status).toBe(401);
  });

  it('when someone registers, then they are a student by default and can sign in; the same address again is 409', async () => {
    const res = await request(s.app).post('/api/auth/register').send({ email: 'Reg@Example.test', password: 'long-enough-pw', displayName: 'Reg' });
    expect(res.status).toBe(201);
    expect(SessionResponseSchema.parse(res.body).user).toMatchObject({ email: 'reg@example.test', role: 'student' });
    const again = await request(s.app).post('/api/auth/register').send({ email: 'reg@example.test', password: 'long-enough-pw', displayName: 'Reg' });
    expect(again.status).toBe(409);
    expect(again.body.error.code).toBe('email_taken');
  });

  it('when registering as curator, then 400: only student or analyst may be chosen', async () => {
    const res = await request(s.app).post('/api/auth/register').send({ email: 'c@example.test', password: 'long-enough-pw', displayName: 'C', role: 'curator' });
    expect(res.status).toBe(400);
    expect(res.body.error.details.issues[0].field).toBe('role');
  });

  it('when a refresh token is used, then a new pair comes back and the old refresh token stops working; reusing it revokes the new one too', async () => {
    const first = await signIn(s.app, 'analyst');
    const r1 = await request(s.app).post('/api/auth/refresh').send({ refreshToken: first.refreshToken });
    expect(r1.status).toBe(200);
    expect(r1.body.refreshToken).not.toBe(first.refreshToken);
    expect((await request(s.app).get('/api/auth/me').set(bearer(r1.body.accessToken))).body.user.role).toBe('analyst');
    const reuse = await request(s.app).post('/api/auth/refresh').send({ refreshToken: first.refreshToken });
    expect(reuse.status).toBe(401);
    expect(reuse.body.error.message).toBe('refresh token already used or revoked: sign in again');
    // Reuse means theft: the descendant token is revoked as well.
    expect((await request(s.app).post('/api/auth/refresh').send({ refreshToken: r1.body.refreshToken })).status).toBe(401);
  });

  it('when signing out with the refresh token, then that token no longer refreshes', async () => {
    const session = await signIn(s.app, 'student');
    const out = await request(s.app).post('/api/auth/sign-out').set(bearer(session.accessToken)).send({ refreshToken: session.refreshToken });
    expect(out.status).toBe(200);
    expect((await request(s.app).post('/api/auth/refresh').send({ refreshToken: session.refreshToken })).status).toBe(401);
  });

  it('when a password reset is asked for, then the code arrives in the outbox, sets a new password once, and signs out everywhere', async () => {
    const before = await signIn(s.app, 'curator');
    const ask = await request(s.app).post('/api/auth/password-reset').send({ email: 'curator@demo.tessera.test' });
    expect(ask.status).toBe(202);
    const unknown = await request(s.app).post('/api/auth/password-reset').send({ email: 'nobody@example.test' });
    expect(unknown.status).toBe(202); // same answer: no account discovery
    const mails = await s.ds.getRepository(MailMessage).find({ where: { kind: 'password_reset' } });
    expect(mails.map((m) => m.toAddress)).toEqual(['curator@demo.tessera.test']);
    const token = /code in the app: (\S+)/.exec(mails[0].bodyText!)![1];
    const ok = await request(s.app).post('/api/auth/password-reset/confirm').send({ token, password: 'a-brand-new-password' });
    expect(ok.status).toBe(200);
    const twice = await request(s.app).post('/api/auth/password-reset/confirm').send({ token, password: 'another-new-password' });
    expect(twice.status).toBe(400);
    expect(twice.body.error.message).toBe('token: unknown, used or expired; ask for a new reset e-mail');
    expect((await request(s.app).post('/api/auth/refresh').send({ refreshToken: before.refreshToken })).status).toBe(401);
    expect((await request(s.app).post('/api/auth/sign-in').send({ email: 'curator@demo.tessera.test', password: 'tessera-demo' })).status).toBe(401);
    expect((await request(s.app).post('/api/auth/sign-in').send({ email: 'curator@demo.tessera.test', password: 'a-brand-new-password' })).status).toBe(200);
  });

  it('when an admin disables an account, then its access token stops working at once and it cannot sign in', async () => {
    const admin = await signIn(s.app, 'admin');
    const reg = await request(s.app).post('/api/auth/register').send({ email: 'tobe@disabled.test', password: 'long-enough-pw', displayName: 'Tobe' });
    const patch = await request(s.app).patch(`/api/admin/users/${reg.body.user.id}`).set(bearer(admin.accessToken)).send({ disabled: true });
    expect(patch.status).toBe(200);
    expect(patch.body.user.disabled).toBe(true);
    expect((await request(s.app).get('/api/library').set(bearer(reg.body.accessToken))).status).toBe(401);
    const sign = await request(s.app).post('/api/auth/sign-in').send({ email: 'tobe@disabled.test', password: 'long-enough-pw' });
    expect(sign.status).toBe(403);
    expect(sign.body.error.code).toBe('account_disabled');
  });

  it('when an admin changes a role, then the next request already sees it', async () => {
    const admin = await signIn(s.app, 'admin');
    const reg = await request(s.app).post('/api/auth/register').send({ email: 'promote@me.test', password: 'long-enough-pw', displayName: 'P' });
    expect((await request(s.app).get('/api/review/queue').set(bearer(reg.body.accessToken))).status).toBe(403);
    await request(s.app).patch(`/api/admin/users/${reg.body.user.id}`).set(bearer(admin.accessToken)).send({ role: 'curator' });
    expect((await request(s.app).get('/api/review/queue').set(bearer(reg.body.accessToken))).status).toBe(200);
  });

  it('when an admin tries to demote themselves, then 409 self_lockout', async () => {
    const admin = await signIn(s.app, 'admin');
    const res = await request(s.app).patch(`/api/admin/users/${admin.user.id}`).set(bearer(admin.accessToken)).send({ role: 'student' });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('self_lockout');
  });
});

describe('sign-in rate limit', () => {
  let s: TestServer;
  beforeAll(async () => {
    s = await startTestServer({ env: { AUTH_RATE_LIMIT: '3' } });
  });
  afterAll(() => s.close());

  it('when one address fails sign-in past the limit, then 429 rate_limited, even with the right password', async () => {
    for (let i = 0; i < 3; i++) expect((await request(s.app).post('/api/auth/sign-in').send({ email: 'analyst@demo.tessera.test', password: 'wrong' })).status).toBe(401);
    const res = await request(s.app).post('/api/auth/sign-in').send({ email: 'analyst@demo.tessera.test', password: 'tessera-demo' });
    expect(res.status).toBe(429);
    expect(res.body.error.code).toBe('rate_limited');
    // Another route's budget is separate.
    expect((await request(s.app).post('/api/auth/password-reset').send({ email: 'analyst@demo.tessera.test' })).status).toBe(202);
  });
});
