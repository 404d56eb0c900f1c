// How the bill of materials' parts are laid out on an enclosure's backplate: the usable back-panel area of
// an enclosure, the duct and spacing practice of the layout (shared/calc/layout), the depths devices need,
// and the wire allowances. Common practice (catalog/README.md lists them); no standard gives them.

export const PANEL_LAYOUT_SOURCE = 'common practice estimate';

/** A step table: the value of the first row whose limit the quantity does not exceed; the last row has no limit. */
export type StepTable = ReadonlyArray<readonly [upTo: number, value: number]>;

/** The value of a step table at x (a quantity above every limit, or not a number, takes the last row). */
export function stepValue(table: StepTable, x: number): number {
  for (const [upTo, value] of table) if (x <= upTo) return value;
  return table[table.length - 1]![1];
}

/** Usable back panel: the enclosure's height less 150 mm and width less 100 mm for flanges and door stiffeners. */
export const USABLE_AREA_DEDUCTION_MM = { height: 150, width: 100 } as const;

/**
 * How parts are laid out on the backplate (common practice, not a standard; the shop's own practice may differ):
 * - slotted wire duct 40 mm wide on a plate up to 500 mm wide, 60 mm on a wider one, down both sides and
 *   across the plate above the first row, between rows and below the last;
 * - 25 mm between a part and the duct beside it (room to bend and dress the wires into the duct);
 * - 10 mm between parts on a row; terminal blocks of one strip touch, 10 mm (an end stop) between strips;
 * - each part centred on its row's DIN rail or mounting line; a drive's or soft starter's clearance above and
 *   below stays free of other parts and of duct;
 * - the enclosure at least 50 mm deeper than the deepest part (back-panel stand-off and door clearance).
 */
export const BACKPLATE = {
  ductWidthMm: { narrowPlateMm: 500, narrow: 40, wide: 60 },
  ductGapMm: 25,
  partGapMm: 10,
  stripGapMm: 10,
  depthAllowanceMm: 50,
  /** DIN rail (EN 60715 top-hat, 35 mm), drawn behind the parts of each row */
  railHeightMm: 35,
} as const;

/** A small dry-type transformer for motors at another voltage needs at least this depth, mm. */
export const POWER_TRANSFORMER_DEPTH = { minDepthMm: 300 } as const;

/** Depths, mm: the least any enclosure has, a drive or soft starter by its current, NEMA size 4 and 5 contactors, a main above 400 A. */
export const ENCLOSURE_DEPTH = {
  minMm: 200,
  electronicByAmps: [
    [30, 250],
    [156, 300],
    [Infinity, 400],
  ] as StepTable,
  largeContactorNemaSizes: ['4', '5'] as readonly string[],
  largeContactorMm: 300,
  largeMainAboveAmps: 400,
  largeMainMm: 400,
} as const;

/** Wire lengths: per motor-lead conductor, control wire per bucket, per pole and set from the main to the distribution block, ft. */
export const WIRE_ALLOWANCE_FT = { perMotorLeadConductor: 10, controlPerBucket: 40, mainToDistributionPerConductor: 4 } as const;
