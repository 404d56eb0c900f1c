// The shop's settings form and its logo: name, address, pricing defaults, drawing numbers, the sign-off rule.
import { useEffect, useRef } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import { formResolver as zodResolver } from '../../../lib/form-resolver';
import { useLogo, useSaveSettings } from '../api/settings';
import {
  LOGO_MAX_BYTES,
  ShopSettingsFields,
  drawingNumber,
  drawingSchemeProblems,
  type ShopSettings,
  type ShopSettingsInput,
} from '../../../../shared/schemas/settings';
import { ErrorNote } from '../../../components/ui/feedback';
import { Field, inputClass } from '../../../components/ui/field';
import { Button } from '../../../components/ui/button';

const fieldsOf = (s: ShopSettings): ShopSettingsInput => ({
  name: s.name,
  address: s.address,
  defaultLabourRate: s.defaultLabourRate,
  defaultMarkupPercent: s.defaultMarkupPercent,
  drawingNumberScheme: s.drawingNumberScheme,
  allowSelfSignOff: s.allowSelfSignOff,
});

function SchemePreview({ scheme }: { scheme: string }) {
  if (drawingSchemeProblems(scheme).length) return null;
  const sample = (sheet: number) => drawingNumber(scheme, { job: 'J-2041', panel: 'MCC 1', rev: 'R2', sheet });
  return (
    <p className="text-sm" data-testid="scheme-preview">
      Preview (job J-2041, panel MCC 1, R2): <strong>{sample(1)}</strong>, <strong>{sample(2)}</strong> … one number per page of the
      submittal.
    </p>
  );
}

/** `moved(from, to)`: our own upload or removal moved the settings' version */
export function LogoSection({ settings, moved }: { settings: ShopSettings; moved: (from: number, to: number) => void }) {
  const { upload, remove } = useLogo();
  const input = useRef<HTMLInputElement>(null);
  const stamp = settings.logo?.updatedAt ?? '';
  return (
    <section className="rounded border border-line bg-panel p-4" aria-label="Logo">
      <h2 className="mb-2 text-lg font-semibold">Logo</h2>
      <p className="mb-3 text-sm text-ink-soft">
        PNG or JPEG, up to {LOGO_MAX_BYTES / 1024} KB. It prints beside the shop's name in the title block of every submittal page.
      </p>
      <div className="flex items-center gap-4">
        {settings.logo ? (
          <img
            src={`/api/settings/logo?v=${encodeURIComponent(stamp)}`}
            alt="The shop's logo"
            className="h-16 w-16 rounded border border-line object-contain"
          />
        ) : (
          <div className="flex h-16 w-16 items-center justify-center rounded border border-dashed border-line text-xs text-ink-soft">
            No logo
          </div>
        )}
        <input
          ref={input}
          type="file"
          accept="image/png,image/jpeg"
          aria-label="Logo file"
          className="text-sm"
          onChange={(e) => {
            const file = e.target.files?.[0];
            if (file) {
              upload.mutate(
                { file, version: settings.version },
                {
                  onSuccess: (s) => moved(settings.version, s.version),
                  onSettled: () => {
                    if (input.current) input.current.value = '';
                  },
                },
              );
            }
          }}
        />
        {settings.logo ? (
          <Button
            variant="ghost"
            disabled={remove.isPending}
            onClick={() => remove.mutate(settings.version, { onSuccess: (s) => moved(settings.version, s.version) })}
          >
            Remove the logo
          </Button>
        ) : null}
      </div>
      {upload.isPending ? <p className="mt-2 text-sm text-ink-soft">Uploading…</p> : null}
      {upload.error ? (
        <div className="mt-2">
          <ErrorNote error={upload.error} />
        </div>
      ) : null}
      {remove.error ? (
        <div className="mt-2">
          <ErrorNote error={remove.error} />
        </div>
      ) : null}
    </section>
  );
}

export function SettingsForm({ settings, base, setBase }: { settings: ShopSettings; base: number; setBase: (v: number) => void }) {
  const save = useSaveSettings();
  const { register, handleSubmit, formState, reset, control } = useForm<ShopSettingsInput>({
    resolver: zodResolver(ShopSettingsFields),
    defaultValues: fieldsOf(settings),
  });
  // `base`: the version these fields were read at; a save over someone else's newer change answers 409
  const dirty = formState.isDirty;
  useEffect(() => {
    if (dirty) return; // keep the person's edits (and their version) until they save or reload
    reset(fieldsOf(settings));
    setBase(settings.version);
  }, [settings, reset, dirty, setBase]);
  const scheme = useWatch({ control, name: 'drawingNumberScheme' }) ?? '';
  const e = formState.errors;
  return (
    <form
      noValidate
      aria-label="Shop settings"
      className="space-y-5"
      onSubmit={handleSubmit((v) =>
        save.mutate(
          { ...v, version: base },
          {
            onSuccess: (s) => {
              reset(fieldsOf(s));
              setBase(s.version);
            },
          },
        ),
      )}
    >
      <section className="grid gap-4 rounded border border-line bg-panel p-4 md:grid-cols-2">
        <h2 className="text-lg font-semibold md:col-span-2">The shop</h2>
        <Field
          label="Shop name"
          error={e.name?.message}
          hint="The manufacturer on the nameplate (NEC 409.110(1)) and in the submittal's title block"
        >
          {(a) => <input {...a} {...register('name')} className={inputClass} />}
        </Field>
        <Field label="Address" error={e.address?.message} hint="One line per part; the first two print in the title block">
          {(a) => <textarea {...a} {...register('address')} rows={3} className={inputClass} />}
        </Field>
      </section>
      <section className="grid gap-4 rounded border border-line bg-panel p-4 md:grid-cols-2">
        <h2 className="text-lg font-semibold md:col-span-2">Pricing defaults</h2>
        <p className="text-sm text-ink-soft md:col-span-2">
          A new panel starts with these; each panel keeps its own afterwards (the estimator changes them on its bill of materials), so a
          change here does not reprice panels already made.
        </p>
        <Field label="Labour rate" unit="$ per hour" error={e.defaultLabourRate?.message}>
          {(a) => <input {...a} {...register('defaultLabourRate', { valueAsNumber: true })} inputMode="decimal" className={inputClass} />}
        </Field>
        <Field label="Markup" unit="%" error={e.defaultMarkupPercent?.message}>
          {(a) => (
            <input {...a} {...register('defaultMarkupPercent', { valueAsNumber: true })} inputMode="decimal" className={inputClass} />
          )}
        </Field>
      </section>
      <section className="space-y-3 rounded border border-line bg-panel p-4">
        <h2 className="text-lg font-semibold">Drawing numbers</h2>
        <Field
          label="Drawing-number scheme"
          error={e.drawingNumberScheme?.message}
          hint="Parts: {job}, {panel}, {rev} (R2, or D for a draft) and {sheet}, the page; {sheet:2} pads it to two digits"
        >
          {(a) => <input {...a} {...register('drawingNumberScheme')} className={`${inputClass} max-w-md font-mono`} />}
        </Field>
        <SchemePreview scheme={scheme} />
      </section>
      <section className="space-y-2 rounded border border-line bg-panel p-4">
        <h2 className="text-lg font-semibold">Sign-off</h2>
        <label className="flex items-start gap-2 text-sm">
          <input type="checkbox" className="mt-1" {...register('allowSelfSignOff')} />
          <span>
            Allow self sign-off: an engineer who also builds panels may sign off a panel they submitted or changed since its last revision.
            Off, another engineer must sign it. Either way the activity records who did what.
          </span>
        </label>
      </section>
      <div className="flex items-center gap-3">
        <Button type="submit" disabled={save.isPending || !formState.isDirty}>
          Save settings
        </Button>
        {!formState.isDirty && !save.isSuccess ? <span className="text-sm text-ink-soft">Nothing changed yet.</span> : null}
        {save.isSuccess && !formState.isDirty ? <span className="text-sm text-state-signed">✔ Saved.</span> : null}
      </div>
      {save.error ? <ErrorNote error={save.error} /> : null}
    </form>
  );
}
