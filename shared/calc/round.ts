// One rounding rule for every figure the product shows or stores: half up (away from zero) on the decimal
// number as it is written. 1.005 is held in binary as 1.00499999999999989…, so `Math.round(x * 100) / 100`
// gives 1; written as 1.005 it is a half, and a half rounds up: 1.01. The same for 2.675 → 2.68 and
// −1.005 → −1.01. This is the rounding a person does on paper and a spreadsheet's ROUND() does.

/** a product within this of a half is taken as the half the decimal number meant */
const NEAR_HALF = 1e-7;

/** Rounds `x` to `places` decimals (default 2), a half away from zero, on the decimal value as written. */
export function roundHalfUp(x: number, places = 2): number {
  if (!Number.isFinite(x)) return x;
  const scale = 10 ** places;
  const scaled = Math.abs(x) * scale;
  const fraction = scaled - Math.floor(scaled);
  // near a half the binary error decides; 15 significant digits is the decimal the number was written as
  const whole = Math.abs(fraction - 0.5) < NEAR_HALF ? Math.round(Number(scaled.toPrecision(15))) : Math.round(scaled);
  return whole === 0 ? 0 : (Math.sign(x) * whole) / scale;
}

/** Two decimals, half up: amps, volts, percentages and money. */
export const round2 = (x: number): number => roundHalfUp(x, 2);

/** Four decimals, half up: labour hours and quantities. */
export const round4 = (x: number): number => roundHalfUp(x, 4);
