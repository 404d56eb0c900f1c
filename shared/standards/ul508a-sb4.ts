// UL 508A, Supplement SB (short-circuit current ratings of industrial control panels), clause SB4.
// - Table SB4.1: assumed short-circuit current ratings of unmarked components.
// - SB4.3-style raise of a branch rating by a current-limiting device in the feeder.
// - Tested combination ratings (a catalogue-supplied, listed combination of components).
//
// EVERY kA value in ASSUMED_SCCR below is written FROM MEMORY of UL 508A Table SB4.1 and must be
// checked against the current edition of the standard before the product is relied on.

/** Component types the panel SCCR worksheet knows, in the power circuit. */
export type SccrComponentType =
  | 'bus-bar'
  | 'circuit-breaker'
  | 'fuse'
  | 'fuse-holder'
  | 'disconnect-switch'
  | 'terminal-block'
  | 'power-distribution-block'
  | 'supplementary-protector'
  | 'contactor'
  | 'overload-relay'
  | 'motor-controller'
  | 'motor-protective-switch'
  | 'vfd'
  | 'soft-starter'
  | 'meter-current-shunt'
  | 'receptacle'
  | 'other';

export interface AssumedRating {
  ka: number;
  /** the row of the table, in words, and the clause */
  basis: string;
  fromMemory: true;
}

const TABLE = 'UL 508A Table SB4.1 (from memory)';

/** Table SB4.1 rows for motor controllers rated in horsepower (from memory). Upper bound inclusive. */
export const MOTOR_CONTROLLER_HP_ROWS: ReadonlyArray<{ maxHp: number; ka: number; row: string }> = [
  { maxHp: 50, ka: 5, row: '0–50 hp' },
  { maxHp: 200, ka: 10, row: '51–200 hp' },
  { maxHp: 400, ka: 18, row: '201–400 hp' },
  { maxHp: 600, ka: 30, row: '401–600 hp' },
  { maxHp: 900, ka: 42, row: '601–900 hp' },
  { maxHp: 1500, ka: 85, row: '901–1500 hp' },
];

/** Fixed rows of Table SB4.1 that do not depend on horsepower (from memory). */
export const ASSUMED_SCCR_FIXED: Readonly<Partial<Record<SccrComponentType, { ka: number; row: string }>>> = {
  'bus-bar': { ka: 10, row: 'bus bars' },
  'circuit-breaker': { ka: 5, row: 'circuit breaker (including GFCI type)' },
  'fuse-holder': { ka: 10, row: 'fuseholder' },
  fuse: { ka: 10, row: 'miniature or miscellaneous fuse' },
  'disconnect-switch': { ka: 5, row: 'switch unit' },
  'terminal-block': { ka: 10, row: 'terminal block' },
  'power-distribution-block': { ka: 10, row: 'power distribution block' },
  'supplementary-protector': { ka: 0.2, row: 'supplementary protector' },
  'meter-current-shunt': { ka: 10, row: 'current shunt' },
  receptacle: { ka: 10, row: 'receptacle (other than GFCI type)' },
};

/** Types whose assumed rating is the Table SB4.1 "motor controller rated in horsepower" row. */
const HP_RATED_TYPES: ReadonlySet<SccrComponentType> = new Set<SccrComponentType>([
  'contactor',
  'overload-relay',
  'motor-controller',
  'motor-protective-switch',
  'vfd',
  'soft-starter',
]);

export function isHorsepowerRated(type: SccrComponentType): boolean {
  return HP_RATED_TYPES.has(type);
}

/**
 * The assumed SCCR of an unmarked component by its type (and the motor horsepower for motor controllers).
 * Returns null when Table SB4.1 gives no assumed value for the type: such a component must be marked.
 * Throws when horsepower is needed but outside the table (over 1500 hp): the table does not cover it.
 */
export function assumedSccr(type: SccrComponentType, hp?: number | null): AssumedRating | null {
  if (HP_RATED_TYPES.has(type)) {
    if (hp == null || !Number.isFinite(hp) || hp < 0) {
      throw new RangeError(`${TABLE}: horsepower is needed for the assumed rating of a ${type}`);
    }
    const row = MOTOR_CONTROLLER_HP_ROWS.find((r) => hp <= r.maxHp);
    if (!row) throw new RangeError(`${TABLE}: ${hp} hp is above the table (1500 hp)`);
    const note =
      type === 'vfd' || type === 'soft-starter'
        ? '; an unmarked drive or soft starter is taken as a motor controller — prefer its marked or combination rating'
        : '';
    return { ka: row.ka, basis: `${TABLE}, motor controller rated ${row.row}${note}`, fromMemory: true };
  }
  const fixed = ASSUMED_SCCR_FIXED[type];
  if (!fixed) return null;
  return { ka: fixed.ka, basis: `${TABLE}, ${fixed.row}`, fromMemory: true };
}

// ---------------------------------------------------------------------------------------------
// Current-limiting feeder device (SB4.3-style).

/** Listed classes of current-limiting fuse the product accepts in the feeder for the raise. */
export const CURRENT_LIMITING_FUSE_CLASSES = ['J', 'CC', 'T', 'RK1'] as const;
export type CurrentLimitingFuseClass = (typeof CURRENT_LIMITING_FUSE_CLASSES)[number];

export interface LetThrough {
  /** peak let-through current at the prospective current below, kA */
  ipKa: number;
  /** let-through energy, A²s */
  i2tA2s: number;
  /** the prospective (available) fault current these values were published for, kA */
  atProspectiveKa: number;
}

export interface CurrentLimitingFeeder {
  code: string;
  fuseClass?: CurrentLimitingFuseClass;
  /** a circuit breaker listed and marked current-limiting */
  listedCurrentLimitingBreaker?: boolean;
  interruptingKa: number;
  letThrough: LetThrough;
}

export interface BranchComponentForRaise {
  type: SccrComponentType;
  ratingKa: number;
  /** withstand I²t of the component where its maker publishes one */
  i2tWithstandA2s?: number;
  /** a branch-circuit protective device: its interrupting rating is never raised */
  isBranchProtectiveDevice: boolean;
}

export interface RaiseResult {
  raised: boolean;
  ratingKa: number;
  basis: string;
  reason: string;
}

const SB43 = 'UL 508A SB4.3 (from memory: current-limiting device in the feeder)';

/**
 * May a branch component's rating be raised by the current-limiting feeder device?
 * Conditions applied here (conservative reading of SB4.3, from memory):
 *  - the feeder device is a listed class of current-limiting fuse (J, CC, T, RK1) or a breaker listed
 *    and marked current-limiting;
 *  - its let-through values were published for a prospective current >= the available fault current;
 *  - peak let-through Ip <= the component's rating (kA);
 *  - let-through I²t <= the component's withstand I²t where that is published (stated when it is not);
 *  - branch-circuit protective devices keep their own interrupting rating, and drives / soft starters
 *    are not raised this way (product choice: use their marked or tested combination rating).
 * The raised rating is the lower of the feeder's interrupting rating and the prospective current of
 * its published let-through.
 */
export function raiseByCurrentLimitingFeeder(
  component: BranchComponentForRaise,
  feeder: CurrentLimitingFeeder,
  availableFaultKa: number,
): RaiseResult {
  const keep = (reason: string): RaiseResult => ({ raised: false, ratingKa: component.ratingKa, basis: SB43, reason });
  const listed =
    (feeder.fuseClass !== undefined && (CURRENT_LIMITING_FUSE_CLASSES as readonly string[]).includes(feeder.fuseClass)) ||
    feeder.listedCurrentLimitingBreaker === true;
  if (!listed) return keep('feeder device is not a listed current-limiting class (J, CC, T, RK1 fuse or marked breaker)');
  if (component.isBranchProtectiveDevice) return keep('a branch-circuit protective device keeps its own interrupting rating');
  if (component.type === 'vfd' || component.type === 'soft-starter') {
    return keep('drives and soft starters are not raised by a feeder device; use a marked or tested combination rating');
  }
  const lt = feeder.letThrough;
  if (lt.atProspectiveKa < availableFaultKa) {
    return keep(`let-through published at ${lt.atProspectiveKa} kA, below the available ${availableFaultKa} kA`);
  }
  if (lt.ipKa > component.ratingKa) {
    return keep(`peak let-through ${lt.ipKa} kA exceeds the component rating ${component.ratingKa} kA`);
  }
  if (component.i2tWithstandA2s !== undefined && lt.i2tA2s > component.i2tWithstandA2s) {
    return keep(`let-through I²t ${lt.i2tA2s} A²s exceeds the component withstand ${component.i2tWithstandA2s} A²s`);
  }
  const ratingKa = Math.min(feeder.interruptingKa, lt.atProspectiveKa);
  if (ratingKa <= component.ratingKa) return keep('the feeder device would not raise the rating');
  const i2tNote = component.i2tWithstandA2s === undefined ? '; I²t not compared: no withstand I²t published for the component' : '';
  return {
    raised: true,
    ratingKa,
    basis: SB43,
    reason: `feeder ${feeder.code} lets through Ip ${lt.ipKa} kA <= ${component.ratingKa} kA${i2tNote}`,
  };
}

// ---------------------------------------------------------------------------------------------
// Tested combination ratings.

export interface CombinationRating {
  id: string;
  /** catalogue codes that make up the tested combination (all must be present in the bucket) */
  componentCodes: string[];
  ratingKa: number;
  /** maximum voltage of the combination's rating */
  maxVolts?: number;
  /** the listing or the maker's published combination table it comes from */
  source: string;
}

/** The combination that applies to a set of codes in one bucket: the highest-rated complete match. */
export function findCombination(
  codesInBucket: readonly string[],
  combinations: readonly CombinationRating[],
  volts?: number,
): CombinationRating | null {
  const present = new Set(codesInBucket);
  const matches = combinations.filter(
    (c) =>
      c.componentCodes.length > 0 &&
      c.componentCodes.every((code) => present.has(code)) &&
      (c.maxVolts === undefined || volts === undefined || volts <= c.maxVolts),
  );
  if (matches.length === 0) return null;
  return matches.reduce((a, b) => (b.ratingKa > a.ratingKa ? b : a));
}
