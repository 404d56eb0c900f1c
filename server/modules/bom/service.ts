// A panel's bill of materials in the database: built from the effective selections (overrides
// applied) and the organisation's catalogue, keeping the estimator's manual lines and swaps.
import type { Transaction } from 'sequelize';
import { db } from '../../db/sequelize';
import type { Panel } from '../../db/models/panel';
import * as repo from './repository';
import type { Job } from '../../db/models/job';
import type { CurrentUser } from '../../../shared/schemas/auth';
import type { BomLine } from '../../../shared/schemas/catalogue';
import type { LoadSelection, PanelRollup } from '../../../shared/schemas/selection';
import { buildBom, lineServes, lineShortfalls, swappedLine } from '../../../shared/calc/bom';
import { recordPanelActivity } from '../activity/service';
import { catalogueFor, labourUnitsFor } from '../catalogue/repository';
import { loadsOf } from '../panels/repository';
import { loadView, openBomChange, requirePanel } from '../panels/service';

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

export async function effectiveSelections(panelId: number, t?: Transaction): Promise<LoadSelection[]> {
  const loads = await loadsOf(panelId, t);
  return loads.map(loadView).flatMap((l) => (l.effective ? [l.effective] : []));
}

export interface RegenerateOptions {
  /** take today's catalogue prices for every line (otherwise a line that stays keeps the unit cost it was priced at) */
  reprice?: boolean;
  /** told of each swap a rebuild drops because its part no longer meets the line's requirement (or left the catalogue) */
  onDroppedSwap?: (swap: BomLine, why: string) => void;
}

/** Key of a line for "the same line after a rebuild": bucket, category and its order among them. */
export function ordinalKeys(lines: readonly BomLine[]): string[] {
  const seen = new Map<string, number>();
  return lines.map((l) => {
    const k = `${l.bucket}\u0000${l.category}`;
    const n = seen.get(k) ?? 0;
    seen.set(k, n + 1);
    return `${k}\u0000${n}`;
  });
}

/**
 * The lines a rebuild would store, without writing: automatic lines from the selections, swaps re-applied
 * to the same line (bucket, category and order), manual lines kept; a line whose part stays keeps its frozen unit cost.
 */
/** The automatic lines the matcher picks today, with the catalogue and labour units it used (nothing written). */
export async function buildLines(organisationId: number, panel: Panel & { job: Job }, t?: Transaction) {
  // one after the other: the three share the transaction's single connection
  const selections = await effectiveSelections(panel.id, t);
  const catalogue = await catalogueFor(organisationId, t);
  const labourUnits = await labourUnitsFor(organisationId, t);
  const rollup =
    panel.rollup ??
    ({
      feeder: { minAmpacity: 0, conductorSize: 'none', ocpdMaxAmps: 0, basis: '' },
      totalFlcAmps: 0,
      largestMotorTag: null,
    } satisfies PanelRollup);
  const built = buildBom({
    panelName: panel.name,
    selections: selections.filter((s) => s.errors.length === 0),
    panel: rollup,
    supply: { volts: panel.job.supplyVolts, phases: panel.job.supplyPhases, hz: panel.job.supplyHz },
    enclosureType: panelEnclosureType(selections),
    catalogue,
    labourUnits,
  });
  return { built, catalogue, labourUnits };
}

export async function planBom(
  organisationId: number,
  panel: Panel & { job: Job },
  old: readonly BomLine[],
  t?: Transaction,
  opts: RegenerateOptions = {},
): Promise<BomLine[]> {
  const { built, catalogue, labourUnits } = await buildLines(organisationId, panel, t);
  const byCode = new Map(catalogue.map((c) => [c.code, c]));
  const labour = new Map(labourUnits.map((u) => [u.key, u]));
  const autoOld = old.filter((l) => l.source !== 'manual');
  const oldKeys = ordinalKeys(autoOld);
  const swaps = new Map<string, BomLine>();
  const frozen = new Map<string, number>();
  autoOld.forEach((l, i) => {
    if (l.source === 'swapped') swaps.set(oldKeys[i]!, l);
    if (l.code) frozen.set(`${l.bucket}\u0000${l.category}\u0000${l.code}`, l.unitCost);
  });
  const builtKeys = ordinalKeys(built.lines);
  const lines: BomLine[] = built.lines.map((l, i) => {
    const swap = swaps.get(builtKeys[i]!);
    const item = swap?.code ? byCode.get(swap.code) : undefined;
    let line: BomLine = l;
    if (swap) {
      // a swap stays only while its part is active and still meets what the line needs now
      const why = !item
        ? `${swap.code} is no longer in the catalogue`
        : !item.active
          ? `${item.code} is deactivated`
          : l.requirement
            ? lineShortfalls(item, l.requirement, lineServes(l.bucket)).join('; ')
            : `the line now needs ${l.requiredRatings ?? 'a part the catalogue cannot be searched for'}`;
      if (item?.active && l.requirement && !why) line = swappedLine(l, item, labour, swap.swapReason);
      else opts.onDroppedSwap?.(swap, why);
    }
    const kept = !opts.reprice && line.code ? frozen.get(`${line.bucket}\u0000${line.category}\u0000${line.code}`) : undefined;
    return kept !== undefined ? { ...line, unitCost: kept } : line;
  });
  lines.push(...old.filter((l) => l.source === 'manual'));
  return lines;
}

/** Rebuilds the automatic lines; manual lines stay, a swap stays on its line, and prices stay frozen unless `reprice`. */
export async function regenerateBom(organisationId: number, panel: Panel & { job: Job }, t: Transaction, opts: RegenerateOptions = {}) {
  const oldRows = await repo.bomRowsOf(panel.id, t);
  const lines = await planBom(
    organisationId,
    panel,
    oldRows.map((r) => r.line),
    t,
    opts,
  );
  await repo.replaceBomLines(organisationId, panel.id, lines, t);
  return lines;
}

/** What decides a stored bill of materials: its automatic lines' parts and quantities (prices excluded: they stay frozen). */
export function designSignature(lines: readonly BomLine[]): string {
  return JSON.stringify(
    lines.filter((l) => l.source !== 'manual').map((l) => [l.bucket, l.category, l.code, l.quantity, l.status, l.requiredRatings]),
  );
}

/** The one bill of materials of a panel for the checks and the submittal (nothing written). */
export interface CurrentBom {
  lines: BomLine[];
  /** the stored lines, or with none stored the lines a rebuild would store, built in memory */
  source: 'stored' | 'in-memory';
  /** stored lines that a rebuild now would change (other parts or quantities) */
  stale: boolean;
}

/** The stored lines and whether they are still current; with none stored, the lines a rebuild would store (the same plan). */
export async function currentBom(organisationId: number, panel: Panel & { job: Job }): Promise<CurrentBom> {
  const rows = await repo.bomRowsFor(organisationId, panel.id);
  const stored = rows.map((r) => r.line);
  if (stored.length === 0) return { lines: await planBom(organisationId, panel, []), source: 'in-memory', stale: false };
  return { lines: stored, source: 'stored', stale: await bomOutOfDate(organisationId, panel, stored) };
}

/** Whether the stored lines differ from what a rebuild would store now (motors, overrides or the catalogue changed). */
export async function bomOutOfDate(organisationId: number, panel: Panel & { job: Job }, lines: readonly BomLine[]): Promise<boolean> {
  if (!panel.bomGeneratedAt) return true;
  return designSignature(await planBom(organisationId, panel, lines)) !== designSignature(lines);
}

/**
 * Rebuilds the automatic lines. One that changes parts or quantities is a change to the design: refused
 * while the panel is in review, and on a signed-off panel it opens a new draft. A re-price alone changes
 * neither (prices are the estimator's, not the sign-off's).
 */
export async function rebuild(actor: CurrentUser, panelRef: Panel & { job: Job }, opts: RegenerateOptions = {}) {
  await db().transaction(async (t) => {
    const panel = await lockedPanel(actor, panelRef.id, t);
    const before = (await repo.bomRowsOf(panel.id, t)).map((r) => r.line);
    const dropped: string[] = [];
    const lines = await regenerateBom(actor.organisationId, panel, t, {
      ...opts,
      onDroppedSwap: (s, why) => dropped.push(`${s.code ?? 'a part'} on ${s.bucket} (${why})`),
    });
    if (designSignature(before) !== designSignature(lines))
      await openBomChange(actor, panel, t, 'the bill of materials was rebuilt with other parts');
    await recordPanelActivity(
      actor,
      panel,
      {
        entity: 'bom',
        entityId: panel.id,
        action: 'rebuilt',
        summary: `Rebuilt the bill of materials of ${panel.name}${opts.reprice ? " at today's catalogue prices" : ''}${dropped.length ? `; dropped the swap${dropped.length === 1 ? '' : 's'} that no longer fit: ${dropped.join('; ')}` : ''}`,
      },
      t,
    );
  });
}

export async function lockedPanel(actor: CurrentUser, panelId: number, t: Transaction) {
  return requirePanel(actor, panelId, t, true);
}
