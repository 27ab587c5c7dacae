import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { spectrumToJcamp } from '../../matching/io';
import { signIn, startTestServer, tableCounts, type TestServer } from './helpers';

const META = (id: string, extra: Record<string, unknown> = {}) =>
  JSON.stringify({
    entry: { id, name: `Demo upload ${id}`, formula: 'C2H6O', category: 'demo', source: 'invented demo upload', solvent: 'CDCl3', mhz: 400 },
    ...extra,
  });

/** Invented demo peak list (integrals 3 : 2 : 1 → nuclei 3, 2, 1). */
const PEAKS_CSV = 'shift,integral\n1.22,3.0\n3.69,2.0\n2.10,1.0\n';

describe('uploads', () => {
  let s: TestServer;
  let token: string;
  beforeAll(async () => {
    s = await startTestServer({ env: { UPLOAD_MAX_BYTES: '4096' } });
    token = (await signIn(s.app, 'analyst')).accessToken;
  });
  afterAll(() => s.close());
  const upload = () => request(s.app).post('/api/submissions/upload').set('Authorization', `Bearer ${token}`);

  it('when the file has the wrong type, then 415 and nothing is stored', async () => {
    const before = await tableCounts(s.ds);
    const res = await upload().field('meta', META('demo.up-bad-type')).attach('file', Buffer.from('%PDF-1.4 ...'), 'spectrum.pdf');
    expect(res.status).toBe(415);
    expect(res.body.error.message).toBe('file: unsupported type ".pdf"; send .csv, .tsv, .txt, .jdx or .dx');
    expect(await tableCounts(s.ds)).toEqual(before);
  });

  it('when the file is binary under a text name, then 415 says binary', async () => {
    const before = await tableCounts(s.ds);
    const res = await upload().field('meta', META('demo.up-bin')).attach('file', Buffer.from([0x31, 0x2c, 0x00, 0xff, 0x10]), 'peaks.csv');
    expect(res.status).toBe(415);
    expect(res.body.error.details.issues[0]).toEqual({ field: 'file', message: 'binary content' });
    expect(await tableCounts(s.ds)).toEqual(before);
  });

  it('when the file is larger than the limit, then 413 and nothing is stored', async () => {
    const before = await tableCounts(s.ds);
    const big = 'shift,intensity\n' + '1.00,1\n'.repeat(1000);
    const res = await upload().field('meta', META('demo.up-big')).attach('file', Buffer.from(big), 'peaks.csv');
    expect(res.status).toBe(413);
    expect(res.body.error.code).toBe('file_too_large');
    expect(await tableCounts(s.ds)).toEqual(before);
  });

  it('when a line is malformed, then 400 names that line and nothing is stored', async () => {
    const before = await tableCounts(s.ds);
    const res = await upload().field('meta', META('demo.up-malformed')).attach('file', Buffer.from('shift,integral\n1.22,3.0\n3.69,abc\n2.10,1.0\n'), 'peaks.csv');
    expect(res.status).toBe(400);
    expect(res.body.error.details.issues).toEqual([{ field: 'file.intensity', line: 3, message: 'intensity "abc" is not a number' }]);
    expect(res.body.error.message).toContain('line 3');
    expect(await tableCounts(s.ds)).toEqual(before);
  });

  it('when meta is missing a field, then 400 names meta.entry.<field>', async () => {
    const res = await upload().field('meta', JSON.stringify({ entry: { id: 'demo.x', name: 'x', category: 'demo', source: 's', solvent: 'CDCl3', mhz: 400 } })).attach('file', Buffer.from(PEAKS_CSV), 'peaks.csv');
    expect(res.status).toBe(400);
    expect(res.body.error.details.issues[0].field).toBe('meta.entry.formula');
  });

  it('when no file is attached, then 400 file: required', async () => {
    const res = await upload().field('meta', META('demo.nofile'));
    expect(res.status).toBe(400);
    expect(res.body.error.message).toBe('file: required (multipart field "file")');
  });

  it('when a peak list is uploaded, then each peak becomes a singlet with nuclei from its integral share', async () => {
    const res = await upload().field('meta', META('demo.up-ok')).attach('file', Buffer.from(PEAKS_CSV), 'peaks.csv');
    expect(res.status).toBe(201);
    const sub = res.body.submission;
    expect(sub).toMatchObject({ sourceFormat: 'peaklist', fileName: 'peaks.csv', status: 'pending' });
    expect(sub.entry.signals.map((x: { shift: number; nuclei: number; multiplicity: string }) => [x.shift, x.nuclei, x.multiplicity])).toEqual([
      [1.22, 3, 's'],
      [2.1, 1, 's'],
      [3.69, 2, 's'],
    ]);
  });

  it('when the same peak list comes as UTF-16 with a BOM or as Latin-1, then it reads the same', async () => {
    const utf16 = Buffer.concat([Buffer.from([0xff, 0xfe]), Buffer.from(PEAKS_CSV, 'utf16le')]);
    // 0xE9 (é in Latin-1) is not valid UTF-8 on its own: the decoder must fall back.
    const latin1 = Buffer.from('shift,integral,note\n1.22,3.0,méthyle\n3.69,2.0,\n2.10,1.0,\n', 'latin1');
    expect(latin1.includes(0xe9)).toBe(true);
    const shifts: number[][] = [];
    for (const [i, bytes] of [utf16, latin1].entries()) {
      const res = await upload().field('meta', META(`demo.up-enc-${i}`)).attach('file', bytes, 'peaks.csv');
      expect(res.status, JSON.stringify(res.body)).toBe(201);
      shifts.push(res.body.submission.entry.signals.map((x: { shift: number }) => x.shift));
    }
    expect(shifts).toEqual([
      [1.22, 2.1, 3.69],
      [1.22, 2.1, 3.69],
    ]);
  });

  it('when totalNuclei is given, then the peaks share it by intensity', async () => {
    const res = await upload().field('meta', META('demo.up-total', { totalNuclei: 12 })).attach('file', Buffer.from(PEAKS_CSV), 'peaks.csv');
    expect(res.status).toBe(201);
    // 3 : 2 : 1 of 12 nuclei → 6, 4, 2 (sorted by shift: 1.22, 2.10, 3.69)
    expect(res.body.submission.entry.signals.map((x: { nuclei: number }) => x.nuclei)).toEqual([6, 2, 4]);
  });

  it('when the same upload is sent twice with one id in meta, then the second answer is the stored submission (200)', async () => {
    const id = '0b7f3a52-1c2d-4e5f-8a9b-0c1d2e3f4a5b';
    const first = await upload().field('meta', META('demo.up-idem', { id })).attach('file', Buffer.from(PEAKS_CSV), 'peaks.csv');
    const second = await upload().field('meta', META('demo.up-idem', { id })).attach('file', Buffer.from(PEAKS_CSV), 'peaks.csv');
    expect([first.status, second.status]).toEqual([201, 200]);
    expect(second.body.submission.id).toBe(id);
    const rows: { n: number }[] = await s.ds.query('SELECT COUNT(*) AS n FROM submission WHERE id = ?', [id]);
    expect(rows[0].n).toBe(1);
  });

  it('when a JCAMP-DX spectrum is uploaded, then its picked peaks become the signals', async () => {
    // Synthetic spectrum: two Lorentzian lines (areas 3 : 1) at 1.00 and 2.00 ppm, 1 Hz wide at 400 MHz.
    const ppm: number[] = [];
    const intensity: number[] = [];
    const gamma = 0.5 / 400; // half width at half height, ppm
    for (let i = 0; i < 4000; i++) {
      const x = 3 - (i * 3) / 4000;
      ppm.push(x);
      const l = (c: number, a: number) => (a * gamma) / Math.PI / ((x - c) ** 2 + gamma ** 2);
      intensity.push(l(1, 3) + l(2, 1));
    }
    const jcamp = spectrumToJcamp({ kind: 'spectrum', name: 'demo two lines', nucleus: '1H', solvent: 'CDCl3', mhz: 400, reference: 'TMS', ppm, intensity });
    const s2 = await startTestServer({ env: { UPLOAD_MAX_BYTES: String(2 * 1024 * 1024) } });
    try {
      const t = (await signIn(s2.app, 'analyst')).accessToken;
      const res = await request(s2.app).post('/api/submissions/upload').set('Authorization', `Bearer ${t}`).field('meta', META('demo.up-jcamp', { totalNuclei: 4 })).attach('file', Buffer.from(jcamp), 'two-lines.jdx');
      expect(res.status).toBe(201);
      const signals = res.body.submission.entry.signals as { shift: number; nuclei: number }[];
      expect(res.body.submission.sourceFormat).toBe('jcamp');
      expect(signals.map((x) => [Number(x.shift.toFixed(2)), x.nuclei])).toEqual([
        [1, 3],
        [2, 1],
      ]);
    } finally {
      await s2.close();
    }
  });

  it('when a JCAMP-DX file is truncated, then 400 and nothing is stored', async () => {
    const before = await tableCounts(s.ds);
    const res = await upload().field('meta', META('demo.up-trunc')).attach('file', Buffer.from('##TITLE=cut\n##JCAMP-DX=5.01\n##DATA TYPE=NMR SPECTRUM\n##XUNITS=HZ\n##XYDATA=(X++(Y..Y))\n1 2 3'), 'cut.jdx');
    expect(res.status).toBeGreaterThanOrEqual(400);
    expect(res.status).toBeLessThan(500);
    expect(res.body.error.message).toMatch(/^file: /);
    expect(await tableCounts(s.ds)).toEqual(before);
  });
});
