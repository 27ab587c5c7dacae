import type { NextFunction, Request, RequestHandler, Response } from 'express';
import jwt from 'jsonwebtoken';
import type { DataSource } from 'typeorm';
import { RoleSchema, type Role } from '../../shared/user';
import { forbidden, unauthorized } from '../errors/AppError';

/** Who may call a route. There is no default: every route states one of these. */
export type Access = { kind: 'public' } | { kind: 'roles'; roles: readonly Role[] };
export const PUBLIC: Access = { kind: 'public' };
export const ALL_ROLES: readonly Role[] = RoleSchema.options;
export const roles = (...r: Role[]): Access => ({ kind: 'roles', roles: r });
export const anySignedIn: Access = { kind: 'roles', roles: ALL_ROLES };

export interface AuthUser {
  id: string;
  email: string;
  displayName: string;
  role: Role;
}

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    interface Request {
      user?: AuthUser;
    }
  }
}

export type HttpMethod = 'get' | 'post' | 'put' | 'patch' | 'delete';

/** One API route with its access rule and a line for ROUTES.md / the role matrix. */
export interface RouteDef {
  method: HttpMethod;
  path: string;
  access: Access;
  summary: string;
  handlers: RequestHandler[];
}

interface AccessClaims {
  sub: string;
  role: Role;
  typ: 'access';
  exp: number;
}

/**
 * Tokens already verified, by secret and token: jsonwebtoken's verify costs about a third of a
 * millisecond, which dominated small requests such as an up-to-date sync pull. A signature stays
 * valid, so only the expiry is re-checked on a hit. Bounded: cleared when full.
 */
const verified = new Map<string, AccessClaims>();
const MAX_VERIFIED = 10_000;

function verifyAccessToken(token: string, secret: string): AccessClaims {
  const key = `${secret}\u0000${token}`;
  const hit = verified.get(key);
  if (hit) {
    if (hit.exp * 1000 > Date.now()) return hit;
    verified.delete(key);
    throw unauthorized('access token expired: refresh the session or sign in again');
  }
  let claims: AccessClaims;
  try {
    claims = jwt.verify(token, secret, { algorithms: ['HS256'], issuer: 'tessera' }) as unknown as AccessClaims;
  } catch (e) {
    if (e instanceof jwt.TokenExpiredError) throw unauthorized('access token expired: refresh the session or sign in again');
    throw unauthorized('access token invalid: sign in again');
  }
  if (claims.typ !== 'access' || typeof claims.sub !== 'string' || typeof claims.exp !== 'number') throw unauthorized('access token invalid: sign in again');
  if (verified.size >= MAX_VERIFIED) verified.clear();
  verified.set(key, claims);
  return claims;
}

export function signAccessToken(user: AuthUser, secret: string, ttlSeconds: number): string {
  return jwt.sign({ role: user.role, typ: 'access' }, secret, { subject: user.id, expiresIn: ttlSeconds, algorithm: 'HS256', issuer: 'tessera' });
}

/**
 * Checks the bearer token, then reloads the account so a disabled account or a changed role takes
 * effect at once rather than when the token runs out.
 */
export function requireAccess(access: Access, ds: DataSource, secret: string): RequestHandler {
  if (access.kind === 'public') return (_req, _res, next) => next();
  const allowed = new Set(access.roles);
  return async (req: Request, _res: Response, next: NextFunction) => {
    const header = req.headers.authorization;
    if (!header || !/^Bearer\s+\S+$/i.test(header)) throw unauthorized();
    const token = header.replace(/^Bearer\s+/i, '');
    const claims = verifyAccessToken(token, secret);
    // Plain SQL: this runs on every authenticated request and needs five columns, not an entity.
    const [user]: { id: string; email: string; display_name: string; role: Role; disabled: number }[] = await ds.query(
      'SELECT "id", "email", "display_name", "role", "disabled" FROM "user" WHERE "id" = ?',
      [claims.sub],
    );
    if (!user || user.disabled) throw unauthorized('account not found or disabled');
    req.user = { id: user.id, email: user.email, displayName: user.display_name, role: user.role };
    if (!allowed.has(user.role)) throw forbidden(`role ${user.role} may not do this (allowed: ${[...allowed].join(', ')})`);
    next();
  };
}

/** The signed-in user of a route whose access rule demanded one. */
export function currentUser(req: Request): AuthUser {
  if (!req.user) throw unauthorized();
  return req.user;
}
