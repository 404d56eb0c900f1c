import { z } from 'zod';
import { defineRoute } from '../../http/route-table';
import { panelChecks } from './service';

const ALL = ['admin', 'designer', 'estimator', 'engineer'] as const;
const PanelId = z.object({ panelId: z.coerce.number().int().positive() });

export const checkRoutes = [
  defineRoute({
    method: 'get',
    path: '/api/panels/:panelId/checks',
    access: ALL,
    summary: 'Panel checks: SCCR worksheet, heat load, control power transformer, nameplate and feeder, connection cards',
    params: PanelId,
    handler: ({ user, params }) => panelChecks(user, params.panelId),
  }),
];
