// Motor branch-circuit short-circuit and ground-fault protection, NEC 430.52(C)(1) and
// Table 430.52, percent of the table FLC; Exception 1 permits the next higher standard rating of
// Table 240.6(A); Exception 2 (motor will not start) only as an explicit override with a reason,
// and then "in no case exceeding" its limit, so the rating is taken at or below it.
// Instantaneous-trip breakers: 430.52(C)(3), adjustable setting, listed combination controller.

import { ValidationError } from '../errors';
import type { PerWindingScpd, ScpdType } from '../schemas/selection';
import { nec, type CodeEdition } from '../standards/code-edition';
import { nextHigherStandard, nextLowerStandard } from '../standards/nec-table-240-6a';
import { exception2LimitPercent, maxPercent430_52, type MotorKind } from '../standards/nec-table-430-52';
import { round2 } from './round';

export interface ScpdResult {
  type: ScpdType;
  maxPercent: number;
  ratingAmps: number;
  computedMaxAmps: number;
  basis: string;
  exception: 'none' | 'exception-1' | 'exception-2';
}

/** The protective device in words, for a schedule, a one-line or a submittal. */
export const SCPD_WORDS: Record<ScpdType, string> = {
  'inverse-time-breaker': 'inverse-time breaker',
  'instantaneous-trip-breaker': 'instantaneous-trip breaker',
  'dual-element-fuse': 'dual-element fuses',
  'non-time-delay-fuse': 'non-time-delay fuses',
};

export function motorKind(load: { supply: 'ac3' | 'ac1' | 'dc'; rotor?: string; design?: string; energyEfficient?: boolean }): MotorKind {
  if (load.supply === 'dc') return 'dc-constant-voltage';
  if (load.supply === 'ac1') return 'single-phase';
  if (load.rotor === 'wound-rotor') return 'wound-rotor';
  if (load.design === 'B' && load.energyEfficient) return 'squirrel-cage-design-b-energy-efficient';
  return 'squirrel-cage';
}

function family(type: ScpdType): 'fuse' | 'breaker' {
  return type === 'dual-element-fuse' || type === 'non-time-delay-fuse' ? 'fuse' : 'breaker';
}

export function branchProtection(
  input: { flcAmps: number; type: ScpdType; motor: MotorKind; override?: { maxPercent: number; reason: string } },
  edition: CodeEdition,
): ScpdResult {
  const tablePercent = maxPercent430_52(input.motor, input.type);
  if (input.override) {
    const limit = exception2LimitPercent(input.motor, input.type, input.flcAmps);
    if (input.override.maxPercent > limit) {
      throw new ValidationError(
        `scpdOverride.maxPercent ${input.override.maxPercent} % exceeds the ${limit} % limit of 430.52(C)(1) Exception 2 for this device`,
        [{ path: 'scpdOverride.maxPercent', message: `at most ${limit} % for ${input.type}` }],
      );
    }
    const computed = round2((input.flcAmps * input.override.maxPercent) / 100);
    const clause = input.type === 'instantaneous-trip-breaker' ? '430.52(C)(3) Exception No. 1' : '430.52(C)(1) Exception No. 2';
    const rating =
      input.type === 'instantaneous-trip-breaker'
        ? Math.floor(computed * 10) / 10
        : nextLowerStandard(computed, edition, family(input.type));
    return {
      type: input.type,
      maxPercent: input.override.maxPercent,
      computedMaxAmps: computed,
      ratingAmps: rating,
      basis: nec(edition, `${clause} (override: ${input.override.reason}), Table 240.6(A)`),
      exception: 'exception-2',
    };
  }
  const computed = round2((input.flcAmps * tablePercent) / 100);
  if (input.type === 'instantaneous-trip-breaker') {
    return {
      type: input.type,
      maxPercent: tablePercent,
      computedMaxAmps: computed,
      // an adjustable trip setting, not a standard rating: set at or below the computed maximum
      ratingAmps: Math.floor(computed * 10) / 10,
      basis: nec(edition, '430.52(C)(3), Table 430.52'),
      exception: 'none',
    };
  }
  const rating = nextHigherStandard(computed, edition, family(input.type));
  return {
    type: input.type,
    maxPercent: tablePercent,
    computedMaxAmps: computed,
    ratingAmps: rating,
    basis: nec(
      edition,
      rating > computed + 1e-9
        ? '430.52(C)(1) Exception No. 1, Table 430.52, Table 240.6(A)'
        : '430.52(C)(1), Table 430.52, Table 240.6(A)',
    ),
    exception: rating > computed + 1e-9 ? 'exception-1' : 'none',
  };
}

// Part-winding motors, NEC 430.4 (text written from memory; check against the published edition):
// each motor winding connection shall have branch short-circuit and ground-fault protection rated at
// not more than one-half that specified by 430.52. Exception: one device for both windings is
// permitted if it will allow the motor to start; time-delay (dual-element) fuses so used are
// permitted at not more than 150 % of the motor full-load current.

/** One device per half-winding: half the Table 430.52 value; the next higher standard rating where
 *  the half is not one (430.52(C)(1) Exception No. 1 read into "that specified by 430.52"). */
function perWindingProtection(input: { flcAmps: number; type: ScpdType; motor: MotorKind }, edition: CodeEdition): PerWindingScpd {
  const maxPercent = maxPercent430_52(input.motor, input.type) / 2;
  const computed = round2((input.flcAmps * maxPercent) / 100);
  if (input.type === 'instantaneous-trip-breaker') {
    return {
      count: 2,
      maxPercent,
      computedMaxAmps: computed,
      ratingAmps: Math.floor(computed * 10) / 10,
      basis: nec(edition, '430.4, 430.52(C)(3), Table 430.52'),
    };
  }
  const rating = nextHigherStandard(computed, edition, family(input.type));
  return {
    count: 2,
    maxPercent,
    computedMaxAmps: computed,
    ratingAmps: rating,
    basis: nec(
      edition,
      rating > computed + 1e-9
        ? '430.4 (one-half of 430.52), 430.52(C)(1) Exception No. 1, Table 240.6(A)'
        : '430.4 (one-half of 430.52), Table 240.6(A)',
    ),
  };
}

/** One set of time-delay (dual-element) fuses for both windings of a part-winding motor: at most
 *  150 % of the table FLC, at or below it (430.4 Exception). */
function partWindingSingleFuse(flcAmps: number, edition: CodeEdition): ScpdResult {
  const computed = round2(flcAmps * 1.5);
  return {
    type: 'dual-element-fuse',
    maxPercent: 150,
    computedMaxAmps: computed,
    ratingAmps: nextLowerStandard(computed, edition, 'fuse'),
    basis: nec(edition, '430.4 Exception (one set of time-delay fuses for both windings, not over 150 % of FLC), Table 240.6(A)'),
    exception: 'none',
  };
}

/**
 * A part-winding motor's branch protection (NEC 430.4): the single device of the exception in place of
 * the 430.52 one (time-delay fuses then at most 150 % of FLC; an Exception No. 2 override stands), and
 * the alternative of a device on each half-winding.
 */
export function partWindingProtection(
  single: ScpdResult,
  input: { flcAmps: number; motor: MotorKind },
  edition: CodeEdition,
): { single: ScpdResult; perWinding: PerWindingScpd } {
  const both =
    single.type === 'dual-element-fuse' && single.exception !== 'exception-2'
      ? partWindingSingleFuse(input.flcAmps, edition)
      : {
          ...single,
          basis: `${single.basis}; ${nec(edition, '430.4 Exception')} (one device for both windings: it must let the motor start)`,
        };
  return { single: both, perWinding: perWindingProtection({ flcAmps: input.flcAmps, type: single.type, motor: input.motor }, edition) };
}

/** The per-winding alternative in words, or null when the motor is not part-winding. */
export function perWindingText(s: { scpd: { perWinding?: PerWindingScpd } }): string | null {
  const p = s.scpd.perWinding;
  if (!p) return null;
  return `or one per half-winding: ${p.count} × ${p.ratingAmps} A (max ${p.maxPercent} % = ${p.computedMaxAmps} A each)`;
}
