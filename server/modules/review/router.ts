// Review and sign-off: submit, return, approve, the frozen revisions and the change report between them.
import { z } from 'zod';
import { defineRoute } from '../../http/route-table';
import { ROLE_SETS } from '../../../shared/schemas/auth';
import { countParamSchema, idParamSchema } from '../../../shared/schemas/bounds';
import { ReviewActionSchema } from '../../../shared/schemas/panel';
import { sendAttachment } from '../../http/attachment';
import * as review from './service';
import { changeReportWorkbook } from './change-report-export';

const PanelId = z.object({ panelId: idParamSchema });

export const reviewRoutes = [
  defineRoute({
    method: 'post',
    path: '/api/panels/:panelId/submit',
    access: ROLE_SETS.design,
    summary: 'Submit for sign-off',
    params: PanelId,
    body: ReviewActionSchema,
    status: 200,
    handler: ({ user, params, body }) => review.submitForReview(user, params.panelId, body.version, body.comment),
  }),
  defineRoute({
    method: 'post',
    path: '/api/panels/:panelId/return',
    access: ROLE_SETS.engineer,
    summary: 'Return to the designer with a comment',
    params: PanelId,
    body: ReviewActionSchema,
    status: 200,
    handler: ({ user, params, body }) => review.returnPanel(user, params.panelId, body.version, body.comment),
  }),
  defineRoute({
    method: 'post',
    path: '/api/panels/:panelId/approve',
    access: ROLE_SETS.engineer,
    summary: 'Sign off: freeze the next revision',
    params: PanelId,
    body: ReviewActionSchema,
    status: 200,
    handler: ({ user, params, body }) =>
      review.approvePanel(user, params.panelId, body.version, body.comment, { acknowledgeSccr: body.acknowledgeSccr }),
  }),
  defineRoute({
    method: 'get',
    path: '/api/panels/:panelId/sign-off-eligibility',
    access: ROLE_SETS.everyone,
    summary: 'Whether the signed-in person may sign the panel off as its reviewer (separation of duties), and why not',
    params: PanelId,
    handler: ({ user, params }) => review.signOffEligibility(user, params.panelId),
  }),
  defineRoute({
    method: 'get',
    path: '/api/panels/:panelId/revisions/:number',
    access: ROLE_SETS.everyone,
    summary: 'One frozen revision',
    params: PanelId.extend({ number: countParamSchema }),
    handler: ({ user, params }) => review.getRevision(user, params.panelId, params.number),
  }),
  defineRoute({
    method: 'get',
    path: '/api/panels/:panelId/change-report',
    access: ROLE_SETS.everyone,
    summary: 'Change report between two revisions',
    params: PanelId,
    query: z.object({ from: countParamSchema, to: countParamSchema }),
    handler: ({ user, params, query }) => review.compareRevisions(user, params.panelId, query.from, query.to),
  }),
  defineRoute({
    method: 'get',
    path: '/api/panels/:panelId/change-report.xlsx',
    access: ROLE_SETS.everyone,
    summary: 'Change report between two revisions as .xlsx (totals, lines with formulas, decisions)',
    params: PanelId,
    query: z.object({ from: countParamSchema, to: countParamSchema }),
    handler: async ({ user, params, query, res }) => {
      const out = await changeReportWorkbook(user, params.panelId, query.from, query.to);
      return sendAttachment(res, out.base, 'xlsx', out.buffer);
    },
  }),
];
