import { z } from 'zod';

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
