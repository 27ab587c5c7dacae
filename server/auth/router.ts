import type { RequestHandler } from 'express';
import { rateLimit } from 'express-rate-limit';
import {
  PasswordResetConfirmBodySchema,
  PasswordResetRequestBodySchema,
  RefreshBodySchema,
  RegisterBodySchema,
  SignInBodySchema,
  SignOutBodySchema,
} from '../../shared/api/auth';
import type { Config } from '../config';
import { AppError } from '../errors/AppError';
import { parseOr400 } from '../errors/validate';
import { anySignedIn, currentUser, PUBLIC, type RouteDef } from './access';
import { toPublicUser, type AuthService } from './service';
import type { DataSource } from 'typeorm';
import { User } from '../entities/User';

/** One limiter per app (tests build many apps), keyed by client address, answering in our error shape. */
function authLimiter(config: Config): RequestHandler {
  return rateLimit({
    windowMs: config.authRateLimit.windowMs,
    limit: config.authRateLimit.max,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    handler: (_req, _res, next) => next(new AppError(429, 'rate_limited', 'too many attempts from this address; wait a few minutes and try again')),
  });
}

export function authRoutes(auth: AuthService, config: Config, ds: DataSource): RouteDef[] {
  // Separate budgets: failed sign-ins must not block a password reset, and the other way round.
  const signInLimiter = authLimiter(config);
  const registerLimiter = authLimiter(config);
  const resetLimiter = authLimiter(config);
  return [
    {
      method: 'post',
      path: '/api/auth/sign-in',
      access: PUBLIC,
      summary: 'SignInBody → SessionResponse (rate-limited)',
      handlers: [
        signInLimiter,
        async (req, res) => {
          const body = parseOr400(SignInBodySchema, req.body, 'sign-in');
          res.json(await auth.signIn(body.email, body.password));
        },
      ],
    },
    {
      method: 'post',
      path: '/api/auth/register',
      access: PUBLIC,
      summary: 'RegisterBody → 201 SessionResponse (rate-limited)',
      handlers: [
        registerLimiter,
        async (req, res) => {
          const body = parseOr400(RegisterBodySchema, req.body, 'register');
          res.status(201).json(await auth.register(body));
        },
      ],
    },
    {
      method: 'post',
      path: '/api/auth/refresh',
      access: PUBLIC,
      summary: 'RefreshBody → SessionResponse (rotates the refresh token)',
      handlers: [
        async (req, res) => {
          const body = parseOr400(RefreshBodySchema, req.body, 'refresh');
          res.json(await auth.refresh(body.refreshToken));
        },
      ],
    },
    {
      method: 'post',
      path: '/api/auth/sign-out',
      access: anySignedIn,
      summary: 'SignOutBody → OkResponse (revokes the refresh token, or all with everywhere)',
      handlers: [
        async (req, res) => {
          const body = parseOr400(SignOutBodySchema, req.body ?? {}, 'sign-out');
          await auth.signOut(currentUser(req).id, body.refreshToken, body.everywhere);
          res.json({ ok: true });
        },
      ],
    },
    {
      method: 'get',
      path: '/api/auth/me',
      access: anySignedIn,
      summary: '→ MeResponse',
      handlers: [
        async (req, res) => {
          const user = await ds.getRepository(User).findOneByOrFail({ id: currentUser(req).id });
          res.json({ user: toPublicUser(user) });
        },
      ],
    },
    {
      method: 'post',
      path: '/api/auth/password-reset',
      access: PUBLIC,
      summary: 'PasswordResetRequestBody → 202 OkResponse; e-mails a one-time code (rate-limited)',
      handlers: [
        resetLimiter,
        async (req, res) => {
          const body = parseOr400(PasswordResetRequestBodySchema, req.body, 'password-reset');
          await auth.requestPasswordReset(body.email);
          res.status(202).json({ ok: true });
        },
      ],
    },
    {
      method: 'post',
      path: '/api/auth/password-reset/confirm',
      access: PUBLIC,
      summary: 'PasswordResetConfirmBody → OkResponse; signs out everywhere (rate-limited)',
      handlers: [
        resetLimiter,
        async (req, res) => {
          const body = parseOr400(PasswordResetConfirmBodySchema, req.body, 'password-reset/confirm');
          await auth.confirmPasswordReset(body.token, body.password);
          res.json({ ok: true });
        },
      ],
    },
  ];
}
