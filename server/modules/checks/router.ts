import { z } from 'zod';
import { idParamSchema } from '../../../shared/schemas/bounds';
import { defineRoute } from '../../http/route-table';
import { ROLE_SETS } from '../../../shared/schemas/auth';
import { panelChecks } from './service';

const PanelId = z.object({ panelId: idParamSchema });

export const checkRoutes = [
  defineRoute({
    method: 'get',
    path: '/api/panels/:panelId/checks',
    access: ROLE_SETS.everyone,
    summary: 'Panel checks: SCCR worksheet, heat load, control power transformer, nameplate and feeder, connection cards',
    params: PanelId,
    handler: ({ user, params }) => panelChecks(user, params.panelId),
  }),
];
