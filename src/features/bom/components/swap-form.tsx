import { useState, type FormEvent } from 'react';
import { useQuery } from '@tanstack/react-query';
import { Field, inputClass } from '../../../components/ui/field';
import { Button } from '../../../components/ui/button';
import { ErrorNote, Loading } from '../../../components/ui/feedback';
import { bomQueries, type StoredLine } from '../api/bom';
import { bucketLabel, categoryLabel } from './format';
import { formatAmount as money } from '../../../../shared/format/money';

/** Swap a line's part for another active item of the same category; the reason is required and kept on the line. */
export function SwapForm({ panelId, line, onSubmit, pending, error, onCancel }: { panelId: number; line: StoredLine; onSubmit: (v: { swapCode: string; swapReason: string }) => void; pending: boolean; error: unknown; onCancel: () => void }) {
  const options = useQuery(bomQueries.alternatives(panelId, line.id));
  const [code, setCode] = useState('');
  const [reason, setReason] = useState('');
  const [problem, setProblem] = useState<{ code?: string; reason?: string }>({});
  const submit = (e: FormEvent) => {
    e.preventDefault();
    const p = { code: code ? undefined : 'Choose the part', reason: reason.trim() ? undefined : 'Give the reason for the swap' };
    setProblem(p);
    if (!p.code && !p.reason) onSubmit({ swapCode: code, swapReason: reason.trim() });
  };
  return (
    <form onSubmit={submit} noValidate aria-label="Swap a part" className="space-y-3 rounded border border-copper-500/50 bg-copper-50 p-4">
      <h2 className="font-semibold">
        {line.status === 'unmatched' ? 'Choose a part for' : 'Swap'} {line.code ?? 'the unmatched line'} · {categoryLabel(line.category)} · {bucketLabel(line.bucket)}
      </h2>
      {line.status === 'unmatched' ? <p className="text-sm text-state-returned">✖ It needs: {line.requiredRatings}. Check that the part you choose meets every one.</p> : (
        <p className="text-sm">Now: {line.description} at {money(line.unitCost)} each. The swapped line takes the new part's price.</p>
      )}
      {options.isPending ? <Loading what="Loading parts" /> : options.isError ? <ErrorNote error={options.error} /> : (
        <div className="grid grid-cols-2 gap-3">
          <Field label="Part" error={problem.code}>
            {(p) => (
              <select {...p} value={code} onChange={(e) => setCode(e.target.value)} className={inputClass}>
                <option value="">Choose…</option>
                {options.data.map((o) => (
                  <option key={o.code} value={o.code}>
                    {o.code} — {o.description} — ${money(o.unitCost)} · {o.leadTimeDays} d
                  </option>
                ))}
              </select>
            )}
          </Field>
          <Field label="Reason" error={problem.reason}>{(p) => <input {...p} value={reason} onChange={(e) => setReason(e.target.value)} placeholder="e.g. Customer's standard" className={inputClass} />}</Field>
        </div>
      )}
      <div className="flex gap-2">
        <Button type="submit" disabled={pending}>Swap</Button>
        <Button variant="ghost" onClick={onCancel}>Cancel</Button>
      </div>
      {error ? <ErrorNote error={error} /> : null}
    </form>
  );
}
