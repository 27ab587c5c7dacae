import { Initial1733000000000 } from './1733000000000-Initial';
import { SubmissionCheckSummary1733000000001 } from './1733000000001-SubmissionCheckSummary';

/** Listed explicitly (no glob) so the same list works from source, compiled output and vitest. */
export const MIGRATIONS = [Initial1733000000000, SubmissionCheckSummary1733000000001];
