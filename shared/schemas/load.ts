// Input of the selection engine: the supply and one load per motor. Shared by the CLI, the server
// and the web forms (zodResolver). Field names are the CLI's public contract (see the README).

import { z } from 'zod';

const positive = (what: string) => z.number({ error: `${what} must be a number` }).positive(`${what} must be greater than 0`);

export const SupplySchema = z
  .object({
    volts: positive('volts').max(1000, 'panels are limited to 1000 V (NEC 409)'),
    phases: z.union([z.literal(1), z.literal(3)], { error: 'phases must be 1 or 3' }),
    hz: z.union([z.literal(50), z.literal(60)], { error: 'hz must be 50 or 60' }).default(60),
    availableFaultKa: positive('availableFaultKa').max(200, 'availableFaultKa above 200 kA is outside this product'),
    ambientC: z.number({ error: 'ambientC must be a number' }).min(-40).max(85),
    /** Measured voltage unbalance at the site, % (NEMA MG 1 14.36); 0 when none is known. */
    voltageUnbalancePercent: z.number({ error: 'voltageUnbalancePercent must be a number' }).min(0).max(20, 'voltageUnbalancePercent above 20 % is outside this product').default(0),
    /** Feeder conductors and protective device (optional; copper, 75 °C, inverse-time breaker by default). */
    feeder: z
      .object({
        material: z.enum(['cu', 'al']).default('cu'),
        tempRatingC: z.union([z.literal(60), z.literal(75), z.literal(90)]).default(75),
        ocpdType: z.enum(['inverse-time-breaker', 'dual-element-fuse', 'non-time-delay-fuse']).default('inverse-time-breaker'),
      })
      .prefault({}),
  })
  .strict();

export const ENVIRONMENTS = [
  'indoor-dry',
  'indoor-dusty',
  'outdoor',
  'washdown',
  'corrosive',
  'class1-div1',
  'class1-div2',
  'class2-div1',
  'class2-div2',
] as const;

export const SCPD_TYPES = ['inverse-time-breaker', 'instantaneous-trip-breaker', 'dual-element-fuse', 'non-time-delay-fuse'] as const;

export const CONTROL_SCHEMES = ['three-wire', 'two-wire', 'hand-off-auto'] as const;
export type ControlScheme = (typeof CONTROL_SCHEMES)[number];

const CODE_LETTERS = ['A', 'B', 'C', 'D', 'E', 'F', 'G', 'H', 'J', 'K', 'L', 'M', 'N', 'P', 'R', 'S', 'T', 'U', 'V'] as const;

const LoadObject = z
  .object({
    tag: z.string().trim().min(1, 'tag is required').max(40),
    description: z.string().max(200).optional(),
    supply: z.enum(['ac3', 'ac1', 'dc'], { error: 'supply must be "ac3", "ac1" or "dc"' }),
    hp: positive('hp').max(1000).optional(),
    kw: positive('kw').max(750).optional(),
    volts: positive('volts').max(1000, 'motors above 1000 V are outside this product'),
    hz: z.union([z.literal(50), z.literal(60)], { error: 'hz must be 50 or 60' }).default(60),
    fla: positive('fla').max(5000).optional(),
    serviceFactor: z.number().min(1, 'serviceFactor is at least 1.0').max(1.5).default(1.0),
    tempRiseC: positive('tempRiseC').max(150).optional(),
    /** the motor's locked-rotor withstand (hot safe stall) time, s, from the motor maker's data */
    lockedRotorWithstandS: positive('lockedRotorWithstandS').max(300).optional(),
    codeLetter: z.enum(CODE_LETTERS, { error: 'codeLetter must be a NEC Table 430.7(B) letter (A–V, no I, O, Q)' }).optional(),
    design: z.enum(['A', 'B', 'C', 'D']).optional(),
    energyEfficient: z.boolean().default(false),
    poles: z.number().int().min(2).max(48).refine((p) => p % 2 === 0, 'poles must be even').optional(),
    rotor: z.enum(['squirrel-cage', 'wound-rotor']).default('squirrel-cage'),
    singlePhaseType: z.enum(['split-phase', 'capacitor-start', 'psc', 'two-value-capacitor']).optional(),
    dcField: z.enum(['shunt', 'series', 'compound']).optional(),
    leads: z.union([z.literal(3), z.literal(6), z.literal(9), z.literal(12)], { error: 'leads must be 3, 6, 9 or 12' }).optional(),
    connection: z.enum(['wye', 'delta']).optional(),
    duty: z.enum(['continuous', 'intermittent']).default('continuous'),
    jogging: z.boolean().default(false),
    plugging: z.boolean().default(false),
    reversing: z.boolean().default(false),
    speedControl: z.enum(['fixed', 'variable']).default('fixed'),
    /** speed range as a ratio, e.g. 10 for 10:1 */
    turndown: z.number().min(1, 'turndown is a ratio of at least 1 (e.g. 10 for 10:1)').max(1000).optional(),
    torque: z.enum(['variable', 'constant']).optional(),
    startingLimit: z.enum(['none', 'reduced-inrush']).default('none'),
    inertia: z.enum(['normal', 'high', 'very-high']).default('normal'),
    reverseRotationHazard: z.boolean().default(false),
    critical: z.boolean().default(false),
    environment: z.enum(ENVIRONMENTS).optional(),
    scpdType: z.enum(SCPD_TYPES).default('inverse-time-breaker'),
    conductor: z
      .object({
        material: z.enum(['cu', 'al']).default('cu'),
        tempRatingC: z.union([z.literal(60), z.literal(75), z.literal(90)], { error: 'tempRatingC must be 60, 75 or 90' }).default(75),
      })
      .strict()
      .prefault({}),
    cableLengthFt: z.number().min(0).max(10000).optional(),
    // Beyond the CLI's minimum field set (documented in the README):
    /** two-speed motor (consequent-pole or separate windings) */
    twoSpeed: z.boolean().default(false),
    /** reduced-voltage method wanted when inrush must be limited */
    starterPreference: z.enum(['rvss', 'wye-delta', 'part-winding']).optional(),
    /** soft starter connected inside the motor's delta (six-lead delta motor) */
    insideDelta: z.boolean().default(false),
    /** DC: quick stops wanted (dynamic braking) */
    quickStop: z.boolean().default(false),
    /** control of the starter's coil: three-wire (stop/start with seal-in, no restart after a power loss),
     *  two-wire (a maintained contact from a remote controller, restarts by itself) or hand-off-auto */
    controlScheme: z.enum(CONTROL_SCHEMES, { error: 'controlScheme must be "three-wire", "two-wire" or "hand-off-auto"' }).default('three-wire'),
    /** rated input current of the chosen drive, for its input conductors (430.122(A)) */
    driveInputAmps: positive('driveInputAmps').max(5000).optional(),
    /** 430.52(C)(1) Exception 2: a higher protective-device limit, only with a reason */
    scpdOverride: z
      .object({
        maxPercent: positive('scpdOverride.maxPercent').max(1700),
        reason: z.string().trim().min(10, 'scpdOverride.reason must explain why (at least 10 characters)'),
      })
      .strict()
      .optional(),
  })
  .strict();

type LoadShape = z.output<typeof LoadObject>;

function crossCheck(l: LoadShape, ctx: z.RefinementCtx): void {
  const issue = (path: string, message: string) => ctx.addIssue({ code: 'custom', path: [path], message });
  if (l.hp === undefined && l.kw === undefined) issue('hp', 'hp or kw is required');
  if (l.hp !== undefined && l.kw !== undefined) issue('kw', 'give hp or kw, not both');
  if (l.supply !== 'dc' && l.dcField !== undefined) issue('dcField', 'dcField applies to dc motors only');
  if (l.supply === 'dc' && l.singlePhaseType !== undefined) issue('singlePhaseType', 'singlePhaseType applies to single-phase (ac1) motors only');
  if (l.supply === 'ac3' && l.singlePhaseType !== undefined) issue('singlePhaseType', 'singlePhaseType applies to single-phase (ac1) motors only');
  if (l.supply !== 'ac3') {
    if (l.rotor === 'wound-rotor') issue('rotor', 'wound-rotor applies to three-phase (ac3) motors only');
    if (l.design !== undefined) issue('design', 'NEMA design letters A–D apply to three-phase (ac3) motors only');
    if (l.connection !== undefined) issue('connection', 'connection applies to three-phase (ac3) motors only');
    if (l.leads !== undefined) issue('leads', 'leads (3, 6, 9, 12) apply to three-phase (ac3) motors only');
    if (l.insideDelta) issue('insideDelta', 'inside-delta soft starting applies to three-phase (ac3) motors only');
  }
  if (l.supply === 'dc' && l.codeLetter !== undefined) issue('codeLetter', 'code letters (Table 430.7(B)) apply to AC motors only');
  if (l.energyEfficient && l.design !== 'B') issue('energyEfficient', 'energyEfficient applies to NEMA Design B motors: set design "B"');
  if (l.speedControl !== 'variable') {
    if (l.turndown !== undefined) issue('turndown', 'turndown applies only when speedControl is "variable"');
    if (l.torque !== undefined) issue('torque', 'torque applies only when speedControl is "variable"');
  }
  if (l.leads === 3 && l.connection !== undefined && l.insideDelta) issue('insideDelta', 'inside-delta needs a six- or twelve-lead motor');
  if (l.rotor === 'wound-rotor' && l.starterPreference !== undefined) issue('starterPreference', 'reduced-voltage starter preferences apply to squirrel-cage motors');
}

/** The load fields without the cross-field checks, for forms that extend them (apply `loadCrossCheck` after). */
export const LoadFieldsSchema = LoadObject;
export const loadCrossCheck = crossCheck;

export const LoadSchema = LoadObject.superRefine(crossCheck);

export const SelectionInputSchema = z
  .object({
    supply: SupplySchema,
    loads: z.array(LoadSchema).min(1, 'at least one load is required').max(2000),
  })
  .strict();

export type SupplyInput = z.input<typeof SupplySchema>;
export type Supply = z.output<typeof SupplySchema>;
export type LoadInput = z.input<typeof LoadSchema>;
export type Load = z.output<typeof LoadSchema>;
export type SelectionInput = z.input<typeof SelectionInputSchema>;
export type SelectionRequest = z.output<typeof SelectionInputSchema>;
export type Environment = (typeof ENVIRONMENTS)[number];
