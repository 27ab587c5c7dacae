import { z } from 'zod';
import { LibraryEntrySchema } from '../libraryEntry';

/** new = an entry id the library does not have yet; change = a new revision of an existing entry. */
export const SubmissionKindSchema = z.enum(['new', 'change']);
export type SubmissionKind = z.infer<typeof SubmissionKindSchema>;

/** How the proposed entry reached the server. */
export const SubmissionSourceSchema = z.enum(['json', 'peaklist', 'jcamp']);
export type SubmissionSource = z.infer<typeof SubmissionSourceSchema>;

/**
 * pending           — waiting in the curator queue;
 * approved          — became a library revision;
 * rejected          — closed by a curator with a comment;
 * changes_requested — sent back; the submitter may submit again (as a new submission).
 */
export const SubmissionStatusSchema = z.enum(['pending', 'approved', 'rejected', 'changes_requested']);
export type SubmissionStatus = z.infer<typeof SubmissionStatusSchema>;

/**
 * Every shape of the submission routes. A submission proposes a whole LibraryEntry: `kind: "new"`
 * for an id the library never held, `kind: "change"` for the next revision of a current entry.
 * Students' submissions are always marked `studentWork`.
 */
const note = z.string().trim().max(2000).optional().describe('message to the curator');

/** POST /api/submissions (student, analyst, curator) → 201 SubmissionResponse (200 when `id` was already stored by you). */
export const SubmissionCreateBodySchema = z.object({
  id: z.uuid().optional().describe('client-made UUID; sending the same one again returns the stored submission'),
  kind: SubmissionKindSchema.default('new'),
  baseRevision: z.number().int().positive().optional().describe('for a change: the revision it was edited from'),
  entry: LibraryEntrySchema,
  note,
});
export type SubmissionCreateBody = z.infer<typeof SubmissionCreateBodySchema>;
export type SubmissionCreateInput = z.input<typeof SubmissionCreateBodySchema>;

/** Everything but the signals, which the uploaded file provides. */
export const UploadEntryMetaSchema = LibraryEntrySchema.omit({ signals: true, revision: true, retired: true });

/**
 * POST /api/submissions/upload (student, analyst, curator), multipart/form-data:
 *   file — a 1H peak list (.csv .tsv .txt) or a JCAMP-DX spectrum/peak table (.jdx .dx .jcamp);
 *   meta — JSON text of this schema.
 * Each peak of the file becomes a singlet of the proposed entry; its nuclei count is its share of
 * the summed intensity scaled to `totalNuclei` (default: the smallest peak counts 1), so the curator
 * sees the formula check flag counts that do not add up. → 201 SubmissionResponse.
 * Errors name the line of the file (`details.issues[].line`) or the meta field.
 */
export const UploadMetaSchema = z.object({
  id: z.uuid().optional(),
  kind: SubmissionKindSchema.default('new'),
  baseRevision: z.number().int().positive().optional(),
  totalNuclei: z.number().int().positive().max(500).optional().describe('1H nuclei the peaks share; default: smallest peak = 1'),
  entry: UploadEntryMetaSchema,
  note,
});
export type UploadMeta = z.infer<typeof UploadMetaSchema>;

export const CurationCheckNameSchema = z.enum(['schema', 'id', 'formula', 'shiftRange', 'multiplicity', 'nearDuplicate', 'similarName', 'similarPeaks']);

/** One finding of the automatic curation checks, located by field of the proposed entry. */
export const CurationProblemSchema = z.object({
  check: CurationCheckNameSchema,
  field: z.string(),
  message: z.string(),
});
export type CurationProblem = z.infer<typeof CurationProblemSchema>;

/** An existing current entry that looks like the proposal. */
export const SimilarEntrySchema = z.object({
  entryId: z.string(),
  name: z.string(),
  revision: z.number().int().positive(),
  solvent: z.string(),
  nameScore: z.number().min(0).max(1).nullable().describe('fuse.js name/synonym similarity, 1 = same; null if names differ'),
  peakScore: z.number().min(0).max(1).nullable().describe("the engine's screening score of this entry against the proposal's simulated lines; null if below 0.5"),
});
export type SimilarEntry = z.infer<typeof SimilarEntrySchema>;

/** The automatic checks shown to the curator. */
export const CurationChecksSchema = z.object({
  checkedAt: z.string().describe('ISO 8601'),
  problems: z.array(CurationProblemSchema),
  similar: z.array(SimilarEntrySchema).describe('most similar first, at most 5'),
  nearestEntryId: z.string().nullable(),
});
export type CurationChecks = z.infer<typeof CurationChecksSchema>;

/** A submission as lists show it (no entry body). */
export const SubmissionSummarySchema = z.object({
  id: z.string(),
  kind: SubmissionKindSchema,
  entryId: z.string(),
  baseRevision: z.number().int().nullable(),
  name: z.string(),
  status: SubmissionStatusSchema,
  sourceFormat: SubmissionSourceSchema,
  fileName: z.string().nullable(),
  studentWork: z.boolean(),
  problemCount: z.number().int().nonnegative(),
  nearestEntryId: z.string().nullable(),
  submitter: z.object({ id: z.string(), displayName: z.string() }),
  decisionComment: z.string().nullable(),
  decidedAt: z.string().nullable(),
  version: z.number().int().positive().describe('send it back with a decision (optimistic lock)'),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type SubmissionSummary = z.infer<typeof SubmissionSummarySchema>;

export const SubmissionViewSchema = SubmissionSummarySchema.extend({
  entry: LibraryEntrySchema,
  note: z.string().nullable(),
  checks: CurationChecksSchema,
  decidedBy: z.object({ id: z.string(), displayName: z.string() }).nullable(),
});
export type SubmissionView = z.infer<typeof SubmissionViewSchema>;

/** POST /api/submissions, /api/submissions/upload, GET /api/submissions/:id. */
export const SubmissionResponseSchema = z.object({ submission: SubmissionViewSchema });
export type SubmissionResponse = z.infer<typeof SubmissionResponseSchema>;

/** GET /api/submissions?status=&limit=&offset= → the caller's own submissions, newest first. */
export const MySubmissionsQuerySchema = z.object({
  status: SubmissionStatusSchema.optional(),
  limit: z.coerce.number().int().min(1).max(200).default(50),
  offset: z.coerce.number().int().min(0).default(0),
});
export const SubmissionListResponseSchema = z.object({ items: z.array(SubmissionSummarySchema), total: z.number().int().nonnegative() });
export type SubmissionListResponse = z.infer<typeof SubmissionListResponseSchema>;
