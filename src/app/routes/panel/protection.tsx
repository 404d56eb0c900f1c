import { useState } from 'react';
import { motorGroup } from '../../../../shared/calc/group-circuits';
import { selectionValueLabel } from '../../../../shared/labels';
import { useQuery } from '@tanstack/react-query';
import { useParams } from 'react-router-dom';
import { panelQueries, useAddComment } from '../../../features/panels/api/panels';
import { SelectionSummary } from '../../../features/panels/components/selection-summary';
import { OVERRIDE_FIELDS } from '../../../../shared/schemas/override';
import { PanelChecks } from '../../../features/checks/components/panel-checks';
import { TerminationsAnswer } from '../../../features/panels/components/terminations-answer';
import { hasRole, sessionQueries } from '../../../features/auth/api/session';
import { Caution } from '../../../components/ui/feedback';
import { Button } from '../../../components/ui/button';
import { inputClass } from '../../../components/ui/field';

/** The engineer's view: every protection choice with its clause, overrides and assumed inputs flagged, then the panel checks. */
export function Component() {
  const panelId = Number(useParams().panelId);
  const { data: p } = useQuery(panelQueries.detail(panelId));
  const comment = useAddComment(panelId);
  const { data: me } = useQuery(sessionQueries.me());
  const [drafts, setDrafts] = useState<Record<number, string>>({});
  if (!p) return null;
  const overrides = p.loads.flatMap((l) => l.overrides.map((o) => ({ tag: l.tag, ...o })));
  const assumedCount = p.loads.reduce((n, l) => n + (l.selection?.assumed.length ?? 0), 0);
  return (
    <div className="space-y-5">
      <Caution />
      <section className="grid gap-3 sm:grid-cols-3">
        <div className="rounded border border-line bg-panel p-3">
          <p className="text-xs uppercase text-ink-soft">Motors</p>
          <p className="text-2xl font-semibold">{p.loads.length}</p>
        </div>
        <div className={`rounded border p-3 ${overrides.length ? 'border-copper-500/50 bg-copper-50' : 'border-line bg-panel'}`}>
          <p className="text-xs uppercase text-ink-soft">Overrides to review</p>
          <p className="text-2xl font-semibold">{overrides.length}</p>
        </div>
        <div className={`rounded border p-3 ${assumedCount ? 'border-state-review/40 bg-warn-bg' : 'border-line bg-panel'}`}>
          <p className="text-xs uppercase text-ink-soft">Assumed inputs</p>
          <p className="text-2xl font-semibold">◔ {assumedCount}</p>
        </div>
      </section>
      <TerminationsAnswer panel={p} canEdit={hasRole(me, 'designer', 'admin')} />
      {overrides.length ? (
        <section aria-label="Overrides list" className="rounded border border-copper-500/40 bg-panel p-4">
          <h2 className="mb-2 text-lg font-semibold">Overrides</h2>
          <table className="dense w-full text-sm">
            <thead className="text-left text-xs uppercase text-ink-soft">
              <tr>
                <th className="py-1">Motor</th>
                <th>Decision</th>
                <th>Engine</th>
                <th>Override</th>
                <th>Justification</th>
                <th>Warnings</th>
              </tr>
            </thead>
            <tbody>
              {overrides.map((o) => (
                <tr key={`${o.tag}-${o.field}`} className="border-t border-line/60 align-top">
                  <td className="py-1 font-semibold">{o.tag}</td>
                  <td>{OVERRIDE_FIELDS[o.field]}</td>
                  <td>{selectionValueLabel(o.field, o.was)}</td>
                  <td className="font-semibold">{selectionValueLabel(o.field, o.value)}</td>
                  <td>
                    “{o.justification}” — {o.by}
                  </td>
                  <td className="text-xs text-state-review">{o.warnings.join(' ') || '—'}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </section>
      ) : null}
      <section aria-label="Protection by motor" className="grid gap-4 xl:grid-cols-2">
        {p.loads.map((l) => (
          <article
            key={l.id}
            className={`rounded border bg-panel p-4 ${l.overrides.length ? 'border-copper-500/60' : 'border-line'}`}
            aria-label={`Motor ${l.tag}`}
          >
            <h3 className="mb-2 flex items-baseline gap-2 text-base font-semibold">
              {l.tag}{' '}
              <span className="text-sm font-normal text-ink-soft">
                {String(l.answers.description ?? '')} · {(l.effective ?? l.selection)?.hp ?? '?'} hp {String(l.answers.volts)} V
              </span>
            </h3>
            {(l.effective ?? l.selection) ? (
              <SelectionSummary
                selection={(l.effective ?? l.selection)!}
                overridden={l.overrides.map((o) => o.field)}
                group={motorGroup(p.rollup, l.tag)}
              />
            ) : (
              <p className="text-sm text-state-returned">✖ No selection</p>
            )}
            <div className="mt-3 border-t border-line pt-2">
              {p.comments
                .filter((c) => c.loadId === l.id)
                .map((c) => (
                  <p key={c.id} className="text-sm">
                    <strong>{c.author}:</strong> {c.body}
                  </p>
                ))}
              <form
                className="mt-1 flex gap-2"
                onSubmit={(e) => {
                  e.preventDefault();
                  const body = (drafts[l.id] ?? '').trim();
                  if (body) comment.mutate({ body, loadId: l.id }, { onSuccess: () => setDrafts((d) => ({ ...d, [l.id]: '' })) });
                }}
              >
                <input
                  aria-label={`Comment on ${l.tag}`}
                  className={inputClass}
                  placeholder={`Comment on ${l.tag}`}
                  value={drafts[l.id] ?? ''}
                  onChange={(e) => setDrafts((d) => ({ ...d, [l.id]: e.target.value }))}
                />
                <Button type="submit" variant="secondary" disabled={comment.isPending} waitsFor="Saving…">
                  Comment
                </Button>
              </form>
            </div>
          </article>
        ))}
      </section>
      <PanelChecks panelId={panelId} />
    </div>
  );
}
