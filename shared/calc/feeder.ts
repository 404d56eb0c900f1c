// Motor feeder roll-up: conductors per NEC 430.24 (125 % of the largest motor's FLC plus the sum
// of the other motors' FLCs) and the feeder protective device per 430.62(A) (not greater than the
// largest branch short-circuit device rating — at the maximum 430.52 permits — plus the sum of the
// other motors' FLCs; where that is not a standard rating, the next lower standard rating).
// Instantaneous-trip branches count at the Table 430.52 percentage of the feeder device type.

import type { PanelRollup } from '../schemas/selection';
import { nec, type CodeEdition } from '../standards/code-edition';
import { nextLowerStandard } from '../standards/nec-table-240-6a';
import type { ConductorMaterial, TempRating } from '../standards/nec-table-310-16';
import { selectConductor } from './conductor';

export interface FeederBranch {
  tag: string;
  flcAmps: number;
  /** branch device rating counted for 430.62(A) */
  branchDeviceAmps: number;
}

export interface FeederInput {
  branches: FeederBranch[];
  material: ConductorMaterial;
  tempRatingC: TempRating;
  ambientC: number;
  ocpdFamily: 'fuse' | 'breaker';
  /** the panel's terminations listed for 75 °C conductors (110.14(C)(1)); true when absent */
  terminationsListed75C?: boolean;
}

const round2 = (x: number) => Math.round(x * 100) / 100;

export function feederRollup(input: FeederInput, edition: CodeEdition): PanelRollup & { notes: string[]; errors: string[] } {
  const notes: string[] = [];
  const errors: string[] = [];
  const b = input.branches;
  const total = round2(b.reduce((s, x) => s + x.flcAmps, 0));
  if (b.length === 0) {
    return {
      feeder: { minAmpacity: 0, conductorSize: 'none', ocpdMaxAmps: 0, basis: nec(edition, '430.24, 430.62(A)') },
      totalFlcAmps: 0,
      largestMotorTag: null,
      notes: ['no motor on the feeder at the supply voltage'],
      errors,
    };
  }
  let largest = b[0] as FeederBranch;
  for (const x of b) if (x.flcAmps > largest.flcAmps) largest = x;
  const minAmpacity = round2(1.25 * largest.flcAmps + (total - largest.flcAmps));

  let largestDevice = b[0] as FeederBranch;
  for (const x of b) if (x.branchDeviceAmps > largestDevice.branchDeviceAmps) largestDevice = x;
  const ocpdComputed = round2(largestDevice.branchDeviceAmps + (total - largestDevice.flcAmps));

  let conductorSize = 'outside Table 310.16';
  let conductorBasis = '';
  try {
    const c = selectConductor(minAmpacity, input, edition);
    conductorSize = c.size;
    conductorBasis = c.basis;
    notes.push(...c.cautions);
  } catch (e) {
    errors.push(`feeder conductor: ${(e as Error).message}`);
  }
  let ocpdMaxAmps = 0;
  try {
    ocpdMaxAmps = nextLowerStandard(ocpdComputed, edition, input.ocpdFamily);
    if (ocpdComputed > 6000) notes.push(`430.62(A) permits up to ${ocpdComputed} A; 6000 A is the largest standard rating of Table 240.6(A).`);
  } catch (e) {
    errors.push(`feeder protective device: ${(e as Error).message}`);
  }
  notes.push(`430.62(A): ${largestDevice.branchDeviceAmps} A (${largestDevice.tag}) + ${round2(total - largestDevice.flcAmps)} A of other FLCs = ${ocpdComputed} A, next lower standard rating ${ocpdMaxAmps} A.`);
  return {
    feeder: {
      minAmpacity,
      conductorSize,
      ocpdMaxAmps,
      basis: `${nec(edition, '430.24, 430.62(A), Table 240.6(A)')}; ${conductorBasis}`,
    },
    totalFlcAmps: total,
    largestMotorTag: largest.tag,
    notes,
    errors,
  };
}
