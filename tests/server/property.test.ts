import crypto from 'node:crypto';
import fc from 'fast-check';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { spectrumToJcamp } from '../../matching/io';
import { demoEntry, signIn, startTestServer, writeLibraryDir, type TestServer } from './helpers';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';

/**
 * Generated garbage at every write route and every query string: never a 5xx, every rejection
 * names a field or line (or is an auth/conflict answer with a message), and a rejected request
 * leaves every table byte-for-byte as it was. Runs per property: PROPERTY_RUNS (default 60; raise it
 * for a deeper run — the timeout grows with it).
 */
const RUNS = Number(process.env.PROPERTY_RUNS ?? 60);
const TIMEOUT = Math.max(30_000, RUNS * 60);
const TABLES = ['user', 'library_entry', 'submission', 'audit_log', 'mail_message', 'password_reset', 'refresh_token'];

async function fingerprint(s: TestServer): Promise<string> {
  const h = crypto.createHash('sha256');
  for (const t of TABLES) h.update(t + JSON.stringify(await s.ds.query(`SELECT * FROM "${t}" ORDER BY rowid`)));
  return h.digest('hex');
}

function checkRejection(res: request.Response, what: string): void {
  expect(res.status, `${what}: ${res.status} ${res.text.slice(0, 300)}`).toBeLessThan(500);
  if (res.status < 400) return;
  const err = res.body?.error;
  expect(err, `${what}: error body`).toBeDefined();
  expect(typeof err.message).toBe('string');
  expect(err.message.length).toBeGreaterThan(0);
  expect(err.message).not.toMatch(/\n\s+at /); // no stack traces
  if ([400, 413, 415].includes(res.status)) {
    const issues = err.details?.issues as { field?: string; line?: number }[] | undefined;
    expect(issues?.length, `${what}: issues for ${err.message}`).toBeGreaterThan(0);
    expect(issues!.every((i) => typeof i.field === 'string' || typeof i.line === 'number'), `${what}: ${JSON.stringify(issues)}`).toBe(true);
  }
}

/** A valid body with one value somewhere replaced by anything at all. */
function mutated<T extends Record<string, unknown>>(base: T): fc.Arbitrary<unknown> {
  const paths: string[][] = [];
  const walk = (v: unknown, p: string[]) => {
    paths.push(p);
    if (v && typeof v === 'object') for (const [k, c] of Object.entries(v)) walk(c, [...p, k]);
  };
  walk(base, []);
  return fc.tuple(fc.constantFrom(...paths.filter((p) => p.length > 0)), fc.anything({ maxDepth: 2 }), fc.boolean()).map(([p, value, drop]) => {
    const copy = structuredClone(base) as Record<string, unknown>;
    let node = copy as Record<string, unknown>;
    for (const k of p.slice(0, -1)) node = node[k] as Record<string, unknown>;
    if (drop) delete node[p[p.length - 1]];
    else node[p[p.length - 1]] = value;
    return copy;
  });
}

const hugeNumbers = fc.constantFrom(1e308, -1e308, Number.MAX_SAFE_INTEGER, 1e-320, 0, -0);
const anyBody = fc.oneof(fc.anything({ maxDepth: 3 }), fc.jsonValue({ maxDepth: 3 }), fc.dictionary(fc.string(), hugeNumbers));

describe('property: generated input at every write route', () => {
  let s: TestServer;
  let tokens: Record<string, string>;
  let pendingId: string;

  beforeAll(async () => {
    const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'tessera-prop-'));
    s = await startTestServer({ libraryDir: writeLibraryDir(dir, [demoEntry('demo.prop-a'), demoEntry('demo.prop-b', { name: 'Demo B' })]), env: { AUTH_RATE_LIMIT: '100000', UPLOAD_MAX_BYTES: '65536' } });
    tokens = {};
    for (const r of ['student', 'analyst', 'curator', 'admin'] as const) tokens[r] = (await signIn(s.app, r)).accessToken;
    const sub = await request(s.app).post('/api/submissions').set('Authorization', `Bearer ${tokens.analyst}`).send({ entry: demoEntry('demo.prop-pending') });
    pendingId = sub.body.submission.id;
  });
  afterAll(() => s.close());

  const send = (method: 'post' | 'patch', url: string, token: string | null, body: unknown) => {
    const r = request(s.app)[method](url);
    if (token) r.set('Authorization', `Bearer ${token}`);
    return r.set('Content-Type', 'application/json').send(JSON.stringify(body) ?? 'null');
  };

  const jsonRoutes: { name: string; method: 'post' | 'patch'; url: () => string; role: string | null; base: Record<string, unknown> }[] = [
    { name: 'sign-in', method: 'post', url: () => '/api/auth/sign-in', role: null, base: { email: 'analyst@demo.tessera.test', password: 'tessera-demo' } },
    { name: 'register', method: 'post', url: () => '/api/auth/register', role: null, base: { email: 'x@example.test', password: 'long-enough-pw', displayName: 'X', role: 'student' } },
    { name: 'refresh', method: 'post', url: () => '/api/auth/refresh', role: null, base: { refreshToken: 'x'.repeat(43) } },
    { name: 'sign-out', method: 'post', url: () => '/api/auth/sign-out', role: 'student', base: { refreshToken: 'y'.repeat(43), everywhere: false } },
    { name: 'password-reset', method: 'post', url: () => '/api/auth/password-reset', role: null, base: { email: 'nobody@example.test' } },
    { name: 'password-reset/confirm', method: 'post', url: () => '/api/auth/password-reset/confirm', role: null, base: { token: 'z'.repeat(43), password: 'long-enough-pw' } },
    { name: 'submissions', method: 'post', url: () => '/api/submissions', role: 'analyst', base: { kind: 'new', entry: demoEntry('demo.prop-new'), note: 'n' } },
    { name: 'decision', method: 'post', url: () => `/api/review/submissions/${pendingId}/decision`, role: 'curator', base: { decision: 'reject', comment: 'c', version: 99 } },
    { name: 'retire', method: 'post', url: () => '/api/review/entries/demo.prop-a/retire', role: 'curator', base: { revision: 99, comment: 'c' } },
    { name: 'push', method: 'post', url: () => '/api/sync/push', role: 'analyst', base: { submissions: [{ id: '6f1b7a4e-0000-4000-8000-000000000001', kind: 'change', entry: demoEntry('demo.prop-missing') }] } },
    { name: 'admin patch', method: 'patch', url: () => `/api/admin/users/${crypto.randomUUID()}`, role: 'admin', base: { role: 'analyst', disabled: false, displayName: 'Y' } },
  ];

  for (const route of jsonRoutes) {
    it(`when ${route.name} gets generated bodies, then no 5xx, rejections name a field, and rejected requests change nothing`, async () => {
      await fc.assert(
        fc.asyncProperty(fc.oneof(anyBody, mutated(route.base)), async (body) => {
          const before = await fingerprint(s);
          const res = await send(route.method, route.url(), route.role ? tokens[route.role] : null, body);
          checkRejection(res, `${route.name} ${JSON.stringify(body)?.slice(0, 200)}`);
          if (res.status >= 400) expect(await fingerprint(s)).toBe(before);
        }),
        { numRuns: RUNS },
      );
    }, TIMEOUT);
  }

  it('when the body is not JSON at all, then every write route answers 4xx naming the body', async () => {
    await fc.assert(
      fc.asyncProperty(fc.constantFrom(...jsonRoutes), fc.string({ maxLength: 200 }), async (route, text) => {
        // An empty body is no body (routes whose fields are all optional accept it).
        fc.pre(text.trim() !== '');
        fc.pre(!(() => { try { JSON.parse(text); return true; } catch { return false; } })());
        const before = await fingerprint(s);
        const r = request(s.app)[route.method](route.url()).set('Content-Type', 'application/json');
        if (route.role) r.set('Authorization', `Bearer ${tokens[route.role]}`);
        const res = await r.send(text);
        checkRejection(res, `${route.name} raw`);
        expect(res.status).toBe(400);
        expect(await fingerprint(s)).toBe(before);
      }),
      { numRuns: RUNS },
    );
  }, TIMEOUT);

  const getRoutes: { url: string; role: string }[] = [
    { url: '/api/review/queue', role: 'curator' },
    { url: '/api/sync/changes', role: 'student' },
    { url: '/api/submissions', role: 'analyst' },
    { url: '/api/admin/outbox', role: 'admin' },
    { url: '/api/admin/audit', role: 'admin' },
  ];
  const queryKeys = ['status', 'kind', 'studentWork', 'q', 'sort', 'limit', 'offset', 'cursor', 'subjectType', 'subjectId'];
  const queryValue = fc.oneof(fc.string({ maxLength: 40 }), fc.integer().map(String), fc.constantFrom('1e400', '-1', 'NaN', '%', '%%', '\u0000', 'true', 'all', 'pending'), fc.array(fc.string({ maxLength: 5 }), { maxLength: 3 }));

  it('when list routes get generated query strings, then no 5xx and rejections name the query field', async () => {
    await fc.assert(
      fc.asyncProperty(fc.constantFrom(...getRoutes), fc.dictionary(fc.oneof(fc.constantFrom(...queryKeys), fc.string({ maxLength: 8 })), queryValue, { maxKeys: 4 }), async (route, query) => {
        const res = await request(s.app).get(route.url).query(query).set('Authorization', `Bearer ${tokens[route.role]}`);
        checkRejection(res, `${route.url}?${JSON.stringify(query)}`);
      }),
      { numRuns: RUNS * 2 },
    );
  }, TIMEOUT);

  // Upload material: random bytes, truncated peak lists and JCAMP-DX, huge numbers, other encodings.
  const csv = 'shift,intensity\n1.22,3\n3.69,2\n2.10,1\n';
  const jcamp = spectrumToJcamp({
    kind: 'spectrum', name: 'demo', nucleus: '1H', solvent: 'CDCl3', mhz: 400, reference: 'TMS',
    ppm: Array.from({ length: 64 }, (_, i) => 4 - i / 16),
    intensity: Array.from({ length: 64 }, (_, i) => (i === 30 ? 100 : 1 + (i % 3))),
  });
  const fileBytes = fc.oneof(
    fc.uint8Array({ maxLength: 300 }).map((b) => Buffer.from(b)),
    fc.nat({ max: csv.length }).map((n) => Buffer.from(csv.slice(0, n))),
    fc.nat({ max: jcamp.length }).map((n) => Buffer.from(jcamp.slice(0, n))),
    fc.array(fc.tuple(fc.oneof(fc.double(), hugeNumbers, fc.constant('1e400')), fc.oneof(fc.double(), hugeNumbers)), { maxLength: 8 }).map((rows) => Buffer.from('shift,intensity\n' + rows.map(([a, b]) => `${a},${b}`).join('\n'))),
    fc.constantFrom(Buffer.from(csv, 'utf16le'), Buffer.from('\ufeff' + csv, 'utf16le'), Buffer.from('shift;intensity\n1,2\u00e9\n', 'latin1'), Buffer.from(csv.replace(/\n/g, '\r'))),
  );
  const fileName = fc.constantFrom('peaks.csv', 'peaks.txt', 'peaks.tsv', 'spec.jdx', 'spec.dx', 'x.exe', 'noext', 'a.CSV');
  const meta = fc.oneof(
    fc.constant(JSON.stringify({ entry: { id: 'demo.prop-up', name: 'Demo upload', formula: 'C2H6O', category: 'demo', source: 's', solvent: 'CDCl3', mhz: 400 } })),
    fc.string({ maxLength: 50 }),
    fc.jsonValue({ maxDepth: 2 }).map((v) => JSON.stringify(v)),
  );

  it('when uploads carry generated bytes, names and meta, then no 5xx, rejections name the file line or field, and nothing is stored on rejection', async () => {
    await fc.assert(
      fc.asyncProperty(fileBytes, fileName, meta, fc.boolean(), async (bytes, name, metaText, withMeta) => {
        const before = await fingerprint(s);
        const r = request(s.app).post('/api/submissions/upload').set('Authorization', `Bearer ${tokens.analyst}`);
        if (withMeta) r.field('meta', metaText);
        const res = await r.attach('file', bytes, name);
        checkRejection(res, `upload ${name} ${bytes.length}B`);
        if (res.status >= 400) expect(await fingerprint(s)).toBe(before);
        else await s.ds.query('DELETE FROM submission WHERE id = ?', [res.body.submission.id]); // keep ids free for the next run
      }),
      { numRuns: RUNS * 2 },
    );
  }, TIMEOUT);
});
