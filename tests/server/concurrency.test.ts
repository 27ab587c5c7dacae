import crypto from 'node:crypto';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { tx } from '../../server/data-source';
import { signIn, demoEntry, startTestServer, type TestServer } from './helpers';

describe('concurrent decisions', () => {
  let s: TestServer;
  let analyst: string;
  let curatorA: string;
  let curatorB: string;
  const bearer = (t: string) => ({ Authorization: `Bearer ${t}` });

  beforeAll(async () => {
    s = await startTestServer();
    analyst = (await signIn(s.app, 'analyst')).accessToken;
    curatorA = (await signIn(s.app, 'curator')).accessToken;
    const hash = await s.app.locals.services.auth.hashPassword('second-curator-pw');
    await tx(s.ds, (m) => s.app.locals.services.auth.createUser(m, { email: 'curator2@example.test', displayName: 'Second Curator', role: 'curator', passwordHash: hash }));
    curatorB = (await request(s.app).post('/api/auth/sign-in').send({ email: 'curator2@example.test', password: 'second-curator-pw' })).body.accessToken;
  });
  afterAll(() => s.close());

  it('when two curators decide the same submission at once, then one wins and the other gets 409 showing the winning decision', async () => {
    for (let round = 0; round < 5; round++) {
      const sub = await request(s.app).post('/api/submissions').set(bearer(analyst)).send({ entry: demoEntry(`demo.race-${round}`) });
      const id = sub.body.submission.id;
      const [a, b] = await Promise.all([
        request(s.app).post(`/api/review/submissions/${id}/decision`).set(bearer(curatorA)).send({ decision: 'approve', version: 1 }),
        request(s.app).post(`/api/review/submissions/${id}/decision`).set(bearer(curatorB)).send({ decision: 'reject', version: 1, comment: 'not convinced' }),
      ]);
      const statuses = [a.status, b.status].sort();
      expect(statuses).toEqual([200, 409]);
      const winner = a.status === 200 ? a : b;
      const loser = a.status === 409 ? a : b;
      expect(loser.body.error.code).toBe('conflict');
      expect(loser.body.error.details.submission.status).toBe(winner.body.submission.status);
      expect(loser.body.error.details.submission.decidedBy.displayName).toBe(winner === a ? 'Demo Curator' : 'Second Curator');
      expect(loser.body.error.message).toMatch(/already decided/);
      // The library holds the entry only if approve won, and exactly once.
      const rows: { n: number }[] = await s.ds.query('SELECT COUNT(*) AS n FROM library_entry WHERE entry_id = ?', [`demo.race-${round}`]);
      expect(rows[0].n).toBe(winner === a ? 1 : 0);
      const audits: { n: number }[] = await s.ds.query("SELECT COUNT(*) AS n FROM audit_log WHERE subject_id = ? AND action LIKE 'submission.%' AND action <> 'submission.create'", [id]);
      expect(audits[0].n).toBe(1);
    }
  });

  it('when a decision names an old version, then 409 without touching the submission', async () => {
    const sub = await request(s.app).post('/api/submissions').set(bearer(analyst)).send({ entry: demoEntry('demo.stale') });
    const res = await request(s.app).post(`/api/review/submissions/${sub.body.submission.id}/decision`).set(bearer(curatorA)).send({ decision: 'approve', version: 7 });
    expect(res.status).toBe(409);
    expect(res.body.error.details.submission).toMatchObject({ status: 'pending', version: 1 });
  });

  it('when the same push arrives 10 times at once, then it is stored once', async () => {
    const id = crypto.randomUUID();
    const body = { submissions: [{ id, entry: demoEntry('demo.burst') }] };
    const all = await Promise.all(Array.from({ length: 10 }, () => request(s.app).post('/api/sync/push').set(bearer(analyst)).send(body)));
    expect(all.map((r) => r.status)).toEqual(Array(10).fill(200));
    const outcomes = all.map((r) => r.body.results[0].outcome).sort();
    expect(outcomes).toEqual(['created', ...Array(9).fill('duplicate')]);
    const rows: { n: number }[] = await s.ds.query('SELECT COUNT(*) AS n FROM submission WHERE id = ?', [id]);
    expect(rows[0].n).toBe(1);
  });

  it('when two curators retire the same entry at once, then one gets 409', async () => {
    const sub = await request(s.app).post('/api/submissions').set(bearer(analyst)).send({ entry: demoEntry('demo.retire-race') });
    await request(s.app).post(`/api/review/submissions/${sub.body.submission.id}/decision`).set(bearer(curatorA)).send({ decision: 'approve', version: 1 });
    const [a, b] = await Promise.all([
      request(s.app).post('/api/review/entries/demo.retire-race/retire').set(bearer(curatorA)).send({ revision: 1, comment: 'gone' }),
      request(s.app).post('/api/review/entries/demo.retire-race/retire').set(bearer(curatorB)).send({ revision: 1, comment: 'gone too' }),
    ]);
    expect([a.status, b.status].sort()).toEqual([200, 409]);
  });
});
