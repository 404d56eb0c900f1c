// Reads a whole job for its backup and writes a restored one. Reads take one query per table
// whatever the panel and motor counts.
import { Op, UniqueConstraintError, type CreationAttributes, type Transaction } from 'sequelize';
import { Job } from '../../db/models/job';
import { Panel } from '../../db/models/panel';
import { Load } from '../../db/models/load';
import { Comment } from '../../db/models/comment';
import { Revision } from '../../db/models/revision';
import { BomLineRow } from '../../db/models/bom-line';
import { User } from '../../db/models/user';

export async function findJob(organisationId: number, id: number) {
  return Job.findOne({ where: { organisationId, id } });
}

export async function jobContents(organisationId: number, jobId: number) {
  const panels = await Panel.findAll({ where: { organisationId, jobId }, order: [['id', 'ASC']] });
  const panelIds = panels.map((p) => p.id);
  const inPanels = { organisationId, panelId: { [Op.in]: panelIds } };
  const [loads, comments, revisions, bomLines] = await Promise.all([
    Load.findAll({
      where: inPanels,
      order: [
        ['panelId', 'ASC'],
        ['position', 'ASC'],
        ['id', 'ASC'],
      ],
    }),
    Comment.findAll({
      where: inPanels,
      order: [
        ['panelId', 'ASC'],
        ['id', 'ASC'],
      ],
    }),
    Revision.findAll({
      where: inPanels,
      order: [
        ['panelId', 'ASC'],
        ['number', 'ASC'],
      ],
    }),
    BomLineRow.findAll({
      where: inPanels,
      order: [
        ['panelId', 'ASC'],
        ['position', 'ASC'],
        ['id', 'ASC'],
      ],
    }),
  ]);
  const userIds = [
    ...new Set([...comments.map((c) => c.userId), ...revisions.map((r) => r.approvedBy)].filter((x): x is number => x !== null)),
  ];
  const users = userIds.length
    ? await User.findAll({ where: { organisationId, id: { [Op.in]: userIds } }, attributes: ['id', 'email', 'name'] })
    : [];
  return { panels, loads, comments, revisions, bomLines, users };
}

export async function usersByEmail(organisationId: number, emails: string[], transaction: Transaction) {
  if (emails.length === 0) return new Map<string, number>();
  const rows = await User.findAll({ where: { organisationId, email: { [Op.in]: emails } }, attributes: ['id', 'email'], transaction });
  return new Map(rows.map((u) => [u.email, u.id]));
}

export async function takenJobNumbers(organisationId: number, prefix: string, transaction: Transaction) {
  const rows = await Job.findAll({ where: { organisationId, number: { [Op.startsWith]: prefix } }, attributes: ['number'], transaction });
  return new Set(rows.map((r) => r.number.toLowerCase()));
}

// ---- writes of a restored job (all inside the import's transaction) ----

export async function insertJob(values: CreationAttributes<Job>, transaction: Transaction) {
  return Job.create(values, { transaction });
}

export async function insertPanel(values: CreationAttributes<Panel>, transaction: Transaction) {
  return Panel.create(values, { transaction });
}

/** The motors in one statement; returns their new ids in the order given. */
export async function insertLoads(rows: Array<CreationAttributes<Load>>, transaction: Transaction): Promise<number[]> {
  return (await Load.bulkCreate(rows, { transaction, returning: true })).map((l) => l.id);
}

export async function insertComments(rows: Array<CreationAttributes<Comment>>, transaction: Transaction) {
  await Comment.bulkCreate(rows, { transaction });
}

export async function insertRevisions(rows: Array<CreationAttributes<Revision>>, transaction: Transaction) {
  await Revision.bulkCreate(rows, { transaction });
}

export async function insertBomLines(rows: Array<CreationAttributes<BomLineRow>>, transaction: Transaction) {
  await BomLineRow.bulkCreate(rows, { transaction });
}

/** Marks the panel's bill of materials generated now, without touching the panel's own stamp. */
export async function markBomCurrent(panelId: number, transaction: Transaction) {
  await Panel.update({ bomGeneratedAt: new Date() }, { where: { id: panelId }, transaction, silent: true });
}

/** A unique index refused the write (two imports took the same job number at once). */
export function isUniqueViolation(err: unknown): boolean {
  return err instanceof UniqueConstraintError;
}
