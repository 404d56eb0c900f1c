// Control schemes of the bill of materials: the door devices, control-point terminals and contactors each
// starter type takes, and the control fuse of a bucket. Common practice for a motor-control panel, not a
// table of any standard; a shop with other habits changes them here.

import type { StarterType } from '../schemas/selection';

export const CONTROL_SCHEMES_SOURCE = 'common practice';

/** A door device's function, as the catalogue's pilot devices state it. */
export type PilotFunction = 'start' | 'stop' | 'forward' | 'reverse' | 'fast' | 'slow' | 'hand-off-auto' | 'run-light' | 'fault-light';

/** Door devices of each starter type's control scheme: [function, quantity] (common practice). */
export const PILOT_DEVICES: Record<StarterType, ReadonlyArray<readonly [PilotFunction, number]>> = {
  FVNR: [
    ['start', 1],
    ['stop', 1],
    ['run-light', 1],
  ],
  FVR: [
    ['forward', 1],
    ['reverse', 1],
    ['stop', 1],
    ['run-light', 2],
  ],
  'two-speed': [
    ['fast', 1],
    ['slow', 1],
    ['stop', 1],
    ['run-light', 2],
  ],
  'wye-delta': [
    ['start', 1],
    ['stop', 1],
    ['run-light', 1],
  ],
  'part-winding': [
    ['start', 1],
    ['stop', 1],
    ['run-light', 1],
  ],
  RVSS: [
    ['start', 1],
    ['stop', 1],
    ['run-light', 1],
  ],
  VFD: [
    ['hand-off-auto', 1],
    ['run-light', 1],
    ['fault-light', 1],
  ],
  'dc-drive': [
    ['hand-off-auto', 1],
    ['run-light', 1],
    ['fault-light', 1],
  ],
  'dc-armature-resistance': [
    ['start', 1],
    ['stop', 1],
    ['run-light', 1],
  ],
};

/** The catalogue kind of each door device. */
export const PILOT_KIND: Record<PilotFunction, 'push-button' | 'selector-switch' | 'pilot-light'> = {
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

/** Control-point terminals taken to field devices or the plant control system (common practice estimate). */
export const CONTROL_POINTS: Record<StarterType, number> = {
  FVNR: 4,
  RVSS: 4,
  'wye-delta': 4,
  'part-winding': 4,
  'dc-armature-resistance': 4,
  FVR: 6,
  'two-speed': 6,
  VFD: 8,
  'dc-drive': 8,
};

/** Contactors of each starter type's power circuit (a drive, soft starter or DC starter has none of its own). */
export const CONTACTORS: Record<StarterType, number> = {
  FVNR: 1,
  FVR: 2,
  'two-speed': 2,
  'part-winding': 2,
  'wye-delta': 3,
  RVSS: 0,
  VFD: 0,
  'dc-drive': 0,
  'dc-armature-resistance': 0,
};

/** A bucket's control fuse: at least 250 % of the bucket's sealed control current, and at least 2 A (common practice). */
export const CONTROL_FUSE = { percentOfSealedCurrent: 250, minAmps: 2, fuseClass: 'CC', timeDelay: true } as const;

/** Control wire: 14 AWG for a control circuit of 100 V or more, 16 AWG below (common practice). */
export function controlWireSize(controlVolts: number): '14' | '16' {
  return controlVolts >= 100 ? '14' : '16';
}
