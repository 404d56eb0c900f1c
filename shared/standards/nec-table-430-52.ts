// NEC 2023 Table 430.52, Maximum Rating or Setting of Motor Branch-Circuit Short-Circuit and
// Ground-Fault Protective Devices (percent of full-load current). Same percentages in NEC 2020.
// Transcribed from memory. 430.52(C)(1) Exception 2 limits are carried for explicit overrides.

import { OutsideTableError } from '../errors';

export const TABLE_430_52 = 'Table 430.52';

export type ProtectiveDevice = 'non-time-delay-fuse' | 'dual-element-fuse' | 'instantaneous-trip-breaker' | 'inverse-time-breaker';

export type MotorKind =
  | 'single-phase'
  | 'squirrel-cage'
  | 'squirrel-cage-design-b-energy-efficient'
  | 'wound-rotor'
  | 'dc-constant-voltage';

const PERCENT: Record<MotorKind, Record<ProtectiveDevice, number>> = {
  'single-phase': { 'non-time-delay-fuse': 300, 'dual-element-fuse': 175, 'instantaneous-trip-breaker': 800, 'inverse-time-breaker': 250 },
  'squirrel-cage': { 'non-time-delay-fuse': 300, 'dual-element-fuse': 175, 'instantaneous-trip-breaker': 800, 'inverse-time-breaker': 250 },
  'squirrel-cage-design-b-energy-efficient': {
    'non-time-delay-fuse': 300,
    'dual-element-fuse': 175,
    'instantaneous-trip-breaker': 1100,
    'inverse-time-breaker': 250,
  },
  'wound-rotor': { 'non-time-delay-fuse': 150, 'dual-element-fuse': 150, 'instantaneous-trip-breaker': 800, 'inverse-time-breaker': 150 },
  'dc-constant-voltage': {
    'non-time-delay-fuse': 150,
    'dual-element-fuse': 150,
    'instantaneous-trip-breaker': 250,
    'inverse-time-breaker': 150,
  },
};

export function maxPercent430_52(motor: MotorKind, device: ProtectiveDevice): number {
  const row = (PERCENT as Record<string, Record<string, number> | undefined>)[motor];
  const v = row?.[device];
  if (v === undefined) throw new OutsideTableError(TABLE_430_52, `no entry for ${motor} with ${device}`);
  return v;
}

/**
 * Upper limits of 430.52(C)(1) Exception 2 (motor will not start) and 430.52(C)(3) Exception 1
 * (instantaneous-trip setting), percent of FLC. Only for an explicit override with a reason.
 * NTD fuse: 400 % (fuses up to 600 A; 300 % for 601–6000 A); time-delay fuse: 225 %;
 * inverse-time breaker: 400 % for FLC <= 100 A, 300 % above; instantaneous trip: 1300 %
 * (1700 % for Design B energy-efficient). DC instantaneous trip is not raised.
 */
export function exception2LimitPercent(motor: MotorKind, device: ProtectiveDevice, flcAmps: number, fuseRatingAmps?: number): number {
  switch (device) {
    case 'non-time-delay-fuse':
      return fuseRatingAmps !== undefined && fuseRatingAmps > 600 ? 300 : 400;
    case 'dual-element-fuse':
      return 225;
    case 'inverse-time-breaker':
      return flcAmps <= 100 ? 400 : 300;
    case 'instantaneous-trip-breaker':
      if (motor === 'dc-constant-voltage') return 250;
      return motor === 'squirrel-cage-design-b-energy-efficient' ? 1700 : 1300;
  }
}
