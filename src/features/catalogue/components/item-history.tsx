import { useQuery } from '@tanstack/react-query';
import { fieldLabel } from '../../../../shared/labels';
import { ErrorNote, Loading } from '../../../components/ui/feedback';
import { catalogueQueries } from '../api/catalogue';
import type { CatalogueEntry } from '../../../../shared/schemas/catalogue';

const show = (v: unknown) => (v === null || v === undefined ? '—' : typeof v === 'object' ? JSON.stringify(v) : String(v));

/** Who changed a catalogue item, what and when. */
export function ItemHistory({ item, onClose }: { item: CatalogueEntry; onClose: () => void }) {
  const q = useQuery(catalogueQueries.history(item.id));
  return (
    <section aria-label={`History of ${item.code}`} className="rounded border border-line bg-panel p-4">
      <div className="mb-2 flex items-center justify-between">
        <h2 className="text-lg font-semibold">History of {item.code}</h2>
        <button type="button" className="text-sm text-ink-soft hover:text-ink" onClick={onClose}>
          Close
        </button>
      </div>
      {q.isPending ? (
        <Loading what="Loading history" />
      ) : q.isError ? (
        <ErrorNote error={q.error} />
      ) : q.data.length === 0 ? (
        <p className="text-sm text-ink-soft">No changes recorded since the catalogue was loaded.</p>
      ) : (
        <ol className="space-y-2 text-sm">
          {q.data.map((h) => (
            <li key={h.id} className="border-l-2 border-copper-500 pl-2">
              <div>
                <strong>{h.user ?? 'Someone'}</strong> · {new Date(h.at).toLocaleString()} · {h.summary}
              </div>
              {h.diff && h.action !== 'created' ? (
                <ul className="text-xs text-ink-soft">
                  {Object.entries(h.diff).map(([field, change]) => {
                    const [a, b] = Array.isArray(change) ? change : [null, change];
                    return (
                      <li key={field}>
                        {fieldLabel(field) ?? field}: {show(a)} → {show(b)}
                      </li>
                    );
                  })}
                </ul>
              ) : null}
            </li>
          ))}
        </ol>
      )}
    </section>
  );
}
