import { z } from 'zod';
import { idSchema, versionSchema } from './bounds';
import type { LoadSelection, PanelRollup } from './selection';
import type { StoredOverride } from './override';
import type { JobSummary } from './job';

export const MOUNTINGS = ['free-standing', 'wall-mounted', 'row-end', 'row-middle', 'wall-row-end', 'wall-row-middle'] as const;
export const MOUNTING_LABELS: Record<(typeof MOUNTINGS)[number], string> = {
  'free-standing': 'Free-standing, all sides exposed',
  'wall-mounted': 'Wall-mounted',
  'row-end': 'First or last in a row, free-standing',
  'row-middle': 'Middle of a row, free-standing',
  'wall-row-end': 'First or last in a row, wall-mounted',
  'wall-row-middle': 'Middle of a row, wall-mounted',
};

export const PANEL_STATES = ['draft', 'in_review', 'signed_off', 'returned'] as const;
export type PanelState = (typeof PANEL_STATES)[number];

// Field rules without defaults, so that a partial update never fills in absent fields.
const panelFields = {
  name: z.string().trim().min(1, 'Enter a panel name').max(200),
  description: z.string().trim().max(2000),
  mounting: z.enum(MOUNTINGS),
  markupPercent: z.coerce.number().min(0).max(300),
  labourRate: z.coerce.number().min(0).max(1000),
  /** the panel's starters, protective devices and terminal blocks listed for 75 °C conductors (110.14(C)(1)(a)(3)); null: not answered (taken as yes, flagged) */
  terminationsListed75C: z.boolean().nullable(),
};

export const PanelInputSchema = z.object({
  ...panelFields,
  description: panelFields.description.default(''),
  mounting: panelFields.mounting.default('wall-mounted'),
  /** absent: the shop's default markup and labour rate (shop settings) */
  markupPercent: panelFields.markupPercent.optional(),
  labourRate: panelFields.labourRate.optional(),
  terminationsListed75C: panelFields.terminationsListed75C.default(null),
});
export type PanelInput = z.input<typeof PanelInputSchema>;

export const PanelUpdateSchema = z.object(panelFields).partial().extend({ version: versionSchema }).strict();

export interface PanelSummary {
  id: number;
  jobId: number;
  name: string;
  description: string;
  mounting: string;
  status: PanelState;
  revisionNumber: number | null;
  motorCount: number;
  archivedAt: string | null;
  version: number;
  updatedAt: string;
}

export interface LoadView {
  id: number;
  tag: string;
  position: number;
  answers: Record<string, unknown>;
  selection: LoadSelection | null;
  /** the selection with overrides applied (what the bill of materials and the checks use); null in a panel's answer when there is no override, to keep the answer small: then it equals `selection` */
  effective: LoadSelection | null;
  overrides: StoredOverride[];
  version: number;
}

export interface CommentView {
  id: number;
  loadId: number | null;
  body: string;
  author: string | null;
  at: string;
}

export interface PanelDetail extends PanelSummary {
  markupPercent: number;
  /** equipment listed for 75 °C conductors (110.14(C)(1)(a)(3)); null: not answered, taken as yes and flagged on the motors it changes */
  terminationsListed75C: boolean | null;
  labourRate: number;
  rollup: PanelRollup | null;
  job: Omit<JobSummary, 'panelCount' | 'motorCount'>;
  loads: LoadView[];
  comments: CommentView[];
  revisions: Array<{ number: number; approvedAt: string; approvedBy: string | null }>;
}

/** A panel on the sign-off queue: in review, returned, or signed off lately. */
export interface QueuePanel {
  panelId: number;
  panelName: string;
  jobId: number;
  jobNumber: string;
  jobName: string;
  status: PanelState;
  revisionNumber: number | null;
  /** submitted (in review) or last changed (returned, signed off) */
  since: string;
  motorCount: number;
  /** the latest panel-level comment (a submit note, the reason for returning, the sign-off note) */
  note: { body: string; author: string | null } | null;
}

/** What the current rules and tables would change in a panel's stored selections. */
export interface RuleCheckBody {
  panelId: number;
  panelVersion: number;
  motorCount: number;
  /** motors whose decisions differ, each with its differences */
  changed: Array<{ loadId: number; tag: string; differences: Array<{ field: string; label: string; from: string; to: string }> }>;
}

export const ReselectSchema = z.object({ version: versionSchema }).strict();

export const CommentInputSchema = z.object({
  body: z.string().trim().min(1, 'Write a comment').max(5000),
  loadId: idSchema.nullable().default(null),
});

export const ReviewActionSchema = z.object({
  version: versionSchema,
  comment: z.string().trim().max(5000).default(''),
  /** sign-off only: the engineer accepts a panel SCCR below the available fault current (NEC 409.22), with the reason in the comment */
  acknowledgeSccr: z.boolean().default(false),
});

export const BulkEditSchema = z.object({
  loadIds: z.array(idSchema).min(1).max(2000),
  changes: z
    .object({
      environment: z.string().optional(),
      scpdType: z.string().optional(),
      conductor: z
        .object({ material: z.enum(['cu', 'al']), tempRatingC: z.union([z.literal(60), z.literal(75), z.literal(90)]) })
        .optional(),
      critical: z.boolean().optional(),
      reverseRotationHazard: z.boolean().optional(),
      inertia: z.string().optional(),
      startingLimit: z.string().optional(),
      cableLengthFt: z.number().min(0).max(10000).optional(),
      hz: z.number().optional(),
    })
    .strict()
    .refine((c) => Object.keys(c).length > 0, 'Choose at least one answer to change'),
  panelVersion: versionSchema,
});

/** Whether the signed-in person may sign a panel off as its reviewer (separation of duties). */
export interface SignOffEligibility {
  /** they submitted or changed the panel since its last revision */
  selfReview: boolean;
  /** the shop's settings allow them to sign it off anyway */
  allowed: boolean;
  /** what they did, in the activity's words (at most 5) */
  actions: string[];
  /** why the sign-off is refused, in plain words, or null */
  reason: string | null;
}

/** A motor as frozen in a revision (the effective selection is there from the first release that froze it). */
export interface FrozenLoad {
  tag: string;
  answers: unknown;
  selection?: LoadSelection | null;
  effective?: LoadSelection | null;
  overrides?: StoredOverride[];
}

/**
 * What a sign-off freezes (the `revisions.snapshot` column). Revisions frozen by earlier releases, or restored
 * from a backup, may lack the later fields: `loads` and `sccr` are optional.
 */
export interface RevisionSnapshot {
  panel?: { name: string; mounting: string; markupPercent: number; labourRate: number };
  job?: Record<string, unknown>;
  rollup?: PanelRollup | null;
  loads?: FrozenLoad[];
  bom: import('./catalogue').BomLine[];
  totals: { sell: number; materialCost: number; labourHours: number } & Record<string, unknown>;
  comment?: string;
  sccr?: {
    panelSccrKa: number | null;
    availableFaultKa: number | null;
    verdict: string;
    acknowledged?: { finding: string; by: string; reason: string } | null;
  };
}
