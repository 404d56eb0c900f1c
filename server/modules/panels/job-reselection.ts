// A change to a job that the selections depend on (supply, ambient, code edition): every active panel's motors are selected again.
import type { Transaction } from 'sequelize';
import type { CurrentUser } from '../../../shared/schemas/auth';
import type { JobValues } from '../../../shared/schemas/job';
import { ConflictError } from '../../../shared/errors';
import * as repo from './repository';
import { recordPanelActivity } from '../activity/service';
import { updateJob } from '../jobs/service';
import { reselectPanel } from './reselection';

/** A change to the job's supply, ambient or code edition: every active panel's motors are selected again. */
export async function reselectJobPanels(actor: CurrentUser, jobId: number, what: string, t: Transaction) {
  for (const p of await repo.jobPanelsForUpdate(actor.organisationId, jobId, t)) {
    if (p.status === 'in_review')
      throw new ConflictError(`Panel ${p.name} is in review: the engineer must return it before the job's ${what} can change`);
    await reselectPanel(p, t);
    const reopened = p.status === 'signed_off';
    await repo.bumpPanel(actor.organisationId, p.id, p.version, { status: reopened ? 'draft' : p.status, rollup: p.rollup }, t);
    if (reopened)
      await recordPanelActivity(
        actor,
        p,
        {
          entity: 'panel',
          entityId: p.id,
          action: 'reopened',
          summary: `Opened a new draft after R${p.revisionNumber}: the job's ${what} changed`,
        },
        t,
      );
  }
}

/** A job's change; a change to its supply (or anything else the selections depend on) re-selects its panels. */
export async function changeJob(actor: CurrentUser, jobId: number, input: Partial<JobValues> & { version: number }) {
  return updateJob(actor, jobId, input, async (fields, t) => {
    if (fields.length) await reselectJobPanels(actor, jobId, fields.join(', '), t);
  });
}
