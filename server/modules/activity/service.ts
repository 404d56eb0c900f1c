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

/**
 * What a person did to a panel, or to its job's own data (supply, fault current, code edition), since a
 * moment (the last sign-off), oldest first: entity, action, summary and diff.
 */
export async function panelActionsBy(organisationId: number, panel: { id: number; jobId: number }, userId: number, since: Date | null, transaction?: Transaction) {
  const rows = await Activity.findAll({
    where: {
      organisationId,
      userId,
      [Op.or]: [{ panelId: panel.id }, { jobId: panel.jobId, entity: 'job' }],
      ...(since ? { createdAt: { [Op.gt]: since } } : {}),
    },
    attributes: ['entity', 'action', 'summary', 'diff'],
    order: [['id', 'ASC']],
    transaction,
  });
  return rows.map((r) => ({ entity: r.entity, action: r.action, summary: r.summary, diff: r.diff }));
}
