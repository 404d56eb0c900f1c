import { useQuery } from '@tanstack/react-query';
import { Link, NavLink, Outlet, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { panelQueries, useArchivePanel, useDuplicatePanel } from '../../../features/panels/api/panels';
import { hasRole, sessionQueries } from '../../../features/auth/api/session';
import { queryClient } from '../../../lib/query-client';
import { ErrorNote, Loading } from '../../../components/ui/feedback';
import { SignOffState } from '../../../components/ui/status';
import { Button } from '../../../components/ui/button';
import { RuleCheckBanner } from '../../../features/panels/components/rule-check-banner';
import { ROLE_SETS } from '../../../../shared/schemas/auth';

export async function loader({ params }: LoaderFunctionArgs) {
  await queryClient.ensureQueryData(panelQueries.detail(Number(params.panelId)));
  return null;
}

const SECTIONS = [
  { to: 'motors', label: 'Motors' },
  { to: 'protection', label: 'Protection' },
  { to: 'bill-of-materials', label: 'Bill of materials' },
  { to: 'drawings', label: 'Drawings' },
  { to: 'sign-off', label: 'Sign-off' },
  { to: 'activity', label: 'Activity' },
];

export function Component() {
  const { panelId, jobId } = useParams();
  const panel = useQuery(panelQueries.detail(Number(panelId)));
  const { data: me } = useQuery(sessionQueries.me());
  const duplicate = useDuplicatePanel(Number(panelId));
  const archive = useArchivePanel(Number(panelId));
  if (panel.isPending) return <Loading what="Loading panel" />;
  if (panel.isError) return <ErrorNote error={panel.error} />;
  const p = panel.data;
  const errors = p.loads.filter((l) => (l.selection?.errors.length ?? 1) > 0).length;
  return (
    <div>
      <nav aria-label="Breadcrumb" className="mb-1 text-sm text-ink-soft">
        <Link to="/jobs" className="hover:underline">
          Jobs
        </Link>{' '}
        ›{' '}
        <Link to={`/jobs/${jobId}`} className="hover:underline">
          {p.job.number} {p.job.name}
        </Link>{' '}
        › {p.name}
      </nav>
      <div className="mb-3 flex flex-wrap items-center gap-3">
        <h1 className="text-2xl font-semibold tracking-tight">{p.name}</h1>
        <SignOffState state={p.status} />
        <span className="text-sm text-ink-soft">
          {[
            p.revisionNumber === null ? 'No signed-off revision yet' : `Last signed off: R${p.revisionNumber}`,
            `${p.job.supplyVolts} V ${p.job.supplyPhases}φ ${p.job.supplyHz} Hz`,
            `${p.job.availableFaultKa} kA available`,
            ...(p.job.voltageUnbalancePercent > 0 ? [`${p.job.voltageUnbalancePercent} % voltage unbalance`] : []),
            `NEC ${p.job.codeEdition}`,
          ].join(' · ')}
        </span>
        {errors > 0 ? (
          <span className="rounded bg-bad-bg px-2 py-0.5 text-xs font-semibold text-state-returned">
            ✖ {errors} motor{errors > 1 ? 's' : ''} need fixing
          </span>
        ) : null}
        {hasRole(me, ...ROLE_SETS.design) ? (
          <span className="ml-auto flex gap-2">
            <Button variant="secondary" disabled={duplicate.isPending} waitsFor="Duplicating…" onClick={() => duplicate.mutate()}>
              Duplicate panel
            </Button>
            <Button variant="ghost" onClick={() => archive.mutate({ archived: !p.archivedAt, version: p.version })}>
              {p.archivedAt ? 'Restore' : 'Archive'}
            </Button>
          </span>
        ) : null}
      </div>
      {duplicate.isSuccess ? (
        <p className="mb-2 text-sm">
          ✔ Copy made:{' '}
          <Link className="font-semibold text-copper-700 underline" to={`/jobs/${jobId}/panels/${duplicate.data.id}`}>
            {duplicate.data.name}
          </Link>
        </p>
      ) : null}
      <RuleCheckBanner panel={p} canEdit={hasRole(me, ...ROLE_SETS.design)} />
      <nav aria-label="Panel sections" className="mb-4 flex gap-1 border-b border-line">
        {SECTIONS.map((s) => (
          <NavLink
            key={s.to}
            to={s.to}
            className={({ isActive }) =>
              `-mb-px border-b-2 px-3 py-2 text-sm font-semibold ${isActive ? 'border-copper-500 text-ink' : 'border-transparent text-ink-soft hover:text-ink'}`
            }
          >
            {s.label}
          </NavLink>
        ))}
      </nav>
      <Outlet />
    </div>
  );
}
