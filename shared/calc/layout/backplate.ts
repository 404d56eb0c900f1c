// The backplate layout of a panel from its bill of materials: the enclosure line's enclosure (as many
// sections as the line's quantity) and every mounted part placed on it, or named with the reason it could
// not be. The bill of materials chooses that enclosure with the same placement (chooseEnclosure in
// shared/calc/bom-stages/enclosure.ts), so the layout, the enclosure line and the heat check name one
// enclosure. Pure TypeScript.
import type { BomLine, CatalogueItem } from '../../schemas/catalogue';
import { BACKPLATE, USABLE_AREA_DEDUCTION_MM } from '../../standards/panel-layout';
import { type Placement, type Plate, placeUnits } from './layout-place';
import { layoutUnits, type LayoutUnit, type UnplacedPart } from './layout-units';

export interface LayoutEnclosure {
  code: string;
  description: string;
  nemaType: string | null;
  heightMm: number;
  widthMm: number;
  depthMm: number;
}

export interface BackplateLayout {
  /** the enclosure line's enclosure; null where the bill of materials has none with dimensions */
  enclosure: LayoutEnclosure | null;
  sections: number;
  placement: Placement | null;
  /** every mounted part that is not on the plate, with the reason */
  unplaced: UnplacedPart[];
  /** the depth the deepest placed part asks of the enclosure (its depth + BACKPLATE.depthAllowanceMm), mm */
  minDepthMm: number;
  /** how many parts of the bill of materials the layout places */
  placedCount: number;
}

/** The usable backplate of an enclosure: its height less 150 mm and width less 100 mm (common practice). */
export function plateOf(enclosure: CatalogueItem): Plate | null {
  const h = (enclosure.ratings.heightMm ?? 0) - USABLE_AREA_DEDUCTION_MM.height;
  const w = (enclosure.ratings.widthMm ?? 0) - USABLE_AREA_DEDUCTION_MM.width;
  return h > 0 && w > 0 ? { widthMm: w, heightMm: h } : null;
}

/** The depth the units ask of an enclosure: the deepest + BACKPLATE.depthAllowanceMm, mm (0 with no units). */
export function depthNeedMm(units: readonly LayoutUnit[]): number {
  const deepest = units.reduce((m, u) => Math.max(m, u.depthMm), 0);
  return deepest > 0 ? deepest + BACKPLATE.depthAllowanceMm : 0;
}

/** A unit's parts, named as not on the plate for the reason. */
function namedParts(u: LayoutUnit, reason: string): UnplacedPart[] {
  return u.parts.map((part) => ({
    tag: part.tag,
    bucket: u.bucket,
    code: part.code,
    category: part.category,
    description: part.description,
    reason,
  }));
}

/** Every unit the placement could not put on a plate, as named parts. */
export function unplacedOfPlacement(p: Placement, sectionsAllowed: number): UnplacedPart[] {
  return [
    ...p.tooLarge.flatMap(({ unit, reason }) => namedParts(unit, reason)),
    ...p.overflow.flatMap((u) =>
      namedParts(u, `no room left on the ${sectionsAllowed} section${sectionsAllowed === 1 ? '' : 's'} of the enclosure line`),
    ),
  ];
}

/** True when the placement holds every unit on one plate. */
export function holdsAll(p: Placement): boolean {
  return p.tooLarge.length === 0 && p.overflow.length === 0 && p.sections <= 1;
}

/** The layout of a panel's bill of materials on the enclosure its enclosure line names. */
export function backplateLayout(lines: readonly BomLine[], itemOf: (code: string) => CatalogueItem | undefined): BackplateLayout {
  const { units, unplaced } = layoutUnits(lines, itemOf);
  const minDepthMm = depthNeedMm(units);
  const encLine = lines.find((l) => l.category === 'enclosure' && l.code);
  const enc = encLine?.code ? itemOf(encLine.code) : undefined;
  const plate = enc ? plateOf(enc) : null;
  if (!encLine || !enc || !plate) {
    const reason = 'the bill of materials has no enclosure with dimensions to lay it out on';
    const all = units.flatMap((u) => namedParts(u, reason));
    return { enclosure: null, sections: 0, placement: null, unplaced: [...unplaced, ...all], minDepthMm, placedCount: 0 };
  }
  const sections = Math.max(1, Math.round(encLine.quantity));
  const placement = placeUnits(units, plate, sections);
  return {
    enclosure: {
      code: enc.code,
      description: enc.description,
      nemaType: enc.ratings.nemaType ?? null,
      heightMm: enc.ratings.heightMm!,
      widthMm: enc.ratings.widthMm!,
      depthMm: enc.ratings.depthMm ?? 0,
    },
    sections,
    placement,
    unplaced: [...unplaced, ...unplacedOfPlacement(placement, sections)],
    minDepthMm,
    placedCount: placement.placed.reduce((n, p) => n + p.unit.parts.length, 0),
  };
}
