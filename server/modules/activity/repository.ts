// The activity log's table: one row per change, read newest first with the author's name.
import type { CreationAttributes, Transaction, WhereOptions } from 'sequelize';
import { Activity } from '../../db/models/activity';
import { User } from '../../db/models/user';

export async function insertActivity(values: CreationAttributes<Activity>, transaction?: Transaction) {
  await Activity.create(values, { transaction });
}

/** Newest first, each with its author's name (null when the person is gone). */
export async function activityRows(where: WhereOptions<Activity>, limit: number) {
  const rows = await Activity.findAll({ where, include: [{ model: User, as: 'user', attributes: ['name'] }], order: [['id', 'DESC']], limit });
  return rows.map((r) => ({ row: r, author: (r as Activity & { user?: User | null }).user?.name ?? null }));
}
