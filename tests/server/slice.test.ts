import fs from 'node:fs';
import path from 'node:path';
import jwt from 'jsonwebtoken';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { LibraryListResponseSchema } from '../../shared/api/library';
import { SessionResponseSchema } from '../../shared/api/auth';
import { createApp } from '../../server/app';
import { demoEntry, signIn, startTestServer, writeLibraryDir, type TestServer } from './helpers';
import { readLibraryFiles, SeedError } from '../../server/seed/seed';

describe('thin slice: sign-in and library list', () => {
  let s: TestServer;
  beforeAll(async () => {
    const tmp = fs.mkdtempSync(path.join(require('node:os').tmpdir(), 'tessera-lib-'));
    s = await startTestServer({ libraryDir: writeLibraryDir(tmp, [demoEntry('demo.b'), demoEntry('demo.a', { name: 'Alpha demo' })]) });
  });
  afterAll(() => s.close());

  it('when no token is sent, then GET /api/library answers 401 with an error body', async () => {
    const res = await request(s.app).get('/api/library');
    expect(res.status).toBe(401);
    expect(res.body).toEqual({ error: { code: 'unauthorized', message: 'sign in first: this route needs a valid access token' } });
  });

  it('when the token is garbage, then 401 says it is invalid', async () => {
    const res = await request(s.app).get('/api/library').set('Authorization', 'Bearer abc.def.ghi');
    expect(res.status).toBe(401);
    expect(res.body.error.message).toBe('access token invalid: sign in again');
  });

  it('when the token has expired, then 401 says so', async () => {
    const user = (await signIn(s.app, 'analyst')).user;
    const expired = jwt.sign({ role: 'analyst', typ: 'access', exp: Math.floor(Date.now() / 1000) - 10 }, s.config.jwtSecret, { subject: user.id, issuer: 'tessera' });
    const res = await request(s.app).get('/api/library').set('Authorization', `Bearer ${expired}`);
    expect(res.status).toBe(401);
    expect(res.body.error.message).toBe('access token expired: refresh the session or sign in again');
  });

  it('when a token that already worked runs out, then the next request is refused as expired', async () => {
    const session = await signIn(s.app, 'student');
    expect((await request(s.app).get('/api/library').set('Authorization', `Bearer ${session.accessToken}`)).status).toBe(200);
    const now = Date.now();
    const clock = vi.spyOn(Date, 'now').mockReturnValue(now + 16 * 60 * 1000); // past the 15-minute lifetime
    try {
      const res = await request(s.app).get('/api/library').set('Authorization', `Bearer ${session.accessToken}`);
      expect(res.status).toBe(401);
      expect(res.body.error.message).toBe('access token expired: refresh the session or sign in again');
    } finally {
      clock.mockRestore();
    }
  });

  it('when the password is wrong, then sign-in answers 401 bad_credentials', async () => {
    const res = await request(s.app).post('/api/auth/sign-in').send({ email: 'analyst@demo.tessera.test', password: 'nope' });
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('bad_credentials');
  });

  it('when the e-mail is malformed, then sign-in answers 400 naming the field', async () => {
    const res = await request(s.app).post('/api/auth/sign-in').send({ email: 'not-an-email', password: 'x' });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/^sign-in: email: /);
  });

  it('when the demo analyst signs in, then the session matches the shared schema and the library lists the seeded entries by name', async () => {
    const res = await request(s.app).post('/api/auth/sign-in').send({ email: 'Analyst@Demo.Tessera.Test ', password: 'tessera-demo' });
    expect(res.status).toBe(200);
    expect(res.headers['cache-control']).toBe('no-store');
    const session = SessionResponseSchema.parse(res.body);
    expect(session.user).toMatchObject({ email: 'analyst@demo.tessera.test', role: 'analyst' });
    const lib = await request(s.app).get('/api/library').set('Authorization', `Bearer ${session.accessToken}`);
    expect(lib.status).toBe(200);
    const body = LibraryListResponseSchema.parse(lib.body);
    expect(body.entries.map((e) => e.id)).toEqual(['demo.a', 'demo.b']);
    expect(body.entries[0]).toMatchObject({ name: 'Alpha demo', revision: 1, category: 'demo' });
    expect(body.entries[0].retired).toBeUndefined();
  });

  it('when every demo role signs in, then each gets its own role', async () => {
    for (const role of ['student', 'analyst', 'curator', 'admin'] as const) {
      expect((await signIn(s.app, role)).user.role).toBe(role);
    }
  });

  it('when an unknown /api route is asked for, then it answers JSON 404, not the app page', async () => {
    const res = await request(s.app).get('/api/nothing-here');
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe('not_found');
  });

  it('when the body is not JSON, then 400 invalid_json', async () => {
    const res = await request(s.app).post('/api/auth/sign-in').set('Content-Type', 'application/json').send('{"email":');
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('invalid_json');
  });

  it('when the web export is missing, then any app route gets the page saying how to build it', async () => {
    const res = await request(s.app).get('/library');
    expect(res.status).toBe(200);
    expect(res.text).toContain('npm run build:web');
  });
});

describe('static web export', () => {
  let s: TestServer;
  let web: string;
  beforeAll(async () => {
    s = await startTestServer();
    web = path.join(s.dir, 'web');
    fs.mkdirSync(path.join(web, 'assets'), { recursive: true });
    fs.writeFileSync(path.join(web, 'index.html'), '<!doctype html><title>app shell</title>');
    fs.writeFileSync(path.join(web, 'assets', 'db.wasm'), Buffer.from([0, 0x61, 0x73, 0x6d, 1, 0, 0, 0]));
  });
  afterAll(() => s.close());

  it('when a .wasm file is fetched, then it is served as application/wasm', async () => {
    const app = createApp({ dataSource: s.ds, config: { ...s.config, webDir: web }, mailer: s.mailer });
    const res = await request(app).get('/assets/db.wasm');
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('application/wasm');
  });

  it('when an app route (even with a dot) is fetched, then index.html comes back uncached; a missing asset is 404', async () => {
    const app = createApp({ dataSource: s.ds, config: { ...s.config, webDir: web }, mailer: s.mailer });
    for (const p of ['/', '/library/demo.ethanol', '/deep/route']) {
      const res = await request(app).get(p);
      expect(res.status).toBe(200);
      expect(res.text).toContain('app shell');
      expect(res.headers['cache-control']).toBe('no-cache');
    }
    expect((await request(app).get('/_expo/missing.js')).status).toBe(404);
  });

  it('when any response goes out, then helmet headers are on it and no x-powered-by', async () => {
    const app = createApp({ dataSource: s.ds, config: { ...s.config, webDir: web }, mailer: s.mailer });
    const res = await request(app).get('/');
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['content-security-policy']).toContain("'wasm-unsafe-eval'");
    expect(res.headers['x-powered-by']).toBeUndefined();
  });
});

describe('seed files', () => {
  it('when a library file breaks the schema, then SeedError names the file and the field', () => {
    const tmp = fs.mkdtempSync(path.join(require('node:os').tmpdir(), 'tessera-bad-'));
    const lib = writeLibraryDir(tmp, [demoEntry('demo.x', { mhz: -5 })], 'broken.json');
    expect(() => readLibraryFiles(lib)).toThrow(SeedError);
    expect(() => readLibraryFiles(lib)).toThrow(/^broken\.json: entries\.0\.mhz: /);
  });

  it('when the folder is missing, then nothing is read', () => {
    expect(readLibraryFiles('/nonexistent/tessera/library')).toEqual([]);
  });

  it('when the repository library-data exists, then every file in it passes the schema', () => {
    // Guards the content other people edit: a broken file would stop the server from starting.
    const dir = path.join(__dirname, '../../library-data');
    expect(() => readLibraryFiles(dir)).not.toThrow();
  });
});
