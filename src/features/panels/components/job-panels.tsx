import { useState } from 'react';
import { useQuery } from '@tanstack/react-query';
import { Link } from 'react-router-dom';
import { panelQueries, useCreatePanel } from '../api/panels';
import { SignOffState } from '../../../components/ui/status';
import { Empty, ErrorNote, Loading } from '../../../components/ui/feedback';
import { Button } from '../../../components/ui/button';
import { inputClass } from '../../../components/ui/field';

/** The panels of a job, with a one-line form for a new panel. */
export function JobPanels({ jobId, canEdit }: { jobId: number; canEdit: boolean }) {
  const panels = useQuery(panelQueries.list(jobId));
  const create = useCreatePanel(jobId);
  const [name, setName] = useState('');
  return (
    <section>
      <div className="mb-2 flex items-end justify-between">
        <h2 className="text-lg font-semibold">Panels</h2>
        {canEdit ? (
          <form
            className="flex gap-2"
            onSubmit={(e) => {
              e.preventDefault();
              if (name.trim()) create.mutate({ name: name.trim() }, { onSuccess: () => setName('') });
            }}
          >
            <input
              aria-label="New panel name"
              placeholder="New panel name, e.g. MCC-2"
              value={name}
              onChange={(e) => setName(e.target.value)}
              className={`${inputClass} w-64`}
            />
            <Button type="submit" disabled={create.isPending || !name.trim()}>
              + Add panel
            </Button>
          </form>
        ) : null}
      </div>
      {create.error ? <ErrorNote error={create.error} /> : null}
      {panels.isPending ? (
        <Loading what="Loading panels" />
      ) : panels.isError ? (
        <ErrorNote error={panels.error} />
      ) : panels.data.length === 0 ? (
        <Empty title="No panels yet">
          {canEdit ? 'Add the first panel (one enclosure or lineup) above.' : 'A panel builder adds panels.'}
        </Empty>
      ) : (
        <table className="dense w-full rounded border border-line bg-panel text-sm" aria-label="Panels">
          <thead className="border-b border-line bg-surface text-left text-xs uppercase tracking-wide text-ink-soft">
            <tr>
              <th className="px-3 py-2">Panel</th>
              <th className="px-3 py-2">State</th>
              <th className="px-3 py-2 text-right">Revision</th>
              <th className="px-3 py-2 text-right">Motors</th>
              <th className="px-3 py-2">Changed</th>
            </tr>
          </thead>
          <tbody>
            {panels.data.map((p) => (
              <tr key={p.id} className={`border-b border-line/60 last:border-0 hover:bg-copper-50 ${p.archivedAt ? 'opacity-60' : ''}`}>
                <td className="px-3 py-2 font-semibold">
                  <Link className="text-copper-700 hover:underline" to={`/jobs/${jobId}/panels/${p.id}`}>
                    {p.name}
                  </Link>
                  {p.archivedAt ? <span className="ml-2 text-xs text-ink-soft">(archived)</span> : null}
                </td>
                <td className="px-3 py-2">
                  <SignOffState state={p.status} />
                </td>
                <td className="px-3 py-2 text-right">{p.revisionNumber === null ? '—' : `R${p.revisionNumber}`}</td>
                <td className="px-3 py-2 text-right">{p.motorCount}</td>
                <td className="px-3 py-2 text-ink-soft">{new Date(p.updatedAt).toLocaleString()}</td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
    </section>
  );
}
