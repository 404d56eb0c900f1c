// A panel's bill of materials in the database: built from the effective selections (overrides
// applied) and the organisation's catalogue, keeping the estimator's manual lines and swaps.
import type { Transaction } from 'sequelize';
import { db } from '../../db/sequelize';
import { BomLineRow } from '../../db/models/bom-line';
import { Panel } from '../../db/models/panel';
import type { Job } from '../../db/models/job';
import type { CurrentUser } from '../../../shared/schemas/auth';
import type { BomLine, BomTotals } from '../../../shared/schemas/catalogue';
import type { LoadSelection, PanelRollup } from '../../../shared/schemas/selection';
import { buildBom, computeTotals } from '../../../shared/calc/bom';
import { catalogueFor, labourUnitsFor } from '../catalogue/repository';
import { loadsOf } from '../panels/repository';
import { loadView } from '../panels/service';

/** Most protective enclosure type among the buckets (common practice: one enclosure serves the worst environment). */
const STRINGENCY = ['1', '12', '3R', '4', '4X', '9', '7'];
export function panelEnclosureType(selections: readonly LoadSelection[]): string {
  let best = '12';
  let seen = false;
  for (const s of selections) {
    const t = s.enclosure?.nemaType;
    if (!t) continue;
    if (!seen || STRINGENCY.indexOf(t) > STRINGENCY.indexOf(best)) best = t;
    seen = true;
  }
  return best;
}

export interface StoredBom {
  lines: Array<BomLine & { id: number; position: number }>;
  totals: BomTotals;
  generatedAt: string | null;
  stale: boolean;
  enclosureType: string;
}

export async function effectiveSelections(panelId: number, t?: Transaction): Promise<LoadSelection[]> {
  const loads = await loadsOf(panelId, t);
  return loads.map(loadView).flatMap((l) => (l.effective ? [l.effective] : []));
}

/** Rebuilds the automatic lines; manual lines stay, and a swap stays where its bucket and category still exist. */
export async function regenerateBom(organisationId: number, panel: Panel & { job: Job }, t: Transaction) {
  const [selections, catalogue, labourUnits, oldRows] = await Promise.all([
    effectiveSelections(panel.id, t),
    catalogueFor(organisationId, t),
    labourUnitsFor(organisationId, t),
    BomLineRow.findAll({ where: { panelId: panel.id }, order: [['position', 'ASC']], transaction: t }),
  ]);
  const old = oldRows.map((r) => r.line as unknown as BomLine);
  const rollup = (panel.rollup ?? { feeder: { minAmpacity: 0, conductorSize: 'none', ocpdMaxAmps: 0, basis: '' }, totalFlcAmps: 0, largestMotorTag: null }) as unknown as PanelRollup;
  const built = buildBom({
    panelName: panel.name,
    selections: selections.filter((s) => s.errors.length === 0),
    panel: rollup,
    supply: { volts: panel.job.supplyVolts, phases: panel.job.supplyPhases, hz: panel.job.supplyHz },
    enclosureType: panelEnclosureType(selections),
    catalogue,
    labourUnits,
  });
  const byCode = new Map(catalogue.map((c) => [c.code, c]));
  const swaps = old.filter((l) => l.source === 'swapped');
  const lines: BomLine[] = built.lines.map((l) => {
    const swap = swaps.find((s) => s.bucket === l.bucket && s.category === l.category);
    if (!swap) return l;
    const item = swap.code ? byCode.get(swap.code) : undefined;
    return item ? { ...l, code: item.code, description: item.description, unitCost: item.unitCost, status: 'matched', requiredRatings: null, source: 'swapped', swapReason: swap.swapReason } : l;
  });
  lines.push(...old.filter((l) => l.source === 'manual'));
  await BomLineRow.destroy({ where: { panelId: panel.id }, transaction: t });
  await BomLineRow.bulkCreate(
    lines.map((line, position) => ({ organisationId, panelId: panel.id, position, line: line as unknown as Record<string, unknown> })),
    { transaction: t },
  );
  await Panel.update({ bomGeneratedAt: new Date() }, { where: { id: panel.id }, transaction: t });
  return lines;
}

export async function storedBom(actor: CurrentUser, panel: Panel): Promise<StoredBom> {
  const rows = await BomLineRow.findAll({ where: { organisationId: actor.organisationId, panelId: panel.id }, order: [['position', 'ASC'], ['id', 'ASC']] });
  const lines = rows.map((r) => ({ ...(r.line as unknown as BomLine), id: r.id, position: r.position }));
  return {
    lines,
    totals: computeTotals(lines, panel.markupPercent, panel.labourRate),
    generatedAt: panel.bomGeneratedAt ? panel.bomGeneratedAt.toISOString() : null,
    stale: !panel.bomGeneratedAt || panel.bomGeneratedAt < panel.updatedAt,
    enclosureType: panelEnclosureType(await effectiveSelections(panel.id)),
  };
}

export async function rebuild(actor: CurrentUser, panel: Panel & { job: Job }) {
  await db().transaction((t) => regenerateBom(actor.organisationId, panel, t));
}
