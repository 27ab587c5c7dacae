import { SyncChangesQuerySchema, SyncPushBodySchema, SyncPushItemSchema, type SyncPushResult } from '../../shared/api/sync';
import { anySignedIn, currentUser, roles, type RouteDef } from '../auth/access';
import type { DataSource } from 'typeorm';
import { parseOr400, zodIssues } from '../errors/validate';
import { outcomeToResult, type Proposal, type SubmissionService } from '../submissions/service';
import { syncChangesPage } from './service';

export function syncRoutes(ds: DataSource, submissions: SubmissionService): RouteDef[] {
  return [
    {
      method: 'get',
      path: '/api/sync/changes',
      access: anySignedIn,
      summary: '?cursor&limit → SyncChangesResponse (entries and tombstones since the cursor)',
      handlers: [
        async (req, res) => {
          const q = parseOr400(SyncChangesQuerySchema, req.query, 'query');
          const page = await syncChangesPage(ds, q.cursor, q.limit);
          // Express compares the ETag with If-None-Match and answers 304 itself.
          res.type('application/json').setHeader('ETag', page.etag);
          res.setHeader('Cache-Control', 'private, no-cache');
          res.send(page.body);
        },
      ],
    },
    {
      method: 'post',
      path: '/api/sync/push',
      access: roles('student', 'analyst', 'curator'),
      summary: 'SyncPushBody → SyncPushResponse: one outcome per item (created, duplicate, rejected, conflict)',
      handlers: [
        async (req, res) => {
          const body = parseOr400(SyncPushBodySchema, req.body, 'push');
          const results: (SyncPushResult | null)[] = body.submissions.map(() => null);
          const proposals: { index: number; p: Proposal }[] = [];
          body.submissions.forEach((raw, index) => {
            const r = SyncPushItemSchema.safeParse(raw);
            const rawId = raw && typeof raw === 'object' && typeof (raw as { id?: unknown }).id === 'string' ? ((raw as { id: string }).id.slice(0, 80)) : null;
            if (!r.success) {
              const issues = zodIssues(r.error, `submissions.${index}`);
              results[index] = { index, id: rawId, outcome: 'rejected', error: { code: 'invalid_request', message: `${issues[0].field}: ${issues[0].message}`, issues } };
            } else {
              proposals.push({ index, p: { ...r.data, sourceFormat: 'json' } });
            }
          });
          if (proposals.length) {
            const outcomes = await submissions.store(currentUser(req), proposals.map((x) => x.p));
            const rows = outcomes.flatMap((o) => (o.outcome === 'created' || o.outcome === 'duplicate' ? [o.row] : []));
            const summaries = new Map((await submissions.summaries(rows)).map((s) => [s.id, s]));
            outcomes.forEach((o, k) => {
              const { index, p } = proposals[k];
              const withField = o.outcome === 'conflict' || o.outcome === 'rejected' ? { ...o, error: { ...o.error, issues: o.error.issues.map((i) => ({ ...i, field: `submissions.${index}.${i.field}` })) } } : o;
              results[index] = outcomeToResult(index, p.id ?? null, withField, 'row' in o ? summaries.get(o.row.id) : undefined);
            });
          }
          res.json({ results });
        },
      ],
    },
  ];
}
