// Motor disconnecting means: NEC 430.110(A) ampere rating >= 115 % of table FLC; 430.109(A)
// horsepower rating at least the motor's; 430.128 for power conversion equipment (115 % of the
// drive's rated input current).

import { nec, type CodeEdition } from '../standards/code-edition';
import { disconnectMinAmps } from '../standards/nec-430-110-disconnect';
import { round2 } from './round';

export interface DisconnectResult {
  minAmps: number;
  minHp: number | null;
  basis: string;
}

export function motorDisconnect(
  input: { flcAmps: number; hp: number | null; driveInputAmps?: number },
  edition: CodeEdition,
): DisconnectResult {
  const byMotor = disconnectMinAmps(input.flcAmps);
  const byDrive = input.driveInputAmps !== undefined ? disconnectMinAmps(input.driveInputAmps) : 0;
  const minAmps = round2(Math.max(byMotor, byDrive));
  const clauses = byDrive > byMotor ? '430.128, 430.109(A)' : '430.110(A), 430.109(A)';
  return { minAmps, minHp: input.hp, basis: nec(edition, clauses) };
}
