import { createBrowserRouter, redirect } from 'react-router-dom';
import { queryClient } from '../lib/query-client';
import { sessionQueries } from '../features/auth/api/session';
import { AppLayout } from './routes/app-layout';
import { RouteError } from './routes/route-error';
import { Loading } from '../components/ui/feedback';

async function requireUser() {
  const me = await queryClient.ensureQueryData(sessionQueries.me());
  if (!me) throw redirect(`/sign-in?next=${encodeURIComponent(location.pathname + location.search)}`);
  return me;
}

export const router = createBrowserRouter([
  { path: '/sign-in', lazy: () => import('./routes/sign-in'), errorElement: <RouteError /> },
  { path: '/invite/:token', lazy: () => import('./routes/accept-invite'), errorElement: <RouteError /> },
  {
    path: '/',
    element: <AppLayout />,
    loader: requireUser,
    // shown while the first page waits for the signed-in person (asked again while the database is away)
    hydrateFallbackElement: <Loading what="Opening Panelwright" />,
    errorElement: <RouteError />,
    children: [
      { index: true, loader: () => redirect('/jobs') },
      { path: 'jobs', lazy: () => import('./routes/jobs') },
      { path: 'jobs/new', lazy: () => import('./routes/job-new') },
      { path: 'jobs/:jobId', lazy: () => import('./routes/job-detail') },
      {
        path: 'jobs/:jobId/panels/:panelId',
        lazy: () => import('./routes/panel/layout'),
        children: [
          { index: true, loader: () => redirect('motors') },
          { path: 'motors', lazy: () => import('./routes/panel/motors') },
          { path: 'motors/new', lazy: () => import('./routes/panel/motor-wizard') },
          { path: 'motors/import', lazy: () => import('./routes/panel/motor-import') },
          { path: 'motors/:loadId', lazy: () => import('./routes/panel/motor-wizard') },
          { path: 'protection', lazy: () => import('./routes/panel/protection') },
          { path: 'bill-of-materials', lazy: () => import('./routes/panel/bill-of-materials') },
          { path: 'drawings', lazy: () => import('./routes/panel/drawings') },
          { path: 'sign-off', lazy: () => import('./routes/panel/sign-off') },
          { path: 'activity', lazy: () => import('./routes/panel/activity') },
        ],
      },
      { path: 'catalogue', lazy: () => import('./routes/catalogue') },
      { path: 'labour-units', lazy: () => import('./routes/labour-units') },
      { path: 'people', lazy: () => import('./routes/people') },
      { path: 'settings', lazy: () => import('./routes/shop-settings') },
      { path: 'outbox', lazy: () => import('./routes/outbox') },
      { path: '*', lazy: () => import('./routes/not-found') },
    ],
  },
]);
