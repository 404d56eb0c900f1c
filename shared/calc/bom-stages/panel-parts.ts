// Stage 4 of the bill of materials, the panel's own parts: a bucket for each transformer or DC supply that
// feeds motors at another voltage, the main (breaker, or fused disconnect), the distribution block and the
// feeder wire, and the control power transformer with its fuses.
import { PANEL_BUCKET, type Requirement } from '../../schemas/catalogue';
import type { OtherSource, PanelRollup } from '../../schemas/selection';
import { CONTROL_TRANSFORMER_FUSE_CLASS_ORDER, MAIN_FUSE_CLASS } from '../../standards/fuse-classes';
import { POWER_TRANSFORMER_DEPTH, WIRE_ALLOWANCE_FT } from '../../standards/panel-layout';
import { sourceBucket } from '../other-sources';
import { round2 } from '../round';
import type { BomContext } from './context';
import { parseConductor } from './normalise';

export interface PanelSupply {
  volts: number;
  phases: number;
}

/**
 * A transformer or DC supply for motors at another voltage (shared/calc/other-sources), in a bucket of its
 * own: the unit, its primary device and (transformers) its secondary device per Table 450.3(B).
 */
export function addOtherSourceParts(ctx: BomContext, src: OtherSource, supply: PanelSupply): void {
  const { lines, tally } = ctx;
  const poles = src.phases === 3 ? 3 : 2;
  const bucket = sourceBucket(src);
  if (src.kind === 'transformer') {
    lines.add(
      bucket,
      {
        category: 'power-transformer',
        kind: src.phases === 3 ? 'three-phase' : 'single-phase',
        minVa: (src.kva ?? src.loadKva) * 1000,
        secondaryVolts: src.secondaryVolts,
        volts: supply.volts,
      },
      1,
    );
    lines.add(bucket, { category: 'inverse-time-breaker', exactAmps: src.primaryProtection.ratingAmps, poles, volts: supply.volts }, 1);
    if (src.secondaryProtection)
      lines.add(
        bucket,
        { category: 'inverse-time-breaker', exactAmps: src.secondaryProtection.ratingAmps, poles, volts: src.secondaryVolts },
        1,
      );
    tally.minDepthMm = Math.max(tally.minDepthMm, POWER_TRANSFORMER_DEPTH.minDepthMm);
  } else {
    lines.add(
      bucket,
      { category: 'dc-power-supply', minAmps: src.secondaryAmps, secondaryVolts: src.secondaryVolts, volts: supply.volts },
      1,
    );
    lines.add(bucket, { category: 'inverse-time-breaker', exactAmps: src.primaryProtection.ratingAmps, poles, volts: supply.volts }, 1);
  }
}

/**
 * The panel main, its distribution block (one branch connection per bucket) and the wire between them.
 * Returns the main's rating, A (0 where the panel has no main).
 */
export function addMainParts(
  ctx: BomContext,
  feeder: PanelRollup['feeder'],
  supply: PanelSupply,
  main: 'breaker' | 'fused-disconnect',
  branches: number,
): number {
  const { lines } = ctx;
  const P = PANEL_BUCKET;
  const panelPoles = supply.phases === 1 ? 2 : 3;
  const ocpdMax = feeder.ocpdMaxAmps;
  const minAmpacity = feeder.minAmpacity;
  const mainBounds = { maxAmps: ocpdMax, ...(minAmpacity > 0 && minAmpacity <= ocpdMax ? { minAmps: round2(minAmpacity) } : {}) };
  let mainAmps: number;
  if (main === 'breaker') {
    // the largest not above the 430.62(A) limit, and at least the feeder's minimum ampacity (NEC 430.24): a
    // main below the panel's load would trip in service (common practice)
    const breaker = lines.add(P, { category: 'main-breaker', ...mainBounds, poles: panelPoles, volts: supply.volts, prefer: 'largest' }, 1);
    mainAmps = breaker?.ratings.amps ?? ocpdMax;
  } else {
    const fuse = lines.add(
      P,
      { category: 'fuse', ...mainBounds, fuseClass: MAIN_FUSE_CLASS, timeDelay: true, volts: supply.volts, prefer: 'largest' },
      panelPoles,
    );
    mainAmps = fuse?.ratings.amps ?? ocpdMax;
    lines.add(P, { category: 'main-disconnect', minAmps: mainAmps, fuseClass: MAIN_FUSE_CLASS, poles: panelPoles, volts: supply.volts }, 1);
  }
  const pdbReq: Requirement = { category: 'power-distribution-block', minAmps: feeder.minAmpacity, poles: panelPoles, volts: supply.volts };
  const pdb = lines.find(pdbReq);
  lines.add(P, pdbReq, pdb ? Math.ceil(branches / (pdb.ratings.outputs ?? 1)) : 1);
  const conductor = parseConductor(feeder.conductorSize);
  // main to distribution block: one conductor per pole and parallel set, 4 ft each (common practice estimate)
  const perConductor = WIRE_ALLOWANCE_FT.mainToDistributionPerConductor;
  if (conductor) lines.add(P, { category: 'wire', kind: 'power', wireSize: conductor.size }, panelPoles * conductor.sets * perConductor);
  else
    lines.unmatched(
      P,
      'wire',
      panelPoles * perConductor,
      `Wire: feeder conductor size "${feeder.conductorSize}" is not a known AWG/kcmil size`,
    );
  return mainAmps;
}

/**
 * Largest fuse for a control transformer side, % of its rated current: 125 % at ≥ 9 A, 167 % below
 * (NEC 2023 Table 450.3(B)); a primary under 2 A may go to 500 % (NEC 2023 430.72(C)(4)). From memory.
 */
function transformerFuseLimitAmps(ratedAmps: number, primary: boolean): number {
  const pct = ratedAmps >= 9 ? 125 : primary && ratedAmps < 2 ? 500 : 167;
  return (ratedAmps * pct) / 100;
}

export interface ControlPower {
  sealedVa: number;
  largestInrushVa: number;
  /** the transformer's inrush selection: √(sealed² + largest inrush²) */
  selectionVa: number;
}

/**
 * The control power transformer: continuous ≥ total sealed VA; inrush check √(sealed² + inrush²) (common
 * practice), with its primary and secondary fuses and holders.
 */
export function addControlTransformer(ctx: BomContext, supplyVolts: number): ControlPower {
  const { lines, controlVolts, tally } = ctx;
  const P = PANEL_BUCKET;
  const { sealedVa, largestInrushVa } = tally;
  const selectionVa = round2(Math.sqrt(sealedVa ** 2 + largestInrushVa ** 2));
  const power = { sealedVa: round2(sealedVa), largestInrushVa, selectionVa };
  if (sealedVa <= 0) return power;
  const cpt = lines.add(
    P,
    {
      category: 'control-transformer',
      minVa: round2(sealedVa),
      minInrushVa: selectionVa,
      secondaryVolts: controlVolts,
      volts: supplyVolts,
    },
    1,
  );
  if (!cpt?.ratings.va) return power;
  const primaryAmps = cpt.ratings.va / supplyVolts;
  const secondaryAmps = cpt.ratings.va / controlVolts;
  // largest fuse not above the 450.3(B) limit that still carries the rated current
  const fuseReqs = (amps: number, primary: boolean): Requirement[] =>
    CONTROL_TRANSFORMER_FUSE_CLASS_ORDER.map((fc) => ({
      category: 'fuse',
      fuseClass: fc,
      timeDelay: true,
      minAmps: round2(amps),
      maxAmps: round2(transformerFuseLimitAmps(amps, primary)),
      volts: primary ? supplyVolts : controlVolts,
      prefer: 'largest',
    }));
  const pf = lines.addFirst(P, fuseReqs(primaryAmps, true), 2);
  lines.add(
    P,
    {
      category: 'fuse-holder',
      fuseClass: pf?.ratings.fuseClass ?? 'CC',
      poles: 2,
      minAmps: pf?.ratings.amps ?? primaryAmps,
      volts: supplyVolts,
    },
    1,
  );
  const sf = lines.addFirst(P, fuseReqs(secondaryAmps, false), 1);
  lines.add(
    P,
    {
      category: 'fuse-holder',
      fuseClass: sf?.ratings.fuseClass ?? 'CC',
      poles: 1,
      minAmps: sf?.ratings.amps ?? secondaryAmps,
      volts: controlVolts,
    },
    1,
  );
  return power;
}
