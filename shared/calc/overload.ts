// Motor overload protection, NEC 430.32(A)(1): a separate overload device set at no more than
// 125 % of the nameplate full-load current for motors with a marked service factor of 1.15 or more
// or a marked temperature rise of 40 °C or less, and 115 % for all other motors.
// (430.32(C) permits 140 % / 130 % where the motor will not start: an override, not a default.)

import { nec, type CodeEdition } from '../standards/code-edition';
import type { LoadSelection, OverloadRelay } from '../schemas/selection';
import { round2 } from './round';

export interface OverloadResult {
  maxSettingAmps: number;
  maxPercent: number;
  basis: string;
  why: string;
}

export function overloadMaxSetting(
  input: { flaAmps: number; serviceFactor: number; tempRiseC?: number },
  edition: CodeEdition,
): OverloadResult {
  let maxPercent = 115;
  let why = 'service factor below 1.15 and no marked temperature rise of 40 °C or less';
  if (input.serviceFactor >= 1.15) {
    maxPercent = 125;
    why = `service factor ${input.serviceFactor.toFixed(2)} (1.15 or more)`;
  } else if (input.tempRiseC !== undefined && input.tempRiseC <= 40) {
    maxPercent = 125;
    why = `marked temperature rise ${input.tempRiseC} °C (40 °C or less)`;
  }
  return {
    maxPercent,
    maxSettingAmps: Math.round(input.flaAmps * maxPercent) / 100,
    basis: nec(edition, '430.32(A)(1)'),
    why,
  };
}

/**
 * Where the relay sits changes the current it sees:
 * - wye-delta (star-delta) starter: the relay is normally wired in the motor leads of the delta
 *   windings, so it carries the phase current, FLA/√3 (common practice; the starter maker's wiring
 *   diagram governs: a relay in the incoming line is set at the full FLA);
 * - standard part-winding start: each half-winding has its own relay with a trip current one-half of
 *   that of 430.32 (NEC 430.4);
 * - every other starter: one relay carrying the line current.
 */
export function overloadRelay(
  input: { flaAmps: number; maxSettingAmps: number; starterType: string },
  edition: CodeEdition,
): OverloadRelay {
  const { flaAmps, maxSettingAmps, starterType } = input;
  if (starterType === 'wye-delta') {
    const share = 1 / Math.sqrt(3);
    return {
      share,
      count: 1,
      settingAmps: round2(flaAmps * share),
      maxAmps: round2(maxSettingAmps * share),
      note: 'relay in the motor leads of the delta windings: it carries the phase current, FLA/√3 (set at the full FLA if the starter maker puts it in the incoming line)',
      basis: `${nec(edition, '430.32(A)(1)')} limit × 1/√3; relay position: common practice, starter maker's diagram governs`,
    };
  }
  if (starterType === 'part-winding') {
    return {
      share: 0.5,
      count: 2,
      settingAmps: round2(flaAmps / 2),
      maxAmps: round2(maxSettingAmps / 2),
      note: 'one relay per half-winding, each with one-half the trip current of 430.32',
      basis: nec(edition, '430.4'),
    };
  }
  return {
    share: 1,
    count: starterType === 'two-speed' ? 2 : 1,
    settingAmps: round2(flaAmps),
    maxAmps: round2(maxSettingAmps),
    note: null,
    basis: nec(edition, '430.32(A)(1)'),
  };
}

type RelayInputs = Pick<LoadSelection, 'flaAmps' | 'overload' | 'starter'>;

/** The relay for a selection's own starter type, FLA and limit (the edition is read from the overload's basis). */
export function relayFor(s: RelayInputs): OverloadRelay {
  const edition: CodeEdition = /NEC 2020\b/.test(s.overload.basis) ? '2020' : '2023';
  return overloadRelay({ flaAmps: s.flaAmps, maxSettingAmps: s.overload.maxSettingAmps, starterType: s.starter.type }, edition);
}

/** The relay of a selection: the one it carries, or for a selection stored before overload.relay existed, relayFor. */
export function relayOf(s: RelayInputs): OverloadRelay {
  return s.overload.relay ?? relayFor(s);
}

/**
 * The relay as wired, in words, when it differs from one relay on the line current
 * ("1 relay in the delta windings: set 17.9 A, max 22.37 A each"); null otherwise or when the drive
 * provides the overload.
 */
export function relayWiringText(s: RelayInputs): string | null {
  if (s.overload.providedByDrive) return null;
  const relay = relayOf(s);
  if (relay.share === 1) return null;
  const where = relay.share === 0.5 ? 'one per half-winding' : 'in the delta windings';
  return `${relay.count} relay${relay.count > 1 ? 's' : ''} ${where}: set ${relay.settingAmps} A, max ${relay.maxAmps} A each`;
}
