import { z } from 'zod';
import { LibraryEntrySchema } from '../libraryEntry';
import { SubmissionCreateBodySchema, SubmissionSummarySchema } from './submissions';

/**
 * GET /api/sync/changes?cursor=&limit= (every role): approved entries and tombstones changed
 * after `cursor`, oldest change first. No cursor = from the beginning (a new client gets everything).
 * Store `nextCursor` and send it next time; keep pulling while `hasMore`. Cursors are opaque.
 */
export const SyncChangesQuerySchema = z.object({
  cursor: z.string().max(200).optional(),
  limit: z.coerce.number().int().min(1).max(1000).default(200),
});
export type SyncChangesQuery = z.infer<typeof SyncChangesQuerySchema>;

/** One changed entry: its latest approved revision, or a tombstone (`retired: true`, entry.retired true). */
export const SyncChangeSchema = z.object({
  entryId: z.string(),
  revision: z.number().int().positive(),
  retired: z.boolean(),
  entry: LibraryEntrySchema,
});
export type SyncChange = z.infer<typeof SyncChangeSchema>;

export const SyncChangesResponseSchema = z.object({
  changes: z.array(SyncChangeSchema),
  nextCursor: z.string(),
  hasMore: z.boolean(),
});
export type SyncChangesResponse = z.infer<typeof SyncChangesResponseSchema>;

/** One pushed submission: like POST /api/submissions but the client-made UUID is required. */
export const SyncPushItemSchema = SubmissionCreateBodySchema.extend({ id: z.uuid() });
export type SyncPushItem = z.infer<typeof SyncPushItemSchema>;

/**
 * POST /api/sync/push (student, analyst, curator): up to 100 submissions made offline. Safe to
 * repeat: an id already stored by you comes back as `duplicate`, never stored twice.
 * Items are judged one by one; a bad item does not stop the others.
 */
export const SyncPushBodySchema = z.object({ submissions: z.array(z.unknown()).min(1).max(100) });
export type SyncPushBody = z.infer<typeof SyncPushBodySchema>;

/**
 * created   — stored now;
 * duplicate — this id was already stored (by you): nothing changed;
 * rejected  — invalid: `error.details.issues` names the fields; nothing stored;
 * conflict  — the id belongs to someone else's submission, or the entry id clashes with the library.
 */
export const SyncPushOutcomeSchema = z.enum(['created', 'duplicate', 'rejected', 'conflict']);
export type SyncPushOutcome = z.infer<typeof SyncPushOutcomeSchema>;

export const SyncPushResultSchema = z.object({
  index: z.number().int().nonnegative().describe('position in the pushed array'),
  id: z.string().nullable().describe('the item id, null if it had none'),
  outcome: SyncPushOutcomeSchema,
  submission: SubmissionSummarySchema.optional(),
  error: z
    .object({ code: z.string(), message: z.string(), issues: z.array(z.object({ field: z.string().optional(), line: z.number().optional(), message: z.string() })) })
    .optional(),
});
export type SyncPushResult = z.infer<typeof SyncPushResultSchema>;

export const SyncPushResponseSchema = z.object({ results: z.array(SyncPushResultSchema) });
export type SyncPushResponse = z.infer<typeof SyncPushResponseSchema>;
