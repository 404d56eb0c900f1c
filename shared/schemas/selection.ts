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

export type ScpdType = 'inverse-time-breaker' | 'instantaneous-trip-breaker' | 'dual-element-fuse' | 'non-time-delay-fuse';

export type SupplyKind = 'ac3' | 'ac1' | 'dc';

export interface TraceEntry {
  ruleId: string;
  /** what was decided, e.g. "starter.type = FVR" */
  decision: string;
  /** the same in words for people, without decision keys (selections stored before it have none) */
  words?: string;
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
import type { GroupCircuit } from './group-circuit';

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
    /** the branch conductors if the terminations are held to 60 °C (110.14(C)(1)(a)): present only when
     *  the panel's terminations are taken as listed for 75 °C and the 60 °C size differs */
    termination60C?: { size: string; ampacity: number; minAmpacity: number; basis: string };
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
  /** the transformers and DC supplies the panel carries for motors at another voltage (shared/calc/other-sources) */
  otherSources?: OtherSource[];
  /** motors at another voltage fed from a source outside the panel: left out of the feeder and the full-load current */
  externalMotors?: ExternalMotor[];
  /** the other sources' primary (input) currents counted in the feeder and the 409.110 full-load current, A */
  otherLoadsAmps?: number;
  /** motors on one branch circuit (430.53), by group tag (absent: none grouped) */
  groups?: GroupCircuit[];
  /** drives that feed several motors (shared/calc/shared-drives); absent or empty: every drive feeds one motor */
  sharedDrives?: SharedDrive[];
  /** motors that name a shared drive and could not join it, or drives whose motors disagree, in words */
  sharedDriveErrors?: string[];
}

/** A motor on a shared drive: its own overload relay, output contactor and conductors. */
export interface SharedDriveMotor {
  tag: string;
  /** table full-load current (430.6(A)(1)): conductors and protection */
  flcAmps: number;
  /** nameplate FLA (the table FLC where none was given): the drive's output and the overload setting */
  flaAmps: number;
  overload: { settingAmps: number; maxSettingAmps: number; maxPercent: number; tripClass: 10 | 20 | 30; basis: string };
  outputContactor: { minAc3Amps: number; basis: string };
  conductor: { minAmpacity: number; size: string; ampacity: number; material: 'cu' | 'al'; tempRatingC: 60 | 75 | 90; basis: string };
}

/** One drive feeding several motors at one voltage, sized for their sum. */
export interface SharedDrive {
  tag: string;
  supply: 'ac3' | 'ac1';
  volts: number;
  motors: SharedDriveMotor[];
  sumFlcAmps: number;
  sumFlaAmps: number;
  output: { duty: 'normal' | 'heavy'; minOutputAmps: number; outputFilter: 'none' | 'dv-dt' | 'sine-wave'; basis: string };
  /** the drive's input branch circuit (430.122(A), 430.130) */
  input: {
    /** the drive's rated input current as given on its motors' answers; null when none was given */
    ratedInputAmps: number | null;
    /** the current the input circuit and the feeder count: the rated input current, at least the sum of the table FLCs */
    amps: number;
    conductor: { minAmpacity: number; size: string; ampacity: number; basis: string };
    protection: { type: ScpdType; maxPercent: number; computedMaxAmps: number; ratingAmps: number; basis: string };
  };
  /** the conductors from the drive's output terminals to the motors' taps */
  outputConductor: { minAmpacity: number; size: string; ampacity: number; basis: string };
  cautions: string[];
}

/** A motor fed from one of the panel's other sources. */
export interface OtherSourceMotor {
  tag: string;
  supply: SupplyKind;
  volts: number;
  /** the current it draws from the source: its FLC, or a DC drive's AC line current */
  amps: number;
  /** the voltage of the circuit it is on (120 or 240 on a 240/120 V secondary, the DC voltage …) */
  circuitVolts: number;
}

export interface SourceProtection {
  /** NEC Table 450.3(B) method (transformers) or the maker's instructions (DC supplies) */
  method: 'primary-only' | 'primary-and-secondary' | 'input';
  percent: number;
  maxAmps: number;
  ratingAmps: number;
  basis: string;
}

/** A transformer or DC supply inside the panel, sized from the motors it feeds. */
export interface OtherSource {
  kind: 'transformer' | 'dc-supply';
  /** T1, T2 … / DC1 … */
  tag: string;
  /** what it delivers, e.g. "480-240/120 V single-phase", "240 V DC" */
  description: string;
  /** transformer phases, or the DC supply's input phases */
  phases: 1 | 3;
  primaryVolts: number;
  /** secondary line voltage (transformer) or DC output voltage */
  secondaryVolts: number;
  /** single-phase 240/120 V, three-phase 208Y/120 V, 240 V … (transformer); "DC" for a DC supply */
  secondaryLabel: string;
  /** the motors' load on it: kVA (transformer) or kW output (DC supply) */
  loadKva: number;
  /** standard kVA rating chosen (transformer); null for a DC supply */
  kva: number | null;
  /** transformer rated secondary current, or the DC output current needed, A */
  secondaryAmps: number;
  /** transformer rated primary current, or the DC supply's estimated input current, A */
  primaryAmps: number;
  primaryProtection: SourceProtection;
  secondaryProtection: SourceProtection | null;
  motors: OtherSourceMotor[];
  basis: string;
  notes: string[];
}

export interface ExternalMotor {
  tag: string;
  supply: SupplyKind;
  volts: number;
  /** the source it needs, in words, e.g. "240/120 V single-phase" */
  needs: string;
}

export interface SelectionOutput {
  results: LoadSelection[];
  panel: PanelRollup;
  codeEdition: string;
}
