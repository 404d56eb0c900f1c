// The decisions a rule may set (event.params.set), each with the schema of its value.
// Conflict resolution, applied generically by the runner: for each key the fired rule with the
// highest priority wins; equal priority and different values is a conflict reported as an error
// on the load (the rule with the lower id is kept so the result stays deterministic).

import { z } from 'zod';
import { ENCLOSURE_TYPES } from '../standards/nema-250-enclosure-types';

export const STARTER_TYPES = ['FVNR', 'FVR', 'RVSS', 'VFD', 'wye-delta', 'part-winding', 'two-speed', 'dc-armature-resistance', 'dc-drive'] as const;

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
