// A panel's and a job's bill of materials as the export writers take them (CSV and the job workbook).
import type { CurrentUser } from '../../../shared/schemas/auth';
import * as repo from './repository';
import type { BomExportJob, BomExportPanel } from './export';
import { getJob } from '../jobs/service';
import { requirePanel } from '../panels/service';
import { shopSettingsOf } from '../settings/service';

export async function panelExport(
  actor: CurrentUser,
  panelId: number,
): Promise<{ job: BomExportJob; panels: BomExportPanel[]; fileBase: string }> {
  const panel = await requirePanel(actor, panelId);
  const rows = await repo.bomRowsFor(actor.organisationId, panel.id);
  return {
    job: {
      number: panel.job.number,
      name: panel.job.name,
      customer: panel.job.customer || undefined,
      markupPercent: panel.markupPercent,
      labourRatePerHour: panel.labourRate,
    },
    panels: [{ name: panel.name, lines: rows.map((r) => r.line) }],
    fileBase: `${panel.job.number}-${panel.name}-bom`,
  };
}

/** Every panel of the job that is not archived. The summary's rate and markup are the first panel's (each panel's own are on the page), the shop's defaults for a job with no panel. */
export async function jobExport(
  actor: CurrentUser,
  jobId: number,
): Promise<{ job: BomExportJob; panels: BomExportPanel[]; fileBase: string }> {
  const job = await getJob(actor, jobId);
  const panels = await repo.jobPanels(actor.organisationId, job.id);
  const rows = await repo.bomRowsFor(
    actor.organisationId,
    panels.map((p) => p.id),
  );
  const shop = panels.length ? null : await shopSettingsOf(actor.organisationId);
  return {
    job: {
      number: job.number,
      name: job.name,
      customer: job.customer || undefined,
      markupPercent: panels[0]?.markupPercent ?? shop!.defaultMarkupPercent,
      labourRatePerHour: panels[0]?.labourRate ?? shop!.defaultLabourRate,
    },
    panels: panels.map((p) => ({ name: p.name, lines: rows.filter((r) => r.panelId === p.id).map((r) => r.line) })),
    fileBase: `${job.number}-bom`,
  };
}
