import { z } from 'zod';
import { DecisionBodySchema, RetireBodySchema, ReviewQueueQuerySchema } from '../../shared/api/review';
import { currentUser, roles, type RouteDef } from '../auth/access';
import { parseOr400 } from '../errors/validate';
import type { ReviewService } from './service';

const CURATORS = roles('curator');
const IdParams = z.object({ id: z.uuid('id must be a UUID') });
const EntryParams = z.object({ id: z.string().min(1).max(80) });

export function reviewRoutes(svc: ReviewService): RouteDef[] {
  return [
    {
      method: 'get',
      path: '/api/review/queue',
      access: CURATORS,
      summary: 'ReviewQueueQuery → ReviewQueueResponse',
      handlers: [async (req, res) => res.json(await svc.queue(parseOr400(ReviewQueueQuerySchema, req.query, 'query')))],
    },
    {
      method: 'get',
      path: '/api/review/submissions/:id',
      access: CURATORS,
      summary: '→ ReviewDetailResponse: fresh checks, nearest entry, replaced revision',
      handlers: [async (req, res) => res.json(await svc.detail(parseOr400(IdParams, req.params, 'path').id))],
    },
    {
      method: 'post',
      path: '/api/review/submissions/:id/decision',
      access: CURATORS,
      summary: 'DecisionBody → DecisionResponse; 409 with details.submission if someone decided first',
      handlers: [
        async (req, res) => {
          const { id } = parseOr400(IdParams, req.params, 'path');
          const body = parseOr400(DecisionBodySchema, req.body, 'decision');
          res.json(await svc.decide(currentUser(req), id, body));
        },
      ],
    },
    {
      method: 'post',
      path: '/api/review/entries/:id/retire',
      access: CURATORS,
      summary: 'RetireBody → LibraryEntryResponse (the tombstone); 409 if the revision moved',
      handlers: [
        async (req, res) => {
          const { id } = parseOr400(EntryParams, req.params, 'path');
          const body = parseOr400(RetireBodySchema, req.body, 'retire');
          res.json({ entry: await svc.retire(currentUser(req), id, body.revision, body.comment) });
        },
      ],
    },
  ];
}
