import type { DataSource } from 'typeorm';
import { z } from 'zod';
import { anySignedIn, type RouteDef } from '../auth/access';
import { parseOr400 } from '../errors/validate';
import { libraryGetVisible, libraryListCurrent, libraryListRevisions, rowToEntry } from './service';
import { notFound } from '../errors/AppError';

const EntryParams = z.object({ id: z.string().min(1).max(80) });
const RevisionParams = EntryParams.extend({ revision: z.string().regex(/^\d{1,9}$/, 'revision must be a positive whole number').transform(Number) });

export function libraryRoutes(ds: DataSource): RouteDef[] {
  return [
    {
      method: 'get',
      path: '/api/library',
      access: anySignedIn,
      summary: '→ LibraryListResponse: every current approved entry',
      handlers: [async (_req, res) => res.json({ entries: await libraryListCurrent(ds) })],
    },
    {
      method: 'get',
      path: '/api/library/:id',
      access: anySignedIn,
      summary: '→ LibraryEntryResponse: the visible revision (retired: true for a tombstone)',
      handlers: [
        async (req, res) => {
          const { id } = parseOr400(EntryParams, req.params, 'path');
          res.json({ entry: rowToEntry(await libraryGetVisible(ds, id)) });
        },
      ],
    },
    {
      method: 'get',
      path: '/api/library/:id/revisions',
      access: anySignedIn,
      summary: '→ RevisionListResponse: every revision, newest first',
      handlers: [
        async (req, res) => {
          const { id } = parseOr400(EntryParams, req.params, 'path');
          const rows = await libraryListRevisions(ds, id);
          res.json({
            revisions: rows.map((r) => ({ revision: r.revision, status: r.status, submissionId: r.submissionId, createdAt: r.createdAt.toISOString(), entry: rowToEntry(r) })),
          });
        },
      ],
    },
    {
      method: 'get',
      path: '/api/library/:id/revisions/:revision',
      access: anySignedIn,
      summary: '→ LibraryEntryResponse: one revision, superseded ones included',
      handlers: [
        async (req, res) => {
          const { id, revision } = parseOr400(RevisionParams, req.params, 'path');
          const rows = await libraryListRevisions(ds, id);
          const row = rows.find((r) => r.revision === revision);
          if (!row) throw notFound(`library entry "${id}" has no revision ${revision}`);
          res.json({ entry: rowToEntry(row) });
        },
      ],
    },
  ];
}
