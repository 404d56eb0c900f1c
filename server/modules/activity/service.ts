import type { Transaction } from 'sequelize';
import type { CurrentUser } from '../../../shared/schemas/auth';
import { actionsOnPanelBy, activityRows, insertActivity } from './repository';

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
  await insertActivity(
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
    transaction,
  );
}

/** An entry in a panel's history: the job and the panel it is filed under are the panel's own. */
export async function recordPanelActivity(
  actor: CurrentUser,
  panel: { id: number; jobId: number },
  entry: Omit<ActivityInput, 'jobId' | 'panelId'>,
  transaction?: Transaction,
) {
  await recordActivity(actor, { ...entry, jobId: panel.jobId, panelId: panel.id }, transaction);
}

export async function listActivity(actor: CurrentUser, where: { jobId?: number; entity?: string }, limit = 200) {
  const rows = await activityRows(
    {
      organisationId: actor.organisationId,
      ...(where.jobId ? { jobId: where.jobId } : {}),
      ...(where.entity ? { entity: where.entity } : {}),
    },
    limit,
  );
  return rows.map(({ row: r, author }) => ({
    id: r.id,
    entity: r.entity,
    entityId: r.entityId,
    action: r.action,
    summary: r.summary,
    diff: r.diff,
    panelId: r.panelId,
    user: author,
    at: r.createdAt,
  }));
}

/**
 * What a person did to a panel, or to its job's own data (supply, fault current, code edition), since a
 * moment (the last sign-off), oldest first: entity, action, summary and diff.
 */
export async function panelActionsBy(
  organisationId: number,
  panel: { id: number; jobId: number },
  userId: number,
  since: Date | null,
  transaction?: Transaction,
) {
  return actionsOnPanelBy(organisationId, panel, userId, since, transaction);
}
