import type { Transaction } from 'sequelize';
import { FeedCache } from '../../db/change-feed';
import { CatalogueItem as CatalogueRow } from '../../db/models/catalogue-item';
import { LabourUnit as LabourRow } from '../../db/models/labour-unit';
import type { CatalogueItem, LabourUnit } from '../../../shared/schemas/catalogue';

export function toItem(r: CatalogueRow): CatalogueItem {
  return {
    code: r.code,
    description: r.description,
    category: r.category as CatalogueItem['category'],
    unit: r.unit as CatalogueItem['unit'],
    ratings: r.ratings as CatalogueItem['ratings'],
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
  const rows = await CatalogueRow.findAll({ where: { organisationId }, order: [['category', 'ASC'], ['code', 'ASC']], transaction });
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
