// The activity log's table: one row per change, read newest first with the author's name.
import { Op, type CreationAttributes, type Transaction, type WhereOptions } from 'sequelize';
import { Activity } from '../../db/models/activity';
import { User } from '../../db/models/user';

export async function insertActivity(values: CreationAttributes<Activity>, transaction?: Transaction) {
  await Activity.create(values, { transaction });
}

/** Newest first, each with its author's name (null when the person is gone). */
export async function activityRows(where: WhereOptions<Activity>, limit: number) {
  const rows = await Activity.findAll({
    where,
    include: [{ model: User, as: 'user', attributes: ['name'] }],
    order: [['id', 'DESC']],
    limit,
  });
  return rows.map((r) => ({ row: r, author: (r as Activity & { user?: User | null }).user?.name ?? null }));
}

/** A person's rows on a panel, or on its job's own data, after a moment (or all), oldest first. */
export async function actionsOnPanelBy(
  organisationId: number,
  panel: { id: number; jobId: number },
  userId: number,
  since: Date | null,
  transaction?: Transaction,
) {
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
