// Input of the selection engine: the supply and one load per motor. Shared by the CLI, the server
// and the web forms (zodResolver). Field names are the CLI's public contract (see the README).

import { z } from 'zod';

// Messages are in words for the person who reads them (shared/plain-messages.ts words the rest).
const positive = (_what: string) => z.number().positive();

export const SupplySchema = z
  .object({
    volts: positive('volts').max(1000, 'panels are limited to 1000 V (NEC 409)'),
    phases: z.union([z.literal(1), z.literal(3)], { error: 'Choose 1 or 3 phases' }),
    hz: z.union([z.literal(50), z.literal(60)], { error: 'Choose 50 or 60 Hz' }).default(60),
    availableFaultKa: positive('availableFaultKa').max(200, 'an available fault current above 200 kA is outside this product'),
    ambientC: z.number().min(-40).max(85),
    /** Measured voltage unbalance at the site, % (NEMA MG 1 14.36); 0 when none is known. */
    voltageUnbalancePercent: z.number().min(0).max(20, 'a voltage unbalance above 20 % is outside this product').default(0),
    /** The panel's equipment (starters, protective devices, terminal blocks) listed and identified for 75 °C
     *  conductors (110.14(C)(1)(a)(3)); absent: taken as true and flagged on each motor whose conductor it changes. */
    terminationsListed75C: z.boolean({ error: 'Answer yes or no: are the terminations listed for 75 °C?' }).optional(),
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
    tag: z.string().trim().min(1, 'Give the motor a tag').max(40),
    description: z.string().max(200).optional(),
    supply: z.enum(['ac3', 'ac1', 'dc'], { error: 'Choose three-phase AC (ac3), single-phase AC (ac1) or DC (dc)' }),
    hp: positive('hp').max(1000).optional(),
    kw: positive('kw').max(750).optional(),
    volts: positive('volts').max(1000, 'motors above 1000 V are outside this product'),
    hz: z.union([z.literal(50), z.literal(60)], { error: 'Choose 50 or 60 Hz' }).default(60),
    fla: positive('fla').max(5000).optional(),
    serviceFactor: z.number().min(1, 'A service factor is at least 1.0').max(1.5).default(1.0),
    tempRiseC: positive('tempRiseC').max(150).optional(),
    /** the motor's locked-rotor withstand (hot safe stall) time, s, from the motor maker's data */
    lockedRotorWithstandS: positive('lockedRotorWithstandS').max(300).optional(),
    codeLetter: z.enum(CODE_LETTERS, { error: 'Use a NEC Table 430.7(B) code letter (A–V, no I, O, Q)' }).optional(),
    design: z.enum(['A', 'B', 'C', 'D']).optional(),
    energyEfficient: z.boolean().default(false),
    poles: z
      .number()
      .int()
      .min(2)
      .max(48)
      .refine((p) => p % 2 === 0, 'The number of poles is even')
      .optional(),
    rotor: z.enum(['squirrel-cage', 'wound-rotor']).default('squirrel-cage'),
    singlePhaseType: z.enum(['split-phase', 'capacitor-start', 'psc', 'two-value-capacitor']).optional(),
    dcField: z.enum(['shunt', 'series', 'compound']).optional(),
    leads: z.union([z.literal(3), z.literal(6), z.literal(9), z.literal(12)], { error: 'Choose 3, 6, 9 or 12 leads' }).optional(),
    connection: z.enum(['wye', 'delta']).optional(),
    duty: z.enum(['continuous', 'intermittent']).default('continuous'),
    jogging: z.boolean().default(false),
    plugging: z.boolean().default(false),
    reversing: z.boolean().default(false),
    speedControl: z.enum(['fixed', 'variable']).default('fixed'),
    /** speed range as a ratio, e.g. 10 for 10:1 */
    turndown: z.number().min(1, 'Turndown is a ratio of at least 1 (e.g. 10 for 10:1)').max(1000).optional(),
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
        tempRatingC: z.union([z.literal(60), z.literal(75), z.literal(90)], { error: 'Choose 60, 75 or 90 °C' }).default(75),
      })
      .strict()
      .prefault({}),
    cableLengthFt: z.number().min(0).max(10000).optional(),
    /** a motor at another voltage than the supply: fed from a transformer or DC supply in the panel, or from a source outside it */
    fedFrom: z.enum(['panel', 'external'], { error: 'fedFrom must be "panel" or "external"' }).default('panel'),
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
    controlScheme: z
      .enum(CONTROL_SCHEMES, { error: 'controlScheme must be "three-wire", "two-wire" or "hand-off-auto"' })
      .default('three-wire'),
    /** rated input current of the chosen drive, for its input conductors (430.122(A)) */
    driveInputAmps: positive('driveInputAmps').max(5000).optional(),
    /** the tag of a drive this motor shares with other motors of the panel (e.g. "VFD-1"); absent: its own drive */
    sharedDrive: z.string().trim().min(1, 'Give the shared drive a tag, or leave it empty').max(40).optional(),
    /** several motors on one branch circuit (430.53): the group's tag, shared by its motors (absent: its own branch circuit) */
    branchGroup: z.string().trim().min(1, 'Give the group a tag, e.g. G-1').max(20).optional(),
    /** the largest fuse or inverse-time breaker marked on this motor's controller and overload relay where both are
     *  listed for group installation (430.53(C)(1)(a), (2)(a)); absent: not listed for group installation */
    groupListedMaxAmps: positive('groupListedMaxAmps').max(6000).optional(),
    /** 430.52(C)(1) Exception 2: a higher protective-device limit, only with a reason */
    scpdOverride: z
      .object({
        maxPercent: positive('scpdOverride.maxPercent').max(1700),
        reason: z.string().trim().min(10, 'Explain why the motor will not start (at least 10 characters)'),
      })
      .strict()
      .optional(),
  })
  .strict();

type LoadShape = z.output<typeof LoadObject>;

function crossCheck(l: LoadShape, ctx: z.RefinementCtx): void {
  const issue = (path: string, message: string) => ctx.addIssue({ code: 'custom', path: [path], message });
  if (l.hp === undefined && l.kw === undefined) issue('hp', 'Give the horsepower or the kW');
  if (l.hp !== undefined && l.kw !== undefined) issue('kw', 'Give the horsepower or the kW, not both');
  if (l.supply !== 'dc' && l.dcField !== undefined) issue('dcField', 'A DC field applies to DC motors only');
  if (l.supply === 'dc' && l.singlePhaseType !== undefined)
    issue('singlePhaseType', 'A single-phase type applies to single-phase motors only');
  if (l.supply === 'ac3' && l.singlePhaseType !== undefined)
    issue('singlePhaseType', 'A single-phase type applies to single-phase motors only');
  if (l.supply !== 'ac3') {
    if (l.rotor === 'wound-rotor') issue('rotor', 'A wound rotor applies to three-phase motors only');
    if (l.design !== undefined) issue('design', 'NEMA design letters A–D apply to three-phase motors only');
    if (l.connection !== undefined) issue('connection', 'A winding connection applies to three-phase motors only');
    if (l.leads !== undefined) issue('leads', 'Leads (3, 6, 9, 12) apply to three-phase motors only');
    if (l.insideDelta) issue('insideDelta', 'Inside-delta soft starting applies to three-phase motors only');
  }
  if (l.supply === 'dc' && l.codeLetter !== undefined) issue('codeLetter', 'Code letters (Table 430.7(B)) apply to AC motors only');
  if (l.energyEfficient && l.design !== 'B') issue('energyEfficient', 'Energy-efficient applies to NEMA Design B motors: choose Design B');
  if (l.speedControl !== 'variable') {
    if (l.turndown !== undefined) issue('turndown', 'Turndown applies only to variable speed');
    if (l.torque !== undefined) issue('torque', 'Load torque applies only to variable speed');
    if (l.sharedDrive !== undefined) issue('sharedDrive', 'A shared drive applies only to motors with variable speed');
  }
  if (l.supply === 'dc' && l.sharedDrive !== undefined) issue('sharedDrive', 'A shared drive applies to AC motors only');
  if (l.leads === 3 && l.connection !== undefined && l.insideDelta) issue('insideDelta', 'Inside-delta needs a six- or twelve-lead motor');
  if (l.rotor === 'wound-rotor' && l.starterPreference !== undefined)
    issue('starterPreference', 'A reduced-voltage method applies to squirrel-cage motors');
}

/** The load fields without the cross-field checks, for forms that extend them (apply `loadCrossCheck` after). */
export const LoadFieldsSchema = LoadObject;
export const loadCrossCheck = crossCheck;

export const LoadSchema = LoadObject.superRefine(crossCheck);

/**
 * Answers the engine assumes when they are not given, and flags in the selection's `assumed` list
 * (service factor 1.0, so a 115 % overload limit per 430.32(A)(1); NEMA Type 12; no code letter;
 * a shunt field; constant torque; table FLC for the FLA; short drive leads). A form leaves them
 * empty until the user answers, so the wizard, the motor-list import and the CLI reach the same
 * selection, with the same flags, for the same unknowns.
 */
export const ASSUMED_WHEN_NOT_GIVEN = ['serviceFactor', 'environment', 'codeLetter', 'dcField', 'torque', 'fla', 'cableLengthFt'] as const;

/**
 * The answers a motor takes when they are not given: the schema's own defaults, read from it (each
 * field parsed from "not given"), less the assumptions above. The wizard starts from these; the
 * import and the CLI get the same values from the same schema when they parse.
 */
export function loadDefaults(): Partial<Load> {
  const out: Record<string, unknown> = {};
  for (const [key, field] of Object.entries(LoadObject.shape)) {
    if ((ASSUMED_WHEN_NOT_GIVEN as readonly string[]).includes(key)) continue;
    const r = (field as z.ZodType).safeParse(undefined);
    if (r.success && r.data !== undefined) out[key] = r.data;
  }
  return out as Partial<Load>;
}

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
