import type { EntityManager } from 'typeorm';
import { AuditLog } from '../entities/AuditLog';

/** Appends to the audit log inside the caller's transaction, so a decision and its record commit together. */
export async function audit(m: EntityManager, actorId: string | null, action: string, subjectType: string, subjectId: string, details: Record<string, unknown>): Promise<void> {
  await m.getRepository(AuditLog).insert(
    Object.assign(new AuditLog(), { at: new Date(), actorId, action, subjectType, subjectId, details: JSON.stringify(details) }),
  );
}
