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

export const CATALOG_DIR = path.resolve(__dirname, '../../../catalog');

let cached: CatalogueItem[] | null = null;
/** Every item of the seed catalogue (all catalog/*.json except labour units). */
export function seedCatalogue(): CatalogueItem[] {
  if (!cached) {
    cached = fs
      .readdirSync(CATALOG_DIR)
      .filter((f) => f.endsWith('.json') && f !== 'labour-units.json')
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

type DeepPartial<T> = { [K in keyof T]?: T[K] extends object | null ? DeepPartial<NonNullable<T[K]>> | T[K] : T[K] };

/**
 * A 10 hp, 460 V, three-phase FVNR motor as the engine would describe it.
 * FLC 14 A is NEC 2023 Table 430.250 (10 hp, 460 V); the rest follows from it (from memory):
 * inverse-time breaker 250 % × 14 = 35 A (Table 430.52), overload 125 % × FLA, conductor 125 % × 14 = 17.5 A → 14 AWG.
 */
export function makeSelection(over: DeepPartial<LoadSelection> = {}): LoadSelection {
  const base: LoadSelection = {
    tag: 'M-101',
    description: 'Transfer pump',
    supply: 'ac3',
    hp: 10,
    volts: 460,
    tableVolts: 460,
    flcAmps: 14,
    flcSource: 'NEC 2023 Table 430.250',
    flaAmps: 13.2,
    lockedRotorAmps: null,
    synchronousRpm: 1800,
    starter: { type: 'FVNR', nemaSize: '1', iecCategory: null, iecAmps: null, reversingContactors: false, interlock: false, basis: 'NEMA ICS 2' },
    overload: { maxSettingAmps: 16.5, maxPercent: 125, tripClass: 20, providedByDrive: false, basis: 'NEC 2023 430.32(A)(1)' },
    scpd: { type: 'inverse-time-breaker', maxPercent: 250, ratingAmps: 35, computedMaxAmps: 35, basis: 'NEC 2023 Table 430.52' },
    conductor: { minAmpacity: 17.5, size: '14 AWG', material: 'cu', tempRatingC: 75, ampacity: 20, basis: 'NEC 2023 430.22, Table 310.16' },
    disconnect: { minAmps: 16.1, minHp: 10, basis: 'NEC 2023 430.110(A)' },
    relays: { phaseLoss: false, phaseReversal: false, phaseLossByOverload: false },
    enclosure: { nemaType: '12', ipCode: 'IP54', flagForEngineer: false },
    vfd: null,
    softStarter: null,
    dc: null,
    cautions: [],
    assumed: [],
    trace: [],
    errors: [],
  };
  return merge(base, over) as LoadSelection;
}

function merge(a: unknown, b: unknown): unknown {
  if (b === undefined) return a;
  if (b === null || typeof b !== 'object' || Array.isArray(b) || a === null || typeof a !== 'object') return b;
  const out: Record<string, unknown> = { ...(a as Record<string, unknown>) };
  for (const [k, v] of Object.entries(b as Record<string, unknown>)) out[k] = merge(out[k], v);
  return out;
}

export function makePanel(over: Partial<PanelRollup['feeder']> = {}, totalFlcAmps = 14): PanelRollup {
  return {
    feeder: { minAmpacity: 17.5, conductorSize: '10 AWG', ocpdMaxAmps: 35, basis: 'NEC 2023 430.24, 430.62(A)', ...over },
    totalFlcAmps,
    largestMotorTag: 'M-101',
  };
}

export const SUPPLY_480 = { volts: 480, phases: 3, hz: 60 };
