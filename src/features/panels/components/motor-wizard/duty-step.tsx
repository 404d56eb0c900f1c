import { Field, SelectField, inputClass } from '../../../../components/ui/field';
import { opt, optNum, type StepProps } from './steps';

/** Step 2: how the motor runs and starts. */
export function DutyStep({ register, errors: e, values }: StepProps) {
  const supplyKind = values.supply as string;
  const variable = values.speedControl === 'variable';
  return (
    <>
      <SelectField
        label="Duty"
        error={e.duty?.message}
        field={register('duty')}
        options={[
          ['continuous', 'Continuous'],
          ['intermittent', 'Intermittent'],
        ]}
      />
      <SelectField
        label="Speed"
        error={e.speedControl?.message}
        field={register('speedControl')}
        options={[
          ['fixed', 'Fixed speed'],
          ['variable', 'Variable speed'],
        ]}
      />
      <SelectField
        label="Starting"
        error={e.startingLimit?.message}
        field={register('startingLimit')}
        options={[
          ['none', 'Full-voltage starting allowed'],
          ['reduced-inrush', 'Inrush must be limited'],
        ]}
      />
      {variable ? (
        <>
          <Field label="Turndown" unit="ratio, e.g. 10 for 10:1" error={e.turndown?.message}>
            {(a) => <input {...a} {...register('turndown', optNum)} inputMode="decimal" className={inputClass} />}
          </Field>
          <SelectField
            label="Load torque"
            error={e.torque?.message}
            field={register('torque', opt)}
            notGiven="Not known"
            options={[
              ['variable', 'Variable torque (fans, pumps)'],
              ['constant', 'Constant torque (conveyors, mixers)'],
            ]}
          />
          <Field
            label="Shared drive"
            unit="tag, e.g. VFD-1"
            hint="Leave empty for a drive of its own; motors naming one tag share one drive sized for their sum"
            error={e.sharedDrive?.message}
          >
            {(a) => <input {...a} {...register('sharedDrive', opt)} className={inputClass} />}
          </Field>
          <Field label="Drive rated input current" unit="A, from the chosen drive" error={e.driveInputAmps?.message}>
            {(a) => <input {...a} {...register('driveInputAmps', optNum)} inputMode="decimal" className={inputClass} />}
          </Field>
        </>
      ) : null}
      {values.startingLimit === 'reduced-inrush' && supplyKind === 'ac3' ? (
        <SelectField
          label="Reduced-voltage method"
          error={e.starterPreference?.message}
          field={register('starterPreference', opt)}
          notGiven="Let the rules choose"
          options={[
            ['rvss', 'Solid-state soft starter'],
            ['wye-delta', 'Wye-delta (six-lead delta motor)'],
            ['part-winding', 'Part-winding'],
          ]}
        />
      ) : null}
      <SelectField
        label="Load inertia"
        error={e.inertia?.message}
        hint="Decides the overload trip class"
        field={register('inertia')}
        options={[
          ['normal', 'Normal'],
          ['high', 'High'],
          ['very-high', 'Very high (large fans, centrifuges)'],
        ]}
      />
      <SelectField
        label="Control scheme"
        error={e.controlScheme?.message}
        hint="Drawn on the control schematic; two-wire restarts by itself after a power loss"
        field={register('controlScheme')}
        options={[
          ['three-wire', 'Three-wire: stop/start with seal-in'],
          ['two-wire', 'Two-wire: maintained contact from a remote controller'],
          ['hand-off-auto', 'Hand-off-auto selector'],
        ]}
      />
      <fieldset className="col-span-full flex flex-wrap gap-5 text-sm">
        <legend className="mb-1 text-xs font-semibold uppercase text-ink-soft">Operation</legend>
        <label className="flex items-center gap-2">
          <input type="checkbox" {...register('reversing')} /> Runs in both directions
        </label>
        <label className="flex items-center gap-2">
          <input type="checkbox" {...register('jogging')} /> Jogging
        </label>
        <label className="flex items-center gap-2">
          <input type="checkbox" {...register('plugging')} /> Plugging
        </label>
        <label className="flex items-center gap-2">
          <input type="checkbox" {...register('twoSpeed')} /> Two-speed motor
        </label>
        {supplyKind === 'dc' ? (
          <label className="flex items-center gap-2">
            <input type="checkbox" {...register('quickStop')} /> Quick stops (dynamic braking)
          </label>
        ) : null}
        {supplyKind === 'ac3' ? (
          <label className="flex items-center gap-2">
            <input type="checkbox" {...register('insideDelta')} /> Soft starter inside the delta
          </label>
        ) : null}
      </fieldset>
    </>
  );
}
