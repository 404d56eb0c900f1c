// NEMA MG 1 14.35 / 14.36: percent voltage unbalance and the derating of a motor on it.
import { describe, expect, it } from 'vitest';
import { percentUnbalance, unbalanceDerating } from '../../../shared/standards/nema-mg1-voltage-unbalance';

describe('percent voltage unbalance (NEMA MG 1 14.36)', () => {
  it('works the standard’s own example: 460, 467 and 450 V give 1.96 %', () => {
    // average 459 V, largest deviation 9 V: 100 × 9 / 459 = 1.96 % (the example of 14.36, from memory)
    expect(percentUnbalance([460, 467, 450])).toBe(1.96);
  });
  it('is 0 for balanced voltages and does not depend on their order', () => {
    expect(percentUnbalance([480, 480, 480])).toBe(0);
    expect(percentUnbalance([450, 460, 467])).toBe(percentUnbalance([467, 450, 460]));
  });
  it('refuses a missing or zero voltage', () => {
    expect(() => percentUnbalance([480, 0, 480])).toThrow(RangeError);
    expect(() => percentUnbalance([480, Number.NaN, 480])).toThrow(RangeError);
  });
});

describe('derating factor (NEMA MG 1 14.35, Figure 14-1; curve values from memory)', () => {
  it.each([
    [0, 1],
    [0.5, 1], // no derating up to 1 %
    [1, 1],
    [2, 0.95],
    [3, 0.88],
    [4, 0.82],
    [5, 0.75],
    [2.5, 0.915], // between the read points: a straight line
  ])('%s %% unbalance → %s × rated horsepower', (pct, factor) => {
    expect(unbalanceDerating(pct).factor).toBe(factor);
  });
  it('gives no factor above 5 %: operation there is not recommended', () => {
    expect(unbalanceDerating(5.01).factor).toBeNull();
    expect(unbalanceDerating(8).basis).toMatch(/NEMA MG 1 14\.35/);
  });
  it('never rises as the unbalance grows', () => {
    let last = 1;
    for (let p = 0; p <= 5; p += 0.05) {
      const f = unbalanceDerating(Math.round(p * 100) / 100).factor!;
      expect(f).toBeLessThanOrEqual(last);
      last = f;
    }
  });
});
