import { queryOptions } from '@tanstack/react-query';
import { ApiError, get } from '../../../lib/api-client';
import type { DrawingsView } from '../../../../shared/drawings/panel-drawings';

const base = (panelId: number) => `/api/panels/${panelId}/drawings`;

async function svgText(url: string): Promise<string> {
  const r = await fetch(url, { credentials: 'same-origin' });
  if (!r.ok) {
    let message = `The drawing could not be loaded (${r.status}).`;
    try {
      message = ((await r.json()) as { error: { message: string } }).error.message;
    } catch {
      /* not JSON */
    }
    throw new ApiError(r.status, 'drawing', message, null);
  }
  return r.text();
}

export const drawingQueries = {
  // under the panel's detail key: every change to the panel refreshes its drawings
  all: (panelId: number) => ['panels', 'detail', panelId, 'drawings'] as const,
  panel: (panelId: number) => queryOptions({ queryKey: drawingQueries.all(panelId), queryFn: () => get<DrawingsView>(base(panelId)) }),
  schematic: (panelId: number, tag: string) =>
    queryOptions({
      queryKey: [...drawingQueries.all(panelId), 'schematic', tag],
      queryFn: () => svgText(`${base(panelId)}/schematic.svg?tag=${encodeURIComponent(tag)}`),
    }),
  layout: (panelId: number) =>
    queryOptions({ queryKey: [...drawingQueries.all(panelId), 'layout'], queryFn: () => svgText(`${base(panelId)}/layout.svg`) }),
  nameplate: (panelId: number) =>
    queryOptions({ queryKey: [...drawingQueries.all(panelId), 'nameplate'], queryFn: () => svgText(`${base(panelId)}/nameplate.svg`) }),
};

export const drawingUrls = (panelId: number) => ({
  schematic: `${base(panelId)}/schematic.svg`,
  nameplate: `${base(panelId)}/nameplate.svg`,
  layout: `${base(panelId)}/layout.svg`,
  wires: `${base(panelId)}/wires.csv`,
  terminals: `${base(panelId)}/terminals.csv`,
  wiring: `${base(panelId)}/wiring.xlsx`,
});
