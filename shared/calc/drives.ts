// Drives and soft starters.
// VFD: the drive's continuous output current at its duty rating (normal duty ~110 % for 60 s,
// heavy duty ~150 % for 60 s — common practice) at least the motor nameplate FLA; the drive's
// listed electronic overload may serve as the motor overload (NEC 430.124(A)); branch protection
// per the drive's listing and instructions (430.130).
// Soft starter: rated current at least the motor FLA in line; inside the delta the device carries
// the phase current, FLA / √3 (common practice, per the device's instructions).

import { nec, type CodeEdition } from '../standards/code-edition';
import { round2 } from './round';

export function vfdMinOutputAmps(
  flaAmps: number,
  duty: 'normal' | 'heavy',
  edition: CodeEdition,
): { minOutputAmps: number; basis: string } {
  return {
    minOutputAmps: round2(flaAmps),
    basis: `drive ${duty}-duty output current >= motor nameplate FLA (common practice); ${nec(edition, '430.122, 430.124(A), 430.130')}`,
  };
}

export function softStarterMinAmps(flaAmps: number, insideDelta: boolean): { minAmps: number; basis: string } {
  return insideDelta
    ? { minAmps: round2(flaAmps / Math.sqrt(3)), basis: 'inside-delta: phase current FLA / √3 (common practice)' }
    : { minAmps: round2(flaAmps), basis: 'in-line: rated current >= motor FLA (common practice)' };
}
