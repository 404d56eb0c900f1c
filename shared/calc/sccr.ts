// Panel short-circuit current rating by the weakest-link method of UL 508A Supplement SB (SB4),
// compared with the job's available fault current (NEC 2023 409.22). Produces the SCCR worksheet data.
import {
  assumedSccr,
  findCombination,
  raiseByCurrentLimitingFeeder,
  type CombinationRating,
  type CurrentLimitingFuseClass,
  type LetThrough,
  type SccrComponentType,
} from '../standards/ul508a-sb4';
import { round2 } from './round';

/** What the SCCR check needs of a catalogue part (the lead wires the catalogue in). */
export interface SccrComponentInput {
  code: string;
  category: SccrComponentType;
  description: string;
  /** marked short-circuit current rating (or marked interrupting rating of a protective device), kA */
  sccrKa?: number;
  qty?: number;
  /** unit cost; used only for the cost difference of ways out */
  cost?: number;
  /** published withstand I²t, used by the current-limiting raise */
  i2tWithstandA2s?: number;
  /** a branch-circuit protective device (fuse or breaker protecting the branch); defaults by category in a bucket */
  isBranchProtectiveDevice?: boolean;
  /** set on a feeder device that is current-limiting */
  currentLimiting?: {
    fuseClass?: CurrentLimitingFuseClass;
    listedCurrentLimitingBreaker?: boolean;
    letThrough: LetThrough;
  };
}

export interface SccrBucketInput {
  tag: string;
  /** motor horsepower: selects the Table SB4.1 row for unmarked motor controllers */
  hp: number | null;
  volts?: number;
  components: SccrComponentInput[];
}

export interface SccrAlternatives {
  /** current-limiting feeder devices the shop can fit (with let-through data and cost) */
  currentLimitingFeeders?: SccrComponentInput[];
  /** catalogue parts with marked ratings that could replace a weak component of the same category */
  replacements?: SccrComponentInput[];
}

export interface SccrInput {
  feeder: SccrComponentInput[];
  /** horsepower used for an unmarked horsepower-rated device in the feeder (e.g. the sum of motors) */
  feederHp?: number | null;
  buckets: SccrBucketInput[];
  combinations?: readonly CombinationRating[];
  /** the job's available fault current at the panel's line terminals, kA; null when not known */
  availableFaultKa: number | null;
  alternatives?: SccrAlternatives;
}

export type SccrSource = 'marked' | 'assumed' | 'combination' | 'current-limiting' | 'none';

export interface SccrRow {
  /** "feeder" or the bucket's tag */
  location: string;
  code: string;
  description: string;
  category: SccrComponentType;
  qty: number;
  ratingKa: number | null;
  source: SccrSource;
  basis: string;
  /** the rating before a current-limiting raise, where one applied */
  unraisedKa?: number;
  limiting: boolean;
  belowAvailable: boolean;
}

export type SccrVerdict = 'adequate' | 'below-available' | 'no-available-fault-current' | 'incomplete';

export interface SccrWayOut {
  kind: 'current-limiting-feeder' | 'higher-rated-component' | 'replace-all-weak' | 'advice';
  description: string;
  /** panel SCCR after the change, kA (null for advice) */
  resultingSccrKa: number | null;
  /** true when the panel would then be >= the available fault current */
  resolves: boolean;
  /** extra cost of the change (positive = dearer); null when costs are not supplied */
  costDifference: number | null;
  partCodes: string[];
}

export interface SccrResult {
  panelSccrKa: number | null;
  availableFaultKa: number | null;
  verdict: SccrVerdict;
  limiting: SccrRow[];
  rows: SccrRow[];
  waysOut: SccrWayOut[];
  basis: string;
  notes: string[];
}

/**
 * The SCCR component type of a catalogue category (the catalogue's category ids as plain strings).
 * Null: not counted in the power-circuit SCCR (control-circuit parts, pilot devices, accessories, the
 * load side of a drive). The control transformer itself is left out; its primary fuses and holder count.
 * Product choice, stated on the worksheet.
 */
export function sccrTypeForCatalogueCategory(category: string): SccrComponentType | null {
  const map: Record<string, SccrComponentType> = {
    contactor: 'contactor',
    'overload-relay': 'overload-relay',
    'inverse-time-breaker': 'circuit-breaker',
    'motor-circuit-protector': 'circuit-breaker',
    'main-breaker': 'circuit-breaker',
    fuse: 'fuse',
    'fuse-holder': 'fuse-holder',
    'fused-disconnect': 'disconnect-switch',
    'disconnect-switch': 'disconnect-switch',
    'main-disconnect': 'disconnect-switch',
    'manual-motor-protector': 'motor-protective-switch',
    'soft-starter': 'soft-starter',
    vfd: 'vfd',
    'dc-drive': 'vfd',
    'dc-starter': 'motor-controller',
    'terminal-block': 'terminal-block',
    'power-distribution-block': 'power-distribution-block',
  };
  return map[category] ?? null;
}

const PROTECTIVE_CATEGORIES: ReadonlySet<SccrComponentType> = new Set<SccrComponentType>(['fuse', 'circuit-breaker']);

interface Evaluated {
  rows: SccrRow[];
  panelSccrKa: number | null;
  notes: string[];
}

/** A component's rating, where it comes from and why. */
type Rating = Pick<SccrRow, 'ratingKa' | 'source' | 'basis'>;

function baseRating(c: SccrComponentInput, hp: number | null | undefined): Rating {
  if (c.sccrKa !== undefined) {
    return { ratingKa: c.sccrKa, source: 'marked', basis: 'marked rating (catalogue)' };
  }
  try {
    const a = assumedSccr(c.category, hp);
    if (a) return { ratingKa: a.ka, source: 'assumed', basis: `assumed for an unmarked component: ${a.basis}` };
    return {
      ratingKa: null,
      source: 'none',
      basis: 'no marked rating and UL 508A Table SB4.1 gives no assumed value for this type: mark or replace',
    };
  } catch (e) {
    return { ratingKa: null, source: 'none', basis: (e as Error).message };
  }
}

/** A worksheet row for one component at its location; limiting and belowAvailable are set once all rows are in. */
function rowOf(location: string, c: SccrComponentInput, rating: Rating): SccrRow {
  return {
    location,
    code: c.code,
    description: c.description,
    category: c.category,
    qty: c.qty ?? 1,
    ...rating,
    limiting: false,
    belowAvailable: false,
  };
}

function evaluate(input: Omit<SccrInput, 'alternatives'>): Evaluated {
  const rows: SccrRow[] = [];
  const notes: string[] = [];
  const available = input.availableFaultKa;

  for (const c of input.feeder) {
    rows.push(rowOf('feeder', c, baseRating(c, input.feederHp)));
  }

  const clFeeder = input.feeder.find((c) => c.currentLimiting && c.sccrKa !== undefined);

  for (const b of input.buckets) {
    const combo = findCombination(
      b.components.map((c) => c.code),
      input.combinations ?? [],
      b.volts,
    );
    for (const c of b.components) {
      let r = baseRating(c, b.hp);
      if (combo?.componentCodes.includes(c.code)) {
        r = {
          ratingKa: combo.ratingKa,
          source: 'combination',
          basis: `tested combination ${combo.id} (${combo.source}), UL 508A SB4`,
        };
      }
      const row = rowOf(b.tag, c, r);
      if (clFeeder?.currentLimiting && available !== null && r.ratingKa !== null && r.source !== 'combination') {
        const raise = raiseByCurrentLimitingFeeder(
          {
            type: c.category,
            ratingKa: r.ratingKa,
            i2tWithstandA2s: c.i2tWithstandA2s,
            isBranchProtectiveDevice: c.isBranchProtectiveDevice ?? PROTECTIVE_CATEGORIES.has(c.category),
          },
          {
            code: clFeeder.code,
            fuseClass: clFeeder.currentLimiting.fuseClass,
            listedCurrentLimitingBreaker: clFeeder.currentLimiting.listedCurrentLimitingBreaker,
            interruptingKa: clFeeder.sccrKa!,
            letThrough: clFeeder.currentLimiting.letThrough,
          },
          available,
        );
        if (raise.raised) {
          row.unraisedKa = r.ratingKa;
          row.ratingKa = raise.ratingKa;
          row.source = 'current-limiting';
          row.basis = `${r.basis}; raised by ${raise.basis}: ${raise.reason}`;
        }
      }
      rows.push(row);
    }
  }

  const rated = rows.filter((r) => r.ratingKa !== null);
  const unrated = rows.filter((r) => r.ratingKa === null);
  let panelSccrKa: number | null = null;
  if (rows.length > 0 && unrated.length === 0) {
    panelSccrKa = Math.min(...rated.map((r) => r.ratingKa as number));
    for (const r of rows) r.limiting = r.ratingKa === panelSccrKa;
  }
  if (unrated.length > 0) {
    notes.push(`${unrated.length} component(s) have no rating: the panel SCCR cannot be established until they are marked or replaced.`);
  }
  for (const r of rows) r.belowAvailable = available !== null && r.ratingKa !== null && r.ratingKa < available;
  return { rows, panelSccrKa, notes };
}

function costOf(c: SccrComponentInput | undefined): number | null {
  return c?.cost === undefined ? null : c.cost * (c.qty ?? 1);
}

function diff(newCost: number | null, oldCost: number | null): number | null {
  if (newCost === null || oldCost === null) return null;
  return round2(newCost - oldCost);
}

function replaceInInput(input: SccrInput, location: string, code: string, by: SccrComponentInput): SccrInput {
  const swap = (list: SccrComponentInput[]) =>
    list.map((c) => (c.code === code ? { ...by, qty: c.qty ?? 1, isBranchProtectiveDevice: c.isBranchProtectiveDevice } : c));
  if (location === 'feeder') return { ...input, feeder: swap(input.feeder) };
  return {
    ...input,
    buckets: input.buckets.map((b) => (b.tag === location ? { ...b, components: swap(b.components) } : b)),
  };
}

function findComponent(input: SccrInput, location: string, code: string): SccrComponentInput | undefined {
  const list = location === 'feeder' ? input.feeder : (input.buckets.find((b) => b.tag === location)?.components ?? []);
  return list.find((c) => c.code === code);
}

/** The panel's SCCR, each component's rating and its source, the limiting component, verdict and ways out. */
export function calculatePanelSccr(input: SccrInput): SccrResult {
  const ev = evaluate(input);
  const available = input.availableFaultKa;
  let verdict: SccrVerdict;
  if (ev.panelSccrKa === null) verdict = 'incomplete';
  else if (available === null) verdict = 'no-available-fault-current';
  else verdict = ev.panelSccrKa >= available ? 'adequate' : 'below-available';

  const waysOut: SccrWayOut[] = [];
  if (verdict === 'below-available' && available !== null) {
    // 1. a current-limiting feeder device, replacing the feeder's protective device where there is one
    for (const alt of input.alternatives?.currentLimitingFeeders ?? []) {
      const existing = input.feeder.find((c) => PROTECTIVE_CATEGORIES.has(c.category));
      const feeder = existing
        ? input.feeder.map((c) => (c === existing ? { ...alt, qty: alt.qty ?? existing.qty } : c))
        : [alt, ...input.feeder];
      const after = evaluate({ ...input, feeder });
      waysOut.push({
        kind: 'current-limiting-feeder',
        description: existing
          ? `Replace feeder device ${existing.code} by current-limiting ${alt.code} (${alt.description})`
          : `Add current-limiting feeder device ${alt.code} (${alt.description})`,
        resultingSccrKa: after.panelSccrKa,
        resolves: after.panelSccrKa !== null && after.panelSccrKa >= available,
        costDifference: diff(costOf(alt), existing ? costOf(existing) : 0),
        partCodes: [alt.code],
      });
    }
    // 2. a higher-rated component in place of each weak one
    let working: SccrInput = input;
    let allCost: number | null = 0;
    const allCodes: string[] = [];
    let allPossible = true;
    for (const row of ev.rows.filter((r) => r.belowAvailable)) {
      const current = findComponent(input, row.location, row.code);
      const candidates = (input.alternatives?.replacements ?? []).filter(
        (c) => c.category === row.category && c.sccrKa !== undefined && c.sccrKa >= available && c.code !== row.code,
      );
      if (candidates.length === 0) {
        allPossible = false;
        continue;
      }
      const best = candidates.reduce((a, b) => {
        const ca = a.cost ?? Infinity;
        const cb = b.cost ?? Infinity;
        if (ca !== cb) return cb < ca ? b : a;
        return (b.sccrKa ?? 0) > (a.sccrKa ?? 0) ? b : a;
      });
      const qty = current?.qty ?? 1;
      const after = evaluate(replaceInInput(input, row.location, row.code, best));
      const d = diff(best.cost === undefined ? null : best.cost * qty, costOf(current));
      waysOut.push({
        kind: 'higher-rated-component',
        description: `${row.location}: replace ${row.code} (${row.ratingKa} kA, ${row.source}) by ${best.code} marked ${best.sccrKa} kA`,
        resultingSccrKa: after.panelSccrKa,
        resolves: after.panelSccrKa !== null && after.panelSccrKa >= available,
        costDifference: d,
        partCodes: [best.code],
      });
      working = replaceInInput(working, row.location, row.code, best);
      allCost = allCost === null || d === null ? null : round2(allCost + d);
      allCodes.push(best.code);
    }
    const weakCount = ev.rows.filter((r) => r.belowAvailable).length;
    if (weakCount > 1 && allCodes.length > 0) {
      const after = evaluate(working);
      waysOut.push({
        kind: 'replace-all-weak',
        description: `Replace every component below ${available} kA by a higher-rated part${allPossible ? '' : ' (no candidate for some)'}`,
        resultingSccrKa: after.panelSccrKa,
        resolves: after.panelSccrKa !== null && after.panelSccrKa >= available,
        costDifference: allCost,
        partCodes: allCodes,
      });
    }
    if (waysOut.length === 0) {
      waysOut.push(
        {
          kind: 'advice',
          description:
            'Fit a current-limiting feeder device (Class J, CC, T or RK1 fuses) whose peak let-through at the available fault current is at or below the branch components’ ratings (UL 508A SB4.3).',
          resultingSccrKa: null,
          resolves: false,
          costDifference: null,
          partCodes: [],
        },
        {
          kind: 'advice',
          description: 'Use components with a higher marked rating or a tested combination rating (UL 508A SB4).',
          resultingSccrKa: null,
          resolves: false,
          costDifference: null,
          partCodes: [],
        },
      );
    }
  }

  const notes = [...ev.notes];
  if (ev.rows.some((r) => r.source === 'assumed')) {
    notes.push('Assumed ratings for unmarked components are from UL 508A Table SB4.1, written from memory: verify against the standard.');
  }
  if (verdict === 'no-available-fault-current') notes.push('The job has no available fault current: NEC 409.22 cannot be checked.');
  if (verdict === 'below-available') {
    notes.push(`Panel SCCR ${ev.panelSccrKa} kA is below the available fault current ${available} kA (NEC 2023 409.22).`);
  }

  return {
    panelSccrKa: ev.panelSccrKa,
    availableFaultKa: available,
    verdict,
    limiting: ev.rows.filter((r) => r.limiting),
    rows: ev.rows,
    waysOut,
    basis: 'UL 508A Supplement SB, SB4 (weakest link); NEC 2023 409.22 (SCCR >= available fault current)',
    notes,
  };
}
