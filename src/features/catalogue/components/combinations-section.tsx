import { useState } from 'react';
import { useQuery } from '@tanstack/react-query';
import { useForm } from 'react-hook-form';
import { formResolver as zodResolver } from '../../../lib/form-resolver';
import { z } from 'zod';
import { combinationQueries, useCreateCombination, useImportCombinations, useUpdateCombination } from '../api/catalogue';
import { Field, inputClass } from '../../../components/ui/field';
import { Button } from '../../../components/ui/button';
import { ErrorNote, Loading } from '../../../components/ui/feedback';
import { ApiError } from '../../../lib/api-client';

/** The add form: parts typed as one list ("PW-BR-3P-030, PW-CN-N1-120"), split before they are sent. */
const FormSchema = z.object({
  ref: z.string().trim().min(1, 'Give the combination a reference'),
  parts: z.string().trim().min(1, 'Name at least two catalogue parts'),
  ratingKa: z.coerce.number({ error: 'A number of kA' }).min(0.1, 'At least 0.1 kA').max(200, 'At most 200 kA'),
  maxVolts: z.string().trim(),
  source: z.string().trim().min(3, 'Name the listing or the maker’s table it comes from'),
});
type FormIn = z.input<typeof FormSchema>;
type FormOut = z.output<typeof FormSchema>;

const splitParts = (s: string) =>
  s
    .split(/[\s,+;]+/)
    .map((p) => p.trim().toUpperCase())
    .filter(Boolean);

function AddCombinationForm({ onDone }: { onDone: () => void }) {
  const create = useCreateCombination();
  const { register, handleSubmit, formState, setError } = useForm<FormIn, unknown, FormOut>({
    resolver: zodResolver(FormSchema),
    defaultValues: { maxVolts: '480' },
  });
  const e = formState.errors;
  const submit = (v: FormOut) =>
    create.mutate(
      {
        ref: v.ref,
        componentCodes: splitParts(v.parts),
        ratingKa: v.ratingKa,
        maxVolts: v.maxVolts ? Number(v.maxVolts) : null,
        source: v.source,
      },
      {
        onSuccess: onDone,
        onError: (err) => {
          if (!(err instanceof ApiError)) return;
          for (const i of err.fieldIssues) {
            const field = i.path.replace(/^body\./, '').replace(/^componentCodes.*/, 'parts') as keyof FormIn;
            if (field in FormSchema.shape) setError(field, { message: i.message });
          }
        },
      },
    );
  return (
    <form
      onSubmit={handleSubmit(submit)}
      noValidate
      className="grid grid-cols-2 gap-3 rounded border border-line bg-panel p-4 lg:grid-cols-[1fr_2fr_0.6fr_0.6fr]"
      aria-label="Add a tested combination"
    >
      <Field label="Reference" error={e.ref?.message} hint="e.g. the maker's table row">
        {(p) => <input {...p} {...register('ref')} className={inputClass} />}
      </Field>
      <Field label="Parts" error={e.parts?.message} hint="Catalogue codes of the bucket, e.g. breaker, contactor, overload relay">
        {(p) => <input {...p} {...register('parts')} className={inputClass} />}
      </Field>
      <Field label="Rating" unit="kA" error={e.ratingKa?.message}>
        {(p) => <input {...p} {...register('ratingKa')} inputMode="decimal" className={inputClass} />}
      </Field>
      <Field label="Up to" unit="V" error={e.maxVolts?.message}>
        {(p) => <input {...p} {...register('maxVolts')} inputMode="numeric" className={inputClass} />}
      </Field>
      <div className="col-span-2 lg:col-span-3">
        <Field label="Source" error={e.source?.message} hint="The listing or the maker's published combination table">
          {(p) => <input {...p} {...register('source')} className={inputClass} />}
        </Field>
      </div>
      <div className="flex items-end gap-2">
        <Button type="submit" disabled={create.isPending}>
          {create.isPending ? 'Saving…' : 'Add combination'}
        </Button>
        <Button type="button" variant="secondary" onClick={onDone}>
          Cancel
        </Button>
      </div>
      {create.error && !(create.error instanceof ApiError && create.error.fieldIssues.length) ? (
        <div className="col-span-full">
          <ErrorNote error={create.error} />
        </div>
      ) : null}
    </form>
  );
}

/** The shop's tested combination ratings: read by every role, kept by estimators, engineers and administrators. */
export function CombinationsSection({ canEdit }: { canEdit: boolean }) {
  const list = useQuery(combinationQueries.list());
  const update = useUpdateCombination();
  const importing = useImportCombinations();
  const [adding, setAdding] = useState(false);
  return (
    <section className="space-y-3" aria-labelledby="combinations-title">
      <div className="flex flex-wrap items-end justify-between gap-2">
        <div>
          <h2 id="combinations-title" className="text-lg font-semibold">
            Tested combination ratings
          </h2>
          <p className="text-sm text-ink-soft">
            Parts of one bucket tested together to a short-circuit current rating (UL 508A SB4). When every part of a combination is in a
            bucket, the SCCR worksheet takes its rating for them. A combination is never rated above the interrupting rating of its own
            protective device.
          </p>
        </div>
        <div className="flex flex-wrap items-center gap-2">
          <a
            href="/api/catalogue/combinations.csv"
            className="rounded border border-line bg-panel px-3 py-1.5 text-sm font-semibold hover:border-copper-500"
            download
          >
            Download table (.csv)
          </a>
          {canEdit ? (
            <label className="cursor-pointer rounded border border-line bg-panel px-3 py-1.5 text-sm font-semibold hover:border-copper-500">
              {importing.isPending ? 'Importing…' : 'Import table (.csv, .xlsx)'}
              <input
                type="file"
                accept=".csv,.xlsx"
                className="sr-only"
                aria-label="Import a combination table"
                onChange={(e) => {
                  const f = e.target.files?.[0];
                  if (f) importing.mutate(f);
                  e.target.value = '';
                }}
              />
            </label>
          ) : null}
          {canEdit && !adding ? <Button onClick={() => setAdding(true)}>+ Add combination</Button> : null}
        </div>
      </div>
      {importing.isSuccess ? (
        <p className="text-sm" role="status">
          ✔ Imported: {importing.data.created} new, {importing.data.changed} changed, {importing.data.unchanged} unchanged. Columns: ref,
          parts (joined by +), ratingKa, maxVolts, source, active.
        </p>
      ) : null}
      {importing.error ? <ErrorNote error={importing.error} /> : null}
      {adding ? <AddCombinationForm onDone={() => setAdding(false)} /> : null}
      {update.error ? <ErrorNote error={update.error} /> : null}
      {list.isPending ? (
        <Loading what="Loading the combinations" />
      ) : list.isError ? (
        <ErrorNote error={list.error} />
      ) : list.data.length === 0 ? (
        <p className="text-sm text-ink-soft">None yet.</p>
      ) : (
        <table className="w-full border-collapse rounded border border-line bg-panel text-sm" aria-label="Tested combination ratings">
          <thead className="border-b border-line bg-surface text-left text-xs uppercase tracking-wide text-ink-soft">
            <tr>
              <th className="px-2 py-2">Reference</th>
              <th className="px-2 py-2">Parts</th>
              <th className="px-2 py-2 text-right">Rating (kA)</th>
              <th className="px-2 py-2 text-right">Up to (V)</th>
              <th className="px-2 py-2">Source</th>
              <th className="px-2 py-2">State</th>
            </tr>
          </thead>
          <tbody>
            {list.data.map((c) => (
              <tr key={c.id} className={`border-t border-line ${c.active ? '' : 'text-ink-soft'}`}>
                <td className="px-2 py-1.5 font-semibold">{c.ref}</td>
                <td className="px-2 py-1.5 font-mono text-xs">{c.componentCodes.join(' + ')}</td>
                <td className="px-2 py-1.5 text-right">{c.ratingKa}</td>
                <td className="px-2 py-1.5 text-right">{c.maxVolts ?? '—'}</td>
                <td className="px-2 py-1.5 text-xs">{c.source}</td>
                <td className="px-2 py-1.5">
                  {c.active ? '✔ in use' : '○ set aside'}
                  {canEdit ? (
                    <button
                      type="button"
                      className="ml-2 text-xs font-semibold text-copper-700 hover:underline"
                      disabled={update.isPending}
                      onClick={() => update.mutate({ id: c.id, version: c.version, active: !c.active })}
                    >
                      {c.active ? 'Set aside' : 'Use again'}
                    </button>
                  ) : null}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
    </section>
  );
}
