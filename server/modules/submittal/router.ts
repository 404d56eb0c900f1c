import { z } from 'zod';
import { idParamSchema } from '../../../shared/schemas/bounds';
import { defineRoute } from '../../http/route-table';
import { ROLE_SETS } from '../../../shared/schemas/auth';
import { ConflictError } from '../../../shared/errors';
import { computeChecks } from '../checks/service';
import { getRevision } from '../review/service';
import { revisionsOf } from '../panels/repository';
import { logoOf } from '../settings/service';
import { writeSubmittalPdf, type SubmittalData } from './pdf';
import { drawingsFrom, submittalDrawings } from '../drawings/service';

const PanelId = z.object({ panelId: idParamSchema });

/** A file name from the job number and panel name: letters, digits, dot, dash and underscore only. */
export function submittalFileName(jobNumber: string, panelName: string): string {
  const clean = `${jobNumber} ${panelName}`
    .normalize('NFKD')
    .replace(/[^A-Za-z0-9._-]+/g, '-')
    .replace(/-+/g, '-')
    .replace(/^[-.]+|[-.]+$/g, '')
    .slice(0, 120);
  return `${clean || 'panel'}-submittal.pdf`;
}

export const submittalRoutes = [
  defineRoute({
    method: 'get',
    path: '/api/panels/:panelId/submittal.pdf',
    access: ROLE_SETS.everyone,
    summary: 'The panel submittal as a PDF (download)',
    params: PanelId,
    handler: async ({ user, params, res }) => {
      const ctx = await computeChecks(user, params.panelId);
      const { checks, selections, rollup, panel, shop } = ctx;
      // a signed-off panel: its revision, and what the engineer acknowledged when signing (NEC 409.22)
      const revision =
        panel.status === 'signed_off' && panel.revisionNumber !== null ? await getRevision(user, panel.id, panel.revisionNumber) : null;
      const signer = revision ? ((await revisionsOf(panel.id)).find((r) => r.number === revision.number)?.approvedBy ?? null) : null;
      const logo = shop.logo ? await logoOf(user.organisationId) : null;
      const frozen = (
        revision?.snapshot as { sccr?: { acknowledged?: { finding: string; by: string; reason: string } | null } } | undefined
      )?.sccr;
      const missing = [
        selections.length === 0 ? 'the panel has no motors' : null,
        checks.heat.result ? null : checks.heat.reason,
        checks.nameplate.result ? null : checks.nameplate.reason,
        checks.controlPower.result ? null : checks.controlPower.reason,
      ].filter((x): x is string => !!x);
      if (missing.length > 0 || !rollup || !checks.heat.result || !checks.nameplate.result || !checks.controlPower.result) {
        throw new ConflictError(`The submittal cannot be written yet: ${missing.join(' ')}`);
      }
      const data: SubmittalData = {
        job: {
          number: checks.job.number,
          name: checks.job.name,
          customer: checks.job.customer,
          site: checks.job.site,
          availableFaultKa: checks.job.availableFaultKa,
          ambientC: checks.job.ambientC,
          codeEdition: `NEC ${checks.job.codeEdition}`,
        },
        panel: {
          name: checks.panel.name,
          revision: checks.panel.revision,
          revisionCode: revision ? `R${revision.number}` : 'D',
          date: new Date().toISOString().slice(0, 10),
          enclosureType: checks.panel.enclosureType,
        },
        shop: { name: shop.name, address: shop.address, logo: logo?.data ?? null, drawingNumberScheme: shop.drawingNumberScheme },
        selections,
        rollup,
        nameplate: checks.nameplate.result,
        sccr: checks.sccr,
        ...(revision
          ? {
              signOff: {
                revision: `R${revision.number}`,
                date: new Date(revision.approvedAt).toISOString().slice(0, 10),
                by: signer,
                acknowledged: frozen?.acknowledged ?? null,
              },
            }
          : {}),
        heat: checks.heat.result,
        controlPower: checks.controlPower.result,
        controlConductors: checks.controlConductors,
        connectionCards: checks.connectionCards.flatMap((c) => (c.card ? [{ tag: c.tag, card: c.card }] : [])),
        drawings: submittalDrawings(drawingsFrom(ctx)),
      };
      res.status(200);
      res.setHeader('content-type', 'application/pdf');
      res.setHeader('content-disposition', `attachment; filename="${submittalFileName(checks.job.number, checks.panel.name)}"`);
      res.setHeader('cache-control', 'no-store');
      await writeSubmittalPdf(data, res);
      return undefined;
    },
  }),
];
