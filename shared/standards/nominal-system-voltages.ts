// Nominal system voltages and the ranges the NEC gives them (e.g. 220.5(A), and the voltage ranges
// under the motor full-load current tables of Article 430): a 460 V motor belongs to a 480 V
// system, a 230 V motor to a 240 V system. Ranges written from memory.

const RANGES: ReadonlyArray<readonly [lo: number, hi: number, nominal: number]> = [
  [110, 120, 120],
  [200, 208, 208],
  [220, 240, 240],
  [440, 480, 480],
  [550, 600, 600],
];

/** The nominal system a rated voltage belongs to, or null outside the listed ranges. */
export function nominalSystemVolts(ratedVolts: number): number | null {
  return RANGES.find(([lo, hi]) => ratedVolts >= lo && ratedVolts <= hi)?.[2] ?? null;
}
