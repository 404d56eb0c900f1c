import { useState } from 'react';
import { useQuery } from '@tanstack/react-query';
import { useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { jobQueries, useUpdateJob } from '../../features/jobs/api/jobs';
import { hasRole, sessionQueries } from '../../features/auth/api/session';
import { queryClient } from '../../lib/query-client';
import { ErrorNote, Loading, PageHeader } from '../../components/ui/feedback';
import { Button } from '../../components/ui/button';
import { JobForm } from '../../features/jobs/components/job-form';
import { JobPanels } from '../../features/panels/components/job-panels';
import { ActivityList } from '../../features/jobs/components/activity-list';
import { ROLE_SETS } from '../../../shared/schemas/auth';

export async function loader({ params }: LoaderFunctionArgs) {
  await queryClient.ensureQueryData(jobQueries.detail(Number(params.jobId)));
  return null;
}

export function Component() {
  const id = Number(useParams().jobId);
  const job = useQuery(jobQueries.detail(id));
  const { data: me } = useQuery(sessionQueries.me());
  const [editing, setEditing] = useState(false);
  const update = useUpdateJob(id);
  if (job.isPending) return <Loading what="Loading job" />;
  if (job.isError) return <ErrorNote error={job.error} />;
  const j = job.data;
  const canEdit = hasRole(me, ...ROLE_SETS.design);
  return (
    <div>
      <PageHeader
        title={
          <>
            <span className="text-copper-700">{j.number}</span> {j.name}
          </>
        }
        subtitle={`${j.customer} · ${j.site}`}
        actions={
          canEdit ? (
            <Button variant="secondary" onClick={() => setEditing((e) => !e)}>
              {editing ? 'Close' : 'Edit job'}
            </Button>
          ) : null
        }
      />
      {editing ? (
        <div className="mb-6">
          <JobForm
            initial={{ ...j, codeEdition: j.codeEdition as '2023' | '2020' }}
            submitLabel="Save job"
            pending={update.isPending}
            error={update.error}
            onSubmit={(v) => update.mutate({ ...v, version: j.version }, { onSuccess: () => setEditing(false) })}
          />
        </div>
      ) : (
        <dl className="mb-6 grid grid-cols-2 gap-x-8 gap-y-2 rounded border border-line bg-panel p-4 text-sm sm:grid-cols-5">
          <div>
            <dt className="text-xs uppercase text-ink-soft">Supply</dt>
            <dd className="font-semibold">
              {j.supplyVolts} V {j.supplyPhases}φ {j.supplyHz} Hz
            </dd>
          </div>
          <div>
            <dt className="text-xs uppercase text-ink-soft">Available fault</dt>
            <dd className="font-semibold">{j.availableFaultKa} kA</dd>
          </div>
          <div>
            <dt className="text-xs uppercase text-ink-soft">Ambient</dt>
            <dd className="font-semibold">{j.ambientC} °C</dd>
          </div>
          <div>
            <dt className="text-xs uppercase text-ink-soft">Voltage unbalance</dt>
            <dd className="font-semibold">{j.voltageUnbalancePercent ? `${j.voltageUnbalancePercent} %` : 'not given'}</dd>
          </div>
          <div>
            <dt className="text-xs uppercase text-ink-soft">Code</dt>
            <dd className="font-semibold">NEC {j.codeEdition}</dd>
          </div>
          <div>
            <dt className="text-xs uppercase text-ink-soft">Notes</dt>
            <dd>{j.notes || '—'}</dd>
          </div>
        </dl>
      )}
      <JobPanels jobId={id} canEdit={canEdit} />
      <p className="mt-2 text-sm">
        Bill of materials of the whole job:{' '}
        <a className="font-semibold text-copper-700 underline" href={`/api/jobs/${id}/bom.xlsx`}>
          ⬇ .xlsx
        </a>{' '}
        <a className="font-semibold text-copper-700 underline" href={`/api/jobs/${id}/bom.csv`}>
          ⬇ .csv
        </a>
      </p>
      <section className="mt-8">
        <h2 className="mb-2 text-lg font-semibold">Activity</h2>
        <ActivityList jobId={id} />
      </section>
    </div>
  );
}
