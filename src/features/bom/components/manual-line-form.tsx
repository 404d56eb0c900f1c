import { useState, type FormEvent } from 'react';
import { MANUAL_CATEGORIES, PANEL_BUCKET } from '../../../../shared/schemas/catalogue';
import { Field, inputClass } from '../../../components/ui/field';
import { Button } from '../../../components/ui/button';
import { ErrorNote } from '../../../components/ui/feedback';
import type { ManualLineInput } from '../api/bom';
import { bucketLabel, categoryLabel } from './format';

/** Freight, engineering hours, spares …: a line the rebuild keeps. */
export function ManualLineForm({
  buckets,
  onSubmit,
  pending,
  error,
  onCancel,
}: {
  buckets: string[];
  onSubmit: (v: ManualLineInput) => void;
  pending: boolean;
  error: unknown;
  onCancel: () => void;
}) {
  const [v, setV] = useState({
    category: 'freight' as ManualLineInput['category'],
    bucket: PANEL_BUCKET,
    description: '',
    quantity: '1',
    unitCost: '0',
    unitLabourHours: '0',
  });
  const [problem, setProblem] = useState<string | null>(null);
  const submit = (e: FormEvent) => {
    e.preventDefault();
    const quantity = Number(v.quantity);
    const unitCost = Number(v.unitCost);
    const unitLabourHours = Number(v.unitLabourHours);
    if (!v.description.trim()) return setProblem('Describe the line');
    if (!(quantity > 0) || !(unitCost >= 0) || !(unitLabourHours >= 0)) return setProblem('Quantity above 0; cost and hours 0 or more');
    setProblem(null);
    onSubmit({ category: v.category, bucket: v.bucket, description: v.description.trim(), quantity, unitCost, unitLabourHours });
  };
  const set = (k: keyof typeof v) => (e: { target: { value: string } }) => setV({ ...v, [k]: e.target.value });
  return (
    <form
      onSubmit={submit}
      noValidate
      aria-label="Add a manual line"
      className="grid grid-cols-6 items-end gap-3 rounded border border-line bg-panel p-4"
    >
      <Field label="Kind">
        {(p) => (
          <select {...p} value={v.category} onChange={set('category')} className={inputClass}>
            {MANUAL_CATEGORIES.map((c) => (
              <option key={c} value={c}>
                {categoryLabel(c)}
              </option>
            ))}
          </select>
        )}
      </Field>
      <Field label="Bucket">
        {(p) => (
          <select {...p} value={v.bucket} onChange={set('bucket')} className={inputClass}>
            {[PANEL_BUCKET, ...buckets.filter((b) => b !== PANEL_BUCKET)].map((b) => (
              <option key={b} value={b}>
                {bucketLabel(b)}
              </option>
            ))}
          </select>
        )}
      </Field>
      <div className="col-span-2">
        <Field label="Description" error={problem ?? undefined}>
          {(p) => (
            <input {...p} value={v.description} onChange={set('description')} placeholder="e.g. Freight to site" className={inputClass} />
          )}
        </Field>
      </div>
      <Field label="Quantity">
        {(p) => <input {...p} value={v.quantity} onChange={set('quantity')} inputMode="decimal" className={inputClass} />}
      </Field>
      <Field label="Unit cost" unit="$">
        {(p) => <input {...p} value={v.unitCost} onChange={set('unitCost')} inputMode="decimal" className={inputClass} />}
      </Field>
      <Field label="Labour per unit" unit="h">
        {(p) => <input {...p} value={v.unitLabourHours} onChange={set('unitLabourHours')} inputMode="decimal" className={inputClass} />}
      </Field>
      <div className="col-span-5 flex gap-2">
        <Button type="submit" disabled={pending} waitsFor="Saving…">
          Add line
        </Button>
        <Button variant="ghost" onClick={onCancel}>
          Cancel
        </Button>
        {error ? <ErrorNote error={error} /> : null}
      </div>
    </form>
  );
}
