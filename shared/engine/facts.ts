// Facts the rule files may use: one flat fact per answer or derived value, each with the schema of
// its values so that a rule comparing a fact with an impossible value is refused at load.
// Absent optional answers are null (never undefined) so every fact is always defined.

import { z } from 'zod';
import { ENVIRONMENTS, SCPD_TYPES, type Load, type Supply } from '../schemas/load';

const nullableNumber = z.number().nullable();

export const FACT_SCHEMAS = {
  supply: z.enum(['ac3', 'ac1', 'dc']),
  /** horsepower (kW converted) */
  hp: z.number(),
  kw: nullableNumber,
  volts: z.number(),
  hz: z.number(),
  /** table FLC (or nameplate where outside the tables); null when it could not be determined */
  flcAmps: nullableNumber,
  /** nameplate FLA, or the table FLC when no nameplate value was given */
  flaAmps: nullableNumber,
  flaGiven: z.boolean(),
  serviceFactor: z.number(),
  tempRiseC: nullableNumber,
  /** locked-rotor withstand (hot safe stall) time, s; null when not given */
  lockedRotorWithstandS: nullableNumber,
  codeLetter: z.string().nullable(),
  design: z.enum(['A', 'B', 'C', 'D']).nullable(),
  energyEfficient: z.boolean(),
  poles: nullableNumber,
  rotor: z.enum(['squirrel-cage', 'wound-rotor']),
  singlePhaseType: z.enum(['split-phase', 'capacitor-start', 'psc', 'two-value-capacitor']).nullable(),
  /** DC field; "shunt" assumed (and flagged) when a dc motor does not say */
  dcField: z.enum(['shunt', 'series', 'compound']).nullable(),
  leads: z.union([z.literal(3), z.literal(6), z.literal(9), z.literal(12)]).nullable(),
  connection: z.enum(['wye', 'delta']).nullable(),
  duty: z.enum(['continuous', 'intermittent']),
  jogging: z.boolean(),
  plugging: z.boolean(),
  reversing: z.boolean(),
  speedControl: z.enum(['fixed', 'variable']),
  turndown: nullableNumber,
  /** "constant" assumed (and flagged) for variable speed when not given */
  torque: z.enum(['variable', 'constant']).nullable(),
  startingLimit: z.enum(['none', 'reduced-inrush']),
  inertia: z.enum(['normal', 'high', 'very-high']),
  reverseRotationHazard: z.boolean(),
  critical: z.boolean(),
  /** "indoor-dusty" assumed (and flagged) when not given */
  environment: z.enum(ENVIRONMENTS),
  environmentGiven: z.boolean(),
  scpdType: z.enum(SCPD_TYPES),
  conductorMaterial: z.enum(['cu', 'al']),
  conductorTempRatingC: z.union([z.literal(60), z.literal(75), z.literal(90)]),
  cableLengthFt: nullableNumber,
  twoSpeed: z.boolean(),
  starterPreference: z.enum(['rvss', 'wye-delta', 'part-winding']).nullable(),
  insideDelta: z.boolean(),
  quickStop: z.boolean(),
  supplyVolts: z.number(),
  supplyPhases: z.union([z.literal(1), z.literal(3)]),
  availableFaultKa: z.number(),
  ambientC: z.number(),
  voltageUnbalancePercent: z.number(),
} as const;

export type FactName = keyof typeof FACT_SCHEMAS;
export type Facts = { [K in FactName]: z.output<(typeof FACT_SCHEMAS)[K]> };

export const FACT_NAMES = Object.keys(FACT_SCHEMAS) as FactName[];

export function isFactName(name: string): name is FactName {
  return Object.hasOwn(FACT_SCHEMAS, name);
}

export function buildFacts(load: Load, supply: Supply, derived: { hp: number; flcAmps: number | null; flaAmps: number | null }): Facts {
  return {
    supply: load.supply,
    hp: derived.hp,
    kw: load.kw ?? null,
    volts: load.volts,
    hz: load.hz,
    flcAmps: derived.flcAmps,
    flaAmps: derived.flaAmps,
    flaGiven: load.fla !== undefined,
    serviceFactor: load.serviceFactor,
    tempRiseC: load.tempRiseC ?? null,
    lockedRotorWithstandS: load.lockedRotorWithstandS ?? null,
    codeLetter: load.codeLetter ?? null,
    design: load.design ?? null,
    energyEfficient: load.energyEfficient,
    poles: load.poles ?? null,
    rotor: load.rotor,
    singlePhaseType: load.singlePhaseType ?? null,
    dcField: load.supply === 'dc' ? (load.dcField ?? 'shunt') : null,
    leads: load.leads ?? null,
    connection: load.connection ?? null,
    duty: load.duty,
    jogging: load.jogging,
    plugging: load.plugging,
    reversing: load.reversing,
    speedControl: load.speedControl,
    turndown: load.turndown ?? null,
    torque: load.speedControl === 'variable' ? (load.torque ?? 'constant') : null,
    startingLimit: load.startingLimit,
    inertia: load.inertia,
    reverseRotationHazard: load.reverseRotationHazard,
    critical: load.critical,
    environment: load.environment ?? 'indoor-dusty',
    environmentGiven: load.environment !== undefined,
    scpdType: load.scpdType,
    conductorMaterial: load.conductor.material,
    conductorTempRatingC: load.conductor.tempRatingC,
    cableLengthFt: load.cableLengthFt ?? null,
    twoSpeed: load.twoSpeed,
    starterPreference: load.starterPreference ?? null,
    insideDelta: load.insideDelta,
    quickStop: load.quickStop,
    supplyVolts: supply.volts,
    supplyPhases: supply.phases,
    availableFaultKa: supply.availableFaultKa,
    ambientC: supply.ambientC,
    voltageUnbalancePercent: supply.voltageUnbalancePercent,
  };
}
