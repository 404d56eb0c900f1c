// Stage 3 of the bill of materials, a motor's bucket: its controller (contactors, soft starter, drive or DC
// starter), overload relays, branch short-circuit and ground-fault protection, protective relays, control
// scheme, terminals and wire — each the smallest adequate catalogue item for what the selection decided.
import { HP_VOLTS, type CatalogueItem, type Requirement } from '../../schemas/catalogue';
import type { LoadSelection } from '../../schemas/selection';
import { relayOf } from '../overload';
import { round2 } from '../round';
import type { BomContext } from './context';
import { addControlParts, contactorCount, controlPoints } from './control-scheme';
import { bucketMinDepthMm } from './footprint';
import { hpColumn, parseConductor } from './normalise';

/** What the stages of one bucket share: the selection, its tag, voltage, poles and horsepower requirement. */
export interface Bucket {
  s: LoadSelection;
  tag: string;
  volts: number;
  poles: number;
  hpVolts: ReturnType<typeof hpColumn>;
  minHp: { volts: NonNullable<ReturnType<typeof hpColumn>>; hp: number } | undefined;
}

export function bucketOf(s: LoadSelection): Bucket {
  const volts = s.volts;
  const poles = s.supply === 'ac3' ? 3 : s.supply === 'ac1' && volts <= 120 ? 1 : 2;
  const hpVolts = hpColumn(s.tableVolts ?? s.volts);
  const minHp = s.hp !== null && hpVolts ? { volts: hpVolts, hp: s.hp } : undefined;
  return { s, tag: s.tag, volts, poles, hpVolts, minHp };
}

/** The contactor requirement: by NEMA size where the engine decided one, else by IEC current in its category. */
function contactorRequirement(s: LoadSelection, controlVolts: number): Requirement | null {
  const v = s.volts;
  if (s.starter.nemaSize) return { category: 'contactor', nemaSize: s.starter.nemaSize, coilVolts: controlVolts, volts: v };
  if (s.starter.iecAmps === null) return null;
  return s.starter.iecCategory === 'AC-4'
    ? { category: 'contactor', minIecAc4Amps: s.starter.iecAmps, coilVolts: controlVolts, volts: v }
    : { category: 'contactor', minIecAc3Amps: s.starter.iecAmps, coilVolts: controlVolts, volts: v };
}

/** Contactors, their auxiliary contacts and (two or more, not part-winding) the mechanical interlock. Returns the coils' sealed VA. */
export function addContactors(ctx: BomContext, k: Bucket): number {
  const { lines, controlVolts, tally } = ctx;
  const { s, tag } = k;
  const count = contactorCount(s.starter.type);
  if (count === 0) return 0;
  const req = contactorRequirement(s, controlVolts);
  let contactor: CatalogueItem | null = null;
  if (req) contactor = lines.add(tag, req, count);
  else
    lines.unmatched(
      tag,
      'contactor',
      count,
      `Contactors: no NEMA size or IEC current decided for ${s.starter.type}; coil ${controlVolts} V`,
    );
  if (contactor) {
    tally.sealedVa += count * (contactor.ratings.sealedVa ?? 0);
    tally.largestInrushVa = Math.max(tally.largestInrushVa, contactor.ratings.inrushVa ?? 0);
  }
  lines.add(tag, { category: 'aux-contact', contacts: '1NO1NC' }, count);
  if (count >= 2 && s.starter.type !== 'part-winding') {
    if (s.starter.nemaSize) lines.add(tag, { category: 'mechanical-interlock', kind: 'nema', nemaSize: s.starter.nemaSize }, 1);
    else
      lines.add(
        tag,
        { category: 'mechanical-interlock', kind: 'iec', minAmps: contactor?.ratings.iecAc3Amps ?? s.starter.iecAmps ?? s.flcAmps },
        1,
      );
  }
  return count * (contactor?.ratings.sealedVa ?? 0);
}

/** A soft starter, drive (with its output filter) or DC starter. Returns whether it carries the motor's overload protection. */
export function addElectronicController(ctx: BomContext, k: Bucket): boolean {
  const { lines } = ctx;
  const { s, tag, volts: v, minHp } = k;
  switch (s.starter.type) {
    case 'RVSS': {
      const ss = lines.add(
        tag,
        {
          category: 'soft-starter',
          minAmps: s.softStarter?.minAmps ?? s.flcAmps,
          volts: v,
          ...(s.softStarter?.bypass ? { internalBypass: true } : {}),
        },
        1,
      );
      return ss?.ratings.builtInOverload === true;
    }
    case 'VFD': {
      const duty = s.vfd?.duty ?? 'normal';
      const amps = s.vfd?.minOutputAmps ?? s.flaAmps;
      lines.add(
        tag,
        duty === 'heavy' ? { category: 'vfd', minHeavyDutyAmps: amps, volts: v } : { category: 'vfd', minNormalDutyAmps: amps, volts: v },
        1,
      );
      if (s.vfd && s.vfd.outputFilter !== 'none')
        lines.add(tag, { category: 'output-filter', kind: s.vfd.outputFilter, minAmps: amps, volts: v }, 1);
      return s.overload.providedByDrive;
    }
    case 'dc-drive':
      lines.add(tag, { category: 'dc-drive', minAmps: s.flcAmps, volts: v, ...(minHp ? { minHp } : {}) }, 1);
      return true;
    case 'dc-armature-resistance':
      lines.add(tag, { category: 'dc-starter', minAmps: s.flcAmps, volts: v, builtInOverload: true, ...(minHp ? { minHp } : {}) }, 1);
      return true;
    default:
      return false;
  }
}

/**
 * Overload relay(s): dial set at the current the relay carries (the selection's overload.relay: wye-delta
 * FLA/√3 in the delta windings, common practice; part-winding FLA/2 per half-winding, NEC 430.4).
 */
export function addOverloadRelays(ctx: BomContext, k: Bucket): void {
  const { s, tag } = k;
  const relay = relayOf(s);
  ctx.lines.add(
    tag,
    {
      category: 'overload-relay',
      settingAmps: Math.min(relay.settingAmps, relay.maxAmps),
      tripClass: s.overload.tripClass,
      ...(s.relays.phaseLossByOverload ? { detectsPhaseLoss: true } : {}),
    },
    relay.count,
  );
}

/** Fuses of the first class in the order the catalogue holds at the rating, with a fuse holder or (per bucket) a fused disconnect. */
function addBranchFuses(ctx: BomContext, k: Bucket): void {
  const { lines, fuseClasses } = ctx;
  const { s, tag, volts: v, poles, hpVolts } = k;
  const rating = s.scpd.ratingAmps;
  const timeDelay = s.scpd.type === 'dual-element-fuse';
  const fuseClass = fuseClasses.find(
    (fc) => lines.find({ category: 'fuse', exactAmps: rating, fuseClass: fc, timeDelay, volts: v }) !== null,
  );
  if (!fuseClass) {
    lines.addFirst(
      tag,
      fuseClasses.map((fc): Requirement => ({ category: 'fuse', exactAmps: rating, fuseClass: fc, timeDelay, volts: v })),
      poles,
    );
    return;
  }
  lines.add(tag, { category: 'fuse', exactAmps: rating, fuseClass, timeDelay, volts: v }, poles);
  if (ctx.perBucketDisconnect) {
    const minHp = s.disconnect.minHp !== null && hpVolts ? { minHp: { volts: hpVolts, hp: s.disconnect.minHp } } : {};
    lines.add(
      tag,
      { category: 'fused-disconnect', fuseClass, minAmps: Math.max(rating, s.disconnect.minAmps), minPoles: poles, volts: v, ...minHp },
      1,
    );
  } else {
    lines.add(tag, { category: 'fuse-holder', fuseClass, minAmps: rating, poles, volts: v }, 1);
  }
}

/** Branch short-circuit and ground-fault protection: the breaker, motor-circuit protector or fuses the selection sized. */
export function addBranchProtection(ctx: BomContext, k: Bucket): void {
  const { s, tag, volts: v, poles } = k;
  const rating = s.scpd.ratingAmps;
  if (s.scpd.type === 'inverse-time-breaker') {
    ctx.lines.add(tag, { category: 'inverse-time-breaker', exactAmps: rating, poles, volts: v }, 1);
  } else if (s.scpd.type === 'instantaneous-trip-breaker') {
    // continuous rating ≥ 115 % of FLC where it is the disconnecting means (NEC 2023 430.110(A))
    ctx.lines.add(
      tag,
      { category: 'motor-circuit-protector', minAmps: round2(s.flcAmps * 1.15), maxTripSettingAmps: rating, minPoles: poles, volts: v },
      1,
    );
  } else {
    addBranchFuses(ctx, k);
  }
}

/** Protective relays: phase loss and reversal (46/47), DC field loss, dynamic braking resistors. */
export function addProtectiveRelays(ctx: BomContext, k: Bucket): void {
  const { lines, tally } = ctx;
  const { s, tag, volts: v, minHp } = k;
  const needLoss = s.relays.phaseLoss && !s.relays.phaseLossByOverload;
  if (needLoss || s.relays.phaseReversal) {
    const relay = lines.add(
      tag,
      {
        category: 'phase-monitor-relay',
        volts: v,
        ...(needLoss ? { detectsPhaseLoss: true } : {}),
        ...(s.relays.phaseReversal ? { detectsPhaseReversal: true } : {}),
      },
      1,
    );
    tally.sealedVa += relay?.ratings.va ?? 0;
  }
  if (s.dc?.fieldLossProtection) lines.add(tag, { category: 'field-loss-relay', volts: v }, 1);
  if (s.dc?.dynamicBraking) {
    if (minHp) lines.add(tag, { category: 'braking-resistor', minHp, volts: v }, 1);
    else
      lines.unmatched(
        tag,
        'braking-resistor',
        1,
        `Dynamic braking resistors: motor hp at a catalogued DC voltage (${HP_VOLTS.join(', ')} V) needed; have ${s.hp ?? '—'} hp at ${v} V`,
      );
  }
}

/** Motor-lead and control terminals and wire. */
export function addTerminalsAndWire(ctx: BomContext, k: Bucket): void {
  const { lines, wireFtPerConductor: wireFt } = ctx;
  const { s, tag } = k;
  const t = s.starter.type;
  const leads =
    (s.supply === 'ac3' ? 3 : 2) * (t === 'wye-delta' || t === 'part-winding' || t === 'two-speed' ? 2 : 1) +
    (s.dc && s.dc.field !== 'series' ? 2 : 0);
  const cond = parseConductor(s.conductor.size);
  if (cond) {
    // one terminal and one run per conductor of each parallel set; each terminal carries its share
    lines.add(
      tag,
      { category: 'terminal-block', kind: 'feed-through', wireSize: cond.size, minAmps: round2(s.conductor.minAmpacity / cond.sets) },
      leads * cond.sets,
    );
    lines.add(tag, { category: 'terminal-block', kind: 'ground', wireSize: cond.size }, 1);
    if (s.conductor.material === 'cu')
      lines.add(tag, { category: 'wire', kind: 'power', wireSize: cond.size }, Math.ceil(leads * cond.sets * wireFt));
    else
      lines.unmatched(tag, 'wire', Math.ceil(leads * cond.sets * wireFt), `Wire: aluminum ${cond.size} (the catalogue's wire is copper)`);
  } else {
    lines.unmatched(
      tag,
      'terminal-block',
      leads + 1,
      `Terminal blocks: conductor size "${s.conductor.size}" is not a known AWG/kcmil size`,
    );
    lines.unmatched(tag, 'wire', Math.ceil(leads * wireFt), `Wire: conductor size "${s.conductor.size}" is not a known AWG/kcmil size`);
  }
  const points = controlPoints(t);
  lines.add(tag, { category: 'terminal-block', kind: 'feed-through', wireSize: ctx.controlWire.wireSize! }, points);
  lines.add(tag, ctx.controlWire, ctx.controlWireFtPerBucket);
}

/** Every part of one motor's bucket, in the order the bill of materials lists them; the panel's tally grows with it.
 *  A motor on a group's branch circuit (430.53) has no branch device of its own: the group's serves it. */
export function addBucketParts(ctx: BomContext, s: LoadSelection, onGroupDevice = false): void {
  const k = bucketOf(s);
  const { tally } = ctx;
  tally.minDepthMm = Math.max(tally.minDepthMm, bucketMinDepthMm(s));
  const coilsVa = addContactors(ctx, k);
  const overloadBuiltIn = addElectronicController(ctx, k);
  if (!overloadBuiltIn && s.starter.type !== 'dc-drive' && s.starter.type !== 'dc-armature-resistance') addOverloadRelays(ctx, k);
  if (!onGroupDevice) addBranchProtection(ctx, k);
  addProtectiveRelays(ctx, k);
  addControlParts(ctx, k.tag, s.starter.type, coilsVa, s.controlScheme);
  addTerminalsAndWire(ctx, k);
}

/** A group's one branch short-circuit and ground-fault protective device (430.53), listed under the group's tag,
 *  on the circuit of its largest motor (voltage, poles). */
export function addGroupBranchProtection(
  ctx: BomContext,
  group: string,
  largest: LoadSelection,
  device: { type: LoadSelection['scpd']['type']; ratingAmps: number },
): void {
  const s: LoadSelection = {
    ...largest,
    tag: group,
    scpd: { ...largest.scpd, type: device.type, ratingAmps: device.ratingAmps },
    disconnect: { ...largest.disconnect, minAmps: device.ratingAmps, minHp: null },
  };
  addBranchProtection(ctx, bucketOf(s));
}
