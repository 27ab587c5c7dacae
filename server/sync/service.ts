import crypto from 'node:crypto';
import type { DataSource } from 'typeorm';
import { exclusive } from '../data-source';
import { badRequest } from '../errors/AppError';

/** Cursors wrap the library change counter; clients must treat them as opaque strings. */
export function cursorEncode(seq: number): string {
  return Buffer.from(`c1:${seq}`, 'utf8').toString('base64url');
}

export function cursorDecode(cursor: string | undefined): number {
  if (cursor === undefined || cursor === '') return 0;
  const m = /^c1:(\d{1,15})$/.exec(/^[A-Za-z0-9_-]+$/.test(cursor) ? Buffer.from(cursor, 'base64url').toString('utf8') : '');
  if (!m) throw badRequest('cursor: not a cursor this server issued; start again without one', [{ field: 'cursor', message: 'unknown cursor' }]);
  return Number(m[1]);
}

interface PageRow {
  entry_id: string;
  revision: number;
  status: 'current' | 'retired';
  body: string;
  seq: number;
}

/** Rendered pages for the library as of one change number; dropped as soon as the library changes. */
/** A rendered page: the JSON bytes and their strong ETag, both computed once. */
export interface RenderedPage {
  body: Buffer;
  etag: string;
}

const pageCache = new WeakMap<DataSource, { seq: number; pages: Map<string, RenderedPage> }>();
const MAX_CACHED_PAGES = 64;

/**
 * One indexed range query per page: visible revisions (current, or retired = tombstone) whose
 * change number is past the cursor, in change order. An entry changed twice since the cursor
 * appears once, at its latest state, because superseded revisions are not visible.
 *
 * Returns the SyncChangesResponse as JSON bytes with an ETag (a client sending If-None-Match gets 304). The stored body already is the entry's JSON
 * (without revision/retired), so it is spliced in rather than parsed and re-serialised, and the
 * text of a page is kept until the library next changes: many clients pull the same pages.
 */
export async function syncChangesPage(ds: DataSource, cursor: string | undefined, limit: number): Promise<RenderedPage> {
  const after = cursorDecode(cursor);
  return exclusive(ds, () => renderPage(ds, after, limit));
}

async function renderPage(ds: DataSource, after: number, limit: number): Promise<RenderedPage> {
  const [{ s }]: { s: number | null }[] = await ds.query('SELECT MAX("seq") AS s FROM "library_entry"');
  const seq = s ?? 0;
  let cache = pageCache.get(ds);
  if (!cache || cache.seq !== seq) {
    cache = { seq, pages: new Map() };
    pageCache.set(ds, cache);
  }
  const key = `${after}:${limit}`;
  const hit = cache.pages.get(key);
  if (hit !== undefined) return hit;

  const rows: PageRow[] = await ds.query(
    `SELECT "entry_id", "revision", "status", "body", "seq" FROM "library_entry"
     WHERE "status" IN ('current', 'retired') AND "seq" > ? ORDER BY "seq" ASC LIMIT ?`,
    [after, limit + 1],
  );
  const page = rows.slice(0, limit);
  const last = page.length ? page[page.length - 1].seq : after;
  const changes = page.map((r) => {
    const retired = r.status === 'retired';
    const head = `{"revision":${r.revision},${retired ? '"retired":true,' : ''}`;
    const entry = r.body === '{}' ? head.slice(0, -1) + '}' : head + r.body.slice(1);
    return `{"entryId":${JSON.stringify(r.entry_id)},"revision":${r.revision},"retired":${retired},"entry":${entry}}`;
  });
  const json = `{"changes":[${changes.join(',')}],"nextCursor":${JSON.stringify(cursorEncode(last))},"hasMore":${rows.length > limit}}`;
  const body = Buffer.from(json, 'utf8');
  const rendered = { body, etag: `"${crypto.createHash('sha1').update(body).digest('base64url')}"` };
  if (cache.pages.size >= MAX_CACHED_PAGES) cache.pages.delete(cache.pages.keys().next().value!);
  cache.pages.set(key, rendered);
  return rendered;
}
