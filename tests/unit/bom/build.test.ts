// buildBom from hand-built selections: per-bucket devices, accessories, panel items, labour, unmatched lines.
import { describe, expect, it } from 'vitest';
import { buildBom, indexCatalogue, selectItem, type BuildBomInput } from '../../../shared/calc/bom';
import { calculateHeat } from '../../../shared/calc/heat';
import { linesHeatLossW } from './heat-of-lines';
import { backplateLayout } from '../../../shared/calc/layout/backplate';
import { placeUnits } from '../../../shared/calc/layout/layout-place';
import { layoutUnits } from '../../../shared/calc/layout/layout-units';
import { BomLineSchema, PANEL_BUCKET, type BomLine } from '../../../shared/schemas/catalogue';
import type { LoadSelection } from '../../../shared/schemas/selection';
import { makePanel, makeSelection, seedCatalogue, seedLabourUnits, SUPPLY_480 } from './fixtures';

function bom(selections: LoadSelection[], over: Partial<BuildBomInput> = {}) {
  return buildBom({
    panelName: 'MCC-1',
    selections,
    panel: makePanel(),
    supply: SUPPLY_480,
    enclosureType: '12',
    catalogue: seedCatalogue(),
    labourUnits: seedLabourUnits(),
    ...over,
  });
}
const byCode = new Map(seedCatalogue().map((i) => [i.code, i]));
const itemOf = (code: string) => byCode.get(code);
const codes = (lines: BomLine[], bucket: string) =>
  lines.filter((l) => l.bucket === bucket).map((l) => `${l.code ?? `UNMATCHED:${l.category}`} x${l.quantity}`);

describe('FVNR bucket (10 hp, 460 V; FLC 14 A per NEC 2023 Table 430.250)', () => {
  const { lines } = bom([makeSelection()]);
  it('lists starter, overload, breaker, control and wiring items', () => {
    expect(codes(lines, 'M-101')).toEqual([
      'PW-CN-N1-120 x1', // NEMA size 1 decided by the engine
      'PW-AX-1NO1NC x1',
      'PW-OT-18A-C20 x1', // 12–18 A holds FLA 13.2 A, class 20
      'PW-BR-3P-035 x1', // 250 % × 14 A = 35 A (NEC 2023 Table 430.52)
      'PW-PB-START x1',
      'PW-PB-STOP x1',
      'PW-PL-RUN-120 x1',
      'PW-FU-CC-TD-2A x1', // control fuse, 2 A minimum (common practice)
      'PW-FH-CC-1P-030 x1',
      'PW-TB-12-FT x3', // three motor leads, 14 AWG
      'PW-TB-12-GR x1',
      'PW-WR-14-BK x30', // 3 conductors × 10 ft
      'PW-TB-12-FT x4', // FVNR control points (common practice)
      'PW-WR-14-RD x40',
    ]);
  });
  it('every line is a valid BomLine, priced from the catalogue', () => {
    for (const l of lines) expect(BomLineSchema.safeParse(l).success).toBe(true);
    const c = lines.find((l) => l.code === 'PW-CN-N1-120')!;
    expect(c.unitCost).toBe(96);
    expect(c.status).toBe('matched');
    expect(c.source).toBe('auto');
  });
  it('labour = mounting unit + terminations × termination unit + item adder', () => {
    // contactor: device-mount 0.25 h + 8 × 0.06 h = 0.73 h (catalog/labour-units.json)
    expect(lines.find((l) => l.code === 'PW-CN-N1-120')!.unitLabourHours).toBeCloseTo(0.73, 10);
    // start button: door-device 0.4 h + 2 × 0.06 h = 0.52 h
    expect(lines.find((l) => l.code === 'PW-PB-START')!.unitLabourHours).toBeCloseTo(0.52, 10);
    // wire: 0.004 h per ft, no terminations
    expect(lines.find((l) => l.code === 'PW-WR-14-BK')!.unitLabourHours).toBeCloseTo(0.004, 10);
  });
  it('labour follows the labour units when the shop edits them', () => {
    const units = seedLabourUnits().map((u) => (u.key === 'termination' ? { ...u, hours: 0.1 } : u));
    const l2 = bom([makeSelection()], { labourUnits: units }).lines;
    expect(l2.find((l) => l.code === 'PW-CN-N1-120')!.unitLabourHours).toBeCloseTo(0.25 + 8 * 0.1, 10);
  });
});

describe('starter types', () => {
  it('FVR: two contactors, a mechanical interlock, forward/reverse/stop and two run lights', () => {
    const s = makeSelection({ tag: 'M-2', starter: { type: 'FVR', reversingContactors: true, interlock: true } });
    const l = bom([s]).lines.filter((x) => x.bucket === 'M-2');
    const q = (code: string) => l.filter((x) => x.code === code).reduce((n, x) => n + x.quantity, 0);
    expect(q('PW-CN-N1-120')).toBe(2);
    expect(q('PW-AX-1NO1NC')).toBe(2);
    expect(q('PW-MI-N1')).toBe(1);
    expect(q('PW-PB-FWD')).toBe(1);
    expect(q('PW-PB-REV')).toBe(1);
    expect(q('PW-PB-STOP')).toBe(1);
    expect(q('PW-PL-RUN-120')).toBe(2);
    expect(q('PW-TB-12-FT')).toBe(3 + 6);
  });
  it('VFD with the drive overload: drive at the duty current, filter, HOA, no overload relay, no contactor', () => {
    const s = makeSelection({
      tag: 'M-3',
      starter: { type: 'VFD', nemaSize: null },
      overload: { providedByDrive: true },
      vfd: { duty: 'heavy', minOutputAmps: 14, inverterDutyMotor: true, outputFilter: 'sine-wave', basis: '' },
    });
    const l = bom([s]).lines.filter((x) => x.bucket === 'M-3');
    expect(l.map((x) => x.code)).toContain('PW-VF-4-21A'); // heavy duty 14 A
    expect(l.map((x) => x.code)).toContain('PW-OF-SW-018');
    expect(l.map((x) => x.code)).toContain('PW-SW-HOA');
    expect(l.some((x) => x.category === 'overload-relay' || x.category === 'contactor')).toBe(false);
    // drive labour: drive unit 1.5 h + 16 terminations × 0.06 h + 1.0 h set-up adder
    expect(l.find((x) => x.category === 'vfd')!.unitLabourHours).toBeCloseTo(3.46, 10);
  });
  it('VFD without the drive overload gets an overload relay', () => {
    const s = makeSelection({
      tag: 'M-4',
      starter: { type: 'VFD', nemaSize: null },
      vfd: { duty: 'normal', minOutputAmps: 14, inverterDutyMotor: false, outputFilter: 'none', basis: '' },
    });
    const l = bom([s]).lines.filter((x) => x.bucket === 'M-4');
    expect(l.filter((x) => x.category === 'overload-relay').map((x) => x.code)).toEqual(['PW-OT-18A-C20']);
    expect(l.filter((x) => x.category === 'vfd').map((x) => x.code)).toEqual(['PW-VF-4-14A']);
  });
  it('RVSS with bypass: soft starter with internal bypass and built-in overload, no relay', () => {
    const s = makeSelection({
      tag: 'M-5',
      starter: { type: 'RVSS', nemaSize: null },
      softStarter: { minAmps: 14, insideDelta: false, bypass: true },
    });
    const l = bom([s]).lines.filter((x) => x.bucket === 'M-5');
    expect(l.filter((x) => x.category === 'soft-starter').map((x) => x.code)).toEqual(['PW-SS-B-017']);
    expect(l.some((x) => x.category === 'overload-relay')).toBe(false);
  });
  it('wye-delta: three contactors, interlock, overload at FLA/√3, six motor leads', () => {
    const s = makeSelection({
      tag: 'M-6',
      flaAmps: 27,
      overload: { maxSettingAmps: 33.75 },
      starter: { type: 'wye-delta', nemaSize: '2' },
    });
    const l = bom([s]).lines.filter((x) => x.bucket === 'M-6');
    expect(l.find((x) => x.category === 'contactor')!.quantity).toBe(3);
    expect(l.find((x) => x.category === 'mechanical-interlock')!.code).toBe('PW-MI-N2');
    expect(l.find((x) => x.category === 'overload-relay')!.code).toBe('PW-OT-18A-C20'); // 27/√3 = 15.59 A in 12–18 A
    expect(l.find((x) => x.code === 'PW-WR-14-BK')!.quantity).toBe(60);
  });
  it('two-speed: two overload relays; part-winding: two relays at FLA/2 and no interlock', () => {
    const ts = bom([makeSelection({ tag: 'M-7', starter: { type: 'two-speed' } })]).lines;
    expect(ts.find((x) => x.category === 'overload-relay')!.quantity).toBe(2);
    const pw = bom([makeSelection({ tag: 'M-8', starter: { type: 'part-winding' } })]).lines;
    expect(pw.find((x) => x.category === 'overload-relay')!.code).toBe('PW-OT-8A-C20'); // 13.2/2 = 6.6 A in 5.5–8 A
    expect(pw.some((x) => x.category === 'mechanical-interlock')).toBe(false);
  });
  it('DC drive with field-loss protection and dynamic braking', () => {
    const s = makeSelection({
      tag: 'D-1',
      supply: 'dc',
      hp: 10,
      volts: 240,
      tableVolts: 240,
      flcAmps: 38,
      flaAmps: 38,
      starter: { type: 'dc-drive', nemaSize: null },
      conductor: { size: '8 AWG', minAmpacity: 47.5 },
      dc: { fieldLossProtection: true, dynamicBraking: true, field: 'shunt' },
      scpd: { ratingAmps: 60 },
    });
    const l = bom([s]).lines.filter((x) => x.bucket === 'D-1');
    const c = l.map((x) => x.code);
    expect(c).toContain('PW-DD-040');
    expect(c).toContain('PW-FL-300');
    expect(c).toContain('PW-DB-240-010');
    expect(c).toContain('PW-BR-2P-060'); // DC: two poles
    expect(l.find((x) => x.code === 'PW-TB-8-FT' && x.quantity === 4)).toBeDefined(); // A1, A2, F1, F2
  });
});

describe('protection variants', () => {
  it('dual-element fuses: three class J time-delay fuses and a 3-pole holder', () => {
    const l = bom([makeSelection({ scpd: { type: 'dual-element-fuse', ratingAmps: 25 } })]).lines;
    expect(codes(l, 'M-101').filter((c) => c.startsWith('PW-F'))).toEqual([
      'PW-FU-J-TD-025 x3',
      'PW-FH-J-3P-030 x1',
      'PW-FU-CC-TD-2A x1',
      'PW-FH-CC-1P-030 x1',
    ]);
  });
  it('per-bucket disconnect with fuses: a fused disconnect instead of the holder', () => {
    const l = bom([makeSelection({ scpd: { type: 'dual-element-fuse', ratingAmps: 25 } })], {
      options: { bucketDisconnect: 'per-bucket' },
    }).lines;
    expect(l.some((x) => x.code === 'PW-FD-J-030')).toBe(true);
    expect(l.some((x) => x.code === 'PW-FH-J-3P-030')).toBe(false);
  });
  it('fuse class preference is followed', () => {
    const l = bom([makeSelection({ scpd: { type: 'dual-element-fuse', ratingAmps: 25 } })], {
      options: { fuseClasses: ['RK5', 'J'] },
    }).lines;
    expect(l.some((x) => x.code === 'PW-FU-RK5-TD-025')).toBe(true);
  });
  it('instantaneous-trip breaker: continuous ≥ 115 % FLC (NEC 2023 430.110(A)), trip settable within the limit', () => {
    const l = bom([makeSelection({ scpd: { type: 'instantaneous-trip-breaker', ratingAmps: 112, maxPercent: 800 } })]).lines;
    expect(l.some((x) => x.code === 'PW-MC-3P-030')).toBe(true); // 14 × 1.15 = 16.1 A → 30 A frame
  });
  it('phase loss by the overload → electronic overload; reversal → phase-monitoring relay', () => {
    const l = bom([makeSelection({ relays: { phaseLoss: true, phaseReversal: true, phaseLossByOverload: true } })]).lines;
    expect(l.find((x) => x.category === 'overload-relay')!.code).toBe('PW-OE-15A');
    expect(l.find((x) => x.category === 'phase-monitor-relay')!.code).toBe('PW-PM-LR-480');
  });
});

describe('unmatched lines', () => {
  it('a contactor size the catalogue lacks gives an unmatched line with its ratings, not a guess', () => {
    const l = bom([makeSelection({ starter: { nemaSize: '7' } })]).lines;
    const u = l.find((x) => x.category === 'contactor')!;
    expect(u.code).toBeNull();
    expect(u.status).toBe('unmatched');
    expect(u.unitCost).toBe(0);
    expect(u.requiredRatings).toBe('Contactors: NEMA size 7; coil 120 V; rated for 460 V');
    expect(BomLineSchema.safeParse(u).success).toBe(true);
  });
  it('a breaker rating that is not catalogued is unmatched, not rounded', () => {
    const l = bom([makeSelection({ scpd: { ratingAmps: 36 } })]).lines;
    const u = l.find((x) => x.category === 'inverse-time-breaker')!;
    expect(u.code).toBeNull();
    expect(u.requiredRatings).toContain('rating 36 A');
  });
  it('an unknown conductor size leaves terminals and wire unmatched', () => {
    const l = bom([makeSelection({ conductor: { size: '7 AWG' } })]).lines;
    expect(l.filter((x) => x.bucket === 'M-101' && x.status === 'unmatched').map((x) => x.category)).toEqual(['terminal-block', 'wire']);
  });
  it('counts unmatched lines in the totals', () => {
    const r = bom([makeSelection({ starter: { nemaSize: '7' } }), makeSelection({ tag: 'M-2', scpd: { ratingAmps: 36 } })]);
    expect(r.totals.unmatchedLines).toBe(2);
  });
});

describe('panel items', () => {
  const sels = [makeSelection(), makeSelection({ tag: 'M-102' })];
  const r = bom(sels, { panel: makePanel({ ocpdMaxAmps: 70, minAmpacity: 31.5, conductorSize: '8 AWG' }, 28) });
  const panel = r.lines.filter((l) => l.bucket === PANEL_BUCKET);
  it('main breaker: the largest standard rating not above the feeder maximum (NEC 2023 430.62(A))', () => {
    expect(panel.find((l) => l.category === 'main-breaker')!.code).toBe('PW-MB-3P-070');
  });
  it('distribution block sized for the feeder ampacity', () => {
    expect(panel.find((l) => l.category === 'power-distribution-block')!.code).toBe('PW-PD-3P-115-06');
  });
  it('control transformer: continuous ≥ sealed VA, inrush ≥ √(sealed² + inrush²) (common practice)', () => {
    // 2 × 27 VA coils + 2 × 0.6 VA lights = 55.2 VA sealed; largest inrush 218 VA → √(55.2² + 218²) = 224.88 VA
    expect(r.control.sealedVa).toBeCloseTo(55.2, 6);
    expect(r.control.selectionVa).toBeCloseTo(224.88, 2);
    expect(panel.find((l) => l.category === 'control-transformer')!.code).toBe('PW-CT-0075-120'); // 75 VA carries 310 VA inrush
  });
  it('transformer fuses: primary ≤ 500 % under 2 A (NEC 2023 430.72(C)(4)), secondary ≤ 167 % under 9 A (Table 450.3(B)) — from memory', () => {
    // primary 75/480 = 0.156 A → ≤ 0.78 A → 0.5 A; secondary 75/120 = 0.625 A → ≤ 1.04 A → 1 A
    const fuses = panel.filter((l) => l.category === 'fuse').map((l) => `${l.code} x${l.quantity}`);
    expect(fuses).toEqual(['PW-FU-CC-TD-0A5 x2', 'PW-FU-CC-TD-1A x1']);
  });
  it('enclosure of the decided type chosen by the backplate layout (common practice spacing, shared/standards/panel-layout.ts)', () => {
    // 1000 × 800 plate 700 × 850 (less 150 / 100 mm), 60 mm duct: rows 85–255 (main, block, CPT, fuse holders,
    // 1M with its overload 170 mm, 1CB), 365–535 (the rest of both buckets), terminals 645–690; last duct ends at 775
    expect(r.enclosure.requiredAreaMm2).toBe(700 * 775);
    // 800 × 600 (plate 500 × 650, 40 mm duct, 370 mm between the side ducts): rows of 165 and 170 mm and the
    // terminal row, 40 + (25 + 165 + 25 + 40) + (25 + 170 + 25 + 40) + (25 + 45 + 25 + 40) = 690 mm > 650 → next size up
    const smaller = placeUnits(layoutUnits(r.lines, itemOf).units, { widthMm: 500, heightMm: 650 }, 1);
    expect(smaller.usedHeightMm).toBe(555); // the two rows of parts fit; the terminal row's 135 mm does not
    expect(smaller.overflow.map((u) => u.tag)).toHaveLength(16); // both buckets' 8 terminals (3 leads, ground, 4 control)
    expect(panel.find((l) => l.category === 'enclosure')!.code).toBe('PW-EN-12-100X80X30');
    const layout = backplateLayout(r.lines, itemOf);
    expect(layout.enclosure?.code).toBe('PW-EN-12-100X80X30');
    expect(layout.unplaced).toEqual([]);
  });
  it('a panel too big for one section becomes a lineup of the largest section, as many as the layout fills', () => {
    const many = Array.from({ length: 40 }, (_, i) =>
      makeSelection({
        tag: `V-${i}`,
        starter: { type: 'VFD', nemaSize: null },
        overload: { providedByDrive: true },
        vfd: { duty: 'normal', minOutputAmps: 150, inverterDutyMotor: true, outputFilter: 'none', basis: '' },
        scpd: { ratingAmps: 250 },
        conductor: { size: '3/0', minAmpacity: 190 },
      }),
    );
    const big = bom(many, { panel: makePanel({ ocpdMaxAmps: 800, minAmpacity: 700, conductorSize: '500 kcmil' }, 6000) });
    const enc = big.lines.find((l) => l.category === 'enclosure')!;
    expect(enc.code).toBe('PW-EN-12-200X120X60');
    const layout = backplateLayout(big.lines, itemOf);
    // the 156 A drives (300 × 700 mm with 150 mm above and below) take a 1000 mm row each; two buckets a row
    expect(enc.quantity).toBe(layout.sections);
    expect(enc.quantity).toBeGreaterThan(1);
    expect(layout.unplaced).toEqual([]);
    expect(big.enclosure.sections).toBe(enc.quantity);
  });
  it('enclosure type written as people write it ("NEMA 4x") is understood', () => {
    const l = bom([makeSelection()], { enclosureType: 'NEMA 4x' }).lines;
    expect(l.find((x) => x.category === 'enclosure')!.code).toMatch(/^PW-EN-4X-/);
  });
  it('fused main: class J time-delay fuses at the largest rating not above the maximum, and a main disconnect', () => {
    const l = bom(sels, { panel: makePanel({ ocpdMaxAmps: 70 }, 28), options: { main: 'fused-disconnect' } }).lines.filter(
      (x) => x.bucket === PANEL_BUCKET,
    );
    expect(l.find((x) => x.category === 'fuse' && x.code?.startsWith('PW-FU-J'))!.code).toBe('PW-FU-J-TD-070');
    expect(l.find((x) => x.category === 'main-disconnect')!.code).toBe('PW-MD-J-3P-100');
  });
  it('an empty panel has no items', () => {
    expect(bom([]).lines).toEqual([]);
  });
});

describe('cooling (panel-check step): the one heat model of shared/calc/heat.ts, the catalogue match of the bill of materials', () => {
  // IEC TR 60890 simplified method; wall-mounted: top 1.4, front and sides 0.9, back 0.5 (from memory)
  const enclosure = { heightM: 1.2, widthM: 0.8, depthM: 0.3, mounting: 'wall-mounted' as const };
  const index = indexCatalogue(seedCatalogue());
  const heat = (heatLossW: number, ambientC: number) =>
    calculateHeat({
      enclosure,
      sources: [{ bucketTag: null, code: 'LOAD', description: 'panel losses', category: 'contactor', heatLossW }],
      ambientC,
      internalLimitC: 40,
    });
  it('no cooling while the surface sheds the heat', () => {
    // A = 1.4·0.8·0.3 + 0.9·1.2·0.8 + 0.5·1.2·0.8 + 2 × 0.9·1.2·0.3 = 2.328 m² (IEC TR 60890, from memory); 5.5 × 2.328 × 10 K = 128.04 W
    const r = heat(100, 30);
    expect(r.aeM2).toBeCloseTo(2.328, 6);
    expect(r.surfaceDissipationW).toBeCloseTo(128.04, 2);
    expect(r.exceeded).toBe(false);
    expect(r.cooling).toBeNull();
  });
  it('filter fan: cfm = 3.16 × excess W / ΔT°F (common practice), rated for the type', () => {
    const r = heat(500, 30);
    // excess 500 − 128.04 = 371.96 W over a 10 K (18 °F) rise: 3.16 × 371.96 / 18 = 65.30 cfm
    expect(r.cooling!.fan!.cfm).toBeCloseTo((3.16 * (500 - 128.04)) / 18, 1);
    const fan = selectItem(index, { category: 'cooling', kind: 'filter-fan', minCfm: r.cooling!.fan!.cfm, nemaType: '12' });
    expect(fan!.code).toBe('PW-FF-100-12');
  });
  it('air conditioner when the ambient is above the allowed internal temperature', () => {
    const r = heat(500, 45);
    expect(r.cooling!.fan).toBeNull(); // a fan cannot cool below the ambient
    expect(r.cooling!.airConditionerW).toBeCloseTo(500 + 5.5 * 2.328 * 5, 1); // 564.02 W
    const ac = selectItem(index, { category: 'cooling', kind: 'air-conditioner', minCoolingW: r.cooling!.airConditionerW, nemaType: '12' });
    expect(ac!.code).toBe('PW-AC-0800-12');
  });
  it('Type 4X: no filter fan keeps the rating, so an air conditioner', () => {
    const r = heat(500, 30);
    expect(selectItem(index, { category: 'cooling', kind: 'filter-fan', minCfm: r.cooling!.fan!.cfm, nemaType: '4X' })).toBeNull();
    const ac = selectItem(index, { category: 'cooling', kind: 'air-conditioner', minCoolingW: r.cooling!.airConditionerW, nemaType: '4X' });
    expect(ac!.code).toBe('PW-AC-0500-4X'); // 371.96 W
  });
  it('heat loss of lines counts each-units only', () => {
    const lines = bom([makeSelection()]).lines;
    const expected = lines.filter((l) => l.unit === 'ea').reduce((s, l) => s + l.quantity * l.heatLossW, 0);
    // wire by the foot carries no heat loss in the catalogue, so the heat model's total is the each-units'
    expect(lines.filter((l) => l.unit === 'ft').every((l) => l.heatLossW === 0)).toBe(true);
    expect(linesHeatLossW(lines)).toBeCloseTo(expected, 2);
    expect(linesHeatLossW(lines)).toBeGreaterThan(0);
  });
});

describe('conductor sizes as the engine writes them', () => {
  it('parallel sets multiply terminals and wire; the per-terminal current is the set share', async () => {
    const { parseConductor } = await import('../../../shared/calc/bom');
    expect(parseConductor('3 × 350 kcmil per phase')).toEqual({ size: '350', sets: 3 });
    expect(parseConductor('1/0 AWG')).toEqual({ size: '1/0', sets: 1 });
    expect(parseConductor('7 AWG')).toBeNull();
    const s = makeSelection({ conductor: { size: '2 × 1/0 AWG per phase', minAmpacity: 280 } });
    const l = bom([s]).lines.filter((x) => x.bucket === 'M-101');
    // 280 A / 2 sets = 140 A per terminal: 6–1/0 block rated 150 A
    expect(l.find((x) => x.category === 'terminal-block' && x.code === 'PW-TB-0-FT')!.quantity).toBe(6);
    expect(l.find((x) => x.code === 'PW-WR-0-BK')!.quantity).toBe(60);
  });
  it('aluminum branch conductors are not matched to copper wire', () => {
    const l = bom([makeSelection({ conductor: { material: 'al' } })]).lines;
    const w = l.filter((x) => x.category === 'wire' && x.status === 'unmatched');
    expect(w.map((x) => x.requiredRatings)).toEqual(["Wire: aluminum 14 (the catalogue's wire is copper)"]);
  });
});
