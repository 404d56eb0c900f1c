// The nameplate and feeder of the panel checks (NEC 409.110, 409.21, shared/calc/nameplate).
import type { NameplateCheck } from '../../schemas/checks';
import type { PanelRollup } from '../../schemas/selection';
import { panelNameplate } from '../nameplate';

export interface NameplateSupply {
  supplyVolts: number;
  supplyPhases: number;
  supplyHz: number;
}

export function nameplateCheck(
  rollup: PanelRollup | null,
  job: NameplateSupply,
  sccrKa: number | null,
  enclosureType: string,
  shopName: string,
): NameplateCheck {
  if (!rollup)
    return {
      result: null,
      reason: 'The panel has no roll-up yet: add a motor so the selection engine can total the full-load current and size the feeder.',
    };
  try {
    return {
      result: panelNameplate({
        rollup,
        supply: { volts: job.supplyVolts, phases: job.supplyPhases === 1 ? 1 : 3, hz: job.supplyHz === 50 ? 50 : 60 },
        sccrKa,
        enclosureType,
        shopName,
      }),
      reason: null,
    };
  } catch (e) {
    return { result: null, reason: (e as Error).message };
  }
}
