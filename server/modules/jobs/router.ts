import { z } from 'zod';
import { versionSchema } from '../../../shared/schemas/bounds';
import { defineRoute } from '../../http/route-table';
import { IdParamSchema } from '../../../shared/schemas/auth';
import { JobInputSchema, JobListQuerySchema, JobUpdateSchema } from '../../../shared/schemas/job';
import * as service from './service';
import { listActivity } from '../activity/service';

const ALL = ['admin', 'designer', 'estimator', 'engineer'] as const;
const EDIT = ['admin', 'designer'] as const;

export const jobRoutes = [
  defineRoute({ method: 'get', path: '/api/jobs', access: ALL, summary: 'Jobs list', query: JobListQuerySchema, handler: ({ user, query }) => service.listJobs(user, query) }),
  defineRoute({ method: 'post', path: '/api/jobs', access: EDIT, summary: 'New job', body: JobInputSchema, handler: ({ user, body }) => service.createJob(user, body) }),
  defineRoute({ method: 'get', path: '/api/jobs/:id', access: ALL, summary: 'One job', params: IdParamSchema, handler: async ({ user, params }) => service.jobView(await service.getJob(user, params.id)) }),
  defineRoute({ method: 'patch', path: '/api/jobs/:id', access: EDIT, summary: 'Change a job', params: IdParamSchema, body: JobUpdateSchema, handler: ({ user, params, body }) => service.updateJob(user, params.id, body) }),
  defineRoute({
    method: 'post',
    path: '/api/jobs/:id/archive',
    access: EDIT,
    summary: 'Archive or restore a job',
    params: IdParamSchema,
    body: z.object({ archived: z.boolean(), version: versionSchema }),
    status: 200,
    handler: ({ user, params, body }) => service.setArchived(user, params.id, body.archived, body.version),
  }),
  defineRoute({
    method: 'get',
    path: '/api/jobs/:id/activity',
    access: ALL,
    summary: 'Activity log of a job',
    params: IdParamSchema,
    handler: async ({ user, params }) => {
      await service.getJob(user, params.id);
      return listActivity(user, { jobId: params.id });
    },
  }),
];
