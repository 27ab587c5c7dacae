import { getLocalDb } from './dataSource';
import { LocalOutboxItem } from './entities/LocalOutboxItem';
import { withWriteLock } from './writeLock';

export type OutboxStatus = 'pending' | 'sent' | 'approved' | 'rejected' | 'changes_requested' | 'failed';

export interface OutboxItem {
  id: string;
  /** submission: a JSON entry; upload: a peak-list/JCAMP file with its metadata. */
  kind: 'submission' | 'upload';
  status: OutboxStatus;
  title: string;
  body: unknown;
  serverId: string | null;
  message: string | null;
  createdAt: string;
  updatedAt: string;
}

function toItem(r: LocalOutboxItem): OutboxItem {
  return { id: r.id, kind: r.kind === 'upload' ? 'upload' : 'submission', status: r.status as OutboxStatus, title: r.title, body: JSON.parse(r.body), serverId: r.serverId, message: r.message, createdAt: r.createdAt, updatedAt: r.updatedAt };
}

/** Queue work for the server. Written before any network call, so nothing is lost offline. */
export async function outboxAdd(item: { id: string; userId: string; kind?: OutboxItem['kind']; title: string; body: unknown }): Promise<void> {
  const db = await getLocalDb();
  const repo = db.getRepository(LocalOutboxItem);
  const now = new Date().toISOString();
  const row = repo.create({ id: item.id, userId: item.userId, kind: item.kind ?? 'submission', status: 'pending', title: item.title, body: JSON.stringify(item.body), serverId: null, message: null, createdAt: now, updatedAt: now });
  await withWriteLock(() => repo.save(row));
}

/** One account's items, newest first. */
export async function outboxList(userId: string): Promise<OutboxItem[]> {
  const db = await getLocalDb();
  const rows = await db.getRepository(LocalOutboxItem).find({ where: { userId }, order: { createdAt: 'DESC' } });
  return rows.map(toItem);
}

export async function outboxPending(userId: string): Promise<OutboxItem[]> {
  const db = await getLocalDb();
  const rows = await db.getRepository(LocalOutboxItem).find({ where: { status: 'pending', userId }, order: { createdAt: 'ASC' } });
  return rows.map(toItem);
}

export async function outboxUpdate(id: string, patch: { status?: OutboxStatus; serverId?: string | null; message?: string | null }): Promise<void> {
  const db = await getLocalDb();
  await withWriteLock(() => db.getRepository(LocalOutboxItem).update({ id }, { ...patch, updatedAt: new Date().toISOString() }));
}
