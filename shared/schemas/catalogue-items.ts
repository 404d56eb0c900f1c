// The shop's component catalogue: categories, ratings, items and labour units.
// Pure zod; the same schemas validate the seed files, the REST bodies and the spreadsheet import.
import { z } from 'zod';
import { countSchema } from './bounds';

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
export const CATEGORY_LABELS: Record<Category, string> = Object.fromEntries(CATEGORIES.map((c) => [c.id, c.label])) as Record<
  Category,
  string
>;

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
  '18',
  '16',
  '14',
  '12',
  '10',
  '8',
  '6',
  '4',
  '3',
  '2',
  '1',
  '1/0',
  '2/0',
  '3/0',
  '4/0',
  '250',
  '300',
  '350',
  '400',
  '500',
  '600',
  '750',
] as const;
export const WireSizeSchema = z.enum(WIRE_SIZES);

export const FUSE_CLASSES = ['J', 'RK5', 'CC'] as const;
export const FuseClassSchema = z.enum(FUSE_CLASSES);

/** zod number schemas the catalogue's figures share */
export const positive = z.number().finite().positive();
export const nonNegative = z.number().finite().nonnegative();

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
    tripClasses: z
      .array(z.union([z.literal(10), z.literal(20), z.literal(30)]))
      .min(1)
      .optional(),
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
export const PartCodeSchema = z.string().regex(/^[A-Z0-9][A-Z0-9-]{2,39}$/, 'part code: 3–40 upper-case letters, digits or hyphens');

/** The item's fields without the cross-field checks (for .partial()/.pick() in request schemas); validate with CatalogueItemSchema. */
export const CatalogueItemBaseSchema = z
  .object({
    code: PartCodeSchema,
    description: z.string().trim().min(1).max(200),
    category: CategorySchema,
    unit: UnitSchema.default('ea'),
    ratings: RatingsSchema,
    /**
     * outside dimensions as mounted, mm: across the backplate, up it, and off it (for an enclosure, its own
     * size); absent where not given (wire). The backplate layout places each part by them.
     */
    outlineWidthMm: positive.nullish(),
    outlineHeightMm: positive.nullish(),
    outlineDepthMm: positive.nullish(),
    /** free space a drive or soft starter needs above and below it for its cooling air, mm (its instructions give it) */
    clearanceAboveMm: nonNegative.nullish(),
    clearanceBelowMm: nonNegative.nullish(),
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
  const outline = [item.outlineWidthMm, item.outlineHeightMm, item.outlineDepthMm];
  if (outline.some((v) => v != null) && outline.some((v) => v == null)) {
    ctx.addIssue({ code: 'custom', path: ['outlineWidthMm'], message: 'give the width, height and depth together, or none of them' });
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

/** Every rating a catalogue item may carry (shared/schemas/catalogue.ts RatingsSchema). */
export const RATING_LABELS: Record<keyof Ratings, string> = {
  volts: 'Rated voltage',
  voltsMin: 'Lowest rated voltage',
  poles: 'Poles',
  coilVolts: 'Coil voltage',
  nemaSize: 'NEMA size',
  amps: 'Rated current',
  iecAc3Amps: 'IEC AC-3 current',
  iecAc4Amps: 'IEC AC-4 current',
  hpByVolts: 'Horsepower by voltage',
  settingMinAmps: 'Setting range from',
  settingMaxAmps: 'Setting range to',
  tripClasses: 'Trip classes',
  electronic: 'Electronic',
  detectsPhaseLoss: 'Detects phase loss',
  detectsPhaseReversal: 'Detects phase reversal',
  detectsImbalance: 'Detects imbalance',
  fuseClass: 'Fuse class',
  timeDelay: 'Time delay',
  kaic: 'Interrupting rating',
  va: 'Power rating',
  sealedVa: 'Sealed coil power',
  inrushVa: 'Inrush power',
  secondaryVolts: 'Secondary voltage',
  normalDutyAmps: 'Normal-duty current',
  heavyDutyAmps: 'Heavy-duty current',
  inputAmps: 'Input current',
  wireSize: 'Wire size',
  wireMin: 'Smallest wire',
  wireMax: 'Largest wire',
  nemaType: 'NEMA type',
  nemaTypes: 'NEMA types kept',
  heightMm: 'Height',
  widthMm: 'Width',
  depthMm: 'Depth',
  cfm: 'Air flow',
  coolingW: 'Cooling capacity',
  outputs: 'Outputs per pole',
  kind: 'Kind',
  function: 'Function',
  contacts: 'Contacts',
  color: 'Colour',
  ohms: 'Resistance',
  watts: 'Power',
  internalBypass: 'Internal bypass',
  builtInOverload: 'Built-in overload',
};

/** Units of the ratings, for a field's label ("Coil voltage (V)"). */
export const RATING_UNITS: Partial<Record<keyof Ratings, string>> = {
  volts: 'V',
  voltsMin: 'V',
  coilVolts: 'V',
  amps: 'A',
  iecAc3Amps: 'A',
  iecAc4Amps: 'A',
  settingMinAmps: 'A',
  settingMaxAmps: 'A',
  kaic: 'kA',
  va: 'VA',
  sealedVa: 'VA',
  inrushVa: 'VA',
  secondaryVolts: 'V',
  normalDutyAmps: 'A',
  heavyDutyAmps: 'A',
  inputAmps: 'A',
  heightMm: 'mm',
  widthMm: 'mm',
  depthMm: 'mm',
  cfm: 'cfm',
  coolingW: 'W',
  ohms: 'Ω',
  watts: 'W',
};
