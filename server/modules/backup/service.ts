// Job backup: export a whole job (panels, motors with answers, selections and overrides, comments,
// frozen revisions, bill-of-materials lines) as one JSON document, and import it back as a new job
// in one transaction.
import { db } from '../../db/sequelize';
import type { CurrentUser } from '../../../shared/schemas/auth';
import type { PanelState } from '../../../shared/schemas/panel';
import { LoadSchema } from '../../../shared/schemas/load';
import { ConflictError, NotFoundError, ValidationError, zodIssues } from '../../../shared/errors';
import { recordActivity } from '../activity/service';
import * as repo from './repository';
import { BACKUP_FORMAT, BACKUP_VERSION, type JobBackup } from './schema';

const iso = (d: Date | null | undefined) => (d ? d.toISOString() : null);

export async function exportJob(actor: CurrentUser, jobId: number): Promise<JobBackup> {
  const job = await repo.findJob(actor.organisationId, jobId);
  if (!job) throw new NotFoundError('Job');
  const { panels, loads, comments, revisions, bomLines, users } = await repo.jobContents(actor.organisationId, job.id);
  const people = new Map(users.map((u) => [u.id, { email: u.email, name: u.name }]));
  const person = (id: number | null) => (id === null ? null : (people.get(id) ?? null));

  return {
    format: BACKUP_FORMAT,
    version: BACKUP_VERSION,
    exportedAt: new Date().toISOString(),
    job: {
      number: job.number,
      name: job.name,
      customer: job.customer,
      site: job.site,
      supplyVolts: job.supplyVolts,
      supplyPhases: job.supplyPhases as 1 | 3,
      supplyHz: job.supplyHz as 50 | 60,
      availableFaultKa: job.availableFaultKa,
      ambientC: job.ambientC,
      voltageUnbalancePercent: job.voltageUnbalancePercent,
      codeEdition: job.codeEdition as JobBackup['job']['codeEdition'],
      notes: job.notes,
      archivedAt: iso(job.archivedAt),
    },
    panels: panels.map((p, pi) => {
      const panelRef = `P${pi + 1}`;
      const own = loads.filter((l) => l.panelId === p.id);
      const loadRef = new Map(own.map((l, li) => [l.id, `${panelRef}.L${li + 1}`]));
      return {
        ref: panelRef,
        name: p.name,
        description: p.description,
        mounting: p.mounting as JobBackup['panels'][number]['mounting'],
        status: p.status as PanelState,
        revisionNumber: p.revisionNumber,
        markupPercent: p.markupPercent,
        labourRate: p.labourRate,
        terminationsListed75C: p.terminationsListed75C ?? null,
        archivedAt: iso(p.archivedAt),
        submittedAt: iso(p.submittedAt),
        bomGeneratedAt: iso(p.bomGeneratedAt),
        bomStale: !p.bomGeneratedAt || p.bomGeneratedAt < p.updatedAt,
        rollup: p.rollup,
        loads: own.map((l) => ({
          ref: loadRef.get(l.id)!,
          tag: l.tag,
          position: l.position,
          answers: l.answers,
          selection: l.selection,
          overrides: l.overrides ?? [],
        })),
        comments: comments
          .filter((c) => c.panelId === p.id)
          .map((c) => ({
            loadRef: c.loadId === null ? null : (loadRef.get(c.loadId) ?? null),
            body: c.body,
            author: person(c.userId),
            at: c.createdAt.toISOString(),
          })),
        revisions: revisions
          .filter((r) => r.panelId === p.id)
          .map((r) => ({
            number: r.number,
            approvedBy: person(r.approvedBy),
            approvedAt: r.approvedAt.toISOString(),
            snapshot: r.snapshot,
          })),
        bomLines: bomLines.filter((b) => b.panelId === p.id).map((b) => b.line),
      };
    }),
  };
}

/** The first free job number among NUMBER, NUMBER-copy, NUMBER-copy-2 … (at most 40 characters). */
function freeNumber(wanted: string, taken: Set<string>): string {
  if (!taken.has(wanted.toLowerCase())) return wanted;
  for (let n = 1; n < 10_000; n++) {
    const suffix = n === 1 ? '-copy' : `-copy-${n}`;
    const candidate = `${wanted.slice(0, 40 - suffix.length)}${suffix}`;
    if (!taken.has(candidate.toLowerCase())) return candidate;
  }
  throw new ConflictError(`No free job number left for ${wanted}`);
}

/** Every motor's answers must still be valid input of the selection engine. */
function checkAnswers(backup: JobBackup) {
  const issues = backup.panels.flatMap((p, pi) =>
    p.loads.flatMap((l, li) => {
      const r = LoadSchema.safeParse(l.answers);
      return r.success
        ? []
        : zodIssues(r.error.issues).map((i) => ({ ...i, path: `body.panels[${pi}].loads[${li}].answers${i.path ? `.${i.path}` : ''}` }));
    }),
  );
  if (issues.length)
    throw new ValidationError(
      `The backup has ${issues.length} motor answer problem${issues.length === 1 ? '' : 's'}: ${issues
        .slice(0, 5)
        .map((i) => `${i.path} ${i.message}`)
        .join('; ')}`,
      issues,
    );
}

export interface ImportOptions {
  /** test hook: throw after every row is written, to prove the transaction leaves nothing behind */
  failAfterWrite?: boolean;
}

/** Creates a new job from a backup, all in one transaction; returns the new job's id and number. */
export async function importJob(actor: CurrentUser, backup: JobBackup, opts: ImportOptions = {}) {
  checkAnswers(backup);
  const organisationId = actor.organisationId;
  try {
    return await db().transaction(async (t) => {
      const taken = await repo.takenJobNumbers(organisationId, backup.job.number, t);
      const number = freeNumber(backup.job.number, taken);
      const emails = [
        ...new Set(
          backup.panels
            .flatMap((p) => [...p.comments.map((c) => c.author?.email), ...p.revisions.map((r) => r.approvedBy?.email)])
            .filter((e): e is string => !!e),
        ),
      ];
      const userIds = await repo.usersByEmail(organisationId, emails, t);
      const userOf = (p: { email: string } | null) => (p ? (userIds.get(p.email) ?? null) : null);

      const { archivedAt, ...jobValues } = backup.job;
      const job = await repo.insertJob(
        { ...jobValues, number, organisationId, createdBy: actor.id, archivedAt: archivedAt ? new Date(archivedAt) : null },
        t,
      );
      let motors = 0;
      for (const p of backup.panels) {
        const panel = await repo.insertPanel(
          {
            organisationId,
            jobId: job.id,
            name: p.name,
            description: p.description,
            mounting: p.mounting,
            status: p.status,
            revisionNumber: p.revisionNumber,
            markupPercent: p.markupPercent,
            labourRate: p.labourRate,
            terminationsListed75C: p.terminationsListed75C,
            archivedAt: p.archivedAt ? new Date(p.archivedAt) : null,
            submittedAt: p.submittedAt ? new Date(p.submittedAt) : null,
            bomGeneratedAt: p.bomGeneratedAt ? new Date(p.bomGeneratedAt) : null,
            rollup: p.rollup,
          },
          t,
        );
        const createdIds = await repo.insertLoads(
          p.loads.map((l) => ({
            organisationId,
            panelId: panel.id,
            tag: l.tag,
            position: l.position,
            answers: l.answers,
            selection: l.selection,
            overrides: l.overrides,
          })),
          t,
        );
        motors += createdIds.length;
        const loadIds = new Map(p.loads.map((l, i) => [l.ref, createdIds[i]!]));
        if (p.comments.length) {
          await repo.insertComments(
            p.comments.map((c) => ({
              organisationId,
              panelId: panel.id,
              loadId: c.loadRef ? loadIds.get(c.loadRef)! : null,
              userId: userOf(c.author),
              body: c.body,
              createdAt: new Date(c.at),
            })),
            t,
          );
        }
        if (p.revisions.length) {
          await repo.insertRevisions(
            p.revisions.map((r) => ({
              organisationId,
              panelId: panel.id,
              number: r.number,
              snapshot: r.snapshot,
              approvedBy: userOf(r.approvedBy),
              approvedAt: new Date(r.approvedAt),
            })),
            t,
          );
        }
        if (p.bomLines.length) {
          await repo.insertBomLines(
            p.bomLines.map((line, position) => ({ organisationId, panelId: panel.id, position, line: line })),
            t,
          );
        }
        // A bill of materials that was current when exported stays current (not older than the panel row).
        if (p.bomGeneratedAt && !p.bomStale) await repo.markBomCurrent(panel.id, t);
      }
      await recordActivity(
        actor,
        {
          entity: 'job',
          entityId: job.id,
          jobId: job.id,
          action: 'imported',
          summary: `Imported job ${number} ${job.name} from a backup (${backup.panels.length} panels, ${motors} motors)`,
        },
        t,
      );
      if (opts.failAfterWrite) throw new Error('failure injected after the import was written');
      return { id: job.id, number, panels: backup.panels.length, motors };
    });
  } catch (err) {
    if (repo.isUniqueViolation(err))
      throw new ConflictError('Another import or new job took the same job number at the same moment: import again');
    throw err;
  }
}
