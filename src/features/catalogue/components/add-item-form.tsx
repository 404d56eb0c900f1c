import { useForm, useWatch, type Resolver } from 'react-hook-form';
import { formResolver as zodResolver } from '../../../lib/form-resolver';
import type { z } from 'zod';
import {
  CATALOGUE_COLUMNS,
  CATEGORIES,
  CatalogueItemSchema,
  HP_VOLTS,
  REQUIRED_RATINGS,
  type Category,
  type Ratings,
} from '../../../../shared/schemas/catalogue';
import { Field, inputClass } from '../../../components/ui/field';
import { RATING_LABELS, RATING_UNITS } from '../../../../shared/labels';
import { Button } from '../../../components/ui/button';
import { ErrorNote } from '../../../components/ui/feedback';
import { ApiError } from '../../../lib/api-client';

type FormIn = z.input<typeof CatalogueItemSchema>;

/** The outline and clearances, as the backplate layout reads them (clearances: drives and soft starters). */
const OUTLINE_FIELDS = [
  ['outlineWidthMm', 'Width'],
  ['outlineHeightMm', 'Height'],
  ['outlineDepthMm', 'Depth'],
  ['clearanceAboveMm', 'Clearance above'],
  ['clearanceBelowMm', 'Clearance below'],
] as const;
type FormOut = z.output<typeof CatalogueItemSchema>;

const num = (v: unknown) => (v === '' || v === null || v === undefined ? undefined : Number(v));
const numOrNull = (v: unknown) => (v === '' || v === null || v === undefined ? null : Number(v));
const list = (v: unknown, asNumber: boolean) => {
  if (typeof v !== 'string' || v.trim() === '') return undefined;
  const parts = v
    .split('/')
    .map((s) => s.trim())
    .filter(Boolean);
  return asNumber ? parts.map(Number) : parts;
};

/** Drop the empty horsepower cells before validation (a partial record holds only given voltages). */
function withoutEmptyHp(v: FormIn): FormIn {
  const hp = v.ratings?.hpByVolts as Record<string, number | undefined> | undefined;
  if (!hp) return v;
  const given = Object.fromEntries(Object.entries(hp).filter(([, n]) => n !== undefined && !Number.isNaN(n)));
  return { ...v, ratings: { ...v.ratings, hpByVolts: Object.keys(given).length ? given : undefined } };
}
const itemResolver: Resolver<FormIn, unknown, FormOut> = (values, ctx, opts) =>
  zodResolver(CatalogueItemSchema)(withoutEmptyHp(values), ctx, opts);

const KIND_OF = new Map(CATALOGUE_COLUMNS.flatMap((c) => ('rating' in c.target ? [[c.target.rating, c.kind] as const] : [])));

/** Add one catalogue item: the common fields, then the ratings the chosen category must carry. */
export function AddItemForm({
  onSubmit,
  pending,
  error,
  onCancel,
}: {
  onSubmit: (v: FormOut) => void;
  pending: boolean;
  error: unknown;
  onCancel: () => void;
}) {
  const { register, handleSubmit, formState, control, setError } = useForm<FormIn, unknown, FormOut>({
    resolver: itemResolver,
    shouldUnregister: true,
    defaultValues: {
      category: 'contactor',
      unit: 'ea',
      active: true,
      sccrKa: null,
      heatLossW: 0,
      labourHours: 0,
      terminations: 0,
      ratings: {},
    },
  });
  const category = useWatch({ control, name: 'category' }) as Category;
  if (error instanceof ApiError) {
    for (const i of error.fieldIssues) {
      const name = i.path.replace(/^body\./, '') as never;
      if (!(formState.errors as Record<string, unknown>)[i.path.replace(/^body\./, '')]) setError(name, { message: i.message });
    }
  }
  const e = formState.errors;
  const re = (e.ratings ?? {}) as Record<string, { message?: string } | undefined>;
  const needed = REQUIRED_RATINGS[category] ?? [];
  return (
    <form
      onSubmit={handleSubmit(onSubmit)}
      noValidate
      aria-label="Add catalogue item"
      className="space-y-4 rounded border border-line bg-panel p-4"
    >
      <h2 className="text-lg font-semibold">Add an item</h2>
      <div className="grid grid-cols-4 gap-3">
        <Field label="Code" error={e.code?.message} hint="Upper-case letters, digits, hyphens">
          {(p) => <input {...p} {...register('code')} className={inputClass} />}
        </Field>
        <div className="col-span-2">
          <Field label="Description" error={e.description?.message}>
            {(p) => <input {...p} {...register('description')} className={inputClass} />}
          </Field>
        </div>
        <Field label="Category" error={e.category?.message}>
          {(p) => (
            <select {...p} {...register('category')} className={inputClass}>
              {CATEGORIES.map((c) => (
                <option key={c.id} value={c.id}>
                  {c.label}
                </option>
              ))}
            </select>
          )}
        </Field>
        <Field label="Unit cost" unit="$" error={e.unitCost?.message}>
          {(p) => <input {...p} {...register('unitCost', { setValueAs: num })} inputMode="decimal" className={inputClass} />}
        </Field>
        <Field label="Labour adder" unit="h" error={e.labourHours?.message}>
          {(p) => <input {...p} {...register('labourHours', { setValueAs: num })} inputMode="decimal" className={inputClass} />}
        </Field>
        <Field label="Lead time" unit="days" error={e.leadTimeDays?.message}>
          {(p) => <input {...p} {...register('leadTimeDays', { setValueAs: num })} inputMode="numeric" className={inputClass} />}
        </Field>
        <Field label="Unit" error={e.unit?.message}>
          {(p) => (
            <select {...p} {...register('unit')} className={inputClass}>
              <option value="ea">ea</option>
              <option value="ft">ft</option>
            </select>
          )}
        </Field>
        <Field label="Heat loss" unit="W" error={e.heatLossW?.message}>
          {(p) => <input {...p} {...register('heatLossW', { setValueAs: num })} inputMode="decimal" className={inputClass} />}
        </Field>
        <Field label="SCCR" unit="kA" error={e.sccrKa?.message} hint="Empty where none applies">
          {(p) => <input {...p} {...register('sccrKa', { setValueAs: numOrNull })} inputMode="decimal" className={inputClass} />}
        </Field>
        {OUTLINE_FIELDS.map(([key, label]) => (
          <Field key={key} label={label} unit="mm" error={e[key]?.message} hint="The layout places the part by it">
            {(p) => <input {...p} {...register(key, { setValueAs: num })} inputMode="decimal" className={inputClass} />}
          </Field>
        ))}
        <Field label="Terminations" error={e.terminations?.message}>
          {(p) => <input {...p} {...register('terminations', { setValueAs: num })} inputMode="numeric" className={inputClass} />}
        </Field>
        <label className="flex items-center gap-2 pt-5 text-sm">
          <input type="checkbox" {...register('active')} /> Active
        </label>
      </div>
      <fieldset className="rounded border border-line p-3">
        <legend className="px-1 text-sm font-semibold">Ratings this category must carry</legend>
        <div className="grid grid-cols-4 gap-3">
          {needed.map((key) => {
            if (key === 'hpByVolts') {
              return (['230', '460', '575'] as const).map((v) => (
                <Field key={`hp${v}`} label={`hp at ${v} V`} error={re.hpByVolts?.message}>
                  {(p) => (
                    <input
                      {...p}
                      {...register(`ratings.hpByVolts.${v}` as const, { setValueAs: num })}
                      inputMode="decimal"
                      className={inputClass}
                    />
                  )}
                </Field>
              ));
            }
            const kind = KIND_OF.get(key as Exclude<keyof Ratings, 'hpByVolts'>) ?? 'string';
            const name = `ratings.${key}` as const;
            if (kind === 'boolean') {
              return (
                <label key={key} className="flex items-center gap-2 pt-5 text-sm">
                  <input type="checkbox" {...register(name as 'ratings.timeDelay')} /> {RATING_LABELS[key]}
                </label>
              );
            }
            return (
              <Field
                key={key}
                label={RATING_LABELS[key]}
                unit={RATING_UNITS[key]}
                error={re[key]?.message}
                hint={kind.endsWith('List') ? 'values separated by /' : undefined}
              >
                {(p) => (
                  <input
                    {...p}
                    {...register(name as 'ratings.kind', {
                      setValueAs: (v: unknown) =>
                        kind === 'number' || kind === 'integer'
                          ? num(v)
                          : kind === 'numberList'
                            ? list(v, true)
                            : kind === 'stringList'
                              ? list(v, false)
                              : v === ''
                                ? undefined
                                : v,
                    })}
                    className={inputClass}
                  />
                )}
              </Field>
            );
          })}
        </div>
        <p className="mt-2 text-xs text-ink-soft">
          Other ratings (and horsepower at {HP_VOLTS.length} voltages) can be given through the spreadsheet import.
        </p>
      </fieldset>
      {error && !(error instanceof ApiError && error.fieldIssues.length) ? <ErrorNote error={error} /> : null}
      <div className="flex gap-2">
        <Button type="submit" disabled={pending}>
          Add item
        </Button>
        <Button variant="ghost" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
