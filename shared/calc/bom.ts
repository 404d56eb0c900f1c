// Bill of materials: from a panel's selections to priced catalogue lines.
// Rule: for every need, the smallest adequate ACTIVE catalogue item meeting every required rating;
// where nothing fits, an unmatched line stating the ratings it needs — never a guess.
// Pure TypeScript: no Node or DOM imports. The stages live in shared/calc/bom-stages/:
//   match (the requirement check) → control scheme → bucket parts → panel parts → enclosure (by the backplate
//   layout of shared/calc/layout) → totals; diff.
import type { BomLine, BomTotals, CatalogueItem, LabourUnit } from '../schemas/catalogue';
import type { LoadSelection, PanelRollup } from '../schemas/selection';
import { BRANCH_FUSE_CLASS_ORDER, type BranchFuseClass } from '../standards/fuse-classes';
import { controlWireSize } from '../standards/control-schemes';
import { ENCLOSURE_DEPTH, WIRE_ALLOWANCE_FT } from '../standards/panel-layout';
import { addBucketParts, addGroupBranchProtection } from './bom-stages/bucket-parts';
import type { BomContext } from './bom-stages/context';
import { chooseEnclosure, depthByKindMm, type EnclosureNeed } from './bom-stages/enclosure';
import { LineBuilder } from './bom-stages/lines';
import { indexCatalogue } from './bom-stages/match';
import { addControlTransformer, addMainParts, addOtherSourceParts, type ControlPower } from './bom-stages/panel-parts';
import { addSharedDriveParts } from './bom-stages/shared-drive-parts';
import { computeTotals } from './bom-stages/totals';

export type { Requirement } from '../schemas/catalogue';
export { describeRequirement } from './bom-stages/describe';
export { type BomDiff, type DiffEntry, type DiffSide, diffBoms } from './bom-stages/diff';
export { controlPoints, pilotScheme } from './bom-stages/control-scheme';
export { type LabourTable, swappedLine, unitLabourHours } from './bom-stages/lines';
export {
  type CatalogueIndex,
  indexCatalogue,
  lineServes,
  lineShortfalls,
  satisfies,
  selectItem,
  shortfalls,
  usableAreaMm2,
} from './bom-stages/match';
export { normaliseEnclosureType, normaliseWireSize, parseConductor } from './bom-stages/normalise';
export { computeTotals, extendedCost, extendedLabourHours, type RollupLine, rollupByCode } from './bom-stages/totals';

export interface BuildBomOptions {
  /** 'per-bucket' adds a fused disconnect to fused buckets (a breaker serves as the bucket's disconnecting means) */
  bucketDisconnect?: 'none' | 'per-bucket';
  /** order in which fuse classes are tried for fused buckets */
  fuseClasses?: BranchFuseClass[];
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
  control: ControlPower;
  /** what the enclosure was chosen by: the layout's area, the depth, the sections */
  enclosure: EnclosureNeed;
}

/** The options in force, the line builder over the catalogue, and an empty tally. */
function bomContext(input: BuildBomInput): BomContext {
  const opts = input.options ?? {};
  const controlVolts = input.controlVolts ?? 120;
  const labour = new Map(input.labourUnits.map((u) => [u.key, u]));
  return {
    lines: new LineBuilder(indexCatalogue(input.catalogue), labour),
    controlVolts,
    fuseClasses: opts.fuseClasses ?? BRANCH_FUSE_CLASS_ORDER,
    perBucketDisconnect: opts.bucketDisconnect === 'per-bucket',
    wireFtPerConductor: opts.wireFtPerConductor ?? WIRE_ALLOWANCE_FT.perMotorLeadConductor,
    controlWireFtPerBucket: opts.controlWireFtPerBucket ?? WIRE_ALLOWANCE_FT.controlPerBucket,
    controlWire: { category: 'wire', kind: 'control', wireSize: controlWireSize(controlVolts) },
    tally: { sealedVa: 0, largestInrushVa: 0, minDepthMm: ENCLOSURE_DEPTH.minMm },
  };
}

export function buildBom(input: BuildBomInput): BuildBomResult {
  const ctx = bomContext(input);
  // a drive feeding several motors: one bucket for the drive, one per motor for its output contactor and overload
  const drives = (input.panel.sharedDrives ?? []).filter((d) => d.motors.every((m) => input.selections.some((s) => s.tag === m.tag)));
  const onDrive = new Set(drives.flatMap((d) => d.motors.map((m) => m.tag)));
  // motors on one branch circuit (430.53): the group's device once, in place of each motor's own
  const groups = (input.panel.groups ?? []).filter((g) => g.device !== null);
  const grouped = new Set(groups.flatMap((g) => g.motors));
  for (const s of input.selections) if (!onDrive.has(s.tag)) addBucketParts(ctx, s, grouped.has(s.tag));
  for (const d of drives) addSharedDriveParts(ctx, d, input.selections);
  for (const g of groups) {
    const members = input.selections.filter((s) => g.motors.includes(s.tag));
    const largest = members.reduce<LoadSelection | null>((a, s) => (a === null || s.flcAmps > a.flcAmps ? s : a), null);
    if (largest && g.device) addGroupBranchProtection(ctx, g.group, largest, g.device);
  }
  const sources = input.panel.otherSources ?? [];
  for (const src of sources) addOtherSourceParts(ctx, src, input.supply);
  const hasMotors = input.selections.length > 0;
  const mainAmps =
    hasMotors && input.panel.feeder.ocpdMaxAmps > 0
      ? addMainParts(
          ctx,
          input.panel.feeder,
          input.supply,
          input.options?.main ?? 'breaker',
          input.selections.length + drives.length + sources.length,
        )
      : 0;
  const control = addControlTransformer(ctx, input.supply.volts);
  const enclosure: EnclosureNeed = hasMotors
    ? chooseEnclosure(ctx, mainAmps, input.enclosureType)
    : { requiredAreaMm2: 0, minDepthMm: depthByKindMm(ctx.tally, mainAmps), sections: 0 };
  const lines = ctx.lines.lines;
  return { lines, totals: computeTotals(lines, input.markupPercent ?? 0, input.labourRatePerHour ?? 0), control, enclosure };
}
