import { Initial1733000000000 } from './1733000000000-Initial';

/** Listed explicitly (no glob) so the same list works from source, compiled output and vitest. */
export const MIGRATIONS = [Initial1733000000000];
