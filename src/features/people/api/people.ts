import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import { get, patch, post } from '../../../lib/api-client';
import type { Role, UserCreate } from '../../../../shared/schemas/auth';

export interface Person {
  id: number;
  email: string;
  name: string;
  roles: Role[];
  active: boolean;
  invited: boolean;
  lastSignInAt: string | null;
  version: number;
}

export interface OutboxMessage {
  id: number;
  to: string;
  from: string;
  subject: string;
  body: string;
  createdAt: string;
}

export const peopleQueries = {
  all: () => ['people'] as const,
  list: () => queryOptions({ queryKey: [...peopleQueries.all(), 'list'], queryFn: () => get<Person[]>('/api/users') }),
  outbox: () => queryOptions({ queryKey: ['outbox'], queryFn: () => get<OutboxMessage[]>('/api/outbox'), refetchInterval: 5000 }),
};

export function useInvite() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (v: UserCreate) => post<Person & { inviteLink: string }>('/api/users', v),
    onSuccess: () => qc.invalidateQueries({ queryKey: peopleQueries.all() }),
  });
}

export function useUpdatePerson() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (v: { id: number; version: number; roles?: Role[]; active?: boolean }) =>
      patch<Person>(`/api/users/${v.id}`, { version: v.version, roles: v.roles, active: v.active }),
    onSuccess: () => qc.invalidateQueries({ queryKey: peopleQueries.all() }),
  });
}
