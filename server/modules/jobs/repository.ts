import { Op, QueryTypes, type Transaction } from 'sequelize';
import { db } from '../../db/sequelize';
import { Job } from '../../db/models/job';
import type { JobSummary, JobValues } from '../../../shared/schemas/job';

const SORT: Record<string, string> = {
  number: 'j.number asc',
  name: 'j.name asc',
  customer: 'j.customer asc',
  updatedAt: 'j.updated_at desc',
};

/** Jobs with their panel and motor counts, in one query. */
export async function listJobs(organisationId: number, opts: { q?: string; archived: boolean; sort: string }): Promise<JobSummary[]> {
  return db().query<JobSummary>(
    `select j.id, j.number, j.name, j.customer, j.site, j.supply_volts as "supplyVolts", j.supply_phases as "supplyPhases",
            j.supply_hz as "supplyHz", j.available_fault_ka as "availableFaultKa", j.ambient_c as "ambientC", j.voltage_unbalance_percent as "voltageUnbalancePercent",
            j.code_edition as "codeEdition", j.notes, j.archived_at as "archivedAt", j.version, j.updated_at as "updatedAt",
            (select count(*)::int from panels p where p.job_id = j.id and p.archived_at is null) as "panelCount",
            (select count(*)::int from loads l join panels p on p.id = l.panel_id where p.job_id = j.id and p.archived_at is null) as "motorCount"
       from jobs j
      where j.organisation_id = :organisationId
        and (j.archived_at is ${opts.archived ? 'not null' : 'null'})
        and (:q::text is null or j.number ilike :like or j.name ilike :like or j.customer ilike :like or j.site ilike :like)
      order by ${SORT[opts.sort] ?? SORT.updatedAt}, j.id desc`,
    {
      replacements: { organisationId, q: opts.q ?? null, like: `%${(opts.q ?? '').replace(/[%_\\]/g, '\\$&')}%` },
      type: QueryTypes.SELECT,
    },
  );
}

export async function findJob(organisationId: number, id: number, transaction?: Transaction) {
  return Job.findOne({ where: { organisationId, id }, transaction });
}

export async function numberTaken(organisationId: number, number: string, exceptId?: number) {
  return (await Job.count({ where: { organisationId, number, ...(exceptId ? { id: { [Op.ne]: exceptId } } : {}) } })) > 0;
}

export async function createJob(organisationId: number, createdBy: number, values: JobValues, transaction?: Transaction) {
  return Job.create({ ...values, organisationId, createdBy, archivedAt: null }, { transaction });
}

export async function updateJobVersioned(
  organisationId: number,
  id: number,
  version: number,
  values: Partial<JobValues> & { archivedAt?: Date | null },
  transaction?: Transaction,
) {
  const [count] = await Job.update({ ...values, version: version + 1 }, { where: { organisationId, id, version }, transaction });
  return count;
}
