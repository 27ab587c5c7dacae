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
