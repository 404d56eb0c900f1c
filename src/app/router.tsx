import { createBrowserRouter, redirect } from 'react-router-dom';
import { queryClient } from '../lib/query-client';
import { sessionQueries } from '../features/auth/api/session';
import { AppLayout } from './routes/app-layout';
import { RouteError } from './routes/route-error';

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
    errorElement: <RouteError />,
    children: [
      { index: true, loader: () => redirect('/jobs') },
      { path: 'jobs', lazy: () => import('./routes/jobs') },
      { path: 'jobs/new', lazy: () => import('./routes/job-new') },
      { path: 'jobs/:jobId', lazy: () => import('./routes/job-detail') },
      { path: '*', lazy: () => import('./routes/not-found') },
    ],
  },
]);
