import crypto from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';
import { z } from 'zod';

/** Validated server settings. Read once at start-up (server/index.ts); tests build their own. */
export interface Config {
  port: number;
  host: string;
  databasePath: string;
  jwtSecret: string;
  webDir: string;
  libraryDataDir: string;
  /** Origins allowed by CORS: the app's own origin(s) only. */
  appOrigins: string[];
  /** Base URL used in e-mailed links (password reset). */
  publicUrl: string;
  accessTokenTtlSeconds: number;
  refreshTokenTtlSeconds: number;
  passwordResetTtlSeconds: number;
  /** Sign-in (and register / reset request) attempts allowed per client address per window. */
  authRateLimit: { windowMs: number; max: number };
  /** Upload size limit for submission files, bytes. */
  uploadMaxBytes: number;
  /** bcrypt cost factor; tests lower it to keep account creation fast. */
  bcryptRounds: number;
  smtp: SmtpConfig | null;
  mailFrom: string;
  logLevel: string;
}

export interface SmtpConfig {
  host: string;
  port: number;
  secure: boolean;
  user?: string;
  pass?: string;
  /** Accept self-signed certificates (local relays, tests). */
  allowSelfSigned: boolean;
}

const intFrom = (min: number, max: number) =>
  z
    .string()
    .trim()
    .regex(/^\d+$/, 'must be a whole number')
    .transform(Number)
    .refine((n) => n >= min && n <= max, `must be between ${min} and ${max}`);

const boolFrom = z
  .string()
  .trim()
  .toLowerCase()
  .refine((s) => ['true', 'false', '1', '0', 'yes', 'no'].includes(s), 'must be true or false')
  .transform((s) => s === 'true' || s === '1' || s === 'yes');

const EnvSchema = z.object({
  PORT: intFrom(0, 65535).optional(),
  HOST: z.string().trim().min(1, 'must not be empty').optional(),
  DATABASE_PATH: z.string().trim().min(1, 'must not be empty').optional(),
  JWT_SECRET: z.string().min(32, 'must be at least 32 characters').optional(),
  WEB_DIR: z.string().trim().min(1, 'must not be empty').optional(),
  LIBRARY_DATA_DIR: z.string().trim().min(1, 'must not be empty').optional(),
  APP_ORIGIN: z.string().trim().min(1, 'must not be empty').optional(),
  PUBLIC_URL: z.url('must be a URL such as http://127.0.0.1:8080').optional(),
  AUTH_RATE_LIMIT: intFrom(1, 100000).optional(),
  UPLOAD_MAX_BYTES: intFrom(1024, 50 * 1024 * 1024).optional(),
  SMTP_HOST: z.string().trim().min(1, 'must not be empty').optional(),
  SMTP_PORT: intFrom(1, 65535).optional(),
  SMTP_SECURE: boolFrom.optional(),
  SMTP_USER: z.string().optional(),
  SMTP_PASS: z.string().optional(),
  SMTP_ALLOW_SELF_SIGNED: boolFrom.optional(),
  MAIL_FROM: z.string().trim().min(3).optional(),
  LOG_LEVEL: z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']).optional(),
});

export class ConfigError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'ConfigError';
  }
}

const originOf = (s: string, variable: string): string => {
  try {
    return new URL(s).origin;
  } catch {
    throw new ConfigError(`${variable}: "${s}" is not an origin such as http://127.0.0.1:8080`);
  }
};

/**
 * Builds the Config from environment variables. Throws ConfigError naming the first bad variable.
 * In development a JWT secret is generated once and kept beside the database so sessions survive
 * restarts without anyone having to set one.
 */
export function loadConfig(env: Record<string, string | undefined>, root: string): Config {
  const relevant = Object.fromEntries(
    Object.keys(EnvSchema.shape).flatMap((k) => (env[k] === undefined || env[k] === '' ? [] : [[k, env[k]]])),
  );
  const parsed = EnvSchema.safeParse(relevant);
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    throw new ConfigError(`${String(issue.path[0])}: ${issue.message} (got "${relevant[String(issue.path[0])]}")`);
  }
  const e = parsed.data;
  const port = e.PORT ?? 8080;
  const host = e.HOST ?? '127.0.0.1';
  const databasePath = path.resolve(root, e.DATABASE_PATH ?? 'data/tessera.sqlite');
  const webDir = path.resolve(root, e.WEB_DIR ?? 'dist/web');
  const libraryDataDir = path.resolve(root, e.LIBRARY_DATA_DIR ?? 'library-data');
  const publicUrl = (e.PUBLIC_URL ?? `http://${host}:${port}`).replace(/\/$/, '');
  const appOrigins = e.APP_ORIGIN
    ? e.APP_ORIGIN.split(',').map((s) => originOf(s.trim(), 'APP_ORIGIN'))
    : [...new Set([originOf(publicUrl, 'PUBLIC_URL'), `http://localhost:${port}`, `http://127.0.0.1:${port}`])];

  if ((e.SMTP_PORT || e.SMTP_USER || e.SMTP_PASS) && !e.SMTP_HOST) {
    throw new ConfigError('SMTP_HOST: must be set when other SMTP_* settings are given');
  }
  if (e.SMTP_USER && !e.SMTP_PASS) throw new ConfigError('SMTP_PASS: must be set when SMTP_USER is given');
  const smtp: SmtpConfig | null = e.SMTP_HOST
    ? {
        host: e.SMTP_HOST,
        port: e.SMTP_PORT ?? 587,
        secure: e.SMTP_SECURE ?? e.SMTP_PORT === 465,
        user: e.SMTP_USER,
        pass: e.SMTP_PASS,
        allowSelfSigned: e.SMTP_ALLOW_SELF_SIGNED ?? false,
      }
    : null;

  return {
    port,
    host,
    databasePath,
    jwtSecret: e.JWT_SECRET ?? devJwtSecret(databasePath),
    webDir,
    libraryDataDir,
    appOrigins,
    publicUrl,
    accessTokenTtlSeconds: 15 * 60,
    refreshTokenTtlSeconds: 30 * 24 * 3600,
    passwordResetTtlSeconds: 3600,
    authRateLimit: { windowMs: 15 * 60 * 1000, max: e.AUTH_RATE_LIMIT ?? 30 },
    uploadMaxBytes: e.UPLOAD_MAX_BYTES ?? 2 * 1024 * 1024,
    bcryptRounds: 10,
    smtp,
    mailFrom: e.MAIL_FROM ?? 'Tessera <no-reply@tessera.test>',
    logLevel: e.LOG_LEVEL ?? 'info',
  };
}

/** A random secret kept in `<db>.jwt-secret` (mode 600) so tokens survive a restart in development. */
function devJwtSecret(databasePath: string): string {
  const file = `${databasePath}.jwt-secret`;
  if (fs.existsSync(file)) {
    const s = fs.readFileSync(file, 'utf8').trim();
    if (s.length >= 32) return s;
  }
  fs.mkdirSync(path.dirname(file), { recursive: true });
  const secret = crypto.randomBytes(48).toString('base64url');
  fs.writeFileSync(file, secret + '\n', { mode: 0o600 });
  return secret;
}
