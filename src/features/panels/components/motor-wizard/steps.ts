import type { FieldErrors, UseFormRegister } from 'react-hook-form';
import type { LoadInput } from '../../../../../shared/schemas/load';
import type { SelectOption } from '../../../../components/ui/field';

export const STEPS = ['Nameplate', 'Duty', 'Site & hazards', 'Protection'] as const;
export type StepName = (typeof STEPS)[number];

export const STEP_FIELDS: Record<StepName, string[]> = {
  Nameplate: [
    'tag',
    'description',
    'supply',
    'hp',
    'kw',
    'volts',
    'hz',
    'fla',
    'serviceFactor',
    'tempRiseC',
    'lockedRotorWithstandS',
    'codeLetter',
    'design',
    'energyEfficient',
    'poles',
    'rotor',
    'singlePhaseType',
    'dcField',
    'leads',
    'connection',
  ],
  Duty: [
    'duty',
    'jogging',
    'plugging',
    'reversing',
    'speedControl',
    'turndown',
    'torque',
    'sharedDrive',
    'driveInputAmps',
    'startingLimit',
    'starterPreference',
    'insideDelta',
    'inertia',
    'twoSpeed',
    'quickStop',
    'controlScheme',
  ],
  'Site & hazards': ['environment', 'reverseRotationHazard', 'critical', 'cableLengthFt', 'fedFrom'],
  Protection: ['scpdType', 'conductor', 'branchGroup', 'groupListedMaxAmps'],
};

/** The step that holds the first answer with an error (the first step when none does). */
export function firstStepWithError(errors: FieldErrors): number {
  const keys = Object.keys(errors);
  const i = STEPS.findIndex((s) => STEP_FIELDS[s].some((f) => keys.includes(f)));
  return Math.max(i, 0);
}

/** Each answer's error message, by the answer's name. */
export type FieldMessages = Record<string, { message?: string } | undefined>;

/** What every step's fields need: the form's register, the errors, and the answers so far. */
export interface StepProps {
  register: UseFormRegister<LoadInput>;
  errors: FieldMessages;
  values: Record<string, unknown>;
}

export const num = { setValueAs: (v: unknown) => (v === '' || v === null || v === undefined ? undefined : Number(v)) };
export const opt = { setValueAs: (v: unknown) => (v === '' || v === null || v === undefined ? undefined : v) };
export const optNum = { setValueAs: (v: unknown) => (v === '' || v === null || v === undefined ? undefined : Number(v)) };

export const CODE_LETTERS: SelectOption[] = 'ABCDEFGHJKLMNPRSTUV'.split('').map((c) => [c, c]);
export const DESIGNS: SelectOption[] = ['A', 'B', 'C', 'D'].map((c) => [c, `Design ${c}`]);
export const LEADS: SelectOption[] = [3, 6, 9, 12].map((n) => [n, `${n} leads`]);
