// Hand-built selections for the bill-of-materials tests, independent of the selection engine.
import fs from 'node:fs';
import path from 'node:path';
import type { LoadSelection, PanelRollup } from '../../../shared/schemas/selection';
import {
  CatalogueFileSchema,
  LabourUnitsFileSchema,
  type CatalogueItem,
  type CatalogueItemInput,
  type LabourUnit,
  CatalogueItemSchema,
} from '../../../shared/schemas/catalogue';
import { loadSelection, type DeepPartial } from '../../fixtures/selection';
import { isItemFile } from '../../../server/db/seeders/catalogue';

export const CATALOG_DIR = path.resolve(__dirname, '../../../catalog');

let cached: CatalogueItem[] | null = null;
/** Every item of the seed catalogue (all catalog/*.json except labour units). */
export function seedCatalogue(): CatalogueItem[] {
  if (!cached) {
    cached = fs
      .readdirSync(CATALOG_DIR)
      .filter(isItemFile)
      .sort()
      .flatMap((f) => CatalogueFileSchema.parse(JSON.parse(fs.readFileSync(path.join(CATALOG_DIR, f), 'utf8'))));
  }
  return cached;
}

export function seedLabourUnits(): LabourUnit[] {
  return LabourUnitsFileSchema.parse(JSON.parse(fs.readFileSync(path.join(CATALOG_DIR, 'labour-units.json'), 'utf8')));
}

export function item(input: CatalogueItemInput): CatalogueItem {
  return CatalogueItemSchema.parse(input);
}

/** A 10 hp, 460 V, three-phase FVNR motor (tests/fixtures/selection.ts) with `over` merged in. */
export function makeSelection(over: DeepPartial<LoadSelection> = {}): LoadSelection {
  return loadSelection(over);
}

export function makePanel(over: Partial<PanelRollup['feeder']> = {}, totalFlcAmps = 14): PanelRollup {
  return {
    feeder: { minAmpacity: 17.5, conductorSize: '10 AWG', ocpdMaxAmps: 35, basis: 'NEC 2023 430.24, 430.62(A)', ...over },
    totalFlcAmps,
    largestMotorTag: 'M-101',
  };
}

export const SUPPLY_480 = { volts: 480, phases: 3, hz: 60 };
