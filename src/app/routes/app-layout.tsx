import { NavLink, Outlet, useNavigate, useNavigation } from 'react-router-dom';
import { useQuery } from '@tanstack/react-query';
import { hasRole, sessionQueries, useSignOut } from '../../features/auth/api/session';
import { ROLE_LABELS, type Role, ROLE_SETS } from '../../../shared/schemas/auth';
import { ErrorBoundary } from '../../components/ui/error-boundary';
import { Mark } from '../../components/ui/mark';
import { panelQueries } from '../../features/panels/api/panels';

export function AppLayout() {
  const { data: me } = useQuery(sessionQueries.me());
  const signOut = useSignOut();
  const navigate = useNavigate();
  const navigation = useNavigation();
  // panels waiting on this person: in review for an engineer, returned for a panel builder
  const queue = useQuery({ ...panelQueries.queue(), enabled: !!me });
  const waiting = (queue.data ?? []).filter(
    (p) =>
      (p.status === 'in_review' && hasRole(me, ...ROLE_SETS.engineer)) || (p.status === 'returned' && hasRole(me, ...ROLE_SETS.design)),
  ).length;
  const links: Array<{ to: string; label: string; show: boolean }> = [
    { to: '/jobs', label: 'Jobs', show: true },
    { to: '/catalogue', label: 'Catalogue', show: true },
    { to: '/labour-units', label: 'Labour units', show: true },
    { to: '/people', label: 'People', show: hasRole(me, ...ROLE_SETS.admin) },
    { to: '/settings', label: 'Shop settings', show: hasRole(me, ...ROLE_SETS.admin) },
    { to: '/outbox', label: 'Outbox', show: hasRole(me, ...ROLE_SETS.admin) },
  ];
  return (
    <div className="min-h-screen">
      <a href="#main" className="sr-only focus:not-sr-only focus:absolute focus:left-2 focus:top-2 focus:z-50 focus:bg-panel focus:p-2">
        Skip to content
      </a>
      <header className="bg-header text-header-ink">
        <div className="mx-auto flex max-w-[1400px] items-center gap-6 px-4 py-2">
          <NavLink to="/jobs" className="flex items-center gap-2 text-lg font-bold tracking-wide">
            <Mark /> Panelwright
          </NavLink>
          <nav aria-label="Main" className="flex gap-1">
            {links
              .filter((l) => l.show)
              .map((l) => (
                <NavLink
                  key={l.to}
                  to={l.to}
                  className={({ isActive }) =>
                    `rounded px-3 py-1.5 text-sm font-medium ${isActive ? 'bg-white/10 text-white shadow-[inset_0_-2px_0_#c4814a]' : 'text-header-ink/80 hover:text-white'}`
                  }
                >
                  {l.label}
                  {l.to === '/jobs' && waiting > 0 ? (
                    <span
                      className="ml-1.5 rounded-full bg-copper-600 px-1.5 py-0.5 text-xs font-bold text-white"
                      title={`${waiting} panel${waiting === 1 ? '' : 's'} waiting for you`}
                    >
                      {waiting}
                      <span className="sr-only"> waiting for you</span>
                    </span>
                  ) : null}
                </NavLink>
              ))}
          </nav>
          <div className="ml-auto flex items-center gap-3 text-sm">
            <span title={me?.organisationName}>
              {me?.name} <span className="text-header-ink/60">· {me?.roles.map((r) => ROLE_LABELS[r as Role]).join(', ')}</span>
            </span>
            <button
              type="button"
              className="rounded border border-white/20 px-2 py-1 hover:border-copper-500"
              onClick={() => signOut.mutate(undefined, { onSettled: () => navigate('/sign-in') })}
            >
              Sign out
            </button>
          </div>
        </div>
        {navigation.state === 'loading' ? <div className="h-0.5 animate-pulse bg-copper-500" /> : <div className="h-0.5" />}
      </header>
      <main id="main" className="mx-auto max-w-[1400px] px-4 py-5">
        <ErrorBoundary>
          <Outlet />
        </ErrorBoundary>
      </main>
    </div>
  );
}
