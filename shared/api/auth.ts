import { z } from 'zod';
import { PublicUserSchema } from '../user';

export const SignInBodySchema = z.object({
  email: z.string().trim().toLowerCase().email(),
  password: z.string().min(1).max(200),
});
export type SignInBody = z.infer<typeof SignInBodySchema>;

export const SessionResponseSchema = z.object({
  accessToken: z.string(),
  refreshToken: z.string(),
  user: PublicUserSchema,
});
export type SessionResponse = z.infer<typeof SessionResponseSchema>;

/**
 * POST /api/auth/register (public) → 201 SessionResponse. New accounts are students or analysts;
 * curator and admin roles are given by an admin.
 */
export const RegisterBodySchema = z.object({
  email: z.string().trim().toLowerCase().email(),
  password: z.string().min(10, 'password must be at least 10 characters').max(200),
  displayName: z.string().trim().min(1).max(100),
  role: z.enum(['student', 'analyst']).default('student'),
});
export type RegisterBody = z.infer<typeof RegisterBodySchema>;

/** POST /api/auth/refresh (public) → SessionResponse with a new pair; the old refresh token stops working. */
export const RefreshBodySchema = z.object({ refreshToken: z.string().min(20).max(200) });
export type RefreshBody = z.infer<typeof RefreshBodySchema>;

/** POST /api/auth/sign-out (signed in) → OkResponse; revokes the given refresh token (or all with `everywhere`). */
export const SignOutBodySchema = z.object({
  refreshToken: z.string().min(20).max(200).optional(),
  everywhere: z.boolean().default(false),
});
export type SignOutBody = z.infer<typeof SignOutBodySchema>;

/** POST /api/auth/password-reset (public) → 202 OkResponse whether or not the address has an account. */
export const PasswordResetRequestBodySchema = z.object({ email: z.string().trim().toLowerCase().email() });
export type PasswordResetRequestBody = z.infer<typeof PasswordResetRequestBodySchema>;

/** POST /api/auth/password-reset/confirm (public) → OkResponse; signs the account out everywhere. */
export const PasswordResetConfirmBodySchema = z.object({
  token: z.string().min(20).max(200),
  password: z.string().min(10, 'password must be at least 10 characters').max(200),
});
export type PasswordResetConfirmBody = z.infer<typeof PasswordResetConfirmBodySchema>;

/** GET /api/auth/me (signed in) → the account behind the access token. */
export const MeResponseSchema = z.object({ user: PublicUserSchema });
export type MeResponse = z.infer<typeof MeResponseSchema>;

export const OkResponseSchema = z.object({ ok: z.literal(true) });
export type OkResponse = z.infer<typeof OkResponseSchema>;
