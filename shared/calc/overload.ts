// Motor overload protection, NEC 430.32(A)(1): a separate overload device set at no more than
// 125 % of the nameplate full-load current for motors with a marked service factor of 1.15 or more
// or a marked temperature rise of 40 °C or less, and 115 % for all other motors.
// (430.32(C) permits 140 % / 130 % where the motor will not start: an override, not a default.)

import { nec, type CodeEdition } from '../standards/code-edition';

export interface OverloadResult {
  maxSettingAmps: number;
  maxPercent: number;
  basis: string;
  why: string;
}

export function overloadMaxSetting(input: { flaAmps: number; serviceFactor: number; tempRiseC?: number }, edition: CodeEdition): OverloadResult {
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
