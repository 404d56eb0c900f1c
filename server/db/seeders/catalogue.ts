// Loads the generic catalogue (catalog/*.json) and the shop's labour units into an organisation.
import fs from 'node:fs';
import path from 'node:path';
import type { Transaction } from 'sequelize';
import { CatalogueFileSchema, LabourUnitsFileSchema, type CatalogueItem } from '../../../shared/schemas/catalogue';
import { CatalogueItem as CatalogueRow } from '../models/catalogue-item';
import { LabourUnit as LabourRow } from '../models/labour-unit';
import { CombinationRatingRow } from '../models/combination-rating';
import { CombinationFileSchema, type CombinationValues } from '../../../shared/schemas/combination';
import { fromItem } from '../../modules/catalogue/repository';

/** Files of catalog/ that are not catalogue items. */
const NOT_ITEMS = new Set(['labour-units.json', 'combination-ratings.json']);

/** Is this file of catalog/ a list of catalogue items? */
export function isItemFile(name: string): boolean {
  return name.endsWith('.json') && !NOT_ITEMS.has(name);
}

export const CATALOG_DIR = path.resolve(import.meta.dirname, '..', '..', '..', 'catalog');

export function readSeedCatalogue(dir = CATALOG_DIR): CatalogueItem[] {
  const items: CatalogueItem[] = [];
  for (const f of fs.readdirSync(dir).filter(isItemFile).sort()) {
    const parsed = CatalogueFileSchema.safeParse(JSON.parse(fs.readFileSync(path.join(dir, f), 'utf8')));
    if (!parsed.success) throw new Error(`catalog/${f}: ${parsed.error.issues[0]?.message}`);
    items.push(...parsed.data);
  }
  return items;
}

/** The seed's tested combination ratings (invented demo data), each naming parts of the seed catalogue. */
export function readSeedCombinations(dir = CATALOG_DIR): CombinationValues[] {
  return CombinationFileSchema.parse(JSON.parse(fs.readFileSync(path.join(dir, 'combination-ratings.json'), 'utf8')));
}

export function readSeedLabourUnits(dir = CATALOG_DIR) {
  return LabourUnitsFileSchema.parse(JSON.parse(fs.readFileSync(path.join(dir, 'labour-units.json'), 'utf8')));
}

export async function seedCatalogue(organisationId: number, transaction: Transaction) {
  await CatalogueRow.bulkCreate(
    readSeedCatalogue().map((i) => fromItem(organisationId, i)),
    { transaction },
  );
  await LabourRow.bulkCreate(
    readSeedLabourUnits().map((u) => ({ organisationId, key: u.key, label: u.description, hours: u.hours, per: u.per })),
    { transaction },
  );
  await CombinationRatingRow.bulkCreate(
    readSeedCombinations().map((c) => ({ ...c, organisationId })),
    { transaction },
  );
}
