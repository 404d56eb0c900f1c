// Stage 4, cautions from the sized results, each against the limit its table or practice gives:
// branch protection raised under 430.52(C)(1) Exception 2, the running voltage drop above the
// limit of shared/calc/voltage-drop.ts, drive input conductors not yet sized on a chosen drive
// (430.122(A)), and the site's voltage unbalance (NEMA MG 1 14.35, limits in its standards table).

import type { Load, Supply } from '../../schemas/load';
import type { StarterType, UnbalanceResult } from '../../schemas/selection';
import { UNBALANCE_MAX_PERCENT, UNBALANCE_NO_DERATING_PERCENT } from '../../standards/nema-mg1-voltage-unbalance';
import type { CircuitSizing } from './sizing-conductors';
import type { ProtectionSizing } from './sizing-protection';

export interface Cautions {
  /** after the protection's own cautions */
  protection: string[];
  /** after the circuit's own cautions: voltage drop, drive input, unbalance */
  circuit: string[];
  /** last of all: how the motor is controlled (two-wire restarts by itself) */
  control: string[];
}

export function cautions(
  load: Load,
  supply: Supply,
  starterType: StarterType,
  protection: ProtectionSizing,
  circuit: CircuitSizing,
  unbalance: UnbalanceResult | null,
): Cautions {
  const out: Cautions = { protection: [], circuit: [], control: [] };
  const scpd = protection.scpd;
  if (scpd?.exception === 'exception-2')
    out.protection.push(
      `Branch protection raised under ${scpd.basis}: only where the motor will not start at the normal limit; the engineer must confirm.`,
    );

  const vd = circuit.voltageDrop;
  if (vd && vd.percent > vd.limitPercent) {
    out.circuit.push(
      `Running voltage drop ${vd.percent} % over ${vd.lengthFt} ft is above ${vd.limitPercent} % (common practice)${vd.sizeWithinLimit ? `: ${vd.sizeWithinLimit} keeps it within` : ''}; check the drop at starting too.`,
    );
  }
  if (starterType === 'VFD' && load.driveInputAmps === undefined) {
    out.circuit.push(
      'Drive input conductors follow 430.122(A): 125 % of the drive rated input current — recheck once the drive is chosen.',
    );
  }
  const percent = supply.voltageUnbalancePercent;
  if (load.supply === 'ac3' && starterType === 'VFD' && percent > UNBALANCE_NO_DERATING_PERCENT) {
    out.circuit.push(
      `Voltage unbalance ${percent} % at the site: the drive's input takes it (the motor sees balanced output); check the drive's limit for input unbalance and fit a line reactor where its instructions call for one (common practice).`,
    );
  }
  if (unbalance) {
    if (unbalance.deratingFactor === null) {
      out.circuit.push(
        `Voltage unbalance ${unbalance.percent} % at the site: operating a motor above ${UNBALANCE_MAX_PERCENT} % unbalance is not recommended (NEMA MG 1 14.35); correct the supply first.`,
      );
    } else if (unbalance.deratingFactor < 1) {
      out.circuit.push(
        `Voltage unbalance ${unbalance.percent} % at the site: the motor can deliver about ${unbalance.deratingFactor} × its rating${unbalance.deratedHp !== null ? ` = ${unbalance.deratedHp} hp` : ''} (NEMA MG 1 14.35); check the driven load against that.`,
      );
    }
  }
  if (load.controlScheme === 'two-wire') {
    out.control.push(
      'Two-wire control restarts the motor by itself when power returns: the engineer confirms an automatic restart is safe for this machine (NFPA 79 7.5, from memory).',
    );
  }
  return out;
}
