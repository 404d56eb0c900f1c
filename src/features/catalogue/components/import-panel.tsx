import { useState } from 'react';
import { ApiError } from '../../../lib/api-client';
import { ErrorNote } from '../../../components/ui/feedback';
import { useImportCatalogue } from '../api/catalogue';

interface RowError {
  row?: number;
  column?: string;
  path: string;
  message: string;
}

/** Upload a catalogue .xlsx/.csv: all rows go in, or none, with every problem listed by row and column. */
export function ImportPanel() {
  const imp = useImportCatalogue();
  const [name, setName] = useState('');
  const errors: RowError[] = imp.error instanceof ApiError ? (imp.error.fieldIssues as RowError[]) : [];
  return (
    <section aria-label="Import catalogue" className="space-y-3 rounded border border-line bg-panel p-4">
      <h2 className="text-lg font-semibold">Import a catalogue file</h2>
      <p className="text-sm text-ink-soft">
        Use the columns of the exported file. Items are matched by code: a known code is updated, a new one added, and items the file does
        not name stay as they are. Either every row is good and all go in, or nothing changes.
      </p>
      <input
        type="file"
        aria-label="Catalogue file"
        accept=".xlsx,.csv"
        onChange={(e) => {
          const f = e.target.files?.[0];
          if (!f) return;
          setName(f.name);
          imp.mutate(f);
          e.target.value = '';
        }}
      />
      {imp.isPending ? (
        <p role="status" className="text-sm">
          Checking {name}…
        </p>
      ) : null}
      {imp.isSuccess ? (
        <p role="status" className="text-sm text-state-signed">
          ✔ {name}: {imp.data.created} added, {imp.data.updated} changed, {imp.data.unchanged} unchanged.
        </p>
      ) : null}
      {imp.error ? <ErrorNote error={imp.error} /> : null}
      {errors.length > 0 ? (
        <div className="max-h-72 overflow-auto rounded border border-line">
          <table className="dense w-full text-sm" aria-label="Import problems">
            <thead className="sticky top-0 bg-surface text-left text-xs uppercase tracking-wide text-ink-soft">
              <tr>
                <th className="px-2 py-1 text-right">Row</th>
                <th className="px-2 py-1">Column</th>
                <th className="px-2 py-1">Problem</th>
              </tr>
            </thead>
            <tbody>
              {errors.map((er, i) => (
                <tr key={i} className="border-t border-line/60">
                  <td className="px-2 py-1 text-right tabular-nums">{er.row ? er.row : '—'}</td>
                  <td className="px-2 py-1 font-semibold">{er.column || (er.row ? '(row)' : '(file)')}</td>
                  <td className="px-2 py-1">✖ {er.message}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      ) : null}
    </section>
  );
}
