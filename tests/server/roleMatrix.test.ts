import jwt from 'jsonwebtoken';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Role } from '../../shared/user';
import { signIn, startTestServer, type TestServer } from './helpers';

/**
 * Every registered route × every role, no token and an expired token. The expectation comes
 * from the route's own declared access, and the declared access is pinned below so a route that
 * changes who may call it breaks this test on purpose.
 */
const EXPECTED: Record<string, 'public' | Role[]> = {
  'GET /api/health': 'public',
  'GET /api/admin/users': ['admin'],
  'PATCH /api/admin/users/:id': ['admin'],
  'GET /api/admin/outbox': ['admin'],
  'GET /api/admin/audit': ['admin', 'curator'],
  'POST /api/auth/sign-in': 'public',
  'POST /api/auth/register': 'public',
  'POST /api/auth/refresh': 'public',
  'POST /api/auth/sign-out': ['student', 'analyst', 'curator', 'admin'],
  'GET /api/auth/me': ['student', 'analyst', 'curator', 'admin'],
  'POST /api/auth/password-reset': 'public',
  'POST /api/auth/password-reset/confirm': 'public',
  'GET /api/library': ['student', 'analyst', 'curator', 'admin'],
  'GET /api/library/:id': ['student', 'analyst', 'curator', 'admin'],
  'GET /api/library/:id/revisions': ['student', 'analyst', 'curator', 'admin'],
  'GET /api/library/:id/revisions/:revision': ['student', 'analyst', 'curator', 'admin'],
  'POST /api/submissions': ['student', 'analyst', 'curator'],
  'POST /api/submissions/upload': ['student', 'analyst', 'curator'],
  'GET /api/submissions': ['student', 'analyst', 'curator'],
  'GET /api/submissions/:id': ['student', 'analyst', 'curator', 'admin'],
  'GET /api/review/queue': ['curator'],
  'GET /api/review/submissions/:id': ['curator'],
  'POST /api/review/submissions/:id/decision': ['curator'],
  'POST /api/review/entries/:id/retire': ['curator'],
  'GET /api/sync/changes': ['student', 'analyst', 'curator', 'admin'],
  'POST /api/sync/push': ['student', 'analyst', 'curator'],
};

const ROLES: Role[] = ['student', 'analyst', 'curator', 'admin'];

describe('role matrix', () => {
  let s: TestServer;
  const tokens: Record<string, string> = {};
  beforeAll(async () => {
    s = await startTestServer({ env: { AUTH_RATE_LIMIT: '1000' } });
    for (const r of ROLES) {
      const session = await signIn(s.app, r);
      tokens[r] = session.accessToken;
      tokens[`expired-${r}`] = jwt.sign({ role: r, typ: 'access', exp: Math.floor(Date.now() / 1000) - 60 }, s.config.jwtSecret, { subject: session.user.id, issuer: 'tessera' });
    }
  });
  afterAll(() => s.close());

  it('when the app is built, then its routes are exactly the pinned list (no route without a declared rule)', () => {
    const actual = Object.fromEntries(s.app.locals.routes.map((r) => [`${r.method.toUpperCase()} ${r.path}`, r.access.kind === 'public' ? 'public' : [...r.access.roles]]));
    expect(actual).toEqual(EXPECTED);
  });

  const call = (method: string, path: string, token?: string) => {
    const url = path.replace(':revision', '1').replace(':id', path.includes('/library/') || path.includes('/entries/') ? 'demo.none' : '00000000-0000-4000-8000-000000000000');
    const req = (request(s.app) as unknown as Record<string, (u: string) => request.Test>)[method.toLowerCase()](url);
    if (token) req.set('Authorization', `Bearer ${token}`);
    return method === 'GET' ? req : req.send({});
  };

  for (const [key, access] of Object.entries(EXPECTED)) {
    const [method, path] = key.split(' ');
    it(`when ${key} is called by each role, without a token and with an expired one, then only its declared roles pass`, async () => {
      for (const role of ROLES) {
        const res = await call(method, path, tokens[role]);
        const allowed = access === 'public' || access.includes(role);
        if (allowed) expect([401, 403], `${role} → ${res.status} ${JSON.stringify(res.body)}`).not.toContain(res.status);
        else {
          expect(res.status, `${role} should be denied`).toBe(403);
          expect(res.body.error.code).toBe('forbidden');
        }
        if (access !== 'public') {
          const expired = await call(method, path, tokens[`expired-${role}`]);
          expect(expired.status).toBe(401);
          expect(expired.body.error.message).toBe('access token expired: refresh the session or sign in again');
        }
      }
      const anon = await call(method, path);
      if (access === 'public') expect(anon.body?.error?.code).not.toBe('unauthorized');
      else {
        expect(anon.status).toBe(401);
        expect(anon.body.error.code).toBe('unauthorized');
      }
    });
  }
});
