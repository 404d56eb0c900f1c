// The panel roll-up from the motors' selections: the feeder (430.24, 430.62(A)), motors left out with
// the reason, an instantaneous-trip branch counted at the feeder device type's Table 430.52 percent,
// a drive feeding several motors counted once at its input, and the motors grouped on one branch circuit (430.53), each counted at its group's device for 430.62(A).

import { feederRollup, type FeederBranch } from '../calc/feeder';
import { round2 } from '../calc/round';
import { groupCircuits, type GroupMember } from '../calc/group-circuits';
import { otherSources, sourceNeed } from '../calc/other-sources';
import { branchProtection, motorKind } from '../calc/scpd';
import { sharedDrives } from '../calc/shared-drives';
import type { Load, Supply } from '../schemas/load';
import type { LoadSelection, SelectionOutput } from '../schemas/selection';
import type { CodeEdition } from '../standards/code-edition';

export function panelRollupOf(
  supply: Supply,
  loads: ReadonlyArray<Load>,
  results: ReadonlyArray<LoadSelection>,
  edition: CodeEdition,
): SelectionOutput['panel'] {
  const notes: string[] = [];
  const errors: string[] = [];
  const branches: FeederBranch[] = [];
  const feederFamily = supply.feeder.ocpdType === 'inverse-time-breaker' ? 'breaker' : 'fuse';
  // a drive feeding several motors is one branch of the feeder: its input current and its input device (430.122, 430.130)
  const shared = sharedDrives(
    results.map((r, i) => ({ load: loads[i] as Load, selection: r, onBus: sourceNeed(loads[i] as Load, r, supply).on === 'bus' })),
    { ambientC: supply.ambientC, terminationsListed75C: supply.terminationsListed75C !== false },
    edition,
  );
  for (const d of shared.drives) {
    const motor = motorKind(loads[results.findIndex((r) => r.tag === d.motors[0]?.tag)] as Load);
    const deviceAmps = feederCountedDevice(supply, d.input.amps, d.input.protection, motor, edition).amps;
    branches.push({ tag: d.tag, flcAmps: d.input.amps, branchDeviceAmps: deviceAmps });
    notes.push(
      `${d.tag}: one drive for ${d.motors.map((m) => m.tag).join(', ')}, counted once in the feeder at ${d.input.amps} A with its ${deviceAmps} A input device (430.122, 430.130, 430.24)`,
    );
  }
  const groups = panelGroups(supply, loads, results, edition);
  const groupDevice = new Map(groups.flatMap((g) => (g.device ? g.motors.map((t) => [t, g] as const) : [])));
  // a group no path of 430.53 allows: a roll-up error (each motor stays on its own branch device meanwhile)
  for (const g of groups) if (g.refusal !== null) errors.push(`group ${g.group} (${g.motors.join(', ')}) refused: ${g.refusal}`);
  results.forEach((r, i) => {
    const load = loads[i] as Load;
    if (r.flcAmps <= 0 || r.scpd.ratingAmps <= 0) {
      errors.push(`${r.tag}: left out of the feeder roll-up (its selection has errors)`);
      return;
    }
    if (load.supply === 'ac3' && supply.phases === 1) {
      errors.push(`${r.tag}: a three-phase motor cannot be fed from a single-phase supply`);
      return;
    }
    // a motor at another voltage (or DC) is fed through another source, counted by otherSources below
    if (sourceNeed(load, r, supply).on !== 'bus') return;
    if (shared.memberTags.has(r.tag)) return;
    let deviceAmps = r.scpd.ratingAmps;
    const group = groupDevice.get(r.tag);
    if (group?.device) {
      // 430.62(A): the device provided for the motor is its group's
      deviceAmps = group.device.ratingAmps;
      notes.push(`${r.tag}: on group ${group.group}'s ${deviceAmps} A device (430.53(${group.path})) for 430.62(A)`);
    } else {
      const counted = feederCountedDevice(supply, r.flcAmps, r.scpd, motorKind(load), edition);
      deviceAmps = counted.amps;
      if (counted.percent !== null)
        notes.push(
          `${r.tag}: instantaneous-trip branch counted at ${counted.percent} % (${supply.feeder.ocpdType}) = ${counted.amps} A per 430.62(A)`,
        );
    }
    const onGroupDevice = group?.device
      ? { sharedDevice: { tag: group.group, flcAmps: round2(group.taps.reduce((sum, t) => sum + t.flcAmps, 0)) } }
      : {};
    branches.push({ tag: r.tag, flcAmps: r.flcAmps, branchDeviceAmps: deviceAmps, ...onGroupDevice });
  });
  const os = otherSources(supply, loads, results, edition);
  const f = feederRollup(
    {
      branches: [...branches, ...os.branches],
      otherLoads: os.otherLoads,
      material: supply.feeder.material,
      tempRatingC: supply.feeder.tempRatingC,
      ambientC: supply.ambientC,
      ocpdFamily: feederFamily,
      terminationsListed75C: supply.terminationsListed75C !== false,
    },
    edition,
  );
  return {
    feeder: f.feeder,
    totalFlcAmps: f.totalFlcAmps,
    largestMotorTag: f.largestMotorTag,
    notes: [...notes, ...shared.notes, ...os.notes, ...f.notes],
    errors: [...errors, ...shared.errors, ...os.errors, ...f.errors],
    otherSources: os.sources,
    externalMotors: os.externalMotors,
    otherLoadsAmps: f.otherLoadsAmps,
    ...(shared.drives.length > 0 ? { sharedDrives: shared.drives } : {}),
    ...(shared.errors.length > 0 ? { sharedDriveErrors: shared.errors } : {}),
    ...(groups.length ? { groups } : {}),
  };
}

/**
 * The branch device a feeder counts for 430.62(A): the device itself, or for an instantaneous-trip breaker
 * (which has no inverse-time rating to add) the Table 430.52 value of the feeder's device type (`percent` set).
 */
function feederCountedDevice(
  supply: Supply,
  flcAmps: number,
  device: { type: string; ratingAmps: number },
  motor: ReturnType<typeof motorKind>,
  edition: CodeEdition,
): { amps: number; percent: number | null } {
  if (device.type !== 'instantaneous-trip-breaker') return { amps: device.ratingAmps, percent: null };
  const p = branchProtection({ flcAmps, type: supply.feeder.ocpdType, motor }, edition);
  return { amps: p.ratingAmps, percent: p.maxPercent };
}

/** The motors whose answers name a branch-circuit group, as groups (430.53). */
function panelGroups(supply: Supply, loads: ReadonlyArray<Load>, results: ReadonlyArray<LoadSelection>, edition: CodeEdition) {
  const members: GroupMember[] = [];
  results.forEach((r, i) => {
    const load = loads[i];
    if (load?.branchGroup === undefined) return;
    members.push({ tag: r.tag, branchGroup: load.branchGroup, listedMaxAmps: load.groupListedMaxAmps ?? null, selection: r });
  });
  return groupCircuits(members, { ambientC: supply.ambientC, terminationsListed75C: supply.terminationsListed75C !== false }, edition);
}
