import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import { api, get, put } from '../../../lib/api-client';
import type { ShopSettings, ShopSettingsUpdate } from '../../../../shared/schemas/settings';

export const settingsQueries = {
  all: () => ['settings'] as const,
  shop: () => queryOptions({ queryKey: [...settingsQueries.all(), 'shop'], queryFn: () => get<ShopSettings>('/api/settings') }),
};

export function useSaveSettings() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (v: ShopSettingsUpdate) => put<ShopSettings>('/api/settings', v),
    onSuccess: (s) => qc.setQueryData(settingsQueries.shop().queryKey, s),
  });
}

export function useLogo() {
  const qc = useQueryClient();
  const done = (s: ShopSettings) => qc.setQueryData(settingsQueries.shop().queryKey, s);
  const upload = useMutation({
    mutationFn: (v: { file: File; version: number }) => {
      const form = new FormData();
      form.append('version', String(v.version));
      form.append('file', v.file);
      return api<ShopSettings>('PUT', '/api/settings/logo', form);
    },
    onSuccess: done,
  });
  const remove = useMutation({
    mutationFn: (version: number) => api<ShopSettings>('DELETE', '/api/settings/logo', { version }),
    onSuccess: done,
  });
  return { upload, remove };
}
