import { useState, type FormEvent } from 'react';
import { useQuery } from '@tanstack/react-query';
import { Field, inputClass } from '../../../components/ui/field';
import { Button } from '../../../components/ui/button';
import { ErrorNote, Loading } from '../../../components/ui/feedback';
import { bomQueries, type StoredLine } from '../api/bom';
import { bucketLabel, categoryLabel } from './format';
import { describeRequirement } from '../../../../shared/calc/bom';
import { formatAmount as money } from '../../../../shared/format/money';

/**
 * Swap a line's part for another active item that meets the line's requirement (the one the matcher used: the
 * server lists only those and refuses any other); the reason is required and kept on the line.
 */
export function SwapForm({
  panelId,
  line,
  onSubmit,
  pending,
  error,
  onCancel,
}: {
  panelId: number;
  line: StoredLine;
  onSubmit: (v: { swapCode: string; swapReason: string }) => void;
  pending: boolean;
  error: unknown;
  onCancel: () => void;
}) {
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
        {line.status === 'unmatched' ? 'Choose a part for' : 'Swap'} {line.code ?? 'the unmatched line'} · {categoryLabel(line.category)} ·{' '}
        {bucketLabel(line.bucket)}
      </h2>
      {line.status === 'unmatched' ? (
        <p className="text-sm text-state-returned">✖ Nothing active in the catalogue meets it yet.</p>
      ) : (
        <p className="text-sm">
          Now: {line.description} at {money(line.unitCost)} each. The swapped line takes the new part's price.
        </p>
      )}
      <p className="text-sm" data-testid="swap-needs">
        <span className="font-semibold">It must meet:</span>{' '}
        {line.requirement?.length
          ? line.requirement.map((r) => describeRequirement(r)).join(' — or — ')
          : (line.requiredRatings ?? 'a need the catalogue cannot be searched for: add a manual line for the part instead')}
      </p>
      {options.isPending ? (
        <Loading what="Loading parts" />
      ) : options.isError ? (
        <ErrorNote error={options.error} />
      ) : options.data.length === 0 ? (
        <p role="status" className="rounded border border-line bg-panel px-3 py-2 text-sm" data-testid="swap-none">
          ◔ No other active part in the catalogue meets it. Add one on the Catalogue page (an estimator or administrator), then swap; or add
          a manual line.
        </p>
      ) : (
        <div className="grid grid-cols-2 gap-3">
          <Field
            label={`Part (${options.data.length} that meet${options.data.length === 1 ? 's' : ''} it, cheapest first)`}
            error={problem.code}
          >
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
          <Field label="Reason" error={problem.reason}>
            {(p) => (
              <input
                {...p}
                value={reason}
                onChange={(e) => setReason(e.target.value)}
                placeholder="e.g. Customer's standard"
                className={inputClass}
              />
            )}
          </Field>
        </div>
      )}
      <div className="flex gap-2">
        <Button
          type="submit"
          disabled={pending || !options.data?.length}
          waitsFor={pending ? 'Saving…' : options.isPending ? 'Loading the parts that fit…' : 'No part to swap to.'}
        >
          Swap
        </Button>
        <Button variant="ghost" onClick={onCancel}>
          Cancel
        </Button>
      </div>
      {error ? <ErrorNote error={error} /> : null}
    </form>
  );
}
