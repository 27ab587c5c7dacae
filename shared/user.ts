import { z } from 'zod';

export const RoleSchema = z.enum(['student', 'analyst', 'curator', 'admin']);
export type Role = z.infer<typeof RoleSchema>;

export const PublicUserSchema = z.object({
  id: z.string(),
  email: z.string().email(),
  displayName: z.string(),
  role: RoleSchema,
});
export type PublicUser = z.infer<typeof PublicUserSchema>;
