import { useState } from 'react';
import { selectionValueLabel } from '../../../../shared/labels';
import type { LoadView } from '../../../../shared/schemas/panel';
import { OVERRIDE_FIELDS, type OverrideField, type OverrideInput } from '../../../../shared/schemas/override';
import { useSetOverrides } from '../api/panels';
import { Button } from '../../../components/ui/button';
import { ErrorNote } from '../../../components/ui/feedback';
import { inputClass } from '../../../components/ui/field';

function parseValue(field: OverrideField, raw: string): OverrideInput['value'] {
  if (field === 'relays.phaseLoss' || field === 'relays.phaseReversal') return raw === 'true';
  if (field === 'scpd.ratingAmps' || field === 'overload.tripClass') return Number(raw);
  return raw;
}

/** A designer's overrides of one motor's selection, each with a written justification. */
export function OverrideEditor({ panelId, load }: { panelId: number; load: LoadView }) {
  const set = useSetOverrides(panelId);
  const [field, setField] = useState<OverrideField>('starter.nemaSize');
  const [value, setValue] = useState('');
  const [why, setWhy] = useState('');
  const current: OverrideInput[] = load.overrides.map((o) => ({ field: o.field, value: o.value, justification: o.justification }));
  const save = (next: OverrideInput[]) =>
    set.mutate(
      { loadId: load.id, overrides: next, version: load.version },
      {
        onSuccess: () => {
          setValue('');
          setWhy('');
        },
      },
    );
  return (
    <section className="rounded border border-copper-500/40 bg-panel p-4" aria-label="Overrides">
      <h2 className="mb-2 text-lg font-semibold">Overrides</h2>
      {load.overrides.length ? (
        <ul className="mb-3 space-y-2 text-sm">
          {load.overrides.map((o) => (
            <li key={o.field} className="rounded bg-copper-50 p-2">
              <div className="flex justify-between gap-2">
                <span>
                  <strong>{OVERRIDE_FIELDS[o.field]}</strong>: {selectionValueLabel(o.field, o.was)} →{' '}
                  <strong>{selectionValueLabel(o.field, o.value)}</strong>
                </span>
                <button
                  type="button"
                  className="text-xs text-state-returned"
                  onClick={() => save(current.filter((c) => c.field !== o.field))}
                >
                  Remove
                </button>
              </div>
              <p className="text-xs">
                “{o.justification}” — {o.by}, {new Date(o.at).toLocaleDateString()}
              </p>
              {o.warnings.map((w) => (
                <p key={w} className="text-xs text-state-review">
                  ◔ {w}
                </p>
              ))}
            </li>
          ))}
        </ul>
      ) : (
        <p className="mb-2 text-sm text-ink-soft">None. An override needs a justification and is shown to the engineer.</p>
      )}
      <div className="grid grid-cols-2 gap-2 text-sm">
        <select
          aria-label="Decision to override"
          className={inputClass}
          value={field}
          onChange={(e) => setField(e.target.value as OverrideField)}
        >
          {Object.entries(OVERRIDE_FIELDS).map(([k, v]) => (
            <option key={k} value={k}>
              {v}
            </option>
          ))}
        </select>
        <input
          aria-label="New value"
          className={inputClass}
          placeholder="New value"
          value={value}
          onChange={(e) => setValue(e.target.value)}
        />
        <textarea
          aria-label="Justification"
          className={`${inputClass} col-span-2`}
          rows={2}
          placeholder="Why (at least 15 characters)"
          value={why}
          onChange={(e) => setWhy(e.target.value)}
        />
      </div>
      <Button
        className="mt-2"
        variant="secondary"
        disabled={!value || set.isPending}
        waitsFor={set.isPending ? 'Saving…' : 'Give the new value first.'}
        onClick={() => save([...current.filter((c) => c.field !== field), { field, value: parseValue(field, value), justification: why }])}
      >
        Add override
      </Button>
      {set.error ? (
        <div className="mt-2">
          <ErrorNote error={set.error} />
        </div>
      ) : null}
    </section>
  );
}
