import { z } from 'zod';
import { LibraryEntrySchema } from '../libraryEntry';

/** GET /api/library → every approved, current entry. */
export const LibraryListResponseSchema = z.object({ entries: z.array(LibraryEntrySchema) });
export type LibraryListResponse = z.infer<typeof LibraryListResponseSchema>;

/** GET /api/library/:id and /api/library/:id/revisions/:revision → one entry (retired: true on a tombstone). */
export const LibraryEntryResponseSchema = z.object({ entry: LibraryEntrySchema });
export type LibraryEntryResponse = z.infer<typeof LibraryEntryResponseSchema>;

export const RevisionStatusSchema = z.enum(['current', 'superseded', 'retired']);
export type RevisionStatus = z.infer<typeof RevisionStatusSchema>;

/** GET /api/library/:id/revisions → every revision, newest first; older ones stay readable. */
export const RevisionListResponseSchema = z.object({
  revisions: z.array(
    z.object({
      revision: z.number().int().positive(),
      status: RevisionStatusSchema,
      submissionId: z.string().nullable().describe('the approved submission that made this revision; null for seeded ones'),
      createdAt: z.string().describe('ISO 8601'),
      entry: LibraryEntrySchema,
    }),
  ),
});
export type RevisionListResponse = z.infer<typeof RevisionListResponseSchema>;
