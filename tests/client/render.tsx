// Renders one route's screen as the app does: a fresh QueryClient (the app's own settings) and a memory router.
import type { ReactNode } from 'react';
import { QueryClientProvider } from '@tanstack/react-query';
import { createMemoryRouter, RouterProvider } from 'react-router-dom';
import { render } from '@testing-library/react';
import { makeQueryClient } from '../../src/lib/query-client';
import type { JobSummary } from '../../shared/schemas/job';
import type { PanelDetail } from '../../shared/schemas/panel';

export function renderRoute(routes: Array<{ path: string; element: ReactNode }>, at: string) {
  const queryClient = makeQueryClient();
  const router = createMemoryRouter(routes, { initialEntries: [at] });
  const view = render(
    <QueryClientProvider client={queryClient}>
      <RouterProvider router={router} />
    </QueryClientProvider>,
  );
  return { ...view, router, queryClient };
}

/** A job of the fictional demo plant: 480 V three-phase, 60 Hz, 65 kA available, NEC 2023. */
export const JOB: Omit<JobSummary, 'panelCount' | 'motorCount'> = {
  id: 7,
  number: 'J-2041',
  name: 'Clearwater pump station upgrade',
  customer: 'Northbrook Water Board',
  site: 'Clearwater',
  supplyVolts: 480,
  supplyPhases: 3,
  supplyHz: 60,
  availableFaultKa: 65,
  ambientC: 40,
  voltageUnbalancePercent: 0,
  codeEdition: '2023',
  notes: '',
  archivedAt: null,
  version: 1,
  updatedAt: '2026-11-02T09:30:00.000Z',
};

export function panelDetail(over: Partial<PanelDetail> = {}): PanelDetail {
  return {
    id: 12,
    jobId: JOB.id,
    name: 'MCC-1',
    description: '',
    mounting: 'wall-mounted',
    status: 'draft',
    revisionNumber: null,
    motorCount: 0,
    archivedAt: null,
    version: 3,
    updatedAt: '2026-11-02T09:30:00.000Z',
    markupPercent: 15,
    labourRate: 85,
    terminationsListed75C: null,
    rollup: null,
    job: JOB,
    loads: [],
    comments: [],
    revisions: [],
    ...over,
  };
}
