import { QueryClientProvider } from '@tanstack/react-query';
import { RouterProvider } from 'react-router-dom';
import { queryClient } from '../lib/query-client';
import { router } from './router';
import { DatabaseStatus } from '../components/ui/database-status';

export function AppProvider() {
  return (
    <QueryClientProvider client={queryClient}>
      <DatabaseStatus />
      <RouterProvider router={router} />
    </QueryClientProvider>
  );
}
