import type { Response } from 'express';
import { z } from 'zod';
import { idParamSchema } from '../../../shared/schemas/bounds';
import { defineRoute } from '../../http/route-table';
import { attachment } from '../../http/attachment';
import { IdParamSchema, ROLE_SETS } from '../../../shared/schemas/auth';
import { BomCategorySchema, PartCodeSchema, UnitSchema } from '../../../shared/schemas/catalogue';
import { requirePanel } from '../panels/service';
import { writeBomWorkbook, type BomExportJob, type BomExportPanel } from './export';
import { writeBomCsv } from './export-csv';
import * as service from './service';
import * as exportData from './export-data';
import * as lines from './lines';
import * as swaps from './swaps';

const PanelId = z.object({ panelId: idParamSchema });
const LineId = PanelId.extend({ lineId: idParamSchema });
const money = z.number().finite().nonnegative().max(10_000_000);
const hours = z.number().finite().nonnegative().max(10_000);

const ManualLineBody = z
  .object({
    bucket: z.string().trim().max(60).optional(),
    category: BomCategorySchema,
    code: PartCodeSchema.nullable().optional(),
    description: z.string().trim().max(300).optional(),
    quantity: z.number().finite().positive().max(1_000_000),
    unit: UnitSchema.optional(),
    unitCost: money.optional(),
    unitLabourHours: hours.optional(),
  })
  .strict();

const LinePatchBody = z
  .object({
    quantity: z.number().finite().positive().max(1_000_000).optional(),
    description: z.string().trim().min(1).max(300).optional(),
    unitCost: money.optional(),
    unitLabourHours: hours.optional(),
    swapCode: PartCodeSchema.optional(),
    swapReason: z.string().trim().max(500).optional(),
  })
  .strict();

async function stream(res: Response, out: { job: BomExportJob; panels: BomExportPanel[]; fileBase: string }, ext: 'xlsx' | 'csv') {
  attachment(res, out.fileBase, ext);
  if (ext === 'xlsx') await writeBomWorkbook(out.job, out.panels, res);
  else await writeBomCsv(out.job, out.panels, res);
  return undefined;
}

export const bomRoutes = [
  defineRoute({
    method: 'get',
    path: '/api/panels/:panelId/bom',
    access: ROLE_SETS.everyone,
    summary: "A panel's bill of materials with totals and the stale flag",
    params: PanelId,
    handler: async ({ user, params }) => lines.storedBom(user, await requirePanel(user, params.panelId)),
  }),
  defineRoute({
    method: 'post',
    path: '/api/panels/:panelId/bom/rebuild',
    access: ROLE_SETS.rebuildBom,
    summary: "Rebuild the automatic lines from the selections (manual lines and swaps kept; reprice to take today's catalogue prices)",
    params: PanelId,
    body: z.object({ reprice: z.boolean().default(false) }).strict(),
    status: 200,
    handler: async ({ user, params, body }) => {
      await service.rebuild(user, await requirePanel(user, params.panelId), { reprice: body.reprice });
      return lines.storedBom(user, await requirePanel(user, params.panelId));
    },
  }),
  defineRoute({
    method: 'post',
    path: '/api/panels/:panelId/bom/lines',
    access: ROLE_SETS.estimate,
    summary: 'Add a manual line (freight, engineering hours, spares …)',
    params: PanelId,
    body: ManualLineBody,
    handler: ({ user, params, body }) => lines.addManualLine(user, params.panelId, body),
  }),
  defineRoute({
    method: 'patch',
    path: '/api/panels/:panelId/bom/lines/:lineId',
    access: ROLE_SETS.estimate,
    summary: 'Change a manual line, or swap a line for an equivalent catalogue item with a reason',
    params: LineId,
    body: LinePatchBody,
    handler: ({ user, params, body }) => swaps.updateLine(user, params.panelId, params.lineId, body),
  }),
  defineRoute({
    method: 'delete',
    path: '/api/panels/:panelId/bom/lines/:lineId',
    access: ROLE_SETS.estimate,
    summary: 'Remove a manual line',
    params: LineId,
    handler: async ({ user, params }) => {
      await lines.deleteLine(user, params.panelId, params.lineId);
      return undefined;
    },
  }),
  defineRoute({
    method: 'get',
    path: '/api/panels/:panelId/bom/lines/:lineId/alternatives',
    access: ROLE_SETS.everyone,
    summary: 'Active catalogue items of the same category a line may be swapped for',
    params: LineId,
    handler: ({ user, params }) => swaps.swapCandidates(user, params.panelId, params.lineId),
  }),
  defineRoute({
    method: 'get',
    path: '/api/panels/:panelId/bom.xlsx',
    access: ROLE_SETS.everyone,
    summary: "A panel's bill of materials as .xlsx (streamed)",
    params: PanelId,
    handler: async ({ user, params, res }) => stream(res, await exportData.panelExport(user, params.panelId), 'xlsx'),
  }),
  defineRoute({
    method: 'get',
    path: '/api/panels/:panelId/bom.csv',
    access: ROLE_SETS.everyone,
    summary: "A panel's bill of materials as .csv",
    params: PanelId,
    handler: async ({ user, params, res }) => stream(res, await exportData.panelExport(user, params.panelId), 'csv'),
  }),
  defineRoute({
    method: 'get',
    path: '/api/jobs/:id/bom.xlsx',
    access: ROLE_SETS.everyone,
    summary: "A job's bill of materials (every panel not archived) as .xlsx (streamed)",
    params: IdParamSchema,
    handler: async ({ user, params, res }) => stream(res, await exportData.jobExport(user, params.id), 'xlsx'),
  }),
  defineRoute({
    method: 'get',
    path: '/api/jobs/:id/bom.csv',
    access: ROLE_SETS.everyone,
    summary: "A job's bill of materials as .csv",
    params: IdParamSchema,
    handler: async ({ user, params, res }) => stream(res, await exportData.jobExport(user, params.id), 'csv'),
  }),
];
