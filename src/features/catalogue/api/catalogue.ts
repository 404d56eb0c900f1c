import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import { api, get, patch, post, qs } from '../../../lib/api-client';
import type {
  CatalogueEntry,
  CatalogueFilter,
  CatalogueItemInput,
  HistoryEntry,
  ImportSummary,
  ItemChanges,
  LabourUnitEntry,
} from '../../../../shared/schemas/catalogue';
import type { CombinationInput, CombinationView } from '../../../../shared/schemas/combination';

export const catalogueQueries = {
  all: () => ['catalogue'] as const,
  lists: () => [...catalogueQueries.all(), 'list'] as const,
  list: (f: CatalogueFilter = {}) =>
    queryOptions({
      queryKey: [...catalogueQueries.lists(), f],
      queryFn: () => get<CatalogueEntry[]>(`/api/catalogue/items${qs({ category: f.category, q: f.q, active: f.active })}`),
    }),
  history: (itemId: number) =>
    queryOptions({
      queryKey: [...catalogueQueries.all(), 'history', itemId],
      queryFn: () => get<HistoryEntry[]>(`/api/catalogue/items/${itemId}/history`),
    }),
  labourUnits: () =>
    queryOptions({ queryKey: [...catalogueQueries.all(), 'labour-units'], queryFn: () => get<LabourUnitEntry[]>('/api/labour-units') }),
};

export const CATALOGUE_EXPORT = { xlsx: '/api/catalogue.xlsx', csv: '/api/catalogue.csv' } as const;

function useInvalidateCatalogue() {
  const qc = useQueryClient();
  return () => qc.invalidateQueries({ queryKey: catalogueQueries.all() });
}

export function useCreateItem() {
  const invalidate = useInvalidateCatalogue();
  return useMutation({ mutationFn: (v: CatalogueItemInput) => post<CatalogueEntry>('/api/catalogue/items', v), onSuccess: invalidate });
}

export function useUpdateItem() {
  const invalidate = useInvalidateCatalogue();
  return useMutation({
    mutationFn: (v: { id: number; version: number; changes: ItemChanges }) =>
      patch<CatalogueEntry>(`/api/catalogue/items/${v.id}`, { ...v.changes, version: v.version }),
    onSettled: invalidate,
  });
}

/** One file as multipart form data, under the field name the server's upload takes. */
function uploadFile<T>(path: string, file: File): Promise<T> {
  const fd = new FormData();
  fd.append('file', file);
  return api<T>('POST', path, fd);
}

export function useImportCatalogue() {
  const invalidate = useInvalidateCatalogue();
  return useMutation({
    mutationFn: (file: File) => uploadFile<ImportSummary>('/api/catalogue/import', file),
    onSuccess: invalidate,
  });
}

export function useUpdateLabourUnit() {
  const invalidate = useInvalidateCatalogue();
  return useMutation({
    mutationFn: (v: { key: string; version: number; hours?: number; description?: string }) => {
      const { key, ...body } = v;
      return patch<LabourUnitEntry>(`/api/labour-units/${key}`, body);
    },
    onSettled: invalidate,
  });
}

// ---- tested combination ratings (UL 508A SB4) ----------------------------------------------------
export const combinationQueries = {
  list: () =>
    queryOptions({
      queryKey: [...catalogueQueries.all(), 'combinations'],
      queryFn: () => get<CombinationView[]>('/api/catalogue/combinations'),
    }),
};

/** A combination changes the SCCR worksheet of every panel using its parts: the panels' checks are stale too. */
function useInvalidateCombinations() {
  const qc = useQueryClient();
  return () => Promise.all([qc.invalidateQueries({ queryKey: catalogueQueries.all() }), qc.invalidateQueries({ queryKey: ['panels'] })]);
}

export function useCreateCombination() {
  const invalidate = useInvalidateCombinations();
  return useMutation({
    mutationFn: (v: CombinationInput) => post<CombinationView>('/api/catalogue/combinations', v),
    onSuccess: invalidate,
  });
}

export function useUpdateCombination() {
  const invalidate = useInvalidateCombinations();
  return useMutation({
    mutationFn: (v: { id: number; version: number; active: boolean }) =>
      patch<CombinationView>(`/api/catalogue/combinations/${v.id}`, { active: v.active, version: v.version }),
    onSettled: invalidate,
  });
}

export function useImportCombinations() {
  const invalidate = useInvalidateCombinations();
  return useMutation({
    mutationFn: (file: File) =>
      uploadFile<{ created: number; changed: number; unchanged: number }>('/api/catalogue/combinations/import', file),
    onSuccess: invalidate,
  });
}
