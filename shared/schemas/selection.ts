// The contract of the selection engine's output: one LoadSelection per motor, one PanelRollup per panel.
// Written once here; the engine (shared/engine), the bill of materials (shared/calc/bom) and the
// panel checks (shared/calc/sccr, heat, cpt) all read this shape.

export type StarterType =
  | 'FVNR'
  | 'FVR'
  | 'RVSS'
  | 'VFD'
  | 'wye-delta'
  | 'part-winding'
  | 'two-speed'
  | 'dc-armature-resistance'
  | 'dc-drive';

export type ScpdType =
  | 'inverse-time-breaker'
  | 'instantaneous-trip-breaker'
  | 'dual-element-fuse'
  | 'non-time-delay-fuse';

export type SupplyKind = 'ac3' | 'ac1' | 'dc';

export interface TraceEntry {
  ruleId: string;
  /** what was decided, e.g. "starter.type = FVR" */
  decision: string;
  /** plain-language reason */
  reason: string;
  /** code section / standard clause with edition, or "common practice" */
  basis: string;
}

export interface AssumedInput {
  /** input path, e.g. "fla" or "codeLetter" */
  field: string;
  /** what value the engine used instead */
  assumed: string;
  /** why, in words */
  note: string;
}

/** The overload relay as wired: the current it carries at full load, its dial setting and its limit. */
export interface OverloadRelay {
  /** the share of the motor's line current the relay carries: 1, 1/√3 or 1/2 */
  share: number;
  /** relays per motor */
  count: number;
  /** dial setting at full load: nameplate FLA × share */
  settingAmps: number;
  /** the 430.32(A)(1) limit as the relay sees it: maximum setting × share */
  maxAmps: number;
  note: string | null;
  basis: string;
}

/** A three-phase motor on the site's measured voltage unbalance (NEMA MG 1 14.35). */
export interface UnbalanceResult {
  percent: number;
  /** factor on rated horsepower; null above 5 % (operation not recommended) */
  deratingFactor: number | null;
  /** rated horsepower × factor, when the horsepower is known */
  deratedHp: number | null;
  basis: string;
}

/** Part-winding motors (NEC 430.4): a protective device on each half-winding's connection. */
export interface PerWindingScpd {
  /** devices, one per half-winding connection */
  count: 2;
  /** one-half of the Table 430.52 percentage */
  maxPercent: number;
  computedMaxAmps: number;
  ratingAmps: number;
  basis: string;
}

/** The conductors between the controller and the motor where they carry a share of the line current
 *  (wye-start delta-run 430.22(C), part-winding 430.22(D)). */
export interface MotorLeadConductors {
  /** conductors between controller and motor (six leads for both starters) */
  count: number;
  /** share of the motor full-load current the sizing is based on: 0.58 or 0.5 */
  share: number;
  minAmpacity: number;
  size: string;
  ampacity: number;
  basis: string;
}

import type { VoltageDropResult } from '../calc/voltage-drop';

export interface LoadSelection {
  tag: string;
  description?: string;
  supply: SupplyKind;
  hp: number | null;
  volts: number;
  /** table column voltage used (e.g. 460 for a 480 V motor) */
  tableVolts: number | null;
  /** NEC Table 430.247/430.248/430.250 full-load current (or nameplate when outside the tables) */
  flcAmps: number;
  flcSource: string;
  /** nameplate FLA used for the overload (or the table FLC when assumed) */
  flaAmps: number;
  lockedRotorAmps: { min: number; max: number; basis: string } | null;
  synchronousRpm: number | null;
  starter: {
    type: StarterType;
    /** NEMA ICS 2 size: "00", "0", "1", ... "9", or null for drives / soft starters / DC */
    nemaSize: string | null;
    /** IEC utilisation-category current for the contactor (AC-3, or AC-4 for jogging/plugging) */
    iecCategory: 'AC-3' | 'AC-4' | null;
    iecAmps: number | null;
    reversingContactors: boolean;
    /** mechanical + electrical interlock on a reversing pair */
    interlock: boolean;
    basis: string;
  };
  overload: {
    /** max setting in amperes per NEC 430.32(A)(1) */
    maxSettingAmps: number;
    maxPercent: number;
    tripClass: 10 | 20 | 30;
    /** where a listed drive's electronic overload serves (430.124) */
    providedByDrive: boolean;
    basis: string;
    /** the relay as wired: share of line current, setting and limit per relay (absent in selections stored before it existed) */
    relay?: OverloadRelay;
  };
  scpd: {
    type: ScpdType;
    maxPercent: number;
    /** standard rating chosen (240.6(A)), next higher where 430.52(C)(1) Exc. 1 allows */
    ratingAmps: number;
    /** the arithmetic maximum before rounding */
    computedMaxAmps: number;
    basis: string;
    /** part-winding motors: the alternative of a device on each half-winding (430.4); absent otherwise */
    perWinding?: PerWindingScpd;
  };
  conductor: {
    minAmpacity: number;
    size: string;
    material: 'cu' | 'al';
    tempRatingC: 60 | 75 | 90;
    ampacity: number;
    basis: string;
    /** wye-delta and part-winding starters: the conductors from controller to motor (absent otherwise) */
    motorLeads?: MotorLeadConductors;
    /** running voltage drop over the given cable length (absent when no length was given) */
    voltageDrop?: VoltageDropResult;
  };
  disconnect: { minAmps: number; minHp: number | null; basis: string };
  relays: { phaseLoss: boolean; phaseReversal: boolean; phaseLossByOverload: boolean };
  enclosure: { nemaType: string; ipCode: string; flagForEngineer: boolean };
  vfd: null | {
    duty: 'normal' | 'heavy';
    minOutputAmps: number;
    inverterDutyMotor: boolean;
    outputFilter: 'none' | 'dv-dt' | 'sine-wave';
    basis: string;
  };
  softStarter: null | { minAmps: number; insideDelta: boolean; bypass: boolean };
  dc: null | { fieldLossProtection: boolean; dynamicBraking: boolean; field: 'shunt' | 'series' | 'compound' };
  /** how the coil is commanded (the motor answer; absent in selections stored before it existed: three-wire) */
  controlScheme?: 'three-wire' | 'two-wire' | 'hand-off-auto';
  /** the site's voltage unbalance and the derating it calls for (absent: none given, or not a three-phase motor on the line) */
  unbalance?: UnbalanceResult | null;
  cautions: string[];
  assumed: AssumedInput[];
  trace: TraceEntry[];
  /** per-load errors (e.g. rating outside the tables with no nameplate FLA) */
  errors: string[];
}

export interface PanelRollup {
  feeder: {
    minAmpacity: number;
    conductorSize: string;
    ocpdMaxAmps: number;
    basis: string;
  };
  /** sum of table FLCs, used for the 409.110 nameplate full-load current */
  totalFlcAmps: number;
  largestMotorTag: string | null;
  /** optional (added by the engine): how the roll-up was formed, loads left out and why */
  notes?: string[];
  /** optional (added by the engine): roll-up problems, e.g. a feeder beyond the tables */
  errors?: string[];
}

export interface SelectionOutput {
  results: LoadSelection[];
  panel: PanelRollup;
  codeEdition: string;
}
