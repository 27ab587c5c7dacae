import { z } from 'zod';

/** One problem found while importing a file or pasted text: where it is and what is wrong. */
export const InputIssueSchema = z.object({
  line: z.number().int().positive().optional().describe('1-based line number in the input text'),
  field: z.string().optional().describe('column or metadata field the problem concerns'),
  message: z.string().min(1),
});
export type InputIssue = z.infer<typeof InputIssueSchema>;
