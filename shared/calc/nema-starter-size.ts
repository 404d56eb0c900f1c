// NEMA starter size for a full-voltage contactor starter from the NEMA ICS 2 horsepower ratings
// at the motor's voltage, with the lower plug-stop / plug-reverse / jogging ratings where that
// duty applies, and the size's continuous current at least the motor current. Controller
// horsepower rating at the voltage: NEC 430.83(A).

import { nec, type CodeEdition } from '../standards/code-edition';
import { NEMA_ICS_2, nemaColumn, nemaSizeFor, type NemaDuty } from '../standards/nema-ics-2-starter-sizes';

export interface NemaSizeResult {
  size: string;
  ratedHp: number;
  continuousAmps: number;
  basis: string;
}

export function nemaStarterSize(
  input: { hp: number; phases: 1 | 3; volts: number; duty: NemaDuty; amps: number },
  edition: CodeEdition,
): NemaSizeResult {
  const column = nemaColumn(input.phases, input.volts);
  const r = nemaSizeFor(input.hp, column, input.duty, input.amps);
  const dutyText = input.duty === 'normal' ? 'normal duty' : 'plugging/jogging duty';
  return { ...r, basis: `${NEMA_ICS_2} (${dutyText}, ${column}); ${nec(edition, '430.83(A)')}` };
}
