import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ReviewDetailResponseSchema, ReviewQueueResponseSchema, DecisionResponseSchema } from '../../shared/api/review';
import { SubmissionResponseSchema } from '../../shared/api/submissions';
import { SyncChangesResponseSchema } from '../../shared/api/sync';
import { OutboxResponseSchema, AuditResponseSchema } from '../../shared/api/admin';
import { demoEntry, signIn, startTestServer, writeLibraryDir, type TestServer } from './helpers';

describe('submission lifecycle', () => {
  let s: TestServer;
  let analyst: string;
  let curator: string;
  let admin: string;
  let student: string;
  const auth = (t: string) => ({ Authorization: `Bearer ${t}` });

  beforeAll(async () => {
    const base = await import('node:fs').then((fs) => fs.mkdtempSync(require('node:path').join(require('node:os').tmpdir(), 'tessera-lc-')));
    s = await startTestServer({ libraryDir: writeLibraryDir(base, [demoEntry('demo.ethanol-like', { name: 'Demo ethanol-like' })]) });
    [analyst, curator, admin, student] = (await Promise.all([signIn(s.app, 'analyst'), signIn(s.app, 'curator'), signIn(s.app, 'admin'), signIn(s.app, 'student')])).map((x) => x.accessToken);
  });
  afterAll(() => s.close());

  it('when an analyst submits, a curator approves, and later retires, then sync carries the entry and then its tombstone', async () => {
    const initial = SyncChangesResponseSchema.parse((await request(s.app).get('/api/sync/changes').set(auth(analyst))).body);
    expect(initial.changes.map((c) => c.entryId)).toEqual(['demo.ethanol-like']);
    const cursor = initial.nextCursor;

    const entry = demoEntry('demo.new-one', {
      name: 'Demo new compound',
      formula: 'C3H8O',
      signals: [
        { nucleus: '1H', shift: 0.94, multiplicity: 't', j: [7.4], nuclei: 3 },
        { nucleus: '1H', shift: 1.57, multiplicity: 'sext', j: [7.2], nuclei: 2 },
        { nucleus: '1H', shift: 3.58, multiplicity: 't', j: [6.7], nuclei: 2 },
      ],
    });
    const sub = await request(s.app).post('/api/submissions').set(auth(analyst)).send({ entry, note: 'from our bench-top run' });
    expect(sub.status).toBe(201);
    const view = SubmissionResponseSchema.parse(sub.body).submission;
    expect(view).toMatchObject({ status: 'pending', kind: 'new', entryId: 'demo.new-one', version: 1, studentWork: false, sourceFormat: 'json' });
    // C3H8O has 8 H, one on O; the entry gives 7 non-exchangeable — the formula check is satisfied.
    expect(view.checks.problems.filter((p) => p.check === 'formula')).toEqual([]);

    const queue = ReviewQueueResponseSchema.parse((await request(s.app).get('/api/review/queue').set(auth(curator))).body);
    expect(queue.items.map((i) => i.id)).toContain(view.id);

    const detail = ReviewDetailResponseSchema.parse((await request(s.app).get(`/api/review/submissions/${view.id}`).set(auth(curator))).body);
    expect(detail.submission.id).toBe(view.id);
    expect(detail.current).toBeNull();

    const decided = await request(s.app).post(`/api/review/submissions/${view.id}/decision`).set(auth(curator)).send({ decision: 'approve', version: 1, comment: 'looks right' });
    expect(decided.status).toBe(200);
    const d = DecisionResponseSchema.parse(decided.body);
    expect(d.submission).toMatchObject({ status: 'approved', version: 2, decisionComment: 'looks right' });
    expect(d.entry).toMatchObject({ id: 'demo.new-one', revision: 1 });

    const after = SyncChangesResponseSchema.parse((await request(s.app).get('/api/sync/changes').query({ cursor }).set(auth(student))).body);
    expect(after.changes).toHaveLength(1);
    expect(after.changes[0]).toMatchObject({ entryId: 'demo.new-one', revision: 1, retired: false });

    const retire = await request(s.app).post('/api/review/entries/demo.new-one/retire').set(auth(curator)).send({ revision: 1, comment: 'duplicate of a published entry' });
    expect(retire.status).toBe(200);
    expect(retire.body.entry).toMatchObject({ id: 'demo.new-one', retired: true });

    const tomb = SyncChangesResponseSchema.parse((await request(s.app).get('/api/sync/changes').query({ cursor: after.nextCursor }).set(auth(student))).body);
    expect(tomb.changes).toEqual([expect.objectContaining({ entryId: 'demo.new-one', retired: true })]);
    expect(tomb.changes[0].entry.retired).toBe(true);

    const lib = await request(s.app).get('/api/library').set(auth(student));
    expect(lib.body.entries.map((e: { id: string }) => e.id)).not.toContain('demo.new-one');

    const auditRes = AuditResponseSchema.parse((await request(s.app).get('/api/admin/audit').query({ subjectType: 'submission', subjectId: view.id }).set(auth(admin))).body);
    expect(auditRes.events.map((e) => e.action)).toEqual(['submission.approve', 'submission.create']);
  });

  it('when a curator rejects with a comment, then the submitter gets an e-mail in the outbox with that comment', async () => {
    const sub = await request(s.app).post('/api/submissions').set(auth(analyst)).send({ entry: demoEntry('demo.reject-me', { name: 'Demo reject me' }) });
    expect(sub.status).toBe(201);
    const res = await request(s.app).post(`/api/review/submissions/${sub.body.submission.id}/decision`).set(auth(curator)).send({ decision: 'reject', version: 1, comment: 'shifts do not fit the structure' });
    expect(res.status).toBe(200);
    const outbox = OutboxResponseSchema.parse((await request(s.app).get('/api/admin/outbox').set(auth(admin))).body);
    const mail = outbox.messages.find((m) => m.kind === 'decision' && m.subject.includes('Demo reject me'));
    expect(mail).toBeDefined();
    expect(mail!.to).toBe('analyst@demo.tessera.test');
    expect(mail!.text).toContain('shifts do not fit the structure');
    expect(outbox.messages.some((m) => m.kind === 'new_submission' && m.to === 'curator@demo.tessera.test')).toBe(true);
  });

  it('when rejecting without a comment, then 400 names the comment field', async () => {
    const sub = await request(s.app).post('/api/submissions').set(auth(analyst)).send({ entry: demoEntry('demo.no-comment') });
    const res = await request(s.app).post(`/api/review/submissions/${sub.body.submission.id}/decision`).set(auth(curator)).send({ decision: 'reject', version: 1 });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toBe('decision: comment: a comment is required to reject');
  });

  it('when a change is approved, then the entry gets revision 2 and revision 1 stays readable', async () => {
    const changed = { ...demoEntry('demo.ethanol-like', { name: 'Demo ethanol-like' }), notes: 'refined shifts' };
    const sub = await request(s.app).post('/api/submissions').set(auth(analyst)).send({ kind: 'change', baseRevision: 1, entry: changed });
    expect(sub.status).toBe(201);
    const detail = ReviewDetailResponseSchema.parse((await request(s.app).get(`/api/review/submissions/${sub.body.submission.id}`).set(auth(curator))).body);
    expect(detail.current).toMatchObject({ id: 'demo.ethanol-like', revision: 1 });
    const ok = await request(s.app).post(`/api/review/submissions/${sub.body.submission.id}/decision`).set(auth(curator)).send({ decision: 'approve', version: 1 });
    expect(ok.status).toBe(200);
    expect(ok.body.entry).toMatchObject({ revision: 2, notes: 'refined shifts' });
    const revs = await request(s.app).get('/api/library/demo.ethanol-like/revisions').set(auth(student));
    expect(revs.body.revisions.map((r: { revision: number; status: string }) => [r.revision, r.status])).toEqual([[2, 'current'], [1, 'superseded']]);
    const r1 = await request(s.app).get('/api/library/demo.ethanol-like/revisions/1').set(auth(student));
    expect(r1.status).toBe(200);
    expect(r1.body.entry.notes).toBeUndefined();
  });

  it('when a new submission reuses an id the library holds, then 409 names entry.id and nothing is stored', async () => {
    const res = await request(s.app).post('/api/submissions').set(auth(analyst)).send({ entry: demoEntry('demo.ethanol-like') });
    expect(res.status).toBe(409);
    expect(res.body.error.details.issues[0].field).toBe('entry.id');
  });

  // The write-route property test found a 5e-324 MHz entry that passed validation and broke the
  // curation checks (500); the frequency now has the bounds of a real spectrometer.
  it('when a submission states a spectrometer frequency no instrument has, then 400 names entry.mhz and nothing is stored', async () => {
    const before = await s.ds.query('SELECT COUNT(*) AS n FROM submission');
    for (const mhz of [5e-324, 0.5, 2500]) {
      const res = await request(s.app).post('/api/submissions').set(auth(analyst)).send({ entry: demoEntry(`demo.bad-mhz-${String(mhz).replace(/[^0-9]/g, '')}`, { mhz }) });
      expect(res.status, JSON.stringify(res.body)).toBe(400);
      expect(res.body.error.details.issues.map((i: { field: string }) => i.field)).toEqual(['entry.mhz']);
    }
    expect(await s.ds.query('SELECT COUNT(*) AS n FROM submission')).toEqual(before);
  });

  it('when a student submits, then the submission is marked student work', async () => {
    const res = await request(s.app).post('/api/submissions').set(auth(student)).send({ entry: demoEntry('demo.student-try', { studentWork: false }) });
    expect(res.status).toBe(201);
    expect(res.body.submission.studentWork).toBe(true);
    expect(res.body.submission.entry.studentWork).toBe(true);
    const q = await request(s.app).get('/api/review/queue').query({ studentWork: 'true' }).set(auth(curator));
    expect(q.body.items.map((i: { entryId: string }) => i.entryId)).toEqual(['demo.student-try']);
  });

  it('when a near copy of an existing entry is submitted, then the checks name it as nearest with name and peak similarity', async () => {
    const res = await request(s.app).post('/api/submissions').set(auth(analyst)).send({ entry: demoEntry('demo.copy', { name: 'Demo ethanol like' }) });
    expect(res.status).toBe(201);
    const checks = res.body.submission.checks;
    expect(checks.nearestEntryId).toBe('demo.ethanol-like');
    expect(checks.similar[0].nameScore).toBeGreaterThan(0.9);
    expect(checks.similar[0].peakScore).toBeGreaterThan(0.9);
    expect(checks.problems.map((p: { check: string }) => p.check)).toEqual(expect.arrayContaining(['nearDuplicate', 'similarName', 'similarPeaks']));
  });
});
