import { z } from 'zod';
import { RoleSchema } from '../user';

/** An account as admins see it. */
export const AdminUserSchema = z.object({
  id: z.string(),
  email: z.string(),
  displayName: z.string(),
  role: RoleSchema,
  demo: z.boolean(),
  disabled: z.boolean(),
  createdAt: z.string(),
});
export type AdminUser = z.infer<typeof AdminUserSchema>;

/** GET /api/admin/users (admin) → every account, by e-mail. */
export const AdminUserListResponseSchema = z.object({ users: z.array(AdminUserSchema) });
export type AdminUserListResponse = z.infer<typeof AdminUserListResponseSchema>;

/**
 * PATCH /api/admin/users/:id (admin) → { user: AdminUser }. Disabling signs the account out
 * everywhere. Admins cannot take the admin role from, or disable, themselves (no lock-out).
 */
export const AdminUserPatchBodySchema = z
  .object({
    role: RoleSchema.optional(),
    disabled: z.boolean().optional(),
    displayName: z.string().trim().min(1).max(100).optional(),
  })
  .refine((b) => b.role !== undefined || b.disabled !== undefined || b.displayName !== undefined, { message: 'give at least one of role, disabled, displayName' });
export type AdminUserPatchBody = z.infer<typeof AdminUserPatchBodySchema>;

export const PageQuerySchema = z.object({
  limit: z.coerce.number().int().min(1).max(200).default(50),
  offset: z.coerce.number().int().min(0).max(1_000_000).default(0),
});

/** GET /api/admin/outbox?limit=&offset= (admin) → messages the server sent, newest first. */
export const OutboxMessageSchema = z.object({
  id: z.string(),
  kind: z.enum(['new_submission', 'decision', 'password_reset']),
  to: z.string(),
  subject: z.string(),
  text: z.string().nullable().describe('full text with the local outbox; null when sent through SMTP'),
  transport: z.enum(['outbox', 'smtp']),
  status: z.enum(['stored', 'sent', 'failed']),
  error: z.string().nullable(),
  createdAt: z.string(),
});
export type OutboxMessage = z.infer<typeof OutboxMessageSchema>;
export const OutboxResponseSchema = z.object({ messages: z.array(OutboxMessageSchema), total: z.number().int().nonnegative() });
export type OutboxResponse = z.infer<typeof OutboxResponseSchema>;

/** GET /api/admin/audit?subjectType=&subjectId=&limit=&offset= (admin, curator) → newest first. */
export const AuditQuerySchema = PageQuerySchema.extend({
  subjectType: z.enum(['submission', 'entry', 'user']).optional(),
  subjectId: z.string().max(80).optional(),
});
export const AuditEventSchema = z.object({
  id: z.number().int(),
  at: z.string(),
  actor: z.object({ id: z.string(), displayName: z.string() }).nullable(),
  action: z.string().describe('e.g. submission.approve, entry.retire, account.role'),
  subjectType: z.string(),
  subjectId: z.string(),
  details: z.record(z.string(), z.unknown()),
});
export type AuditEvent = z.infer<typeof AuditEventSchema>;
export const AuditResponseSchema = z.object({ events: z.array(AuditEventSchema), total: z.number().int().nonnegative() });
export type AuditResponse = z.infer<typeof AuditResponseSchema>;

/** GET /api/health (public) → liveness for scripts and the app's online check. */
export const HealthResponseSchema = z.object({ ok: z.literal(true), version: z.string() });
export type HealthResponse = z.infer<typeof HealthResponseSchema>;
