// Motor feeder roll-up: conductors per NEC 430.24 (125 % of the largest motor's FLC plus the sum
// of the other motors' FLCs) and the feeder protective device per 430.62(A) (not greater than the
// largest branch short-circuit device rating — at the maximum 430.52 permits — plus the sum of the
// other motors' FLCs; where that is not a standard rating, the next lower standard rating).
// Instantaneous-trip branches count at the Table 430.52 percentage of the feeder device type. A group
// device (430.53) counts once, with all its motors' FLCs as its own (not added again as other motors).
// Other loads (the primary current of a transformer or DC supply in the panel for motors at another
// voltage, shared/calc/other-sources) add at 100 % to both (430.24, 430.63); their own primary device
// takes part in the choice of the largest device for 430.62(A).

import type { PanelRollup } from '../schemas/selection';
import { nec, type CodeEdition } from '../standards/code-edition';
import { nextLowerStandard } from '../standards/nec-table-240-6a';
import type { ConductorMaterial, TempRating } from '../standards/nec-table-310-16';
import { selectConductor } from './conductor';
import { round2 } from './round';

export interface FeederBranch {
  tag: string;
  flcAmps: number;
  /** branch device rating counted for 430.62(A) */
  branchDeviceAmps: number;
  /** a device shared by several motors (430.53): its tag and the sum of their FLCs, left out of "the other motors" */
  sharedDevice?: { tag: string; flcAmps: number };
}

/** A non-motor load on the feeder: a transformer's or DC supply's primary current and its primary device. */
export interface FeederOtherLoad {
  tag: string;
  amps: number;
  deviceAmps: number;
}

export interface FeederInput {
  branches: FeederBranch[];
  otherLoads?: FeederOtherLoad[];
  material: ConductorMaterial;
  tempRatingC: TempRating;
  ambientC: number;
  ocpdFamily: 'fuse' | 'breaker';
  /** the panel's terminations listed for 75 °C conductors (110.14(C)(1)); true when absent */
  terminationsListed75C?: boolean;
}

export function feederRollup(
  input: FeederInput,
  edition: CodeEdition,
): PanelRollup & { notes: string[]; errors: string[]; otherLoadsAmps: number } {
  const notes: string[] = [];
  const errors: string[] = [];
  const b = input.branches;
  const others = input.otherLoads ?? [];
  const total = round2(b.reduce((s, x) => s + x.flcAmps, 0));
  const otherAmps = round2(others.reduce((s, x) => s + x.amps, 0));
  if (b.length === 0 && others.length === 0) {
    return {
      feeder: { minAmpacity: 0, conductorSize: 'none', ocpdMaxAmps: 0, basis: nec(edition, '430.24, 430.62(A)') },
      totalFlcAmps: 0,
      largestMotorTag: null,
      notes: ['no motor on the feeder at the supply voltage'],
      errors,
      otherLoadsAmps: 0,
    };
  }
  let largest: FeederBranch | null = b[0] ?? null;
  for (const x of b) if (largest && x.flcAmps > largest.flcAmps) largest = x;
  const largestFlc = largest?.flcAmps ?? 0;
  const minAmpacity = round2(1.25 * largestFlc + (total - largestFlc) + otherAmps);

  // the largest protective device among the motor branches and the other loads' primary devices
  const devices = [
    ...b.map((x) => ({ tag: x.sharedDevice?.tag ?? x.tag, deviceAmps: x.branchDeviceAmps, amps: x.sharedDevice?.flcAmps ?? x.flcAmps })),
    ...others.map((x) => ({ tag: x.tag, deviceAmps: x.deviceAmps, amps: x.amps })),
  ];
  let largestDevice = devices[0] as (typeof devices)[number];
  for (const x of devices) if (x.deviceAmps > largestDevice.deviceAmps) largestDevice = x;
  const ocpdComputed = round2(largestDevice.deviceAmps + (total + otherAmps - largestDevice.amps));
  if (others.length > 0)
    notes.push(`430.24, 430.63: ${others.map((x) => `${x.tag} ${x.amps} A`).join(', ')} of other sources' primary current added at 100 %.`);

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
    if (ocpdComputed > 6000)
      notes.push(`430.62(A) permits up to ${ocpdComputed} A; 6000 A is the largest standard rating of Table 240.6(A).`);
  } catch (e) {
    errors.push(`feeder protective device: ${(e as Error).message}`);
  }
  notes.push(
    `430.62(A): ${largestDevice.deviceAmps} A (${largestDevice.tag}) + ${round2(total + otherAmps - largestDevice.amps)} A of other ${others.length ? 'currents' : 'FLCs'} = ${ocpdComputed} A, next lower standard rating ${ocpdMaxAmps} A.`,
  );
  return {
    feeder: {
      minAmpacity,
      conductorSize,
      ocpdMaxAmps,
      basis: `${nec(edition, '430.24, 430.62(A), Table 240.6(A)')}; ${conductorBasis}`,
    },
    totalFlcAmps: total,
    largestMotorTag: largest?.tag ?? null,
    notes,
    errors,
    otherLoadsAmps: otherAmps,
  };
}
