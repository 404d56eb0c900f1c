// The stored bills of materials: one row per line, in the panel's order.
import type { Transaction } from 'sequelize';
import { BomLineRow } from '../../db/models/bom-line';
import { Panel } from '../../db/models/panel';
import type { BomLine } from '../../../shared/schemas/catalogue';

const IN_ORDER: Array<[string, string]> = [
  ['position', 'ASC'],
  ['id', 'ASC'],
];

/** The panel's line rows in order (inside a change: the panel row is already the actor's). */
export async function bomRowsOf(panelId: number, transaction?: Transaction) {
  return BomLineRow.findAll({ where: { panelId }, order: IN_ORDER, transaction });
}

/** The panel's line rows in order, of the actor's organisation only. */
export async function bomRowsFor(organisationId: number, panelId: number | number[]) {
  return BomLineRow.findAll({ where: { organisationId, panelId }, order: IN_ORDER });
}

/** Writes the panel's lines anew in the order given and stamps the bill of materials generated now. */
export async function replaceBomLines(organisationId: number, panelId: number, lines: readonly BomLine[], transaction: Transaction) {
  await BomLineRow.destroy({ where: { panelId }, transaction });
  await BomLineRow.bulkCreate(
    lines.map((line, position) => ({ organisationId, panelId, position, line })),
    { transaction },
  );
  await Panel.update({ bomGeneratedAt: new Date() }, { where: { id: panelId }, transaction, silent: true });
}

export async function findBomLine(panelId: number, lineId: number, transaction: Transaction) {
  return BomLineRow.findOne({ where: { id: lineId, panelId }, transaction });
}

/** A line after the panel's last one. */
export async function appendBomLine(organisationId: number, panelId: number, line: BomLine, transaction: Transaction) {
  const last = (await BomLineRow.max('position', { where: { panelId }, transaction })) as number | null;
  return BomLineRow.create({ organisationId, panelId, position: (last ?? -1) + 1, line }, { transaction });
}

export async function updateBomLine(id: number, line: BomLine, transaction: Transaction) {
  await BomLineRow.update({ line }, { where: { id }, transaction });
}

export async function deleteBomLine(id: number, transaction: Transaction) {
  await BomLineRow.destroy({ where: { id }, transaction });
}

/** The job's panels that are not archived, by name. */
export async function jobPanels(organisationId: number, jobId: number) {
  return Panel.findAll({
    where: { organisationId, jobId, archivedAt: null },
    order: [
      ['name', 'ASC'],
      ['id', 'ASC'],
    ],
  });
}
