import { z } from 'zod';
import { MySubmissionsQuerySchema, SubmissionCreateBodySchema } from '../../shared/api/submissions';
import { currentUser, roles, anySignedIn, type RouteDef } from '../auth/access';
import type { Config } from '../config';
import { parseOr400 } from '../errors/validate';
import type { SubmissionService } from './service';
import { uploadMiddleware, uploadToProposal } from './upload';

const SUBMITTERS = roles('student', 'analyst', 'curator');
const IdParams = z.object({ id: z.uuid('id must be a UUID') });

export function submissionRoutes(svc: SubmissionService, config: Config): RouteDef[] {
  return [
    {
      method: 'post',
      path: '/api/submissions',
      access: SUBMITTERS,
      summary: 'SubmissionCreateBody → 201 SubmissionResponse (200 if the id was already yours)',
      handlers: [
        async (req, res) => {
          const body = parseOr400(SubmissionCreateBodySchema, req.body, 'submission');
          const r = await svc.storeOne(currentUser(req), { ...body, sourceFormat: 'json' });
          res.status(r.created ? 201 : 200).json({ submission: r.submission });
        },
      ],
    },
    {
      method: 'post',
      path: '/api/submissions/upload',
      access: SUBMITTERS,
      summary: 'multipart file (peak list / JCAMP-DX) + meta (UploadMeta JSON) → 201 SubmissionResponse',
      handlers: [
        uploadMiddleware(config.uploadMaxBytes),
        async (req, res) => {
          const proposal = uploadToProposal(req.file, (req.body as Record<string, unknown> | undefined)?.meta);
          const r = await svc.storeOne(currentUser(req), proposal);
          res.status(r.created ? 201 : 200).json({ submission: r.submission });
        },
      ],
    },
    {
      method: 'get',
      path: '/api/submissions',
      access: SUBMITTERS,
      summary: '?status&limit&offset → SubmissionListResponse: your own submissions, newest first',
      handlers: [
        async (req, res) => {
          const q = parseOr400(MySubmissionsQuerySchema, req.query, 'query');
          res.json(await svc.listMine(currentUser(req), q));
        },
      ],
    },
    {
      method: 'get',
      path: '/api/submissions/:id',
      access: anySignedIn,
      summary: '→ SubmissionResponse: yours, or any for curators and admins (404 otherwise)',
      handlers: [
        async (req, res) => {
          const { id } = parseOr400(IdParams, req.params, 'path');
          res.json({ submission: await svc.getVisible(currentUser(req), id) });
        },
      ],
    },
  ];
}
