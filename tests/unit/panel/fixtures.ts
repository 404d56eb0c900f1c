// Hand-made LoadSelection objects for the panel-level tests (a fictional plant: "Cedar Flats water works").
// Currents are NEC 2023 Table 430.250 values at the 460 V column (10 hp 14 A, 25 hp 34 A, 20 hp 27 A).
import type { LoadSelection, PanelRollup } from '../../../shared/schemas/selection';
import { loadSelection, type DeepPartial } from '../../fixtures/selection';

/** The raw water pump every panel-test motor starts from: 10 hp on a 480 V supply, dual-element fuses. */
const RAW_WATER_PUMP: DeepPartial<LoadSelection> = {
  tag: 'P-101',
  description: 'Raw water pump',
  volts: 480,
  flcSource: 'NEC 2023 Table 430.250, 10 hp at 460 V',
  starter: { iecCategory: 'AC-3', iecAmps: 18, basis: 'NEMA ICS 2, 10 hp at 460 V: size 1' },
  overload: { basis: 'NEC 2023 430.32(A)(1): 125 % of FLA 13.2 A' },
  scpd: {
    type: 'dual-element-fuse',
    maxPercent: 175,
    ratingAmps: 25,
    computedMaxAmps: 24.5,
    basis: 'NEC 2023 430.52(C)(1), Table 430.52: 175 %; Exc. 1 next higher 25 A (240.6(A))',
  },
  conductor: { size: '12 AWG', ampacity: 25, basis: 'NEC 2023 430.22, Table 310.16 75 °C' },
  disconnect: { basis: 'NEC 2023 430.109, 430.110(A)' },
};

export function selection(patch: DeepPartial<LoadSelection> = {}): LoadSelection {
  return loadSelection(RAW_WATER_PUMP, patch);
}

export const pumpFvnr = selection();

export const conveyorFvr = selection({
  tag: 'CV-201',
  description: 'Sludge conveyor',
  hp: 25,
  flcAmps: 34,
  flcSource: 'NEC 2023 Table 430.250, 25 hp at 460 V',
  flaAmps: 31,
  starter: { type: 'FVR', nemaSize: '2', iecAmps: 40, reversingContactors: true, interlock: true, basis: 'NEMA ICS 2 size 2' },
  overload: { maxSettingAmps: 38.75, tripClass: 20, basis: 'NEC 2023 430.32(A)(1): 125 % of FLA 31 A' },
  scpd: { type: 'inverse-time-breaker', maxPercent: 250, ratingAmps: 90, computedMaxAmps: 85, basis: 'NEC 2023 Table 430.52: 250 %' },
  conductor: {
    minAmpacity: 42.5,
    size: '8 AWG',
    material: 'cu',
    tempRatingC: 75,
    ampacity: 50,
    basis: 'NEC 2023 430.22, Table 310.16 75 °C',
  },
  disconnect: { minAmps: 39.1, minHp: 25, basis: 'NEC 2023 430.109, 430.110(A)' },
  relays: { phaseReversal: true, phaseLoss: true, phaseLossByOverload: true },
});

export const blowerVfd = selection({
  tag: 'B-301',
  description: 'Aeration blower',
  hp: 20,
  flcAmps: 27,
  flcSource: 'NEC 2023 Table 430.250, 20 hp at 460 V',
  flaAmps: 25,
  starter: { type: 'VFD', nemaSize: null, iecCategory: null, iecAmps: null, basis: 'variable speed required' },
  overload: { providedByDrive: true, maxSettingAmps: 31.25, tripClass: 10, basis: 'NEC 2023 430.124' },
  scpd: { type: 'non-time-delay-fuse', maxPercent: 300, ratingAmps: 80, computedMaxAmps: 81, basis: 'per the drive listing, NEC 430.130' },
  conductor: {
    minAmpacity: 33.75,
    size: '10 AWG',
    material: 'cu',
    tempRatingC: 75,
    ampacity: 35,
    basis: 'NEC 2023 430.22, Table 310.16 75 °C',
  },
  disconnect: { minAmps: 31.05, minHp: 20, basis: 'NEC 2023 430.109, 430.110(A)' },
  vfd: { duty: 'normal', minOutputAmps: 27, inverterDutyMotor: true, outputFilter: 'dv-dt', basis: 'common practice' },
});

export const rollup: PanelRollup = {
  feeder: {
    minAmpacity: 1.25 * 34 + 14 + 27, // NEC 430.24: 125 % of the largest (34 A) + 14 A + 27 A = 83.5 A
    conductorSize: '4 AWG',
    ocpdMaxAmps: 125, // NEC 430.62(A): 90 A (largest branch device) + 14 + 27 = 131 A -> next lower standard 125 A
    basis: 'NEC 2023 430.24, 430.62(A)',
  },
  totalFlcAmps: 14 + 34 + 27,
  largestMotorTag: 'CV-201',
};
