// Control power transformer: continuous (sealed) VA, inrush check, standard size, and its primary and
// secondary overcurrent protection per NEC 2023 430.72(C) and 450.3(B) / Table 450.3(B).

/** Standard control transformer VA ratings (common practice). */
export const STANDARD_CPT_VA = [50, 75, 100, 150, 200, 250, 300, 350, 500, 750, 1000, 1500, 2000, 3000, 5000] as const;

/**
 * Inrush VA a transformer of each size can carry at 40 % power factor with the secondary at ≥ 90 % of rated
 * voltage. TYPICAL DATA, INVENTED FOR THE PRODUCT (common practice shape only): use the transformer maker's
 * published regulation table for the part actually fitted.
 */
export const INRUSH_VA_AT_40PF_90PCT: Readonly<Record<(typeof STANDARD_CPT_VA)[number], number>> = {
  50: 170,
  75: 300,
  100: 450,
  150: 700,
  200: 1000,
  250: 1500,
  300: 2000,
  350: 2500,
  500: 4000,
  750: 6500,
  1000: 9500,
  1500: 17000,
  2000: 23000,
  3000: 40000,
  5000: 70000,
};

/** Fuse ratings below 15 A commonly made for control-transformer protection (Class CC / midget; common practice, from memory). */
export const SMALL_FUSE_RATINGS = [
  0.5, 0.6, 0.8, 1, 1.25, 1.5, 1.6, 2, 2.25, 2.5, 2.8, 3, 3.2, 3.5, 4, 4.5, 5, 5.6, 6, 6.25, 7, 8, 9, 10, 12,
] as const;

/** NEC 2023 240.6(A) standard ampere ratings, 15 A to 600 A. */
export const STANDARD_OCPD_AMPS_240_6A = [
  15, 20, 25, 30, 35, 40, 45, 50, 60, 70, 80, 90, 100, 110, 125, 150, 175, 200, 225, 250, 300, 350, 400, 450, 500, 600,
] as const;

const ALL_FUSE_RATINGS: readonly number[] = [...SMALL_FUSE_RATINGS, ...STANDARD_OCPD_AMPS_240_6A];

export interface ControlLoadInput {
  description: string;
  kind: 'coil' | 'pilot-light' | 'relay' | 'other';
  qty?: number;
  sealedVa: number;
  /** inrush VA of a coil (omit for lamps and electronics) */
  inrushVa?: number;
  /** pulls in at the same moment as the others (default true when inrushVa is given) */
  pullsInTogether?: boolean;
}

export interface ProtectionChoice {
  currentA: number;
  maxPercent: number;
  maxAmps: number;
  /** the fuse rating chosen */
  ratingAmps: number;
  rounding: 'next-lower' | 'next-higher-standard';
  basis: string;
}

export interface ControlPowerInput {
  loads: ControlLoadInput[];
  primaryVolts: number;
  secondaryVolts: number;
  /** force a size (e.g. an existing part); otherwise the smallest that passes */
  chosenVa?: number;
  /** inrush VA each size carries, from the catalogue's transformers; replaces the typical table where given */
  inrushCapacityByVa?: Partial<Record<number, number>>;
}

export interface ControlPowerResult {
  sealedVa: number;
  inrushVa: number;
  /** √(sealed² + inrush²), common practice */
  selectionVa: number;
  /** next standard size ≥ sealed VA (continuous rating) */
  continuousSizeVa: number;
  /** the size that passes both the continuous and the inrush check */
  sizeVa: number;
  inrushCapacityVa: number;
  inrushOk: boolean;
  primary: ProtectionChoice;
  secondary: ProtectionChoice;
  basis: string[];
  notes: string[];
}

const r3 = (x: number) => Math.round(x * 1000) / 1000;

function nextLower(max: number): number {
  const ok = ALL_FUSE_RATINGS.filter((a) => a <= max + 1e-9);
  if (ok.length === 0) throw new RangeError(`no fuse rating at or below ${max} A`);
  return ok[ok.length - 1];
}

function nextHigherStandard(x: number): number {
  const r = STANDARD_OCPD_AMPS_240_6A.find((a) => a >= x - 1e-9);
  if (r === undefined) throw new RangeError(`${x} A is above NEC 240.6(A) standard ratings handled here`);
  return r;
}

/** One band of a protection table: applies below `belowAmps` rated current; the last band takes the rest. */
interface ProtectionBand {
  belowAmps: number;
  maxPercent: number;
  rounding: ProtectionChoice['rounding'];
  basis: string;
}

/** NEC 2023 450.3(B), Table 450.3(B): the same bands on either side of the transformer. */
const table450_3B = (side: 'primary' | 'secondary'): ProtectionBand[] => [
  {
    belowAmps: 9,
    maxPercent: 167,
    rounding: 'next-lower',
    basis: `NEC 2023 450.3(B), Table 450.3(B): ${side} current less than 9 A, not more than 167 %`,
  },
  {
    belowAmps: Infinity,
    maxPercent: 125,
    rounding: 'next-higher-standard',
    basis: `NEC 2023 450.3(B), Table 450.3(B): ${side} current 9 A or more, 125 %; Note 1: next higher standard rating (240.6(A))`,
  },
];

/** Primary side, primary and secondary both protected: NEC 2023 430.72(C)(4) below 2 A, then Table 450.3(B). */
const PRIMARY_BANDS: readonly ProtectionBand[] = [
  {
    belowAmps: 2,
    maxPercent: 500,
    rounding: 'next-lower',
    basis: 'NEC 2023 430.72(C)(4): primary current less than 2 A, not more than 500 %',
  },
  ...table450_3B('primary'),
];

const SECONDARY_BANDS: readonly ProtectionBand[] = table450_3B('secondary');

function applyBand(bands: readonly ProtectionBand[], currentA: number): ProtectionChoice {
  const band = bands.find((b) => currentA < b.belowAmps) ?? bands[bands.length - 1]!;
  // percent / 100 first: 167 / 100 is the same double as 1.67
  const max = currentA * (band.maxPercent / 100);
  return {
    currentA: r3(currentA),
    maxPercent: band.maxPercent,
    maxAmps: r3(max),
    ratingAmps: band.rounding === 'next-lower' ? nextLower(max) : nextHigherStandard(max),
    rounding: band.rounding,
    basis: band.basis,
  };
}

/** Primary protection (primary and secondary both protected). */
export function primaryProtection(va: number, primaryVolts: number): ProtectionChoice {
  return applyBand(PRIMARY_BANDS, va / primaryVolts);
}

/** Secondary protection. */
export function secondaryProtection(va: number, secondaryVolts: number): ProtectionChoice {
  return applyBand(SECONDARY_BANDS, va / secondaryVolts);
}

export function nextStandardVa(va: number): number {
  const s = STANDARD_CPT_VA.find((x) => x >= va);
  if (s === undefined) throw new RangeError(`${va} VA is above the largest standard size (5000 VA)`);
  return s;
}

export function sizeControlTransformer(input: ControlPowerInput): ControlPowerResult {
  if (!(input.primaryVolts > 0 && input.secondaryVolts > 0)) throw new RangeError('voltages must be positive');
  let sealedVa = 0;
  let inrushVa = 0;
  for (const l of input.loads) {
    const q = l.qty ?? 1;
    sealedVa += q * l.sealedVa;
    if (l.inrushVa !== undefined && (l.pullsInTogether ?? true)) inrushVa += q * l.inrushVa;
  }
  const selectionVa = Math.sqrt(sealedVa ** 2 + inrushVa ** 2);
  const continuousSizeVa = nextStandardVa(sealedVa);
  const capacity = (va: number): number =>
    input.inrushCapacityByVa?.[va] ?? INRUSH_VA_AT_40PF_90PCT[va as (typeof STANDARD_CPT_VA)[number]] ?? 0;
  let sizeVa: number;
  if (input.chosenVa !== undefined) {
    sizeVa = input.chosenVa;
  } else {
    const s = STANDARD_CPT_VA.find((x) => x >= sealedVa && capacity(x) >= selectionVa);
    if (s === undefined) throw new RangeError(`inrush ${Math.round(selectionVa)} VA is beyond the largest standard size`);
    sizeVa = s;
  }
  const inrushCapacityVa = capacity(sizeVa);
  const notes: string[] = [];
  if (input.chosenVa !== undefined && !(STANDARD_CPT_VA as readonly number[]).includes(input.chosenVa)) {
    notes.push('Chosen size is not a standard size here: no inrush data; check the maker’s regulation table.');
  }
  if (input.inrushCapacityByVa?.[sizeVa] === undefined) {
    notes.push('Inrush capacity figures are typical data, not a particular transformer’s: confirm with the maker’s table.');
  }
  return {
    sealedVa,
    inrushVa,
    selectionVa,
    continuousSizeVa,
    sizeVa,
    inrushCapacityVa,
    inrushOk: inrushCapacityVa >= selectionVa && sizeVa >= sealedVa,
    primary: primaryProtection(sizeVa, input.primaryVolts),
    secondary: secondaryProtection(sizeVa, input.secondaryVolts),
    basis: [
      'continuous rating ≥ total sealed VA (common practice)',
      'inrush check: √(sealed² + inrush²) at 40 % PF, secondary ≥ 90 % of rated voltage (common practice)',
      'NEC 2023 430.72(C), 450.3(B)',
    ],
    notes,
  };
}
