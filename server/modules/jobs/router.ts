import { z } from 'zod';
import { versionSchema } from '../../../shared/schemas/bounds';
import { defineRoute } from '../../http/route-table';
import { IdParamSchema, ROLE_SETS } from '../../../shared/schemas/auth';
import { JobInputSchema, JobListQuerySchema } from '../../../shared/schemas/job';
import * as service from './service';
import { listActivity } from '../activity/service';

export const jobRoutes = [
  defineRoute({
    method: 'get',
    path: '/api/jobs',
    access: ROLE_SETS.everyone,
    summary: 'Jobs list',
    query: JobListQuerySchema,
    handler: ({ user, query }) => service.listJobs(user, query),
  }),
  defineRoute({
    method: 'post',
    path: '/api/jobs',
    access: ROLE_SETS.design,
    summary: 'New job',
    body: JobInputSchema,
    handler: ({ user, body }) => service.createJob(user, body),
  }),
  defineRoute({
    method: 'get',
    path: '/api/jobs/:id',
    access: ROLE_SETS.everyone,
    summary: 'One job',
    params: IdParamSchema,
    handler: async ({ user, params }) => service.jobView(await service.getJob(user, params.id)),
  }),
  // PATCH /api/jobs/:id is in the panels module's routes: a change to the supply re-selects the job's panels.
  defineRoute({
    method: 'post',
    path: '/api/jobs/:id/archive',
    access: ROLE_SETS.design,
    summary: 'Archive or restore a job',
    params: IdParamSchema,
    body: z.object({ archived: z.boolean(), version: versionSchema }),
    status: 200,
    handler: ({ user, params, body }) => service.setArchived(user, params.id, body.archived, body.version),
  }),
  defineRoute({
    method: 'get',
    path: '/api/jobs/:id/activity',
    access: ROLE_SETS.everyone,
    summary: 'Activity log of a job',
    params: IdParamSchema,
    handler: async ({ user, params }) => {
      await service.getJob(user, params.id);
      return listActivity(user, { jobId: params.id });
    },
  }),
];
