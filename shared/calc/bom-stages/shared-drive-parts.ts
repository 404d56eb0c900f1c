// The bill of materials of a drive that feeds several motors (shared/calc/shared-drives): one bucket for the
// drive (the drive sized for the sum of its motors' FLA, its output filter, its input protective device and
// input wire, its door devices), and one bucket per motor with its output contactor (an auxiliary contact for
// the interlock with the drive's enable), its own overload relay (430.32) and its own conductors (430.22).
import type { LoadSelection, SharedDrive } from '../../schemas/selection';
import { disconnectMinAmps } from '../../standards/nec-430-110-disconnect';
import { round2 } from '../round';
import {
  addBranchProtection,
  addContactors,
  addElectronicController,
  addOverloadRelays,
  addProtectiveRelays,
  addTerminalsAndWire,
  bucketOf,
} from './bucket-parts';
import type { BomContext } from './context';
import { addControlParts } from './control-scheme';
import { bucketMinDepthMm } from './footprint';
import { parseConductor } from './normalise';

/** The drive's bucket as a selection the bucket stages read: the drive's ratings in place of one motor's. */
export function driveBucketView(d: SharedDrive, first: LoadSelection, members: readonly LoadSelection[]): LoadSelection {
  const hps = members.map((m) => m.hp);
  const hp = hps.every((x) => x !== null) ? round2(hps.reduce((n: number, x) => n + (x ?? 0), 0)) : null;
  const p = d.input.protection;
  return {
    ...first,
    tag: d.tag,
    hp,
    flcAmps: d.input.amps,
    flaAmps: d.output.minOutputAmps,
    starter: {
      ...first.starter,
      type: 'VFD',
      nemaSize: null,
      iecCategory: null,
      iecAmps: null,
      reversingContactors: false,
      interlock: false,
    },
    vfd: first.vfd
      ? { ...first.vfd, duty: d.output.duty, minOutputAmps: d.output.minOutputAmps, outputFilter: d.output.outputFilter }
      : null,
    overload: { ...first.overload, providedByDrive: false, relay: undefined },
    scpd: { type: p.type, maxPercent: p.maxPercent, ratingAmps: p.ratingAmps, computedMaxAmps: p.computedMaxAmps, basis: p.basis },
    // 430.110(C)(1): the motors together (their currents and horsepower summed)
    disconnect: { minAmps: disconnectMinAmps(d.input.amps), minHp: hp, basis: 'NEC 430.110(C)(1), 430.128' },
    relays: { phaseLoss: false, phaseReversal: false, phaseLossByOverload: false },
    conductor: { ...first.conductor, size: d.input.conductor.size, minAmpacity: d.input.conductor.minAmpacity, motorLeads: undefined },
  };
}

/** A motor on the shared drive as a bucket of an output contactor and its overload relay, with its own conductors. */
export function memberBucketView(s: LoadSelection, d: SharedDrive): LoadSelection {
  const m = d.motors.find((x) => x.tag === s.tag);
  return {
    ...s,
    starter: {
      ...s.starter,
      type: 'FVNR',
      nemaSize: null,
      iecCategory: 'AC-3',
      iecAmps: m?.outputContactor.minAc3Amps ?? s.flaAmps,
      reversingContactors: false,
      interlock: false,
    },
    vfd: null,
    overload: { ...s.overload, providedByDrive: false, relay: undefined },
    conductor: m ? { ...s.conductor, size: m.conductor.size, minAmpacity: m.conductor.minAmpacity, motorLeads: undefined } : s.conductor,
  };
}

/** Every part of a shared drive and its motors' buckets; the panel's tally grows with them. */
export function addSharedDriveParts(ctx: BomContext, d: SharedDrive, selections: readonly LoadSelection[]): void {
  const members = d.motors.flatMap((m) => selections.filter((s) => s.tag === m.tag));
  const first = members[0];
  if (!first) return;
  const drive = driveBucketView(d, first, members);
  const k = bucketOf(drive);
  ctx.tally.minDepthMm = Math.max(ctx.tally.minDepthMm, bucketMinDepthMm(drive));
  addElectronicController(ctx, k);
  addBranchProtection(ctx, k);
  const cond = parseConductor(d.input.conductor.size);
  const conductors = drive.supply === 'ac3' ? 3 : 2;
  if (cond && drive.conductor.material === 'cu')
    ctx.lines.add(
      d.tag,
      { category: 'wire', kind: 'power', wireSize: cond.size },
      Math.ceil(conductors * cond.sets * ctx.wireFtPerConductor),
    );
  else ctx.lines.unmatched(d.tag, 'wire', Math.ceil(conductors * ctx.wireFtPerConductor), `Wire: drive input ${d.input.conductor.size}`);
  addControlParts(ctx, d.tag, 'VFD', 0, first.controlScheme);
  for (const s of members) {
    const view = memberBucketView(s, d);
    const mk = bucketOf(view);
    // the contactor with its overload; no branch device of its own (the drive's input device protects the circuit)
    const coilsVa = addContactors(ctx, mk);
    addOverloadRelays(ctx, mk);
    addProtectiveRelays(ctx, mk);
    // the output contactor closes from the drive's own run command, interlocked with its enable: a run light only
    addControlParts(ctx, s.tag, 'FVNR', coilsVa, 'two-wire');
    addTerminalsAndWire(ctx, mk);
  }
}
