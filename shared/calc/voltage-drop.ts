// Running voltage drop of a motor branch circuit from the conductor's resistance (NEC Chapter 9
// Table 8, 75 °C), reactance left out: three-phase ΔV = √3 · I · R · L / 1000, single-phase and DC
// ΔV = 2 · I · R · L / 1000, divided among parallel sets. It understates the drop of large
// conductors in steel raceway, where reactance counts (common practice: Chapter 9 Table 9 then).
// 3 % for a branch circuit is common practice (the informational notes to NEC 210.19 and 215.2
// suggest 3 % and 5 % overall); it is not a code requirement.

import { nec, type CodeEdition } from '../standards/code-edition';
import { CHAPTER_9_TABLE_8, resistanceOhmsPerKft } from '../standards/nec-chapter-9-table-8';
import { sizesFor, type ConductorMaterial } from '../standards/nec-table-310-16';
import { nominalSystemVolts } from '../standards/nominal-system-voltages';
import { round2 } from './round';

export const DROP_LIMIT_PERCENT = 3;

/** "2 × 350 kcmil per phase" -> { sets: 2, size: "350 kcmil" } */
export function parseConductor(size: string): { sets: number; size: string } {
  const m = /^(\d+) × (.+) per phase$/.exec(size);
  return m ? { sets: Number(m[1]), size: m[2]! } : { sets: 1, size };
}

export interface VoltageDropResult {
  lengthFt: number;
  amps: number;
  volts: number;
  percent: number;
  /** the percentage is of this nominal system voltage */
  systemVolts: number;
  limitPercent: number;
  /** the smallest conductor (same material and sets) within the limit, when the chosen one is not */
  sizeWithinLimit: string | null;
  basis: string;
}

/**
 * How the run from controller to motor is wired:
 * - line: three (or two) conductors carrying the line current;
 * - delta-leads (wye-delta, running in delta): each winding is fed through its two own leads, each
 *   carrying the winding current I/√3, so a winding loses 2 · (I/√3) · R · L;
 * - half-windings (part-winding, both halves running): two three-phase sets in parallel, I/2 each.
 */
export type RunCircuit = 'line' | 'delta-leads' | 'half-windings';

function dropVolts(amps: number, ohmsPerKft: number, lengthFt: number, sets: number, threePhase: boolean, circuit: RunCircuit): number {
  const rl = (ohmsPerKft * lengthFt) / 1000 / sets;
  if (circuit === 'delta-leads') return 2 * (amps / Math.sqrt(3)) * rl;
  if (circuit === 'half-windings') return Math.sqrt(3) * (amps / 2) * rl;
  return (threePhase ? Math.sqrt(3) : 2) * amps * rl;
}

export function motorVoltageDrop(
  input: {
    amps: number;
    ratedVolts: number;
    threePhase: boolean;
    lengthFt: number;
    conductor: string;
    material: ConductorMaterial;
    circuit?: RunCircuit;
  },
  edition: CodeEdition,
): VoltageDropResult {
  const { sets, size } = parseConductor(input.conductor);
  const circuit = input.circuit ?? 'line';
  // a percentage of the nominal system voltage (460 V motor: of 480 V), or of the rating outside the ranges
  const sys = nominalSystemVolts(input.ratedVolts) ?? input.ratedVolts;
  const volts = dropVolts(input.amps, resistanceOhmsPerKft(size, input.material), input.lengthFt, sets, input.threePhase, circuit);
  const percent = (volts / sys) * 100;
  let sizeWithinLimit: string | null = null;
  if (percent > DROP_LIMIT_PERCENT) {
    const sizes = sizesFor(input.material);
    for (const s of sizes.slice(sizes.indexOf(size as (typeof sizes)[number]) + 1)) {
      if (
        (dropVolts(input.amps, resistanceOhmsPerKft(s, input.material), input.lengthFt, sets, input.threePhase, circuit) / sys) * 100 <=
        DROP_LIMIT_PERCENT
      ) {
        sizeWithinLimit = sets > 1 ? `${sets} × ${s} per phase` : s;
        break;
      }
    }
  }
  return {
    lengthFt: input.lengthFt,
    amps: input.amps,
    volts: round2(volts),
    percent: round2(percent),
    systemVolts: sys,
    limitPercent: DROP_LIMIT_PERCENT,
    sizeWithinLimit,
    basis: `${nec(edition, CHAPTER_9_TABLE_8)} resistance at 75 °C (from memory), reactance left out; ${DROP_LIMIT_PERCENT} % for a branch circuit is common practice (informational note to 210.19)`,
  };
}
