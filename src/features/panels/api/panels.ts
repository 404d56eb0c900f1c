import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import { del, get, patch, post, put } from '../../../lib/api-client';
import type {
  LoadView,
  PanelDetail,
  PanelInput,
  PanelSummary,
  CommentView,
  QueuePanel,
  RuleCheckBody,
} from '../../../../shared/schemas/panel';
import type { OverrideInput } from '../../../../shared/schemas/override';
import type { BomDiff } from '../../../../shared/calc/bom';
import type { SelectionDifference } from '../../../../shared/calc/selection-diff';

export interface ChangeReport {
  from: number;
  to: number;
  bom: BomDiff;
  totals: {
    from: { sell: number; materialCost: number; labourHours: number };
    to: { sell: number; materialCost: number; labourHours: number };
    sellDelta: number;
    materialDelta: number;
  };
  motors: { added: string[]; removed: string[]; changed: string[]; decisions: Array<{ tag: string; differences: SelectionDifference[] }> };
}

export const panelQueries = {
  all: () => ['panels'] as const,
  list: (jobId: number) =>
    queryOptions({ queryKey: [...panelQueries.all(), 'list', jobId], queryFn: () => get<PanelSummary[]>(`/api/jobs/${jobId}/panels`) }),
  detail: (panelId: number) =>
    queryOptions({ queryKey: [...panelQueries.all(), 'detail', panelId], queryFn: () => get<PanelDetail>(`/api/panels/${panelId}`) }),
  /** keyed by the panel version, so any change to the panel asks again */
  ruleCheck: (panelId: number, version: number) =>
    queryOptions({
      queryKey: [...panelQueries.all(), 'detail', panelId, 'rule-check', version],
      queryFn: () => get<RuleCheckBody>(`/api/panels/${panelId}/rule-check`),
      staleTime: 60_000,
    }),
  queue: () => queryOptions({ queryKey: [...panelQueries.all(), 'queue'], queryFn: () => get<QueuePanel[]>('/api/sign-off-queue') }),
  changeReport: (panelId: number, from: number, to: number) =>
    queryOptions({
      queryKey: [...panelQueries.all(), 'detail', panelId, 'change-report', from, to],
      queryFn: () => get<ChangeReport>(`/api/panels/${panelId}/change-report?from=${from}&to=${to}`),
    }),
};

function useInvalidatePanel(panelId?: number) {
  const qc = useQueryClient();
  return () =>
    Promise.all([
      panelId
        ? qc.invalidateQueries({ queryKey: panelQueries.detail(panelId).queryKey.slice(0, 3) })
        : qc.invalidateQueries({ queryKey: panelQueries.all() }),
      qc.invalidateQueries({ queryKey: ['panels', 'list'] }),
      qc.invalidateQueries({ queryKey: ['panels', 'queue'] }),
      qc.invalidateQueries({ queryKey: ['jobs'] }),
      qc.invalidateQueries({ queryKey: ['bom'] }),
    ]);
}

export function useCreatePanel(jobId: number) {
  const invalidate = useInvalidatePanel();
  return useMutation({ mutationFn: (v: PanelInput) => post<PanelDetail>(`/api/jobs/${jobId}/panels`, v), onSuccess: invalidate });
}

export function usePanelAction(panelId: number) {
  const invalidate = useInvalidatePanel(panelId);
  return useMutation({
    mutationFn: (a: { action: 'submit' | 'return' | 'approve'; version: number; comment: string; acknowledgeSccr?: boolean }) =>
      post<PanelDetail>(`/api/panels/${panelId}/${a.action}`, {
        version: a.version,
        comment: a.comment,
        ...(a.action === 'approve' && a.acknowledgeSccr ? { acknowledgeSccr: true } : {}),
      }),
    onSuccess: invalidate,
  });
}

export function useReselect(panelId: number) {
  const invalidate = useInvalidatePanel(panelId);
  return useMutation({
    mutationFn: (v: { version: number }) =>
      post<{ motorCount: number; changed: RuleCheckBody['changed'] }>(`/api/panels/${panelId}/reselect`, v),
    onSuccess: invalidate,
  });
}

export function useUpdatePanel(panelId: number) {
  const invalidate = useInvalidatePanel(panelId);
  return useMutation({
    mutationFn: (v: Partial<PanelInput> & { version: number }) => patch<PanelDetail>(`/api/panels/${panelId}`, v),
    onSuccess: invalidate,
  });
}

export function useDuplicatePanel(panelId: number) {
  const invalidate = useInvalidatePanel();
  return useMutation({ mutationFn: () => post<PanelDetail>(`/api/panels/${panelId}/duplicate`), onSuccess: invalidate });
}

export function useArchivePanel(panelId: number) {
  const invalidate = useInvalidatePanel(panelId);
  return useMutation({
    mutationFn: (v: { archived: boolean; version: number }) => post<PanelDetail>(`/api/panels/${panelId}/archive`, v),
    onSuccess: invalidate,
  });
}

export function useSaveLoad(panelId: number) {
  const invalidate = useInvalidatePanel(panelId);
  return useMutation({
    mutationFn: (v: { loadId?: number; answers: Record<string, unknown>; version?: number }) =>
      v.loadId
        ? put<LoadView>(`/api/loads/${v.loadId}`, { answers: v.answers, version: v.version })
        : post<LoadView>(`/api/panels/${panelId}/loads`, { answers: v.answers }),
    onSuccess: invalidate,
  });
}

export function useLoadAction(panelId: number) {
  const invalidate = useInvalidatePanel(panelId);
  return useMutation({
    mutationFn: async (v: { loadId: number; action: 'copy' | 'delete' }): Promise<void> => {
      if (v.action === 'copy') await post<LoadView>(`/api/loads/${v.loadId}/copy`);
      else await del<void>(`/api/loads/${v.loadId}`);
    },
    onSuccess: invalidate,
  });
}

export function useBulkEdit(panelId: number) {
  const invalidate = useInvalidatePanel(panelId);
  return useMutation({
    mutationFn: (v: { loadIds: number[]; changes: Record<string, unknown>; panelVersion: number }) =>
      post<{ updated: number }>(`/api/panels/${panelId}/loads/bulk-edit`, v),
    onSuccess: invalidate,
  });
}

export function useSetOverrides(panelId: number) {
  const invalidate = useInvalidatePanel(panelId);
  return useMutation({
    mutationFn: (v: { loadId: number; overrides: OverrideInput[]; version: number }) =>
      put<LoadView>(`/api/loads/${v.loadId}/overrides`, { overrides: v.overrides, version: v.version }),
    onSuccess: invalidate,
  });
}

export function useAddComment(panelId: number) {
  const invalidate = useInvalidatePanel(panelId);
  return useMutation({
    mutationFn: (v: { body: string; loadId: number | null }) => post<CommentView>(`/api/panels/${panelId}/comments`, v),
    onSuccess: invalidate,
  });
}
