import { z } from 'zod';
import { defineRoute } from '../../http/route-table';
import { sendAttachment } from '../../http/attachment';
import {
  toCsv,
  TERMINAL_COLUMNS,
  terminalRowsFor,
  WIRE_COLUMNS,
  wireRowsFor,
  type DrawingsView,
} from '../../../shared/drawings/panel-drawings';
import { layoutSvg, panelDrawings, panelNameplateSvg, schematicSvg, supplySvg, wiringWorkbook } from './service';
import type { Response } from 'express';

const ALL = ['admin', 'designer', 'estimator', 'engineer'] as const;
const PanelId = z.object({ panelId: z.coerce.number().int().positive() });
const TagQuery = z.object({ tag: z.string().trim().min(1).max(40).optional(), sheet: z.literal('supply').optional() }).strict();
const base = (jobNumber: string, panelName: string) => `${jobNumber} ${panelName}`.trim();

function sendSvg(res: Response, svg: string, name: string): undefined {
  res.status(200);
  res.setHeader('content-type', 'image/svg+xml; charset=utf-8');
  res.setHeader('content-disposition', `inline; filename="${name.replace(/[^A-Za-z0-9._-]+/g, '-')}"`);
  res.setHeader('cache-control', 'no-store');
  res.setHeader('content-security-policy', "default-src 'none'; style-src 'unsafe-inline'");
  res.end(svg);
  return undefined;
}

export const drawingRoutes = [
  defineRoute({
    method: 'get',
    path: '/api/panels/:panelId/drawings',
    access: ALL,
    summary: 'The panel drawings: sheet list, terminal plan, wire list, warnings',
    params: PanelId,
    handler: async ({ user, params }): Promise<DrawingsView> => {
      const { drawings } = await panelDrawings(user, params.panelId);
      return {
        drawingNumber: drawings.drawingNumber,
        sheets: drawings.sheets,
        standard: drawings.standard,
        colourPractice: drawings.colourPractice,
        warnings: drawings.warnings,
        bomTerminalBlocks: drawings.bomTerminalBlocks,
        terminals: drawings.terminals,
        wires: drawings.wires,
        layout: drawings.layout
          ? {
              enclosure: drawings.layout.enclosure,
              sections: drawings.layout.sections,
              placedCount: drawings.layout.placedCount,
              unplaced: drawings.layout.unplaced,
            }
          : null,
        buckets: drawings.buckets.map((b) => ({
          tag: b.tag,
          starter: b.starter,
          scheme: b.scheme,
          firstRung: b.firstRung,
          rungs: b.layout.rows,
          overload: b.overload,
          interlocked: b.interlocked,
        })),
      };
    },
  }),
  defineRoute({
    method: 'get',
    path: '/api/panels/:panelId/drawings/schematic.svg',
    access: ALL,
    summary: 'Control schematics as SVG: every sheet, one bucket with ?tag=, or the supply sheet with ?sheet=supply',
    params: PanelId,
    query: TagQuery,
    handler: async ({ user, params, query, res }) => {
      const c = await panelDrawings(user, params.panelId);
      const svg = query.sheet === 'supply' ? supplySvg(c) : schematicSvg(c, query.tag);
      return sendSvg(res, svg, `${c.drawings.drawingNumber}${query.tag ? `-${query.tag}` : query.sheet ? '-supply' : ''}-schematic.svg`);
    },
  }),
  defineRoute({
    method: 'get',
    path: '/api/panels/:panelId/drawings/layout.svg',
    access: ALL,
    summary: 'The backplate layout, to scale, as SVG',
    params: PanelId,
    handler: async ({ user, params, res }) => {
      const c = await panelDrawings(user, params.panelId);
      return sendSvg(res, layoutSvg(c), `${c.drawings.drawingNumber}-layout.svg`);
    },
  }),
  defineRoute({
    method: 'get',
    path: '/api/panels/:panelId/drawings/nameplate.svg',
    access: ALL,
    summary: 'The panel marking (NEC 409.110, UL 508A) as SVG',
    params: PanelId,
    handler: async ({ user, params, res }) => {
      const c = await panelDrawings(user, params.panelId);
      return sendSvg(res, panelNameplateSvg(c), `${c.drawings.drawingNumber}-nameplate.svg`);
    },
  }),
  defineRoute({
    method: 'get',
    path: '/api/panels/:panelId/drawings/wires.csv',
    access: ALL,
    summary: 'Wire list (.csv)',
    params: PanelId,
    handler: async ({ user, params, res }) => {
      const { drawings, checks } = await panelDrawings(user, params.panelId);
      return sendAttachment(res, `${base(checks.job.number, checks.panel.name)} wires`, 'csv', toCsv(WIRE_COLUMNS, wireRowsFor(drawings)));
    },
  }),
  defineRoute({
    method: 'get',
    path: '/api/panels/:panelId/drawings/terminals.csv',
    access: ALL,
    summary: 'Terminal plan (.csv)',
    params: PanelId,
    handler: async ({ user, params, res }) => {
      const { drawings, checks } = await panelDrawings(user, params.panelId);
      return sendAttachment(
        res,
        `${base(checks.job.number, checks.panel.name)} terminals`,
        'csv',
        toCsv(TERMINAL_COLUMNS, terminalRowsFor(drawings)),
      );
    },
  }),
  defineRoute({
    method: 'get',
    path: '/api/panels/:panelId/drawings/wiring.xlsx',
    access: ALL,
    summary: 'Terminal plan and wire list as one workbook (.xlsx)',
    params: PanelId,
    handler: async ({ user, params, res }) => {
      const c = await panelDrawings(user, params.panelId);
      return sendAttachment(res, `${base(c.checks.job.number, c.checks.panel.name)} wiring`, 'xlsx', await wiringWorkbook(c));
    },
  }),
];
