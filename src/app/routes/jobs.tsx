import { useState } from 'react';
import { useQuery } from '@tanstack/react-query';
import { Link, useSearchParams } from 'react-router-dom';
import { jobQueries, type JobListFilters } from '../../features/jobs/api/jobs';
import { hasRole, sessionQueries } from '../../features/auth/api/session';
import { queryClient } from '../../lib/query-client';
import { Empty, ErrorNote, Loading, PageHeader } from '../../components/ui/feedback';
import { inputClass } from '../../components/ui/field';
import { SignOffQueue } from '../../features/panels/components/sign-off-queue';
import { ROLE_SETS } from '../../../shared/schemas/auth';

function filtersFrom(params: URLSearchParams): JobListFilters {
  return {
    q: params.get('q') ?? undefined,
    archived: params.get('archived') === 'true' ? 'true' : 'false',
    sort: (params.get('sort') as JobListFilters['sort']) ?? 'updatedAt',
  };
}

export async function loader({ request }: { request: Request }) {
  await queryClient.ensureQueryData(jobQueries.list(filtersFrom(new URL(request.url).searchParams)));
  return null;
}

const COLUMNS: Array<{ key: JobListFilters['sort'] | null; label: string; right?: boolean }> = [
  { key: 'number', label: 'Job' },
  { key: 'name', label: 'Name' },
  { key: 'customer', label: 'Customer' },
  { key: null, label: 'Supply' },
  { key: null, label: 'Fault (kA)', right: true },
  { key: null, label: 'Panels', right: true },
  { key: null, label: 'Motors', right: true },
  { key: 'updatedAt', label: 'Changed' },
];

export function Component() {
  const [params, setParams] = useSearchParams();
  const filters = filtersFrom(params);
  const [q, setQ] = useState(filters.q ?? '');
  const { data: me } = useQuery(sessionQueries.me());
  const jobs = useQuery(jobQueries.list(filters));
  const set = (k: string, v: string | null) => {
    const next = new URLSearchParams(params);
    if (v) next.set(k, v);
    else next.delete(k);
    setParams(next, { replace: true });
  };
  return (
    <div>
      <PageHeader
        title="Jobs"
        subtitle="Customer orders, each with its panels and motors"
        actions={
          hasRole(me, ...ROLE_SETS.design) ? (
            <Link to="/jobs/new" className="rounded bg-copper-600 px-3 py-1.5 text-sm font-semibold text-white hover:bg-copper-700">
              + New job
            </Link>
          ) : null
        }
      />
      <SignOffQueue me={me} />
      <form
        className="mb-3 flex flex-wrap items-center gap-3"
        role="search"
        onSubmit={(e) => {
          e.preventDefault();
          set('q', q.trim() || null);
        }}
      >
        <input
          aria-label="Search jobs"
          placeholder="Search number, name, customer, site"
          value={q}
          onChange={(e) => setQ(e.target.value)}
          className={`${inputClass} max-w-xs`}
        />
        <label className="flex items-center gap-1.5 text-sm">
          <input
            type="checkbox"
            checked={filters.archived === 'true'}
            onChange={(e) => set('archived', e.target.checked ? 'true' : null)}
          />{' '}
          Archived jobs
        </label>
      </form>
      {jobs.isPending ? (
        <Loading what="Loading jobs" />
      ) : jobs.isError ? (
        <ErrorNote error={jobs.error} />
      ) : jobs.data.length === 0 ? (
        <Empty title={filters.q ? `No job matches “${filters.q}”` : 'No jobs yet'}>
          {hasRole(me, ...ROLE_SETS.design) ? 'Start with + New job.' : 'A panel builder creates jobs.'}
        </Empty>
      ) : (
        <div className="overflow-x-auto rounded border border-line bg-panel">
          <table className="dense w-full text-sm" aria-label="Jobs">
            <thead className="border-b border-line bg-surface text-left text-xs uppercase tracking-wide text-ink-soft">
              <tr>
                {COLUMNS.map((c) => (
                  <th
                    key={c.label}
                    className={`px-3 py-2 font-semibold ${c.right ? 'text-right' : ''}`}
                    aria-sort={c.key && filters.sort === c.key ? 'ascending' : undefined}
                  >
                    {c.key ? (
                      <button type="button" className="uppercase hover:text-ink" onClick={() => set('sort', c.key ?? null)}>
                        {c.label}
                        {filters.sort === c.key ? ' ▾' : ''}
                      </button>
                    ) : (
                      c.label
                    )}
                  </th>
                ))}
              </tr>
            </thead>
            <tbody>
              {jobs.data.map((j) => (
                <tr key={j.id} className="border-b border-line/60 last:border-0 hover:bg-copper-50">
                  <td className="px-3 py-2 font-semibold">
                    <Link to={`/jobs/${j.id}`} className="text-copper-700 hover:underline">
                      {j.number}
                    </Link>
                  </td>
                  <td className="px-3 py-2">{j.name}</td>
                  <td className="px-3 py-2">{j.customer}</td>
                  <td className="px-3 py-2">
                    {j.supplyVolts} V {j.supplyPhases}φ {j.supplyHz} Hz
                  </td>
                  <td className="px-3 py-2 text-right">{j.availableFaultKa}</td>
                  <td className="px-3 py-2 text-right">{j.panelCount}</td>
                  <td className="px-3 py-2 text-right">{j.motorCount}</td>
                  <td className="px-3 py-2 text-ink-soft">{new Date(j.updatedAt).toLocaleDateString()}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </div>
  );
}
