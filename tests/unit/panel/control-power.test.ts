import { describe, expect, it } from 'vitest';
import { nextStandardVa, primaryProtection, secondaryProtection, sizeControlTransformer } from '../../../shared/calc/control-power';

describe('control power transformer sizing', () => {
  it('sealed 180 VA with 600 VA inrush -> 200 VA', () => {
    // 4 coils at 45 VA sealed / 150 VA inrush pulling in together:
    // sealed = 180 VA -> next standard size 200 VA (common practice)
    // selection VA = √(180² + 600²) = √392 400 = 626.4 VA <= 1000 VA capacity of 200 VA at 40 % PF (typical data)
    const r = sizeControlTransformer({
      loads: [{ description: 'contactor coil', kind: 'coil', qty: 4, sealedVa: 45, inrushVa: 150 }],
      primaryVolts: 480,
      secondaryVolts: 120,
    });
    expect(r.sealedVa).toBe(180);
    expect(r.inrushVa).toBe(600);
    expect(r.selectionVa).toBeCloseTo(626.42, 2);
    expect(r.continuousSizeVa).toBe(200);
    expect(r.sizeVa).toBe(200);
    expect(r.inrushOk).toBe(true);
  });

  it('inrush drives the size up', () => {
    // sealed 180 VA (lights and relays too), inrush 1200 VA: √(180² + 1200²) = √1 472 400 = 1213.42 VA
    // 200 VA carries 1000 VA (typical) -> too small; 250 VA carries 1500 VA -> 250 VA
    const r = sizeControlTransformer({
      loads: [
        { description: 'pilot light', kind: 'pilot-light', qty: 6, sealedVa: 5 },
        { description: 'relay', kind: 'relay', qty: 5, sealedVa: 6 },
        { description: 'size 2 coil', kind: 'coil', qty: 4, sealedVa: 30, inrushVa: 300 },
      ],
      primaryVolts: 480,
      secondaryVolts: 120,
    });
    expect(r.sealedVa).toBe(180); // 30 + 30 + 120
    expect(r.inrushVa).toBe(1200);
    expect(r.selectionVa).toBeCloseTo(1213.42, 2);
    expect(r.continuousSizeVa).toBe(200);
    expect(r.sizeVa).toBe(250);
  });

  it('a coil that does not pull in with the others counts sealed only', () => {
    const r = sizeControlTransformer({
      loads: [
        { description: 'coil', kind: 'coil', sealedVa: 20, inrushVa: 200 },
        { description: 'later coil', kind: 'coil', sealedVa: 20, inrushVa: 200, pullsInTogether: false },
      ],
      primaryVolts: 480,
      secondaryVolts: 120,
    });
    expect(r.inrushVa).toBe(200);
    expect(r.sealedVa).toBe(40);
  });

  it.each([
    [49, 50],
    [50, 50],
    [51, 75],
    [351, 500],
    [4999, 5000],
  ])('next standard size for %s VA is %s VA', (va, size) => {
    expect(nextStandardVa(va)).toBe(size);
  });
  it('refuses above 5000 VA', () => {
    expect(() => nextStandardVa(5001)).toThrow(RangeError);
  });
});

describe('transformer protection, NEC 2023 430.72(C) and 450.3(B)', () => {
  it('500 VA, 480 V primary: 1.04 A < 2 A -> 500 % = 5.21 A -> 5 A (430.72(C)(4))', () => {
    const p = primaryProtection(500, 480);
    expect(p.currentA).toBeCloseTo(1.042, 3);
    expect(p.maxPercent).toBe(500);
    expect(p.maxAmps).toBeCloseTo(5.208, 3);
    expect(p.ratingAmps).toBe(5);
    expect(p.basis).toContain('430.72(C)(4)');
  });
  it('500 VA, 120 V secondary: 4.17 A < 9 A -> 167 % = 6.96 A -> 6.25 A (Table 450.3(B))', () => {
    const s = secondaryProtection(500, 120);
    expect(s.currentA).toBeCloseTo(4.167, 3);
    expect(s.maxAmps).toBeCloseTo(6.958, 3);
    expect(s.ratingAmps).toBe(6.25); // next lower commonly made fuse rating (from memory)
    expect(s.basis).toContain('Table 450.3(B)');
  });
  it('1000 VA, 240 V primary: 4.17 A (2–9 A) -> 167 % = 6.96 A -> 6.25 A (Table 450.3(B))', () => {
    const p = primaryProtection(1000, 240);
    expect(p.maxPercent).toBe(167);
    expect(p.ratingAmps).toBe(6.25);
  });
  it('2000 VA, 208 V primary: 9.62 A >= 9 A -> 125 % = 12.02 A -> next higher standard 15 A (Table 450.3(B) Note 1, 240.6(A))', () => {
    const p = primaryProtection(2000, 208);
    expect(p.maxPercent).toBe(125);
    expect(p.maxAmps).toBeCloseTo(12.019, 3);
    expect(p.ratingAmps).toBe(15);
    expect(p.rounding).toBe('next-higher-standard');
  });
  it('3000 VA, 120 V secondary: 25 A -> 125 % = 31.25 A -> 35 A (Table 450.3(B) Note 1, 240.6(A))', () => {
    const s = secondaryProtection(3000, 120);
    expect(s.ratingAmps).toBe(35);
  });
  it('the transformer chosen carries its protection', () => {
    const r = sizeControlTransformer({
      loads: [{ description: 'x', kind: 'other', sealedVa: 400 }],
      primaryVolts: 480,
      secondaryVolts: 120,
    });
    expect(r.sizeVa).toBe(500);
    expect(r.primary.ratingAmps).toBe(5);
    expect(r.secondary.ratingAmps).toBe(6.25);
  });
});

describe('catalogue inrush data', () => {
  it('replaces the typical table where the catalogue gives a transformer’s inrush capacity', () => {
    // √(180² + 600²) = 626.4 VA; a 200 VA part carrying only 600 VA fails -> 250 VA (typical 1500 VA)
    const r = sizeControlTransformer({
      loads: [{ description: 'coil', kind: 'coil', qty: 4, sealedVa: 45, inrushVa: 150 }],
      primaryVolts: 480,
      secondaryVolts: 120,
      inrushCapacityByVa: { 200: 600 },
    });
    expect(r.sizeVa).toBe(250);
    expect(r.inrushCapacityVa).toBe(1500);
  });
});
