// The panel roll-up from the motors' selections: the feeder (430.24, 430.62(A)), motors left out with
// the reason, an instantaneous-trip branch counted at the feeder device type's Table 430.52 percent.

import { feederRollup, type FeederBranch } from '../calc/feeder';
import { otherSources, sourceNeed } from '../calc/other-sources';
import { branchProtection, motorKind } from '../calc/scpd';
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
    let deviceAmps = r.scpd.ratingAmps;
    if (r.scpd.type === 'instantaneous-trip-breaker') {
      // 430.62(A): an instantaneous-trip branch counts at the Table 430.52 % of the feeder device type
      const p = branchProtection({ flcAmps: r.flcAmps, type: supply.feeder.ocpdType, motor: motorKind(load) }, edition);
      deviceAmps = p.ratingAmps;
      notes.push(
        `${r.tag}: instantaneous-trip branch counted at ${p.maxPercent} % (${supply.feeder.ocpdType}) = ${p.ratingAmps} A per 430.62(A)`,
      );
    }
    branches.push({ tag: r.tag, flcAmps: r.flcAmps, branchDeviceAmps: deviceAmps });
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
    notes: [...notes, ...os.notes, ...f.notes],
    errors: [...errors, ...os.errors, ...f.errors],
    otherSources: os.sources,
    externalMotors: os.externalMotors,
    otherLoadsAmps: f.otherLoadsAmps,
  };
}
