// Stage 2 of the bill of materials, the control scheme: the door devices, control-point terminals and
// contactors of each starter type (shared/standards/control-schemes.ts), and a bucket's control fusing.
import type { LoadSelection, StarterType } from '../../schemas/selection';
import { CONTACTORS, CONTROL_FUSE, CONTROL_POINTS, PILOT_DEVICES, PILOT_KIND, type PilotFunction } from '../../standards/control-schemes';
import { round2 } from '../round';
import type { BomContext } from './context';

/**
 * Door devices of each starter type's control scheme: [function, quantity], following the motor's
 * control-scheme answer. Common practice. No scheme: a selection stored before the answer existed keeps
 * the devices it was priced with (the starter type's table row).
 */
export function pilotScheme(type: StarterType, scheme?: LoadSelection['controlScheme']): Array<[PilotFunction, number]> {
  const drive = type === 'VFD' || type === 'dc-drive';
  if (scheme === 'two-wire')
    return drive
      ? [
          ['run-light', 1],
          ['fault-light', 1],
        ]
      : [['run-light', type === 'FVR' || type === 'two-speed' ? 2 : 1]];
  if (scheme === 'three-wire' && drive)
    return [
      ['start', 1],
      ['stop', 1],
      ['run-light', 1],
      ['fault-light', 1],
    ];
  // hand-off-auto: Hand runs the coil on the selector's maintained contact; a two-direction starter keeps its
  // stop and direction push-buttons for Hand (common practice)
  if (scheme === 'hand-off-auto' && !drive) {
    if (type === 'FVR' || type === 'two-speed') return [['hand-off-auto', 1], ...pilotScheme(type, 'three-wire')];
    return [
      ['hand-off-auto', 1],
      ['run-light', 1],
    ];
  }
  return PILOT_DEVICES[type].map(([fn, qty]) => [fn, qty]);
}

/** Control-point terminals taken to field devices or the plant control system. Common practice estimate. */
export function controlPoints(type: StarterType): number {
  return CONTROL_POINTS[type];
}

/** Contactors of a starter type's power circuit. */
export function contactorCount(type: StarterType): number {
  return CONTACTORS[type];
}

/** A bucket's control fuse, A: 250 % of its sealed control current, at least 2 A (common practice). */
export function controlFuseAmps(bucketSealedVa: number, controlVolts: number): number {
  return Math.max(CONTROL_FUSE.minAmps, round2(((CONTROL_FUSE.percentOfSealedCurrent / 100) * bucketSealedVa) / controlVolts));
}

/**
 * The door devices of the bucket's scheme and its control fuse with holder. `coilsVa` is the sealed VA of
 * the bucket's contactor coils; the pilot lights' VA is added to it and to the panel's tally.
 */
export function addControlParts(
  ctx: BomContext,
  tag: string,
  type: StarterType,
  coilsVa: number,
  scheme?: LoadSelection['controlScheme'],
): void {
  const { lines, controlVolts, tally } = ctx;
  let bucketVa = coilsVa;
  for (const [fn, qty] of pilotScheme(type, scheme)) {
    const kind = PILOT_KIND[fn];
    const dev = lines.add(
      tag,
      { category: 'pilot-device', kind, function: fn, ...(kind === 'pilot-light' ? { exactVolts: controlVolts } : {}) },
      qty,
    );
    if (dev?.ratings.va) {
      tally.sealedVa += qty * dev.ratings.va;
      bucketVa += qty * dev.ratings.va;
    }
  }
  const fuseAmps = controlFuseAmps(bucketVa, controlVolts);
  lines.add(
    tag,
    { category: 'fuse', fuseClass: CONTROL_FUSE.fuseClass, timeDelay: CONTROL_FUSE.timeDelay, minAmps: fuseAmps, volts: controlVolts },
    1,
  );
  lines.add(tag, { category: 'fuse-holder', fuseClass: CONTROL_FUSE.fuseClass, poles: 1, minAmps: fuseAmps, volts: controlVolts }, 1);
}
