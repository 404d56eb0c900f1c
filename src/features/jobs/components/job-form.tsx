import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { formResolver as zodResolver } from '../../../lib/form-resolver';
import type { z } from 'zod';
import { CODE_EDITIONS, JobInputSchema, type JobInput } from '../../../../shared/schemas/job';
import { Field, inputClass } from '../../../components/ui/field';
import { percentUnbalance } from '../../../../shared/standards/nema-mg1-voltage-unbalance';
import { Button } from '../../../components/ui/button';
import { ErrorNote } from '../../../components/ui/feedback';
import { ApiError } from '../../../lib/api-client';

type FormIn = z.input<typeof JobInputSchema>;
type FormOut = z.output<typeof JobInputSchema>;

export function JobForm({
  initial,
  onSubmit,
  pending,
  error,
  submitLabel,
}: {
  initial?: Partial<JobInput>;
  onSubmit: (v: FormOut) => void;
  pending: boolean;
  error: unknown;
  submitLabel: string;
}) {
  const { register, handleSubmit, formState, setError, setValue } = useForm<FormIn, unknown, FormOut>({
    resolver: zodResolver(JobInputSchema),
    defaultValues: {
      supplyVolts: 480,
      supplyPhases: 3,
      supplyHz: 60,
      availableFaultKa: 22,
      ambientC: 30,
      voltageUnbalancePercent: 0,
      codeEdition: '2023',
      customer: '',
      site: '',
      notes: '',
      ...initial,
    },
  });
  if (error instanceof ApiError) {
    for (const i of error.fieldIssues) {
      const name = i.path.replace(/^body\./, '') as keyof FormIn;
      if (!formState.errors[name]) setError(name, { message: i.message });
    }
  }
  const e = formState.errors;
  return (
    <form onSubmit={handleSubmit(onSubmit)} noValidate className="grid max-w-3xl grid-cols-2 gap-4 rounded border border-line bg-panel p-5">
      <Field label="Job number" error={e.number?.message}>
        {(p) => <input {...p} {...register('number')} className={inputClass} />}
      </Field>
      <Field label="Name" error={e.name?.message}>
        {(p) => <input {...p} {...register('name')} className={inputClass} />}
      </Field>
      <Field label="Customer" error={e.customer?.message}>
        {(p) => <input {...p} {...register('customer')} className={inputClass} />}
      </Field>
      <Field label="Site" error={e.site?.message}>
        {(p) => <input {...p} {...register('site')} className={inputClass} />}
      </Field>
      <Field label="Supply voltage" unit="V" error={e.supplyVolts?.message}>
        {(p) => <input {...p} {...register('supplyVolts')} inputMode="numeric" className={inputClass} />}
      </Field>
      <div className="grid grid-cols-2 gap-3">
        <Field label="Phases" error={e.supplyPhases?.message}>
          {(p) => (
            <select {...p} {...register('supplyPhases')} className={inputClass}>
              <option value={3}>3</option>
              <option value={1}>1</option>
            </select>
          )}
        </Field>
        <Field label="Frequency" unit="Hz" error={e.supplyHz?.message}>
          {(p) => (
            <select {...p} {...register('supplyHz')} className={inputClass}>
              <option value={60}>60</option>
              <option value={50}>50</option>
            </select>
          )}
        </Field>
      </div>
      <Field
        label="Available fault current at the panel"
        unit="kA"
        hint="From the utility or the short-circuit study (NEC 409.22)"
        error={e.availableFaultKa?.message}
      >
        {(p) => <input {...p} {...register('availableFaultKa')} inputMode="decimal" className={inputClass} />}
      </Field>
      <Field label="Ambient temperature" unit="°C" error={e.ambientC?.message}>
        {(p) => <input {...p} {...register('ambientC')} inputMode="decimal" className={inputClass} />}
      </Field>
      <Field
        label="Voltage unbalance"
        unit="%"
        hint="Measured at the site; 0 when not known. Above 1 % the motors are derated (NEMA MG 1 14.35)"
        error={e.voltageUnbalancePercent?.message}
      >
        {(p) => <input {...p} {...register('voltageUnbalancePercent')} inputMode="decimal" className={inputClass} />}
      </Field>
      <UnbalanceFromVoltages onUse={(pct) => setValue('voltageUnbalancePercent', pct, { shouldDirty: true, shouldValidate: true })} />
      <Field label="Code edition" error={e.codeEdition?.message}>
        {(p) => (
          <select {...p} {...register('codeEdition')} className={inputClass}>
            {CODE_EDITIONS.map((c) => (
              <option key={c} value={c}>
                NEC {c}
              </option>
            ))}
          </select>
        )}
      </Field>
      <div className="col-span-2">
        <Field label="Notes" error={e.notes?.message}>
          {(p) => <textarea {...p} {...register('notes')} rows={3} className={inputClass} />}
        </Field>
      </div>
      {error && !(error instanceof ApiError && error.fieldIssues.length) ? (
        <div className="col-span-2">
          <ErrorNote error={error} />
        </div>
      ) : null}
      <div className="col-span-2">
        <Button type="submit" disabled={pending}>
          {pending ? 'Saving…' : submitLabel}
        </Button>
      </div>
    </form>
  );
}

/** Works the percent unbalance out of three measured line voltages (NEMA MG 1 14.36) for the field above. */
function UnbalanceFromVoltages({ onUse }: { onUse: (percent: number) => void }) {
  const [v, setV] = useState(['', '', '']);
  const nums = v.map(Number);
  const ready = v.every((x) => x.trim() !== '') && nums.every((x) => x > 0);
  const pct = ready ? percentUnbalance(nums as [number, number, number]) : null;
  return (
    <details className="self-start rounded border border-line px-3 py-2 text-sm">
      <summary className="cursor-pointer text-ink-soft">Work it out from three line voltages</summary>
      <div className="mt-2 grid grid-cols-3 gap-2">
        {['L1–L2', 'L2–L3', 'L3–L1'].map((label, i) => (
          <label key={label} className="text-xs text-ink-soft">
            {label} (V)
            <input
              aria-label={`Measured voltage ${label}`}
              value={v[i]}
              onChange={(ev) => setV((old) => old.map((x, j) => (j === i ? ev.target.value : x)))}
              inputMode="decimal"
              className={inputClass}
            />
          </label>
        ))}
      </div>
      <div className="mt-2 flex items-center justify-between gap-2">
        <p className="text-xs text-ink-soft">100 × largest deviation from the average ÷ average (NEMA MG 1 14.36).</p>
        <Button type="button" variant="secondary" disabled={pct === null} onClick={() => pct !== null && onUse(pct)}>
          {pct === null ? 'Use' : `Use ${pct} %`}
        </Button>
      </div>
    </details>
  );
}
