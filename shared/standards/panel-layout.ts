// Enclosure sizing allowances of the bill of materials: back-panel footprints of the devices a bucket
// holds, the panel-wide items, terminal blocks, the wiring allowance on top, the usable back-panel area of
// an enclosure and the depths devices need. Common practice estimates (catalog/README.md lists them); no
// standard gives them, and the shop's layout is what finally decides the enclosure.

export const PANEL_LAYOUT_SOURCE = 'common practice estimate';

/** A step table: the value of the first row whose limit the quantity does not exceed; the last row has no limit. */
export type StepTable = ReadonlyArray<readonly [upTo: number, value: number]>;

/** The value of a step table at x (a quantity above every limit, or not a number, takes the last row). */
export function stepValue(table: StepTable, x: number): number {
  for (const [upTo, value] of table) if (x <= upTo) return value;
  return table[table.length - 1]![1];
}

const mm2 = (heightMm: number, widthMm: number): number => heightMm * widthMm;

/** Wiring duct, spacing and spare-space allowance on the device footprint (common practice). */
export const LAYOUT_ALLOWANCE = 1.6;

/** Terminal-block area: 12 mm pitch × 80 mm including marking and wire bend space (common practice). */
export const TERMINAL_AREA_MM2 = mm2(12, 80);

/** Usable back panel: the enclosure's height less 150 mm and width less 100 mm for flanges and door stiffeners. */
export const USABLE_AREA_DEDUCTION_MM = { height: 150, width: 100 } as const;

/** One contactor with its overload relay, by NEMA size, mm². */
export const CONTACTOR_AREA_BY_NEMA_SIZE: Readonly<Record<string, number>> = {
  '00': mm2(90, 250),
  '0': mm2(90, 250),
  '1': mm2(90, 250),
  '2': mm2(110, 300),
  '3': mm2(160, 400),
  '4': mm2(200, 480),
  '5': mm2(280, 600),
};

/** One contactor with its overload relay, by IEC rated current (A), where no NEMA size is given, mm². */
export const CONTACTOR_AREA_BY_AMPS: StepTable = [
  [32, mm2(90, 250)],
  [95, mm2(110, 300)],
  [150, mm2(160, 400)],
  [300, mm2(200, 480)],
  [Infinity, mm2(400, 800)],
];

/** A drive by its output current (A), mm². */
export const VFD_AREA_BY_AMPS: StepTable = [
  [12, mm2(140, 260)],
  [30, mm2(180, 350)],
  [77, mm2(240, 500)],
  [156, mm2(300, 650)],
  [Infinity, mm2(400, 900)],
];

/** A drive's output filter (reactor, dV/dt or sine filter) by the drive's output current (A), mm². */
export const OUTPUT_FILTER_AREA_BY_AMPS: StepTable = [
  [30, mm2(150, 200)],
  [156, mm2(250, 300)],
  [Infinity, mm2(350, 450)],
];

/** A soft starter by its current (A), mm². */
export const SOFT_STARTER_AREA_BY_AMPS: StepTable = [
  [85, mm2(120, 250)],
  [210, mm2(200, 400)],
  [Infinity, mm2(300, 600)],
];

/** A DC drive by the motor's full-load current (A), mm². */
export const DC_DRIVE_AREA_BY_AMPS: StepTable = [
  [60, mm2(250, 400)],
  [175, mm2(350, 550)],
  [Infinity, mm2(450, 750)],
];

/** A DC starter with its armature resistors, mm². */
export const DC_STARTER_AREA_MM2 = mm2(300, 500);

/** The branch breaker or fuse block by its rating (A), mm². */
export const BRANCH_DEVICE_AREA_BY_AMPS: StepTable = [
  [100, mm2(100, 150)],
  [250, mm2(140, 250)],
  [Infinity, mm2(210, 350)],
];

/** Main, distribution block and control transformer together, by the main's rating (A), mm² (no main: none). */
export const PANEL_ITEMS_AREA_BY_MAIN_AMPS: StepTable = [
  [0, 0],
  [100, 0.12e6],
  [400, 0.25e6],
  [Infinity, 0.45e6],
];

/** A small dry-type transformer for motors at another voltage: 0.04 m² + 0.008 m² per kVA. */
export const POWER_TRANSFORMER_AREA = { baseMm2: 40_000, perKvaMm2: 8_000, minDepthMm: 300 } as const;

/** A DC power supply for DC motors, mm². */
export const DC_SUPPLY_AREA_MM2 = 60_000;

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
