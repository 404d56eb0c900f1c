import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import { ApiError, get, post, setCsrfToken } from '../../../lib/api-client';
import type { CurrentUser, Role, SignIn } from '../../../../shared/schemas/auth';

export const sessionQueries = {
  all: () => ['session'] as const,
  me: () =>
    queryOptions({
      queryKey: [...sessionQueries.all(), 'me'],
      queryFn: async (): Promise<CurrentUser | null> => {
        try {
          return await get<CurrentUser>('/api/auth/me');
        } catch (err) {
          if (err instanceof ApiError && err.status === 401) return null;
          throw err;
        }
      },
      staleTime: 60_000,
    }),
};

export function useSignIn() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: async (values: SignIn) => {
      const r = await post<{ token: string }>('/api/auth/sign-in', values);
      setCsrfToken(r.token);
    },
    onSuccess: async () => {
      qc.clear();
      await qc.fetchQuery(sessionQueries.me());
    },
  });
}

export function useSignOut() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: () => post<void>('/api/auth/sign-out'),
    onSettled: () => {
      setCsrfToken(null);
      qc.clear();
    },
  });
}

export function hasRole(user: CurrentUser | null | undefined, ...roles: Role[]) {
  return !!user && user.roles.some((r) => roles.includes(r));
}
