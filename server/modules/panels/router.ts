import { z } from 'zod';
import { idParamSchema, versionSchema } from '../../../shared/schemas/bounds';
import { defineRoute } from '../../http/route-table';
import { IdParamSchema, ROLE_SETS } from '../../../shared/schemas/auth';
import { BulkEditSchema, CommentInputSchema, PanelInputSchema, PanelUpdateSchema, ReselectSchema } from '../../../shared/schemas/panel';
import { JobUpdateSchema } from '../../../shared/schemas/job';
import { OverridesPutSchema } from '../../../shared/schemas/override';
import * as service from './service';
import * as jobReselection from './job-reselection';
import * as motors from './motors';
import * as ruleCheck from './rule-check';

const PanelId = z.object({ panelId: idParamSchema });
const LoadId = z.object({ loadId: idParamSchema });
const LoadBody = z.object({ answers: z.record(z.string(), z.unknown()), version: versionSchema.optional() });

export const panelRoutes = [
  defineRoute({
    method: 'get',
    path: '/api/sign-off-queue',
    access: ROLE_SETS.everyone,
    summary: `Panels in review, returned, and signed off in the last ${service.SIGNED_OFF_DAYS} days`,
    handler: ({ user }) => service.signOffQueue(user),
  }),
  // A job's change lives here, not in the jobs module: a change to its supply re-selects its panels.
  defineRoute({
    method: 'patch',
    path: '/api/jobs/:id',
    access: ROLE_SETS.design,
    summary: 'Change a job',
    params: IdParamSchema,
    body: JobUpdateSchema,
    handler: ({ user, params, body }) => jobReselection.changeJob(user, params.id, body),
  }),
  defineRoute({
    method: 'get',
    path: '/api/jobs/:id/panels',
    access: ROLE_SETS.everyone,
    summary: 'Panels of a job',
    params: IdParamSchema,
    handler: ({ user, params }) => service.listPanels(user, params.id),
  }),
  defineRoute({
    method: 'post',
    path: '/api/jobs/:id/panels',
    access: ROLE_SETS.design,
    summary: 'New panel',
    params: IdParamSchema,
    body: PanelInputSchema,
    handler: ({ user, params, body }) => service.createPanel(user, params.id, body),
  }),
  defineRoute({
    method: 'get',
    path: '/api/panels/:panelId',
    access: ROLE_SETS.everyone,
    summary: 'A panel with its motors, selections, comments and revisions',
    params: PanelId,
    handler: async ({ user, params, req, res }) => {
      const { json, gzip, key } = await service.panelDetailJson(user, params.panelId);
      res.setHeader('ETag', `W/"${key}"`);
      res.setHeader('Cache-Control', 'private, no-cache');
      res.setHeader('Vary', 'Accept-Encoding');
      if (req.fresh) res.status(304).end();
      else if (req.acceptsEncodings('gzip')) res.type('application/json').setHeader('Content-Encoding', 'gzip').send(gzip);
      else res.type('application/json').send(json);
      return undefined;
    },
  }),
  defineRoute({
    method: 'patch',
    path: '/api/panels/:panelId',
    access: ['admin', 'designer', 'estimator'],
    summary: 'Change panel settings (estimators: markup and labour rate)',
    params: PanelId,
    body: PanelUpdateSchema,
    handler: ({ user, params, body }) => {
      const { version, ...changes } = body;
      if (!user.roles.some((r) => r === 'admin' || r === 'designer')) {
        for (const k of Object.keys(changes))
          if (k !== 'markupPercent' && k !== 'labourRate') service.assertRole(user, 'admin', 'designer');
      }
      return service.updatePanel(user, params.panelId, changes, version);
    },
  }),
  defineRoute({
    method: 'post',
    path: '/api/panels/:panelId/duplicate',
    access: ROLE_SETS.design,
    summary: 'Duplicate a panel with its motors',
    params: PanelId,
    handler: ({ user, params }) => service.duplicatePanel(user, params.panelId),
  }),
  defineRoute({
    method: 'post',
    path: '/api/panels/:panelId/archive',
    access: ROLE_SETS.design,
    summary: 'Archive or restore a panel',
    params: PanelId,
    body: z.object({ archived: z.boolean(), version: versionSchema }),
    status: 200,
    handler: ({ user, params, body }) => service.archivePanel(user, params.panelId, body.archived, body.version),
  }),
  defineRoute({
    method: 'post',
    path: '/api/panels/:panelId/loads',
    access: ROLE_SETS.design,
    summary: 'Add a motor',
    params: PanelId,
    body: z.object({ answers: z.record(z.string(), z.unknown()), panelVersion: versionSchema.optional() }),
    handler: ({ user, params, body }) => motors.addLoad(user, params.panelId, body.answers, body.panelVersion ?? null),
  }),
  defineRoute({
    method: 'post',
    path: '/api/panels/:panelId/loads/bulk-edit',
    access: ROLE_SETS.design,
    summary: 'Change shared answers on several motors',
    params: PanelId,
    body: BulkEditSchema,
    status: 200,
    handler: ({ user, params, body }) => motors.bulkEdit(user, params.panelId, body.loadIds, body.changes, body.panelVersion),
  }),
  defineRoute({
    method: 'put',
    path: '/api/loads/:loadId',
    access: ROLE_SETS.design,
    summary: "Change a motor's answers",
    params: LoadId,
    body: LoadBody.extend({ version: versionSchema }),
    handler: ({ user, params, body }) => motors.updateLoad(user, params.loadId, body.answers, body.version),
  }),
  defineRoute({
    method: 'post',
    path: '/api/loads/:loadId/copy',
    access: ROLE_SETS.design,
    summary: 'Copy a motor',
    params: LoadId,
    handler: ({ user, params }) => motors.copyLoad(user, params.loadId),
  }),
  defineRoute({
    method: 'delete',
    path: '/api/loads/:loadId',
    access: ROLE_SETS.design,
    summary: 'Remove a motor',
    params: LoadId,
    handler: ({ user, params }) => motors.deleteLoad(user, params.loadId),
  }),
  defineRoute({
    method: 'put',
    path: '/api/loads/:loadId/overrides',
    access: ROLE_SETS.design,
    summary: "Set a motor's overrides, each with a justification",
    params: LoadId,
    body: OverridesPutSchema,
    handler: ({ user, params, body }) => motors.setOverrides(user, params.loadId, body.overrides, body.version),
  }),
  defineRoute({
    method: 'get',
    path: '/api/panels/:panelId/rule-check',
    access: ROLE_SETS.everyone,
    summary: 'What the current rules and tables would change in the stored selections, motor by motor',
    params: PanelId,
    handler: ({ user, params }) => ruleCheck.ruleCheck(user, params.panelId),
  }),
  defineRoute({
    method: 'post',
    path: '/api/panels/:panelId/reselect',
    access: ROLE_SETS.design,
    summary: 'Select every motor again under the current rules and tables (409 in review or when the version is stale)',
    params: PanelId,
    body: ReselectSchema,
    status: 200,
    handler: ({ user, params, body }) => ruleCheck.reselectUnderCurrentRules(user, params.panelId, body.version),
  }),
  defineRoute({
    method: 'post',
    path: '/api/panels/:panelId/comments',
    access: ROLE_SETS.everyone,
    summary: 'Comment on a panel or one of its motors',
    params: PanelId,
    body: CommentInputSchema,
    handler: ({ user, params, body }) => service.addComment(user, params.panelId, body.body, body.loadId),
  }),
];
