import { useState } from 'react';
import { useQuery } from '@tanstack/react-query';
import { Link, useParams } from 'react-router-dom';
import { panelQueries, useBulkEdit, useLoadAction } from '../../../features/panels/api/panels';
import { hasRole, sessionQueries } from '../../../features/auth/api/session';
import { overloadLabel, relayLabel, scpdLabel, starterLabel } from '../../../features/panels/components/selection-summary';
import { relayWiringText } from '../../../../shared/calc/overload';
import { Caution, Empty, ErrorNote } from '../../../components/ui/feedback';
import { Button } from '../../../components/ui/button';
import { inputClass } from '../../../components/ui/field';
import { ENVIRONMENT_LABELS } from '../../../features/panels/components/answer-labels';
import { sourcesSummary } from '../../../../shared/calc/other-sources';
import { ROLE_SETS } from '../../../../shared/schemas/auth';
import { SharedDriveNote } from '../../../features/panels/components/shared-drive-note';
import { GroupCircuitNote } from '../../../features/panels/components/group-circuit-note';

export function Component() {
  const panelId = Number(useParams().panelId);
  const { data: p } = useQuery(panelQueries.detail(panelId));
  const { data: me } = useQuery(sessionQueries.me());
  const action = useLoadAction(panelId);
  const bulk = useBulkEdit(panelId);
  const [selected, setSelected] = useState<number[]>([]);
  const [bulkField, setBulkField] = useState('environment');
  const [bulkValue, setBulkValue] = useState('indoor-dusty');
  if (!p) return null;
  const canEdit = hasRole(me, ...ROLE_SETS.design) && p.status !== 'in_review';
  const sources = sourcesSummary(p.rollup);
  const sourceOf = new Map(sources.sources.flatMap((s) => s.motors.map((m) => [m.tag, s] as const)));
  const external = new Set(sources.externalMotors.map((m) => m.tag));
  const toggle = (id: number) => setSelected((s) => (s.includes(id) ? s.filter((x) => x !== id) : [...s, id]));
  const applyBulk = () => {
    const value = bulkField === 'critical' || bulkField === 'reverseRotationHazard' ? bulkValue === 'true' : bulkValue;
    bulk.mutate({ loadIds: selected, changes: { [bulkField]: value }, panelVersion: p.version }, { onSuccess: () => setSelected([]) });
  };
  return (
    <div className="space-y-3">
      <div className="flex flex-wrap items-center gap-2">
        {canEdit ? (
          <>
            <Link to="new" className="rounded bg-copper-600 px-3 py-1.5 text-sm font-semibold text-white hover:bg-copper-700">
              + Add motor
            </Link>
            <Link to="import" className="rounded border border-line bg-panel px-3 py-1.5 text-sm font-semibold hover:border-copper-500">
              Import motor list
            </Link>
          </>
        ) : p.status === 'in_review' ? (
          <p className="text-sm text-state-review">◔ In review: motors are read-only until the engineer signs off or returns the panel.</p>
        ) : null}
        {p.loads.length ? (
          <a
            href={`/api/panels/${panelId}/motors.xlsx`}
            className="rounded border border-line bg-panel px-3 py-1.5 text-sm font-semibold hover:border-copper-500"
            download
          >
            Export motor list (.xlsx)
          </a>
        ) : null}
        {p.rollup ? (
          <span className="ml-auto text-sm">
            Feeder: <strong>{p.rollup.feeder.minAmpacity} A</strong> min ampacity · <strong>{p.rollup.feeder.conductorSize}</strong> ·
            protective device ≤ <strong>{p.rollup.feeder.ocpdMaxAmps} A</strong>{' '}
            <span className="text-xs text-ink-soft">({p.rollup.feeder.basis})</span>
          </span>
        ) : null}
      </div>
      {sources.lines.length > 0 ? (
        <div
          className="rounded border border-state-review/40 bg-warn-bg px-3 py-2 text-sm"
          role="note"
          aria-label="Motors at another voltage"
        >
          <p className="font-semibold">
            ◔ {sources.sources.reduce((n, s) => n + s.motors.length, 0) + sources.externalMotors.length} motor
            {sources.sources.reduce((n, s) => n + s.motors.length, 0) + sources.externalMotors.length === 1 ? '' : 's'} at another voltage
            than the {p.job.supplyVolts} V {p.job.supplyPhases === 1 ? 'single' : 'three'}-phase supply need another source:
          </p>
          <ul className="mt-1 list-disc space-y-0.5 pl-5">
            {sources.lines.map((l) => (
              <li key={l}>{l}</li>
            ))}
          </ul>
          <p className="mt-1 text-xs text-ink-soft">
            Change a motor’s “Fed from” answer in the wizard to move it between a source in the panel and one outside it.
          </p>
        </div>
      ) : null}
      <SharedDriveNote rollup={p.rollup} />
      <GroupCircuitNote rollup={p.rollup} />
      {p.rollup?.errors?.length ? (
        <div className="rounded border border-state-returned/40 bg-bad-bg px-3 py-2 text-sm" role="alert">
          {p.rollup.errors.map((e) => (
            <p key={e}>✖ {e}</p>
          ))}
        </div>
      ) : null}
      {canEdit && selected.length > 0 ? (
        <div
          className="flex flex-wrap items-center gap-2 rounded border border-copper-500/40 bg-copper-50 px-3 py-2 text-sm"
          role="group"
          aria-label="Bulk edit"
        >
          <strong>{selected.length} selected:</strong> set
          <select
            aria-label="Answer to change"
            className={`${inputClass} w-48`}
            value={bulkField}
            onChange={(e) => {
              setBulkField(e.target.value);
              setBulkValue(
                e.target.value === 'environment' ? 'indoor-dusty' : e.target.value === 'scpdType' ? 'inverse-time-breaker' : 'true',
              );
            }}
          >
            <option value="environment">Environment</option>
            <option value="scpdType">Protective device</option>
            <option value="critical">Critical load</option>
            <option value="reverseRotationHazard">Reverse-rotation hazard</option>
          </select>
          to
          <select aria-label="New value" className={`${inputClass} w-56`} value={bulkValue} onChange={(e) => setBulkValue(e.target.value)}>
            {bulkField === 'environment'
              ? Object.entries(ENVIRONMENT_LABELS).map(([k, v]) => (
                  <option key={k} value={k}>
                    {v}
                  </option>
                ))
              : bulkField === 'scpdType'
                ? ['inverse-time-breaker', 'instantaneous-trip-breaker', 'dual-element-fuse', 'non-time-delay-fuse'].map((k) => (
                    <option key={k} value={k}>
                      {scpdLabel(k)}
                    </option>
                  ))
                : [
                    <option key="t" value="true">
                      Yes
                    </option>,
                    <option key="f" value="false">
                      No
                    </option>,
                  ]}
          </select>
          <Button onClick={applyBulk} disabled={bulk.isPending} waitsFor="Applying…">
            Apply
          </Button>
          <Button variant="ghost" onClick={() => setSelected([])}>
            Clear
          </Button>
        </div>
      ) : null}
      {bulk.error ? <ErrorNote error={bulk.error} /> : null}
      {action.error ? <ErrorNote error={action.error} /> : null}
      {p.loads.length === 0 ? (
        <Empty title="No motors on this panel yet">
          {canEdit ? 'Add one with the wizard, or import the motor list from a spreadsheet.' : null}
        </Empty>
      ) : (
        <div className="overflow-x-auto rounded border border-line bg-panel">
          <table className="dense w-full text-sm" aria-label="Motors">
            <thead className="border-b border-line bg-surface text-left text-xs uppercase tracking-wide text-ink-soft">
              <tr>
                {canEdit ? (
                  <th className="px-2 py-2">
                    <span className="sr-only">Select</span>
                  </th>
                ) : null}
                <th className="px-2 py-2">Tag</th>
                <th className="px-2 py-2">Description</th>
                <th className="px-2 py-2 text-right">hp</th>
                <th className="px-2 py-2 text-right">V</th>
                <th className="px-2 py-2 text-right">FLC (A)</th>
                <th className="px-2 py-2">Starter</th>
                <th className="px-2 py-2">Protective device</th>
                <th className="px-2 py-2">Conductor</th>
                <th
                  className="px-2 py-2 text-right"
                  title="The overload relay's own maximum dial setting (NEC 430.32(A)(1) limit at the current the relay carries)"
                >
                  OL relay max (A)
                </th>
                <th className="px-2 py-2">Relays</th>
                <th className="px-2 py-2">Encl.</th>
                <th className="px-2 py-2">Flags</th>
                {canEdit ? (
                  <th className="px-2 py-2">
                    <span className="sr-only">Actions</span>
                  </th>
                ) : null}
              </tr>
            </thead>
            <tbody>
              {p.loads.map((l) => {
                const s = l.effective ?? l.selection;
                const bad = !s || s.errors.length > 0;
                return (
                  <tr key={l.id} className={`border-b border-line/60 last:border-0 ${bad ? 'bg-bad-bg' : 'hover:bg-copper-50'}`}>
                    {canEdit ? (
                      <td className="px-2 py-1.5">
                        <input
                          type="checkbox"
                          aria-label={`Select ${l.tag}`}
                          checked={selected.includes(l.id)}
                          onChange={() => toggle(l.id)}
                        />
                      </td>
                    ) : null}
                    <td className="px-2 py-1.5 font-semibold">
                      {canEdit ? (
                        <Link className="text-copper-700 hover:underline" to={`${l.id}`}>
                          {l.tag}
                        </Link>
                      ) : (
                        l.tag
                      )}
                    </td>
                    <td className="px-2 py-1.5">{String(l.answers.description ?? '')}</td>
                    <td className="px-2 py-1.5 text-right">{s?.hp ?? '—'}</td>
                    <td className="px-2 py-1.5 text-right">{String(l.answers.volts)}</td>
                    <td className="px-2 py-1.5 text-right">{s?.flcAmps ?? '—'}</td>
                    <td className="px-2 py-1.5">{s ? starterLabel(s) : '—'}</td>
                    <td className="px-2 py-1.5">{s ? `${scpdLabel(s.scpd.type)} ${s.scpd.ratingAmps} A` : '—'}</td>
                    <td className="px-2 py-1.5">{s?.conductor.size ?? '—'}</td>
                    <td className="px-2 py-1.5 text-right" title={s ? (relayWiringText(s) ?? undefined) : undefined}>
                      {s ? overloadLabel(s) : '—'}
                    </td>
                    <td className="px-2 py-1.5">{s ? relayLabel(s) : '—'}</td>
                    <td className="px-2 py-1.5">{s ? s.enclosure.nemaType : '—'}</td>
                    <td className="px-2 py-1.5 text-xs">
                      {bad ? (
                        <span className="font-semibold text-state-returned" title={s?.errors.join('; ')}>
                          ✖ error
                        </span>
                      ) : null}
                      {l.overrides.length ? (
                        <span className="ml-1 rounded bg-copper-100 px-1 font-semibold text-copper-700">{l.overrides.length} override</span>
                      ) : null}
                      {s?.assumed.length ? (
                        <span className="ml-1 text-state-review" title={s.assumed.map((a) => a.field).join(', ')}>
                          ◔ {s.assumed.length} assumed
                        </span>
                      ) : null}
                      {sourceOf.has(l.tag) ? (
                        <span
                          className="ml-1 whitespace-nowrap rounded bg-surface px-1 font-semibold"
                          title={sourceOf.get(l.tag)!.description}
                        >
                          ⚡ from {sourceOf.get(l.tag)!.tag}
                        </span>
                      ) : null}
                      {external.has(l.tag) ? (
                        <span
                          className="ml-1 whitespace-nowrap rounded bg-warn-bg px-1 font-semibold text-state-review"
                          title="Fed from a source outside the panel: not in the feeder or the panel's full-load current"
                        >
                          ⚡ outside source
                        </span>
                      ) : null}
                    </td>
                    {canEdit ? (
                      <td className="whitespace-nowrap px-2 py-1.5 text-right">
                        <button
                          type="button"
                          className="px-1 text-xs text-ink-soft hover:text-ink"
                          onClick={() => action.mutate({ loadId: l.id, action: 'copy' })}
                        >
                          Copy
                        </button>
                        <button
                          type="button"
                          className="px-1 text-xs text-state-returned"
                          onClick={() => {
                            if (confirm(`Remove motor ${l.tag}?`)) action.mutate({ loadId: l.id, action: 'delete' });
                          }}
                        >
                          Remove
                        </button>
                      </td>
                    ) : null}
                  </tr>
                );
              })}
            </tbody>
          </table>
        </div>
      )}
      <Caution />
    </div>
  );
}
