import { queryOptions } from '@tanstack/react-query';
import { get } from '../../../lib/api-client';
import type { PanelChecks } from '../../../../shared/schemas/checks';

export const checkQueries = {
  // under the panel's detail key, so every change to the panel (motors, overrides, job) refreshes the checks too
  all: (panelId: number) => ['panels', 'detail', panelId, 'checks'] as const,
  panel: (panelId: number) =>
    queryOptions({ queryKey: checkQueries.all(panelId), queryFn: () => get<PanelChecks>(`/api/panels/${panelId}/checks`) }),
};

/** The submittal download address (a plain link: the browser saves the attachment). */
export const submittalPdfUrl = (panelId: number) => `/api/panels/${panelId}/submittal.pdf`;
