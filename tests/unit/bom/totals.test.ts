// Totals arithmetic, purchasing roll-up and the change report between two bills of materials.
import { describe, expect, it } from 'vitest';
import { computeTotals, diffBoms, rollupByCode } from '../../../shared/calc/bom';
import type { BomLine } from '../../../shared/schemas/catalogue';

const line = (over: Partial<BomLine>): BomLine => ({
  bucket: 'M-1',
  category: 'contactor',
  code: 'PW-CN-N1-120',
  description: 'Contactor',
  quantity: 1,
  unit: 'ea',
  unitCost: 0,
  unitLabourHours: 0,
  heatLossW: 0,
  sccrKa: null,
  status: 'matched',
  requiredRatings: null,
  source: 'auto',
  swapReason: null,
  ...over,
});

const lines: BomLine[] = [
  line({ quantity: 3, unitCost: 19.99, unitLabourHours: 0.73 }),
  line({ category: 'fuse', code: 'PW-FU-J-TD-030', quantity: 2, unitCost: 0.335, unitLabourHours: 0.05 }),
  line({ bucket: 'M-2', category: 'wire', code: 'PW-WR-14-BK', unit: 'ft', quantity: 40, unitCost: 0.09, unitLabourHours: 0.004 }),
  line({
    bucket: 'M-2',
    category: 'contactor',
    code: null,
    status: 'unmatched',
    requiredRatings: 'Contactors: NEMA size 7',
    quantity: 1,
    unitCost: 0,
    unitLabourHours: 0.25,
  }),
  line({
    bucket: '(panel)',
    category: 'freight',
    code: null,
    status: 'manual',
    source: 'manual',
    description: 'Freight',
    quantity: 1,
    unitCost: 150,
  }),
];

describe('computeTotals', () => {
  // hand arithmetic: 3 × 19.99 = 59.97; 2 × 0.335 = 0.67; 40 × 0.09 = 3.60; 150 → material 214.24
  // labour: 3 × 0.73 + 2 × 0.05 + 40 × 0.004 + 0.25 = 2.19 + 0.10 + 0.16 + 0.25 = 2.70 h
  const t = computeTotals(lines, 15, 85);
  it('material, labour, cost, markup and sell', () => {
    expect(t.materialCost).toBe(214.24);
    expect(t.labourHours).toBe(2.7);
    expect(t.labourCost).toBe(229.5); // 2.70 × 85
    expect(t.cost).toBe(443.74);
    expect(t.markup).toBe(66.56); // 15 % of 443.74 = 66.561
    expect(t.sell).toBe(510.3);
    expect(t.unmatchedLines).toBe(1);
  });
  it('groups by bucket in order of appearance and by category in catalogue order', () => {
    expect(t.byBucket).toEqual([
      { bucket: 'M-1', materialCost: 60.64, labourHours: 2.29 },
      { bucket: 'M-2', materialCost: 3.6, labourHours: 0.41 },
      { bucket: '(panel)', materialCost: 150, labourHours: 0 },
    ]);
    expect(t.byCategory.map((c) => c.category)).toEqual(['contactor', 'fuse', 'wire', 'freight']);
    expect(t.byCategory[0]).toEqual({ category: 'contactor', materialCost: 59.97, labourHours: 2.44 });
  });
  it('sum of groups equals the total', () => {
    expect(t.byBucket.reduce((s, b) => s + b.materialCost, 0)).toBeCloseTo(t.materialCost, 10);
    expect(t.byCategory.reduce((s, b) => s + b.labourHours, 0)).toBeCloseTo(t.labourHours, 10);
  });
  it('no markup and no rate', () => {
    const z = computeTotals(lines, 0);
    expect(z.labourCost).toBe(0);
    expect(z.sell).toBe(214.24);
  });
  it('empty', () => {
    expect(computeTotals([], 10, 80)).toMatchObject({ materialCost: 0, labourHours: 0, sell: 0, byBucket: [], byCategory: [] });
  });
});

describe('rollupByCode', () => {
  it('adds quantities of a code across buckets and keeps a separate row per frozen price', () => {
    const r = rollupByCode([
      line({ bucket: 'M-1', quantity: 1, unitCost: 96 }),
      line({ bucket: 'M-2', quantity: 2, unitCost: 96 }),
      line({ bucket: 'M-3', quantity: 1, unitCost: 99 }),
      line({
        bucket: 'M-3',
        category: 'contactor',
        code: null,
        status: 'unmatched',
        requiredRatings: 'Contactors: NEMA size 7',
        quantity: 1,
      }),
      line({
        bucket: 'M-4',
        category: 'contactor',
        code: null,
        status: 'unmatched',
        requiredRatings: 'Contactors: NEMA size 7',
        quantity: 2,
      }),
    ]);
    expect(r.map((g) => [g.code, g.quantity, g.unitCost, g.extendedCost, g.buckets.join(' ')])).toEqual([
      ['PW-CN-N1-120', 3, 96, 288, 'M-1 M-2'],
      ['PW-CN-N1-120', 1, 99, 99, 'M-3'],
      [null, 3, 0, 0, 'M-3 M-4'],
    ]);
    expect(r[2]!.requiredRatings).toBe('Contactors: NEMA size 7');
  });
});

describe('diffBoms (change report)', () => {
  const before = [
    line({ bucket: 'M-1', quantity: 1, unitCost: 96 }),
    line({ bucket: 'M-1', category: 'overload-relay', code: 'PW-OT-18A-C20', quantity: 1, unitCost: 62.2 }),
    line({ bucket: 'M-2', category: 'inverse-time-breaker', code: 'PW-BR-3P-035', quantity: 1, unitCost: 217 }),
  ];
  const after = [
    line({ bucket: 'M-1', quantity: 2, unitCost: 96 }), // FVNR → FVR: quantity changed
    line({ bucket: 'M-1', category: 'mechanical-interlock', code: 'PW-MI-N1', quantity: 1, unitCost: 18 }), // added
    line({ bucket: 'M-1', category: 'overload-relay', code: 'PW-OT-18A-C20', quantity: 1, unitCost: 65 }), // price re-frozen
    // M-2 breaker removed
  ];
  const d = diffBoms(before, after);
  it('added, removed and changed lines', () => {
    expect(d.added.map((e) => e.code)).toEqual(['PW-MI-N1']);
    expect(d.removed.map((e) => e.code)).toEqual(['PW-BR-3P-035']);
    expect(d.changed.map((e) => [e.code, e.before!.quantity, e.after!.quantity, e.costDelta])).toEqual([
      ['PW-CN-N1-120', 1, 2, 96],
      ['PW-OT-18A-C20', 1, 1, 2.8],
    ]);
  });
  it('cost delta = after − before', () => {
    // +96 + 18 + 2.8 − 217 = −100.2
    expect(d.materialDelta).toBe(-100.2);
    const total = (ls: BomLine[]) => ls.reduce((s, l) => s + l.quantity * l.unitCost, 0);
    expect(d.materialDelta).toBeCloseTo(total(after) - total(before), 10);
  });
  it('identical bills give an empty report', () => {
    expect(diffBoms(before, before)).toEqual({ added: [], removed: [], changed: [], materialDelta: 0, labourHoursDelta: 0 });
  });
  it('the same code split over two lines of a bucket is compared as one', () => {
    const split = [line({ quantity: 1, unitCost: 96 }), line({ quantity: 1, unitCost: 96 })];
    expect(diffBoms(split, [line({ quantity: 2, unitCost: 96 })]).changed).toEqual([]);
  });
});
