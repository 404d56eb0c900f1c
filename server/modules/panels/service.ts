import { gzipSync } from 'node:zlib';
import type { Transaction } from 'sequelize';
import { db } from '../../db/sequelize';
import { changeFeed } from '../../db/change-feed';
import type { CurrentUser } from '../../../shared/schemas/auth';
import type { CommentView, LoadView, PanelDetail, PanelState } from '../../../shared/schemas/panel';
import type { LoadSelection, PanelRollup } from '../../../shared/schemas/selection';
import { applyOverrides } from '../../../shared/calc/overrides';
import { ConflictError, ForbiddenError, NotFoundError, ValidationError } from '../../../shared/errors';
import * as repo from './repository';
import { recordPanelActivity } from '../activity/service';
import { getJob, jobView } from '../jobs/service';
import { shopSettingsOf } from '../settings/service';
import type { Panel } from '../../db/models/panel';
import type { Load } from '../../db/models/load';
import type { Job } from '../../db/models/job';
import { reselectPanel } from './reselection';

const EDITABLE: PanelState[] = ['draft', 'returned', 'signed_off'];

export function loadView(l: Load): LoadView {
  const selection = (l.selection ?? null) as LoadSelection | null;
  const overrides = l.overrides ?? [];
  return {
    id: l.id,
    tag: l.tag,
    position: l.position,
    answers: l.answers,
    selection,
    effective: selection ? applyOverrides(selection, overrides) : null,
    overrides,
    version: l.version,
  };
}

/** Signed-off panels stay on the sign-off queue this long, for the estimator to price the revision. */
export const SIGNED_OFF_DAYS = 14;

/** The panels that wait on someone: in review, returned, signed off lately (oldest first). */
export async function signOffQueue(actor: CurrentUser) {
  return repo.signOffQueue(actor.organisationId, new Date(Date.now() - SIGNED_OFF_DAYS * 86_400_000));
}

export async function listPanels(actor: CurrentUser, jobId: number) {
  await getJob(actor, jobId);
  return repo.listPanels(actor.organisationId, jobId);
}

export async function requirePanel(actor: CurrentUser, id: number, transaction?: Transaction, lock = false): Promise<Panel & { job: Job }> {
  const p = await repo.findPanelWithJob(actor.organisationId, id, transaction, lock);
  if (!p?.job) throw new NotFoundError('Panel');
  return p as Panel & { job: Job };
}

/**
 * The panel page's data as JSON text, kept per process and keyed by the panel's change stamp (its
 * version and the panel's and job's updated_at: every change to motors, overrides, comments, state or
 * job touches one of them). While the change feed is live and no panel or job has changed since the
 * stamp was read, a repeated read costs no query; otherwise one stamp query, and a rebuild only if
 * the stamp moved. A notification from any instance's change moves the feed's token.
 */
const detailCache = new Map<number, PanelDetailBody>();
const DETAIL_KINDS = ['p', 'j'] as const;

export interface PanelDetailBody {
  key: string;
  json: Buffer;
  /** the same JSON gzipped once, for clients that accept it (every browser) */
  gzip: Buffer;
  organisationId: number;
  /** the change feed's token when the stamp was last read */
  verified: number | null;
}
const DETAIL_CACHE_MAX = 500;

export async function panelDetailJson(actor: CurrentUser, id: number): Promise<PanelDetailBody> {
  const feed = changeFeed();
  const hit = detailCache.get(id);
  const mine = hit && hit.organisationId === actor.organisationId ? hit : undefined;
  if (mine && feed.isCurrent(mine.verified, DETAIL_KINDS)) return mine;
  const token = feed.token(DETAIL_KINDS);
  const key = await repo.panelStamp(actor.organisationId, id);
  if (!key) throw new NotFoundError('Panel');
  if (mine && mine.key === key) {
    mine.verified = token;
    return mine;
  }
  const json = Buffer.from(JSON.stringify(await panelDetailOf(await requirePanel(actor, id))));
  const entry: PanelDetailBody = { key, json, gzip: gzipSync(json), organisationId: actor.organisationId, verified: token };
  if (detailCache.size >= DETAIL_CACHE_MAX) detailCache.delete(detailCache.keys().next().value as number);
  detailCache.set(id, entry);
  return entry;
}

/** Everything a panel page shows, in four queries whatever the motor count. */
export async function panelDetail(actor: CurrentUser, id: number): Promise<PanelDetail> {
  return panelDetailOf(await requirePanel(actor, id));
}

async function panelDetailOf(p: Panel & { job: Job }): Promise<PanelDetail> {
  const [loads, comments, revisions] = await Promise.all([repo.loadsOf(p.id), repo.commentsOf(p.id), repo.revisionsOf(p.id)]);
  return {
    id: p.id,
    jobId: p.jobId,
    name: p.name,
    description: p.description,
    mounting: p.mounting,
    status: p.status as PanelState,
    revisionNumber: p.revisionNumber,
    motorCount: loads.length,
    archivedAt: p.archivedAt ? p.archivedAt.toISOString() : null,
    version: p.version,
    updatedAt: p.updatedAt.toISOString(),
    markupPercent: p.markupPercent,
    labourRate: p.labourRate,
    terminationsListed75C: p.terminationsListed75C ?? null,
    rollup: (p.rollup ?? null) as PanelRollup | null,
    job: jobView(p.job) as unknown as PanelDetail['job'], // cast: the view's dates travel as ISO strings in the JSON answer
    loads: loads.map(loadView).map((l) => (l.overrides.length ? l : { ...l, effective: null })),
    comments: comments.map(
      (c): CommentView => ({ id: c.id, loadId: c.loadId, body: c.body, author: c.authorName, at: c.createdAt.toISOString() }),
    ),
    revisions: revisions.map((r) => ({ ...r, approvedAt: new Date(r.approvedAt).toISOString() })),
  };
}

/** A new panel; without its own markup and labour rate it takes the shop's defaults (a panel keeps its own after that). */
export async function createPanel(
  actor: CurrentUser,
  jobId: number,
  values: {
    name: string;
    description: string;
    mounting: string;
    markupPercent?: number;
    labourRate?: number;
    terminationsListed75C: boolean | null;
  },
) {
  const job = await getJob(actor, jobId);
  const shop = await shopSettingsOf(actor.organisationId);
  const pricing = {
    markupPercent: values.markupPercent ?? shop.defaultMarkupPercent,
    labourRate: values.labourRate ?? shop.defaultLabourRate,
  };
  const p = await repo.createPanel({
    ...values,
    ...pricing,
    organisationId: actor.organisationId,
    jobId: job.id,
    revisionNumber: null,
    archivedAt: null,
    rollup: null,
    submittedAt: null,
  });
  await recordPanelActivity(actor, p, {
    entity: 'panel',
    entityId: p.id,
    action: 'created',
    summary: `Created panel ${p.name}`,
  });
  return panelDetail(actor, p.id);
}

/**
 * Opens a change to a panel inside a transaction: locks the panel row, refuses while it is in review,
 * checks the version the client saw, and turns a signed-off panel into a new draft revision.
 */
async function changePanel<T>(
  actor: CurrentUser,
  panelId: number,
  panelVersion: number | null,
  what: string,
  fn: (p: Panel & { job: Job }, t: Transaction) => Promise<T>,
): Promise<T> {
  return db().transaction(async (t) => {
    const p = await requirePanel(actor, panelId, t, true);
    if (!EDITABLE.includes(p.status as PanelState)) {
      throw new ConflictError(`Panel ${p.name} is in review: the engineer must return it before it can change`);
    }
    if (panelVersion !== null && panelVersion !== p.version) {
      throw new ConflictError(
        `Someone else changed panel ${p.name} since you opened it: reload to see their change, then apply yours again`,
      );
    }
    if (p.status === 'signed_off') {
      await recordReopened(actor, p, what, t);
      p.status = 'draft';
    }
    const out = await fn(p, t);
    await repo.bumpPanel(
      actor.organisationId,
      p.id,
      p.version,
      { status: p.status, ...(p.changed('rollup') ? { rollup: p.rollup } : {}) },
      t,
    );
    return out;
  });
}

/** A signed-off panel that changes opens a new draft: the history says after which revision, and why. */
async function recordReopened(actor: CurrentUser, p: Panel, what: string, t: Transaction) {
  await recordPanelActivity(
    actor,
    p,
    { entity: 'panel', entityId: p.id, action: 'reopened', summary: `Opened a new draft after R${p.revisionNumber} (${what})` },
    t,
  );
}

/**
 * Opens a change to a panel's bill of materials inside the caller's transaction (the panel row locked):
 * refuses while the panel is in review, as a motor edit does, and turns a signed-off panel into a new
 * draft, so the changed parts need a new sign-off.
 */
export async function openBomChange(actor: CurrentUser, p: Panel & { job: Job }, t: Transaction, what: string) {
  if (!EDITABLE.includes(p.status as PanelState)) {
    throw new ConflictError(`Panel ${p.name} is in review: the engineer must return it before its bill of materials can change`);
  }
  if (p.status !== 'signed_off') return;
  await recordReopened(actor, p, what, t);
  const count = await repo.bumpPanel(actor.organisationId, p.id, p.version, { status: 'draft' }, t);
  if (count === 0) throw new ConflictError(`Someone else changed panel ${p.name}: reload and try again`);
  p.status = 'draft';
  p.version += 1;
}

export { changePanel };

export async function updatePanel(actor: CurrentUser, panelId: number, changes: Record<string, unknown>, version: number) {
  await changePanel(actor, panelId, version, 'panel settings', async (p, t) => {
    await repo.updatePanel(p.id, changes, t);
    if ('terminationsListed75C' in changes && (changes.terminationsListed75C ?? null) !== (p.terminationsListed75C ?? null)) {
      // the conductors follow the termination rating (110.14(C)(1)): every motor is selected again
      p.terminationsListed75C = (changes.terminationsListed75C ?? null) as boolean | null;
      await reselectPanel(p, t);
    }
    await recordPanelActivity(
      actor,
      p,
      {
        entity: 'panel',
        entityId: p.id,
        action: 'updated',
        summary: `Changed panel ${p.name}: ${Object.keys(changes).join(', ')}`,
        diff: changes,
      },
      t,
    );
  });
  return panelDetail(actor, panelId);
}

export async function duplicatePanel(actor: CurrentUser, panelId: number) {
  const src = await requirePanel(actor, panelId);
  const loads = await repo.loadsOf(src.id);
  const id = await db().transaction(async (t) => {
    const p = await repo.createPanel(
      {
        organisationId: actor.organisationId,
        jobId: src.jobId,
        name: `${src.name} (copy)`.slice(0, 200),
        description: src.description,
        mounting: src.mounting,
        markupPercent: src.markupPercent,
        labourRate: src.labourRate,
        terminationsListed75C: src.terminationsListed75C ?? null,
        revisionNumber: null,
        archivedAt: null,
        rollup: src.rollup,
        submittedAt: null,
      },
      t,
    );
    await repo.saveLoads(
      loads.map((l) => ({
        organisationId: actor.organisationId,
        panelId: p.id,
        tag: l.tag,
        position: l.position,
        answers: l.answers,
        selection: l.selection,
        overrides: l.overrides,
      })),
      t,
    );
    await recordPanelActivity(
      actor,
      p,
      {
        entity: 'panel',
        entityId: p.id,
        action: 'duplicated',
        summary: `Duplicated panel ${src.name} with ${loads.length} motors`,
      },
      t,
    );
    return p.id;
  });
  return panelDetail(actor, id);
}

export async function archivePanel(actor: CurrentUser, panelId: number, archived: boolean, version: number) {
  const p = await requirePanel(actor, panelId);
  const count = await repo.bumpPanel(actor.organisationId, p.id, version, { archivedAt: archived ? new Date() : null });
  if (count === 0) throw new ConflictError(`Someone else changed panel ${p.name}: reload and try again`);
  await recordPanelActivity(actor, p, {
    entity: 'panel',
    entityId: p.id,
    action: archived ? 'archived' : 'restored',
    summary: `${archived ? 'Archived' : 'Restored'} panel ${p.name}`,
  });
  return panelDetail(actor, panelId);
}

export async function addComment(actor: CurrentUser, panelId: number, body: string, loadId: number | null) {
  const p = await requirePanel(actor, panelId);
  if (loadId !== null) {
    const l = await repo.findLoad(actor.organisationId, loadId);
    if (!l || l.panelId !== p.id)
      throw new ValidationError('That motor is not on this panel', [{ path: 'body.loadId', message: 'not on this panel' }]);
  }
  const c = await repo.createComment({ organisationId: actor.organisationId, panelId: p.id, loadId, userId: actor.id, body });
  await repo.touchPanel(p.id);
  await recordPanelActivity(actor, p, {
    entity: 'comment',
    entityId: c.id,
    action: 'commented',
    summary: `Commented on ${p.name}: ${body.slice(0, 80)}`,
  });
  return { id: c.id, loadId, body, author: actor.name, at: c.createdAt.toISOString() } satisfies CommentView;
}

export function assertRole(actor: CurrentUser, ...roles: string[]) {
  if (!actor.roles.some((r) => roles.includes(r))) throw new ForbiddenError();
}
