import crypto from 'node:crypto';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { SyncChangesResponseSchema, SyncPushResponseSchema } from '../../shared/api/sync';
import { demoEntry, signIn, startTestServer, tableCounts, writeLibraryDir, type TestServer } from './helpers';

describe('sync', () => {
  let s: TestServer;
  let analyst: string;
  let student: string;
  let curator: string;
  const bearer = (t: string) => ({ Authorization: `Bearer ${t}` });
  const pull = (cursor: string | undefined, limit: number, token = student) =>
    request(s.app).get('/api/sync/changes').query({ ...(cursor ? { cursor } : {}), limit }).set(bearer(token));

  beforeAll(async () => {
    const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'tessera-sync-'));
    const entries = Array.from({ length: 25 }, (_, i) => demoEntry(`demo.sync-${String(i).padStart(2, '0')}`, { name: `Demo sync ${i}` }));
    s = await startTestServer({ libraryDir: writeLibraryDir(dir, entries) });
    [analyst, student, curator] = (await Promise.all([signIn(s.app, 'analyst'), signIn(s.app, 'student'), signIn(s.app, 'curator')])).map((x) => x.accessToken);
  });
  afterAll(() => s.close());

  it('when a client with no cursor pages through, then it gets every entry exactly once and hasMore ends false', async () => {
    const seen: string[] = [];
    let cursor: string | undefined;
    for (let page = 0; page < 10; page++) {
      const body = SyncChangesResponseSchema.parse((await pull(cursor, 10)).body);
      seen.push(...body.changes.map((c) => c.entryId));
      cursor = body.nextCursor;
      if (!body.hasMore) break;
    }
    expect(seen).toHaveLength(25);
    expect(new Set(seen).size).toBe(25);
    const empty = SyncChangesResponseSchema.parse((await pull(cursor, 10)).body);
    expect(empty).toEqual({ changes: [], nextCursor: cursor, hasMore: false });
  });

  it('when the cursor is not one the server issued, then 400 names the cursor field', async () => {
    for (const bad of ['garbage!', 'Zm9v', Buffer.from('c1:-1').toString('base64url')]) {
      const res = await pull(bad, 10);
      expect(res.status).toBe(400);
      expect(res.body.error.details.issues[0].field).toBe('cursor');
    }
    const res = await pull(undefined, 5000);
    expect(res.status).toBe(400);
    expect(res.body.error.details.issues[0].field).toBe('limit');
  });

  it('when the same batch is pushed twice, then each submission is stored once and the second answer says duplicate', async () => {
    const ids = [crypto.randomUUID(), crypto.randomUUID()];
    const batch = { submissions: [{ id: ids[0], entry: demoEntry('demo.push-a') }, { id: ids[1], entry: demoEntry('demo.push-b') }] };
    const first = SyncPushResponseSchema.parse((await request(s.app).post('/api/sync/push').set(bearer(analyst)).send(batch)).body);
    expect(first.results.map((r) => r.outcome)).toEqual(['created', 'created']);
    const before = await tableCounts(s.ds);
    const second = SyncPushResponseSchema.parse((await request(s.app).post('/api/sync/push').set(bearer(analyst)).send(batch)).body);
    expect(second.results.map((r) => [r.id, r.outcome])).toEqual([
      [ids[0], 'duplicate'],
      [ids[1], 'duplicate'],
    ]);
    expect(await tableCounts(s.ds)).toEqual(before);
    const rows: { n: number }[] = await s.ds.query('SELECT COUNT(*) AS n FROM submission WHERE id IN (?, ?)', ids);
    expect(rows[0].n).toBe(2);
  });

  it('when the same id appears twice in one batch, then it is stored once', async () => {
    const id = crypto.randomUUID();
    const res = SyncPushResponseSchema.parse((await request(s.app).post('/api/sync/push').set(bearer(analyst)).send({ submissions: [{ id, entry: demoEntry('demo.twice') }, { id, entry: demoEntry('demo.twice') }] })).body);
    expect(res.results.map((r) => r.outcome)).toEqual(['created', 'duplicate']);
    const rows: { n: number }[] = await s.ds.query('SELECT COUNT(*) AS n FROM submission WHERE id = ?', [id]);
    expect(rows[0].n).toBe(1);
  });

  it('when a batch mixes good, invalid and clashing items, then each gets its own outcome and only the good one is stored', async () => {
    const good = crypto.randomUUID();
    const res = await request(s.app)
      .post('/api/sync/push')
      .set(bearer(analyst))
      .send({
        submissions: [
          { id: good, entry: demoEntry('demo.mixed-good') },
          { id: crypto.randomUUID(), entry: { ...demoEntry('demo.mixed-bad'), mhz: 'fast' } },
          { entry: demoEntry('demo.no-id') },
          { id: crypto.randomUUID(), entry: demoEntry('demo.sync-00') },
        ],
      });
    expect(res.status).toBe(200);
    const body = SyncPushResponseSchema.parse(res.body);
    expect(body.results.map((r) => r.outcome)).toEqual(['created', 'rejected', 'rejected', 'conflict']);
    expect(body.results[1].error!.issues[0].field).toBe('submissions.1.entry.mhz');
    expect(body.results[2].error!.issues[0].field).toBe('submissions.2.id');
    expect(body.results[3].error!.issues[0].field).toBe('submissions.3.entry.id');
    const stored: { entry_id: string }[] = await s.ds.query("SELECT entry_id FROM submission WHERE entry_id LIKE 'demo.mixed-%' OR entry_id IN ('demo.no-id')");
    expect(stored.map((r) => r.entry_id)).toEqual(['demo.mixed-good']);
  });

  it("when another account pushes an id someone else already used, then conflict and the first stays untouched", async () => {
    const id = crypto.randomUUID();
    await request(s.app).post('/api/sync/push').set(bearer(analyst)).send({ submissions: [{ id, entry: demoEntry('demo.owner') }] });
    const res = SyncPushResponseSchema.parse((await request(s.app).post('/api/sync/push').set(bearer(student)).send({ submissions: [{ id, entry: demoEntry('demo.thief') }] })).body);
    expect(res.results[0].outcome).toBe('conflict');
    const rows: { entry_id: string }[] = await s.ds.query('SELECT entry_id FROM submission WHERE id = ?', [id]);
    expect(rows).toEqual([{ entry_id: 'demo.owner' }]);
  });

  it('when an entry changes twice after a cursor, then the next pull carries only its latest revision', async () => {
    const start = SyncChangesResponseSchema.parse((await pull(undefined, 1000)).body).nextCursor;
    for (const note of ['first edit', 'second edit']) {
      const sub = await request(s.app).post('/api/submissions').set(bearer(analyst)).send({ kind: 'change', entry: { ...demoEntry('demo.sync-05', { name: 'Demo sync 5' }), notes: note } });
      expect(sub.status).toBe(201);
      const ok = await request(s.app).post(`/api/review/submissions/${sub.body.submission.id}/decision`).set(bearer(curator)).send({ decision: 'approve', version: 1 });
      expect(ok.status).toBe(200);
    }
    const body = SyncChangesResponseSchema.parse((await pull(start, 100)).body);
    expect(body.changes.map((c) => [c.entryId, c.revision, c.entry.notes])).toEqual([['demo.sync-05', 3, 'second edit']]);
  });

  it('when a push has more than 100 items or none, then 400 names submissions', async () => {
    for (const submissions of [[], Array.from({ length: 101 }, () => ({}))]) {
      const res = await request(s.app).post('/api/sync/push').set(bearer(analyst)).send({ submissions });
      expect(res.status).toBe(400);
      expect(res.body.error.details.issues[0].field).toBe('submissions');
    }
  });

  it('when a pull runs, then it costs two library queries however many entries change, and a repeated pull only one', async () => {
    // The better-sqlite3 driver has one query runner; every SQL statement passes its query().
    const runner = s.ds.driver.createQueryRunner('master') as unknown as { query: (...a: unknown[]) => Promise<unknown> };
    const original = runner.query;
    const seen: string[] = [];
    runner.query = function (this: unknown, ...args: unknown[]) {
      seen.push(String(args[0]));
      return original.apply(this, args);
    };
    let firstPull: string[];
    let secondBody: unknown;
    let firstBody: unknown;
    try {
      const res = await pull(undefined, 999);
      firstBody = res.body;
      expect(res.body.changes.length).toBeGreaterThan(20);
      firstPull = seen.splice(0);
      secondBody = (await pull(undefined, 999)).body;
    } finally {
      runner.query = original;
    }
    // The library's change number, then the page itself; none per entry.
    expect(firstPull.filter((q) => /library_entry/.test(q))).toHaveLength(2);
    // Unchanged library: the rendered page is reused, only the change number is read.
    expect(seen.filter((q) => /library_entry/.test(q))).toHaveLength(1);
    expect(secondBody).toEqual(firstBody);
  });

  it('when a client sends the ETag it got, then an unchanged page answers 304 with no body', async () => {
    const first = await pull(undefined, 50);
    expect(first.headers['content-type']).toMatch(/^application\/json/);
    expect(first.headers['cache-control']).toBe('private, no-cache');
    const again = await request(s.app).get('/api/sync/changes').query({ limit: 50 }).set(bearer(student)).set('If-None-Match', first.headers.etag);
    expect(again.status).toBe(304);
    expect(again.text).toBe('');
  });
});
