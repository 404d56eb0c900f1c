// Motors at another voltage than the supply: the transformer's kVA, its NEC Table 450.3(B) protection,
// the DC supply, and their primary currents in the feeder (430.24, 430.62(A)) and the 409.110
// full-load current. Expected values worked by hand from the tables named beside each.
import { describe, expect, it } from 'vitest';
import { primaryLimit, secondaryLimit } from '../../../shared/standards/nec-table-450-3b';
import { nextStandardKva } from '../../../shared/standards/transformer-kva-ratings';
import { ratedAmps, transformerKva, transformerProtection } from '../../../shared/calc/transformer';
import { motorFeed, sourceNeed } from '../../../shared/calc/other-sources';
import { panelNameplate } from '../../../shared/calc/nameplate';
import { OutsideTableError } from '../../../shared/errors';
import { motor, selector, supply480 } from '../engine/selector-setup';
import { buildBom } from '../../../shared/calc/bom';
import { linesHeatLossW } from '../bom/heat-of-lines';
import { seedCatalogue, seedLabourUnits } from '../bom/fixtures';
import { oneLineElements } from '../../../src/features/drawings/components/one-line';

describe('NEC 2023 Table 450.3(B) (transformers 1000 V and less)', () => {
  it.each([
    // [method, rated primary A, percent, next higher permitted] — NEC 2023 Table 450.3(B)
    ['primary-only', 15.63, 125, true], // currents of 9 A or more, Note 1
    ['primary-only', 9, 125, true],
    ['primary-only', 8.99, 167, false], // currents less than 9 A
    ['primary-only', 2, 167, false],
    ['primary-only', 1.99, 300, false], // currents less than 2 A
    ['primary-and-secondary', 15.63, 250, false],
    ['primary-and-secondary', 1.5, 250, false],
  ] as const)('%s, primary %s A: %s %%', (method, amps, percent, higher) => {
    expect(primaryLimit(method, amps)).toMatchObject({ percent, nextHigherPermitted: higher });
  });
  it.each([
    [31.25, 125, true], // secondary, 9 A or more, Note 1 — NEC 2023 Table 450.3(B)
    [8.5, 167, false], // secondary, less than 9 A
  ] as const)('secondary %s A: %s %%', (amps, percent, higher) => {
    expect(secondaryLimit(amps)).toMatchObject({ percent, nextHigherPermitted: higher });
  });
  it('refuses a current that is not one', () => {
    expect(() => primaryLimit('primary-only', 0)).toThrow(OutsideTableError);
    expect(() => secondaryLimit(Number.NaN)).toThrow(OutsideTableError);
  });

  it('7.5 kVA 480-240/120 V single-phase: rated currents and both methods', () => {
    const ip = ratedAmps(7.5, 480, 1);
    const is = ratedAmps(7.5, 240, 1);
    expect(ip).toBe(15.63); // 7500 VA / 480 V
    expect(is).toBe(31.25); // 7500 VA / 240 V
    const only = transformerProtection({ primaryAmps: ip, secondaryAmps: is, method: 'primary-only' }, '2023');
    expect(only.primary.maxAmps).toBeCloseTo(19.54, 1); // 125 % × 15.63 A
    expect(only.primary.ratingAmps).toBe(20); // Note 1: next higher standard rating, NEC 2023 Table 240.6(A)
    expect(only.secondary).toBeNull();
    const both = transformerProtection({ primaryAmps: ip, secondaryAmps: is }, '2023');
    expect(both.method).toBe('primary-and-secondary');
    expect(both.primary.maxAmps).toBeCloseTo(39.08, 1); // 250 % × 15.63 A
    expect(both.primary.ratingAmps).toBe(35); // not above 250 %: next lower standard rating, Table 240.6(A)
    expect(both.secondary?.maxAmps).toBeCloseTo(39.06, 1); // 125 % × 31.25 A
    expect(both.secondary?.ratingAmps).toBe(40); // Note 1: next higher standard rating
    expect(both.primary.basis).toMatch(/Table 450\.3\(B\)/);
  });

  it('small transformers take the small-current rows and the 1, 3, 6 A fuse ratings', () => {
    // 1 kVA at 480 V: 2.08 A primary, 167 % = 3.48 A → 3 A fuse (NEC 2023 Table 450.3(B), Table 240.6(A))
    const one = transformerProtection(
      { primaryAmps: ratedAmps(1, 480, 1), secondaryAmps: ratedAmps(1, 240, 1), method: 'primary-only' },
      '2023',
    );
    expect(one.primary).toMatchObject({ percent: 167, ratingAmps: 3, family: 'fuse' });
    // 0.5 kVA at 480 V: 1.04 A primary, 300 % = 3.12 A → 3 A fuse
    const half = transformerProtection(
      { primaryAmps: ratedAmps(0.5, 480, 1), secondaryAmps: ratedAmps(0.5, 240, 1), method: 'primary-only' },
      '2023',
    );
    expect(half.primary).toMatchObject({ percent: 300, ratingAmps: 3 });
    // 1 kVA secondary 4.17 A < 9 A: 167 % = 6.96 A → 6 A fuse
    const oneBoth = transformerProtection({ primaryAmps: ratedAmps(1, 480, 1), secondaryAmps: ratedAmps(1, 240, 1) }, '2023');
    expect(oneBoth.secondary).toMatchObject({ percent: 167, ratingAmps: 6 });
  });
});

describe('transformer kVA from its motors (430.24 counting, standard kVA ratings)', () => {
  it('two 1.5 hp 230 V single-phase motors: (125 % × 10 A + 10 A) × 240 V = 5.4 kVA → 7.5 kVA', () => {
    // FLC 10 A each: NEC 2023 Table 430.248, 1½ hp 230 V
    const k = transformerKva({
      phases: 1,
      secondaryVolts: 240,
      splitPhase: true,
      loads: [
        { amps: 10, circuitVolts: 240 },
        { amps: 10, circuitVolts: 240 },
      ],
    });
    expect(k.loadAmps).toBe(22.5);
    expect(k.loadKva).toBe(5.4);
    expect(k.kva).toBe(7.5); // next standard single-phase rating above 5 kVA (from memory)
  });
  it('two 1 hp 115 V motors go on the two halves of a 240/120 V secondary', () => {
    // 16 A each, NEC 2023 Table 430.248; one per half: 16 A + 25 % × 16 A = 20 A × 240 V = 4.8 kVA → 5 kVA
    const k = transformerKva({
      phases: 1,
      secondaryVolts: 240,
      splitPhase: true,
      loads: [
        { amps: 16, circuitVolts: 120 },
        { amps: 16, circuitVolts: 120 },
      ],
    });
    expect(k.loadAmps).toBe(20);
    expect(k.kva).toBe(5);
  });
  it('a 10 hp 208 V three-phase motor: 125 % × 30.8 A × √3 × 208 V = 13.87 kVA → 15 kVA', () => {
    // 30.8 A: NEC 2023 Table 430.250, 10 hp 208 V
    const k = transformerKva({ phases: 3, secondaryVolts: 208, loads: [{ amps: 30.8, circuitVolts: 208 }] });
    expect(k.loadKva).toBe(13.87);
    expect(k.kva).toBe(15);
  });
  it('refuses a load beyond the listed ratings', () => {
    expect(nextStandardKva(167, 1)).toBe(167);
    expect(() => nextStandardKva(168, 1)).toThrow(OutsideTableError);
  });
});

describe('which motors need another source', () => {
  const fvnr = { flcAmps: 10, starter: { type: 'FVNR' } } as never;
  it.each([
    [{ supply: 'ac3', volts: 460 }, 'bus'], // 460 V motor, 480 V system
    [{ supply: 'ac1', volts: 460 }, 'bus'], // line to line
    [{ supply: 'ac1', volts: 230 }, 'transformer'],
    [{ supply: 'ac1', volts: 115 }, 'transformer'],
    [{ supply: 'ac3', volts: 200 }, 'transformer'],
    [{ supply: 'dc', volts: 240 }, 'dc-supply'],
    [{ supply: 'ac3', volts: 150 }, 'none'],
  ] as const)('%o on 480 V three-phase: %s', (load, on) => {
    expect(sourceNeed(load, fvnr, { volts: 480, phases: 3 }).on).toBe(on);
  });
  it('a motor rated at the supply voltage is on the bus even outside the nominal systems (400 V on a 400 V supply)', () => {
    expect(sourceNeed({ supply: 'ac3', volts: 400 }, fvnr, { volts: 400, phases: 3 }).on).toBe('bus');
    expect(sourceNeed({ supply: 'ac3', volts: 400 }, fvnr, { volts: 480, phases: 3 }).on).toBe('none');
  });
});

describe('the roll-up counts the sources (selectPanel, NEC 2023)', () => {
  const loads = (fedFrom: 'panel' | 'external') => [
    motor({ tag: 'P-1', hp: 10, volts: 460 }), // 14 A, NEC 2023 Table 430.250
    motor({ tag: 'F-1', supply: 'ac1', hp: 1.5, volts: 230, fedFrom }), // 10 A, Table 430.248
    motor({ tag: 'F-2', supply: 'ac1', hp: 1.5, volts: 230, fedFrom }),
  ];
  it('fedFrom panel: a 7.5 kVA 480-240/120 V transformer whose primary current is in the feeder and the full-load current', async () => {
    const out = await selector.selectPanel({ supply: supply480, loads: loads('panel') });
    const [t1] = out.panel.otherSources ?? [];
    expect(t1).toMatchObject({ kind: 'transformer', tag: 'T1', kva: 7.5, phases: 1, primaryAmps: 15.63, secondaryAmps: 31.25 });
    expect(t1?.motors.map((m) => m.tag)).toEqual(['F-1', 'F-2']);
    expect(t1?.primaryProtection.ratingAmps).toBe(35);
    expect(t1?.secondaryProtection?.ratingAmps).toBe(40);
    expect(out.panel.otherLoadsAmps).toBe(15.63);
    expect(out.panel.totalFlcAmps).toBe(14);
    // 430.24: 125 % × 14 A + 15.63 A = 33.13 A
    expect(out.panel.feeder.minAmpacity).toBe(33.13);
    // 430.62(A): 35 A (P-1, 250 % × 14 A) + 15.63 A = 50.63 A → 50 A (Table 240.6(A))
    expect(out.panel.feeder.ocpdMaxAmps).toBe(50);
    const np = panelNameplate({ rollup: out.panel, supply: { volts: 480, phases: 3, hz: 60 }, sccrKa: 10, enclosureType: '12' });
    expect(np.fullLoadAmps).toBe(29.6); // 409.110(2): 14 A + 15.63 A
    expect(np.lines.find((l) => l.label === 'Full-load current')?.basis).toMatch(/T1/);
    expect(out.panel.notes?.some((n) => n.startsWith('T1: F-1, F-2'))).toBe(true);
  });
  it('fedFrom external: left out of the feeder and the full-load current, with a note', async () => {
    const out = await selector.selectPanel({ supply: supply480, loads: loads('external') });
    expect(out.panel.otherSources).toEqual([]);
    expect(out.panel.externalMotors).toEqual([
      { tag: 'F-1', supply: 'ac1', volts: 230, needs: '240/120 V single-phase (a transformer)' },
      { tag: 'F-2', supply: 'ac1', volts: 230, needs: '240/120 V single-phase (a transformer)' },
    ]);
    expect(out.panel.feeder.minAmpacity).toBe(17.5); // 125 % × 14 A
    expect(out.panel.notes?.find((n) => n.startsWith('F-1:'))).toMatch(/outside the panel.*left out of the feeder/);
    const np = panelNameplate({ rollup: out.panel, supply: { volts: 480, phases: 3, hz: 60 }, sccrKa: 10, enclosureType: '12' });
    expect(np.fullLoadAmps).toBe(14);
  });
  it('a source never takes a motor’s tag', async () => {
    const out = await selector.selectPanel({
      supply: supply480,
      loads: [motor({ tag: 'T1', hp: 10, volts: 460 }), motor({ tag: 'F-1', supply: 'ac1', hp: 1.5, volts: 230 })],
    });
    expect(out.panel.otherSources?.map((s) => s.tag)).toEqual(['T2']);
  });
  it('a 5 hp 240 V DC motor gets a DC supply: 125 % × 20 A = 25 A at 240 V', async () => {
    // 20 A: NEC 2023 Table 430.247, 5 hp 240 V
    const out = await selector.selectPanel({
      supply: supply480,
      loads: [motor({ tag: 'H-1', supply: 'dc', hp: 5, volts: 240, dcField: 'shunt' })],
    });
    const [dc] = out.panel.otherSources ?? [];
    expect(dc).toMatchObject({ kind: 'dc-supply', tag: 'DC1', secondaryVolts: 240, secondaryAmps: 25, loadKva: 6 });
    // input ≈ 6 kW / 0.85 / (√3 × 480 V) = 8.49 A (common practice estimate)
    expect(dc?.primaryAmps).toBe(8.49);
    expect(out.panel.otherLoadsAmps).toBe(8.49);
    expect(out.panel.feeder.minAmpacity).toBe(8.49);
  });
});

describe('the bill of materials carries the sources (seed catalogue)', () => {
  it('T1: the 7.5 kVA 480-240/120 V transformer, its 35 A primary and 40 A secondary breakers; its losses in the heat load', async () => {
    const out = await selector.selectPanel({
      supply: supply480,
      loads: [
        motor({ tag: 'P-1', hp: 10, volts: 460 }),
        motor({ tag: 'F-1', supply: 'ac1', hp: 1.5, volts: 230 }),
        motor({ tag: 'F-2', supply: 'ac1', hp: 1.5, volts: 230 }),
        motor({ tag: 'H-1', supply: 'dc', hp: 5, volts: 240, dcField: 'shunt' }),
      ],
    });
    const bom = buildBom({
      panelName: 'T',
      selections: out.results,
      panel: out.panel,
      supply: { volts: 480, phases: 3, hz: 60 },
      enclosureType: '12',
      catalogue: seedCatalogue(),
      labourUnits: seedLabourUnits(),
    });
    const t1 = bom.lines.filter((l) => l.bucket === 'T1 transformer');
    expect(t1.map((l) => [l.category, l.code])).toEqual([
      ['power-transformer', 'PW-XF-1-7A5K-240'], // smallest single-phase 240/120 V unit ≥ 7.5 kVA
      ['inverse-time-breaker', 'PW-BR-2P-035'], // Table 450.3(B) primary, 250 %
      ['inverse-time-breaker', 'PW-BR-2P-040'], // Table 450.3(B) secondary, 125 %, Note 1
    ]);
    const dc1 = bom.lines.filter((l) => l.bucket === 'DC1 DC supply');
    expect(dc1.map((l) => l.category)).toEqual(['dc-power-supply', 'inverse-time-breaker']);
    expect(dc1[0]?.code).toBe('PW-DS-240-025'); // ≥ 25 A at 240 V DC
    const without = linesHeatLossW(bom.lines.filter((l) => l.bucket !== 'T1 transformer' && l.bucket !== 'DC1 DC supply'));
    const transformerLoss = t1[0]?.heatLossW ?? 0;
    expect(transformerLoss).toBeGreaterThan(0);
    expect(linesHeatLossW(bom.lines)).toBeGreaterThanOrEqual(without + transformerLoss);
  });
});

describe('the one-line of a motor at another voltage', () => {
  it('starts at the feeder bus, through T1 and its breakers, to the T1 secondary bus — not a "feeder bus 230 V"', async () => {
    const out = await selector.selectPanel({
      supply: supply480,
      loads: [
        motor({ tag: 'F-1', supply: 'ac1', hp: 1.5, volts: 230 }),
        motor({ tag: 'F-2', supply: 'ac1', hp: 1.5, volts: 230, fedFrom: 'external' }),
      ],
    });
    const f1 = out.results[0]!;
    const els = oneLineElements(f1, motorFeed(out.panel, 'F-1'));
    expect(els.slice(0, 5).map((e) => [e.kind, e.label])).toEqual([
      ['bus', 'Feeder bus'],
      // one 1.5 hp 230 V motor (10 A, NEC 2023 Table 430.248): 125 % × 10 A × 240 V = 3 kVA, a standard rating
      ['breaker', '15 A T1 primary breaker'], // 6.25 A × 250 % = 15.63 A → 15 A, NEC 2023 Table 450.3(B), Table 240.6(A)
      ['transformer', 'T1 — 3 kVA transformer'],
      ['breaker', '20 A T1 secondary breaker'], // 12.5 A × 125 % = 15.63 A → next higher 20 A (Note 1)
      ['bus', 'T1 secondary bus'],
    ]);
    expect(els.some((e) => e.kind === 'bus' && e.detail === '230 V')).toBe(false);
    const ext = oneLineElements(out.results[1]!, motorFeed(out.panel, 'F-2'));
    expect(ext[0]).toMatchObject({ kind: 'bus', label: 'Outside source (not from this panel)' });
  });
});
