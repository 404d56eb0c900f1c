import { QueryTypes, type CreationAttributes, type Transaction } from 'sequelize';
import { db } from '../../db/sequelize';
import { Panel } from '../../db/models/panel';
import { Load } from '../../db/models/load';
import { Job } from '../../db/models/job';
import { Comment } from '../../db/models/comment';
import { Revision } from '../../db/models/revision';
import { User } from '../../db/models/user';
import type { PanelSummary, QueuePanel } from '../../../shared/schemas/panel';

export async function listPanels(organisationId: number, jobId: number): Promise<PanelSummary[]> {
  return db().query<PanelSummary>(
    `select p.id, p.job_id as "jobId", p.name, p.description, p.mounting, p.status, p.revision_number as "revisionNumber",
            p.archived_at as "archivedAt", p.version, p.updated_at as "updatedAt",
            (select count(*)::int from loads l where l.panel_id = p.id) as "motorCount"
       from panels p where p.organisation_id = :organisationId and p.job_id = :jobId
      order by p.archived_at nulls first, p.name, p.id`,
    { replacements: { organisationId, jobId }, type: QueryTypes.SELECT },
  );
}

/**
 * The organisation's panels that wait on someone: in review (the engineer), returned (the panel
 * builder), and signed off since `signedSince` (the estimator prices the revision), in one query.
 */
export async function signOffQueue(organisationId: number, signedSince: Date): Promise<QueuePanel[]> {
  const rows = await db().query<Omit<QueuePanel, 'note'> & { noteBody: string | null; noteAuthor: string | null }>(
    `select p.id as "panelId", p.name as "panelName", j.id as "jobId", j.number as "jobNumber", j.name as "jobName",
            p.status, p.revision_number as "revisionNumber",
            case when p.status = 'in_review' then coalesce(p.submitted_at, p.updated_at) else p.updated_at end as "since",
            (select count(*)::int from loads l where l.panel_id = p.id) as "motorCount",
            c.body as "noteBody", u.name as "noteAuthor"
       from panels p
       join jobs j on j.id = p.job_id and j.archived_at is null
       left join lateral (select body, user_id from comments where panel_id = p.id and load_id is null order by id desc limit 1) c on true
       left join users u on u.id = c.user_id
      where p.organisation_id = :organisationId and p.archived_at is null
        and (p.status in ('in_review', 'returned') or (p.status = 'signed_off' and p.updated_at >= :signedSince))
      order by "since" asc
      limit 300`,
    { replacements: { organisationId, signedSince }, type: QueryTypes.SELECT },
  );
  return rows.map(({ noteBody, noteAuthor, ...r }) => ({
    ...r,
    since: new Date(r.since).toISOString(),
    note: noteBody === null ? null : { body: noteBody, author: noteAuthor },
  }));
}

/** The panel with its job, in one query (the job supplies the supply data). */
export async function findPanelWithJob(organisationId: number, id: number, transaction?: Transaction, lock = false) {
  return Panel.findOne({
    where: { organisationId, id },
    include: [{ model: Job, as: 'job', required: true }],
    transaction,
    lock: lock && transaction ? { level: transaction.LOCK.UPDATE, of: Panel } : undefined,
  });
}

export async function loadsOf(panelId: number, transaction?: Transaction) {
  return Load.findAll({
    where: { panelId },
    order: [
      ['position', 'ASC'],
      ['id', 'ASC'],
    ],
    transaction,
  });
}

/** The panel's comments, oldest first, each with its author's name (null when the person is gone). */
export async function commentsOf(panelId: number) {
  const rows = await Comment.findAll({
    where: { panelId },
    include: [{ model: User, as: 'author', attributes: ['name'] }],
    order: [['id', 'ASC']],
  });
  return rows.map((c) => Object.assign(c, { authorName: (c as Comment & { author?: User | null }).author?.name ?? null }));
}

export async function revisionsOf(panelId: number) {
  return db().query<{ number: number; approvedAt: string; approvedBy: string | null }>(
    `select r.number, r.approved_at as "approvedAt", u.name as "approvedBy"
       from revisions r left join users u on u.id = r.approved_by where r.panel_id = :panelId order by r.number`,
    { replacements: { panelId }, type: QueryTypes.SELECT },
  );
}

/** The change stamp of a panel and its job, in one light query (the panel page's cache key). */
export async function panelStamp(organisationId: number, id: number): Promise<string | null> {
  const rows = await db().query<{ stamp: string }>(
    `select p.id || '.' || p.version || '.' || (extract(epoch from p.updated_at) * 1000000)::bigint || '.' || (extract(epoch from j.updated_at) * 1000000)::bigint as stamp
       from panels p join jobs j on j.id = p.job_id where p.organisation_id = :organisationId and p.id = :id`,
    { replacements: { organisationId, id }, type: QueryTypes.SELECT },
  );
  return rows[0]?.stamp ?? null;
}

/** Marks a panel changed without a new version (a comment): its cached answer is no longer current. */
export async function touchPanel(id: number, transaction?: Transaction) {
  await db().query('update panels set updated_at = now() where id = :id', { replacements: { id }, transaction });
}

export async function findLoad(organisationId: number, id: number, transaction?: Transaction) {
  return Load.findOne({ where: { organisationId, id }, transaction });
}

export async function bumpPanel(
  organisationId: number,
  id: number,
  version: number,
  values: Record<string, unknown>,
  transaction?: Transaction,
) {
  const [count] = await Panel.update({ ...values, version: version + 1 }, { where: { organisationId, id, version }, transaction });
  return count;
}

export async function usersWithRole(organisationId: number, role: string) {
  return db().query<{ email: string; name: string }>(
    `select email, name from users where organisation_id = :organisationId and active and :role = any(roles)`,
    {
      replacements: { organisationId, role },
      type: QueryTypes.SELECT,
    },
  );
}

export async function createPanel(values: CreationAttributes<Panel>, transaction?: Transaction) {
  return Panel.create(values, { transaction });
}

export async function updatePanel(id: number, values: Partial<CreationAttributes<Panel>>, transaction?: Transaction) {
  await Panel.update(values, { where: { id }, transaction });
}

/** The job's panels not archived, with their job, locked for the change (a change to the job's supply). */
export async function jobPanelsForUpdate(organisationId: number, jobId: number, transaction: Transaction) {
  const panels = await Panel.findAll({
    where: { organisationId, jobId, archivedAt: null },
    include: [{ model: Job, as: 'job', required: true }],
    transaction,
    lock: { level: transaction.LOCK.UPDATE, of: Panel },
  });
  return panels as Array<Panel & { job: Job }>;
}

export async function createLoad(values: CreationAttributes<Load>, transaction?: Transaction) {
  return Load.create(values, { transaction });
}

/** New motors in one statement; with `updateOnDuplicate`, changed fields of existing motors in one statement. */
export async function saveLoads(
  rows: Array<CreationAttributes<Load>>,
  transaction: Transaction,
  updateOnDuplicate?: Array<keyof CreationAttributes<Load>>,
) {
  await Load.bulkCreate(rows, { transaction, ...(updateOnDuplicate ? { updateOnDuplicate } : {}) });
}

export async function lastLoadPosition(panelId: number, transaction?: Transaction): Promise<number> {
  return (await Load.max<number, Load>('position', { where: { panelId }, transaction })) ?? 0;
}

/** Changes a motor; with `version`, only while it is still that version. Returns the rows changed. */
export async function updateLoad(id: number, values: Partial<CreationAttributes<Load>>, transaction: Transaction, version?: number) {
  const [count] = await Load.update(values, { where: version === undefined ? { id } : { id, version }, transaction });
  return count;
}

export async function deleteLoad(id: number, transaction: Transaction) {
  await Load.destroy({ where: { id }, transaction });
}

export async function createComment(values: CreationAttributes<Comment>, transaction?: Transaction) {
  return Comment.create(values, { transaction });
}

export async function createRevision(values: CreationAttributes<Revision>, transaction: Transaction) {
  return Revision.create(values, { transaction });
}

export async function findRevision(organisationId: number, panelId: number, number: number, transaction?: Transaction) {
  return Revision.findOne({ where: { organisationId, panelId, number }, transaction });
}
