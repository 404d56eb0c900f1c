// Stage 1 of the bill of materials, the match: whether a catalogue item meets a requirement (and, when it
// does not, what it lacks in plain words), and the smallest adequate active item of a category.
// Rule: every field a requirement gives is a hard constraint; where nothing fits, the line stays unmatched.
import { CATEGORY_LABELS, PANEL_BUCKET, WIRE_SIZES, type CatalogueItem, type Category, type Requirement } from '../../schemas/catalogue';
import { USABLE_AREA_DEDUCTION_MM } from '../../standards/panel-layout';
import { fmt } from './describe';

type WireSize = (typeof WIRE_SIZES)[number];
type Ratings = CatalogueItem['ratings'];

const wireIndex = (s: string): number => WIRE_SIZES.indexOf(s as WireSize);

/** Usable back-panel area of an enclosure: (H − 150 mm) × (W − 100 mm) for flanges and door stiffeners (common practice). */
export function usableAreaMm2(item: CatalogueItem): number {
  const h = item.ratings.heightMm ?? 0;
  const w = item.ratings.widthMm ?? 0;
  return Math.max(0, h - USABLE_AREA_DEDUCTION_MM.height) * Math.max(0, w - USABLE_AREA_DEDUCTION_MM.width);
}

const EPS = 1e-9;

const needsOf = (who: string, what: string): string => `the ${what} ${who} needs`;

// Each group below checks some of a requirement's fields. With a sink, every shortfall is written into it
// and the group goes on; without one it returns false at the first (the matcher's fast path).

/** Voltage, current, settings, trip class and horsepower. */
function meetsRatings(r: Ratings, req: Requirement, who: string, sink: string[] | null): boolean {
  if (req.volts !== undefined) {
    if (r.volts === undefined || r.volts + EPS < req.volts) {
      if (!sink) return false;
      sink.push(
        r.volts === undefined
          ? `no rated voltage, where ${who} runs at ${fmt(req.volts!)} V`
          : `rated ${fmt(r.volts)} V, below ${needsOf(who, `${fmt(req.volts!)} V`)}`,
      );
    } else if (r.voltsMin !== undefined && r.voltsMin > req.volts + EPS) {
      if (!sink) return false;
      sink.push(`rated from ${fmt(r.voltsMin!)} V, above ${needsOf(who, `${fmt(req.volts!)} V`)}`);
    }
  }
  if (req.exactVolts !== undefined && r.volts !== req.exactVolts) {
    if (!sink) return false;
    sink.push(
      `operates at ${r.volts === undefined ? 'no stated voltage' : `${fmt(r.volts)} V`}, not ${needsOf(who, `${fmt(req.exactVolts!)} V`)}`,
    );
  }
  if (req.coilVolts !== undefined && r.coilVolts !== req.coilVolts) {
    if (!sink) return false;
    sink.push(
      `${r.coilVolts === undefined ? 'no stated' : `${fmt(r.coilVolts)} V`} coil, not ${needsOf(who, `${fmt(req.coilVolts!)} V control voltage`)}`,
    );
  }
  if (req.nemaSize !== undefined && r.nemaSize !== req.nemaSize) {
    if (!sink) return false;
    sink.push(
      `${r.nemaSize === undefined ? 'no NEMA size' : `NEMA size ${r.nemaSize}`}${r.amps !== undefined ? ` (${fmt(r.amps)} A)` : ''}, not ${needsOf(who, `NEMA size ${req.nemaSize}`)}`,
    );
  }
  if (req.minAmps !== undefined && (r.amps === undefined || r.amps + EPS < req.minAmps)) {
    if (!sink) return false;
    sink.push(`${r.amps === undefined ? 'no current rating' : `${fmt(r.amps)} A`}, below ${needsOf(who, `${fmt(req.minAmps!)} A`)}`);
  }
  if (req.exactAmps !== undefined && (r.amps === undefined || Math.abs(r.amps - req.exactAmps) > EPS)) {
    if (!sink) return false;
    sink.push(`rated ${r.amps === undefined ? 'no current' : `${fmt(r.amps)} A`}, not ${needsOf(who, `${fmt(req.exactAmps!)} A rating`)}`);
  }
  if (req.maxAmps !== undefined && (r.amps === undefined || r.amps > req.maxAmps + EPS)) {
    if (!sink) return false;
    sink.push(`${r.amps === undefined ? 'no current rating' : `${fmt(r.amps)} A`}, above the ${fmt(req.maxAmps!)} A limit for ${who}`);
  }
  if (req.minIecAc3Amps !== undefined && (r.iecAc3Amps === undefined || r.iecAc3Amps + EPS < req.minIecAc3Amps)) {
    if (!sink) return false;
    sink.push(
      `${r.iecAc3Amps === undefined ? 'no AC-3 rating' : `AC-3 ${fmt(r.iecAc3Amps)} A`}, below ${needsOf(who, `AC-3 ${fmt(req.minIecAc3Amps!)} A`)}`,
    );
  }
  if (req.minIecAc4Amps !== undefined && (r.iecAc4Amps === undefined || r.iecAc4Amps + EPS < req.minIecAc4Amps)) {
    if (!sink) return false;
    sink.push(
      `${r.iecAc4Amps === undefined ? 'no AC-4 rating' : `AC-4 ${fmt(r.iecAc4Amps)} A`}, below ${needsOf(who, `AC-4 ${fmt(req.minIecAc4Amps!)} A`)}`,
    );
  }
  if (req.settingAmps !== undefined) {
    const lo = r.settingMinAmps;
    const hi = r.settingMaxAmps;
    if (lo === undefined || hi === undefined || lo > req.settingAmps + EPS || hi + EPS < req.settingAmps) {
      if (!sink) return false;
      sink.push(
        lo === undefined || hi === undefined
          ? `no setting range, where ${who} needs a setting of ${fmt(req.settingAmps!)} A`
          : `setting range ${fmt(lo)}–${fmt(hi)} A does not hold the ${fmt(req.settingAmps!)} A setting ${who} needs`,
      );
    }
  }
  if (req.maxTripSettingAmps !== undefined && (r.settingMinAmps === undefined || r.settingMinAmps > req.maxTripSettingAmps + EPS)) {
    if (!sink) return false;
    sink.push(
      r.settingMinAmps === undefined
        ? 'no adjustable instantaneous trip'
        : `instantaneous trip sets no lower than ${fmt(r.settingMinAmps)} A, above the ${fmt(req.maxTripSettingAmps!)} A limit for ${who}`,
    );
  }
  if (req.tripClass !== undefined && !(r.tripClasses ?? []).includes(req.tripClass)) {
    if (!sink) return false;
    sink.push(
      `${r.tripClasses?.length ? `trip class ${r.tripClasses.join('/')}` : 'no trip class'}, not ${needsOf(who, `class ${req.tripClass}`)}`,
    );
  }
  if (req.minHp !== undefined) {
    const hp = r.hpByVolts?.[req.minHp.volts];
    if (hp === undefined || hp + EPS < req.minHp.hp) {
      if (!sink) return false;
      sink.push(
        `${hp === undefined ? 'no horsepower rating' : `${fmt(hp)} hp`} at ${req.minHp!.volts} V, below ${needsOf(who, `${fmt(req.minHp!.hp)} hp`)}`,
      );
    }
  }
  return true;
}

/** Poles, fuse class, kind and function, contacts, protective features, drive duty, VA and secondary voltage. */
function meetsDevice(r: Ratings, req: Requirement, who: string, sink: string[] | null): boolean {
  if (req.poles !== undefined && r.poles !== req.poles) {
    if (!sink) return false;
    sink.push(`${r.poles === undefined ? 'no stated poles' : `${r.poles}-pole`}, not ${needsOf(who, `${req.poles}-pole device`)}`);
  }
  if (req.minPoles !== undefined && (r.poles === undefined || r.poles < req.minPoles)) {
    if (!sink) return false;
    sink.push(`${r.poles === undefined ? 'no stated poles' : `${r.poles}-pole`}, fewer than ${needsOf(who, `${req.minPoles} poles`)}`);
  }
  if (req.fuseClass !== undefined && r.fuseClass !== req.fuseClass) {
    if (!sink) return false;
    sink.push(`${r.fuseClass === undefined ? 'no fuse class' : `class ${r.fuseClass}`}, not ${needsOf(who, `class ${req.fuseClass}`)}`);
  }
  if (req.timeDelay !== undefined && r.timeDelay !== req.timeDelay) {
    if (!sink) return false;
    sink.push(`${r.timeDelay ? 'time-delay' : 'non-time-delay'}, where ${who} needs ${req.timeDelay ? 'time-delay' : 'non-time-delay'}`);
  }
  if (req.kind !== undefined && r.kind !== req.kind) {
    if (!sink) return false;
    sink.push(`${r.kind ?? 'no stated kind'}, not ${needsOf(who, req.kind!)}`);
  }
  if (req.function !== undefined && r.function !== req.function) {
    if (!sink) return false;
    sink.push(`function ${r.function ?? 'not stated'}, not ${needsOf(who, req.function!)}`);
  }
  if (req.contacts !== undefined && r.contacts !== req.contacts) {
    if (!sink) return false;
    sink.push(`contacts ${r.contacts ?? 'not stated'}, not ${needsOf(who, req.contacts!)}`);
  }
  if (req.detectsPhaseLoss && !r.detectsPhaseLoss) {
    if (!sink) return false;
    sink.push(`does not detect phase loss, which ${who} needs`);
  }
  if (req.detectsPhaseReversal && !r.detectsPhaseReversal) {
    if (!sink) return false;
    sink.push(`does not detect phase reversal, which ${who} needs`);
  }
  if (req.detectsImbalance && !r.detectsImbalance) {
    if (!sink) return false;
    sink.push(`does not detect imbalance, which ${who} needs`);
  }
  if (req.internalBypass && !r.internalBypass) {
    if (!sink) return false;
    sink.push(`no internal bypass, which ${who} needs`);
  }
  if (req.builtInOverload && !r.builtInOverload) {
    if (!sink) return false;
    sink.push(`no built-in overload, which ${who} needs`);
  }
  if (req.minNormalDutyAmps !== undefined && (r.normalDutyAmps === undefined || r.normalDutyAmps + EPS < req.minNormalDutyAmps)) {
    if (!sink) return false;
    sink.push(
      `${r.normalDutyAmps === undefined ? 'no normal-duty rating' : `normal-duty output ${fmt(r.normalDutyAmps)} A`}, below ${needsOf(who, `${fmt(req.minNormalDutyAmps!)} A`)}`,
    );
  }
  if (req.minHeavyDutyAmps !== undefined && (r.heavyDutyAmps === undefined || r.heavyDutyAmps + EPS < req.minHeavyDutyAmps)) {
    if (!sink) return false;
    sink.push(
      `${r.heavyDutyAmps === undefined ? 'no heavy-duty rating' : `heavy-duty output ${fmt(r.heavyDutyAmps)} A`}, below ${needsOf(who, `${fmt(req.minHeavyDutyAmps!)} A`)}`,
    );
  }
  if (req.minVa !== undefined && (r.va === undefined || r.va + EPS < req.minVa)) {
    if (!sink) return false;
    sink.push(`${r.va === undefined ? 'no VA rating' : `${fmt(r.va)} VA`}, below ${needsOf(who, `${fmt(req.minVa!)} VA continuous`)}`);
  }
  if (req.minInrushVa !== undefined && (r.inrushVa === undefined || r.inrushVa + EPS < req.minInrushVa)) {
    if (!sink) return false;
    sink.push(
      `${r.inrushVa === undefined ? 'no inrush rating' : `inrush ${fmt(r.inrushVa)} VA`}, below ${needsOf(who, `${fmt(req.minInrushVa!)} VA inrush`)}`,
    );
  }
  if (req.secondaryVolts !== undefined && r.secondaryVolts !== req.secondaryVolts) {
    if (!sink) return false;
    sink.push(
      `secondary ${r.secondaryVolts === undefined ? 'not stated' : `${fmt(r.secondaryVolts)} V`}, not ${needsOf(who, `${fmt(req.secondaryVolts!)} V`)}`,
    );
  }
  return true;
}

/** Wire size, enclosure type, airflow, cooling, depth and back-panel area. */
function meetsPhysical(item: CatalogueItem, req: Requirement, who: string, sink: string[] | null): boolean {
  const r = item.ratings;
  if (req.wireSize !== undefined) {
    if (item.category === 'terminal-block') {
      const i = wireIndex(req.wireSize);
      if (!r.wireMin || !r.wireMax || wireIndex(r.wireMin) > i || wireIndex(r.wireMax) < i) {
        if (!sink) return false;
        sink.push(
          `takes ${r.wireMin && r.wireMax ? `${r.wireMin} to ${r.wireMax}` : 'no stated wire range'}, not ${needsOf(who, `size ${req.wireSize}`)}`,
        );
      }
    } else if (r.wireSize !== req.wireSize) {
      if (!sink) return false;
      sink.push(`size ${r.wireSize ?? 'not stated'}, not ${needsOf(who, `size ${req.wireSize}`)}`);
    }
  }
  if (req.nemaType !== undefined) {
    if (item.category === 'cooling') {
      if (!(r.nemaTypes ?? []).includes(req.nemaType as never)) {
        if (!sink) return false;
        sink.push(`does not keep NEMA Type ${req.nemaType}, which ${who} needs`);
      }
    } else if (r.nemaType !== req.nemaType) {
      if (!sink) return false;
      sink.push(`${r.nemaType ? `NEMA Type ${r.nemaType}` : 'no NEMA type'}, not ${needsOf(who, `Type ${req.nemaType}`)}`);
    }
  }
  if (req.minCfm !== undefined && (r.cfm === undefined || r.cfm + EPS < req.minCfm)) {
    if (!sink) return false;
    sink.push(`${r.cfm === undefined ? 'no airflow rating' : `${fmt(r.cfm)} cfm`}, below ${needsOf(who, `${fmt(req.minCfm!)} cfm`)}`);
  }
  if (req.minCoolingW !== undefined && (r.coolingW === undefined || r.coolingW + EPS < req.minCoolingW)) {
    if (!sink) return false;
    sink.push(
      `${r.coolingW === undefined ? 'no cooling rating' : `${fmt(r.coolingW)} W cooling`}, below ${needsOf(who, `${fmt(req.minCoolingW!)} W`)}`,
    );
  }
  if (req.minDepthMm !== undefined && (r.depthMm === undefined || r.depthMm + EPS < req.minDepthMm)) {
    if (!sink) return false;
    sink.push(
      `${r.depthMm === undefined ? 'no stated depth' : `${fmt(r.depthMm)} mm deep`}, below ${needsOf(who, `${fmt(req.minDepthMm!)} mm`)}`,
    );
  }
  if (req.minUsableAreaMm2 !== undefined && usableAreaMm2(item) + EPS < req.minUsableAreaMm2) {
    if (!sink) return false;
    sink.push(`usable back panel ${fmt(usableAreaMm2(item) / 1e6)} m², below ${needsOf(who, `${fmt(req.minUsableAreaMm2! / 1e6)} m²`)}`);
  }
  return true;
}

/**
 * Checks an item against a requirement: true when it meets every constraint. With a sink, every shortfall
 * is written into it in plain words ("9 A, below the 34 A motor P-101 needs"); without one it stops at the
 * first (the matcher's fast path). The one check behind the matcher, the swap list and a swap's validation.
 */
function check(item: CatalogueItem, req: Requirement, who: string, sink: string[] | null): boolean {
  // another category: nothing else is worth comparing
  if (item.category !== req.category) {
    sink?.push(`it is in ${CATEGORY_LABELS[item.category]}, not ${CATEGORY_LABELS[req.category]}`);
    return false;
  }
  if (!meetsRatings(item.ratings, req, who, sink)) return false;
  if (!meetsDevice(item.ratings, req, who, sink)) return false;
  if (!meetsPhysical(item, req, who, sink)) return false;
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
