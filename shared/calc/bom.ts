// Bill of materials: from a panel's selections to priced catalogue lines.
// Rule: for every need, the smallest adequate ACTIVE catalogue item meeting every required rating;
// where nothing fits, an unmatched line stating the ratings it needs — never a guess.
// Pure TypeScript: no Node or DOM imports.
import type { LoadSelection, PanelRollup, StarterType } from '../schemas/selection';
import { relayOf } from './overload';
import { sourceBucket } from './other-sources';
import {
  CATEGORIES,
  CATEGORY_LABELS,
  HP_VOLTS,
  MANUAL_CATEGORIES,
  PANEL_BUCKET,
  WIRE_SIZES,
  type BomCategory,
  type BomLine,
  type BomTotals,
  type CatalogueItem,
  type Category,
  type LabourKey,
  type LabourUnit,
  type Requirement,
} from '../schemas/catalogue';
import { round2 } from './round';

type WireSize = (typeof WIRE_SIZES)[number];
type HpVolts = (typeof HP_VOLTS)[number];

// ---------------------------------------------------------------------------------------------
// Requirements and matching

/** What a catalogue item must meet (RequirementSchema in shared/schemas/catalogue.ts). Every field given is a hard constraint. */
export type { Requirement };

const wireIndex = (s: string): number => WIRE_SIZES.indexOf(s as WireSize);

/** Usable back-panel area of an enclosure: (H − 150 mm) × (W − 100 mm) for flanges and door stiffeners (common practice). */
export function usableAreaMm2(item: CatalogueItem): number {
  const h = item.ratings.heightMm ?? 0;
  const w = item.ratings.widthMm ?? 0;
  return Math.max(0, h - 150) * Math.max(0, w - 100);
}

const EPS = 1e-9;

const needsOf = (who: string, what: string): string => `the ${what} ${who} needs`;

/**
 * Checks an item against a requirement: true when it meets every constraint. With a sink, every shortfall
 * is written into it in plain words ("9 A, below the 34 A motor P-101 needs"); without one it stops at the
 * first (the matcher's fast path). The one check behind the matcher, the swap list and a swap's validation.
 */
function check(item: CatalogueItem, req: Requirement, who: string, sink: string[] | null): boolean {
  const r = item.ratings;
  // another category: nothing else is worth comparing
  if (item.category !== req.category) {
    sink?.push(`it is in ${CATEGORY_LABELS[item.category]}, not ${CATEGORY_LABELS[req.category]}`);
    return false;
  }
  if (req.volts !== undefined) {
    if (r.volts === undefined || r.volts + EPS < req.volts) {
      if (!sink) return false;
      sink.push((r.volts === undefined ? `no rated voltage, where ${who} runs at ${fmt(req.volts!)} V` : `rated ${fmt(r.volts)} V, below ${needsOf(who, `${fmt(req.volts!)} V`)}`));
    } else if (r.voltsMin !== undefined && r.voltsMin > req.volts + EPS) { if (!sink) return false; sink.push(`rated from ${fmt(r.voltsMin!)} V, above ${needsOf(who, `${fmt(req.volts!)} V`)}`); }
  }
  if (req.exactVolts !== undefined && r.volts !== req.exactVolts) { if (!sink) return false; sink.push(`operates at ${r.volts === undefined ? 'no stated voltage' : `${fmt(r.volts)} V`}, not ${needsOf(who, `${fmt(req.exactVolts!)} V`)}`); }
  if (req.coilVolts !== undefined && r.coilVolts !== req.coilVolts) { if (!sink) return false; sink.push(`${r.coilVolts === undefined ? 'no stated' : `${fmt(r.coilVolts)} V`} coil, not ${needsOf(who, `${fmt(req.coilVolts!)} V control voltage`)}`); }
  if (req.nemaSize !== undefined && r.nemaSize !== req.nemaSize) {
    if (!sink) return false;
    sink.push(`${r.nemaSize === undefined ? 'no NEMA size' : `NEMA size ${r.nemaSize}`}${r.amps !== undefined ? ` (${fmt(r.amps)} A)` : ''}, not ${needsOf(who, `NEMA size ${req.nemaSize}`)}`);
  }
  if (req.minAmps !== undefined && (r.amps === undefined || r.amps + EPS < req.minAmps)) { if (!sink) return false; sink.push(`${r.amps === undefined ? 'no current rating' : `${fmt(r.amps)} A`}, below ${needsOf(who, `${fmt(req.minAmps!)} A`)}`); }
  if (req.exactAmps !== undefined && (r.amps === undefined || Math.abs(r.amps - req.exactAmps) > EPS)) { if (!sink) return false; sink.push(`rated ${r.amps === undefined ? 'no current' : `${fmt(r.amps)} A`}, not ${needsOf(who, `${fmt(req.exactAmps!)} A rating`)}`); }
  if (req.maxAmps !== undefined && (r.amps === undefined || r.amps > req.maxAmps + EPS)) { if (!sink) return false; sink.push(`${r.amps === undefined ? 'no current rating' : `${fmt(r.amps)} A`}, above the ${fmt(req.maxAmps!)} A limit for ${who}`); }
  if (req.minIecAc3Amps !== undefined && (r.iecAc3Amps === undefined || r.iecAc3Amps + EPS < req.minIecAc3Amps)) { if (!sink) return false; sink.push(`${r.iecAc3Amps === undefined ? 'no AC-3 rating' : `AC-3 ${fmt(r.iecAc3Amps)} A`}, below ${needsOf(who, `AC-3 ${fmt(req.minIecAc3Amps!)} A`)}`); }
  if (req.minIecAc4Amps !== undefined && (r.iecAc4Amps === undefined || r.iecAc4Amps + EPS < req.minIecAc4Amps)) { if (!sink) return false; sink.push(`${r.iecAc4Amps === undefined ? 'no AC-4 rating' : `AC-4 ${fmt(r.iecAc4Amps)} A`}, below ${needsOf(who, `AC-4 ${fmt(req.minIecAc4Amps!)} A`)}`); }
  if (req.settingAmps !== undefined) {
    const lo = r.settingMinAmps;
    const hi = r.settingMaxAmps;
    if (lo === undefined || hi === undefined || lo > req.settingAmps + EPS || hi + EPS < req.settingAmps) {
      if (!sink) return false;
      sink.push((lo === undefined || hi === undefined ? `no setting range, where ${who} needs a setting of ${fmt(req.settingAmps!)} A` : `setting range ${fmt(lo)}–${fmt(hi)} A does not hold the ${fmt(req.settingAmps!)} A setting ${who} needs`));
    }
  }
  if (req.maxTripSettingAmps !== undefined && (r.settingMinAmps === undefined || r.settingMinAmps > req.maxTripSettingAmps + EPS)) {
    if (!sink) return false;
    sink.push((r.settingMinAmps === undefined ? 'no adjustable instantaneous trip' : `instantaneous trip sets no lower than ${fmt(r.settingMinAmps)} A, above the ${fmt(req.maxTripSettingAmps!)} A limit for ${who}`));
  }
  if (req.tripClass !== undefined && !(r.tripClasses ?? []).includes(req.tripClass)) {
    if (!sink) return false;
    sink.push(`${r.tripClasses?.length ? `trip class ${r.tripClasses.join('/')}` : 'no trip class'}, not ${needsOf(who, `class ${req.tripClass}`)}`);
  }
  if (req.minHp !== undefined) {
    const hp = r.hpByVolts?.[req.minHp.volts];
    if ((hp === undefined || hp + EPS < req.minHp.hp)) { if (!sink) return false; sink.push(`${hp === undefined ? 'no horsepower rating' : `${fmt(hp)} hp`} at ${req.minHp!.volts} V, below ${needsOf(who, `${fmt(req.minHp!.hp)} hp`)}`); }
  }
  if (req.poles !== undefined && r.poles !== req.poles) { if (!sink) return false; sink.push(`${r.poles === undefined ? 'no stated poles' : `${r.poles}-pole`}, not ${needsOf(who, `${req.poles}-pole device`)}`); }
  if (req.minPoles !== undefined && (r.poles === undefined || r.poles < req.minPoles)) { if (!sink) return false; sink.push(`${r.poles === undefined ? 'no stated poles' : `${r.poles}-pole`}, fewer than ${needsOf(who, `${req.minPoles} poles`)}`); }
  if (req.fuseClass !== undefined && r.fuseClass !== req.fuseClass) { if (!sink) return false; sink.push(`${r.fuseClass === undefined ? 'no fuse class' : `class ${r.fuseClass}`}, not ${needsOf(who, `class ${req.fuseClass}`)}`); }
  if (req.timeDelay !== undefined && r.timeDelay !== req.timeDelay) { if (!sink) return false; sink.push(`${r.timeDelay ? 'time-delay' : 'non-time-delay'}, where ${who} needs ${req.timeDelay ? 'time-delay' : 'non-time-delay'}`); }
  if (req.kind !== undefined && r.kind !== req.kind) { if (!sink) return false; sink.push(`${r.kind ?? 'no stated kind'}, not ${needsOf(who, req.kind!)}`); }
  if (req.function !== undefined && r.function !== req.function) { if (!sink) return false; sink.push(`function ${r.function ?? 'not stated'}, not ${needsOf(who, req.function!)}`); }
  if (req.contacts !== undefined && r.contacts !== req.contacts) { if (!sink) return false; sink.push(`contacts ${r.contacts ?? 'not stated'}, not ${needsOf(who, req.contacts!)}`); }
  if (req.detectsPhaseLoss && !r.detectsPhaseLoss) { if (!sink) return false; sink.push(`does not detect phase loss, which ${who} needs`); }
  if (req.detectsPhaseReversal && !r.detectsPhaseReversal) { if (!sink) return false; sink.push(`does not detect phase reversal, which ${who} needs`); }
  if (req.detectsImbalance && !r.detectsImbalance) { if (!sink) return false; sink.push(`does not detect imbalance, which ${who} needs`); }
  if (req.internalBypass && !r.internalBypass) { if (!sink) return false; sink.push(`no internal bypass, which ${who} needs`); }
  if (req.builtInOverload && !r.builtInOverload) { if (!sink) return false; sink.push(`no built-in overload, which ${who} needs`); }
  if (req.minNormalDutyAmps !== undefined && (r.normalDutyAmps === undefined || r.normalDutyAmps + EPS < req.minNormalDutyAmps)) {
    if (!sink) return false;
    sink.push(`${r.normalDutyAmps === undefined ? 'no normal-duty rating' : `normal-duty output ${fmt(r.normalDutyAmps)} A`}, below ${needsOf(who, `${fmt(req.minNormalDutyAmps!)} A`)}`);
  }
  if (req.minHeavyDutyAmps !== undefined && (r.heavyDutyAmps === undefined || r.heavyDutyAmps + EPS < req.minHeavyDutyAmps)) {
    if (!sink) return false;
    sink.push(`${r.heavyDutyAmps === undefined ? 'no heavy-duty rating' : `heavy-duty output ${fmt(r.heavyDutyAmps)} A`}, below ${needsOf(who, `${fmt(req.minHeavyDutyAmps!)} A`)}`);
  }
  if (req.minVa !== undefined && (r.va === undefined || r.va + EPS < req.minVa)) { if (!sink) return false; sink.push(`${r.va === undefined ? 'no VA rating' : `${fmt(r.va)} VA`}, below ${needsOf(who, `${fmt(req.minVa!)} VA continuous`)}`); }
  if (req.minInrushVa !== undefined && (r.inrushVa === undefined || r.inrushVa + EPS < req.minInrushVa)) { if (!sink) return false; sink.push(`${r.inrushVa === undefined ? 'no inrush rating' : `inrush ${fmt(r.inrushVa)} VA`}, below ${needsOf(who, `${fmt(req.minInrushVa!)} VA inrush`)}`); }
  if (req.secondaryVolts !== undefined && r.secondaryVolts !== req.secondaryVolts) { if (!sink) return false; sink.push(`secondary ${r.secondaryVolts === undefined ? 'not stated' : `${fmt(r.secondaryVolts)} V`}, not ${needsOf(who, `${fmt(req.secondaryVolts!)} V`)}`); }
  if (req.wireSize !== undefined) {
    if (item.category === 'terminal-block') {
      const i = wireIndex(req.wireSize);
      if ((!r.wireMin || !r.wireMax || wireIndex(r.wireMin) > i || wireIndex(r.wireMax) < i)) { if (!sink) return false; sink.push(`takes ${r.wireMin && r.wireMax ? `${r.wireMin} to ${r.wireMax}` : 'no stated wire range'}, not ${needsOf(who, `size ${req.wireSize}`)}`); }
    } else if (r.wireSize !== req.wireSize) { if (!sink) return false; sink.push(`size ${r.wireSize ?? 'not stated'}, not ${needsOf(who, `size ${req.wireSize}`)}`); }
  }
  if (req.nemaType !== undefined) {
    if (item.category === 'cooling') {
      if (!(r.nemaTypes ?? []).includes(req.nemaType as never)) { if (!sink) return false; sink.push(`does not keep NEMA Type ${req.nemaType}, which ${who} needs`); }
    } else if (r.nemaType !== req.nemaType) { if (!sink) return false; sink.push(`${r.nemaType ? `NEMA Type ${r.nemaType}` : 'no NEMA type'}, not ${needsOf(who, `Type ${req.nemaType}`)}`); }
  }
  if (req.minCfm !== undefined && (r.cfm === undefined || r.cfm + EPS < req.minCfm)) { if (!sink) return false; sink.push(`${r.cfm === undefined ? 'no airflow rating' : `${fmt(r.cfm)} cfm`}, below ${needsOf(who, `${fmt(req.minCfm!)} cfm`)}`); }
  if (req.minCoolingW !== undefined && (r.coolingW === undefined || r.coolingW + EPS < req.minCoolingW)) { if (!sink) return false; sink.push(`${r.coolingW === undefined ? 'no cooling rating' : `${fmt(r.coolingW)} W cooling`}, below ${needsOf(who, `${fmt(req.minCoolingW!)} W`)}`); }
  if (req.minDepthMm !== undefined && (r.depthMm === undefined || r.depthMm + EPS < req.minDepthMm)) { if (!sink) return false; sink.push(`${r.depthMm === undefined ? 'no stated depth' : `${fmt(r.depthMm)} mm deep`}, below ${needsOf(who, `${fmt(req.minDepthMm!)} mm`)}`); }
  if (req.minUsableAreaMm2 !== undefined && usableAreaMm2(item) + EPS < req.minUsableAreaMm2) {
    if (!sink) return false;
    sink.push(`usable back panel ${fmt(usableAreaMm2(item) / 1e6)} m², below ${needsOf(who, `${fmt(req.minUsableAreaMm2! / 1e6)} m²`)}`);
  }
  return !sink || sink.length === 0;
}

/** What an item lacks against a requirement, each in plain words; empty when it meets it. `who` names what the line serves ("motor P-101", "the panel"). */
export function shortfalls(item: CatalogueItem, req: Requirement, who = 'the line'): string[] {
  const sink: string[] = [];
  check(item, req, who, sink);
  return sink;
}

export function satisfies(item: CatalogueItem, req: Requirement): boolean {
  return check(item, req, '', null);
}

/** What an item lacks against a line's requirement: met when it meets any one of the alternatives (empty list). */
export function lineShortfalls(item: CatalogueItem, reqs: readonly Requirement[], who: string): string[] {
  let best: string[] | null = null;
  for (const req of reqs) {
    const miss = shortfalls(item, req, who);
    if (miss.length === 0) return [];
    if (!best || (req.category === item.category && miss.length < best.length)) best = miss;
  }
  return best ?? [];
}

/** Who a line serves, in words: "motor P-101" or "the panel". */
export function lineServes(bucket: string): string {
  return bucket === PANEL_BUCKET ? 'the panel' : `motor ${bucket}`;
}

/** The size an item is ranked by within its category ("smallest adequate"). */
function sizeOf(item: CatalogueItem): number {
  const r = item.ratings;
  switch (item.category) {
    case 'overload-relay':
      // thermal relays rank first; an electronic relay is chosen when phase-loss detection is required or no thermal range fits
      return (r.settingMaxAmps ?? 0) + (r.electronic ? 1e6 : 0);
    case 'manual-motor-protector':
    case 'field-loss-relay':
      return r.settingMaxAmps ?? 0;
    case 'vfd':
      return r.normalDutyAmps ?? 0;
    case 'control-transformer':
    case 'power-transformer':
      return r.va ?? 0;
    case 'wire':
      return wireIndex(r.wireSize ?? '');
    case 'enclosure':
      return (r.heightMm ?? 0) * (r.widthMm ?? 0) * 1e4 + (r.depthMm ?? 0);
    case 'cooling':
      return r.cfm ?? r.coolingW ?? 0;
    case 'braking-resistor':
      return Math.max(0, ...Object.values(r.hpByVolts ?? {}).map((v) => v ?? 0));
    case 'pilot-device':
    case 'aux-contact':
    case 'mechanical-interlock':
    case 'phase-monitor-relay':
      return 0;
    default:
      return r.amps ?? r.iecAc3Amps ?? 0;
  }
}

export type CatalogueIndex = Map<Category, CatalogueItem[]>;

/** Active items by category, each list smallest first (then cheapest, then by code). Build once per BOM. */
export function indexCatalogue(items: readonly CatalogueItem[]): CatalogueIndex {
  const index: CatalogueIndex = new Map();
  for (const item of items) {
    if (!item.active) continue;
    let list = index.get(item.category);
    if (!list) index.set(item.category, (list = []));
    list.push(item);
  }
  for (const list of index.values()) {
    list.sort((a, b) => sizeOf(a) - sizeOf(b) || a.unitCost - b.unitCost || (a.code < b.code ? -1 : a.code > b.code ? 1 : 0));
  }
  return index;
}

/** The smallest (or, with prefer 'largest', the largest) active item meeting the requirement, or null. */
export function selectItem(index: CatalogueIndex, req: Requirement): CatalogueItem | null {
  const list = index.get(req.category);
  if (!list) return null;
  if (req.prefer === 'largest') {
    let best: CatalogueItem | null = null;
    for (const item of list) {
      if (!satisfies(item, req)) continue;
      if (!best || sizeOf(item) > sizeOf(best) || (sizeOf(item) === sizeOf(best) && item.unitCost < best.unitCost)) best = item;
    }
    return best;
  }
  for (const item of list) if (satisfies(item, req)) return item;
  return null;
}

const fmt = (n: number): string => String(Math.round(n * 100) / 100);

/** The requirement in words, for an unmatched line. */
export function describeRequirement(req: Requirement): string {
  const p: string[] = [];
  if (req.kind) p.push(req.kind);
  if (req.function) p.push(`function ${req.function}`);
  if (req.nemaSize) p.push(`NEMA size ${req.nemaSize}`);
  if (req.minIecAc3Amps !== undefined) p.push(`AC-3 ≥ ${fmt(req.minIecAc3Amps)} A`);
  if (req.minIecAc4Amps !== undefined) p.push(`AC-4 ≥ ${fmt(req.minIecAc4Amps)} A`);
  if (req.coilVolts !== undefined) p.push(`coil ${fmt(req.coilVolts)} V`);
  if (req.exactVolts !== undefined) p.push(`operating at ${fmt(req.exactVolts)} V`);
  if (req.exactAmps !== undefined) p.push(`rating ${fmt(req.exactAmps)} A`);
  if (req.minAmps !== undefined) p.push(`≥ ${fmt(req.minAmps)} A`);
  if (req.maxAmps !== undefined) p.push(`≤ ${fmt(req.maxAmps)} A`);
  if (req.settingAmps !== undefined) p.push(`setting range holding ${fmt(req.settingAmps)} A`);
  if (req.maxTripSettingAmps !== undefined) p.push(`instantaneous trip settable ≤ ${fmt(req.maxTripSettingAmps)} A`);
  if (req.tripClass !== undefined) p.push(`trip class ${req.tripClass}`);
  if (req.minHp) p.push(`≥ ${fmt(req.minHp.hp)} hp at ${req.minHp.volts} V`);
  if (req.minNormalDutyAmps !== undefined) p.push(`normal-duty output ≥ ${fmt(req.minNormalDutyAmps)} A`);
  if (req.minHeavyDutyAmps !== undefined) p.push(`heavy-duty output ≥ ${fmt(req.minHeavyDutyAmps)} A`);
  if (req.poles !== undefined) p.push(`${req.poles}-pole`);
  if (req.minPoles !== undefined) p.push(`≥ ${req.minPoles} poles`);
  if (req.fuseClass) p.push(`class ${req.fuseClass}`);
  if (req.timeDelay !== undefined) p.push(req.timeDelay ? 'time-delay' : 'non-time-delay');
  if (req.contacts) p.push(req.contacts);
  if (req.detectsPhaseLoss) p.push('detects phase loss');
  if (req.detectsPhaseReversal) p.push('detects phase reversal');
  if (req.detectsImbalance) p.push('detects imbalance');
  if (req.internalBypass) p.push('internal bypass');
  if (req.builtInOverload) p.push('built-in overload');
  if (req.minVa !== undefined) p.push(`≥ ${fmt(req.minVa)} VA continuous`);
  if (req.minInrushVa !== undefined) p.push(`inrush capability ≥ ${fmt(req.minInrushVa)} VA`);
  if (req.secondaryVolts !== undefined) p.push(`secondary ${fmt(req.secondaryVolts)} V`);
  if (req.wireSize) p.push(req.category === 'terminal-block' ? `accepts ${req.wireSize}` : `size ${req.wireSize}`);
  if (req.nemaType) p.push(req.category === 'cooling' ? `keeps NEMA Type ${req.nemaType}` : `NEMA Type ${req.nemaType}`);
  if (req.minCfm !== undefined) p.push(`≥ ${fmt(req.minCfm)} cfm`);
  if (req.minCoolingW !== undefined) p.push(`≥ ${fmt(req.minCoolingW)} W cooling`);
  if (req.minUsableAreaMm2 !== undefined) p.push(`usable back panel ≥ ${fmt(req.minUsableAreaMm2 / 1e6)} m²`);
  if (req.minDepthMm !== undefined) p.push(`depth ≥ ${fmt(req.minDepthMm)} mm`);
  if (req.volts !== undefined) p.push(`rated for ${fmt(req.volts)} V`);
  return `${CATEGORY_LABELS[req.category]}: ${p.join('; ')}`;
}

// ---------------------------------------------------------------------------------------------
// Lines and labour

export interface LabourTable {
  get(key: LabourKey): LabourUnit | undefined;
}

const CATEGORY_LABOUR = Object.fromEntries(CATEGORIES.map((c) => [c.id, c.labourKey])) as Record<Category, LabourKey>;

/** Labour hours for one unit of an item: the category's mounting unit + its terminations + the item's own adder. */
export function unitLabourHours(category: Category, item: CatalogueItem | null, labour: LabourTable): number {
  const mount = labour.get(CATEGORY_LABOUR[category])?.hours ?? 0;
  const term = labour.get('termination')?.hours ?? 0;
  if (!item) return round4(mount);
  return round4(mount + item.terminations * term + item.labourHours);
}

const round4 = (n: number): number => Math.round((n + Number.EPSILON) * 10000) / 10000;

/** A line swapped by the estimator for an equivalent item: the item's price, labour, heat and rating, with the reason. */
export function swappedLine(line: BomLine, item: CatalogueItem, labour: LabourTable, reason: string | null): BomLine {
  return {
    ...matchedLine(line.bucket, item, line.quantity, labour, line.requirement ?? null),
    source: 'swapped',
    swapReason: reason,
    swappedFrom: line.source === 'swapped' ? (line.swappedFrom ?? null) : line.code,
  };
}

function matchedLine(bucket: string, item: CatalogueItem, quantity: number, labour: LabourTable, requirement: Requirement[] | null): BomLine {
  return {
    bucket,
    category: item.category,
    code: item.code,
    description: item.description,
    quantity,
    unit: item.unit,
    unitCost: item.unitCost,
    unitLabourHours: unitLabourHours(item.category, item, labour),
    heatLossW: item.heatLossW,
    sccrKa: item.sccrKa,
    status: 'matched',
    requiredRatings: null,
    source: 'auto',
    swapReason: null,
    requirement,
  };
}

function unmatchedLine(bucket: string, category: Category, quantity: number, needs: string, labour: LabourTable, requirement: Requirement[] | null): BomLine {
  return {
    bucket,
    category,
    code: null,
    description: `Unmatched — ${CATEGORY_LABELS[category]}`,
    quantity,
    unit: category === 'wire' ? 'ft' : 'ea',
    unitCost: 0,
    unitLabourHours: unitLabourHours(category, null, labour),
    heatLossW: 0,
    sccrKa: null,
    status: 'unmatched',
    requiredRatings: needs,
    source: 'auto',
    swapReason: null,
    requirement,
  };
}

// ---------------------------------------------------------------------------------------------
// Control schemes (common practice)

/** Door devices of each starter type's control scheme: [function, quantity]. Common practice. */
export function pilotScheme(type: StarterType, scheme?: LoadSelection['controlScheme']): Array<[string, number]> {
  // no scheme: a selection stored before the answer existed keeps the devices it was priced with
  const drive = type === 'VFD' || type === 'dc-drive';
  if (scheme === 'two-wire') return drive ? [['run-light', 1], ['fault-light', 1]] : [['run-light', type === 'FVR' || type === 'two-speed' ? 2 : 1]];
  if (scheme === 'three-wire' && drive) return [['start', 1], ['stop', 1], ['run-light', 1], ['fault-light', 1]];
  // hand-off-auto: Hand runs the coil on the selector's maintained contact; a two-direction starter keeps its
  // stop and direction push-buttons for Hand (common practice)
  if (scheme === 'hand-off-auto' && !drive) {
    if (type === 'FVR' || type === 'two-speed') return [['hand-off-auto', 1], ...pilotScheme(type, 'three-wire')];
    return [['hand-off-auto', 1], ['run-light', 1]];
  }
  switch (type) {
    case 'FVR':
      return [['forward', 1], ['reverse', 1], ['stop', 1], ['run-light', 2]];
    case 'two-speed':
      return [['fast', 1], ['slow', 1], ['stop', 1], ['run-light', 2]];
    case 'VFD':
    case 'dc-drive':
      return [['hand-off-auto', 1], ['run-light', 1], ['fault-light', 1]];
    default:
      return [['start', 1], ['stop', 1], ['run-light', 1]];
  }
}

/** Control-point terminals taken to field devices or the plant control system. Common practice estimate. */
export function controlPoints(type: StarterType): number {
  switch (type) {
    case 'FVNR':
    case 'RVSS':
    case 'wye-delta':
    case 'part-winding':
    case 'dc-armature-resistance':
      return 4;
    case 'FVR':
    case 'two-speed':
      return 6;
    case 'VFD':
    case 'dc-drive':
      return 8;
  }
}

const PILOT_KIND: Record<string, string> = {
  start: 'push-button',
  stop: 'push-button',
  forward: 'push-button',
  reverse: 'push-button',
  fast: 'push-button',
  slow: 'push-button',
  'hand-off-auto': 'selector-switch',
  'run-light': 'pilot-light',
  'fault-light': 'pilot-light',
};

function contactorCount(type: StarterType): number {
  switch (type) {
    case 'FVNR':
      return 1;
    case 'FVR':
    case 'two-speed':
    case 'part-winding':
      return 2;
    case 'wye-delta':
      return 3;
    default:
      return 0;
  }
}

/** Back-panel footprint of a bucket's power devices, mm² (common practice estimate, documented in catalog/README.md). */
function bucketFootprintMm2(s: LoadSelection): number {
  const t = s.starter.type;
  let area = 0;
  const n = contactorCount(t);
  if (n > 0) {
    const bySize: Record<string, number> = { '00': 90 * 250, '0': 90 * 250, '1': 90 * 250, '2': 110 * 300, '3': 160 * 400, '4': 200 * 480, '5': 280 * 600 };
    let one = s.starter.nemaSize ? bySize[s.starter.nemaSize] : undefined;
    if (one === undefined) {
      const a = s.starter.iecAmps ?? s.flcAmps;
      one = a <= 32 ? 90 * 250 : a <= 95 ? 110 * 300 : a <= 150 ? 160 * 400 : a <= 300 ? 200 * 480 : 400 * 800;
    }
    area += n * one;
  }
  if (t === 'VFD') {
    const a = s.vfd?.minOutputAmps ?? s.flcAmps;
    area += a <= 12 ? 140 * 260 : a <= 30 ? 180 * 350 : a <= 77 ? 240 * 500 : a <= 156 ? 300 * 650 : 400 * 900;
    if (s.vfd && s.vfd.outputFilter !== 'none') area += a <= 30 ? 150 * 200 : a <= 156 ? 250 * 300 : 350 * 450;
  }
  if (t === 'RVSS') {
    const a = s.softStarter?.minAmps ?? s.flcAmps;
    area += a <= 85 ? 120 * 250 : a <= 210 ? 200 * 400 : 300 * 600;
  }
  if (t === 'dc-drive') area += s.flcAmps <= 60 ? 250 * 400 : s.flcAmps <= 175 ? 350 * 550 : 450 * 750;
  if (t === 'dc-armature-resistance') area += 300 * 500;
  const r = s.scpd.ratingAmps;
  area += r <= 100 ? 100 * 150 : r <= 250 ? 140 * 250 : 210 * 350;
  return area;
}

function bucketMinDepthMm(s: LoadSelection): number {
  const t = s.starter.type;
  const a = t === 'VFD' ? (s.vfd?.minOutputAmps ?? s.flcAmps) : t === 'RVSS' ? (s.softStarter?.minAmps ?? s.flcAmps) : s.flcAmps;
  if (t === 'VFD' || t === 'RVSS' || t === 'dc-drive') return a <= 30 ? 250 : a <= 156 ? 300 : 400;
  if (s.starter.nemaSize === '4' || s.starter.nemaSize === '5') return 300;
  return 200;
}

/** Normalise an enclosure type as written by people ("NEMA 4x", "Type 12") to the catalogue's ("4X", "12"). */
export function normaliseEnclosureType(t: string): string {
  return t.toUpperCase().replace(/NEMA|TYPE/g, '').replace(/\s+/g, '');
}

/** Normalise a conductor size ("10 AWG", "#1/0", "250 kcmil") to the catalogue's ("10", "1/0", "250"); null if unknown. */
export function normaliseWireSize(size: string): WireSize | null {
  const s = size.replace(/awg|kcmil|mcm|#/gi, '').trim();
  return (WIRE_SIZES as readonly string[]).includes(s) ? (s as WireSize) : null;
}

/** A conductor as the engine writes it: "10 AWG", or parallel sets "3 × 350 kcmil per phase". */
export function parseConductor(text: string): { size: WireSize; sets: number } | null {
  const m = /^\s*(\d+)\s*[×x]\s*(.+?)(\s+per\s+phase)?\s*$/i.exec(text);
  const size = normaliseWireSize(m ? m[2]! : text);
  const sets = m ? Number(m[1]) : 1;
  return size && sets >= 1 ? { size, sets } : null;
}

const hpKey = (v: number | null): HpVolts | null =>
  v !== null && (HP_VOLTS as readonly string[]).includes(String(v)) ? (String(v) as HpVolts) : null;

// ---------------------------------------------------------------------------------------------
// The bill of materials

export interface BuildBomOptions {
  /** 'per-bucket' adds a fused disconnect to fused buckets (a breaker serves as the bucket's disconnecting means) */
  bucketDisconnect?: 'none' | 'per-bucket';
  /** order in which fuse classes are tried for fused buckets */
  fuseClasses?: Array<'J' | 'RK5' | 'CC'>;
  /** panel main: a breaker, or a fused disconnect with class J fuses */
  main?: 'breaker' | 'fused-disconnect';
  /** motor-lead wire per conductor, ft (common practice estimate) */
  wireFtPerConductor?: number;
  /** control wire per bucket, ft (common practice estimate) */
  controlWireFtPerBucket?: number;
}

export interface BuildBomInput {
  panelName: string;
  selections: LoadSelection[];
  panel: PanelRollup;
  supply: { volts: number; phases: number; hz: number };
  enclosureType: string;
  catalogue: readonly CatalogueItem[];
  labourUnits: LabourUnit[];
  /** control circuit voltage, V (default 120) */
  controlVolts?: number;
  /** for the totals returned with the lines (default 0 and 0) */
  markupPercent?: number;
  labourRatePerHour?: number;
  options?: BuildBomOptions;
}

export interface BuildBomResult {
  lines: BomLine[];
  totals: BomTotals;
  /** control power in the panel (for the transformer and its check) */
  control: { sealedVa: number; largestInrushVa: number; selectionVa: number };
  /** enclosure sizing inputs */
  enclosure: { requiredAreaMm2: number; minDepthMm: number };
}

/** Wiring duct, spacing and spare-space allowance on the device footprint (common practice). */
export const LAYOUT_ALLOWANCE = 1.6;
/** Terminal-block area: 12 mm pitch × 80 mm including marking and wire bend space (common practice). */
const TERMINAL_AREA_MM2 = 12 * 80;

class Builder {
  readonly lines: BomLine[] = [];
  private readonly memo = new Map<string, CatalogueItem | null>();
  constructor(
    readonly index: CatalogueIndex,
    readonly labour: LabourTable,
  ) {}

  find(req: Requirement): CatalogueItem | null {
    const key = JSON.stringify(req);
    let hit = this.memo.get(key);
    if (hit === undefined) {
      hit = selectItem(this.index, req);
      this.memo.set(key, hit);
    }
    return hit;
  }

  /** Add the match for req, or an unmatched line; returns the item. */
  add(bucket: string, req: Requirement, quantity: number): CatalogueItem | null {
    if (quantity <= 0) return null;
    const item = this.find(req);
    this.lines.push(item ? matchedLine(bucket, item, quantity, this.labour, [req]) : unmatchedLine(bucket, req.category, quantity, describeRequirement(req), this.labour, [req]));
    return item;
  }

  /** First requirement of the list that matches; unmatched line describing the first when none does. */
  addFirst(bucket: string, reqs: Requirement[], quantity: number): CatalogueItem | null {
    for (const req of reqs) {
      const item = this.find(req);
      if (item) {
        this.lines.push(matchedLine(bucket, item, quantity, this.labour, reqs));
        return item;
      }
    }
    const needs = reqs.map(describeRequirement).join(' — or — ');
    this.lines.push(unmatchedLine(bucket, reqs[0]!.category, quantity, needs, this.labour, reqs));
    return null;
  }

  unmatched(bucket: string, category: Category, quantity: number, needs: string): void {
    this.lines.push(unmatchedLine(bucket, category, quantity, needs, this.labour, null));
  }
}

/**
 * Largest fuse for a control transformer side, % of its rated current: 125 % at ≥ 9 A, 167 % below
 * (NEC 2023 Table 450.3(B)); a primary under 2 A may go to 500 % (NEC 2023 430.72(C)(4)). From memory.
 */
function transformerFuseLimitAmps(ratedAmps: number, primary: boolean): number {
  const pct = ratedAmps >= 9 ? 125 : primary && ratedAmps < 2 ? 500 : 167;
  return (ratedAmps * pct) / 100;
}

export function buildBom(input: BuildBomInput): BuildBomResult {
  const opts = input.options ?? {};
  const controlVolts = input.controlVolts ?? 120;
  const fuseClasses = opts.fuseClasses ?? ['J', 'RK5', 'CC'];
  const wireFt = opts.wireFtPerConductor ?? 10;
  const controlWireFt = opts.controlWireFtPerBucket ?? 40;
  const labourMap = new Map(input.labourUnits.map((u) => [u.key, u]));
  const b = new Builder(indexCatalogue(input.catalogue), labourMap);
  const controlWire: Requirement = { category: 'wire', kind: 'control', wireSize: controlVolts >= 100 ? '14' : '16' };

  let sealedVa = 0;
  let largestInrushVa = 0;
  let footprint = 0;
  let terminalCount = 0;
  let minDepth = 200;

  for (const s of input.selections) {
    const tag = s.tag;
    const t = s.starter.type;
    const v = s.volts;
    const poles = s.supply === 'ac3' ? 3 : s.supply === 'ac1' && v <= 120 ? 1 : 2;
    const hpv = hpKey(s.tableVolts ?? s.volts);
    const minHp = s.hp !== null && hpv ? { volts: hpv, hp: s.hp } : undefined;
    footprint += bucketFootprintMm2(s);
    minDepth = Math.max(minDepth, bucketMinDepthMm(s));

    // Controller
    const nContactors = contactorCount(t);
    let contactor: CatalogueItem | null = null;
    if (nContactors > 0) {
      const req: Requirement | null = s.starter.nemaSize
        ? { category: 'contactor', nemaSize: s.starter.nemaSize, coilVolts: controlVolts, volts: v }
        : s.starter.iecAmps !== null
          ? s.starter.iecCategory === 'AC-4'
            ? { category: 'contactor', minIecAc4Amps: s.starter.iecAmps, coilVolts: controlVolts, volts: v }
            : { category: 'contactor', minIecAc3Amps: s.starter.iecAmps, coilVolts: controlVolts, volts: v }
          : null;
      if (req) contactor = b.add(tag, req, nContactors);
      else b.unmatched(tag, 'contactor', nContactors, `Contactors: no NEMA size or IEC current decided for ${t}; coil ${controlVolts} V`);
      if (contactor) {
        sealedVa += nContactors * (contactor.ratings.sealedVa ?? 0);
        largestInrushVa = Math.max(largestInrushVa, contactor.ratings.inrushVa ?? 0);
      }
      b.add(tag, { category: 'aux-contact', contacts: '1NO1NC' }, nContactors);
      if (nContactors >= 2 && t !== 'part-winding') {
        if (s.starter.nemaSize) b.add(tag, { category: 'mechanical-interlock', kind: 'nema', nemaSize: s.starter.nemaSize }, 1);
        else b.add(tag, { category: 'mechanical-interlock', kind: 'iec', minAmps: contactor?.ratings.iecAc3Amps ?? s.starter.iecAmps ?? s.flcAmps }, 1);
      }
    }
    let overloadBuiltIn = false;
    if (t === 'RVSS') {
      const ss = b.add(tag, { category: 'soft-starter', minAmps: s.softStarter?.minAmps ?? s.flcAmps, volts: v, ...(s.softStarter?.bypass ? { internalBypass: true } : {}) }, 1);
      overloadBuiltIn = ss?.ratings.builtInOverload === true;
    }
    if (t === 'VFD') {
      const duty = s.vfd?.duty ?? 'normal';
      const amps = s.vfd?.minOutputAmps ?? s.flaAmps;
      b.add(tag, duty === 'heavy' ? { category: 'vfd', minHeavyDutyAmps: amps, volts: v } : { category: 'vfd', minNormalDutyAmps: amps, volts: v }, 1);
      if (s.vfd && s.vfd.outputFilter !== 'none') b.add(tag, { category: 'output-filter', kind: s.vfd.outputFilter, minAmps: amps, volts: v }, 1);
      overloadBuiltIn = s.overload.providedByDrive;
    }
    if (t === 'dc-drive') {
      b.add(tag, { category: 'dc-drive', minAmps: s.flcAmps, volts: v, ...(minHp ? { minHp } : {}) }, 1);
      overloadBuiltIn = true;
    }
    if (t === 'dc-armature-resistance') {
      b.add(tag, { category: 'dc-starter', minAmps: s.flcAmps, volts: v, builtInOverload: true, ...(minHp ? { minHp } : {}) }, 1);
      overloadBuiltIn = true;
    }

    // Overload relay(s): dial set at the current the relay carries (the selection's overload.relay:
    // wye-delta FLA/√3 in the delta windings, common practice; part-winding FLA/2 per half-winding, NEC 430.4)
    if (!overloadBuiltIn && t !== 'dc-drive' && t !== 'dc-armature-resistance') {
      const relay = relayOf(s);
      b.add(tag, { category: 'overload-relay', settingAmps: Math.min(relay.settingAmps, relay.maxAmps), tripClass: s.overload.tripClass, ...(s.relays.phaseLossByOverload ? { detectsPhaseLoss: true } : {}) }, relay.count);
    }

    // Branch short-circuit and ground-fault protection
    const rating = s.scpd.ratingAmps;
    const perBucketDisconnect = opts.bucketDisconnect === 'per-bucket';
    if (s.scpd.type === 'inverse-time-breaker') {
      b.add(tag, { category: 'inverse-time-breaker', exactAmps: rating, poles, volts: v }, 1);
    } else if (s.scpd.type === 'instantaneous-trip-breaker') {
      // continuous rating ≥ 115 % of FLC where it is the disconnecting means (NEC 2023 430.110(A))
      b.add(tag, { category: 'motor-circuit-protector', minAmps: round2(s.flcAmps * 1.15), maxTripSettingAmps: rating, minPoles: poles, volts: v }, 1);
    } else {
      const timeDelay = s.scpd.type === 'dual-element-fuse';
      const candidates = fuseClasses.map((fc) => ({ fc, fuse: b.find({ category: 'fuse', exactAmps: rating, fuseClass: fc, timeDelay, volts: v }) }));
      const chosen = candidates.find((c) => c.fuse !== null);
      if (!chosen) {
        b.addFirst(tag, fuseClasses.map((fc): Requirement => ({ category: 'fuse', exactAmps: rating, fuseClass: fc, timeDelay, volts: v })), poles);
      } else {
        b.add(tag, { category: 'fuse', exactAmps: rating, fuseClass: chosen.fc, timeDelay, volts: v }, poles);
        if (perBucketDisconnect) {
          b.add(tag, { category: 'fused-disconnect', fuseClass: chosen.fc, minAmps: Math.max(rating, s.disconnect.minAmps), minPoles: poles, volts: v, ...(s.disconnect.minHp !== null && hpv ? { minHp: { volts: hpv, hp: s.disconnect.minHp } } : {}) }, 1);
        } else {
          b.add(tag, { category: 'fuse-holder', fuseClass: chosen.fc, minAmps: rating, poles, volts: v }, 1);
        }
      }
    }

    // Protective relays (46/47)
    const needLoss = s.relays.phaseLoss && !s.relays.phaseLossByOverload;
    if (needLoss || s.relays.phaseReversal) {
      const relay = b.add(tag, { category: 'phase-monitor-relay', volts: v, ...(needLoss ? { detectsPhaseLoss: true } : {}), ...(s.relays.phaseReversal ? { detectsPhaseReversal: true } : {}) }, 1);
      sealedVa += relay?.ratings.va ?? 0;
    }
    if (s.dc?.fieldLossProtection) b.add(tag, { category: 'field-loss-relay', volts: v }, 1);
    if (s.dc?.dynamicBraking) {
      if (minHp) b.add(tag, { category: 'braking-resistor', minHp, volts: v }, 1);
      else b.unmatched(tag, 'braking-resistor', 1, `Dynamic braking resistors: motor hp at a catalogued DC voltage (${HP_VOLTS.join(', ')} V) needed; have ${s.hp ?? '—'} hp at ${v} V`);
    }

    // Control: fusing, door devices
    let bucketVa = nContactors * (contactor?.ratings.sealedVa ?? 0);
    for (const [fn, qty] of pilotScheme(t, s.controlScheme)) {
      const kind = PILOT_KIND[fn]!;
      const dev = b.add(tag, { category: 'pilot-device', kind, function: fn, ...(kind === 'pilot-light' ? { exactVolts: controlVolts } : {}) }, qty);
      if (dev?.ratings.va) {
        sealedVa += qty * dev.ratings.va;
        bucketVa += qty * dev.ratings.va;
      }
    }
    // control fuse ≥ 250 % of the bucket's sealed current, at least 2 A (common practice)
    const controlFuseAmps = Math.max(2, round2((2.5 * bucketVa) / controlVolts));
    b.add(tag, { category: 'fuse', fuseClass: 'CC', timeDelay: true, minAmps: controlFuseAmps, volts: controlVolts }, 1);
    b.add(tag, { category: 'fuse-holder', fuseClass: 'CC', poles: 1, minAmps: controlFuseAmps, volts: controlVolts }, 1);

    // Terminals and wire
    const leads = (s.supply === 'ac3' ? 3 : 2) * (t === 'wye-delta' || t === 'part-winding' || t === 'two-speed' ? 2 : 1) + (s.dc && s.dc.field !== 'series' ? 2 : 0);
    const cond = parseConductor(s.conductor.size);
    if (cond) {
      // one terminal and one run per conductor of each parallel set; each terminal carries its share
      b.add(tag, { category: 'terminal-block', kind: 'feed-through', wireSize: cond.size, minAmps: round2(s.conductor.minAmpacity / cond.sets) }, leads * cond.sets);
      b.add(tag, { category: 'terminal-block', kind: 'ground', wireSize: cond.size }, 1);
      if (s.conductor.material === 'cu') b.add(tag, { category: 'wire', kind: 'power', wireSize: cond.size }, Math.ceil(leads * cond.sets * wireFt));
      else b.unmatched(tag, 'wire', Math.ceil(leads * cond.sets * wireFt), `Wire: aluminum ${cond.size} (the catalogue's wire is copper)`);
    } else {
      b.unmatched(tag, 'terminal-block', leads + 1, `Terminal blocks: conductor size "${s.conductor.size}" is not a known AWG/kcmil size`);
      b.unmatched(tag, 'wire', Math.ceil(leads * wireFt), `Wire: conductor size "${s.conductor.size}" is not a known AWG/kcmil size`);
    }
    const points = controlPoints(t);
    b.add(tag, { category: 'terminal-block', kind: 'feed-through', wireSize: controlWire.wireSize! }, points);
    b.add(tag, controlWire, controlWireFt);
    terminalCount += leads + 1 + points;
  }

  // ------------------------------------------------------------------ other sources
  // A transformer or DC supply for motors at another voltage (shared/calc/other-sources), in a bucket of
  // its own: the unit, its primary device and (transformers) its secondary device per Table 450.3(B).
  const sources = input.panel.otherSources ?? [];
  for (const src of sources) {
    const poles = src.phases === 3 ? 3 : 2;
    const bucket = sourceBucket(src);
    if (src.kind === 'transformer') {
      b.add(bucket, { category: 'power-transformer', kind: src.phases === 3 ? 'three-phase' : 'single-phase', minVa: (src.kva ?? src.loadKva) * 1000, secondaryVolts: src.secondaryVolts, volts: input.supply.volts }, 1);
      b.add(bucket, { category: 'inverse-time-breaker', exactAmps: src.primaryProtection.ratingAmps, poles, volts: input.supply.volts }, 1);
      if (src.secondaryProtection) b.add(bucket, { category: 'inverse-time-breaker', exactAmps: src.secondaryProtection.ratingAmps, poles, volts: src.secondaryVolts }, 1);
      // floor space of a small dry-type transformer: 0.04 m² + 0.008 m² per kVA (common practice estimate)
      footprint += 40_000 + 8_000 * (src.kva ?? 0);
      minDepth = Math.max(minDepth, 300);
    } else {
      b.add(bucket, { category: 'dc-power-supply', minAmps: src.secondaryAmps, secondaryVolts: src.secondaryVolts, volts: input.supply.volts }, 1);
      b.add(bucket, { category: 'inverse-time-breaker', exactAmps: src.primaryProtection.ratingAmps, poles, volts: input.supply.volts }, 1);
      footprint += 60_000;
    }
    terminalCount += poles * 2 + 1;
  }

  // ------------------------------------------------------------------ panel items
  const P = PANEL_BUCKET;
  const supplyVolts = input.supply.volts;
  const panelPoles = input.supply.phases === 1 ? 2 : 3;
  const ocpdMax = input.panel.feeder.ocpdMaxAmps;
  let mainAmps = 0;
  if (input.selections.length > 0 && ocpdMax > 0) {
    const minAmpacity = input.panel.feeder.minAmpacity;
    const mainBounds = { maxAmps: ocpdMax, ...(minAmpacity > 0 && minAmpacity <= ocpdMax ? { minAmps: round2(minAmpacity) } : {}) };
    if ((opts.main ?? 'breaker') === 'breaker') {
      // the largest not above the 430.62(A) limit, and at least the feeder's minimum ampacity (NEC 430.24): a
      // main below the panel's load would trip in service (common practice)
      const main = b.add(P, { category: 'main-breaker', ...mainBounds, poles: panelPoles, volts: supplyVolts, prefer: 'largest' }, 1);
      mainAmps = main?.ratings.amps ?? ocpdMax;
    } else {
      const fuse = b.add(P, { category: 'fuse', ...mainBounds, fuseClass: 'J', timeDelay: true, volts: supplyVolts, prefer: 'largest' }, panelPoles);
      mainAmps = fuse?.ratings.amps ?? ocpdMax;
      b.add(P, { category: 'main-disconnect', minAmps: mainAmps, fuseClass: 'J', poles: panelPoles, volts: supplyVolts }, 1);
    }
    // distribution block: one branch connection per bucket
    const pdbReq: Requirement = { category: 'power-distribution-block', minAmps: input.panel.feeder.minAmpacity, poles: panelPoles, volts: supplyVolts };
    const pdb = b.find(pdbReq);
    const pdbQty = pdb ? Math.ceil((input.selections.length + sources.length) / (pdb.ratings.outputs ?? 1)) : 1;
    b.add(P, pdbReq, pdbQty);
    const feeder = parseConductor(input.panel.feeder.conductorSize);
    // main to distribution block: one conductor per pole and parallel set, 4 ft each (common practice estimate)
    if (feeder) b.add(P, { category: 'wire', kind: 'power', wireSize: feeder.size }, panelPoles * feeder.sets * 4);
    else b.unmatched(P, 'wire', panelPoles * 4, `Wire: feeder conductor size "${input.panel.feeder.conductorSize}" is not a known AWG/kcmil size`);
  }

  // Control power transformer (DOMAIN §7: continuous ≥ total sealed VA; inrush check √(sealed² + inrush²), common practice)
  const selectionVa = round2(Math.sqrt(sealedVa ** 2 + largestInrushVa ** 2));
  if (sealedVa > 0) {
    const cpt = b.add(P, { category: 'control-transformer', minVa: round2(sealedVa), minInrushVa: selectionVa, secondaryVolts: controlVolts, volts: supplyVolts }, 1);
    if (cpt?.ratings.va) {
      const primaryAmps = cpt.ratings.va / supplyVolts;
      const secondaryAmps = cpt.ratings.va / controlVolts;
      // largest fuse not above the 450.3(B) limit that still carries the rated current
      const fuseReqs = (amps: number, primary: boolean): Requirement[] =>
        (['CC', 'J'] as const).map((fc) => ({ category: 'fuse', fuseClass: fc, timeDelay: true, minAmps: round2(amps), maxAmps: round2(transformerFuseLimitAmps(amps, primary)), volts: primary ? supplyVolts : controlVolts, prefer: 'largest' }));
      const pf = b.addFirst(P, fuseReqs(primaryAmps, true), 2);
      b.add(P, { category: 'fuse-holder', fuseClass: pf?.ratings.fuseClass ?? 'CC', poles: 2, minAmps: pf?.ratings.amps ?? primaryAmps, volts: supplyVolts }, 1);
      const sf = b.addFirst(P, fuseReqs(secondaryAmps, false), 1);
      b.add(P, { category: 'fuse-holder', fuseClass: sf?.ratings.fuseClass ?? 'CC', poles: 1, minAmps: sf?.ratings.amps ?? secondaryAmps, volts: controlVolts }, 1);
    }
  }

  // Enclosure sized for its contents (common practice rule, see catalog/README.md)
  const panelArea = mainAmps === 0 ? 0 : mainAmps <= 100 ? 0.12e6 : mainAmps <= 400 ? 0.25e6 : 0.45e6;
  const requiredArea = Math.round((footprint + panelArea + terminalCount * TERMINAL_AREA_MM2) * LAYOUT_ALLOWANCE);
  if (mainAmps > 400) minDepth = Math.max(minDepth, 400);
  const encType = normaliseEnclosureType(input.enclosureType);
  if (input.selections.length > 0) {
    const encReq: Requirement = { category: 'enclosure', nemaType: encType, minUsableAreaMm2: requiredArea, minDepthMm: minDepth };
    const enc = b.find(encReq);
    if (enc) b.add(P, encReq, 1);
    else {
      // a lineup of the largest section of the type that meets the depth
      const largest = b.find({ category: 'enclosure', nemaType: encType, minDepthMm: minDepth, prefer: 'largest' });
      if (largest && usableAreaMm2(largest) > 0) {
        const sections = Math.ceil(requiredArea / usableAreaMm2(largest));
        // a swap keeps the section count, so each section must hold its share of the area
        b.lines.push(matchedLine(P, largest, sections, labourMap, [{ category: 'enclosure', nemaType: encType, minDepthMm: minDepth, minUsableAreaMm2: Math.ceil(requiredArea / sections) }]));
      }
      else b.unmatched(P, 'enclosure', 1, describeRequirement(encReq));
    }
  }

  const lines = b.lines;
  return {
    lines,
    totals: computeTotals(lines, input.markupPercent ?? 0, input.labourRatePerHour ?? 0),
    control: { sealedVa: round2(sealedVa), largestInrushVa, selectionVa },
    enclosure: { requiredAreaMm2: requiredArea, minDepthMm: minDepth },
  };
}

// ---------------------------------------------------------------------------------------------
// Cooling (the panel-check step calls this once the heat load is known)

export interface CoolingInput {
  heatLossW: number;
  enclosure: { heightMm: number; widthMm: number; depthMm: number; nemaType: string };
  mounting: 'wall' | 'free-standing';
  ambientC: number;
  maxInternalC: number;
  catalogue: readonly CatalogueItem[] | CatalogueIndex;
  labourUnits: LabourUnit[];
  bucket?: string;
}

export interface CoolingResult {
  /** effective cooling surface, m² */
  surfaceM2: number;
  /** heat the surface sheds at the allowed rise, W (negative when the ambient is above the limit) */
  surfaceW: number;
  excessW: number;
  method: 'none' | 'filter-fan' | 'air-conditioner';
  requiredCfm: number | null;
  requiredCoolingW: number | null;
  line: BomLine | null;
}

/** Heat-transfer coefficient of painted sheet steel in still air, W/(m²·K) (IEC TR 60890 simplified method). */
export const K_SHEET_STEEL = 5.5;

/**
 * Cooling for an enclosure: natural dissipation k·A·ΔT; beyond it a filter fan rated for the enclosure type
 * (cfm ≈ 3.16 × W / ΔT °F, common practice), or an air conditioner when the ambient is at or above the
 * allowed internal temperature (a fan cannot cool below ambient).
 * Effective surface (IEC TR 60890, from memory): wall-mounted 1.4·W·(H+D) + 1.8·D·H; free-standing 1.8·H·(W+D) + 1.4·W·D (m).
 */
export function selectCooling(input: CoolingInput): CoolingResult {
  const h = input.enclosure.heightMm / 1000;
  const w = input.enclosure.widthMm / 1000;
  const d = input.enclosure.depthMm / 1000;
  const surface = input.mounting === 'wall' ? 1.4 * w * (h + d) + 1.8 * d * h : 1.8 * h * (w + d) + 1.4 * w * d;
  const dT = input.maxInternalC - input.ambientC;
  const surfaceW = K_SHEET_STEEL * surface * dT;
  const excess = input.heatLossW - surfaceW;
  const index = input.catalogue instanceof Map ? input.catalogue : indexCatalogue(input.catalogue);
  const labour = new Map(input.labourUnits.map((u) => [u.key, u]));
  const bucket = input.bucket ?? PANEL_BUCKET;
  const base = { surfaceM2: round4(surface), surfaceW: round2(surfaceW), excessW: round2(Math.max(0, excess)) };
  if (excess <= 0) return { ...base, method: 'none', requiredCfm: null, requiredCoolingW: null, line: null };
  const type = normaliseEnclosureType(input.enclosure.nemaType);
  if (dT > 0) {
    const cfm = round2((3.16 * input.heatLossW) / (dT * 1.8));
    const req: Requirement = { category: 'cooling', kind: 'filter-fan', minCfm: cfm, nemaType: type };
    const fan = selectItem(index, req);
    if (fan) return { ...base, method: 'filter-fan', requiredCfm: cfm, requiredCoolingW: null, line: matchedLine(bucket, fan, 1, labour, [req]) };
  }
  const need = round2(excess);
  const req: Requirement = { category: 'cooling', kind: 'air-conditioner', minCoolingW: need, nemaType: type };
  const ac = selectItem(index, req);
  return {
    ...base,
    method: 'air-conditioner',
    requiredCfm: null,
    requiredCoolingW: need,
    line: ac ? matchedLine(bucket, ac, 1, labour, [req]) : unmatchedLine(bucket, 'cooling', 1, describeRequirement(req), labour, [req]),
  };
}

/** Heat loss of a set of lines, W. */
export function bomHeatLossW(lines: readonly BomLine[]): number {
  return round2(lines.reduce((sum, l) => sum + (l.unit === 'ea' ? l.quantity * l.heatLossW : 0), 0));
}

// ---------------------------------------------------------------------------------------------
// Totals, roll-up, change report

export const extendedCost = (l: Pick<BomLine, 'quantity' | 'unitCost'>): number => round2(l.quantity * l.unitCost);
export const extendedLabourHours = (l: Pick<BomLine, 'quantity' | 'unitLabourHours'>): number => round4(l.quantity * l.unitLabourHours);

const CATEGORY_ORDER = new Map<BomCategory, number>([...CATEGORIES.map((c) => c.id), ...MANUAL_CATEGORIES].map((c, i) => [c, i]));

/**
 * Material, labour and sell for a set of lines. Labour cost = hours × rate; markup on material + labour.
 * Extended costs are rounded to the cent per line, as the spreadsheet export does.
 */
export function computeTotals(lines: readonly BomLine[], markupPercent: number, labourRatePerHour = 0): BomTotals {
  let material = 0;
  let hours = 0;
  let unmatched = 0;
  const byBucket = new Map<string, { materialCost: number; labourHours: number }>();
  const byCategory = new Map<BomCategory, { materialCost: number; labourHours: number }>();
  for (const l of lines) {
    const m = extendedCost(l);
    const h = extendedLabourHours(l);
    material += m;
    hours += h;
    if (l.status === 'unmatched') unmatched++;
    const bb = byBucket.get(l.bucket) ?? { materialCost: 0, labourHours: 0 };
    bb.materialCost += m;
    bb.labourHours += h;
    byBucket.set(l.bucket, bb);
    const bc = byCategory.get(l.category) ?? { materialCost: 0, labourHours: 0 };
    bc.materialCost += m;
    bc.labourHours += h;
    byCategory.set(l.category, bc);
  }
  const materialCost = round2(material);
  const labourHours = round2(hours);
  const labourCost = round2(labourHours * labourRatePerHour);
  const cost = round2(materialCost + labourCost);
  const markup = round2((cost * markupPercent) / 100);
  return {
    materialCost,
    labourHours,
    labourRate: labourRatePerHour,
    labourCost,
    cost,
    markupPercent,
    markup,
    sell: round2(cost + markup),
    unmatchedLines: unmatched,
    byBucket: [...byBucket].map(([bucket, g]) => ({ bucket, materialCost: round2(g.materialCost), labourHours: round2(g.labourHours) })),
    byCategory: [...byCategory]
      .sort((a, b) => (CATEGORY_ORDER.get(a[0]) ?? 99) - (CATEGORY_ORDER.get(b[0]) ?? 99))
      .map(([category, g]) => ({ category, materialCost: round2(g.materialCost), labourHours: round2(g.labourHours) })),
  };
}

export interface RollupLine {
  code: string | null;
  category: BomCategory;
  description: string;
  unit: 'ea' | 'ft';
  quantity: number;
  unitCost: number;
  extendedCost: number;
  /** required ratings of an unmatched group */
  requiredRatings: string | null;
  buckets: string[];
}

/** Purchasing roll-up: one row per part code and frozen unit cost; unmatched lines grouped by what they need. Sorted by category then code. */
export function rollupByCode(lines: readonly BomLine[]): RollupLine[] {
  const groups = new Map<string, RollupLine>();
  for (const l of lines) {
    const key = l.code !== null ? `c|${l.code}|${l.unitCost}` : `u|${l.category}|${l.requiredRatings ?? l.description}|${l.unitCost}`;
    let g = groups.get(key);
    if (!g) {
      g = { code: l.code, category: l.category, description: l.description, unit: l.unit, quantity: 0, unitCost: l.unitCost, extendedCost: 0, requiredRatings: l.code === null ? l.requiredRatings : null, buckets: [] };
      groups.set(key, g);
    }
    g.quantity = round4(g.quantity + l.quantity);
    if (!g.buckets.includes(l.bucket)) g.buckets.push(l.bucket);
  }
  const out = [...groups.values()];
  for (const g of out) g.extendedCost = extendedCost(g);
  return out.sort(
    (a, b) =>
      (CATEGORY_ORDER.get(a.category) ?? 99) - (CATEGORY_ORDER.get(b.category) ?? 99) ||
      (a.code ?? '\uffff').localeCompare(b.code ?? '\uffff') ||
      a.unitCost - b.unitCost,
  );
}

export interface DiffSide {
  quantity: number;
  unitCost: number;
  extendedCost: number;
  labourHours: number;
}
export interface DiffEntry {
  key: string;
  bucket: string;
  category: BomCategory;
  code: string | null;
  description: string;
  before: DiffSide | null;
  after: DiffSide | null;
  /** after − before, material */
  costDelta: number;
  labourHoursDelta: number;
}
export interface BomDiff {
  added: DiffEntry[];
  removed: DiffEntry[];
  changed: DiffEntry[];
  materialDelta: number;
  labourHoursDelta: number;
}

function lineKey(l: BomLine): string {
  if (l.code !== null) return `${l.bucket}|${l.code}`;
  if (l.status === 'unmatched') return `${l.bucket}|unmatched|${l.category}|${l.requiredRatings ?? ''}`;
  return `${l.bucket}|manual|${l.category}|${l.description}`;
}

function collapse(lines: readonly BomLine[]): Map<string, { line: BomLine; side: DiffSide }> {
  const m = new Map<string, { line: BomLine; side: DiffSide }>();
  for (const l of lines) {
    const k = lineKey(l);
    const e = m.get(k);
    if (e) {
      e.side.quantity = round4(e.side.quantity + l.quantity);
      e.side.extendedCost = round2(e.side.extendedCost + extendedCost(l));
      e.side.labourHours = round4(e.side.labourHours + extendedLabourHours(l));
      e.side.unitCost = e.side.quantity > 0 ? round4(e.side.extendedCost / e.side.quantity) : l.unitCost;
    } else {
      m.set(k, { line: l, side: { quantity: l.quantity, unitCost: l.unitCost, extendedCost: extendedCost(l), labourHours: extendedLabourHours(l) } });
    }
  }
  return m;
}

/** Change report between two bills of materials (a = before, b = after), matched by bucket and part code. */
export function diffBoms(a: readonly BomLine[], b: readonly BomLine[]): BomDiff {
  const A = collapse(a);
  const B = collapse(b);
  const added: DiffEntry[] = [];
  const removed: DiffEntry[] = [];
  const changed: DiffEntry[] = [];
  const entry = (key: string, line: BomLine, before: DiffSide | null, after: DiffSide | null): DiffEntry => ({
    key,
    bucket: line.bucket,
    category: line.category,
    code: line.code,
    description: line.description,
    before,
    after,
    costDelta: round2((after?.extendedCost ?? 0) - (before?.extendedCost ?? 0)),
    labourHoursDelta: round4((after?.labourHours ?? 0) - (before?.labourHours ?? 0)),
  });
  for (const [k, { line, side }] of A) {
    const other = B.get(k);
    if (!other) removed.push(entry(k, line, side, null));
    else if (other.side.quantity !== side.quantity || other.side.unitCost !== side.unitCost || other.side.labourHours !== side.labourHours)
      changed.push(entry(k, other.line, side, other.side));
  }
  for (const [k, { line, side }] of B) if (!A.has(k)) added.push(entry(k, line, null, side));
  const sum = (xs: DiffEntry[], f: (e: DiffEntry) => number) => xs.reduce((s, e) => s + f(e), 0);
  const all = [...added, ...removed, ...changed];
  return {
    added,
    removed,
    changed,
    materialDelta: round2(sum(all, (e) => e.costDelta)),
    labourHoursDelta: round4(sum(all, (e) => e.labourHoursDelta)),
  };
}
