import { SyncChangesResponseSchema, SyncPushResponseSchema } from '../shared/api/sync';
import { SubmissionListResponseSchema } from '../shared/api/submissions';
import { LibraryListResponseSchema } from '../shared/api/library';
import type { Role } from '../shared/user';
import type { RequestOptions } from './api';
import { ApiError, OfflineError } from './api';
import { localLibraryRetainOnly, localLibraryUpsert } from '../localdb/library';
import { snapshotLoadIfEmpty } from '../localdb/snapshot';
import { outboxList, outboxPending, outboxUpdate, type OutboxItem } from '../localdb/outbox';
import { SubmissionResponseSchema } from '../shared/api/submissions';
import { settingGet, settingSet } from '../localdb/settings';

export type Request = <T>(path: string, options?: Omit<RequestOptions, 'token'>) => Promise<T>;

export type SyncPhase = 'pushing' | 'pulling' | 'checking';

export interface SyncProgress {
  phase: SyncPhase;
  pushed: number;
  pulled: number;
}

export interface SyncOutcome {
  pushed: number;
  refused: number;
  pulled: number;
  decided: number;
  finishedAt: string;
}

export const SYNC_CURSOR_KEY = 'sync.cursor';
export const SYNC_LAST_KEY = 'sync.lastAt';
const PAGE = 200;

/** Roles that may send submissions (admins curate accounts, not entries). */
export function roleCanSubmit(role: Role): boolean {
  return role === 'student' || role === 'analyst' || role === 'curator';
}

/**
 * One sync round: push the outbox, pull library changes since the stored cursor, then read back
 * what curators decided about our submissions. Every step writes to the device database before
 * the next network call, so a connection lost halfway loses nothing: pending items stay pending
 * (the server treats a repeated client UUID as a duplicate) and the cursor only moves after the
 * page it covers has been stored.
 */
export async function syncRun(request: Request, user: { id: string; role: Role }, onProgress: (p: SyncProgress) => void): Promise<SyncOutcome> {
  const role = user.role;
  await snapshotLoadIfEmpty();
  const progress: SyncProgress = { phase: 'pushing', pushed: 0, pulled: 0 };
  let refused = 0;
  let decided = 0;

  if (roleCanSubmit(role)) {
    onProgress({ ...progress });
    const all = await outboxPending(user.id);
    const pending = all.filter((i) => i.kind === 'submission');
    for (const item of all.filter((i) => i.kind === 'upload')) {
      if (await uploadPush(request, item)) progress.pushed += 1;
      else refused += 1;
      onProgress({ ...progress });
    }
    for (let i = 0; i < pending.length; i += 50) {
      const batch = pending.slice(i, i + 50);
      const res = SyncPushResponseSchema.parse(
        await request<unknown>('/api/sync/push', { method: 'POST', body: { submissions: batch.map((item) => ({ ...(item.body as object), id: item.id })) } }),
      );
      for (const r of res.results) {
        const item = batch[r.index];
        if (!item) continue;
        if (r.outcome === 'created' || r.outcome === 'duplicate') {
          await outboxUpdate(item.id, { status: r.submission?.status === 'pending' || !r.submission ? 'sent' : r.submission.status, serverId: r.submission?.id ?? item.id, message: null });
          progress.pushed += 1;
        } else {
          const why = r.error ? [r.error.message, ...r.error.issues.map((x) => (x.field ? `${x.field}: ${x.message}` : x.message))].join(' · ') : r.outcome;
          await outboxUpdate(item.id, { status: 'failed', message: r.outcome === 'conflict' ? `Conflict: ${why}` : `Refused: ${why}` });
          refused += 1;
        }
      }
      onProgress({ ...progress });
    }
  }

  progress.phase = 'pulling';
  onProgress({ ...progress });
  let cursor = await settingGet(SYNC_CURSOR_KEY);
  // A pull from the very beginning sees every entry the server knows; entries of the shipped
  // snapshot it never mentions are not in the shared library and go once the pass completes.
  const seen: Set<string> | null = cursor ? null : new Set();
  try {
    for (;;) {
      const qs = new URLSearchParams({ limit: String(PAGE), ...(cursor ? { cursor } : {}) });
      const page = SyncChangesResponseSchema.parse(await request<unknown>(`/api/sync/changes?${qs}`));
      await localLibraryUpsert(page.changes.map((c) => (c.retired ? { ...c.entry, retired: true } : c.entry)));
      for (const c of page.changes) seen?.add(c.entryId);
      cursor = page.nextCursor;
      await settingSet(SYNC_CURSOR_KEY, cursor);
      progress.pulled += page.changes.length;
      onProgress({ ...progress });
      if (!page.hasMore || page.changes.length === 0) break;
    }
    if (seen && seen.size > 0) await localLibraryRetainOnly(seen);
  } catch (err) {
    // A server without the sync routes yet: take the whole approved list instead.
    if (!(err instanceof ApiError && err.status === 404)) throw err;
    const all = LibraryListResponseSchema.parse(await request<unknown>('/api/library'));
    await localLibraryUpsert(all.entries);
    progress.pulled += all.entries.length;
  }

  if (roleCanSubmit(role)) {
    progress.phase = 'checking';
    onProgress({ ...progress });
    const mine = await outboxList(user.id);
    if (mine.some((m) => m.status === 'sent')) {
      const res = SubmissionListResponseSchema.parse(await request<unknown>('/api/submissions?limit=200'));
      const byId = new Map(res.items.map((s) => [s.id, s]));
      for (const item of mine) {
        if (item.status !== 'sent') continue;
        const s = byId.get(item.serverId ?? item.id);
        if (s && s.status !== 'pending') {
          await outboxUpdate(item.id, { status: s.status, message: s.decisionComment });
          decided += 1;
        }
      }
    }
  }

  const finishedAt = new Date().toISOString();
  await settingSet(SYNC_LAST_KEY, finishedAt);
  return { pushed: progress.pushed, refused, pulled: progress.pulled, decided, finishedAt };
}

export function isOfflineError(err: unknown): boolean {
  return err instanceof OfflineError;
}

export interface UploadBody {
  fileName: string;
  content: string;
  meta: Record<string, unknown>;
}

/**
 * A file submission goes as multipart form data. The item id travels in meta.id, so a repeat
 * after a lost answer returns the stored submission instead of a second one. Offline errors
 * propagate (the item stays pending); a refusal is recorded on the item.
 */
async function uploadPush(request: Request, item: OutboxItem): Promise<boolean> {
  const body = item.body as UploadBody;
  const form = new FormData();
  form.append('meta', JSON.stringify({ ...body.meta, id: item.id }));
  form.append('file', new Blob([body.content], { type: 'text/plain' }), body.fileName);
  try {
    const res = SubmissionResponseSchema.parse(await request<unknown>('/api/submissions/upload', { method: 'POST', body: form }));
    await outboxUpdate(item.id, { status: res.submission.status === 'pending' ? 'sent' : res.submission.status, serverId: res.submission.id, message: null });
    return true;
  } catch (err) {
    if (!(err instanceof ApiError) || err.status === 401) throw err;
    const issues = (err.details as { issues?: Array<{ line?: number; field?: string; message: string }> } | undefined)?.issues ?? [];
    const where = issues.map((x) => `${x.line !== undefined ? `line ${x.line}` : (x.field ?? '')}: ${x.message}`).join(' · ');
    await outboxUpdate(item.id, { status: 'failed', message: `Refused: ${err.message}${where ? ` · ${where}` : ''}` });
    return false;
  }
}
