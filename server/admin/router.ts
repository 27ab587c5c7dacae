import { z } from 'zod';
import type { DataSource } from 'typeorm';
import { AdminUserPatchBodySchema, AuditQuerySchema, PageQuerySchema, type AdminUser, type AuditEvent, type OutboxMessage } from '../../shared/api/admin';
import { currentUser, PUBLIC, roles, type RouteDef } from '../auth/access';
import { revokeAllIn } from '../auth/service';
import { tx } from '../data-source';
import { AuditLog } from '../entities/AuditLog';
import { MailMessage } from '../entities/MailMessage';
import { User } from '../entities/User';
import { AppError, notFound } from '../errors/AppError';
import { parseOr400 } from '../errors/validate';
import { audit } from './audit';
import { In } from 'typeorm';

const IdParams = z.object({ id: z.uuid('id must be a UUID') });

const toAdminUser = (u: User): AdminUser => ({ id: u.id, email: u.email, displayName: u.displayName, role: u.role, demo: u.demo, disabled: u.disabled, createdAt: u.createdAt.toISOString() });

export function adminRoutes(ds: DataSource, version: string): RouteDef[] {
  return [
    {
      method: 'get',
      path: '/api/health',
      access: PUBLIC,
      summary: '→ HealthResponse',
      handlers: [(_req, res) => void res.json({ ok: true, version })],
    },
    {
      method: 'get',
      path: '/api/admin/users',
      access: roles('admin'),
      summary: '→ AdminUserListResponse',
      handlers: [async (_req, res) => res.json({ users: (await ds.getRepository(User).find({ order: { email: 'ASC' } })).map(toAdminUser) })],
    },
    {
      method: 'patch',
      path: '/api/admin/users/:id',
      access: roles('admin'),
      summary: 'AdminUserPatchBody → { user: AdminUser }; disabling signs the account out everywhere',
      handlers: [
        async (req, res) => {
          const { id } = parseOr400(IdParams, req.params, 'path');
          const body = parseOr400(AdminUserPatchBodySchema, req.body, 'user');
          const me = currentUser(req);
          if (id === me.id && ((body.role && body.role !== 'admin') || body.disabled)) {
            throw new AppError(409, 'self_lockout', 'admins cannot take the admin role from, or disable, their own account; ask another admin', { issues: [{ field: body.disabled ? 'disabled' : 'role', message: 'not on your own account' }] });
          }
          const user = await tx(ds, async (m) => {
            const u = await m.getRepository(User).findOneBy({ id });
            if (!u) return null;
            const before = { role: u.role, disabled: u.disabled, displayName: u.displayName };
            Object.assign(u, body, { updatedAt: new Date() });
            await m.getRepository(User).update({ id }, { role: u.role, disabled: u.disabled, displayName: u.displayName, updatedAt: u.updatedAt });
            if (body.disabled) await revokeAllIn(m, id);
            await audit(m, me.id, 'account.update', 'user', id, { before, after: { role: u.role, disabled: u.disabled, displayName: u.displayName } });
            return u;
          });
          if (!user) throw notFound(`no account ${id}`);
          res.json({ user: toAdminUser(user) });
        },
      ],
    },
    {
      method: 'get',
      path: '/api/admin/outbox',
      access: roles('admin'),
      summary: '?limit&offset → OutboxResponse: every message sent, newest first',
      handlers: [
        async (req, res) => {
          const q = parseOr400(PageQuerySchema, req.query, 'query');
          const [rows, total] = await ds.getRepository(MailMessage).findAndCount({ order: { createdAt: 'DESC', id: 'ASC' }, take: q.limit, skip: q.offset });
          const messages: OutboxMessage[] = rows.map((r) => ({
            id: r.id,
            kind: r.kind as OutboxMessage['kind'],
            to: r.toAddress,
            subject: r.subject,
            text: r.bodyText,
            transport: r.transport,
            status: r.status,
            error: r.error,
            createdAt: r.createdAt.toISOString(),
          }));
          res.json({ messages, total });
        },
      ],
    },
    {
      method: 'get',
      path: '/api/admin/audit',
      access: roles('admin', 'curator'),
      summary: '?subjectType&subjectId&limit&offset → AuditResponse, newest first',
      handlers: [
        async (req, res) => {
          const q = parseOr400(AuditQuerySchema, req.query, 'query');
          const [rows, total] = await ds.getRepository(AuditLog).findAndCount({
            where: { ...(q.subjectType ? { subjectType: q.subjectType } : {}), ...(q.subjectId ? { subjectId: q.subjectId } : {}) },
            order: { id: 'DESC' },
            take: q.limit,
            skip: q.offset,
          });
          const actorIds = [...new Set(rows.map((r) => r.actorId).filter((x): x is string => !!x))];
          const actors = actorIds.length ? await ds.getRepository(User).find({ where: { id: In(actorIds) }, select: { id: true, displayName: true } }) : [];
          const names = new Map(actors.map((a) => [a.id, a.displayName]));
          const events: AuditEvent[] = rows.map((r) => ({
            id: r.id,
            at: r.at.toISOString(),
            actor: r.actorId ? { id: r.actorId, displayName: names.get(r.actorId) ?? '(removed account)' } : null,
            action: r.action,
            subjectType: r.subjectType,
            subjectId: r.subjectId,
            details: JSON.parse(r.details) as Record<string, unknown>,
          }));
          res.json({ events, total });
        },
      ],
    },
  ];
}
