import type { Transaction } from 'sequelize';
import { Op } from 'sequelize';
import type { CurrentUser } from '../../../shared/schemas/auth';
import { Activity } from '../../db/models/activity';
import { User } from '../../db/models/user';

export interface ActivityInput {
  entity: string;
  entityId?: number | null;
  action: string;
  summary: string;
  jobId?: number | null;
  panelId?: number | null;
  diff?: Record<string, unknown> | null;
}

export async function recordActivity(actor: CurrentUser, a: ActivityInput, transaction?: Transaction) {
  await Activity.create(
    {
      organisationId: actor.organisationId,
      userId: actor.id,
      entity: a.entity,
      entityId: a.entityId ?? null,
      action: a.action,
      summary: a.summary,
      jobId: a.jobId ?? null,
      panelId: a.panelId ?? null,
      diff: a.diff ?? null,
    },
    { transaction },
  );
}

export async function listActivity(actor: CurrentUser, where: { jobId?: number; entity?: string }, limit = 200) {
  const rows = await Activity.findAll({
    where: { organisationId: actor.organisationId, ...(where.jobId ? { jobId: where.jobId } : {}), ...(where.entity ? { entity: where.entity } : {}) },
    include: [{ model: User, as: 'user', attributes: ['name'] }],
    order: [['id', 'DESC']],
    limit,
  });
  return rows.map((r) => ({
    id: r.id,
    entity: r.entity,
    entityId: r.entityId,
    action: r.action,
    summary: r.summary,
    diff: r.diff,
    panelId: r.panelId,
    user: (r as unknown as { user?: { name: string } }).user?.name ?? null,
    at: r.createdAt,
  }));
}

/** What a person did to a panel since a moment (the last sign-off), oldest first: action, summary and diff. */
export async function panelActionsBy(organisationId: number, panelId: number, userId: number, since: Date | null, transaction?: Transaction) {
  const rows = await Activity.findAll({
    where: { organisationId, panelId, userId, ...(since ? { createdAt: { [Op.gt]: since } } : {}) },
    attributes: ['action', 'summary', 'diff'],
    order: [['id', 'ASC']],
    transaction,
  });
  return rows.map((r) => ({ action: r.action, summary: r.summary, diff: r.diff }));
}
