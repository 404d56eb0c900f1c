// NEMA starter size for a full-voltage contactor starter from the NEMA ICS 2 horsepower ratings
// at the motor's voltage, with the lower plug-stop / plug-reverse / jogging ratings where that
// duty applies, and the size's continuous current at least the motor current. Controller
// horsepower rating at the voltage: NEC 430.83(A).

import { nec, type CodeEdition } from '../standards/code-edition';
import { NEMA_ICS_2, nemaColumn, nemaSizeFor, type NemaColumn, type NemaDuty } from '../standards/nema-ics-2-starter-sizes';

export interface NemaSizeResult {
  size: string;
  ratedHp: number;
  continuousAmps: number;
  basis: string;
}

/** The table's columns in words, for the basis a person reads (never the column key). */
const COLUMN_WORDS: Record<NemaColumn, string> = {
  '1ph-115': 'single-phase 115 V',
  '1ph-230': 'single-phase 230 V',
  '3ph-200': 'three-phase 200 V',
  '3ph-230': 'three-phase 230 V',
  '3ph-460-575': 'three-phase 460–575 V',
};

export function nemaStarterSize(
  input: { hp: number; phases: 1 | 3; volts: number; duty: NemaDuty; amps: number },
  edition: CodeEdition,
): NemaSizeResult {
  const column = nemaColumn(input.phases, input.volts);
  const r = nemaSizeFor(input.hp, column, input.duty, input.amps);
  const dutyText = input.duty === 'normal' ? 'normal duty' : 'plugging/jogging duty';
  const columnText = COLUMN_WORDS[column];
  return { ...r, basis: `${NEMA_ICS_2} (${dutyText}, ${columnText}); ${nec(edition, '430.83(A)')}` };
}
