// The decisions a rule may set (event.params.set), each with the schema of its value.
// Conflict resolution, applied generically by the runner: for each key the fired rule with the
// highest priority wins; equal priority and different values is a conflict reported as an error
// on the load (the rule with the lower id is kept so the result stays deterministic).

import { z } from 'zod';
import type { StarterType } from '../schemas/selection';
import { ENCLOSURE_TYPES } from '../standards/nema-250-enclosure-types';

export const STARTER_TYPES = [
  'FVNR',
  'FVR',
  'RVSS',
  'VFD',
  'wye-delta',
  'part-winding',
  'two-speed',
  'dc-armature-resistance',
  'dc-drive',
] as const;

export const DECISION_SCHEMAS = {
  'starter.type': z.enum(STARTER_TYPES),
  'starter.reversingContactors': z.boolean(),
  'starter.interlock': z.boolean(),
  'starter.nemaDuty': z.enum(['normal', 'plugging-jogging']),
  'starter.iecCategory': z.enum(['AC-3', 'AC-4']),
  'overload.tripClass': z.union([z.literal(10), z.literal(20), z.literal(30)]),
  'overload.providedByDrive': z.boolean(),
  'relays.phaseLoss': z.boolean(),
  'relays.phaseReversal': z.boolean(),
  'relays.phaseLossByOverload': z.boolean(),
  'enclosure.nemaType': z.enum(ENCLOSURE_TYPES.map((e) => e.nemaType) as [string, ...string[]]),
  'enclosure.flagForEngineer': z.boolean(),
  'vfd.duty': z.enum(['normal', 'heavy']),
  'vfd.inverterDutyMotor': z.boolean(),
  'vfd.outputFilter': z.enum(['none', 'dv-dt', 'sine-wave']),
  'softStarter.bypass': z.boolean(),
  'softStarter.insideDelta': z.boolean(),
  'dc.fieldLossProtection': z.boolean(),
  'dc.dynamicBraking': z.boolean(),
} as const;

export type DecisionKey = keyof typeof DECISION_SCHEMAS;
export type Decisions = { [K in DecisionKey]?: z.output<(typeof DECISION_SCHEMAS)[K]> };

export const DECISION_KEYS = Object.keys(DECISION_SCHEMAS) as DecisionKey[];

export function isDecisionKey(key: string): key is DecisionKey {
  return Object.hasOwn(DECISION_SCHEMAS, key);
}

/**
 * Decisions every load needs, by supply, with the value the selection carries on when a rule set
 * leaves one undecided (reported as an error on the load, never silently).
 */
export const REQUIRED_DECISIONS: Record<'ac' | 'dc', Partial<Decisions>> = {
  ac: {
    'starter.type': 'FVNR',
    'starter.nemaDuty': 'normal',
    'starter.iecCategory': 'AC-3',
    'overload.tripClass': 10,
    'enclosure.nemaType': '12',
  },
  dc: { 'starter.type': 'FVNR', 'overload.tripClass': 10, 'enclosure.nemaType': '12' },
};

/** The value a result carries for a decision no rule made where the decision is not required. */
export const UNDECIDED: Required<
  Pick<
    Decisions,
    | 'vfd.duty'
    | 'vfd.inverterDutyMotor'
    | 'vfd.outputFilter'
    | 'softStarter.bypass'
    | 'softStarter.insideDelta'
    | 'dc.fieldLossProtection'
    | 'dc.dynamicBraking'
    | 'starter.reversingContactors'
    | 'starter.interlock'
    | 'overload.providedByDrive'
    | 'relays.phaseLoss'
    | 'relays.phaseReversal'
    | 'relays.phaseLossByOverload'
    | 'enclosure.flagForEngineer'
  >
> = {
  'vfd.duty': 'heavy',
  'vfd.inverterDutyMotor': false,
  'vfd.outputFilter': 'none',
  'softStarter.bypass': true,
  'softStarter.insideDelta': false,
  'dc.fieldLossProtection': false,
  'dc.dynamicBraking': false,
  'starter.reversingContactors': false,
  'starter.interlock': false,
  'overload.providedByDrive': false,
  'relays.phaseLoss': false,
  'relays.phaseReversal': false,
  'relays.phaseLossByOverload': false,
  'enclosure.flagForEngineer': false,
};

/**
 * What each starter type needs of the motor: its supply, and for wye-delta six or twelve leads wound
 * to run in delta (common practice). A rule set that decides a starter the motor cannot take is an
 * error on the load.
 */
export const STARTER_NEEDS: Record<StarterType, { ac: boolean; leads?: readonly number[]; connection?: 'delta'; error?: string }> = {
  FVNR: { ac: true },
  FVR: { ac: true },
  RVSS: { ac: true },
  VFD: { ac: true },
  'wye-delta': {
    ac: true,
    leads: [6, 12],
    connection: 'delta',
    error: 'wye-delta starting needs a six- or twelve-lead motor wound to run in delta',
  },
  'part-winding': { ac: true },
  'two-speed': { ac: true },
  'dc-armature-resistance': { ac: false },
  'dc-drive': { ac: false },
};

/** Starters built from contactors sized by NEMA size and IEC category, and each contactor's share of the motor current. */
export const CONTACTOR_SHARE: Partial<Record<StarterType, { share: number; nemaSized: boolean }>> = {
  FVNR: { share: 1, nemaSized: true },
  FVR: { share: 1, nemaSized: true },
  'two-speed': { share: 1, nemaSized: true },
  'wye-delta': { share: 1 / Math.sqrt(3), nemaSized: false },
  'part-winding': { share: 0.5, nemaSized: false },
};
