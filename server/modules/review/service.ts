// Sign-off: Draft → In review → Signed off (a frozen revision R0, R1 …) or Returned.
import { db } from '../../db/sequelize';
import type { CurrentUser } from '../../../shared/schemas/auth';
import type { BomLine } from '../../../shared/schemas/catalogue';
import type { SignOffEligibility } from '../../../shared/schemas/panel';
import { computeTotals, diffBoms } from '../../../shared/calc/bom';
import { selectionDifferences } from '../../../shared/calc/selection-diff';
import type { LoadSelection } from '../../../shared/schemas/selection';
import { ConflictError, ForbiddenError, NotFoundError, ValidationError } from '../../../shared/errors';
import * as repo from '../panels/repository';
import { loadView, panelDetail, requirePanel } from '../panels/service';
import { panelActionsBy, recordPanelActivity } from '../activity/service';
import { shopSettingsOf } from '../settings/service';
import type { Transaction } from 'sequelize';
import type { Panel } from '../../db/models/panel';
import { regenerateBom } from '../bom/service';
import { panelSccrFor } from '../checks/service';
import { sendMail } from '../mail/mailer';
import { env } from '../../config/env';

function link(panelId: number, jobId: number) {
  return `${env().APP_URL}/jobs/${jobId}/panels/${panelId}`;
}

export async function submitForReview(actor: CurrentUser, panelId: number, version: number, comment: string) {
  const result = await db().transaction(async (t) => {
    const p = await requirePanel(actor, panelId, t, true);
    if (p.version !== version) throw new ConflictError(`Someone else changed panel ${p.name} since you opened it: reload and try again`);
    if (!['draft', 'returned'].includes(p.status))
      throw new ConflictError(`Panel ${p.name} is ${p.status.replace('_', ' ')}: only a draft or returned panel can be submitted`);
    const loads = await repo.loadsOf(p.id, t);
    if (loads.length === 0)
      throw new ValidationError('Add at least one motor before submitting', [{ path: 'loads', message: 'no motors' }]);
    const broken = loads.map(loadView).filter((l) => !l.selection || l.selection.errors.length > 0);
    if (broken.length)
      throw new ValidationError(
        `Fix the motors with errors first: ${broken.map((l) => l.tag).join(', ')}`,
        broken.map((l) => ({ path: `loads.${l.tag}`, message: l.selection?.errors.join('; ') ?? 'no selection' })),
      );
    await repo.bumpPanel(actor.organisationId, p.id, p.version, { status: 'in_review', submittedAt: new Date() }, t);
    if (comment)
      await repo.createComment({ organisationId: actor.organisationId, panelId: p.id, loadId: null, userId: actor.id, body: comment }, t);
    await recordPanelActivity(
      actor,
      p,
      {
        entity: 'panel',
        entityId: p.id,
        action: 'submitted',
        summary: `Submitted ${p.name} for sign-off (${loads.length} motors)`,
      },
      t,
    );
    return p;
  });
  const engineers = await repo.usersWithRole(actor.organisationId, 'engineer');
  await sendMail(
    engineers.map((e) => e.email),
    `Sign-off requested: ${result.job.number} ${result.name}`,
    `${actor.name} submitted panel ${result.name} of job ${result.job.number} for sign-off.\n\n${comment ? `Note: ${comment}\n\n` : ''}Review it: ${link(result.id, result.jobId)}\n`,
  );
  return panelDetail(actor, panelId);
}

export async function returnPanel(actor: CurrentUser, panelId: number, version: number, comment: string) {
  if (!comment)
    throw new ValidationError('Say what must change when returning a panel', [
      { path: 'body.comment', message: 'required when returning' },
    ]);
  const p = await db().transaction(async (t) => {
    const p = await requirePanel(actor, panelId, t, true);
    if (p.version !== version) throw new ConflictError(`Someone else changed panel ${p.name} since you opened it: reload and try again`);
    if (p.status !== 'in_review') throw new ConflictError(`Panel ${p.name} is not in review`);
    await repo.bumpPanel(actor.organisationId, p.id, p.version, { status: 'returned' }, t);
    await repo.createComment(
      { organisationId: actor.organisationId, panelId: p.id, loadId: null, userId: actor.id, body: `Returned: ${comment}` },
      t,
    );
    await recordPanelActivity(
      actor,
      p,
      {
        entity: 'panel',
        entityId: p.id,
        action: 'returned',
        summary: `Returned ${p.name}: ${comment.slice(0, 120)}`,
      },
      t,
    );
    return p;
  });
  const designers = await repo.usersWithRole(actor.organisationId, 'designer');
  await sendMail(
    designers.map((d) => d.email),
    `Returned: ${p.job.number} ${p.name}`,
    `${actor.name} returned panel ${p.name}.\n\n${comment}\n\n${link(p.id, p.jobId)}\n`,
  );
  return panelDetail(actor, panelId);
}

/** What someone may do to a panel without becoming one of its authors: comment, review, archive, rebuild the bill of materials from the selections (the sign-off rebuilds it too). */
const NOT_AUTHORING = new Set([
  'commented',
  'returned',
  'signed-off',
  'self-sign-off',
  'sign-off-refused',
  'archived',
  'restored',
  'rebuilt',
]);
/** Panel settings that price the work and do not change the design. */
const PRICING_ONLY = new Set(['markupPercent', 'labourRate']);
/** The job's answers the selections rest on; its name, customer or notes do not make a designer. */
const JOB_DESIGN = new Set(['supplyVolts', 'supplyPhases', 'supplyHz', 'availableFaultKa', 'ambientC', 'codeEdition']);

function authoring(a: { entity: string; action: string; diff: Record<string, unknown> | null }): boolean {
  if (NOT_AUTHORING.has(a.action)) return false;
  const keys = Object.keys(a.diff ?? {});
  if (a.entity === 'job') return a.action === 'created' || keys.some((k) => JOB_DESIGN.has(k));
  return !(a.action === 'updated' && keys.length > 0 && keys.every((k) => PRICING_ONLY.has(k)));
}

/**
 * Separation of duties: what the person did to the panel since its last signed-off revision that makes
 * them one of its authors (submitted it, changed its motors, overrides, bill of materials or settings, or
 * the job's supply, fault current or code edition).
 * Empty when they may sign it off as its reviewer.
 */
async function authoredBy(actor: CurrentUser, p: Panel, t?: Transaction): Promise<string[]> {
  const last = p.revisionNumber === null ? null : await repo.findRevision(actor.organisationId, p.id, p.revisionNumber, t);
  const actions = await panelActionsBy(actor.organisationId, p, actor.id, last?.approvedAt ?? null, t);
  return [...new Set(actions.filter(authoring).map((a) => a.summary))];
}

function sinceText(p: Panel) {
  return p.revisionNumber === null ? 'since it was started' : `since R${p.revisionNumber}`;
}

function eligibility(p: Panel, actions: string[], allowSelfSignOff: boolean): SignOffEligibility {
  const selfReview = actions.length > 0;
  return {
    selfReview,
    allowed: allowSelfSignOff,
    actions: actions.slice(0, 5),
    reason:
      selfReview && !allowSelfSignOff
        ? `You submitted or changed panel ${p.name} ${sinceText(p)}, so another engineer must sign it off (a shop administrator can allow self sign-off in Shop settings).`
        : null,
  };
}

/** Whether this engineer may sign the panel off, and if not, why (the sign-off section says it beside the button). */
export async function signOffEligibility(actor: CurrentUser, panelId: number): Promise<SignOffEligibility> {
  const p = await requirePanel(actor, panelId);
  const [actions, shop] = await Promise.all([authoredBy(actor, p), shopSettingsOf(actor.organisationId)]);
  return eligibility(p, actions, shop.allowSelfSignOff);
}

class SelfSignOffRefused extends ForbiddenError {
  constructor(
    message: string,
    readonly panel: Panel,
  ) {
    super(message);
  }
}

/** The shortest reason an engineer may give when signing off a panel rated below the site's fault current. */
const MIN_JUSTIFICATION = 15;

/**
 * Signs off: rebuilds the bill of materials and freezes selections and BOM as the next revision, in one
 * transaction; a panel SCCR below the available fault current needs `acknowledgeSccr` and a reason.
 */
export async function approvePanel(
  actor: CurrentUser,
  panelId: number,
  version: number,
  comment: string,
  opts: { failAfterFreeze?: boolean; acknowledgeSccr?: boolean } = {},
) {
  const shop = await shopSettingsOf(actor.organisationId);
  const p = await db()
    .transaction(async (t) => {
      const p = await requirePanel(actor, panelId, t, true);
      if (p.version !== version) throw new ConflictError(`Someone else changed panel ${p.name} since you opened it: reload and try again`);
      if (p.status !== 'in_review') throw new ConflictError(`Panel ${p.name} is not in review`);
      const own = eligibility(p, await authoredBy(actor, p, t), shop.allowSelfSignOff);
      if (own.reason) throw new SelfSignOffRefused(own.reason, p);
      const lines = await regenerateBom(actor.organisationId, p, t);
      const loads = (await repo.loadsOf(p.id, t)).map(loadView);
      // NEC 409.22(A): a panel is not installed where the available fault current exceeds its SCCR. A
      // sign-off below it (or with a rating the worksheet could not finish) needs the engineer's explicit
      // acknowledgement and a written reason (a current-limiting feeder with let-through data the
      // catalogue does not hold, a corrected fault study …); both are frozen with the revision.
      const effective = loads.flatMap((l) => (l.effective && l.effective.errors.length === 0 ? [l.effective] : []));
      const sccr = await panelSccrFor(actor.organisationId, lines, effective, p.job.availableFaultKa ?? null);
      const short = sccr.verdict === 'below-available' || sccr.verdict === 'incomplete';
      const finding = short
        ? sccr.verdict === 'below-available'
          ? `Panel SCCR ${sccr.panelSccrKa} kA is below the ${p.job.availableFaultKa} kA available at the site (NEC 409.22)`
          : 'The panel SCCR could not be determined from the bill of materials (UL 508A SB4)'
        : null;
      if (finding && (!opts.acknowledgeSccr || comment.trim().length < MIN_JUSTIFICATION)) {
        throw new ValidationError(
          `${finding}: acknowledge it and write why in the sign-off comment (at least ${MIN_JUSTIFICATION} characters) to sign off`,
          [
            ...(opts.acknowledgeSccr ? [] : [{ path: 'body.acknowledgeSccr', message: 'acknowledge the short-circuit rating' }]),
            ...(comment.trim().length < MIN_JUSTIFICATION
              ? [{ path: 'body.comment', message: `say why (at least ${MIN_JUSTIFICATION} characters)` }]
              : []),
          ],
        );
      }
      const number = p.revisionNumber === null ? 0 : p.revisionNumber + 1;
      const snapshot = {
        panel: { name: p.name, mounting: p.mounting, markupPercent: p.markupPercent, labourRate: p.labourRate },
        job: {
          number: p.job.number,
          supplyVolts: p.job.supplyVolts,
          supplyPhases: p.job.supplyPhases,
          supplyHz: p.job.supplyHz,
          availableFaultKa: p.job.availableFaultKa,
          ambientC: p.job.ambientC,
          codeEdition: p.job.codeEdition,
        },
        rollup: p.rollup,
        loads,
        bom: lines,
        totals: computeTotals(lines, p.markupPercent, p.labourRate),
        comment,
        sccr: {
          panelSccrKa: sccr.panelSccrKa,
          availableFaultKa: p.job.availableFaultKa ?? null,
          verdict: sccr.verdict,
          acknowledged: finding ? { finding, by: actor.name, reason: comment } : null,
        },
      };
      await repo.createRevision(
        { organisationId: actor.organisationId, panelId: p.id, number, snapshot, approvedBy: actor.id, approvedAt: new Date() },
        t,
      );
      if (opts.failAfterFreeze) throw new Error('failure injected after the revision was written');
      await repo.bumpPanel(
        actor.organisationId,
        p.id,
        p.version,
        { status: 'signed_off', revisionNumber: number, bomGeneratedAt: new Date() },
        t,
      );
      await recordPanelActivity(
        actor,
        p,
        {
          entity: 'panel',
          entityId: p.id,
          action: 'signed-off',
          summary: `Signed off ${p.name} as R${number}${finding ? ` acknowledging: ${finding}` : ''}${comment ? `: ${comment.slice(0, 100)}` : ''}`,
        },
        t,
      );
      if (own.selfReview) {
        await recordPanelActivity(
          actor,
          p,
          {
            entity: 'panel',
            entityId: p.id,
            action: 'self-sign-off',
            summary: `Signed off R${number} of ${p.name} after submitting or changing it (self sign-off allowed by the shop settings)`,
            diff: { own: own.actions },
          },
          t,
        );
      }
      return Object.assign(p, { revisionNumber: number });
    })
    .catch(async (e: unknown) => {
      if (e instanceof SelfSignOffRefused) {
        await recordPanelActivity(actor, e.panel, {
          entity: 'panel',
          entityId: e.panel.id,
          action: 'sign-off-refused',
          summary: `Sign-off of ${e.panel.name} refused: ${actor.name} submitted or changed it ${sinceText(e.panel)}`,
        });
      }
      throw e;
    });
  const designers = await repo.usersWithRole(actor.organisationId, 'designer');
  const estimators = await repo.usersWithRole(actor.organisationId, 'estimator');
  await sendMail(
    [...new Set([...designers, ...estimators].map((u) => u.email))],
    `Signed off: ${p.job.number} ${p.name} R${p.revisionNumber}`,
    `${actor.name} signed off panel ${p.name} as revision R${p.revisionNumber}.\n\n${comment ? `${comment}\n\n` : ''}${link(p.id, p.jobId)}\n`,
  );
  return panelDetail(actor, panelId);
}

export async function getRevision(actor: CurrentUser, panelId: number, number: number) {
  await requirePanel(actor, panelId);
  const r = await repo.findRevision(actor.organisationId, panelId, number);
  if (!r) throw new NotFoundError(`Revision R${number}`);
  return { number: r.number, approvedAt: r.approvedAt, snapshot: r.snapshot };
}

/** The change report between two revisions: lines added, removed, changed, and the cost delta. */
export async function compareRevisions(actor: CurrentUser, panelId: number, a: number, b: number) {
  const [ra, rb] = await Promise.all([getRevision(actor, panelId, a), getRevision(actor, panelId, b)]);
  const la = (ra.snapshot as { bom: BomLine[] }).bom;
  const lb = (rb.snapshot as { bom: BomLine[] }).bom;
  const ta = (ra.snapshot as { totals: { sell: number; materialCost: number; labourHours: number } }).totals;
  const tb = (rb.snapshot as { totals: { sell: number; materialCost: number; labourHours: number } }).totals;
  type FrozenLoad = { tag: string; answers: unknown; selection?: LoadSelection | null; effective?: LoadSelection | null };
  const frozenA = (ra.snapshot as { loads?: FrozenLoad[] }).loads ?? [];
  const frozenB = (rb.snapshot as { loads?: FrozenLoad[] }).loads ?? [];
  const loadsA = new Map(frozenA.map((l) => [l.tag, JSON.stringify(l.answers)]));
  const loadsB = new Map(frozenB.map((l) => [l.tag, JSON.stringify(l.answers)]));
  // the decisions that moved for a motor on both revisions (answers changed, an override, the job's
  // supply, or a release of the rules), from the effective selections frozen with each revision
  const effA = new Map(frozenA.map((l) => [l.tag, l.effective ?? l.selection ?? null]));
  const decisions = frozenB.flatMap((l) => {
    const before = effA.get(l.tag);
    const after = l.effective ?? l.selection ?? null;
    if (!before || !after) return [];
    const differences = selectionDifferences(before, after);
    return differences.length ? [{ tag: l.tag, differences }] : [];
  });
  return {
    from: a,
    to: b,
    bom: diffBoms(la, lb),
    totals: {
      from: ta,
      to: tb,
      sellDelta: Math.round((tb.sell - ta.sell) * 100) / 100,
      materialDelta: Math.round((tb.materialCost - ta.materialCost) * 100) / 100,
    },
    motors: {
      added: [...loadsB.keys()].filter((k) => !loadsA.has(k)),
      removed: [...loadsA.keys()].filter((k) => !loadsB.has(k)),
      changed: [...loadsB.keys()].filter((k) => loadsA.has(k) && loadsA.get(k) !== loadsB.get(k)),
      decisions,
    },
  };
}
