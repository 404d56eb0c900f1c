// What every stage of the bill of materials shares: the line builder, the options in force, and the
// panel's running tally (control power and the depth the devices need) the panel stages size from.
import type { Requirement } from '../../schemas/catalogue';
import type { BranchFuseClass } from '../../standards/fuse-classes';
import type { LineBuilder } from './lines';

export interface PanelTally {
  /** sealed VA of every control load counted so far */
  sealedVa: number;
  /** the largest contactor coil inrush, VA */
  largestInrushVa: number;
  minDepthMm: number;
}

export interface BomContext {
  lines: LineBuilder;
  controlVolts: number;
  /** order in which fuse classes are tried for fused buckets */
  fuseClasses: readonly BranchFuseClass[];
  /** a fused disconnect in every fused bucket (else a fuse holder) */
  perBucketDisconnect: boolean;
  /** motor-lead wire per conductor, ft */
  wireFtPerConductor: number;
  /** control wire per bucket, ft */
  controlWireFtPerBucket: number;
  controlWire: Requirement;
  tally: PanelTally;
}
