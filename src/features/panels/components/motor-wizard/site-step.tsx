import { needsOtherSource } from '../../../../../shared/calc/other-sources';
import { Field, SelectField, inputClass } from '../../../../components/ui/field';
import { ENVIRONMENT_LABELS } from '../answer-labels';
import { opt, optNum, type StepProps } from './steps';

/** Step 3: where the panel stands and what running wrong would harm. */
export function SiteStep({ register, errors: e, values, supplyVolts }: StepProps & { supplyVolts: number }) {
  const supplyKind = values.supply as string;
  return (
    <>
      <div className="col-span-2">
        <SelectField
          label="Environment at the panel"
          error={e.environment?.message}
          hint="Decides the NEMA 250 enclosure type"
          field={register('environment', opt)}
          notGiven="Not known (assume indoor, dusty)"
          options={Object.entries(ENVIRONMENT_LABELS)}
        />
      </div>
      <Field label="Cable length to the motor" unit="ft" error={e.cableLengthFt?.message} hint="Long drive leads need an output filter">
        {(a) => <input {...a} {...register('cableLengthFt', optNum)} inputMode="decimal" className={inputClass} />}
      </Field>
      {needsOtherSource(values, supplyVolts) ? (
        <div className="col-span-2">
          <SelectField
            label="Fed from"
            error={e.fedFrom?.message}
            hint={`Rated ${String(values.volts ?? '')} V${supplyKind === 'dc' ? ' DC' : ''} on a ${supplyVolts} V supply: the panel carries a transformer or DC supply for it (sized, protected per NEC 450.3(B), in the bill of materials and the feeder), or it is fed from outside the panel and left out of the feeder`}
            field={register('fedFrom', opt)}
            options={[
              ['panel', 'A transformer or DC supply in this panel'],
              ['external', 'A source outside the panel'],
            ]}
          />
        </div>
      ) : null}
      <fieldset className="col-span-full space-y-2 text-sm">
        <legend className="mb-1 text-xs font-semibold uppercase text-ink-soft">Hazards</legend>
        <label className="flex items-center gap-2">
          <input type="checkbox" {...register('reverseRotationHazard')} /> Running backwards would damage the machine or hurt someone (screw
          compressor, hoist, one-way coupling)
        </label>
        <label className="flex items-center gap-2">
          <input type="checkbox" {...register('critical')} /> Critical load: loss of a phase must trip and alarm
        </label>
      </fieldset>
    </>
  );
}
