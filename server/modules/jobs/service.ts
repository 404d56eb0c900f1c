import type { CurrentUser } from '../../../shared/schemas/auth';
import type { JobValues } from '../../../shared/schemas/job';
import { ConflictError, NotFoundError, ValidationError } from '../../../shared/errors';
import * as repo from './repository';
import { recordActivity } from '../activity/service';
import type { Job } from '../../db/models/job';
import { db } from '../../db/sequelize';
import type { Transaction } from 'sequelize';

/** Job fields as the job form names them, for the activity log. */
const JOB_FIELD_WORDS: Record<string, string> = {
  number: 'job number',
  name: 'name',
  customer: 'customer',
  site: 'site',
  supplyVolts: 'supply voltage',
  supplyPhases: 'phases',
  supplyHz: 'frequency',
  availableFaultKa: 'available fault current',
  ambientC: 'ambient temperature',
  voltageUnbalancePercent: 'voltage unbalance',
  codeEdition: 'code edition',
  notes: 'notes',
};

/** Job fields the motor selections depend on. */
const SELECTION_FIELDS = ['supplyVolts', 'supplyPhases', 'supplyHz', 'ambientC', 'voltageUnbalancePercent', 'codeEdition'] as const;

export function jobView(j: Job) {
  return {
    id: j.id,
    number: j.number,
    name: j.name,
    customer: j.customer,
    site: j.site,
    supplyVolts: j.supplyVolts,
    supplyPhases: j.supplyPhases,
    supplyHz: j.supplyHz,
    availableFaultKa: j.availableFaultKa,
    ambientC: j.ambientC,
    voltageUnbalancePercent: j.voltageUnbalancePercent,
    codeEdition: j.codeEdition,
    notes: j.notes,
    archivedAt: j.archivedAt,
    version: j.version,
    updatedAt: j.updatedAt,
  };
}

export async function listJobs(actor: CurrentUser, q: { q?: string; archived: 'true' | 'false'; sort: string }) {
  return repo.listJobs(actor.organisationId, { q: q.q || undefined, archived: q.archived === 'true', sort: q.sort });
}

export async function getJob(actor: CurrentUser, id: number) {
  const job = await repo.findJob(actor.organisationId, id);
  if (!job) throw new NotFoundError('Job');
  return job;
}

export async function createJob(actor: CurrentUser, values: JobValues) {
  if (await repo.numberTaken(actor.organisationId, values.number)) {
    throw new ValidationError(`Job number ${values.number} is already used`, [{ path: 'body.number', message: 'already used' }]);
  }
  const job = await repo.createJob(actor.organisationId, actor.id, values);
  await recordActivity(actor, {
    entity: 'job',
    entityId: job.id,
    jobId: job.id,
    action: 'created',
    summary: `Created job ${job.number} ${job.name}`,
  });
  return jobView(job);
}

/**
 * Changes a job. `afterChange` runs in the same transaction with the job fields the motor selections depend
 * on that moved (the panels module passes its re-selection of the job's panels: panels sit above jobs).
 */
export async function updateJob(
  actor: CurrentUser,
  id: number,
  input: Partial<JobValues> & { version: number },
  afterChange?: (selectionFields: string[], t: Transaction) => Promise<void>,
) {
  const job = await getJob(actor, id);
  const { version, ...changes } = input;
  if (changes.number && changes.number !== job.number && (await repo.numberTaken(actor.organisationId, changes.number, id))) {
    throw new ValidationError(`Job number ${changes.number} is already used`, [{ path: 'body.number', message: 'already used' }]);
  }
  const diff: Record<string, unknown> = {};
  for (const [k, v] of Object.entries(changes)) {
    const before = job.get(k as keyof JobValues);
    if (before !== v) diff[k] = { from: before, to: v };
  }
  const reselect = SELECTION_FIELDS.filter((f) => f in diff);
  await db().transaction(async (t) => {
    const count = await repo.updateJobVersioned(actor.organisationId, id, version, changes, t);
    if (count === 0)
      throw new ConflictError('Someone else changed this job since you opened it: reload to see their change, then apply yours again');
    await recordActivity(
      actor,
      {
        entity: 'job',
        entityId: id,
        jobId: id,
        action: 'updated',
        summary: `Changed job ${job.number}: ${
          Object.keys(diff)
            .map((k) => JOB_FIELD_WORDS[k] ?? k)
            .join(', ') || 'no fields'
        }`,
        diff,
      },
      t,
    );
    if (afterChange) await afterChange(reselect, t);
  });
  return jobView((await repo.findJob(actor.organisationId, id))!);
}

export async function setArchived(actor: CurrentUser, id: number, archived: boolean, version: number) {
  const job = await getJob(actor, id);
  const count = await repo.updateJobVersioned(actor.organisationId, id, version, { archivedAt: archived ? new Date() : null });
  if (count === 0) throw new ConflictError('Someone else changed this job since you opened it: reload and try again');
  await recordActivity(actor, {
    entity: 'job',
    entityId: id,
    jobId: id,
    action: archived ? 'archived' : 'restored',
    summary: `${archived ? 'Archived' : 'Restored'} job ${job.number}`,
  });
  return jobView((await repo.findJob(actor.organisationId, id))!);
}
