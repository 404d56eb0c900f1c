import { z } from 'zod';
import { defineRoute } from '../../http/route-table';
import { ROLE_SETS } from '../../../shared/schemas/auth';
import { latestMessages } from './repository';

export const mailRoutes = [
  defineRoute({
    method: 'get',
    path: '/api/outbox',
    access: ROLE_SETS.admin,
    summary: 'Messages captured by the development mail server',
    query: z.object({ limit: z.coerce.number().int().min(1).max(500).default(100) }),
    handler: async ({ query }) => {
      const rows = await latestMessages(query.limit);
      return rows.map((m) => ({
        id: m.id,
        to: m.toAddress,
        from: m.fromAddress,
        subject: m.subject,
        body: m.body,
        createdAt: m.createdAt,
      }));
    },
  }),
];
