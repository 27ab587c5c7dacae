import type { AddressInfo } from 'node:net';
import request from 'supertest';
import { SMTPServer } from 'smtp-server';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { MailMessage } from '../../server/entities/MailMessage';
import { createSmtpMailer } from '../../server/mail/mailer';
import { silent, startTestServer, type TestServer } from './helpers';

interface Received {
  from: string;
  to: string[];
  data: string;
}

describe('mail through real SMTP', () => {
  let smtp: SMTPServer;
  let port: number;
  const received: Received[] = [];
  let s: TestServer;

  beforeAll(async () => {
    smtp = new SMTPServer({
      authOptional: false,
      disabledCommands: ['STARTTLS'],
      onAuth(auth, _session, cb) {
        if (auth.username === 'tessera' && auth.password === 'smtp-secret') cb(null, { user: 'tessera' });
        else cb(new Error('bad login'));
      },
      onData(stream, session, cb) {
        const chunks: Buffer[] = [];
        stream.on('data', (c: Buffer) => chunks.push(c));
        stream.on('end', () => {
          received.push({ from: session.envelope.mailFrom ? session.envelope.mailFrom.address : '', to: session.envelope.rcptTo.map((r) => r.address), data: Buffer.concat(chunks).toString('utf8') });
          cb();
        });
      },
    });
    await new Promise<void>((resolve) => smtp.listen(0, '127.0.0.1', resolve));
    port = (smtp.server.address() as AddressInfo).port;
    s = await startTestServer({
      env: { SMTP_HOST: '127.0.0.1', SMTP_PORT: String(port), SMTP_SECURE: 'false', SMTP_USER: 'tessera', SMTP_PASS: 'smtp-secret', MAIL_FROM: 'Tessera <mail@tessera.test>' },
      mailer: (ds, c) => createSmtpMailer(ds, c, silent),
    });
  });
  afterAll(async () => {
    await s.close();
    await new Promise<void>((resolve) => smtp.close(() => resolve()));
  });

  it('when SMTP settings are given and a reset is asked for, then the message goes to the SMTP server and only its envelope is recorded', async () => {
    expect(s.mailer.transport).toBe('smtp');
    const res = await request(s.app).post('/api/auth/password-reset').send({ email: 'student@demo.tessera.test' });
    expect(res.status).toBe(202);
    expect(received).toHaveLength(1);
    expect(received[0].from).toBe('mail@tessera.test');
    expect(received[0].to).toEqual(['student@demo.tessera.test']);
    expect(received[0].data).toContain('Subject: Tessera: reset your password');
    const rows = await s.ds.getRepository(MailMessage).find();
    expect(rows.map((r) => [r.transport, r.status, r.toAddress, r.bodyText])).toEqual([['smtp', 'sent', 'student@demo.tessera.test', null]]);
  });

  it('when the SMTP server refuses the login, then the request still succeeds and the failure is recorded', async () => {
    const bad = { ...s.config, smtp: { ...s.config.smtp!, pass: 'wrong' } };
    const mailer = createSmtpMailer(s.ds, bad, silent);
    await mailer.send({ kind: 'decision', to: 'a@b.test', subject: 'x', text: 'y' });
    mailer.close();
    const failed = await s.ds.getRepository(MailMessage).findOneByOrFail({ toAddress: 'a@b.test' });
    expect(failed.status).toBe('failed');
    expect(failed.error).toMatch(/auth|login|535/i);
  });
});
