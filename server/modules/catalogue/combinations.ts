// Tested combination ratings of the shop's catalogue parts (UL 508A SB4): stored per organisation,
// edited by estimators, engineers and administrators (routes in router.ts), and read by the panel's SCCR worksheet.
import type { z } from 'zod';
import { Op, type Transaction } from 'sequelize';
import type { CurrentUser } from '../../../shared/schemas/auth';
import type { CombinationUpdateSchema, CombinationValues, CombinationView } from '../../../shared/schemas/combination';
import type { CombinationRating } from '../../../shared/standards/ul508a-sb4';
import { ConflictError, NotFoundError, ValidationError } from '../../../shared/errors';
import { CombinationRatingRow } from '../../db/models/combination-rating';
import { CatalogueItem as CatalogueRow } from '../../db/models/catalogue-item';
import { db } from '../../db/sequelize';
import { FeedCache } from '../../db/change-feed';
import { recordActivity } from '../activity/service';

/** Catalogue categories whose marked rating is an interrupting rating: a combination cannot exceed it. */
const PROTECTIVE = new Set(['inverse-time-breaker', 'motor-circuit-protector', 'manual-motor-protector', 'fuse', 'main-breaker']);

function view(r: CombinationRatingRow): CombinationView {
  return {
    id: r.id,
    ref: r.ref,
    componentCodes: r.componentCodes,
    ratingKa: r.ratingKa,
    maxVolts: r.maxVolts,
    source: r.source,
    active: r.active,
    version: r.version,
    updatedAt: r.updatedAt.toISOString(),
  };
}

/**
 * The active combinations of an organisation, in the shape the SCCR calculation takes. Kept per process
 * like the catalogue: while the change feed is live and no catalogue or combination statement has run.
 */
const active = new FeedCache<number, readonly CombinationRating[]>(['c']);

export async function activeCombinations(organisationId: number): Promise<readonly CombinationRating[]> {
  return active.get(organisationId, async () => {
    const rows = await CombinationRatingRow.findAll({ where: { organisationId, active: true }, order: [['ref', 'ASC']] });
    return Object.freeze(
      rows.map((r) => Object.freeze({ id: r.ref, componentCodes: r.componentCodes, ratingKa: r.ratingKa, ...(r.maxVolts !== null ? { maxVolts: r.maxVolts } : {}), source: r.source })),
    );
  });
}

/**
 * Every part must be in the catalogue, and the rating may not exceed the interrupting rating marked
 * on a protective device of the combination (its own rating limits the branch).
 */
async function checkAgainstCatalogue(organisationId: number, v: Pick<CombinationValues, 'componentCodes' | 'ratingKa'>, t: Transaction) {
  const items = await CatalogueRow.findAll({ where: { organisationId, code: { [Op.in]: v.componentCodes } }, transaction: t });
  const byCode = new Map(items.map((i) => [i.code, i]));
  const issues = v.componentCodes.flatMap((code, i) => (byCode.has(code) ? [] : [{ path: `body.componentCodes.${i}`, message: `${code} is not in the catalogue` }]));
  if (issues.length) throw new ValidationError('A combination can name only parts of the catalogue', issues);
  const limit = items.filter((i) => PROTECTIVE.has(i.category) && i.sccrKa !== null).sort((a, b) => a.sccrKa! - b.sccrKa!)[0];
  if (limit && v.ratingKa > limit.sccrKa!) {
    throw new ValidationError(`The combination cannot be rated above the ${limit.sccrKa} kA interrupting rating of ${limit.code}`, [
      { path: 'body.ratingKa', message: `at most ${limit.sccrKa} kA (${limit.code})` },
    ]);
  }
}

export async function listCombinations(actor: CurrentUser): Promise<CombinationView[]> {
  const rows = await CombinationRatingRow.findAll({ where: { organisationId: actor.organisationId }, order: [['ref', 'ASC']] });
  return rows.map(view);
}

export async function createCombination(actor: CurrentUser, v: CombinationValues): Promise<CombinationView> {
  return db().transaction(async (t) => {
    if (await CombinationRatingRow.findOne({ where: { organisationId: actor.organisationId, ref: v.ref }, transaction: t })) {
      throw new ConflictError(`There is already a combination ${v.ref}`, [{ path: 'body.ref', message: 'already used' }]);
    }
    await checkAgainstCatalogue(actor.organisationId, v, t);
    const r = await CombinationRatingRow.create({ ...v, organisationId: actor.organisationId }, { transaction: t });
    await recordActivity(actor, { entity: 'combination_rating', entityId: r.id, action: 'created', summary: `Added tested combination ${v.ref}: ${v.componentCodes.join(' + ')} at ${v.ratingKa} kA` }, t);
    return view(r);
  });
}

export async function updateCombination(actor: CurrentUser, id: number, input: z.output<typeof CombinationUpdateSchema>): Promise<CombinationView> {
  const { version, ...changes } = input;
  return db().transaction(async (t) => {
    const r = await CombinationRatingRow.findOne({ where: { organisationId: actor.organisationId, id }, transaction: t, lock: t.LOCK.UPDATE });
    if (!r) throw new NotFoundError('Combination rating');
    if (r.version !== version) throw new ConflictError(`Someone else changed ${r.ref} since you opened it: reload to see their change, then apply yours again`);
    const next = { componentCodes: changes.componentCodes ?? r.componentCodes, ratingKa: changes.ratingKa ?? r.ratingKa };
    await checkAgainstCatalogue(actor.organisationId, next, t);
    await r.update({ ...changes, version: version + 1 }, { transaction: t });
    const what = Object.keys(changes).join(', ') || 'nothing';
    await recordActivity(actor, { entity: 'combination_rating', entityId: id, action: 'updated', summary: `Changed tested combination ${r.ref}: ${what}`, diff: changes }, t);
    return view(r);
  });
}
