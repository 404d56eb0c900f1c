import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import { get, patch, post, qs } from '../../../lib/api-client';
import type { JobInput, JobSummary } from '../../../../shared/schemas/job';

export interface JobListFilters {
  q?: string;
  archived?: 'true' | 'false';
  sort?: 'number' | 'name' | 'customer' | 'updatedAt';
}

export type JobDetail = Omit<JobSummary, 'panelCount' | 'motorCount'>;

export interface ActivityEntry {
  id: number;
  entity: string;
  action: string;
  summary: string;
  user: string | null;
  at: string;
  diff: Record<string, unknown> | null;
  panelId: number | null;
}

export const jobQueries = {
  all: () => ['jobs'] as const,
  lists: () => [...jobQueries.all(), 'list'] as const,
  list: (filters: JobListFilters) =>
    queryOptions({ queryKey: [...jobQueries.lists(), filters], queryFn: () => get<JobSummary[]>(`/api/jobs${qs({ ...filters })}`) }),
  detail: (id: number) => queryOptions({ queryKey: [...jobQueries.all(), 'detail', id], queryFn: () => get<JobDetail>(`/api/jobs/${id}`) }),
  activity: (id: number) =>
    queryOptions({
      queryKey: [...jobQueries.all(), 'detail', id, 'activity'],
      queryFn: () => get<ActivityEntry[]>(`/api/jobs/${id}/activity`),
    }),
};

export function useCreateJob() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (values: JobInput) => post<JobDetail>('/api/jobs', values),
    onSuccess: () => qc.invalidateQueries({ queryKey: jobQueries.lists() }),
  });
}

export function useUpdateJob(id: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (values: Partial<JobInput> & { version: number }) => patch<JobDetail>(`/api/jobs/${id}`, values),
    // a change of supply, ambient, unbalance or code edition selects the job's motors again: panels,
    // their checks (under 'panels') and their bills of materials are then stale too
    onSuccess: () => Promise.all([['jobs'], ['panels'], ['bom']].map((queryKey) => qc.invalidateQueries({ queryKey }))),
  });
}

export function useArchiveJob(id: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (v: { archived: boolean; version: number }) => post<JobDetail>(`/api/jobs/${id}/archive`, v),
    onSuccess: () => qc.invalidateQueries({ queryKey: jobQueries.all() }),
  });
}
