// Stage 5 of the bill of materials, the enclosure: chosen by laying the panel's parts out on its backplate
// (shared/calc/layout). The choice is made here and nowhere else; the layout drawing and the heat check read
// the enclosure line it writes, so all three name the same enclosure.
import { PANEL_BUCKET, type CatalogueItem, type Requirement } from '../../schemas/catalogue';
import { ENCLOSURE_DEPTH } from '../../standards/panel-layout';
import { depthNeedMm, holdsAll, plateOf } from '../layout/backplate';
import { placeUnits, type Placement } from '../layout/layout-place';
import { layoutUnits } from '../layout/layout-units';
import type { BomContext, PanelTally } from './context';
import { describeRequirement } from './describe';
import { satisfies } from './match';
import { normaliseEnclosureType } from './normalise';

export interface EnclosureNeed {
  /** the backplate area the layout takes in its fullest section (plate width × height used), mm² */
  requiredAreaMm2: number;
  minDepthMm: number;
  /** sections of the chosen enclosure (0 where none was chosen) */
  sections: number;
}

/** The depth the devices' kinds ask (a main above 400 A: 400 mm; common practice), before their catalogue depths. */
export function depthByKindMm(tally: PanelTally, mainAmps: number): number {
  return mainAmps > ENCLOSURE_DEPTH.largeMainAboveAmps ? Math.max(tally.minDepthMm, ENCLOSURE_DEPTH.largeMainMm) : tally.minDepthMm;
}

const areaOf = (p: Placement) => Math.round(p.plate.widthMm * p.usedHeightMm);

/**
 * The enclosure: the smallest of the type, deep enough, whose backplate holds the whole layout; else a
 * lineup of as many sections of the largest deep-enough enclosure of the type as the layout fills (a part
 * too large even for it stays off the plate, named on the layout); else an unmatched line stating the need.
 */
export function chooseEnclosure(ctx: BomContext, mainAmps: number, enclosureType: string): EnclosureNeed {
  const { lines } = ctx;
  const byCode = new Map<string, CatalogueItem>();
  for (const list of lines.index.values()) for (const item of list) byCode.set(item.code, item);
  const { units } = layoutUnits(lines.lines, (code) => byCode.get(code));
  const minDepthMm = Math.max(depthByKindMm(ctx.tally, mainAmps), depthNeedMm(units));
  const nemaType = normaliseEnclosureType(enclosureType);
  const base: Requirement = { category: 'enclosure', nemaType, minDepthMm };
  const candidates = (lines.index.get('enclosure') ?? []).filter((e) => satisfies(e, base) && plateOf(e));
  for (const enc of candidates) {
    const placement = placeUnits(units, plateOf(enc)!, 1);
    if (!holdsAll(placement)) continue;
    const requiredAreaMm2 = areaOf(placement);
    lines.addItem(PANEL_BUCKET, enc, 1, [{ ...base, minUsableAreaMm2: requiredAreaMm2 }]);
    return { requiredAreaMm2, minDepthMm, sections: 1 };
  }
  const largest = lines.find({ ...base, prefer: 'largest' });
  const plate = largest ? plateOf(largest) : null;
  if (!largest || !plate) {
    lines.unmatched(PANEL_BUCKET, 'enclosure', 1, describeRequirement(base));
    return { requiredAreaMm2: 0, minDepthMm, sections: 0 };
  }
  const placement = placeUnits(units, plate);
  const sections = Math.max(1, placement.sections);
  const requiredAreaMm2 = areaOf(placement);
  // a swap keeps the section count, so each section must hold the fullest section's share
  lines.addItem(PANEL_BUCKET, largest, sections, [{ ...base, minUsableAreaMm2: requiredAreaMm2 }]);
  return { requiredAreaMm2, minDepthMm, sections };
}
