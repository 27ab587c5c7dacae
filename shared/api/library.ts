import { z } from 'zod';
import { LibraryEntrySchema } from '../libraryEntry';

/** GET /api/library → every approved, current entry. */
export const LibraryListResponseSchema = z.object({ entries: z.array(LibraryEntrySchema) });
export type LibraryListResponse = z.infer<typeof LibraryListResponseSchema>;
