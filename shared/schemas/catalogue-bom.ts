// The bill-of-materials line: its bucket and category, the requirement it was matched against, its totals.
import { z } from 'zod';
import {
  CATEGORY_IDS,
  CategorySchema,
  FuseClassSchema,
  HpVoltsSchema,
  nonNegative,
  PartCodeSchema,
  positive,
  UnitSchema,
  WireSizeSchema,
} from './catalogue-items';

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
    /** usable back-panel area, mm² (see usableAreaMm2 in shared/calc/bom-stages/match.ts) */
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
