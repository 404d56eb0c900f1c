// The engineer's panel checks, computed from the panel's effective selections (overrides applied), its
// bill of materials (stored, or built in memory when none is stored yet: never written here), the
// organisation's catalogue and the job: SCCR worksheet (UL 508A SB4, NEC 409.22), heat load (IEC TR 60890
// simplified), control power transformer (NEC 430.72(C), 450.3(B)), nameplate and feeder (NEC 409.110, 409.21),
// and each motor's lead connection card. Four or five queries whatever the motor count.
import type { CurrentUser } from '../../../shared/schemas/auth';
import type { BomLine, CatalogueItem } from '../../../shared/schemas/catalogue';
import { PANEL_BUCKET } from '../../../shared/schemas/catalogue';
import type { LoadSelection, PanelRollup } from '../../../shared/schemas/selection';
import { CHECK_CAUTIONS, type ControlPowerCheck, type ExcludedComponent, type HeatCheck, type NameplateCheck, type PanelChecks, type SccrCheck } from '../../../shared/schemas/checks';
import { buildBom, indexCatalogue, selectItem } from '../../../shared/calc/bom';
import {
  calculatePanelSccr,
  sccrTypeForCatalogueCategory,
  type SccrBucketInput,
  type SccrComponentInput,
  type SccrInput,
  type SccrResult,
  type SccrWayOut,
} from '../../../shared/calc/sccr';
import { calculateHeat, type EnclosureMounting, type HeatSourceInput } from '../../../shared/calc/heat';
import { sizeControlTransformer } from '../../../shared/calc/control-power';
import { panelNameplate } from '../../../shared/calc/nameplate';
import { catalogueFor, labourUnitsFor } from '../catalogue/repository';
import { activeCombinations } from '../catalogue/combinations';
import { loadsOf } from '../panels/repository';
import { loadView, requirePanel } from '../panels/service';
import { bomOutOfDate, panelEnclosureType } from '../bom/service';
import { storedBomLines } from './repository';
import { motorConnectionCard } from './connection';
import type { Panel } from '../../db/models/panel';
import type { Job } from '../../db/models/job';

/** Control circuit voltage of the panel (the bill of materials' default). */
export const CONTROL_VOLTS = 120;

/** The panel's stored mounting as the heat method's mounting. */
export function heatMounting(mounting: string): EnclosureMounting {
  const map: Record<string, EnclosureMounting> = {
    'free-standing': 'free-standing',
    'wall-mounted': 'wall-mounted',
    'row-end': 'row-end-free-standing',
    'row-middle': 'row-middle-free-standing',
    'wall-row-end': 'row-end-wall-mounted',
    'wall-row-middle': 'row-middle-wall-mounted',
  };
  return map[mounting] ?? 'wall-mounted';
}

const round2 = (x: number) => Math.round(x * 100) / 100;

function component(line: BomLine, type: NonNullable<ReturnType<typeof sccrTypeForCatalogueCategory>>): SccrComponentInput {
  return {
    code: line.code ?? `(unmatched ${line.category})`,
    category: type,
    description: line.description,
    qty: line.quantity,
    cost: line.unitCost,
    ...(line.sccrKa !== null ? { sccrKa: line.sccrKa } : {}),
  };
}

/**
 * The power-circuit components of the bill of materials, by location. Control-circuit parts fed from the
 * transformer's secondary (the buckets' control fuses and holders, the secondary fuse, control and ground
 * terminals) are left out and listed with the reason; the transformer's primary fuses count (product choice,
 * stated on the worksheet).
 */
export function sccrComponents(lines: readonly BomLine[], byCode: ReadonlyMap<string, CatalogueItem>) {
  const feeder: SccrComponentInput[] = [];
  const buckets = new Map<string, SccrComponentInput[]>();
  const excluded: ExcludedComponent[] = [];
  const state = new Map<string, { pilotSeen: boolean; powerTerminal: boolean; cptSeen: boolean; cptFuse: number; cptHolder: number }>();
  for (const line of lines) {
    const where = line.bucket;
    let s = state.get(where);
    if (!s) state.set(where, (s = { pilotSeen: false, powerTerminal: false, cptSeen: false, cptFuse: 0, cptHolder: 0 }));
    if (line.category === 'pilot-device') s.pilotSeen = true;
    if (line.category === 'control-transformer') {
      s.cptSeen = true;
      continue;
    }
    const type = sccrTypeForCatalogueCategory(line.category);
    if (!type) continue;
    const skip = (reason: string) => excluded.push({ location: where === PANEL_BUCKET ? 'feeder' : where, code: line.code, description: line.description, reason });
    if (where === PANEL_BUCKET) {
      if (s.cptSeen && (type === 'fuse' || type === 'fuse-holder')) {
        const n = type === 'fuse' ? s.cptFuse++ : s.cptHolder++;
        if (n > 0) {
          skip('control transformer secondary: control circuit, not in the power-circuit rating');
          continue;
        }
      }
      feeder.push(component(line, type));
      continue;
    }
    if ((type === 'fuse' || type === 'fuse-holder') && s.pilotSeen) {
      skip('control-circuit fuse on the transformer secondary: not in the power-circuit rating');
      continue;
    }
    if (type === 'terminal-block') {
      const item = line.code ? byCode.get(line.code) : undefined;
      if (item?.ratings.kind === 'ground') {
        skip('ground terminal: carries no line current');
        continue;
      }
      if (s.powerTerminal) {
        skip('control-circuit terminals: not in the power-circuit rating');
        continue;
      }
      s.powerTerminal = true;
    }
    let list = buckets.get(where);
    if (!list) buckets.set(where, (list = []));
    list.push(component(line, type));
  }
  return { feeder, buckets, excluded };
}

/** The overload setting in a bucket, as the bill of materials sets the dial (common practice). */
function overloadSetting(s: LoadSelection): number {
  const t = s.starter.type;
  return t === 'wye-delta' ? s.flaAmps / Math.sqrt(3) : t === 'part-winding' ? s.flaAmps / 2 : s.flaAmps;
}

const SAME_RATINGS = ['nemaSize', 'coilVolts', 'poles', 'fuseClass', 'timeDelay', 'kind', 'secondaryVolts'] as const;
const AT_LEAST = ['volts', 'iecAc3Amps', 'iecAc4Amps', 'normalDutyAmps', 'heavyDutyAmps', 'inputAmps', 'va', 'outputs'] as const;
const PROTECTIVE = new Set(['fuse', 'inverse-time-breaker', 'main-breaker', 'motor-circuit-protector']);
const FLAGS = ['builtInOverload', 'internalBypass', 'detectsPhaseLoss', 'detectsPhaseReversal', 'detectsImbalance'] as const;

/** Whether a catalogue part can take the place of another without changing the design (same duty, same protection). */
export function isDropInReplacement(current: CatalogueItem, candidate: CatalogueItem, selection: LoadSelection | undefined): boolean {
  if (candidate.category !== current.category || !candidate.active || candidate.code === current.code) return false;
  const a = current.ratings;
  const b = candidate.ratings;
  for (const k of SAME_RATINGS) if (a[k] !== undefined && a[k] !== b[k]) return false;
  for (const k of AT_LEAST) if (a[k] !== undefined && (b[k] === undefined || (b[k] as number) < (a[k] as number))) return false;
  for (const k of FLAGS) if (a[k] && !b[k]) return false;
  if (a.amps !== undefined) {
    if (b.amps === undefined) return false;
    if (PROTECTIVE.has(current.category) ? b.amps !== a.amps : b.amps < a.amps) return false;
  }
  for (const [v, hp] of Object.entries(a.hpByVolts ?? {})) {
    const other = b.hpByVolts?.[v as keyof typeof b.hpByVolts];
    if (other === undefined || other < (hp ?? 0)) return false;
  }
  if (a.tripClasses && !a.tripClasses.every((c) => b.tripClasses?.includes(c))) return false;
  if (a.settingMinAmps !== undefined && a.settingMaxAmps !== undefined) {
    if (b.settingMinAmps === undefined || b.settingMaxAmps === undefined) return false;
    if (current.category === 'overload-relay' && selection) {
      const set = overloadSetting(selection);
      if (b.settingMinAmps > set || b.settingMaxAmps < set) return false;
    } else if (b.settingMinAmps > a.settingMinAmps || b.settingMaxAmps < a.settingMaxAmps) return false;
  }
  return true;
}

function replaceComponent(input: SccrInput, location: string, code: string, by: SccrComponentInput): SccrInput {
  const swap = (list: SccrComponentInput[]) => list.map((c) => (c.code === code ? { ...by, qty: c.qty } : c));
  if (location === 'feeder') return { ...input, feeder: swap(input.feeder) };
  return { ...input, buckets: input.buckets.map((b) => (b.tag === location ? { ...b, components: swap(b.components) } : b)) };
}

/**
 * Ways out with catalogue prices: a drop-in part with a marked rating at or above the available fault current
 * for each weak component (and all of them together), and a fused main disconnect with current-limiting
 * Class J fuses in place of a main breaker. The weakest-link advice of the SCCR calculation follows.
 */
function waysOut(
  input: SccrInput,
  result: SccrResult,
  lines: readonly BomLine[],
  catalogue: readonly CatalogueItem[],
  selections: ReadonlyMap<string, LoadSelection>,
  supply: { volts: number; phases: number },
  rollup: PanelRollup | null,
): SccrWayOut[] {
  const available = result.availableFaultKa;
  if (result.verdict !== 'below-available' || available === null) return result.waysOut;
  const byCode = new Map(catalogue.map((c) => [c.code, c]));
  const out: SccrWayOut[] = [];
  let all = input;
  let allCost: number | null = 0;
  const allCodes: string[] = [];
  let missing = 0;
  const weak = result.rows.filter((r) => r.belowAvailable);
  const seen = new Set<string>();
  for (const row of weak) {
    const key = `${row.location}|${row.code}`;
    if (seen.has(key)) continue;
    seen.add(key);
    const current = byCode.get(row.code);
    const candidates = current
      ? catalogue.filter((c) => c.sccrKa !== null && c.sccrKa >= available && isDropInReplacement(current, c, selections.get(row.location)))
      : [];
    if (candidates.length === 0) {
      missing++;
      continue;
    }
    const best = candidates.reduce((x, y) => (y.unitCost < x.unitCost || (y.unitCost === x.unitCost && (y.sccrKa ?? 0) > (x.sccrKa ?? 0)) ? y : x));
    const line = lines.find((l) => l.code === row.code && (l.bucket === row.location || (row.location === 'feeder' && l.bucket === PANEL_BUCKET)));
    const qty = row.qty;
    const costDifference = round2((best.unitCost - (line?.unitCost ?? current!.unitCost)) * qty);
    const by: SccrComponentInput = { code: best.code, category: row.category, description: best.description, sccrKa: best.sccrKa!, cost: best.unitCost };
    const after = calculatePanelSccr(replaceComponent(input, row.location, row.code, by));
    out.push({
      kind: 'higher-rated-component',
      description: `${row.location}: replace ${row.code} (${row.ratingKa} kA, ${row.source}) by ${best.code} marked ${best.sccrKa} kA (${best.description})`,
      resultingSccrKa: after.panelSccrKa,
      resolves: after.panelSccrKa !== null && after.panelSccrKa >= available,
      costDifference,
      partCodes: [best.code],
    });
    all = replaceComponent(all, row.location, row.code, by);
    allCost = allCost === null ? null : round2(allCost + costDifference);
    allCodes.push(best.code);
  }
  if (out.length > 1) {
    const after = calculatePanelSccr(all);
    out.push({
      kind: 'replace-all-weak',
      description: `Replace every component below ${available} kA that has a drop-in marked part${missing ? ` (${missing} have none in the catalogue)` : ''}`,
      resultingSccrKa: after.panelSccrKa,
      resolves: after.panelSccrKa !== null && after.panelSccrKa >= available,
      costDifference: allCost,
      partCodes: allCodes,
    });
  }

  // A fused main with Class J (current-limiting) fuses instead of a main breaker
  const mainLine = lines.find((l) => l.bucket === PANEL_BUCKET && l.category === 'main-breaker' && l.code);
  if (mainLine && rollup && rollup.feeder.ocpdMaxAmps > 0) {
    const index = indexCatalogue(catalogue);
    const poles = supply.phases === 1 ? 2 : 3;
    const fuse = selectItem(index, { category: 'fuse', maxAmps: rollup.feeder.ocpdMaxAmps, fuseClass: 'J', timeDelay: true, volts: supply.volts, prefer: 'largest' });
    const sw = fuse ? selectItem(index, { category: 'main-disconnect', minAmps: fuse.ratings.amps, fuseClass: 'J', poles, volts: supply.volts }) : null;
    if (fuse && sw) {
      const feeder = input.feeder.flatMap((c): SccrComponentInput[] =>
        c.code === mainLine.code
          ? [
              { code: sw.code, category: 'disconnect-switch', description: sw.description, qty: 1, cost: sw.unitCost, ...(sw.sccrKa !== null ? { sccrKa: sw.sccrKa } : {}) },
              { code: fuse.code, category: 'fuse', description: fuse.description, qty: poles, cost: fuse.unitCost, ...(fuse.sccrKa !== null ? { sccrKa: fuse.sccrKa } : {}) },
            ]
          : [c],
      );
      const after = calculatePanelSccr({ ...input, feeder });
      out.push({
        kind: 'current-limiting-feeder',
        description:
          `Replace main breaker ${mainLine.code} by fused main disconnect ${sw.code} with ${poles} × Class J fuses ${fuse.code}. ` +
          `Branch ratings rise only where the fuse maker's published peak let-through at ${available} kA is at or below them (UL 508A SB4.3); ` +
          'the catalogue holds no let-through data, so the resulting rating shown is without that raise.',
        resultingSccrKa: after.panelSccrKa,
        resolves: after.panelSccrKa !== null && after.panelSccrKa >= available,
        costDifference: round2(sw.unitCost + poles * fuse.unitCost - mainLine.unitCost * mainLine.quantity),
        partCodes: [sw.code, fuse.code],
      });
    }
  }
  // the calculation was given no alternatives, so its own ways out are the general advice
  return [...out, ...result.waysOut];
}

function heatCheck(lines: readonly BomLine[], byCode: ReadonlyMap<string, CatalogueItem>, selections: ReadonlyMap<string, LoadSelection>, mounting: string, ambientC: number): HeatCheck {
  const m = heatMounting(mounting);
  const encLine = lines.find((l) => l.category === 'enclosure' && l.code);
  const enc = encLine?.code ? byCode.get(encLine.code) : undefined;
  const r = enc?.ratings;
  if (!encLine || !r?.heightMm || !r.widthMm || !r.depthMm) {
    return { result: null, enclosure: null, reason: 'No enclosure with dimensions in the bill of materials: the heat load needs the enclosure’s height, width and depth.' };
  }
  const sections = Math.max(1, Math.round(encLine.quantity));
  const sources: HeatSourceInput[] = [];
  for (const l of lines) {
    const atLoad = l.category === 'vfd' || l.category === 'soft-starter' || l.category === 'dc-drive';
    if (!(l.heatLossW > 0) && !atLoad) continue;
    const bucketTag = l.bucket === PANEL_BUCKET ? null : l.bucket;
    const sel = bucketTag ? selections.get(bucketTag) : undefined;
    const item = l.code ? byCode.get(l.code) : undefined;
    const ratedAmps = item ? (item.ratings.normalDutyAmps ?? item.ratings.amps) : undefined;
    sources.push({
      bucketTag,
      code: l.code ?? `(unmatched ${l.category})`,
      description: l.description,
      category: l.category,
      qty: l.quantity,
      ...(l.status === 'unmatched' ? {} : { heatLossW: l.heatLossW }),
      ...(atLoad && sel ? { loadAmps: sel.flaAmps, ...(ratedAmps ? { ratedAmps } : {}), bypassed: sel.softStarter?.bypass ?? false } : {}),
    });
  }
  const enclosure = { code: encLine.code, description: encLine.description, heightMm: r.heightMm, widthMm: r.widthMm * sections, depthMm: r.depthMm, sections, mounting: m };
  const result = calculateHeat({
    enclosure: { heightM: r.heightMm / 1000, widthM: (r.widthMm * sections) / 1000, depthM: r.depthMm / 1000, mounting: m },
    sources,
    ambientC,
  });
  if (sections > 1) result.notes.push(`${sections} enclosure sections taken as one lineup ${sections} × ${r.widthMm} mm wide.`);
  return { result, enclosure, reason: null };
}

/** Sealed VA and the largest coil inrush of the control loads in the lines, as the bill of materials counts them. */
export function controlLoads(lines: readonly BomLine[], byCode: ReadonlyMap<string, CatalogueItem>) {
  let sealedVa = 0;
  let largestInrushVa = 0;
  let coils = 0;
  let lights = 0;
  let relays = 0;
  for (const l of lines) {
    const item = l.code ? byCode.get(l.code) : undefined;
    if (!item) continue;
    if (l.category === 'contactor') {
      const va = l.quantity * (item.ratings.sealedVa ?? 0);
      sealedVa += va;
      coils += va;
      largestInrushVa = Math.max(largestInrushVa, item.ratings.inrushVa ?? 0);
    } else if (l.category === 'pilot-device' && item.ratings.va) {
      sealedVa += l.quantity * item.ratings.va;
      lights += l.quantity * item.ratings.va;
    } else if (l.category === 'phase-monitor-relay' && item.ratings.va) {
      sealedVa += l.quantity * item.ratings.va;
      relays += l.quantity * item.ratings.va;
    }
  }
  return { sealedVa: round2(sealedVa), largestInrushVa, coilsVa: round2(coils), lightsVa: round2(lights), relaysVa: round2(relays) };
}

function controlPowerCheck(lines: readonly BomLine[], byCode: ReadonlyMap<string, CatalogueItem>, primaryVolts: number): ControlPowerCheck {
  const c = controlLoads(lines, byCode);
  const basis = 'Sealed VA of contactor coils, pilot lights and relays from the catalogue; inrush of the largest coil (one coil pulls in at a time, common practice).';
  const cptLine = lines.find((l) => l.category === 'control-transformer');
  const cptItem = cptLine?.code ? byCode.get(cptLine.code) : undefined;
  try {
    const result = sizeControlTransformer({
      loads: [
        { description: 'contactor coils (sealed)', kind: 'coil', sealedVa: c.coilsVa },
        { description: 'pilot lights', kind: 'pilot-light', sealedVa: c.lightsVa },
        { description: 'protective relays', kind: 'relay', sealedVa: c.relaysVa },
        { description: 'largest coil pulling in', kind: 'coil', sealedVa: 0, inrushVa: c.largestInrushVa },
      ],
      primaryVolts,
      secondaryVolts: CONTROL_VOLTS,
    });
    const fitted = cptLine
      ? { code: cptLine.code, description: cptLine.description, va: cptItem?.ratings.va ?? null, adequate: cptItem?.ratings.va ? cptItem.ratings.va >= result.sizeVa : null }
      : null;
    return { result, fitted, basis, reason: c.sealedVa === 0 ? 'No control loads in the bill of materials.' : null };
  } catch (e) {
    return { result: null, fitted: null, basis, reason: (e as Error).message };
  }
}

function nameplateCheck(rollup: PanelRollup | null, job: Job, sccrKa: number | null, enclosureType: string): NameplateCheck {
  if (!rollup) return { result: null, reason: 'The panel has no roll-up yet: add a motor so the selection engine can total the full-load current and size the feeder.' };
  try {
    return {
      result: panelNameplate({
        rollup,
        supply: { volts: job.supplyVolts, phases: job.supplyPhases === 1 ? 1 : 3, hz: job.supplyHz === 50 ? 50 : 60 },
        sccrKa,
        enclosureType,
      }),
      reason: null,
    };
  } catch (e) {
    return { result: null, reason: (e as Error).message };
  }
}

export interface ChecksContext {
  checks: PanelChecks;
  /** the effective selections without errors (what the checks used) */
  selections: LoadSelection[];
  rollup: PanelRollup | null;
  panel: Panel & { job: Job };
}

/** The SCCR worksheet's input from a bill of materials, the catalogue, the selections and the tested combinations. */
function sccrInputFor(
  lines: readonly BomLine[],
  byCode: ReadonlyMap<string, CatalogueItem>,
  selections: readonly LoadSelection[],
  combinations: SccrInput['combinations'],
  availableFaultKa: number | null,
) {
  const bySel = new Map(selections.map((s) => [s.tag, s]));
  const parts = sccrComponents(lines, byCode);
  const buckets: SccrBucketInput[] = [...parts.buckets.entries()].map(([tag, components]) => ({ tag, hp: bySel.get(tag)?.hp ?? null, volts: bySel.get(tag)?.volts, components }));
  const feederHp = selections.reduce((s, x) => s + (x.hp ?? 0), 0);
  const input: SccrInput = { feeder: parts.feeder, feederHp: feederHp > 0 ? feederHp : null, buckets, combinations, availableFaultKa };
  return { input, parts };
}

/** The panel's SCCR from a given bill of materials (the one a sign-off has just regenerated). */
export async function panelSccrFor(organisationId: number, lines: readonly BomLine[], selections: readonly LoadSelection[], availableFaultKa: number | null): Promise<SccrResult> {
  const [catalogue, combinations] = await Promise.all([catalogueFor(organisationId), activeCombinations(organisationId)]);
  const byCode = new Map(catalogue.map((c) => [c.code, c]));
  return calculatePanelSccr(sccrInputFor(lines, byCode, selections, combinations, availableFaultKa).input);
}

export async function computeChecks(actor: CurrentUser, panelId: number): Promise<ChecksContext> {
  const panel = await requirePanel(actor, panelId);
  const job = panel.job;
  const [loads, stored, catalogue, combinations] = await Promise.all([
    loadsOf(panel.id),
    storedBomLines(actor.organisationId, panel.id),
    catalogueFor(actor.organisationId),
    activeCombinations(actor.organisationId),
  ]);
  const views = loads.map(loadView);
  const all = views.flatMap((l) => (l.effective ? [l.effective] : []));
  const selections = all.filter((s) => s.errors.length === 0);
  const motorsWithErrors = views.filter((l) => !l.effective || l.effective.errors.length > 0).map((l) => l.tag);
  const rollup = (panel.rollup ?? null) as PanelRollup | null;
  const enclosureType = panelEnclosureType(all);

  let lines: BomLine[] = stored;
  let source: 'stored' | 'in-memory' = 'stored';
  if (stored.length === 0) {
    source = 'in-memory';
    const labourUnits = await labourUnitsFor(actor.organisationId);
    lines = buildBom({
      panelName: panel.name,
      selections,
      panel: rollup ?? { feeder: { minAmpacity: 0, conductorSize: 'none', ocpdMaxAmps: 0, basis: '' }, totalFlcAmps: 0, largestMotorTag: null },
      supply: { volts: job.supplyVolts, phases: job.supplyPhases, hz: job.supplyHz },
      enclosureType,
      catalogue,
      labourUnits,
    }).lines;
  }
  const byCode = new Map(catalogue.map((c) => [c.code, c]));
  const bySel = new Map(selections.map((s) => [s.tag, s]));

  // SCCR worksheet
  const { input, parts } = sccrInputFor(lines, byCode, selections, combinations, job.availableFaultKa ?? null);
  const base = calculatePanelSccr(input);
  const sccr: SccrCheck = {
    ...base,
    waysOut: waysOut(input, base, lines, catalogue, bySel, { volts: job.supplyVolts, phases: job.supplyPhases }, rollup),
    excluded: parts.excluded,
  };

  // stale when a rebuild now would give other parts or quantities (as the Bill of materials section says)
  const stale = source === 'stored' && (await bomOutOfDate(actor.organisationId, panel, lines));
  const checks: PanelChecks = {
    panel: { id: panel.id, name: panel.name, mounting: panel.mounting, enclosureType, revision: revisionText(panel) },
    job: {
      id: job.id,
      number: job.number,
      name: job.name,
      customer: job.customer,
      site: job.site,
      supplyVolts: job.supplyVolts,
      supplyPhases: job.supplyPhases,
      supplyHz: job.supplyHz,
      availableFaultKa: job.availableFaultKa,
      ambientC: job.ambientC,
      codeEdition: job.codeEdition,
    },
    bom: {
      source,
      stale,
      unmatchedLines: lines.filter((l) => l.status === 'unmatched').length,
      note:
        source === 'in-memory'
          ? 'No bill of materials is stored yet: the checks use one built from the catalogue for this view (not saved).'
          : stale
            ? 'The motors, their overrides or the catalogue changed since the stored bill of materials was built: rebuild it for current checks.'
            : null,
    },
    motorsWithErrors,
    sccr,
    heat: heatCheck(lines, byCode, bySel, panel.mounting, job.ambientC),
    controlPower: controlPowerCheck(lines, byCode, job.supplyVolts),
    nameplate: nameplateCheck(rollup, job, sccr.panelSccrKa, enclosureType),
    connectionCards: views.map((l) => motorConnectionCard(l.id, l.answers, l.effective)),
    cautions: CHECK_CAUTIONS,
  };
  return { checks, selections, rollup, panel };
}

function revisionText(p: Panel): string {
  if (p.revisionNumber === null) return 'Draft (no signed-off revision)';
  return p.status === 'signed_off' ? `R${p.revisionNumber}` : `Draft after R${p.revisionNumber}`;
}

export async function panelChecks(actor: CurrentUser, panelId: number): Promise<PanelChecks> {
  return (await computeChecks(actor, panelId)).checks;
}

