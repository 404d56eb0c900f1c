import { z } from 'zod';
import { idParamSchema } from '../../../shared/schemas/bounds';
import { defineRoute } from '../../http/route-table';
import { panelChecks } from './service';
import { submittalRoutes } from '../submittal/router';

const ALL = ['admin', 'designer', 'estimator', 'engineer'] as const;
const PanelId = z.object({ panelId: idParamSchema });

export const checkRoutes = [
  defineRoute({
    method: 'get',
    path: '/api/panels/:panelId/checks',
    access: ALL,
    summary: 'Panel checks: SCCR worksheet, heat load, control power transformer, nameplate and feeder, connection cards',
    params: PanelId,
    handler: ({ user, params }) => panelChecks(user, params.panelId),
  }),
  ...submittalRoutes,
];
