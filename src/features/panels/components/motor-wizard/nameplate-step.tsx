import { Field, SelectField, inputClass } from '../../../../components/ui/field';
import { CODE_LETTERS, DESIGNS, LEADS, num, opt, optNum, type StepProps } from './steps';

/** Step 1: the motor's nameplate. */
export function NameplateStep({ register, errors: e, values }: StepProps) {
  const supplyKind = values.supply as string;
  return (
    <>
      <Field label="Tag" error={e.tag?.message} hint="Unique on this panel, e.g. P-101">
        {(a) => <input {...a} {...register('tag')} className={inputClass} autoFocus />}
      </Field>
      <div className="col-span-2">
        <Field label="Description" error={e.description?.message}>
          {(a) => <input {...a} {...register('description', opt)} className={inputClass} />}
        </Field>
      </div>
      <SelectField
        label="Supply"
        error={e.supply?.message}
        field={register('supply', opt)}
        notGiven="Choose the supply"
        options={[
          ['ac3', 'Three-phase AC'],
          ['ac1', 'Single-phase AC'],
          ['dc', 'DC'],
        ]}
      />
      <Field label="Horsepower" unit="hp" error={e.hp?.message} hint="Or give kW instead">
        {(a) => <input {...a} {...register('hp', optNum)} inputMode="decimal" className={inputClass} />}
      </Field>
      <Field label="Kilowatts" unit="kW" error={e.kw?.message}>
        {(a) => <input {...a} {...register('kw', optNum)} inputMode="decimal" className={inputClass} />}
      </Field>
      <Field label="Rated voltage" unit="V" error={e.volts?.message} hint="From the nameplate, e.g. 460">
        {(a) => <input {...a} {...register('volts', num)} inputMode="numeric" className={inputClass} />}
      </Field>
      <SelectField
        label="Frequency"
        unit="Hz"
        error={e.hz?.message}
        field={register('hz', num)}
        options={[
          [60, '60'],
          [50, '50'],
        ]}
      />
      <Field label="Nameplate FLA" unit="A" error={e.fla?.message} hint="Sizes the overload (430.6(A)(2))">
        {(a) => <input {...a} {...register('fla', optNum)} inputMode="decimal" className={inputClass} />}
      </Field>
      <Field label="Service factor" error={e.serviceFactor?.message} hint="From the nameplate; empty: 1.0 assumed (115 % overload)">
        {(a) => <input {...a} {...register('serviceFactor', optNum)} inputMode="decimal" className={inputClass} />}
      </Field>
      <Field label="Temperature rise" unit="°C" error={e.tempRiseC?.message}>
        {(a) => <input {...a} {...register('tempRiseC', optNum)} inputMode="decimal" className={inputClass} />}
      </Field>
      <Field
        label="Locked-rotor withstand"
        unit="s"
        hint="hot safe stall time, motor maker's data"
        error={e.lockedRotorWithstandS?.message}
      >
        {(a) => <input {...a} {...register('lockedRotorWithstandS', optNum)} inputMode="decimal" className={inputClass} />}
      </Field>
      {supplyKind !== 'dc' ? (
        <SelectField
          label="NEMA code letter"
          error={e.codeLetter?.message}
          hint="Locked-rotor kVA/hp, Table 430.7(B)"
          field={register('codeLetter', opt)}
          notGiven="Not known"
          options={CODE_LETTERS}
        />
      ) : null}
      {supplyKind === 'ac3' ? (
        <>
          <SelectField
            label="NEMA design"
            error={e.design?.message}
            field={register('design', opt)}
            notGiven="Not known"
            options={DESIGNS}
          />
          <SelectField
            label="Rotor"
            error={e.rotor?.message}
            field={register('rotor')}
            options={[
              ['squirrel-cage', 'Squirrel cage'],
              ['wound-rotor', 'Wound rotor'],
            ]}
          />
          <SelectField label="Leads" error={e.leads?.message} field={register('leads', optNum)} notGiven="Not known" options={LEADS} />
          <SelectField
            label="Winding connection"
            error={e.connection?.message}
            field={register('connection', opt)}
            notGiven="Not known"
            options={[
              ['wye', 'Wye (star)'],
              ['delta', 'Delta'],
            ]}
          />
          <label className="flex items-center gap-2 self-end text-sm">
            <input type="checkbox" {...register('energyEfficient')} /> Energy-efficient Design B
          </label>
        </>
      ) : null}
      {supplyKind === 'ac1' ? (
        <SelectField
          label="Single-phase type"
          error={e.singlePhaseType?.message}
          field={register('singlePhaseType', opt)}
          notGiven="Not known"
          options={[
            ['split-phase', 'Split-phase'],
            ['capacitor-start', 'Capacitor-start'],
            ['psc', 'Permanent-split capacitor'],
            ['two-value-capacitor', 'Two-value capacitor'],
          ]}
        />
      ) : null}
      {supplyKind === 'dc' ? (
        <SelectField
          label="DC field"
          error={e.dcField?.message}
          field={register('dcField', opt)}
          notGiven="Not known"
          options={[
            ['shunt', 'Shunt'],
            ['series', 'Series'],
            ['compound', 'Compound'],
          ]}
        />
      ) : null}
      <Field label="Poles" error={e.poles?.message}>
        {(a) => <input {...a} {...register('poles', optNum)} inputMode="numeric" className={inputClass} />}
      </Field>
    </>
  );
}
