// A power transformer in the panel for motors at another voltage: its kVA from the motors it feeds
// (the sum of their currents with the largest at 125 %, as the feeder rule NEC 430.24 counts them),
// the next standard kVA rating, its rated currents, and its overcurrent protection per NEC
// Table 450.3(B) (shared/standards/nec-table-450-3b).

import type { SourceProtection } from '../schemas/selection';
import { nec, type CodeEdition } from '../standards/code-edition';
import { nextHigherStandard, nextLowerStandard, standardRatings, type DeviceFamily } from '../standards/nec-table-240-6a';
import { primaryLimit, secondaryLimit, TABLE_450_3B, type Limit450, type TransformerProtectionMethod } from '../standards/nec-table-450-3b';
import { nextStandardKva, TRANSFORMER_KVA_SOURCE } from '../standards/transformer-kva-ratings';
import { OutsideTableError } from '../errors';
import { round2 } from './round';

const SQRT3 = Math.sqrt(3);

export interface TransformerLoad {
  /** current the motor draws, A */
  amps: number;
  /** the voltage of its circuit: 120 or 240 on a 240/120 V secondary; the line voltage otherwise */
  circuitVolts: number;
}

export interface TransformerKvaInput {
  phases: 1 | 3;
  /** secondary line-to-line voltage: 240 for 240/120 V, 208 for 208Y/120 V … */
  secondaryVolts: number;
  /** a single-phase 240/120 V secondary: 120 V loads sit on one half, 240 V loads across both */
  splitPhase?: boolean;
  loads: TransformerLoad[];
}

export interface TransformerKva {
  /** secondary current the loads need, A (the most loaded line or half) */
  loadAmps: number;
  loadKva: number;
  kva: number;
  steps: string[];
}

/**
 * The kVA a transformer needs for its motors and the next standard rating.
 * Single-phase 240/120 V: each 120 V load goes on the less loaded half (largest first); 240 V loads
 * load both halves; the most loaded half plus 25 % of the largest motor's current, times 240 V.
 * Three-phase: the motors' currents counted in full on one line (a single-phase motor included,
 * a conservative simplification, common practice), plus 25 % of the largest, times √3 × V.
 */
export function transformerKva(input: TransformerKvaInput): TransformerKva {
  if (input.loads.length === 0) throw new RangeError('a transformer needs at least one load');
  const largest = Math.max(...input.loads.map((l) => l.amps));
  const steps: string[] = [];
  let lineAmps: number;
  if (input.phases === 1 && input.splitPhase) {
    const half = input.secondaryVolts / 2;
    const legs = [0, 0];
    const sorted = [...input.loads].sort((a, b) => b.amps - a.amps);
    for (const l of sorted) {
      if (l.circuitVolts <= half + 1e-9) {
        const i = (legs[0] as number) <= (legs[1] as number) ? 0 : 1;
        legs[i] = (legs[i] as number) + l.amps;
      } else {
        legs[0] = (legs[0] as number) + l.amps;
        legs[1] = (legs[1] as number) + l.amps;
      }
    }
    const worst = Math.max(legs[0] as number, legs[1] as number);
    lineAmps = worst + 0.25 * largest;
    steps.push(
      `halves of the ${input.secondaryVolts}/${half} V secondary carry ${round2(legs[0] as number)} A and ${round2(legs[1] as number)} A; the more loaded ${round2(worst)} A + 25 % of the largest motor's ${largest} A = ${round2(lineAmps)} A`,
    );
  } else {
    const sum = input.loads.reduce((s, l) => s + l.amps, 0);
    lineAmps = sum + 0.25 * largest;
    steps.push(`${round2(sum)} A of motor current + 25 % of the largest motor's ${largest} A = ${round2(lineAmps)} A`);
  }
  const va = input.phases === 3 ? SQRT3 * input.secondaryVolts * lineAmps : input.secondaryVolts * lineAmps;
  const loadKva = Math.round(va / 10) / 100;
  const kva = nextStandardKva(va / 1000, input.phases);
  steps.push(
    `${round2(lineAmps)} A × ${input.phases === 3 ? '√3 × ' : ''}${input.secondaryVolts} V = ${loadKva} kVA; next standard rating ${kva} kVA (${TRANSFORMER_KVA_SOURCE})`,
  );
  return { loadAmps: round2(lineAmps), loadKva, kva, steps };
}

/** Rated current of a winding, A. */
export function ratedAmps(kva: number, volts: number, phases: 1 | 3): number {
  return round2((kva * 1000) / (phases === 3 ? SQRT3 * volts : volts));
}

/**
 * A standard device for a limit: at most maxAmps, or the next higher standard rating where the table
 * permits it (Table 450.3(B) Note 1). Inverse-time breaker ratings first; below 10 A the fuse ratings
 * of Table 240.6(A) (1, 3, 6 A).
 */
export function deviceWithin(
  maxAmps: number,
  nextHigherPermitted: boolean,
  edition: CodeEdition,
): { ratingAmps: number; family: DeviceFamily } {
  for (const family of ['breaker', 'fuse'] as const) {
    try {
      if (nextHigherPermitted) return { ratingAmps: nextHigherStandard(maxAmps, edition, family), family };
      return { ratingAmps: nextLowerStandard(maxAmps, edition, family), family };
    } catch (e) {
      if (!(e instanceof OutsideTableError)) throw e;
    }
  }
  throw new OutsideTableError(
    'Table 240.6(A)',
    `no standard rating within ${round2(maxAmps)} A (smallest ${standardRatings(edition, 'fuse')[0]} A)`,
  );
}

export interface TransformerProtection {
  method: TransformerProtectionMethod;
  primary: SourceProtection & { family: DeviceFamily };
  secondary: (SourceProtection & { family: DeviceFamily }) | null;
}

function side(
  limit: Limit450,
  amps: number,
  method: TransformerProtectionMethod,
  where: string,
  edition: CodeEdition,
): SourceProtection & { family: DeviceFamily } {
  const maxAmps = round2((limit.percent * amps) / 100);
  const d = deviceWithin(maxAmps, limit.nextHigherPermitted, edition);
  if (d.ratingAmps + 1e-9 < amps)
    throw new OutsideTableError(TABLE_450_3B, `no standard ${where} device between the rated ${amps} A and the ${maxAmps} A limit`);
  const higher = limit.nextHigherPermitted && d.ratingAmps > maxAmps + 1e-9 ? ', next higher standard rating (Note 1)' : '';
  return {
    method,
    percent: limit.percent,
    maxAmps,
    ratingAmps: d.ratingAmps,
    family: d.family,
    basis: `${nec(edition, TABLE_450_3B)}, ${limit.row}: ${limit.percent} % × ${amps} A = ${maxAmps} A → ${d.ratingAmps} A${higher} (Table 240.6(A))`,
  };
}

/**
 * Overcurrent protection of a transformer of 1000 V or less per Table 450.3(B). "primary-and-secondary"
 * (the default here): a primary device up to 250 % rides through the transformer's energising inrush
 * and the motors' starting current, and the secondary device (125 %) protects the secondary
 * (common practice for a transformer feeding motors).
 */
export function transformerProtection(
  input: { primaryAmps: number; secondaryAmps: number; method?: TransformerProtectionMethod },
  edition: CodeEdition,
): TransformerProtection {
  const method = input.method ?? 'primary-and-secondary';
  const primary = side(primaryLimit(method, input.primaryAmps), input.primaryAmps, method, 'primary', edition);
  const secondary =
    method === 'primary-and-secondary'
      ? side(secondaryLimit(input.secondaryAmps), input.secondaryAmps, method, 'secondary', edition)
      : null;
  return { method, primary, secondary };
}
