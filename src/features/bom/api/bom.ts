import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import { del, get, patch, post } from '../../../lib/api-client';
import type { BomCategory, BomLine, BomTotals, Ratings } from '../../../../shared/schemas/catalogue';

export type StoredLine = BomLine & { id: number; position: number };

export interface StoredBom {
  lines: StoredLine[];
  totals: BomTotals;
  generatedAt: string | null;
  stale: boolean;
  enclosureType: string;
}

export interface SwapCandidate {
  code: string;
  description: string;
  unitCost: number;
  leadTimeDays: number;
  ratings: Ratings;
}

export interface ManualLineInput {
  bucket?: string;
  category: BomCategory;
  description: string;
  quantity: number;
  unit?: 'ea' | 'ft';
  unitCost: number;
  unitLabourHours: number;
}

// Keys start with 'bom' so that a panel change (which invalidates ['bom']) refreshes them too.
export const bomQueries = {
  all: () => ['bom'] as const,
  panel: (panelId: number) =>
    queryOptions({ queryKey: [...bomQueries.all(), 'panel', panelId], queryFn: () => get<StoredBom>(`/api/panels/${panelId}/bom`) }),
  alternatives: (panelId: number, lineId: number) =>
    queryOptions({
      queryKey: [...bomQueries.all(), 'panel', panelId, 'alternatives', lineId],
      queryFn: () => get<SwapCandidate[]>(`/api/panels/${panelId}/bom/lines/${lineId}/alternatives`),
    }),
};

export const bomDownloads = {
  panel: (panelId: number) => ({ xlsx: `/api/panels/${panelId}/bom.xlsx`, csv: `/api/panels/${panelId}/bom.csv` }),
  job: (jobId: number) => ({ xlsx: `/api/jobs/${jobId}/bom.xlsx`, csv: `/api/jobs/${jobId}/bom.csv` }),
};

function useInvalidateBom(panelId: number) {
  const qc = useQueryClient();
  return () => qc.invalidateQueries({ queryKey: bomQueries.panel(panelId).queryKey });
}

export function useRebuildBom(panelId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (v: { reprice?: boolean } = {}) => post<StoredBom>(`/api/panels/${panelId}/bom/rebuild`, { reprice: v.reprice ?? false }),
    onSuccess: (data) => {
      qc.setQueryData(bomQueries.panel(panelId).queryKey, data);
      return qc.invalidateQueries({ queryKey: bomQueries.panel(panelId).queryKey });
    },
  });
}

export function useAddManualLine(panelId: number) {
  const invalidate = useInvalidateBom(panelId);
  return useMutation({
    mutationFn: (v: ManualLineInput) => post<StoredLine>(`/api/panels/${panelId}/bom/lines`, v),
    onSuccess: invalidate,
  });
}

export function useUpdateLine(panelId: number) {
  const invalidate = useInvalidateBom(panelId);
  return useMutation({
    mutationFn: (v: { lineId: number; quantity?: number; swapCode?: string; swapReason?: string }) => {
      const { lineId, ...body } = v;
      return patch<StoredLine>(`/api/panels/${panelId}/bom/lines/${lineId}`, body);
    },
    onSuccess: invalidate,
  });
}

export function useDeleteLine(panelId: number) {
  const invalidate = useInvalidateBom(panelId);
  return useMutation({ mutationFn: (lineId: number) => del<void>(`/api/panels/${panelId}/bom/lines/${lineId}`), onSuccess: invalidate });
}
