import { useState } from 'react';
import type { PanelDetail } from '../../../../shared/schemas/panel';
import { useUpdatePanel } from '../api/panels';
import { ErrorNote } from '../../../components/ui/feedback';
import { inputClass } from '../../../components/ui/field';

const CHOICES = [
  ['unanswered', 'Not answered — taken as listed for 75 °C, flagged'],
  ['yes', 'Yes — every termination listed for 75 °C conductors'],
  ['no', 'No — hold 14–1 AWG and circuits of 100 A or less to 60 °C'],
] as const;

function choiceOf(v: boolean | null): (typeof CHOICES)[number][0] {
  return v === null ? 'unanswered' : v ? 'yes' : 'no';
}

/**
 * The panel's termination answer (NEC 110.14(C)(1)): are its starters, protective devices and terminal
 * blocks listed and identified for 75 °C conductors? Changing it selects every motor again.
 */
export function TerminationsAnswer({ panel, canEdit }: { panel: PanelDetail; canEdit: boolean }) {
  const update = useUpdatePanel(panel.id);
  const [error, setError] = useState<unknown>(null);
  const current = choiceOf(panel.terminationsListed75C);
  const differing = panel.loads.filter((l) => l.selection?.conductor.termination60C).length;
  return (
    <section aria-label="Termination temperature" className="rounded border border-line bg-panel p-4">
      <h2 className="mb-1 text-lg font-semibold">Termination temperature</h2>
      <p className="mb-2 text-sm text-ink-soft">
        NEC 110.14(C)(1): conductors of 14 through 1 AWG, or of a circuit of 100 A or less, are held to the 60 °C column of Table 310.16
        unless the equipment is listed and identified for 75 °C conductors. Check the listing and marking of the starters, protective
        devices and terminal blocks.
      </p>
      <label className="flex flex-wrap items-center gap-2 text-sm">
        <span className="font-semibold">Terminations listed for 75 °C</span>
        <select
          aria-label="Terminations listed for 75 °C"
          className={`${inputClass} max-w-md`}
          value={current}
          disabled={!canEdit || update.isPending}
          onChange={(e) => {
            const v = e.target.value;
            setError(null);
            update.mutate(
              { version: panel.version, terminationsListed75C: v === 'unanswered' ? null : v === 'yes' },
              { onError: setError },
            );
          }}
        >
          {CHOICES.map(([v, label]) => (
            <option key={v} value={v}>
              {label}
            </option>
          ))}
        </select>
        {update.isPending ? <span className="text-ink-soft">Selecting the motors again…</span> : null}
      </label>
      {panel.terminationsListed75C !== false && differing > 0 ? (
        <p className="mt-2 text-sm text-state-review" data-testid="termination-differs">
          ◔ {differing} motor{differing === 1 ? '' : 's'} would take a larger conductor at 60 °C terminations: shown beside the conductors
          on each card.
        </p>
      ) : null}
      {error ? <ErrorNote error={error} /> : null}
    </section>
  );
}
