// Property tests (fast-check) over generated motors within the tables.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { nextHigherStandard } from '../../../shared/standards/nec-table-240-6a';
import { maxPercent430_52 } from '../../../shared/standards/nec-table-430-52';
import { motorKind } from '../../../shared/calc/scpd';
import type { LoadInput, SupplyInput } from '../../../shared/schemas/load';
import { selector } from './selector-setup';

const ac3 = fc.record({
  supply: fc.constant('ac3' as const),
  hp: fc.constantFrom(0.5, 1, 2, 3, 5, 7.5, 10, 15, 20, 25, 30, 40, 50, 60, 75, 100, 125, 150, 200),
  volts: fc.constantFrom(200, 208, 230, 460, 480, 575),
  rotor: fc.constantFrom('squirrel-cage' as const, 'wound-rotor' as const),
  design: fc.constantFrom('B' as const),
  energyEfficient: fc.boolean(),
  speedControl: fc.constantFrom('fixed' as const, 'variable' as const),
  startingLimit: fc.constantFrom('none' as const, 'reduced-inrush' as const),
  reverseRotationHazard: fc.boolean(),
});
const ac1 = fc.record({
  supply: fc.constant('ac1' as const),
  hp: fc.constantFrom(1 / 6, 0.25, 1 / 3, 0.5, 1, 2, 3, 5, 7.5, 10),
  volts: fc.constantFrom(115, 120, 208, 230),
});
const dc = fc.record({
  supply: fc.constant('dc' as const),
  hp: fc.constantFrom(1, 2, 3, 5, 7.5, 10, 15, 25, 50),
  volts: fc.constant(240),
  dcField: fc.constantFrom('shunt' as const, 'series' as const, 'compound' as const),
});
const common = fc.record({
  scpdType: fc.constantFrom(
    'inverse-time-breaker' as const,
    'instantaneous-trip-breaker' as const,
    'dual-element-fuse' as const,
    'non-time-delay-fuse' as const,
  ),
  conductor: fc.record({
    material: fc.constantFrom('cu' as const, 'al' as const),
    tempRatingC: fc.constantFrom(60 as const, 75 as const, 90 as const),
  }),
  reversing: fc.boolean(),
  jogging: fc.boolean(),
  critical: fc.boolean(),
  inertia: fc.constantFrom('normal' as const, 'high' as const, 'very-high' as const),
  environment: fc.option(
    fc.constantFrom('indoor-dry' as const, 'outdoor' as const, 'washdown' as const, 'class1-div1' as const, 'class2-div2' as const),
    { nil: undefined },
  ),
});
const loadArb = fc.tuple(fc.oneof(ac3, ac1, dc), common).map(([k, c]) => {
  const l = { tag: 'PT', ...k, ...c } as Record<string, unknown>;
  if (l.energyEfficient === false) delete l.design;
  return l as LoadInput;
});
const supplyArb = fc
  .record({ ambientC: fc.integer({ min: 10, max: 50 }) })
  .map((s): SupplyInput => ({ volts: 480, phases: 3, hz: 60, availableFaultKa: 35, ambientC: s.ambientC }));

describe('properties of every selection', () => {
  it('the branch device never exceeds what NEC 2023 430.52 with Exception 1 permits', async () => {
    await fc.assert(
      fc.asyncProperty(loadArb, supplyArb, async (load, supply) => {
        const r = await selector.selectLoad(load, supply);
        expect(r.errors).toEqual([]);
        const pct = maxPercent430_52(motorKind(load as never), r.scpd.type);
        const limit = (r.flcAmps * pct) / 100;
        expect(r.scpd.maxPercent).toBe(pct);
        if (r.scpd.type === 'instantaneous-trip-breaker') {
          expect(r.scpd.ratingAmps).toBeLessThanOrEqual(limit + 1e-6);
        } else {
          const family = r.scpd.type === 'inverse-time-breaker' ? 'breaker' : 'fuse';
          expect(r.scpd.ratingAmps).toBeLessThanOrEqual(nextHigherStandard(limit, '2023', family));
          expect(r.scpd.ratingAmps).toBeGreaterThanOrEqual(limit - 1e-6);
        }
      }),
      { numRuns: 300 },
    );
  });

  it('branch conductors never fall below 125 % of the table FLC (NEC 2023 430.22)', async () => {
    await fc.assert(
      fc.asyncProperty(loadArb, supplyArb, async (load, supply) => {
        const r = await selector.selectLoad(load, supply);
        expect(r.conductor.minAmpacity).toBeGreaterThanOrEqual(1.25 * r.flcAmps - 0.01);
        expect(r.conductor.ampacity).toBeGreaterThanOrEqual(1.25 * r.flcAmps - 0.01);
      }),
      { numRuns: 300 },
    );
  });

  it('every decision has a trace entry with a non-empty basis', async () => {
    await fc.assert(
      fc.asyncProperty(loadArb, supplyArb, async (load, supply) => {
        const r = await selector.selectLoad(load, supply);
        for (const t of r.trace) {
          expect(t.basis.trim().length).toBeGreaterThan(0);
          expect(t.reason.trim().length).toBeGreaterThan(0);
          expect(t.ruleId.length).toBeGreaterThan(0);
        }
        const traced = (text: string) => r.trace.some((t) => t.decision.includes(text));
        expect(traced(`starter.type = ${r.starter.type}`)).toBe(true);
        expect(traced(`overload.tripClass = ${r.overload.tripClass}`)).toBe(true);
        expect(traced(`enclosure.nemaType = ${r.enclosure.nemaType}`)).toBe(true);
        expect(traced(`scpd.ratingAmps = ${r.scpd.ratingAmps}`)).toBe(true);
        expect(traced(`conductor.size = ${r.conductor.size}`)).toBe(true);
        expect(traced(`flcAmps = ${r.flcAmps}`)).toBe(true);
        expect(traced(`disconnect.minAmps = ${r.disconnect.minAmps}`)).toBe(true);
        if (r.starter.nemaSize) expect(traced(`starter.nemaSize = ${r.starter.nemaSize}`)).toBe(true);
        if (r.starter.reversingContactors) expect(traced('starter.reversingContactors = true')).toBe(true);
        for (const [k, v] of Object.entries(r.relays)) if (v) expect(traced(`relays.${k} = true`)).toBe(true);
        if (r.enclosure.flagForEngineer) expect(traced('enclosure.flagForEngineer = true')).toBe(true);
        if (r.dc?.fieldLossProtection) expect(traced('dc.fieldLossProtection = true')).toBe(true);
        if (r.vfd) expect(traced(`vfd.duty = ${r.vfd.duty}`)).toBe(true);
        if (r.overload.providedByDrive) expect(traced('overload.providedByDrive = true')).toBe(true);
      }),
      { numRuns: 200 },
    );
  });

  it('overload setting never exceeds 125 % of the FLA used (NEC 2023 430.32(A)(1))', async () => {
    await fc.assert(
      fc.asyncProperty(loadArb, supplyArb, async (load, supply) => {
        const r = await selector.selectLoad(load, supply);
        expect(r.overload.maxSettingAmps).toBeLessThanOrEqual(1.25 * r.flaAmps + 1e-6);
      }),
      { numRuns: 150 },
    );
  });
});
