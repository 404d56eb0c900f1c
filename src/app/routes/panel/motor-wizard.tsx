import { useEffect, useMemo, useState } from 'react';
import { useForm, useWatch, type FieldErrors } from 'react-hook-form';
import { useQuery } from '@tanstack/react-query';
import { useNavigate, useParams } from 'react-router-dom';
import { LoadSchema, type LoadInput } from '../../../../shared/schemas/load';
import { cleanAnswers as clean, motorResolver, newMotorAnswers } from '../../../features/panels/model/motor-answers';
import type { LoadSelection } from '../../../../shared/schemas/selection';
import { panelQueries, useSaveLoad } from '../../../features/panels/api/panels';
import { SelectionSummary } from '../../../features/panels/components/selection-summary';
import { OverrideEditor } from '../../../features/panels/components/override-editor';
import { jobSupply } from '../../../../shared/schemas/job';
import { ENVIRONMENT_LABELS } from '../../../features/panels/components/answer-labels';
import { fieldLabel } from '../../../../shared/labels';
import { browserSelector } from '../../../lib/selector';
import { needsOtherSource } from '../../../../shared/calc/other-sources';
import { Field, SelectField, inputClass, type SelectOption } from '../../../components/ui/field';
import { Button } from '../../../components/ui/button';
import { Caution, ErrorNote } from '../../../components/ui/feedback';
import { ApiError } from '../../../lib/api-client';
import type { CodeEdition } from '../../../../shared/standards/code-edition';

const STEPS = ['Nameplate', 'Duty', 'Site & hazards', 'Protection'] as const;
const STEP_FIELDS: Record<(typeof STEPS)[number], string[]> = {
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
    'startingLimit',
    'starterPreference',
    'insideDelta',
    'inertia',
    'twoSpeed',
    'quickStop',
    'controlScheme',
  ],
  'Site & hazards': ['environment', 'reverseRotationHazard', 'critical', 'cableLengthFt', 'fedFrom'],
  Protection: ['scpdType', 'conductor'],
};

const num = { setValueAs: (v: unknown) => (v === '' || v === null || v === undefined ? undefined : Number(v)) };
const opt = { setValueAs: (v: unknown) => (v === '' || v === null || v === undefined ? undefined : v) };
const optNum = { setValueAs: (v: unknown) => (v === '' || v === null || v === undefined ? undefined : Number(v)) };

const CODE_LETTERS: SelectOption[] = 'ABCDEFGHJKLMNPRSTUV'.split('').map((c) => [c, c]);
const DESIGNS: SelectOption[] = ['A', 'B', 'C', 'D'].map((c) => [c, `Design ${c}`]);
const LEADS: SelectOption[] = [3, 6, 9, 12].map((n) => [n, `${n} leads`]);

function firstStepWithError(errors: FieldErrors): number {
  const keys = Object.keys(errors);
  const i = STEPS.findIndex((s) => STEP_FIELDS[s].some((f) => keys.includes(f)));
  return Math.max(i, 0);
}

/** The preview's "what is missing" line: each answer by its label, with the plain sentence. */
function missingAnswers(issues: ReadonlyArray<{ path: PropertyKey[]; message: string }>): string {
  const parts = issues.slice(0, 3).map((i) => {
    const key = i.path.map(String).join('.');
    const name = key === 'hp' || key === 'kw' ? 'Horsepower or kW' : (fieldLabel(key) ?? key);
    return `${name}: ${i.message}`;
  });
  return [...new Set(parts)].join(' ') + (issues.length > 3 ? ' …' : '');
}

export function Component() {
  const { panelId, loadId, jobId } = useParams();
  const navigate = useNavigate();
  const { data: p } = useQuery(panelQueries.detail(Number(panelId)));
  const existing = loadId ? p?.loads.find((l) => l.id === Number(loadId)) : undefined;
  const save = useSaveLoad(Number(panelId));
  const [step, setStep] = useState(0);
  const form = useForm<LoadInput>({
    resolver: motorResolver,
    defaultValues: existing ? (existing.answers as LoadInput) : newMotorAnswers(),
    mode: 'onChange',
  });
  const { register, handleSubmit, formState, control, setError } = form;
  const values = useWatch({ control }) as Record<string, unknown>;
  const supplyKind = values.supply as string;
  const variable = values.speedControl === 'variable';
  const [preview, setPreview] = useState<{ sel: LoadSelection | null; error: string | null }>({ sel: null, error: null });
  const valuesKey = JSON.stringify(values);

  // Live preview: the same engine as the server, in the browser, as the answers change.
  // biome-ignore lint/correctness/useExhaustiveDependencies: keyed on the answers' JSON (valuesKey), as the form hands over a new values object on every render
  useEffect(() => {
    if (!p) return;
    const t = setTimeout(() => {
      const parsed = LoadSchema.safeParse(clean(values));
      if (!parsed.success) {
        setPreview((x) => ({ sel: x.sel, error: `Complete the answers to see the selection: ${missingAnswers(parsed.error.issues)}` }));
        return;
      }
      browserSelector((p.job.codeEdition === '2020' ? '2020' : '2023') as CodeEdition)
        .selectLoad(clean(values) as LoadInput, jobSupply({ ...p.job, terminationsListed75C: p.terminationsListed75C }))
        .then((sel) => setPreview({ sel, error: null }))
        .catch((e: Error) => setPreview({ sel: null, error: e.message }));
    }, 150);
    return () => clearTimeout(t);
  }, [valuesKey, p?.job.codeEdition]);

  const serverErrors = useMemo(() => (save.error instanceof ApiError ? save.error.fieldIssues : []), [save.error]);
  useEffect(() => {
    for (const i of serverErrors) {
      const name = i.path.replace(/^body\.answers\./, '');
      setError(name as keyof LoadInput, { message: i.message });
    }
  }, [serverErrors, setError]);

  if (!p) return null;
  const e = formState.errors as Record<string, { message?: string } | undefined>;
  const onSubmit = handleSubmit(
    (v) =>
      save.mutate(
        { loadId: existing?.id, answers: clean(v as Record<string, unknown>), version: existing?.version },
        { onSuccess: () => navigate(`/jobs/${jobId}/panels/${panelId}/motors`) },
      ),
    (errs) => setStep(firstStepWithError(errs)),
  );
  // Enter in a field submits the form through its first submit button, "Next": it moves to the next
  // step. Only the last step's Enter, or a click on the save button, saves the motor.
  const onFormSubmit = (ev: React.FormEvent<HTMLFormElement>) => {
    const submitter = (ev.nativeEvent as SubmitEvent).submitter as HTMLElement | null;
    if (step < STEPS.length - 1 && submitter?.dataset.action !== 'save') {
      ev.preventDefault();
      setStep((s) => s + 1);
      return;
    }
    void onSubmit(ev);
  };
  const stepName = STEPS[step];
  return (
    <div className="grid grid-cols-1 gap-5 lg:grid-cols-[minmax(0,1fr)_430px]">
      <form onSubmit={onFormSubmit} noValidate className="rounded border border-line bg-panel" aria-label="Motor wizard">
        <div className="flex items-center justify-between border-b border-line px-4 py-2">
          <h2 className="text-lg font-semibold">{existing ? `Motor ${existing.tag}` : 'New motor'}</h2>
          <ol className="flex gap-1 text-sm" aria-label="Steps">
            {STEPS.map((s, i) => (
              <li key={s}>
                <button
                  type="button"
                  aria-current={i === step ? 'step' : undefined}
                  onClick={() => setStep(i)}
                  className={`rounded px-2 py-1 font-semibold ${i === step ? 'bg-header text-white' : 'text-ink-soft hover:bg-copper-50'}`}
                >
                  {i + 1}. {s}
                  {STEP_FIELDS[s].some((f) => e[f]) ? <span className="ml-1 text-state-returned">⚠</span> : null}
                </button>
              </li>
            ))}
          </ol>
        </div>
        <div className="grid grid-cols-2 gap-4 p-4 md:grid-cols-3">
          {stepName === 'Nameplate' ? (
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
                  <SelectField
                    label="Leads"
                    error={e.leads?.message}
                    field={register('leads', optNum)}
                    notGiven="Not known"
                    options={LEADS}
                  />
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
          ) : null}
          {stepName === 'Duty' ? (
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
          ) : null}
          {stepName === 'Site & hazards' ? (
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
              <Field
                label="Cable length to the motor"
                unit="ft"
                error={e.cableLengthFt?.message}
                hint="Long drive leads need an output filter"
              >
                {(a) => <input {...a} {...register('cableLengthFt', optNum)} inputMode="decimal" className={inputClass} />}
              </Field>
              {needsOtherSource(values, p.job.supplyVolts) ? (
                <div className="col-span-2">
                  <SelectField
                    label="Fed from"
                    error={e.fedFrom?.message}
                    hint={`Rated ${String(values.volts ?? '')} V${supplyKind === 'dc' ? ' DC' : ''} on a ${p.job.supplyVolts} V supply: the panel carries a transformer or DC supply for it (sized, protected per NEC 450.3(B), in the bill of materials and the feeder), or it is fed from outside the panel and left out of the feeder`}
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
                  <input type="checkbox" {...register('reverseRotationHazard')} /> Running backwards would damage the machine or hurt
                  someone (screw compressor, hoist, one-way coupling)
                </label>
                <label className="flex items-center gap-2">
                  <input type="checkbox" {...register('critical')} /> Critical load: loss of a phase must trip and alarm
                </label>
              </fieldset>
            </>
          ) : null}
          {stepName === 'Protection' ? (
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
          ) : null}
        </div>
        <div className="flex items-center gap-2 border-t border-line px-4 py-3">
          <Button variant="secondary" disabled={step === 0} onClick={() => setStep((s) => s - 1)}>
            ‹ Back
          </Button>
          {step < STEPS.length - 1 ? (
            <Button type="submit" variant="secondary" data-action="next">
              Next ›
            </Button>
          ) : null}
          <Button type="submit" data-action="save" className="ml-auto" disabled={save.isPending}>
            {save.isPending ? 'Saving…' : existing ? 'Save motor' : 'Add motor'}
          </Button>
          <Button variant="ghost" onClick={() => navigate(`/jobs/${jobId}/panels/${panelId}/motors`)}>
            Cancel
          </Button>
        </div>
        {save.error && !(save.error instanceof ApiError && save.error.fieldIssues.length) ? (
          <div className="px-4 pb-3">
            <ErrorNote error={save.error} />
          </div>
        ) : null}
      </form>
      <aside className="space-y-3" aria-label="Selection preview">
        <div className="rounded border border-line bg-panel p-4">
          <h2 className="mb-2 flex items-center justify-between text-lg font-semibold">
            Selection <span className="text-xs font-normal text-ink-soft">live, NEC {p.job.codeEdition}</span>
          </h2>
          {preview.error ? <p className="mb-2 text-sm text-state-review">◔ {preview.error}</p> : null}
          {preview.sel ? <SelectionSummary selection={preview.sel} /> : null}
        </div>
        {existing?.selection ? <OverrideEditor panelId={Number(panelId)} load={existing} /> : null}
        <Caution compact />
      </aside>
    </div>
  );
}
