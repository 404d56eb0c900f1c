// Placing the layout's units on a backplate (or on the backplates of a lineup's sections): rows of parts on
// DIN rails or mounting lines, separated by horizontal wire duct, with duct down both sides, by the common
// practice of BACKPLATE (shared/standards/panel-layout.ts). Units go in order, left to right, a new row when
// the next does not fit across, a new section when the next row does not fit below. Pure TypeScript.
import { BACKPLATE } from '../../standards/panel-layout';
import type { LayoutUnit } from './layout-units';

/** The usable backplate of one section, mm. */
export interface Plate {
  widthMm: number;
  heightMm: number;
}

/** A rectangle on a section's plate, mm from its top-left corner. */
export interface Rect {
  section: number;
  x: number;
  y: number;
  w: number;
  h: number;
}

export interface PlacedUnit {
  unit: LayoutUnit;
  /** the unit's body (its clearances above and below are kept free beside it) */
  rect: Rect;
  row: number;
}

export interface LayoutRow {
  section: number;
  index: number;
  /** top and bottom of the row's band, clearances included */
  topMm: number;
  bottomMm: number;
  /** the DIN rail's (or mounting line's) centre */
  railMm: number;
  terminal: boolean;
}

export interface Placement {
  plate: Plate;
  ductWidthMm: number;
  sections: number;
  placed: PlacedUnit[];
  rows: LayoutRow[];
  ducts: Rect[];
  /** units no plate of this size can hold, with the reason */
  tooLarge: Array<{ unit: LayoutUnit; reason: string }>;
  /** units that would need more sections than allowed */
  overflow: LayoutUnit[];
  /** the deepest part placed, mm */
  deepestMm: number;
  /** the plate height the layout takes in its fullest section, mm */
  usedHeightMm: number;
}

/** The duct width for a plate (BACKPLATE.ductWidthMm). */
export function ductWidthFor(plate: Plate): number {
  const d = BACKPLATE.ductWidthMm;
  return plate.widthMm <= d.narrowPlateMm ? d.narrow : d.wide;
}

interface RowBuild {
  units: LayoutUnit[];
  up: number;
  down: number;
  width: number;
  terminal: boolean;
}

const up = (u: LayoutUnit) => u.heightMm / 2 + u.clearanceAboveMm;
const down = (u: LayoutUnit) => u.heightMm / 2 + u.clearanceBelowMm;
const gapBefore = (prev: LayoutUnit, u: LayoutUnit) =>
  prev.strip && prev.strip === u.strip ? 0 : prev.terminal && u.terminal ? BACKPLATE.stripGapMm : BACKPLATE.partGapMm;

/** The rows the units fill across a plate, and the units too large for any row of it. */
function buildRows(units: readonly LayoutUnit[], span: number, maxBand: number): { rows: RowBuild[]; tooLarge: Placement['tooLarge'] } {
  const rows: RowBuild[] = [];
  const tooLarge: Placement['tooLarge'] = [];
  let row: RowBuild | null = null;
  for (const u of units) {
    if (u.widthMm > span) {
      tooLarge.push({ unit: u, reason: `${u.widthMm} mm wide: the plate leaves ${span} mm between its side ducts` });
      continue;
    }
    if (up(u) + down(u) > maxBand) {
      tooLarge.push({
        unit: u,
        reason: `${up(u) + down(u)} mm tall with its clearances: a row of the plate holds ${maxBand} mm between ducts`,
      });
      continue;
    }
    const last = row?.units[row.units.length - 1];
    const fits =
      row &&
      last &&
      row.terminal === u.terminal &&
      row.width + gapBefore(last, u) + u.widthMm <= span &&
      Math.max(row.up, up(u)) + Math.max(row.down, down(u)) <= maxBand;
    if (row && last && fits) {
      row.width += gapBefore(last, u) + u.widthMm;
      row.up = Math.max(row.up, up(u));
      row.down = Math.max(row.down, down(u));
      row.units.push(u);
    } else {
      row = { units: [u], up: up(u), down: down(u), width: u.widthMm, terminal: u.terminal };
      rows.push(row);
    }
  }
  return { rows, tooLarge };
}

/**
 * Lay the units out on plates of one size: as many sections as it takes, up to maxSections (the units past
 * the last section that holds them are returned as overflow).
 */
export function placeUnits(units: readonly LayoutUnit[], plate: Plate, maxSections = Number.POSITIVE_INFINITY): Placement {
  const duct = ductWidthFor(plate);
  const gap = BACKPLATE.ductGapMm;
  const x0 = duct + gap;
  const span = plate.widthMm - 2 * (duct + gap);
  const maxBand = plate.heightMm - 2 * duct - 2 * gap;
  const { rows, tooLarge } = buildRows(units, span, maxBand);
  const placed: PlacedUnit[] = [];
  const layoutRows: LayoutRow[] = [];
  const ducts: Rect[] = [];
  const overflow: LayoutUnit[] = [];
  let section = 0;
  let y = 0;
  let usedHeightMm = 0;
  const openSection = () => {
    section++;
    ducts.push({ section, x: 0, y: 0, w: duct, h: plate.heightMm }, { section, x: plate.widthMm - duct, y: 0, w: duct, h: plate.heightMm });
    ducts.push({ section, x: duct, y: 0, w: plate.widthMm - 2 * duct, h: duct });
    y = duct;
  };
  for (const r of rows) {
    const need = gap + r.up + r.down + gap + duct;
    if (section === 0 || y + need > plate.heightMm) {
      if (section >= maxSections || span <= 0 || maxBand <= 0) {
        overflow.push(...r.units);
        continue;
      }
      openSection();
    }
    const top = y + gap;
    const rail = top + r.up;
    const bottom = rail + r.down;
    const index = layoutRows.length;
    layoutRows.push({ section, index, topMm: top, bottomMm: bottom, railMm: rail, terminal: r.terminal });
    let x = x0;
    r.units.forEach((u, i) => {
      if (i > 0) x += gapBefore(r.units[i - 1]!, u);
      placed.push({ unit: u, rect: { section, x, y: rail - u.heightMm / 2, w: u.widthMm, h: u.heightMm }, row: index });
      x += u.widthMm;
    });
    ducts.push({ section, x: duct, y: bottom + gap, w: plate.widthMm - 2 * duct, h: duct });
    y = bottom + gap + duct;
    usedHeightMm = Math.max(usedHeightMm, y);
  }
  const deepestMm = placed.reduce((m, p) => Math.max(m, p.unit.depthMm), 0);
  return { plate, ductWidthMm: duct, sections: section, placed, rows: layoutRows, ducts, tooLarge, overflow, deepestMm, usedHeightMm };
}

/** The parts of a placed unit, each with its own rectangle (stacked top to bottom, centred across the unit). */
export function partRects(p: PlacedUnit): Array<{ part: LayoutUnit['parts'][number]; rect: Rect }> {
  let y = p.rect.y;
  return p.unit.parts.map((part) => {
    const rect = { section: p.rect.section, x: p.rect.x + (p.rect.w - part.widthMm) / 2, y, w: part.widthMm, h: part.heightMm };
    y += part.heightMm;
    return { part, rect };
  });
}
