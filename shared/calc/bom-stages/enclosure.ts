// Stage 5 of the bill of materials, the enclosure: the back-panel area and depth the panel's contents need
// (shared/standards/panel-layout.ts), and the enclosure chosen for them. The choice is in one function,
// `chooseEnclosure`, so a layout drawn on the backplate can take its place.
import { PANEL_BUCKET, type Requirement } from '../../schemas/catalogue';
import {
  ENCLOSURE_DEPTH,
  LAYOUT_ALLOWANCE,
  PANEL_ITEMS_AREA_BY_MAIN_AMPS,
  stepValue,
  TERMINAL_AREA_MM2,
} from '../../standards/panel-layout';
import type { BomContext, PanelTally } from './context';
import { describeRequirement } from './describe';
import { usableAreaMm2 } from './match';
import { normaliseEnclosureType } from './normalise';

export interface EnclosureNeed {
  requiredAreaMm2: number;
  minDepthMm: number;
}

/** The back-panel area (devices, panel items and terminals, × the layout allowance) and depth the contents need. */
export function enclosureNeed(tally: PanelTally, mainAmps: number): EnclosureNeed {
  const panelItemsArea = stepValue(PANEL_ITEMS_AREA_BY_MAIN_AMPS, mainAmps);
  const requiredAreaMm2 = Math.round((tally.footprintMm2 + panelItemsArea + tally.terminalCount * TERMINAL_AREA_MM2) * LAYOUT_ALLOWANCE);
  const minDepthMm =
    mainAmps > ENCLOSURE_DEPTH.largeMainAboveAmps ? Math.max(tally.minDepthMm, ENCLOSURE_DEPTH.largeMainMm) : tally.minDepthMm;
  return { requiredAreaMm2, minDepthMm };
}

/**
 * The enclosure for the need: the smallest of the type with the area and depth; else a lineup of the
 * largest section of the type that has the depth; else an unmatched line stating what it needs.
 */
export function chooseEnclosure(ctx: BomContext, need: EnclosureNeed, enclosureType: string): void {
  const { lines } = ctx;
  const nemaType = normaliseEnclosureType(enclosureType);
  const encReq: Requirement = { category: 'enclosure', nemaType, minUsableAreaMm2: need.requiredAreaMm2, minDepthMm: need.minDepthMm };
  if (lines.find(encReq)) {
    lines.add(PANEL_BUCKET, encReq, 1);
    return;
  }
  const largest = lines.find({ category: 'enclosure', nemaType, minDepthMm: need.minDepthMm, prefer: 'largest' });
  if (!largest || usableAreaMm2(largest) <= 0) {
    lines.unmatched(PANEL_BUCKET, 'enclosure', 1, describeRequirement(encReq));
    return;
  }
  const sections = Math.ceil(need.requiredAreaMm2 / usableAreaMm2(largest));
  // a swap keeps the section count, so each section must hold its share of the area
  lines.addItem(PANEL_BUCKET, largest, sections, [
    { category: 'enclosure', nemaType, minDepthMm: need.minDepthMm, minUsableAreaMm2: Math.ceil(need.requiredAreaMm2 / sections) },
  ]);
}
