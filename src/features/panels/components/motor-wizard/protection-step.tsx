import { Field, SelectField, inputClass } from '../../../../components/ui/field';
import { num, opt, optNum, type StepProps } from './steps';

/** Step 4: the branch protective device, the conductors and the group of motors on one branch circuit (430.53). */
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
      <Field
        label="Branch-circuit group"
        error={e.branchGroup?.message}
        hint="Motors with the same group tag share one branch protective device (430.53); leave empty for its own branch circuit"
      >
        {(a) => <input {...a} {...register('branchGroup', opt)} placeholder="e.g. G-1" className={inputClass} />}
      </Field>
      <Field
        label="Group-installation listing, largest device"
        unit="A"
        error={e.groupListedMaxAmps?.message}
        hint="The largest fuse or inverse-time breaker marked on the controller and overload relay listed for group installation (430.53(C)); empty: not listed"
      >
        {(a) => <input {...a} {...register('groupListedMaxAmps', optNum)} inputMode="decimal" className={inputClass} />}
      </Field>
    </>
  );
}
