// Tested combination ratings of the shop's catalogue parts (UL 508A SB4): stored per organisation,
// edited by estimators, engineers and administrators (routes in router.ts), and read by the panel's SCCR worksheet.
import type { z } from 'zod';
import type { Transaction } from 'sequelize';
import type { CurrentUser } from '../../../shared/schemas/auth';
import {
  CombinationInputSchema,
  type CombinationUpdateSchema,
  type CombinationValues,
  type CombinationView,
} from '../../../shared/schemas/combination';
import type { CombinationRating } from '../../../shared/standards/ul508a-sb4';
import { ConflictError, NotFoundError, ValidationError, zodIssues } from '../../../shared/errors';
import { csvField, unneutraliseCsvText } from './spreadsheet';
import { readSheetRows } from '../../http/sheet-rows';
import type { CombinationRatingRow } from '../../db/models/combination-rating';
import * as repo from './repository';
import type { CatalogueRow } from './repository';
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
    const rows = await repo.activeCombinationRows(organisationId);
    return Object.freeze(
      rows.map((r) =>
        Object.freeze({
          id: r.ref,
          componentCodes: r.componentCodes,
          ratingKa: r.ratingKa,
          ...(r.maxVolts !== null ? { maxVolts: r.maxVolts } : {}),
          source: r.source,
        }),
      ),
    );
  });
}

/**
 * Every part must be in the catalogue, and the rating may not exceed the interrupting rating marked
 * on a protective device of the combination (its own rating limits the branch).
 */
async function checkAgainstCatalogue(
  organisationId: number,
  v: Pick<CombinationValues, 'componentCodes' | 'ratingKa'>,
  t: Transaction,
  known?: ReadonlyMap<string, CatalogueRow>,
) {
  const byCode = known ?? (await repo.itemsByCode(organisationId, v.componentCodes, t));
  const items = v.componentCodes.flatMap((code) => byCode.get(code) ?? []);
  const issues = v.componentCodes.flatMap((code, i) =>
    byCode.has(code) ? [] : [{ path: `body.componentCodes.${i}`, message: `${code} is not in the catalogue` }],
  );
  if (issues.length) throw new ValidationError('A combination can name only parts of the catalogue', issues);
  const limit = items.filter((i) => PROTECTIVE.has(i.category) && i.sccrKa !== null).sort((a, b) => a.sccrKa! - b.sccrKa!)[0];
  if (limit && v.ratingKa > limit.sccrKa!) {
    throw new ValidationError(`The combination cannot be rated above the ${limit.sccrKa} kA interrupting rating of ${limit.code}`, [
      { path: 'body.ratingKa', message: `at most ${limit.sccrKa} kA (${limit.code})` },
    ]);
  }
}

export async function listCombinations(actor: CurrentUser): Promise<CombinationView[]> {
  const rows = await repo.combinationRows(actor.organisationId);
  return rows.map(view);
}

export async function createCombination(actor: CurrentUser, v: CombinationValues): Promise<CombinationView> {
  return db().transaction(async (t) => {
    if (await repo.findCombinationByRef(actor.organisationId, v.ref, t)) {
      throw new ConflictError(`There is already a combination ${v.ref}`, [{ path: 'body.ref', message: 'already used' }]);
    }
    await checkAgainstCatalogue(actor.organisationId, v, t);
    const r = await repo.insertCombination({ ...v, organisationId: actor.organisationId }, t);
    await recordActivity(
      actor,
      {
        entity: 'combination_rating',
        entityId: r.id,
        action: 'created',
        summary: `Added tested combination ${v.ref}: ${v.componentCodes.join(' + ')} at ${v.ratingKa} kA`,
      },
      t,
    );
    return view(r);
  });
}

export async function updateCombination(
  actor: CurrentUser,
  id: number,
  input: z.output<typeof CombinationUpdateSchema>,
): Promise<CombinationView> {
  const { version, ...changes } = input;
  return db().transaction(async (t) => {
    const r = await repo.findCombinationForUpdate(actor.organisationId, id, t);
    if (!r) throw new NotFoundError('Combination rating');
    if (r.version !== version)
      throw new ConflictError(`Someone else changed ${r.ref} since you opened it: reload to see their change, then apply yours again`);
    const next = { componentCodes: changes.componentCodes ?? r.componentCodes, ratingKa: changes.ratingKa ?? r.ratingKa };
    await checkAgainstCatalogue(actor.organisationId, next, t);
    await repo.writeCombination(r, { ...changes, version: version + 1 }, t);
    const what = Object.keys(changes).join(', ') || 'nothing';
    await recordActivity(
      actor,
      {
        entity: 'combination_rating',
        entityId: id,
        action: 'updated',
        summary: `Changed tested combination ${r.ref}: ${what}`,
        diff: changes,
      },
      t,
    );
    return view(r);
  });
}

// ------------------------------------------------------------------------------------------------
// A combination table as a file: one row per combination, the parts joined by "+". A maker's published
// combination table is typed or pasted once into this shape and imported in one go.

export const COMBINATION_COLUMNS = ['ref', 'parts', 'ratingKa', 'maxVolts', 'source', 'active'] as const;

/** The organisation's combinations as CSV (text that looks like a formula is neutralised). */
export async function combinationsCsv(actor: CurrentUser): Promise<string> {
  const rows = await listCombinations(actor);
  const lines = [COMBINATION_COLUMNS.join(',')];
  for (const c of rows)
    lines.push([c.ref, c.componentCodes.join(' + '), c.ratingKa, c.maxVolts, c.source, c.active ? 'yes' : 'no'].map(csvField).join(','));
  return `${lines.join('\r\n')}\r\n`;
}

const MAX_COMBINATION_ROWS = 2000;

/**
 * Imports a combination table: every row valid, every part in the catalogue and no rating above its
 * own protective device, or nothing is written (the problems come back by row). A reference already
 * kept is changed in place (its version moves); a new one is added.
 */
export async function importCombinations(actor: CurrentUser, buffer: Buffer, kind: 'xlsx' | 'csv') {
  const raw = (await readSheetRows(buffer, kind, { maxRows: MAX_COMBINATION_ROWS, what: 'combinations' })).filter((r) =>
    r.some((c) => c !== ''),
  );
  const header = (raw[0] ?? []).map((h) => h.trim());
  if (COMBINATION_COLUMNS.some((c, i) => header[i] !== c)) {
    throw new ValidationError(`The header row must be: ${COMBINATION_COLUMNS.join(', ')}`, [
      { path: 'columns', message: `found ${header.join(', ') || 'nothing'}` },
    ]);
  }
  if (raw.length < 2) throw new ValidationError('The file has no combinations under the header', [{ path: 'file', message: 'no rows' }]);
  const issues: Array<{ path: string; message: string }> = [];
  const seen = new Set<string>();
  const values: CombinationValues[] = [];
  raw.slice(1).forEach((cells, i) => {
    const row = i + 2;
    const [ref = '', parts = '', ratingKa = '', maxVolts = '', source = '', active = ''] = cells.map((c) => unneutraliseCsvText(c));
    const activeText = active.toLowerCase();
    if (activeText && !['yes', 'no', 'true', 'false'].includes(activeText))
      issues.push({ path: `rows[${row}].active`, message: `"${active}" is not yes or no` });
    const r = CombinationInputSchema.safeParse({
      ref,
      componentCodes: parts.split(/\s*[+,;]\s*|\s+/).filter(Boolean),
      ratingKa: ratingKa === '' ? undefined : Number(ratingKa),
      maxVolts: maxVolts === '' ? null : Number(maxVolts),
      source,
      active: activeText === '' ? true : activeText === 'yes' || activeText === 'true',
    });
    if (!r.success) {
      for (const iss of zodIssues(r.error.issues))
        issues.push({ path: `rows[${row}].${iss.path.replace(/^componentCodes/, 'parts')}`, message: iss.message });
      return;
    }
    if (seen.has(r.data.ref)) issues.push({ path: `rows[${row}].ref`, message: `${r.data.ref} appears twice in the file` });
    seen.add(r.data.ref);
    values.push(r.data);
  });
  if (issues.length)
    throw new ValidationError(
      `${new Set(issues.map((x) => x.path.split('.')[0])).size} row(s) have problems: nothing was imported`,
      issues,
    );

  return db().transaction(async (t) => {
    const existing = await repo.combinationsByRefForUpdate(
      actor.organisationId,
      values.map((v) => v.ref),
      t,
    );
    // every part of every row in one query, not one per row
    const codes = [...new Set(values.flatMap((v) => v.componentCodes))];
    const known = await repo.itemsByCode(actor.organisationId, codes, t);
    const fresh: Array<CombinationValues & { organisationId: number }> = [];
    let changed = 0;
    let unchanged = 0;
    for (const [i, v] of values.entries()) {
      try {
        await checkAgainstCatalogue(actor.organisationId, v, t, known);
      } catch (e) {
        if (!(e instanceof ValidationError)) throw e;
        throw new ValidationError(
          `Row ${i + 2} (${v.ref}): ${e.message}: nothing was imported`,
          (e.details ?? []).map((d) => ({
            path: `rows[${i + 2}].${d.path.replace(/^body\.componentCodes/, 'parts').replace(/^body\./, '')}`,
            message: d.message,
          })),
        );
      }
      const r = existing.get(v.ref);
      if (!r) fresh.push({ ...v, organisationId: actor.organisationId });
      else if (
        JSON.stringify([r.componentCodes, r.ratingKa, r.maxVolts, r.source, r.active]) !==
        JSON.stringify([v.componentCodes, v.ratingKa, v.maxVolts, v.source, v.active])
      ) {
        await repo.writeCombination(
          r,
          {
            componentCodes: v.componentCodes,
            ratingKa: v.ratingKa,
            maxVolts: v.maxVolts,
            source: v.source,
            active: v.active,
            version: r.version + 1,
          },
          t,
        );
        changed++;
      } else unchanged++;
    }
    // the new ones in one statement; a changed one is an update of its own row (its version moves)
    await repo.insertCombinations(fresh, t);
    const created = fresh.length;
    await recordActivity(
      actor,
      {
        entity: 'combination_rating',
        entityId: 0,
        action: 'imported',
        summary: `Imported tested combinations: ${created} new, ${changed} changed, ${unchanged} unchanged`,
      },
      t,
    );
    return { created, changed, unchanged };
  });
}
