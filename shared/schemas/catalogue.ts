// The shop's component catalogue, its labour units, and the bill-of-materials line.
// Pure zod; the same schemas validate the seed files, the REST bodies and the spreadsheet import.
import { z } from 'zod';
import { countSchema } from './bounds';
import { RATING_LABELS } from '../labels';

export const CATEGORIES = [
  { id: 'contactor', label: 'Contactors', labourKey: 'device-mount' },
  { id: 'mechanical-interlock', label: 'Mechanical interlock kits', labourKey: 'accessory' },
  { id: 'aux-contact', label: 'Auxiliary contacts', labourKey: 'accessory' },
  { id: 'overload-relay', label: 'Overload relays', labourKey: 'device-mount' },
  { id: 'inverse-time-breaker', label: 'Inverse-time breakers', labourKey: 'device-mount' },
  { id: 'motor-circuit-protector', label: 'Instantaneous-trip motor circuit protectors', labourKey: 'device-mount' },
  { id: 'fuse', label: 'Fuses', labourKey: 'accessory' },
  { id: 'fuse-holder', label: 'Fuse holders', labourKey: 'din-device' },
  { id: 'fused-disconnect', label: 'Fused disconnect switches', labourKey: 'device-mount' },
  { id: 'disconnect-switch', label: 'Non-fused disconnect switches', labourKey: 'device-mount' },
  { id: 'manual-motor-protector', label: 'Manual motor protectors', labourKey: 'din-device' },
  { id: 'soft-starter', label: 'Soft starters', labourKey: 'drive' },
  { id: 'vfd', label: 'Variable-frequency drives', labourKey: 'drive' },
  { id: 'phase-monitor-relay', label: 'Phase-monitoring relays', labourKey: 'din-device' },
  { id: 'control-transformer', label: 'Control power transformers', labourKey: 'device-mount' },
  { id: 'terminal-block', label: 'Terminal blocks', labourKey: 'terminal-block' },
  { id: 'pilot-device', label: 'Pilot devices', labourKey: 'door-device' },
  { id: 'wire', label: 'Wire', labourKey: 'wire-run' },
  { id: 'enclosure', label: 'Enclosures', labourKey: 'enclosure-prep' },
  { id: 'cooling', label: 'Cooling', labourKey: 'cooling-install' },
  { id: 'main-breaker', label: 'Main breakers', labourKey: 'device-mount' },
  { id: 'main-disconnect', label: 'Main disconnects', labourKey: 'device-mount' },
  { id: 'power-distribution-block', label: 'Power distribution blocks', labourKey: 'device-mount' },
  { id: 'output-filter', label: 'Output filters (dV/dt, sine-wave)', labourKey: 'device-mount' },
  { id: 'braking-resistor', label: 'Dynamic braking resistors', labourKey: 'device-mount' },
  { id: 'dc-drive', label: 'DC drives', labourKey: 'drive' },
  { id: 'dc-starter', label: 'DC armature starters', labourKey: 'device-mount' },
  { id: 'field-loss-relay', label: 'Field-loss relays', labourKey: 'din-device' },
  { id: 'power-transformer', label: 'Power transformers (motors at another voltage)', labourKey: 'device-mount' },
  { id: 'dc-power-supply', label: 'DC power supplies (rectifiers)', labourKey: 'drive' },
] as const;

export type Category = (typeof CATEGORIES)[number]['id'];
export const CATEGORY_IDS = CATEGORIES.map((c) => c.id) as [Category, ...Category[]];
export const CategorySchema = z.enum(CATEGORY_IDS);
export const CATEGORY_LABELS: Record<Category, string> = Object.fromEntries(
  CATEGORIES.map((c) => [c.id, c.label]),
) as Record<Category, string>;

/** NEMA ICS 2 starter sizes in ascending order. */
export const NEMA_SIZES = ['00', '0', '1', '2', '3', '4', '5', '6', '7', '8', '9'] as const;
export const NemaSizeSchema = z.enum(NEMA_SIZES);

/** Enclosure types of NEMA 250 the catalogue may carry. */
export const ENCLOSURE_TYPES = ['1', '12', '3R', '4', '4X', '7', '9'] as const;
export const EnclosureTypeSchema = z.enum(ENCLOSURE_TYPES);

/** Voltages a horsepower rating may be given at (AC table columns and DC armature voltages). */
export const HP_VOLTS = ['115', '200', '208', '230', '460', '575', '90', '180', '240', '500'] as const;
export const HpVoltsSchema = z.enum(HP_VOLTS);

/** Conductor sizes, smallest first: AWG then kcmil. */
export const WIRE_SIZES = [
  '18', '16', '14', '12', '10', '8', '6', '4', '3', '2', '1', '1/0', '2/0', '3/0', '4/0',
  '250', '300', '350', '400', '500', '600', '750',
] as const;
export const WireSizeSchema = z.enum(WIRE_SIZES);

export const FUSE_CLASSES = ['J', 'RK5', 'CC'] as const;
export const FuseClassSchema = z.enum(FUSE_CLASSES);

const positive = z.number().finite().positive();
const nonNegative = z.number().finite().nonnegative();

/**
 * One ratings object shared by every category: each field is optional and means the same thing
 * wherever it appears. Which fields a category needs is checked by CatalogueItemSchema.
 */
export const RatingsSchema = z
  .object({
    /** rated (maximum) voltage, V */
    volts: positive.optional(),
    /** lowest voltage of the rated range, V (drives, relays, transformer primaries) */
    voltsMin: positive.optional(),
    poles: z.number().int().min(1).max(4).optional(),
    /** operating-coil voltage, V */
    coilVolts: positive.optional(),
    nemaSize: NemaSizeSchema.optional(),
    /** continuous / rated current, A (breaker and fuse rating, holder and switch size …) */
    amps: positive.optional(),
    iecAc3Amps: positive.optional(),
    iecAc4Amps: positive.optional(),
    /** horsepower by rated voltage, e.g. { "230": 15, "460": 25 } */
    hpByVolts: z.partialRecord(HpVoltsSchema, positive).optional(),
    /** adjustable setting range, A (overload relays, MMPs, motor circuit protector instantaneous trip) */
    settingMinAmps: positive.optional(),
    settingMaxAmps: positive.optional(),
    tripClasses: z.array(z.union([z.literal(10), z.literal(20), z.literal(30)])).min(1).optional(),
    electronic: z.boolean().optional(),
    detectsPhaseLoss: z.boolean().optional(),
    detectsPhaseReversal: z.boolean().optional(),
    detectsImbalance: z.boolean().optional(),
    fuseClass: FuseClassSchema.optional(),
    timeDelay: z.boolean().optional(),
    /** interrupting rating, kA */
    kaic: positive.optional(),
    /** continuous VA (transformers), burden VA (pilot lights, relays) */
    va: positive.optional(),
    sealedVa: positive.optional(),
    /** coil inrush VA; for a transformer, the inrush VA it carries at 40 % PF keeping 85 % secondary voltage */
    inrushVa: positive.optional(),
    secondaryVolts: positive.optional(),
    normalDutyAmps: positive.optional(),
    heavyDutyAmps: positive.optional(),
    inputAmps: positive.optional(),
    wireSize: WireSizeSchema.optional(),
    wireMin: WireSizeSchema.optional(),
    wireMax: WireSizeSchema.optional(),
    nemaType: EnclosureTypeSchema.optional(),
    /** enclosure types a cooling device keeps the rating of */
    nemaTypes: z.array(EnclosureTypeSchema).min(1).optional(),
    heightMm: positive.optional(),
    widthMm: positive.optional(),
    depthMm: positive.optional(),
    cfm: positive.optional(),
    coolingW: positive.optional(),
    /** branch connections per pole (distribution blocks) */
    outputs: countSchema.min(1).optional(),
    /** sub-type within the category (thermal/electronic, filter-fan/air-conditioner, dv-dt/sine-wave …) */
    kind: z.string().min(1).max(40).optional(),
    /** what a pilot device does (start, stop, forward, reverse, fast, slow, hand-off-auto, run-light) */
    function: z.string().min(1).max(40).optional(),
    contacts: z.string().min(1).max(20).optional(),
    color: z.string().min(1).max(20).optional(),
    ohms: positive.optional(),
    watts: positive.optional(),
    internalBypass: z.boolean().optional(),
    builtInOverload: z.boolean().optional(),
  })
  .strict();
export type Ratings = z.infer<typeof RatingsSchema>;

/** Ratings each category must carry to be matched by the bill of materials. */
export const REQUIRED_RATINGS: Record<Category, (keyof Ratings)[]> = {
  contactor: ['volts', 'coilVolts', 'amps', 'sealedVa', 'inrushVa'],
  'mechanical-interlock': ['kind'],
  'aux-contact': ['contacts'],
  'overload-relay': ['kind', 'settingMinAmps', 'settingMaxAmps', 'tripClasses'],
  'inverse-time-breaker': ['volts', 'amps', 'poles'],
  'motor-circuit-protector': ['volts', 'amps', 'poles', 'settingMinAmps', 'settingMaxAmps'],
  fuse: ['volts', 'amps', 'fuseClass', 'timeDelay'],
  'fuse-holder': ['volts', 'amps', 'fuseClass', 'poles'],
  'fused-disconnect': ['volts', 'amps', 'fuseClass', 'poles', 'hpByVolts'],
  'disconnect-switch': ['volts', 'amps', 'poles', 'hpByVolts'],
  'manual-motor-protector': ['volts', 'settingMinAmps', 'settingMaxAmps'],
  'soft-starter': ['volts', 'amps'],
  vfd: ['volts', 'voltsMin', 'normalDutyAmps', 'heavyDutyAmps', 'inputAmps'],
  'phase-monitor-relay': ['volts', 'voltsMin', 'va'],
  'control-transformer': ['volts', 'voltsMin', 'va', 'inrushVa', 'secondaryVolts'],
  'terminal-block': ['kind', 'amps', 'wireMin', 'wireMax'],
  'pilot-device': ['kind', 'function'],
  wire: ['kind', 'wireSize', 'amps'],
  enclosure: ['nemaType', 'heightMm', 'widthMm', 'depthMm'],
  cooling: ['kind', 'nemaTypes'],
  'main-breaker': ['volts', 'amps', 'poles', 'kaic'],
  'main-disconnect': ['volts', 'amps', 'poles', 'fuseClass'],
  'power-distribution-block': ['volts', 'amps', 'poles', 'outputs'],
  'output-filter': ['kind', 'volts', 'amps'],
  'braking-resistor': ['volts', 'hpByVolts', 'ohms', 'watts'],
  'dc-drive': ['volts', 'amps', 'hpByVolts'],
  'dc-starter': ['volts', 'amps', 'hpByVolts'],
  'field-loss-relay': ['volts', 'settingMinAmps', 'settingMaxAmps'],
  'power-transformer': ['kind', 'volts', 'voltsMin', 'va', 'secondaryVolts'],
  'dc-power-supply': ['kind', 'volts', 'voltsMin', 'amps', 'secondaryVolts'],
};

export const UNITS = ['ea', 'ft'] as const;
export const UnitSchema = z.enum(UNITS);

/** Part code: upper-case letters, digits, hyphens, e.g. PW-CN-N1-120 (see catalog/README.md). */
export const PartCodeSchema = z
  .string()
  .regex(/^[A-Z0-9][A-Z0-9-]{2,39}$/, 'part code: 3–40 upper-case letters, digits or hyphens');

/** The item's fields without the cross-field checks (for .partial()/.pick() in request schemas); validate with CatalogueItemSchema. */
export const CatalogueItemBaseSchema = z
  .object({
    code: PartCodeSchema,
    description: z.string().trim().min(1).max(200),
    category: CategorySchema,
    unit: UnitSchema.default('ea'),
    ratings: RatingsSchema,
    /** short-circuit current rating, kA (invented demo values, not listings); null where none applies */
    sccrKa: positive.nullable().default(null),
    /** heat loss per unit at rated load, W */
    heatLossW: nonNegative.default(0),
    unitCost: nonNegative,
    /** item-specific labour beyond the shop's labour units (e.g. drive parameter set-up), h per unit */
    labourHours: nonNegative.default(0),
    /** wire terminations made on one unit; priced with the 'termination' labour unit */
    terminations: countSchema.default(0),
    leadTimeDays: countSchema,
    active: z.boolean().default(true),
  })
  .strict();

export const CatalogueItemSchema = CatalogueItemBaseSchema.superRefine((item, ctx) => {
    for (const key of REQUIRED_RATINGS[item.category]) {
      if (item.ratings[key] === undefined) {
        ctx.addIssue({
          code: 'custom',
          path: ['ratings', key],
          message: `${CATEGORY_LABELS[item.category]} need a rating: ${RATING_LABELS[key].toLowerCase()}`,
        });
      }
    }
    const r = item.ratings;
    if (r.settingMinAmps !== undefined && r.settingMaxAmps !== undefined && r.settingMinAmps > r.settingMaxAmps) {
      ctx.addIssue({ code: 'custom', path: ['ratings', 'settingMinAmps'], message: 'setting range minimum is above its maximum' });
    }
    if (r.voltsMin !== undefined && r.volts !== undefined && r.voltsMin > r.volts) {
      ctx.addIssue({ code: 'custom', path: ['ratings', 'voltsMin'], message: 'voltsMin is above volts' });
    }
    if (r.wireMin && r.wireMax && WIRE_SIZES.indexOf(r.wireMin) > WIRE_SIZES.indexOf(r.wireMax)) {
      ctx.addIssue({ code: 'custom', path: ['ratings', 'wireMin'], message: 'wireMin is larger than wireMax' });
    }
  });
export type CatalogueItem = z.output<typeof CatalogueItemSchema>;
export type CatalogueItemInput = z.input<typeof CatalogueItemSchema>;

export const CatalogueFileSchema = z.array(CatalogueItemSchema);

export const LABOUR_KEYS = [
  'enclosure-prep',
  'device-mount',
  'din-device',
  'accessory',
  'door-device',
  'drive',
  'terminal-block',
  'termination',
  'wire-run',
  'cooling-install',
] as const;
export const LabourKeySchema = z.enum(LABOUR_KEYS);
export type LabourKey = z.infer<typeof LabourKeySchema>;

export const LabourUnitSchema = z
  .object({
    key: LabourKeySchema,
    description: z.string().min(1).max(200),
    /** hours per unit of `per` */
    hours: nonNegative,
    per: z.enum(['each', 'termination', 'foot']),
  })
  .strict();
export type LabourUnit = z.infer<typeof LabourUnitSchema>;
export const LabourUnitsFileSchema = z.array(LabourUnitSchema).superRefine((units, ctx) => {
  const seen = new Set<string>();
  units.forEach((u, i) => {
    if (seen.has(u.key)) ctx.addIssue({ code: 'custom', path: [i, 'key'], message: `duplicate labour unit ${u.key}` });
    seen.add(u.key);
  });
});

// ---------------------------------------------------------------------------------------------
// Catalogue API answers and requests

/** A catalogue item as the API returns it. */
export type CatalogueEntry = CatalogueItem & { id: number; version: number; updatedAt: string };
export type LabourUnitEntry = LabourUnit & { version: number };

/** Filters of the catalogue list. */
export interface CatalogueFilter {
  category?: Category;
  q?: string;
  active?: 'true' | 'false' | 'all';
}

/** Changes to a catalogue item: any field but its code. */
export type ItemChanges = Partial<Omit<CatalogueItemInput, 'code'>>;

/** One entry of a catalogue item's history (from the activity log). */
export interface HistoryEntry {
  id: number;
  action: string;
  summary: string;
  diff: Record<string, unknown> | null;
  user: string | null;
  at: string;
}

/** What an import did. */
export interface ImportSummary {
  created: number;
  updated: number;
  unchanged: number;
}

// ---------------------------------------------------------------------------------------------
// Bill of materials

/** Bucket name of the panel's own items (enclosure, main, transformer …). */
export const PANEL_BUCKET = '(panel)';

export const MANUAL_CATEGORIES = ['freight', 'engineering', 'spares', 'other'] as const;
export const BomCategorySchema = z.enum([...CATEGORY_IDS, ...MANUAL_CATEGORIES]);
export type BomCategory = z.infer<typeof BomCategorySchema>;

/**
 * What a catalogue item must meet for a bill-of-materials line: every field given is a hard constraint.
 * The matcher picks the smallest (or largest) active item meeting it; a swap must meet it too.
 */
export const RequirementSchema = z
  .object({
    category: CategorySchema,
    /** the item's rated range must hold this voltage: voltsMin ≤ v ≤ volts */
    volts: positive.optional(),
    /** operating voltage must equal this (pilot lights, fans) */
    exactVolts: positive.optional(),
    coilVolts: positive.optional(),
    /** NEMA ICS 2 size as the selection writes it ("00" … "9") */
    nemaSize: z.string().min(1).max(4).optional(),
    minAmps: nonNegative.optional(),
    exactAmps: positive.optional(),
    maxAmps: positive.optional(),
    minIecAc3Amps: positive.optional(),
    minIecAc4Amps: positive.optional(),
    /** settingMinAmps ≤ x ≤ settingMaxAmps */
    settingAmps: positive.optional(),
    /** the adjustable instantaneous trip can be set at or below this value (settingMinAmps ≤ x) */
    maxTripSettingAmps: positive.optional(),
    tripClass: z.union([z.literal(10), z.literal(20), z.literal(30)]).optional(),
    minHp: z.object({ volts: HpVoltsSchema, hp: positive }).strict().optional(),
    poles: z.number().int().min(1).max(4).optional(),
    minPoles: z.number().int().min(1).max(4).optional(),
    fuseClass: FuseClassSchema.optional(),
    timeDelay: z.boolean().optional(),
    kind: z.string().min(1).max(40).optional(),
    function: z.string().min(1).max(40).optional(),
    contacts: z.string().min(1).max(20).optional(),
    detectsPhaseLoss: z.boolean().optional(),
    detectsPhaseReversal: z.boolean().optional(),
    detectsImbalance: z.boolean().optional(),
    internalBypass: z.boolean().optional(),
    builtInOverload: z.boolean().optional(),
    minNormalDutyAmps: positive.optional(),
    minHeavyDutyAmps: positive.optional(),
    minVa: positive.optional(),
    minInrushVa: positive.optional(),
    secondaryVolts: positive.optional(),
    /** wire: this size; terminal block: wireMin ≤ size ≤ wireMax */
    wireSize: WireSizeSchema.optional(),
    /** enclosure: this type; cooling: keeps this type's rating */
    nemaType: z.string().min(1).max(10).optional(),
    minCfm: positive.optional(),
    minCoolingW: positive.optional(),
    minDepthMm: positive.optional(),
    /** usable back-panel area, mm² (see usableAreaMm2 in shared/calc/bom.ts) */
    minUsableAreaMm2: nonNegative.optional(),
    /** pick the largest item that meets the rest (for ratings with an upper limit) */
    prefer: z.enum(['smallest', 'largest']).optional(),
  })
  .strict();
export type Requirement = z.infer<typeof RequirementSchema>;

export const BomLineSchema = z
  .object({
    /** motor tag, or PANEL_BUCKET for the panel's own items */
    bucket: z.string().min(1).max(60),
    category: BomCategorySchema,
    /** catalogue code; null when nothing in the catalogue fits, or for a manual line without a part */
    code: PartCodeSchema.nullable(),
    description: z.string().min(1).max(300),
    quantity: nonNegative,
    unit: UnitSchema,
    /** cost per unit frozen when the line was priced */
    unitCost: nonNegative,
    /** labour hours per unit */
    unitLabourHours: nonNegative,
    /** heat loss per unit, W */
    heatLossW: nonNegative,
    sccrKa: positive.nullable(),
    status: z.enum(['matched', 'unmatched', 'manual']),
    /** the ratings a matching item must meet (always set when unmatched) */
    requiredRatings: z.string().max(500).nullable(),
    source: z.enum(['auto', 'manual', 'swapped']),
    swapReason: z.string().max(500).nullable(),
    /**
     * what the matcher asked of this line's part (any one of the list; several when it tried them in
     * order, e.g. fuse classes); a swap must meet it. Null where the need is not one the catalogue can
     * be searched for; absent on lines stored before it was kept.
     */
    requirement: z.array(RequirementSchema).max(6).nullable().optional(),
    /** on a swapped line: the part the matcher picked */
    swappedFrom: PartCodeSchema.nullable().optional(),
  })
  .strict()
  .superRefine((line, ctx) => {
    if (line.status === 'unmatched' && (line.code !== null || !line.requiredRatings)) {
      ctx.addIssue({ code: 'custom', path: ['code'], message: 'an unmatched line has no code and states the ratings it needs' });
    }
    if (line.source === 'swapped' && !line.swapReason?.trim()) {
      ctx.addIssue({ code: 'custom', path: ['swapReason'], message: 'a swapped line needs a reason' });
    }
  });
export type BomLine = z.infer<typeof BomLineSchema>;

const MoneyGroupSchema = z.object({ materialCost: nonNegative, labourHours: nonNegative });

export const BomTotalsSchema = z.object({
  materialCost: nonNegative,
  labourHours: nonNegative,
  labourRate: nonNegative,
  labourCost: nonNegative,
  cost: nonNegative,
  markupPercent: z.number().finite(),
  markup: z.number().finite(),
  sell: z.number().finite(),
  unmatchedLines: z.number().int().nonnegative(),
  byBucket: z.array(MoneyGroupSchema.extend({ bucket: z.string() })),
  byCategory: z.array(MoneyGroupSchema.extend({ category: BomCategorySchema })),
});
export type BomTotals = z.infer<typeof BomTotalsSchema>;

// ---------------------------------------------------------------------------------------------
// Spreadsheet rows: one flat row per item, one column per field (ratings flattened).

export type ColumnKind = 'string' | 'number' | 'integer' | 'boolean' | 'numberList' | 'stringList';
export interface CatalogueColumn {
  /** header text in the file */
  header: string;
  kind: ColumnKind;
  /** where the value goes in a CatalogueItem */
  target: { top: Exclude<keyof CatalogueItem, 'ratings'> } | { rating: Exclude<keyof Ratings, 'hpByVolts'> } | { hp: (typeof HP_VOLTS)[number] };
  required?: boolean;
  width?: number;
}

const top = (header: Exclude<keyof CatalogueItem, 'ratings'>, kind: ColumnKind, required = false, width = 10): CatalogueColumn => ({
  header,
  kind,
  target: { top: header },
  required,
  width,
});
const rating = (header: Exclude<keyof Ratings, 'hpByVolts'>, kind: ColumnKind, width = 9): CatalogueColumn => ({
  header,
  kind,
  target: { rating: header },
  width,
});

/** Column order of the catalogue .xlsx/.csv; headers are the field names. */
export const CATALOGUE_COLUMNS: CatalogueColumn[] = [
  top('code', 'string', true, 20),
  top('description', 'string', true, 48),
  top('category', 'string', true, 22),
  top('unit', 'string', true, 6),
  top('active', 'boolean', true, 8),
  top('unitCost', 'number', true, 11),
  top('labourHours', 'number', true, 11),
  top('terminations', 'integer', true, 12),
  top('leadTimeDays', 'integer', true, 12),
  top('heatLossW', 'number', true, 10),
  top('sccrKa', 'number', false, 8),
  rating('volts', 'number'),
  rating('voltsMin', 'number'),
  rating('poles', 'integer'),
  rating('coilVolts', 'number'),
  rating('nemaSize', 'string'),
  rating('amps', 'number'),
  rating('iecAc3Amps', 'number'),
  rating('iecAc4Amps', 'number'),
  ...HP_VOLTS.map((v): CatalogueColumn => ({ header: `hp@${v}`, kind: 'number', target: { hp: v }, width: 8 })),
  rating('settingMinAmps', 'number', 12),
  rating('settingMaxAmps', 'number', 12),
  rating('tripClasses', 'numberList'),
  rating('electronic', 'boolean'),
  rating('detectsPhaseLoss', 'boolean'),
  rating('detectsPhaseReversal', 'boolean'),
  rating('detectsImbalance', 'boolean'),
  rating('fuseClass', 'string'),
  rating('timeDelay', 'boolean'),
  rating('kaic', 'number'),
  rating('va', 'number'),
  rating('sealedVa', 'number'),
  rating('inrushVa', 'number'),
  rating('secondaryVolts', 'number'),
  rating('normalDutyAmps', 'number'),
  rating('heavyDutyAmps', 'number'),
  rating('inputAmps', 'number'),
  rating('wireSize', 'string'),
  rating('wireMin', 'string'),
  rating('wireMax', 'string'),
  rating('nemaType', 'string'),
  rating('nemaTypes', 'stringList'),
  rating('heightMm', 'number'),
  rating('widthMm', 'number'),
  rating('depthMm', 'number'),
  rating('cfm', 'number'),
  rating('coolingW', 'number'),
  rating('outputs', 'integer'),
  rating('kind', 'string', 14),
  rating('function', 'string', 14),
  rating('contacts', 'string'),
  rating('color', 'string'),
  rating('ohms', 'number'),
  rating('watts', 'number'),
  rating('internalBypass', 'boolean'),
  rating('builtInOverload', 'boolean'),
];
export const CATALOGUE_HEADERS = CATALOGUE_COLUMNS.map((c) => c.header);

/** A catalogue row as read from a file: header → cell value (strings, numbers, booleans or empty). */
export const CatalogueRowSchema = z.record(z.string(), z.union([z.string(), z.number(), z.boolean(), z.null()]));
export type CatalogueRow = z.infer<typeof CatalogueRowSchema>;

export interface RowIssue {
  column: string;
  message: string;
}

const LIST_SEPARATOR = '/';

function parseCell(raw: string | number | boolean | null | undefined, kind: ColumnKind): { value?: unknown; error?: string } {
  if (raw === null || raw === undefined || (typeof raw === 'string' && raw.trim() === '')) return {};
  switch (kind) {
    case 'string':
      return { value: String(raw).trim() };
    case 'number':
    case 'integer': {
      const n = typeof raw === 'number' ? raw : Number(String(raw).trim());
      if (typeof raw === 'boolean' || !Number.isFinite(n)) return { error: `"${String(raw)}" is not a number` };
      if (kind === 'integer' && !Number.isInteger(n)) return { error: `"${String(raw)}" is not a whole number` };
      return { value: n };
    }
    case 'boolean': {
      if (typeof raw === 'boolean') return { value: raw };
      const s = String(raw).trim().toLowerCase();
      if (['true', 'yes', 'y', '1'].includes(s)) return { value: true };
      if (['false', 'no', 'n', '0'].includes(s)) return { value: false };
      return { error: `"${String(raw)}" is not yes/no (true/false)` };
    }
    case 'numberList': {
      const parts = String(raw).split(LIST_SEPARATOR).map((p) => p.trim()).filter(Boolean);
      const nums = parts.map(Number);
      if (nums.some((n) => !Number.isFinite(n))) return { error: `"${String(raw)}" is not a list of numbers separated by "${LIST_SEPARATOR}"` };
      return { value: nums };
    }
    case 'stringList':
      return { value: String(raw).split(LIST_SEPARATOR).map((p) => p.trim()).filter(Boolean) };
  }
}

function columnOfPath(path: PropertyKey[]): string {
  if (path[0] === 'ratings') {
    if (path[1] === 'hpByVolts') return path[2] !== undefined ? `hp@${String(path[2])}` : 'hp@…';
    return String(path[1] ?? 'ratings');
  }
  return String(path[0] ?? '(row)');
}

/** Turn one flat spreadsheet row into a validated catalogue item, or the list of its problems by column. */
export function catalogueRowToItem(row: CatalogueRow): { item: CatalogueItem | null; issues: RowIssue[] } {
  const issues: RowIssue[] = [];
  const out: Record<string, unknown> = {};
  const ratings: Record<string, unknown> = {};
  const hp: Record<string, unknown> = {};
  for (const col of CATALOGUE_COLUMNS) {
    const { value, error } = parseCell(row[col.header], col.kind);
    if (error) {
      issues.push({ column: col.header, message: error });
      continue;
    }
    if (value === undefined) {
      if (col.required) issues.push({ column: col.header, message: 'required' });
      continue;
    }
    if ('top' in col.target) out[col.target.top] = value;
    else if ('rating' in col.target) ratings[col.target.rating] = value;
    else hp[col.target.hp] = value;
  }
  if (Object.keys(hp).length > 0) ratings.hpByVolts = hp;
  out.ratings = ratings;
  if (!('sccrKa' in out)) out.sccrKa = null;
  if (issues.length > 0) return { item: null, issues };
  const parsed = CatalogueItemSchema.safeParse(out);
  if (!parsed.success) {
    return {
      item: null,
      issues: parsed.error.issues.map((i) => ({ column: columnOfPath(i.path), message: i.message })),
    };
  }
  return { item: parsed.data, issues: [] };
}

/** Flatten an item into spreadsheet cells, header → value (undefined for an empty cell). */
export function catalogueItemToRow(item: CatalogueItem): Record<string, string | number | boolean | undefined> {
  const row: Record<string, string | number | boolean | undefined> = {};
  for (const col of CATALOGUE_COLUMNS) {
    let v: unknown;
    if ('top' in col.target) v = item[col.target.top];
    else if ('rating' in col.target) v = item.ratings[col.target.rating];
    else v = item.ratings.hpByVolts?.[col.target.hp];
    if (v === null || v === undefined) row[col.header] = undefined;
    else if (Array.isArray(v)) row[col.header] = v.join(LIST_SEPARATOR);
    else row[col.header] = v as string | number | boolean;
  }
  return row;
}
