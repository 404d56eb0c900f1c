import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  calculateHeat,
  effectiveCoolingSurface,
  sourceLoss,
  type EnclosureMounting,
  type HeatSourceInput,
} from '../../../shared/calc/heat';

// IEC TR 60890 simplified method. Surface factors b (from memory): top exposed 1.4, top covered 0.7,
// exposed side faces 0.9, covered side faces 0.5, floor 0. Summed by face they give the closed forms
// for the installation types (H, W, D in metres):
const closedForm: Record<EnclosureMounting, (h: number, w: number, d: number, topCovered: boolean) => number> = {
  'free-standing': (h, w, d) => 1.8 * h * (w + d) + 1.4 * w * d,
  'wall-mounted': (h, w, d) => 1.4 * w * (h + d) + 1.8 * d * h,
  'row-end-free-standing': (h, w, d) => 1.4 * d * (h + w) + 1.8 * w * h,
  'row-end-wall-mounted': (h, w, d) => 1.4 * h * (w + d) + 1.4 * w * d,
  'row-middle-free-standing': (h, w, d) => 1.8 * w * h + 1.4 * w * d + d * h,
  'row-middle-wall-mounted': (h, w, d, top) => (top ? 1.4 * w * h + 0.7 * w * d + d * h : 1.4 * w * (h + d) + d * h),
};

describe('effective cooling surface Ae (IEC TR 60890)', () => {
  it('2.0 × 0.8 × 0.6 m wall-mounted, worked by hand', () => {
    // top 0.8·0.6 = 0.48 × 1.4 = 0.672; front 2.0·0.8 = 1.6 × 0.9 = 1.44; back 1.6 × 0.5 = 0.8;
    // sides 2 × 2.0·0.6 = 2.4 × 0.9 = 2.16; Ae = 0.672 + 1.44 + 0.8 + 2.16 = 5.072 m²
    const { aeM2, faces } = effectiveCoolingSurface({ heightM: 2, widthM: 0.8, depthM: 0.6, mounting: 'wall-mounted' });
    expect(aeM2).toBeCloseTo(5.072, 6);
    expect(faces.find((f) => f.face === 'back')?.factor).toBe(0.5);
    expect(faces.find((f) => f.face === 'top')?.factor).toBe(1.4);
  });
  it('middle of a row, wall-mounted, top covered: 1.4·W·H + 0.7·W·D + D·H', () => {
    // 1.4·0.8·2.0 = 2.24; 0.7·0.8·0.6 = 0.336; 0.6·2.0 = 1.2 -> 3.776 m²
    const { aeM2 } = effectiveCoolingSurface({
      heightM: 2,
      widthM: 0.8,
      depthM: 0.6,
      mounting: 'row-middle-wall-mounted',
      topCovered: true,
    });
    expect(aeM2).toBeCloseTo(3.776, 6);
  });
  it('every mounting matches its closed form for any size', () => {
    const mountings = Object.keys(closedForm) as EnclosureMounting[];
    fc.assert(
      fc.property(
        fc.constantFrom(...mountings),
        fc.double({ min: 0.2, max: 2.4, noNaN: true }),
        fc.double({ min: 0.2, max: 1.6, noNaN: true }),
        fc.double({ min: 0.15, max: 1, noNaN: true }),
        (m, h, w, d) => {
          const top = m === 'row-middle-wall-mounted';
          const { aeM2 } = effectiveCoolingSurface({ heightM: h, widthM: w, depthM: d, mounting: m, topCovered: top });
          return Math.abs(aeM2 - closedForm[m](h, w, d, top)) < 1e-9;
        },
      ),
    );
  });
  it('refuses a zero dimension', () => {
    expect(() => effectiveCoolingSurface({ heightM: 0, widthM: 0.8, depthM: 0.6, mounting: 'free-standing' })).toThrow(RangeError);
  });
});

const sources: HeatSourceInput[] = [
  // drive: catalogue 600 W at 40 A, running at 30 A -> 450 W (linear scaling, common practice)
  { bucketTag: 'B-301', code: 'VFD-40', description: 'drive 40 A', category: 'vfd', heatLossW: 600, ratedAmps: 40, loadAmps: 30 },
  { bucketTag: 'P-101', code: 'C-09', description: 'contactor + overload', category: 'contactor', heatLossW: 25 },
  { bucketTag: 'CV-201', code: 'C-32', description: 'contactor + overload', category: 'contactor', heatLossW: 25 },
  { bucketTag: null, code: 'CPT-200', description: 'control transformer', category: 'transformer', heatLossW: 40 },
];

describe('temperature rise and cooling (IEC TR 60890 simplified method)', () => {
  it('worked example: 540 W in a 2.0 × 0.8 × 0.6 m wall-mounted painted steel enclosure at 30 °C', () => {
    // P = 450 + 25 + 25 + 40 = 540 W; k·Ae = 5.5 × 5.072 = 27.896 W/K
    // ΔT = 540 / 27.896 = 19.358 K; internal 30 + 19.358 = 49.358 °C > 40 °C limit
    // surface passes 27.896 × (40 − 30) = 278.96 W; excess 540 − 278.96 = 261.04 W
    // fan (common practice): 3.16 × 261.04 / (10 K × 1.8 = 18 °F) = 45.83 cfm; air conditioner 261.04 W
    const r = calculateHeat({
      enclosure: { heightM: 2, widthM: 0.8, depthM: 0.6, mounting: 'wall-mounted' },
      sources,
      ambientC: 30,
    });
    expect(r.totalLossW).toBeCloseTo(540, 6);
    expect(r.deltaTK).toBeCloseTo(19.358, 3);
    expect(r.internalTempC).toBeCloseTo(49.358, 3);
    expect(r.exceeded).toBe(true);
    expect(r.surfaceDissipationW).toBeCloseTo(278.96, 2);
    expect(r.cooling?.excessW).toBeCloseTo(261.0, 1);
    expect(r.cooling?.fan?.cfm).toBeCloseTo(45.8, 1);
    expect(r.cooling?.airConditionerW).toBeCloseTo(261.0, 1);
    expect(r.byBucket).toEqual([
      { bucketTag: 'B-301', watts: 450 },
      { bucketTag: 'P-101', watts: 25 },
      { bucketTag: 'CV-201', watts: 25 },
      { bucketTag: 'Panel', watts: 40 },
    ]);
  });

  it('ambient above the limit: no fan, the air conditioner also takes the heat coming in', () => {
    // 45 °C ambient, 40 °C limit: AC = 540 + 27.896 × 5 = 679.48 W
    const r = calculateHeat({
      enclosure: { heightM: 2, widthM: 0.8, depthM: 0.6, mounting: 'wall-mounted' },
      sources,
      ambientC: 45,
    });
    expect(r.cooling?.fan).toBeNull();
    expect(r.cooling?.airConditionerW).toBeCloseTo(679.5, 1);
    expect(r.notes.join(' ')).toContain('cannot cool below the ambient');
  });

  it('within the limit: no cooling; a higher limit setting and solar gain are used', () => {
    const r = calculateHeat({
      enclosure: { heightM: 2, widthM: 0.8, depthM: 0.6, mounting: 'wall-mounted' },
      sources,
      ambientC: 25,
      internalLimitC: 50,
      solarGainW: 100,
    });
    // ΔT = (540 + 100) / 27.896 = 22.942 K -> 47.94 °C < 50 °C
    expect(r.deltaTK).toBeCloseTo(22.942, 3);
    expect(r.exceeded).toBe(false);
    expect(r.cooling).toBeNull();
  });

  it('drive and soft starter losses at their load (common practice)', () => {
    expect(sourceLoss({ bucketTag: 'x', code: 'V', description: '', category: 'vfd', throughputKw: 15 }).watts).toBeCloseTo(450, 6); // 3 % of 15 kW
    expect(sourceLoss({ bucketTag: 'x', code: 'S', description: '', category: 'soft-starter', loadAmps: 34 }).watts).toBe(102); // 3 W/A × 34 A
    expect(
      sourceLoss({ bucketTag: 'x', code: 'S', description: '', category: 'soft-starter', loadAmps: 34, bypassed: true, heatLossW: 8 })
        .watts,
    ).toBe(8);
  });
});
