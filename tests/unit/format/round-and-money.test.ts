import { describe, expect, it } from 'vitest';
import { round2, roundHalfUp } from '../../../shared/calc/round';
import { formatMoney, SHOP_CURRENCY } from '../../../shared/format/money';

// Expected values are decimal arithmetic with the half-up rule (a half rounds away from zero), as on paper
// and as a spreadsheet's ROUND(x, 2) gives them; the binary column shows what Math.round(x * 100) / 100 gave.
describe('roundHalfUp: half up on the decimal as written', () => {
  it.each([
    // x, places, expected, binary Math.round gave
    [1.005, 2, 1.01, 1], // 1.005 is 1.00499999999999989… in binary
    [2.675, 2, 2.68, 2.68],
    [0.345, 2, 0.35, 0.35],
    [10.7 * 1.15, 2, 12.31, 12.3], // 115 % of 10.7 A is 12.305; the binary product is 12.304999999999998
    [0.9 * 1.15, 2, 1.04, 1.03], // 1.035, and 103.49999999999999 once multiplied by 100
    [1.004, 2, 1, 1],
    [1.015, 2, 1.02, 1.01],
    [-1.005, 2, -1.01, -1],
    [0.125, 2, 0.13, 0.13], // an exact binary half
    [1234.005, 2, 1234.01, 1234.01],
    [12.3456, 3, 12.346, 12.346],
    [1.45, 1, 1.5, 1.5],
    [2.5, 0, 3, 3],
    [-2.5, 0, -3, -2], // away from zero, where Math.round goes up to −2
  ])('%d to %d places is %d (binary Math.round: %d)', (x, places, expected, binary) => {
    expect(roundHalfUp(x, places)).toBe(expected);
    expect(Math.round(x * 10 ** places) / 10 ** places).toBe(binary);
  });

  it('round2 is two places', () => {
    expect(round2(1.005)).toBe(1.01);
    expect(round2(2.675)).toBe(2.68);
    expect(round2(10.994)).toBe(10.99);
  });

  it('gives 0, never −0, and passes non-finite values through', () => {
    expect(Object.is(roundHalfUp(-0.001), 0)).toBe(true);
    expect(Object.is(roundHalfUp(-0), 0)).toBe(true);
    expect(roundHalfUp(Number.POSITIVE_INFINITY)).toBe(Number.POSITIVE_INFINITY);
    expect(roundHalfUp(Number.NaN)).toBeNaN();
  });

  it('leaves a value already at two places as it is (every cent from 0 to $100)', () => {
    for (let cents = 0; cents <= 10_000; cents++) expect(round2(cents / 100)).toBe(cents / 100);
  });
});

describe('formatMoney: en-US, in the shop currency', () => {
  it('is US dollars', () => expect(SHOP_CURRENCY).toBe('USD'));

  it.each([
    [0, {}, '$0.00'],
    [1234.5, {}, '$1,234.50'],
    [1.005, {}, '$1.01'], // half up, as stored
    [-12, {}, '-$12.00'],
    [1234567.891, {}, '$1,234,567.89'],
    [12.5, { signed: true }, '+$12.50'],
    [-12.5, { signed: true }, '-$12.50'],
    [0, { signed: true }, '$0.00'],
    [1234.5, { symbol: false }, '1,234.50'],
    [0.1 + 0.2, { symbol: false }, '0.30'],
  ] as const)('%d %o → %s', (amount, format, expected) => {
    expect(formatMoney(amount, format)).toBe(expected);
  });
});
