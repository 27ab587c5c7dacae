import { z } from 'zod';
import { LibraryEntrySchema } from '../libraryEntry';
import { SubmissionKindSchema, SubmissionStatusSchema, SubmissionSummarySchema, SubmissionViewSchema, SimilarEntrySchema } from './submissions';

/** GET /api/review/queue (curator) query string. Defaults: status pending, sort oldest, limit 50. */
export const ReviewQueueQuerySchema = z.object({
  status: z.union([SubmissionStatusSchema, z.literal('all')]).default('pending'),
  kind: SubmissionKindSchema.optional(),
  studentWork: z.enum(['true', 'false']).transform((s) => s === 'true').optional(),
  q: z.string().trim().min(1).max(100).optional().describe('text in the name or entry id'),
  sort: z.enum(['oldest', 'newest', 'name', 'problems']).default('oldest').describe('problems: most problems first'),
  limit: z.coerce.number().int().min(1).max(100).default(50),
  offset: z.coerce.number().int().min(0).max(1_000_000).default(0),
});
export type ReviewQueueQuery = z.infer<typeof ReviewQueueQuerySchema>;

export const ReviewQueueResponseSchema = z.object({ items: z.array(SubmissionSummarySchema), total: z.number().int().nonnegative() });
export type ReviewQueueResponse = z.infer<typeof ReviewQueueResponseSchema>;

/**
 * GET /api/review/submissions/:id (curator): the submission with checks re-run against today's
 * library, beside the nearest existing entry and (for a change) the current revision it replaces.
 */
export const ReviewDetailResponseSchema = z.object({
  submission: SubmissionViewSchema,
  nearest: z.object({ similarity: SimilarEntrySchema, entry: LibraryEntrySchema }).nullable(),
  current: LibraryEntrySchema.nullable().describe('for a change: the revision it would replace'),
});
export type ReviewDetailResponse = z.infer<typeof ReviewDetailResponseSchema>;

export const DecisionSchema = z.enum(['approve', 'reject', 'request_changes']);
export type Decision = z.infer<typeof DecisionSchema>;

/**
 * POST /api/review/submissions/:id/decision (curator). `version` is the submission version the
 * curator saw; if someone decided first the answer is 409 `conflict` with
 * `details.submission` (SubmissionView) showing that decision. A comment is required to reject or
 * ask for changes. → DecisionResponse (entry: the new revision when approved).
 */
export const DecisionBodySchema = z
  .object({
    decision: DecisionSchema,
    comment: z.string().trim().max(2000).default(''),
    version: z.number().int().positive(),
  })
  .superRefine((b, ctx) => {
    if (b.decision !== 'approve' && b.comment.length === 0) ctx.addIssue({ code: 'custom', path: ['comment'], message: `a comment is required to ${b.decision === 'reject' ? 'reject' : 'ask for changes'}` });
  });
export type DecisionBody = z.infer<typeof DecisionBodySchema>;

export const DecisionResponseSchema = z.object({ submission: SubmissionViewSchema, entry: LibraryEntrySchema.nullable() });
export type DecisionResponse = z.infer<typeof DecisionResponseSchema>;

/**
 * POST /api/review/entries/:id/retire (curator): `revision` is the current revision the curator
 * saw (409 if it moved). The entry becomes a tombstone that sync carries. → LibraryEntryResponse.
 */
export const RetireBodySchema = z.object({
  revision: z.number().int().positive(),
  comment: z.string().trim().min(1, 'say why the entry is retired').max(2000),
});
export type RetireBody = z.infer<typeof RetireBodySchema>;
