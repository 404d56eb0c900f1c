import { queryOptions } from '@tanstack/react-query';
import { get } from '../../../lib/api-client';
import type { SccrResult } from '../../../../shared/calc/sccr';
import type { EnclosureMounting, HeatResult } from '../../../../shared/calc/heat';
import type { ControlPowerResult } from '../../../../shared/calc/control-power';
import type { NameplateResult } from '../../../../shared/calc/nameplate';
import type { ConnectionCard } from '../../../../shared/calc/connections';

/** The answer of GET /api/panels/:panelId/checks. */
export interface PanelChecks {
  panel: { id: number; name: string; mounting: string; enclosureType: string; revision: string };
  job: { id: number; number: string; name: string; customer: string; site: string; supplyVolts: number; supplyPhases: number; supplyHz: number; availableFaultKa: number; ambientC: number; codeEdition: string };
  bom: { source: 'stored' | 'in-memory'; stale: boolean; unmatchedLines: number; note: string | null };
  motorsWithErrors: string[];
  sccr: SccrResult & { excluded: Array<{ location: string; code: string | null; description: string; reason: string }> };
  heat: {
    result: HeatResult | null;
    enclosure: null | { code: string | null; description: string; heightMm: number; widthMm: number; depthMm: number; sections: number; mounting: EnclosureMounting };
    reason: string | null;
  };
  controlPower: {
    result: ControlPowerResult | null;
    fitted: null | { code: string | null; description: string; va: number | null; adequate: boolean | null };
    basis: string;
    reason: string | null;
  };
  nameplate: { result: NameplateResult | null; reason: string | null };
  connectionCards: Array<{ loadId: number; tag: string; card: ConnectionCard | null; assumptions: string[]; reason: string | null }>;
  cautions: string[];
}

export const checkQueries = {
  // under the panel's detail key, so every change to the panel (motors, overrides, job) refreshes the checks too
  all: (panelId: number) => ['panels', 'detail', panelId, 'checks'] as const,
  panel: (panelId: number) => queryOptions({ queryKey: checkQueries.all(panelId), queryFn: () => get<PanelChecks>(`/api/panels/${panelId}/checks`) }),
};

/** The submittal download address (a plain link: the browser saves the attachment). */
export const submittalPdfUrl = (panelId: number) => `/api/panels/${panelId}/submittal.pdf`;
