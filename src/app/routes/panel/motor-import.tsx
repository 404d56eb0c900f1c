import { useState } from 'react';
import { fieldLabel } from '../../../../shared/labels';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useNavigate, useParams } from 'react-router-dom';
import { api } from '../../../lib/api-client';
import { panelQueries } from '../../../features/panels/api/panels';
import { Button } from '../../../components/ui/button';
import { ErrorNote } from '../../../components/ui/feedback';

interface PreviewRow {
  row: number;
  tag: string;
  problems: Array<{ column: string; message: string }>;
  answers: Record<string, unknown> | null;
}

function upload<T>(url: string, file: File) {
  const fd = new FormData();
  fd.append('file', file);
  return api<T>('POST', url, fd);
}

export function Component() {
  const { panelId, jobId } = useParams();
  const navigate = useNavigate();
  const qc = useQueryClient();
  const [file, setFile] = useState<File | null>(null);
  const preview = useMutation({
    mutationFn: (f: File) => upload<{ rows: PreviewRow[]; ok: boolean }>(`/api/panels/${panelId}/import/preview`, f),
  });
  const commit = useMutation({
    mutationFn: (f: File) => upload<{ imported: number }>(`/api/panels/${panelId}/import/commit`, f),
    onSuccess: async () => {
      await qc.invalidateQueries({ queryKey: panelQueries.all() });
      navigate(`/jobs/${jobId}/panels/${panelId}/motors`);
    },
  });
  const rows = preview.data?.rows ?? [];
  const bad = rows.filter((r) => r.problems.length).length;
  return (
    <div className="space-y-4 rounded border border-line bg-panel p-5">
      <h2 className="text-lg font-semibold">Import a motor list</h2>
      <ol className="list-decimal space-y-1 pl-5 text-sm">
        <li>
          <a className="font-semibold text-copper-700 underline" href={`/api/panels/${panelId}/import/template`}>
            Download the template (.xlsx)
          </a>{' '}
          — one row per motor; the second sheet explains every column. CSV with the same header row works too, and so does a motor list
          exported from another panel (its first sheet is this format).
        </li>
        <li>Upload it for a preview: each row's problems are shown and nothing is saved.</li>
        <li>Import: all rows go in together, or none.</li>
      </ol>
      <div className="flex flex-wrap items-center gap-3">
        <input
          aria-label="Motor list file"
          type="file"
          accept=".xlsx,.csv"
          onChange={(e) => {
            const f = e.target.files?.[0] ?? null;
            setFile(f);
            preview.reset();
            commit.reset();
            if (f) preview.mutate(f);
          }}
        />
        <Button
          disabled={!file || !preview.data?.ok || commit.isPending}
          waitsFor={
            !file
              ? 'Choose a motor list (.xlsx or .csv) first.'
              : preview.isPending
                ? 'Checking the rows…'
                : commit.isPending
                  ? null
                  : !preview.data?.ok
                    ? 'Fix the rows with problems in the file first: nothing is imported until every row is good.'
                    : null
          }
          onClick={() => file && commit.mutate(file)}
        >
          {commit.isPending ? 'Importing…' : `Import ${rows.length || ''} motors`}
        </Button>
      </div>
      {preview.error ? <ErrorNote error={preview.error} /> : null}
      {commit.error ? <ErrorNote error={commit.error} /> : null}
      {rows.length ? (
        <>
          <p className={`text-sm font-semibold ${bad ? 'text-state-returned' : 'text-state-signed'}`}>
            {bad
              ? `✖ ${bad} of ${rows.length} rows have problems: fix them in the file and upload again.`
              : `✔ ${rows.length} rows are ready to import.`}
          </p>
          <table className="dense w-full text-sm" aria-label="Import preview">
            <thead className="text-left text-xs uppercase text-ink-soft">
              <tr>
                <th className="py-1">Row</th>
                <th>Tag</th>
                <th>hp / kW</th>
                <th>V</th>
                <th>Problems</th>
              </tr>
            </thead>
            <tbody>
              {rows.map((r) => (
                <tr key={r.row} className={`border-t border-line/60 ${r.problems.length ? 'bg-bad-bg' : ''}`}>
                  <td className="py-1">{r.row}</td>
                  <td className="font-semibold">{r.tag || '—'}</td>
                  <td>{String(r.answers?.hp ?? r.answers?.kw ?? '')}</td>
                  <td>{String(r.answers?.volts ?? '')}</td>
                  <td className="text-state-returned">
                    {r.problems.map((p) => `${fieldLabel(p.column) ?? p.column} (column ${p.column}): ${p.message}`).join('; ') || (
                      <span className="text-state-signed">✔ ok</span>
                    )}
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </>
      ) : null}
    </div>
  );
}
