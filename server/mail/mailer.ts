import nodemailer from 'nodemailer';
import type { Logger } from 'pino';
import type { DataSource } from 'typeorm';
import { randomUUID } from 'node:crypto';
import type { Config } from '../config';
import { tx } from '../data-source';
import { MailMessage } from '../entities/MailMessage';

export type MailKind = 'new_submission' | 'decision' | 'password_reset';

export interface MailInput {
  kind: MailKind;
  to: string;
  subject: string;
  text: string;
}

export interface Mailer {
  /** Never throws: a mail failure is logged and recorded, it does not undo the request. */
  send(message: MailInput): Promise<void>;
  readonly transport: 'outbox' | 'smtp';
  close(): void;
}

/**
 * The local fake transport (no SMTP settings): nodemailer builds the message with its JSON
 * transport and the whole text goes into the mail_message table, which admins read through
 * GET /api/admin/outbox and tests read directly.
 */
export function createOutboxMailer(ds: DataSource, from: string, logger: Logger): Mailer {
  const transporter = nodemailer.createTransport({ jsonTransport: true });
  return {
    transport: 'outbox',
    async send(m) {
      try {
        await transporter.sendMail({ from, to: m.to, subject: m.subject, text: m.text });
        await tx(ds, (em) => em.getRepository(MailMessage).insert(record(m, 'outbox', 'stored', m.text, null)));
      } catch (err) {
        logger.error({ err, kind: m.kind }, 'outbox write failed');
      }
    },
    close: () => transporter.close(),
  };
}

/** Real SMTP. Only the envelope and the outcome are stored; the text (it may hold a reset token) is not. */
export function createSmtpMailer(ds: DataSource, config: Config, logger: Logger): Mailer {
  const smtp = config.smtp;
  if (!smtp) throw new Error('createSmtpMailer needs SMTP settings');
  const transporter = nodemailer.createTransport({
    host: smtp.host,
    port: smtp.port,
    secure: smtp.secure,
    auth: smtp.user ? { user: smtp.user, pass: smtp.pass ?? '' } : undefined,
    tls: smtp.allowSelfSigned ? { rejectUnauthorized: false } : undefined,
    connectionTimeout: 10_000,
    greetingTimeout: 10_000,
    socketTimeout: 20_000,
  });
  return {
    transport: 'smtp',
    async send(m) {
      let status: 'sent' | 'failed' = 'sent';
      let error: string | null = null;
      try {
        await transporter.sendMail({ from: config.mailFrom, to: m.to, subject: m.subject, text: m.text });
      } catch (err) {
        status = 'failed';
        error = (err as Error).message.slice(0, 500);
        logger.error({ err, kind: m.kind }, 'SMTP send failed');
      }
      try {
        await tx(ds, (em) => em.getRepository(MailMessage).insert(record(m, 'smtp', status, null, error)));
      } catch (err) {
        logger.error({ err }, 'mail record write failed');
      }
    },
    close: () => transporter.close(),
  };
}

export function createMailer(ds: DataSource, config: Config, logger: Logger): Mailer {
  return config.smtp ? createSmtpMailer(ds, config, logger) : createOutboxMailer(ds, config.mailFrom, logger);
}

function record(m: MailInput, transport: 'outbox' | 'smtp', status: MailMessage['status'], bodyText: string | null, error: string | null): MailMessage {
  return Object.assign(new MailMessage(), {
    id: randomUUID(),
    kind: m.kind,
    toAddress: m.to,
    subject: m.subject.slice(0, 300),
    bodyText,
    transport,
    status,
    error,
    createdAt: new Date(),
  });
}
