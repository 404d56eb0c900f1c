// Locked-rotor current from the NEMA code letter, NEC Table 430.7(B):
// I = kVA/hp × hp × 1000 / (V × √3) three-phase, / V single-phase.

import { nec, type CodeEdition } from '../standards/code-edition';
import { lockedRotorKvaPerHp } from '../standards/nec-table-430-7b';

export function lockedRotorCurrent(
  input: { codeLetter: string; hp: number; volts: number; phases: 1 | 3 },
  edition: CodeEdition,
): { min: number; max: number; basis: string } {
  const { min, max } = lockedRotorKvaPerHp(input.codeLetter);
  const divisor = input.volts * (input.phases === 3 ? Math.sqrt(3) : 1);
  const amps = (kvaPerHp: number) => Math.round(((kvaPerHp * input.hp * 1000) / divisor) * 10) / 10;
  const open = max === null;
  return {
    min: amps(min),
    max: amps(max ?? min),
    basis: `${nec(edition, '430.7(B), Table 430.7(B)')} (code letter ${input.codeLetter}${open ? ', open-ended: max shown equals min' : ''})`,
  };
}
