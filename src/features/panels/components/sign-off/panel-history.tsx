import type { PanelDetail } from '../../../../../shared/schemas/panel';

/** The panel's signed-off revisions, oldest first. */
export function RevisionList({ revisions }: { revisions: PanelDetail['revisions'] }) {
  return (
    <section className="rounded border border-line bg-panel p-4">
      <h2 className="mb-2 text-lg font-semibold">Revisions</h2>
      {revisions.length === 0 ? (
        <p className="text-sm text-ink-soft">None yet.</p>
      ) : (
        <ul className="text-sm">
          {revisions.map((r) => (
            <li key={r.number}>
              <strong>R{r.number}</strong> signed off by {r.approvedBy ?? '—'} on {new Date(r.approvedAt).toLocaleString()}
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}

/** The comments left on the panel and its motors through submit, return and sign-off. */
export function PanelComments({ panel }: { panel: PanelDetail }) {
  return (
    <section className="rounded border border-line bg-panel p-4" aria-label="Comments">
      <h2 className="mb-2 text-lg font-semibold">Comments</h2>
      {panel.comments.length === 0 ? (
        <p className="text-sm text-ink-soft">None yet.</p>
      ) : (
        <ul className="space-y-2 text-sm">
          {panel.comments.map((c) => (
            <li key={c.id}>
              <strong>{c.author}</strong>
              {c.loadId ? ` on ${panel.loads.find((l) => l.id === c.loadId)?.tag ?? 'a motor'}` : ''}: {c.body}
              <div className="text-xs text-ink-soft">{new Date(c.at).toLocaleString()}</div>
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
