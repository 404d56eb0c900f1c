// The job backup file: a whole job as JSON, versioned, with database ids replaced by local references
// ("P1", "P1.L3") so the file can be imported into any organisation. Stored selections, revision
// snapshots and bill-of-materials lines are carried as they were frozen.
import { z } from 'zod';
import { countSchema, positionSchema } from '../../../shared/schemas/bounds';
import { CODE_EDITIONS } from '../../../shared/schemas/job';
import { MOUNTINGS, PANEL_STATES, type RevisionSnapshot } from '../../../shared/schemas/panel';
import type { LoadInput } from '../../../shared/schemas/load';
import type { LoadSelection, PanelRollup } from '../../../shared/schemas/selection';
import { OVERRIDE_FIELDS, type OverrideField } from '../../../shared/schemas/override';
import { BomLineSchema } from '../../../shared/schemas/catalogue';

export const BACKUP_FORMAT = 'panelwright-job';
export const BACKUP_VERSION = 1;
/** Upper bound of an uploaded backup file. */
export const MAX_BACKUP_BYTES = 20 * 1024 * 1024;

const isoDate = z.iso.datetime({ offset: true });
const person = z
  .object({ email: z.string().max(320), name: z.string().max(200) })
  .strict()
  .nullable();
const json = z.record(z.string(), z.unknown());
/**
 * A JSON object carried as it was frozen, typed as the column it goes back into: checked here as an object
 * (the same check as `json`); the answers are parsed again by LoadSchema before the import writes.
 */
const jsonOf = <T>() => z.custom<T>((v) => json.safeParse(v).success, { message: 'Invalid input: expected an object' });

const BackupOverrideSchema = z
  .object({
    field: z.enum(Object.keys(OVERRIDE_FIELDS) as [OverrideField, ...OverrideField[]]),
    value: z.union([z.string().max(40), z.number(), z.boolean()]),
    justification: z.string().max(2000),
    by: z.string().max(200),
    at: z.string().max(40),
    was: z.unknown(),
    warnings: z.array(z.string().max(2000)).max(50),
  })
  .strict();

const BackupLoadSchema = z
  .object({
    ref: z.string().min(1).max(40),
    tag: z.string().trim().min(1).max(40),
    position: positionSchema,
    answers: jsonOf<LoadInput>(),
    selection: jsonOf<LoadSelection>().nullable(),
    overrides: z.array(BackupOverrideSchema).max(20),
  })
  .strict();

const BackupCommentSchema = z
  .object({
    loadRef: z.string().max(40).nullable(),
    body: z.string().min(1).max(10_000),
    author: person,
    at: isoDate,
  })
  .strict();

const BackupRevisionSchema = z
  .object({
    number: countSchema,
    approvedBy: person,
    approvedAt: isoDate,
    snapshot: jsonOf<RevisionSnapshot>(),
  })
  .strict();

const BackupPanelSchema = z
  .object({
    ref: z.string().min(1).max(40),
    name: z.string().trim().min(1).max(200),
    description: z.string().max(2000),
    mounting: z.enum(MOUNTINGS),
    status: z.enum(PANEL_STATES),
    revisionNumber: countSchema.nullable(),
    markupPercent: z.number().min(0).max(300),
    labourRate: z.number().min(0).max(1000),
    /** equipment listed for 75 °C conductors (110.14(C)(1)(a)(3)); null: not answered. Absent in older backups. */
    terminationsListed75C: z.boolean().nullable().default(null),
    archivedAt: isoDate.nullable(),
    submittedAt: isoDate.nullable(),
    bomGeneratedAt: isoDate.nullable(),
    /** whether the stored bill of materials was older than the panel's last change */
    bomStale: z.boolean(),
    rollup: jsonOf<PanelRollup>().nullable(),
    loads: z.array(BackupLoadSchema).max(2000),
    comments: z.array(BackupCommentSchema).max(5000),
    revisions: z.array(BackupRevisionSchema).max(500),
    bomLines: z.array(BomLineSchema).max(20_000),
  })
  .strict();

export const JobBackupSchema = z
  .object({
    format: z.literal(BACKUP_FORMAT),
    version: z.literal(BACKUP_VERSION),
    exportedAt: isoDate,
    job: z
      .object({
        number: z.string().trim().min(1).max(40),
        name: z.string().trim().min(1).max(200),
        customer: z.string().max(200),
        site: z.string().max(200),
        supplyVolts: z.number().int().min(100).max(1000),
        supplyPhases: z.union([z.literal(1), z.literal(3)]),
        supplyHz: z.union([z.literal(50), z.literal(60)]),
        availableFaultKa: z.number().min(0.1).max(200),
        ambientC: z.number().min(-40).max(60),
        // absent in backups written before the field existed
        voltageUnbalancePercent: z.number().min(0).max(20).default(0),
        codeEdition: z.enum(CODE_EDITIONS),
        notes: z.string().max(5000),
        archivedAt: isoDate.nullable(),
      })
      .strict(),
    panels: z.array(BackupPanelSchema).max(200),
  })
  .strict()
  .superRefine((b, ctx) => {
    const panelRefs = new Set<string>();
    b.panels.forEach((p, pi) => {
      if (panelRefs.has(p.ref))
        ctx.addIssue({ code: 'custom', path: ['panels', pi, 'ref'], message: `panel reference ${p.ref} is used twice` });
      panelRefs.add(p.ref);
      const loadRefs = new Set<string>();
      const tags = new Set<string>();
      p.loads.forEach((l, li) => {
        if (loadRefs.has(l.ref))
          ctx.addIssue({ code: 'custom', path: ['panels', pi, 'loads', li, 'ref'], message: `motor reference ${l.ref} is used twice` });
        if (tags.has(l.tag.toLowerCase()))
          ctx.addIssue({ code: 'custom', path: ['panels', pi, 'loads', li, 'tag'], message: `tag ${l.tag} is used twice on this panel` });
        loadRefs.add(l.ref);
        tags.add(l.tag.toLowerCase());
      });
      p.comments.forEach((c, ci) => {
        if (c.loadRef !== null && !loadRefs.has(c.loadRef))
          ctx.addIssue({ code: 'custom', path: ['panels', pi, 'comments', ci, 'loadRef'], message: `no motor ${c.loadRef} on this panel` });
      });
      const numbers = new Set<number>();
      p.revisions.forEach((r, ri) => {
        if (numbers.has(r.number))
          ctx.addIssue({ code: 'custom', path: ['panels', pi, 'revisions', ri, 'number'], message: `revision R${r.number} appears twice` });
        numbers.add(r.number);
      });
    });
  });

export type JobBackup = z.output<typeof JobBackupSchema>;
export type BackupPanel = JobBackup['panels'][number];
