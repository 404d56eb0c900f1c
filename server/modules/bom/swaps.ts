// Swapping the part of a bill-of-materials line for an equivalent, and the estimator's changes to one line.
import type { Transaction } from 'sequelize';
import { db } from '../../db/sequelize';
import type { Panel } from '../../db/models/panel';
import type { Job } from '../../db/models/job';
import * as repo from './repository';
import type { CurrentUser } from '../../../shared/schemas/auth';
import type { BomLine, Requirement } from '../../../shared/schemas/catalogue';
import { ValidationError } from '../../../shared/errors';
import { lineServes, lineShortfalls, swappedLine } from '../../../shared/calc/bom';
import { recordPanelActivity } from '../activity/service';
import { catalogueFor, labourUnitsFor } from '../catalogue/repository';
import { openBomChange, requirePanel } from '../panels/service';
import { buildLines, lockedPanel, ordinalKeys } from './service';
import { checkLine, requireLine } from './lines';

export interface LineChanges {
  quantity?: number;
  description?: string;
  unitCost?: number;
  unitLabourHours?: number;
  /** swap for this catalogue item (one meeting the line's requirement), with a reason */
  swapCode?: string;
  swapReason?: string;
}

/**
 * What a line's part must meet: the requirement the matcher kept on the line; for a line stored before
 * lines kept it, the one today's build gives the same line (bucket, category and order). Null when the
 * line's need is not one the catalogue can be searched for.
 */
async function requirementOf(
  organisationId: number,
  panel: Panel & { job: Job },
  lineId: number,
  line: BomLine,
  t?: Transaction,
): Promise<Requirement[] | null> {
  if (line.requirement !== undefined) return line.requirement;
  const rows = await repo.bomRowsOf(panel.id, t);
  const auto = rows.filter((r) => r.line.source !== 'manual');
  const key = ordinalKeys(auto.map((r) => r.line))[auto.findIndex((r) => r.id === lineId)];
  const { built } = await buildLines(organisationId, panel, t);
  const builtKeys = ordinalKeys(built.lines);
  return built.lines[builtKeys.indexOf(key ?? '')]?.requirement ?? null;
}

/**
 * Change one line. A manual line takes any change. An automatic line's quantity follows the design,
 * so it may only be swapped, with a reason, for an active item that meets the line's requirement (the
 * one the matcher used); the swapped line takes the new item's price, every other line keeps its frozen
 * unit cost. On a signed-off panel the change opens a new draft; in review it is refused.
 */
export async function updateLine(actor: CurrentUser, panelId: number, lineId: number, changes: LineChanges) {
  return db().transaction(async (t) => {
    const panel = await lockedPanel(actor, panelId, t);
    const row = await requireLine(panel.id, lineId, t);
    const before = row.line;
    await openBomChange(
      actor,
      panel,
      t,
      changes.swapCode !== undefined
        ? `${before.code ?? 'a line'} on ${before.bucket} was swapped in the bill of materials`
        : 'a line of the bill of materials was changed',
    );
    let after: BomLine = { ...before };
    if (changes.swapCode !== undefined) {
      const reason = changes.swapReason?.trim();
      if (!reason)
        throw new ValidationError('Give the reason for the swap', [{ path: 'body.swapReason', message: 'a swap needs a reason' }]);
      if (before.source === 'manual')
        throw new ValidationError('A manual line is changed directly, not swapped', [
          { path: 'body.swapCode', message: 'not for a manual line' },
        ]);
      const item = (await catalogueFor(actor.organisationId, t)).find((c) => c.code === changes.swapCode);
      if (!item)
        throw new ValidationError(`There is no catalogue item ${changes.swapCode}`, [
          { path: 'body.swapCode', message: 'not in the catalogue' },
        ]);
      if (!item.active) throw new ValidationError(`${item.code} is deactivated`, [{ path: 'body.swapCode', message: 'deactivated item' }]);
      if (item.category !== before.category) {
        throw new ValidationError(`${item.code} is not an equivalent: it is not in the line's category`, [
          { path: 'body.swapCode', message: `must be a ${before.category}` },
        ]);
      }
      const requirement = await requirementOf(actor.organisationId, panel, row.id, before, t);
      const who = lineServes(before.bucket);
      if (!requirement) {
        throw new ValidationError(
          `What ${who} needs here (${before.requiredRatings ?? before.description}) cannot be checked against the catalogue: add a manual line for the part instead`,
          [{ path: 'body.swapCode', message: 'no requirement to check a part against' }],
        );
      }
      const lacks = lineShortfalls(item, requirement, who);
      if (lacks.length > 0) {
        throw new ValidationError(`${item.code} does not meet what ${who} needs: ${lacks.join('; ')}`, [
          { path: 'body.swapCode', message: lacks.join('; ') },
        ]);
      }
      const labour = new Map((await labourUnitsFor(actor.organisationId, t)).map((u) => [u.key, u]));
      after = swappedLine(after, item, labour, reason);
    }
    const direct = (['quantity', 'description', 'unitCost', 'unitLabourHours'] as const).filter((k) => changes[k] !== undefined);
    if (direct.length > 0) {
      if (before.source !== 'manual') {
        throw new ValidationError(
          'The quantity and price of an automatic line follow the design and the catalogue: swap the part, or add a manual line',
          [{ path: `body.${direct[0]}`, message: 'only manual lines are edited directly' }],
        );
      }
      after = { ...after, ...Object.fromEntries(direct.map((k) => [k, changes[k]])) };
    }
    if (changes.swapCode === undefined && direct.length === 0)
      throw new ValidationError('Nothing to change', [{ path: 'body', message: 'give a quantity or a part to swap to' }]);
    after = checkLine(after);
    await repo.updateBomLine(row.id, after, t);
    const diff = Object.fromEntries(
      Object.keys(after)
        .filter((k) => JSON.stringify(after[k as keyof BomLine]) !== JSON.stringify(before[k as keyof BomLine]))
        .map((k) => [k, [before[k as keyof BomLine], after[k as keyof BomLine]]]),
    );
    const summary =
      changes.swapCode !== undefined
        ? `Swapped ${before.code ?? 'an unmatched line'} for ${after.code} in ${before.bucket} of ${panel.name}: ${after.swapReason}`
        : `Changed "${after.description}" in ${panel.name}: ${direct.join(', ')}`;
    await recordPanelActivity(
      actor,
      panel,
      {
        entity: 'bom',
        entityId: panel.id,
        action: changes.swapCode !== undefined ? 'line-swapped' : 'line-changed',
        summary,
        diff,
      },
      t,
    );
    return { ...after, id: row.id, position: row.position };
  });
}

/**
 * Active catalogue items a line may be swapped for: those that meet the line's requirement (the one the
 * matcher used), cheapest first. None for a manual line, or a line whose need the catalogue cannot be searched for.
 */
export async function swapCandidates(actor: CurrentUser, panelId: number, lineId: number) {
  const panel = await requirePanel(actor, panelId);
  const row = await db().transaction((t) => requireLine(panel.id, lineId, t));
  const line = row.line;
  if (line.source === 'manual') return [];
  const requirement = await requirementOf(actor.organisationId, panel, row.id, line);
  if (!requirement) return [];
  const who = lineServes(line.bucket);
  const items = await catalogueFor(actor.organisationId);
  return items
    .filter((i) => i.active && i.code !== line.code && lineShortfalls(i, requirement, who).length === 0)
    .sort((a, b) => a.unitCost - b.unitCost || a.code.localeCompare(b.code))
    .map((i) => ({ code: i.code, description: i.description, unitCost: i.unitCost, leadTimeDays: i.leadTimeDays, ratings: i.ratings }));
}
