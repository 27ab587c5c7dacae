import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ReviewQueueResponseSchema } from '../../shared/api/review';
import { SubmissionListResponseSchema } from '../../shared/api/submissions';
import { MailMessage } from '../../server/entities/MailMessage';
import { demoEntry, signIn, startTestServer, type TestServer } from './helpers';

describe('curator queue and the submitter side', () => {
  let s: TestServer;
  let analyst: string;
  let student: string;
  let curator: string;
  const bearer = (t: string) => ({ Authorization: `Bearer ${t}` });
  const ids: Record<string, string> = {};

  beforeAll(async () => {
    s = await startTestServer();
    [analyst, student, curator] = (await Promise.all([signIn(s.app, 'analyst'), signIn(s.app, 'student'), signIn(s.app, 'curator')])).map((x) => x.accessToken);
    // Created one after another so "oldest" order is the order below.
    const plan: [string, string, string, Record<string, unknown>][] = [
      ['zeta', analyst, 'Demo zeta', {}],
      ['alpha', student, 'Demo alpha', {}],
      // 7 H in C2H6O can sit on carbon at most 5: a formula finding, and a shift out of range.
      ['broken', analyst, 'Demo broken', { signals: [{ nucleus: '1H', shift: 25, multiplicity: 's', nuclei: 7 }] }],
    ];
    for (const [key, token, name, extra] of plan) {
      const res = await request(s.app).post('/api/submissions').set(bearer(token)).send({ entry: demoEntry(`demo.q-${key}`, { name, ...extra }) });
      expect(res.status).toBe(201);
      ids[key] = res.body.submission.id;
    }
  });
  afterAll(() => s.close());

  const queue = async (query: Record<string, string>) => ReviewQueueResponseSchema.parse((await request(s.app).get('/api/review/queue').query(query).set(bearer(curator))).body);

  it('when sorting the queue, then oldest, newest, name and problems each order it as named', async () => {
    expect((await queue({ sort: 'oldest' })).items.map((i) => i.entryId)).toEqual(['demo.q-zeta', 'demo.q-alpha', 'demo.q-broken']);
    expect((await queue({ sort: 'newest' })).items.map((i) => i.entryId)).toEqual(['demo.q-broken', 'demo.q-alpha', 'demo.q-zeta']);
    expect((await queue({ sort: 'name' })).items.map((i) => i.name)).toEqual(['Demo alpha', 'Demo broken', 'Demo zeta']);
    const byProblems = (await queue({ sort: 'problems' })).items;
    expect(byProblems[0].entryId).toBe('demo.q-broken');
    expect(byProblems[0].problemCount).toBeGreaterThanOrEqual(2);
  });

  it('when filtering by text, student work or page, then only those come back and total counts the whole match', async () => {
    expect((await queue({ q: 'alph' })).items.map((i) => i.entryId)).toEqual(['demo.q-alpha']);
    expect((await queue({ q: '%' })).items).toEqual([]); // LIKE wildcards are taken literally
    expect((await queue({ studentWork: 'false' })).items.map((i) => i.entryId)).toEqual(['demo.q-zeta', 'demo.q-broken']);
    const page = await queue({ limit: '1', offset: '1' });
    expect(page.items.map((i) => i.entryId)).toEqual(['demo.q-alpha']);
    expect(page.total).toBe(3);
  });

  it('when the checks run, then the broken entry names the formula and the shift range by field', async () => {
    const detail = await request(s.app).get(`/api/review/submissions/${ids.broken}`).set(bearer(curator));
    const problems = detail.body.submission.checks.problems as { check: string; field: string }[];
    expect(problems).toEqual(expect.arrayContaining([expect.objectContaining({ check: 'shiftRange', field: 'signals[0].shift' }), expect.objectContaining({ check: 'formula' })]));
  });

  it('when the SMILES disagrees with the formula, then the checks say so (openchemlib reads the SMILES)', async () => {
    // Ethanol is CCO = C2H6O (common practice); the entry claims C3H8O.
    const res = await request(s.app).post('/api/submissions').set(bearer(analyst)).send({ entry: demoEntry('demo.q-smiles', { name: 'Demo smiles clash', smiles: 'CCO', formula: 'C3H8O' }) });
    expect(res.status).toBe(201);
    const formula = (res.body.submission.checks.problems as { check: string; message: string }[]).filter((p) => p.check === 'formula');
    expect(formula.length).toBeGreaterThan(0);
    expect(formula.map((p) => p.message).join(' ')).toMatch(/C2H6O/);
  });

  it('when a curator asks for changes, then the submitter sees the status and comment in their own list and gets an e-mail', async () => {
    const res = await request(s.app).post(`/api/review/submissions/${ids.broken}/decision`).set(bearer(curator)).send({ decision: 'request_changes', version: 1, comment: 'the 25 ppm signal cannot be 1H' });
    expect(res.status).toBe(200);
    expect(res.body.entry).toBeNull();
    const mine = SubmissionListResponseSchema.parse((await request(s.app).get('/api/submissions').query({ status: 'changes_requested' }).set(bearer(analyst))).body);
    expect(mine.items.map((i) => [i.entryId, i.decisionComment])).toEqual([['demo.q-broken', 'the 25 ppm signal cannot be 1H']]);
    const mail = await s.ds.getRepository(MailMessage).findOneByOrFail({ kind: 'decision', toAddress: 'analyst@demo.tessera.test' });
    expect(mail.subject).toBe('Tessera: your submission "Demo broken" was sent back for changes');
    expect(mail.bodyText).toContain('the 25 ppm signal cannot be 1H');
    // The queue no longer shows it as pending.
    expect((await queue({})).items.map((i) => i.entryId)).not.toContain('demo.q-broken');
    expect((await queue({ status: 'changes_requested' })).items.map((i) => i.entryId)).toEqual(['demo.q-broken']);
  });

  it("when a student asks for someone else's submission, then 404; its owner and curators see it", async () => {
    expect((await request(s.app).get(`/api/submissions/${ids.zeta}`).set(bearer(student))).status).toBe(404);
    expect((await request(s.app).get(`/api/submissions/${ids.zeta}`).set(bearer(analyst))).status).toBe(200);
    expect((await request(s.app).get(`/api/submissions/${ids.zeta}`).set(bearer(curator))).status).toBe(200);
  });

  it('when a change names an entry the library does not have, then 404 names entry.id', async () => {
    const res = await request(s.app).post('/api/submissions').set(bearer(analyst)).send({ kind: 'change', entry: demoEntry('demo.not-there') });
    expect(res.status).toBe(404);
    expect(res.body.error.details.issues[0].field).toBe('entry.id');
  });

  it('when a reset code has expired, then confirming it is refused', async () => {
    const ttl = s.config.passwordResetTtlSeconds;
    s.config.passwordResetTtlSeconds = -1; // the service reads the same config object
    try {
      await request(s.app).post('/api/auth/password-reset').send({ email: 'student@demo.tessera.test' });
    } finally {
      s.config.passwordResetTtlSeconds = ttl;
    }
    const mail = await s.ds.getRepository(MailMessage).findOneByOrFail({ kind: 'password_reset' });
    const token = /code in the app: (\S+)/.exec(mail.bodyText!)![1];
    const res = await request(s.app).post('/api/auth/password-reset/confirm').send({ token, password: 'a-brand-new-password' });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('invalid_token');
  });
});
