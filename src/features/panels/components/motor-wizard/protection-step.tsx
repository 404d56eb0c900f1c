import { SelectField } from '../../../../components/ui/field';
import { num, type StepProps } from './steps';

/** Step 4: the branch protective device and the conductors. */
export function ProtectionStep({ register, errors: e }: Omit<StepProps, 'values'>) {
  return (
    <>
      <SelectField
        label="Branch protective device"
        error={e.scpdType?.message}
        field={register('scpdType')}
        options={[
          ['inverse-time-breaker', 'Inverse-time circuit breaker'],
          ['instantaneous-trip-breaker', 'Instantaneous-trip breaker (listed combination)'],
          ['dual-element-fuse', 'Dual-element time-delay fuse'],
          ['non-time-delay-fuse', 'Non-time-delay fuse'],
        ]}
      />
      <SelectField
        label="Conductor material"
        field={register('conductor.material')}
        options={[
          ['cu', 'Copper'],
          ['al', 'Aluminium'],
        ]}
      />
      <SelectField
        label="Termination temperature"
        unit="°C"
        hint="75 °C is usual for starter terminals (110.14(C))"
        field={register('conductor.tempRatingC', num)}
        options={[
          [75, '75'],
          [60, '60'],
          [90, '90'],
        ]}
      />
    </>
  );
}
