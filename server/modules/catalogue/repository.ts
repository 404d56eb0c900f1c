import { Op, type CreationAttributes, type Transaction, type WhereOptions } from 'sequelize';
import { FeedCache } from '../../db/change-feed';
import { CatalogueItem as CatalogueRow } from '../../db/models/catalogue-item';
import { LabourUnit as LabourRow } from '../../db/models/labour-unit';
import { CombinationRatingRow } from '../../db/models/combination-rating';
import type { CatalogueItem, LabourUnit } from '../../../shared/schemas/catalogue';

const OUTLINE_FIELDS = ['outlineWidthMm', 'outlineHeightMm', 'outlineDepthMm', 'clearanceAboveMm', 'clearanceBelowMm'] as const;

/** The dimensions a row holds, each left out where the column is null (as the schema reads an item without them). */
function outlineOf(r: CatalogueRow): Partial<Record<(typeof OUTLINE_FIELDS)[number], number>> {
  const out: Partial<Record<(typeof OUTLINE_FIELDS)[number], number>> = {};
  for (const key of OUTLINE_FIELDS) {
    const v = r[key];
    if (v !== null && v !== undefined) out[key] = v;
  }
  return out;
}

export function toItem(r: CatalogueRow): CatalogueItem {
  return {
    code: r.code,
    description: r.description,
    category: r.category as CatalogueItem['category'],
    unit: r.unit as CatalogueItem['unit'],
    ratings: r.ratings as CatalogueItem['ratings'],
    ...outlineOf(r),
    sccrKa: r.sccrKa,
    heatLossW: r.heatLossW,
    unitCost: r.unitCost,
    labourHours: r.labourHours,
    terminations: r.terminations,
    leadTimeDays: r.leadTimeDays,
    active: r.active,
  };
}

export function fromItem(organisationId: number, i: CatalogueItem) {
  return {
    organisationId,
    code: i.code,
    description: i.description,
    category: i.category,
    unit: i.unit,
    ratings: i.ratings as Record<string, unknown>,
    outlineWidthMm: i.outlineWidthMm ?? null,
    outlineHeightMm: i.outlineHeightMm ?? null,
    outlineDepthMm: i.outlineDepthMm ?? null,
    clearanceAboveMm: i.clearanceAboveMm ?? null,
    clearanceBelowMm: i.clearanceBelowMm ?? null,
    sccrKa: i.sccrKa,
    heatLossW: i.heatLossW,
    unitCost: i.unitCost,
    labourHours: i.labourHours,
    terminations: i.terminations,
    leadTimeDays: i.leadTimeDays,
    active: i.active,
  };
}

/**
 * The organisation's whole catalogue, in the shared shape (one query). Outside a transaction it is
 * kept per process while the change feed is live and no catalogue statement has run since (any
 * instance's insert, update or delete moves the feed's token); the items are frozen, as every caller
 * shares them. Inside a transaction it is always read, so the transaction sees its own snapshot.
 */
const catalogues = new FeedCache<number, readonly CatalogueItem[]>(['c']);

async function readCatalogue(organisationId: number, transaction?: Transaction): Promise<readonly CatalogueItem[]> {
  const rows = await CatalogueRow.findAll({
    where: { organisationId },
    order: [
      ['category', 'ASC'],
      ['code', 'ASC'],
    ],
    transaction,
  });
  return Object.freeze(
    rows.map((r) => {
      const item = toItem(r);
      return Object.freeze({ ...item, ratings: Object.freeze({ ...item.ratings }) }) as CatalogueItem;
    }),
  );
}

export async function catalogueFor(organisationId: number, transaction?: Transaction): Promise<readonly CatalogueItem[]> {
  return transaction ? readCatalogue(organisationId, transaction) : catalogues.get(organisationId, () => readCatalogue(organisationId));
}

export async function labourUnitsFor(organisationId: number, transaction?: Transaction): Promise<LabourUnit[]> {
  const rows = await LabourRow.findAll({ where: { organisationId }, order: [['key', 'ASC']], transaction });
  return rows.map((r) => ({ key: r.key as LabourUnit['key'], description: r.label, hours: r.hours, per: r.per as LabourUnit['per'] }));
}

// ---- catalogue items ----

export type { CatalogueRow };

/** Items matching a search: category, active flag and a code or description fragment (case-insensitive). */
export async function searchItems(organisationId: number, f: { category?: string; active: boolean | null; like: string | null }) {
  const and: WhereOptions[] = [{ organisationId }];
  if (f.category) and.push({ category: f.category });
  if (f.active !== null) and.push({ active: f.active });
  if (f.like) and.push({ [Op.or]: [{ code: { [Op.iLike]: f.like } }, { description: { [Op.iLike]: f.like } }] });
  return CatalogueRow.findAll({
    where: { [Op.and]: and },
    order: [
      ['category', 'ASC'],
      ['code', 'ASC'],
    ],
  });
}

export async function findItem(organisationId: number, id: number, transaction?: Transaction, lock = false) {
  return CatalogueRow.findOne({
    where: { organisationId, id },
    transaction,
    lock: lock && transaction ? transaction.LOCK.UPDATE : undefined,
  });
}

export async function findItemByCode(organisationId: number, code: string, transaction: Transaction) {
  return CatalogueRow.findOne({ where: { organisationId, code }, transaction });
}

export async function itemById(id: number, transaction: Transaction) {
  return CatalogueRow.findByPk(id, { transaction });
}

/** The items of the given codes, by code (one query). */
export async function itemsByCode(
  organisationId: number,
  codes: readonly string[],
  transaction: Transaction,
): Promise<Map<string, CatalogueRow>> {
  return new Map(
    (await CatalogueRow.findAll({ where: { organisationId, code: { [Op.in]: [...codes] } }, transaction })).map((i) => [i.code, i]),
  );
}

/** Every item of the organisation, by category and code; locked for an import when `lock`. */
export async function allItemRows(organisationId: number, transaction?: Transaction, lock = false) {
  return CatalogueRow.findAll({
    where: { organisationId },
    order: lock
      ? undefined
      : [
          ['category', 'ASC'],
          ['code', 'ASC'],
        ],
    transaction,
    lock: lock && transaction ? transaction.LOCK.UPDATE : undefined,
  });
}

export async function insertItem(organisationId: number, item: CatalogueItem, transaction: Transaction) {
  return CatalogueRow.create(fromItem(organisationId, item), { transaction });
}

/** New items in one statement; returns their rows in the order given. */
export async function insertItems(organisationId: number, items: readonly CatalogueItem[], transaction: Transaction) {
  return CatalogueRow.bulkCreate(
    items.map((i) => fromItem(organisationId, i)),
    { transaction, returning: true },
  );
}

/** Writes an item's fields and its next version; with `version`, only while it is still that version. Returns the rows changed. */
export async function writeItem(
  organisationId: number,
  id: number,
  item: CatalogueItem,
  nextVersion: number,
  transaction: Transaction,
  version?: number,
) {
  const [count] = await CatalogueRow.update(
    { ...fromItem(organisationId, item), version: nextVersion },
    { where: version === undefined ? { id } : { id, version }, transaction },
  );
  return count;
}

// ---- labour units ----

export async function labourRows(organisationId: number) {
  return LabourRow.findAll({ where: { organisationId }, order: [['key', 'ASC']] });
}

export async function findLabourUnitForUpdate(organisationId: number, key: string, transaction: Transaction) {
  return LabourRow.findOne({ where: { organisationId, key }, transaction, lock: transaction.LOCK.UPDATE });
}

export async function writeLabourUnit(
  id: number,
  version: number,
  values: { hours?: number; label?: string; version: number },
  transaction: Transaction,
) {
  const [count] = await LabourRow.update(values, { where: { id, version }, transaction });
  return count;
}

// ---- tested combinations ----

export async function activeCombinationRows(organisationId: number) {
  return CombinationRatingRow.findAll({ where: { organisationId, active: true }, order: [['ref', 'ASC']] });
}

export async function combinationRows(organisationId: number) {
  return CombinationRatingRow.findAll({ where: { organisationId }, order: [['ref', 'ASC']] });
}

export async function findCombinationByRef(organisationId: number, ref: string, transaction: Transaction) {
  return CombinationRatingRow.findOne({ where: { organisationId, ref }, transaction });
}

export async function findCombinationForUpdate(organisationId: number, id: number, transaction: Transaction) {
  return CombinationRatingRow.findOne({ where: { organisationId, id }, transaction, lock: transaction.LOCK.UPDATE });
}

/** The combinations of the given refs, by ref, locked for an import. */
export async function combinationsByRefForUpdate(organisationId: number, refs: readonly string[], transaction: Transaction) {
  return new Map(
    (
      await CombinationRatingRow.findAll({
        where: { organisationId, ref: { [Op.in]: [...refs] } },
        transaction,
        lock: transaction.LOCK.UPDATE,
      })
    ).map((r) => [r.ref, r]),
  );
}

export async function insertCombination(values: CreationAttributes<CombinationRatingRow>, transaction: Transaction) {
  return CombinationRatingRow.create(values, { transaction });
}

export async function insertCombinations(rows: Array<CreationAttributes<CombinationRatingRow>>, transaction: Transaction) {
  await CombinationRatingRow.bulkCreate(rows, { transaction });
}

/** Changes a combination row in place (the row passed in carries the new values afterwards). */
export async function writeCombination(
  row: CombinationRatingRow,
  values: Partial<CreationAttributes<CombinationRatingRow>>,
  transaction: Transaction,
) {
  await row.update(values, { transaction });
}

export async function labourUnitById(id: number, transaction: Transaction) {
  return LabourRow.findByPk(id, { transaction });
}
