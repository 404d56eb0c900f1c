// The stored lines of a panel's bill of materials, and the estimator's manual lines (kept through every rebuild).
import type { Transaction } from 'sequelize';
import { db } from '../../db/sequelize';
import type { Panel } from '../../db/models/panel';
import type { Job } from '../../db/models/job';
import * as repo from './repository';
import type { CurrentUser } from '../../../shared/schemas/auth';
import { BomLineSchema, PANEL_BUCKET, type BomLine, type BomTotals, type CatalogueItem } from '../../../shared/schemas/catalogue';
import { NotFoundError, ValidationError, zodIssues } from '../../../shared/errors';
import { computeTotals, unitLabourHours } from '../../../shared/calc/bom';
import { recordPanelActivity } from '../activity/service';
import { catalogueFor, labourUnitsFor } from '../catalogue/repository';
import { openBomChange } from '../panels/service';
import { designSignature, effectiveSelections, lockedPanel, panelEnclosureType, planBom } from './service';

export interface StoredBom {
  lines: Array<BomLine & { id: number; position: number }>;
  totals: BomTotals;
  generatedAt: string | null;
  stale: boolean;
  enclosureType: string;
}

export async function storedBom(actor: CurrentUser, panel: Panel & { job: Job }): Promise<StoredBom> {
  const rows = await repo.bomRowsFor(actor.organisationId, panel.id);
  const lines = rows.map((r) => ({ ...r.line, id: r.id, position: r.position }));
  // Stale when a rebuild now would give other parts or quantities (motors, overrides or the catalogue changed).
  const plan = panel.bomGeneratedAt ? await planBom(actor.organisationId, panel, lines) : null;
  return {
    lines,
    totals: computeTotals(lines, panel.markupPercent, panel.labourRate),
    generatedAt: panel.bomGeneratedAt ? panel.bomGeneratedAt.toISOString() : null,
    stale: !plan || designSignature(plan) !== designSignature(lines),
    enclosureType: panelEnclosureType(await effectiveSelections(panel.id)),
  };
}

/** The one bill of materials of a panel for the checks and the submittal (nothing written). */
// ---------------------------------------------------------------------------------------------
// The estimator's changes to single lines

export interface ManualLineInput {
  bucket?: string;
  category: BomLine['category'];
  code?: string | null;
  description?: string;
  quantity: number;
  unit?: BomLine['unit'];
  unitCost?: number;
  unitLabourHours?: number;
}

export async function requireLine(panelId: number, lineId: number, t: Transaction) {
  const r = await repo.findBomLine(panelId, lineId, t);
  if (!r) throw new NotFoundError('Bill-of-materials line');
  return r;
}

export function checkLine(line: BomLine): BomLine {
  const r = BomLineSchema.safeParse(line);
  if (!r.success) {
    const issues = zodIssues(r.error.issues).map((i) => ({ ...i, path: `body.${i.path}` }));
    throw new ValidationError(
      `The line has ${issues.length} problem${issues.length === 1 ? '' : 's'}: ${issues.map((i) => `${i.path} ${i.message}`).join('; ')}`,
      issues,
    );
  }
  return r.data;
}

/** Freight, engineering hours, spares …: a line kept through every rebuild; with a code, the part's price and labour are the defaults. */
export async function addManualLine(actor: CurrentUser, panelId: number, input: ManualLineInput) {
  return db().transaction(async (t) => {
    const panel = await lockedPanel(actor, panelId, t);
    await openBomChange(actor, panel, t, 'a manual line was added to the bill of materials');
    let item: CatalogueItem | undefined;
    if (input.code) {
      item = (await catalogueFor(actor.organisationId, t)).find((c) => c.code === input.code);
      if (!item)
        throw new ValidationError(`There is no catalogue item ${input.code}`, [{ path: 'body.code', message: 'not in the catalogue' }]);
    }
    const labour = new Map((await labourUnitsFor(actor.organisationId, t)).map((u) => [u.key, u]));
    const description = input.description?.trim() || item?.description;
    if (!description)
      throw new ValidationError('Describe the line', [{ path: 'body.description', message: 'required without a part code' }]);
    const line = checkLine({
      bucket: input.bucket?.trim() || PANEL_BUCKET,
      category: input.category,
      code: item?.code ?? null,
      description,
      quantity: input.quantity,
      unit: input.unit ?? item?.unit ?? 'ea',
      unitCost: input.unitCost ?? item?.unitCost ?? 0,
      unitLabourHours: input.unitLabourHours ?? (item ? unitLabourHours(item.category, item, labour) : 0),
      heatLossW: item?.heatLossW ?? 0,
      sccrKa: item?.sccrKa ?? null,
      status: 'manual',
      requiredRatings: null,
      source: 'manual',
      swapReason: null,
      requirement: null,
    });
    const row = await repo.appendBomLine(actor.organisationId, panel.id, line, t);
    await recordPanelActivity(
      actor,
      panel,
      {
        entity: 'bom',
        entityId: panel.id,
        action: 'line-added',
        summary: `Added ${line.quantity} ${line.unit} "${line.description}" to ${panel.name}`,
        diff: { line },
      },
      t,
    );
    return { ...line, id: row.id, position: row.position };
  });
}

export async function deleteLine(actor: CurrentUser, panelId: number, lineId: number) {
  await db().transaction(async (t) => {
    const panel = await lockedPanel(actor, panelId, t);
    const row = await requireLine(panel.id, lineId, t);
    const line = row.line;
    if (line.source !== 'manual')
      throw new ValidationError('Only manual lines are removed; the rebuild decides the automatic ones', [
        { path: 'lineId', message: 'not a manual line' },
      ]);
    await openBomChange(actor, panel, t, 'a manual line was removed from the bill of materials');
    await repo.deleteBomLine(row.id, t);
    await recordPanelActivity(
      actor,
      panel,
      {
        entity: 'bom',
        entityId: panel.id,
        action: 'line-removed',
        summary: `Removed "${line.description}" from ${panel.name}`,
        diff: { line },
      },
      t,
    );
  });
}
