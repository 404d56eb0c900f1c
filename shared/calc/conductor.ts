// Conductor selection from NEC Table 310.16 with the ambient correction of Table 310.15(B)(1)(1)
// and the termination limit of 110.14(C): the allowable ampacity is the corrected ampacity at the
// insulation rating, but not above the ampacity at the termination rating (60 °C insulation stays at
// 60 °C). The terminations are taken at 75 °C where the panel's equipment is listed for them
// (110.14(C)(1)(a)(3)); otherwise a conductor of 14 through 1 AWG, or of a circuit rated 100 A or
// less, is held to the 60 °C column (110.14(C)(1)(a)) and a larger one on a circuit over 100 A to
// 75 °C (110.14(C)(1)(b)). Motor branch conductors: 430.22 (125 % of table FLC).
// Where no single conductor through 1000 kcmil suffices, parallel sets of 1/0 AWG or larger per
// 310.10(G), each set up to 500 kcmil (common practice), in separate raceways.

import { OutsideTableError } from '../errors';
import type { MotorLeadConductors } from '../schemas/selection';
import { nec, type CodeEdition } from '../standards/code-edition';
import { ambientCorrectionFactor, table310_15B1 } from '../standards/nec-table-310-15-b-1';
import { TABLE_310_16, ampacity310_16, sizesFor, type ConductorMaterial, type TempRating } from '../standards/nec-table-310-16';
import { round2 } from './round';

export const TERMINATION_TEMP_C: TempRating = 75;

export interface ConductorChoice {
  size: string;
  sets: number;
  /** allowable ampacity of the whole (all parallel sets) after correction and the termination limit */
  ampacity: number;
  material: ConductorMaterial;
  tempRatingC: TempRating;
  basis: string;
  cautions: string[];
}

/** Sizes 110.14(C)(1)(a) names: 14 AWG through 1 AWG. */
const SMALL_TERMINATION_SIZES: ReadonlySet<string> = new Set([
  '14 AWG',
  '12 AWG',
  '10 AWG',
  '8 AWG',
  '6 AWG',
  '4 AWG',
  '3 AWG',
  '2 AWG',
  '1 AWG',
]);

/**
 * The termination column a conductor is held to (110.14(C)(1)): 75 °C where the equipment is listed
 * and identified for 75 °C conductors; otherwise 60 °C for 14–1 AWG or a circuit rated 100 A or less
 * (a), 75 °C for a larger conductor on a circuit over 100 A (b).
 */
export function terminationColumnC(size: string, terminationsListed75C: boolean, circuitAmps: number): 60 | 75 {
  if (terminationsListed75C) return 75;
  return SMALL_TERMINATION_SIZES.has(size) || circuitAmps <= 100 ? 60 : 75;
}

export function allowableAmpacity(
  size: string,
  material: ConductorMaterial,
  insulation: TempRating,
  ambientC: number,
  edition: CodeEdition,
  terminationC: 60 | 75 = TERMINATION_TEMP_C as 75,
): number {
  const termination = Math.min(insulation, terminationC) as TempRating;
  const corrected = ampacity310_16(size, material, insulation) * ambientCorrectionFactor(ambientC, insulation, edition);
  return round2(Math.min(corrected, ampacity310_16(size, material, termination)));
}

export function selectConductor(
  minAmpacity: number,
  opts: {
    material: ConductorMaterial;
    tempRatingC: TempRating;
    ambientC: number;
    /** the panel's terminations listed for 75 °C conductors (110.14(C)(1)(a)(3)); true when absent */
    terminationsListed75C?: boolean;
    /** the circuit's rating for 110.14(C)(1): its protective device, else the minimum ampacity */
    circuitAmps?: number;
  },
  edition: CodeEdition,
): ConductorChoice {
  const { material, tempRatingC, ambientC } = opts;
  const listed = opts.terminationsListed75C !== false;
  const circuitAmps = opts.circuitAmps ?? minAmpacity;
  const termAt = (size: string) => terminationColumnC(size, listed, circuitAmps);
  const sizes = sizesFor(material);
  const parts = [TABLE_310_16];
  const cautions: string[] = [];
  const factor = ambientCorrectionFactor(ambientC, tempRatingC, edition);
  if (factor !== 1) parts.push(`${table310_15B1(edition)} (${ambientC} °C ambient, factor ${factor})`);
  if (!listed && tempRatingC > 60) {
    parts.push('110.14(C)(1)(a) (terminations not listed for 75 °C: 60 °C column for 14–1 AWG or a circuit of 100 A or less)');
  } else if (tempRatingC > TERMINATION_TEMP_C) {
    parts.push('110.14(C) (75 °C terminations)');
  }
  if (tempRatingC > TERMINATION_TEMP_C) {
    cautions.push(
      listed
        ? '90 °C insulation: ampacity limited to the 75 °C column for the terminations (110.14(C)); the 90 °C column serves only for correction and adjustment.'
        : '90 °C insulation: ampacity limited to the termination column (60 °C, or 75 °C above 1 AWG on a circuit over 100 A, 110.14(C)(1)); the 90 °C column serves only for correction and adjustment.',
    );
  }
  const label = `${material === 'cu' ? 'copper' : 'aluminum'} ${tempRatingC} °C`;
  for (const size of sizes) {
    const a = allowableAmpacity(size, material, tempRatingC, ambientC, edition, termAt(size));
    if (a + 1e-9 >= minAmpacity) {
      return { size, sets: 1, ampacity: a, material, tempRatingC, basis: `${nec(edition, parts.join(', '))} (${label})`, cautions };
    }
  }
  const parallelSizes = sizes.filter((s) => sizes.indexOf(s) >= sizes.indexOf('1/0 AWG') && sizes.indexOf(s) <= sizes.indexOf('500 kcmil'));
  for (let sets = 2; sets <= 12; sets++) {
    for (const size of parallelSizes) {
      const a = allowableAmpacity(size, material, tempRatingC, ambientC, edition, termAt(size)) * sets;
      if (a + 1e-9 >= minAmpacity) {
        cautions.push(
          `${sets} parallel sets (310.10(G)): each set in its own raceway, same length, material, size and termination; more than three current-carrying conductors in one raceway need the adjustment of 310.15(C)(1).`,
        );
        return {
          size: `${sets} × ${size} per phase`,
          sets,
          ampacity: round2(a),
          material,
          tempRatingC,
          basis: `${nec(edition, [...parts, '310.10(G)'].join(', '))} (${label}; parallel sets up to 500 kcmil, common practice)`,
          cautions,
        };
      }
    }
  }
  throw new OutsideTableError(TABLE_310_16, `no conductor arrangement up to 12 parallel sets carries ${minAmpacity} A`);
}

/** Motor branch-circuit conductors, 430.22: at least 125 % of the table FLC. */
export function branchConductor(
  input: {
    flcAmps: number;
    material: ConductorMaterial;
    tempRatingC: TempRating;
    ambientC: number;
    driveInputAmps?: number;
    terminationsListed75C?: boolean;
    circuitAmps?: number;
  },
  edition: CodeEdition,
): ConductorChoice & { minAmpacity: number } {
  const byMotor = round2(input.flcAmps * 1.25);
  const byDrive = input.driveInputAmps !== undefined ? round2(input.driveInputAmps * 1.25) : 0;
  const minAmpacity = Math.max(byMotor, byDrive);
  const choice = selectConductor(minAmpacity, input, edition);
  const clause = byDrive > byMotor ? '430.122(A) (125 % of the drive rated input current)' : '430.22 (125 % of table FLC)';
  return { ...choice, minAmpacity, basis: `${nec(edition, clause)}; ${choice.basis}` };
}

/**
 * The conductors between the controller and the motor where each carries a share of the motor
 * current (text written from memory; check against the published edition):
 * - wye-start, delta-run, 430.22(C): based on 58 % of the motor full-load current;
 * - part-winding, 430.22(D): based on 50 % of the motor full-load current.
 * "Based on" is read as taking that share in place of the FLC in the 125 % rule of 430.22 (a reading;
 * the engineer confirms). Six leads in both cases (T1–T6, or T1–T3 and T7–T9).
 */
export function motorLeadConductors(
  input: {
    flcAmps: number;
    starterType: string;
    material: ConductorMaterial;
    tempRatingC: TempRating;
    ambientC: number;
    terminationsListed75C?: boolean;
    circuitAmps?: number;
  },
  edition: CodeEdition,
): (MotorLeadConductors & { cautions: string[] }) | null {
  const share = input.starterType === 'wye-delta' ? 0.58 : input.starterType === 'part-winding' ? 0.5 : null;
  if (share === null) return null;
  const minAmpacity = round2(input.flcAmps * share * 1.25);
  const choice = selectConductor(minAmpacity, input, edition);
  const clause = share === 0.58 ? '430.22(C) (wye-start, delta-run: 125 % of 58 % of FLC' : '430.22(D) (part-winding: 125 % of 50 % of FLC';
  const reading = '; the 125 % of 430.22 applied to the share is a reading, the engineer confirms)';
  return {
    count: 6,
    share,
    minAmpacity,
    size: choice.size,
    ampacity: choice.ampacity,
    basis: `${nec(edition, clause)}${reading}; ${choice.basis}`,
    cautions: choice.cautions,
  };
}

/** The motor-lead conductors in words, or null where the branch conductors run to the motor. */
export function motorLeadText(s: { conductor: { motorLeads?: MotorLeadConductors; material: ConductorMaterial } }): string | null {
  const m = s.conductor.motorLeads;
  if (!m) return null;
  return `controller to motor: ${m.count} × ${m.size} ${s.conductor.material === 'cu' ? 'Cu' : 'Al'} (${m.ampacity} A ≥ ${m.minAmpacity} A, ${Math.round(m.share * 100)} % of FLC)`;
}

/** The running voltage drop in words, or null when no cable length was given. */
export function voltageDropText(s: {
  conductor: { voltageDrop?: { volts: number; percent: number; lengthFt: number; limitPercent: number; sizeWithinLimit: string | null } };
}): string | null {
  const d = s.conductor.voltageDrop;
  if (!d) return null;
  const over = d.percent > d.limitPercent;
  return `running voltage drop ${d.volts} V (${d.percent} %) over ${d.lengthFt} ft${over ? ` — above ${d.limitPercent} %${d.sizeWithinLimit ? `, ${d.sizeWithinLimit} keeps it within` : ''}` : ''}`;
}

/** The conductors if the terminations are held to 60 °C, in words, or null when they are the same or not computed. */
export function termination60Text(s: {
  conductor: { termination60C?: { size: string; ampacity: number; minAmpacity: number }; material: ConductorMaterial };
}): string | null {
  const t = s.conductor.termination60C;
  if (!t) return null;
  return `at 60 °C terminations (110.14(C)(1)(a)): ${t.size} ${s.conductor.material === 'cu' ? 'Cu' : 'Al'} (${t.ampacity} A ≥ ${t.minAmpacity} A)`;
}
