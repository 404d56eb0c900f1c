// Rule outcomes of the repository's rules/ files. Each case names its basis: the code clause, or
// "common practice" where the rule is a rule of thumb of the trade.
import { describe, expect, it } from 'vitest';
import type { LoadSelection } from '../../../shared/schemas/selection';
import { motor, selector, supply480 } from './selector-setup';
import type { LoadInput } from '../../../shared/schemas/load';

const sel = (over: Partial<LoadInput>) => selector.selectLoad(motor(over), supply480);
const fired = (r: LoadSelection) => r.trace.map((t) => t.ruleId);

describe('starter type', () => {
  it('default three-phase fixed speed -> FVNR (common practice)', async () => {
    const r = await sel({});
    expect(r.starter.type).toBe('FVNR');
    expect(fired(r)).toContain('fvnr-default');
  });
  it('reversing -> FVR with reversing contactors, mechanically and electrically interlocked (common practice)', async () => {
    const r = await sel({ reversing: true });
    expect(r.starter).toMatchObject({ type: 'FVR', reversingContactors: true, interlock: true, nemaSize: '1' });
    const t = r.trace.find((x) => x.ruleId === 'fvr-reversing');
    expect(t?.decision).toContain('starter.type = FVR');
    expect(t?.reason).toMatch(/interlocked/);
    // the lower-priority default is kept in the trace, marked overridden
    expect(r.trace.find((x) => x.ruleId === 'fvnr-default')?.decision).toMatch(/overridden: starter\.type kept FVR from fvr-reversing/);
  });
  it('variable speed -> VFD, no reversing contactors even when reversing, drive overload (NEC 2023 430.124(A))', async () => {
    const r = await sel({ speedControl: 'variable', reversing: true, torque: 'variable', turndown: 3, cableLengthFt: 50 });
    expect(r.starter).toMatchObject({ type: 'VFD', reversingContactors: false, interlock: false, nemaSize: null, iecCategory: null });
    expect(r.overload.providedByDrive).toBe(true);
    expect(r.vfd).toMatchObject({ duty: 'normal', inverterDutyMotor: false, outputFilter: 'none', minOutputAmps: 14 });
    expect(r.cautions.some((c) => c.includes('430.130'))).toBe(true);
  });
  it('reduced inrush -> RVSS with bypass, rated for the FLA (common practice)', async () => {
    const r = await sel({ startingLimit: 'reduced-inrush', fla: 13.2 });
    expect(r.starter.type).toBe('RVSS');
    expect(r.starter.nemaSize).toBeNull();
    expect(r.softStarter).toEqual({ minAmps: 13.2, insideDelta: false, bypass: true });
  });
  it('soft starter inside the delta of a six-lead delta motor: FLA/√3 (common practice)', async () => {
    const r = await sel({ startingLimit: 'reduced-inrush', fla: 118, hp: 100, leads: 6, connection: 'delta', insideDelta: true });
    expect(r.softStarter).toEqual({ minAmps: 68.13, insideDelta: true, bypass: true });
  });
  it('inside-delta asked for a three-lead motor: in line, with a caution', async () => {
    const r = await sel({ startingLimit: 'reduced-inrush', fla: 14, leads: 3, insideDelta: true });
    expect(r.softStarter?.insideDelta).toBe(false);
    expect(r.cautions.some((c) => c.startsWith('Inside-delta was asked for'))).toBe(true);
  });
  it('wye-delta needs a six-lead motor wound to run in delta (common practice; NEC 2023 430.22(C))', async () => {
    const ok = await sel({
      startingLimit: 'reduced-inrush',
      starterPreference: 'wye-delta',
      leads: 6,
      connection: 'delta',
      hp: 100,
      fla: 118,
    });
    expect(ok.starter.type).toBe('wye-delta');
    expect(ok.starter.iecAmps).toBeCloseTo(124 / Math.sqrt(3), 1); // each contactor carries FLC/√3
    expect(ok.cautions.some((c) => c.includes('430.22(C)'))).toBe(true);
    const wye = await sel({ startingLimit: 'reduced-inrush', starterPreference: 'wye-delta', leads: 9, connection: 'wye', hp: 100 });
    expect(wye.starter.type).toBe('RVSS');
    expect(wye.cautions.some((c) => c.startsWith('Wye-delta was asked for'))).toBe(true);
    expect(wye.errors).toEqual([]);
  });
  it('part-winding for a nine-lead motor at its low voltage; refused at 460 V', async () => {
    const ok = await sel({
      startingLimit: 'reduced-inrush',
      starterPreference: 'part-winding',
      leads: 9,
      connection: 'wye',
      volts: 230,
      hp: 25,
    });
    expect(ok.starter.type).toBe('part-winding');
    expect(ok.cautions.some((c) => c.includes('430.4'))).toBe(true);
    const no = await sel({
      startingLimit: 'reduced-inrush',
      starterPreference: 'part-winding',
      leads: 9,
      connection: 'wye',
      volts: 460,
      hp: 25,
    });
    expect(no.starter.type).toBe('RVSS');
  });
  it('two-speed motor -> two-speed starter; VFD still wins over it by priority', async () => {
    expect((await sel({ twoSpeed: true })).starter.type).toBe('two-speed');
    expect((await sel({ twoSpeed: true, speedControl: 'variable' })).starter.type).toBe('VFD');
  });
  it('jogging or plugging -> AC-4 and the lower NEMA plugging/jogging rating: 7.5 hp at 460 V goes from size 1 to size 2 (NEMA ICS 2)', async () => {
    expect((await sel({ hp: 7.5 })).starter).toMatchObject({ nemaSize: '1', iecCategory: 'AC-3' });
    expect((await sel({ hp: 7.5, jogging: true })).starter).toMatchObject({ nemaSize: '2', iecCategory: 'AC-4' });
    expect((await sel({ hp: 7.5, plugging: true })).starter).toMatchObject({ nemaSize: '2', iecCategory: 'AC-4' });
  });
});

describe('DC motors', () => {
  it('series field: never-unloaded caution, no field-loss relay (common practice; NEC 2023 430.89)', async () => {
    const r = await sel({ supply: 'dc', volts: 240, hp: 10, dcField: 'series' });
    expect(r.cautions.some((c) => c.includes('Never run a DC series motor unloaded'))).toBe(true);
    expect(r.dc).toEqual({ fieldLossProtection: false, dynamicBraking: false, field: 'series' });
    expect(r.relays).toEqual({ phaseLoss: false, phaseReversal: false, phaseLossByOverload: false });
  });
  it.each(['shunt', 'compound'] as const)('%s field: field-loss protection (common practice)', async (field) => {
    const r = await sel({ supply: 'dc', volts: 240, hp: 10, dcField: field });
    expect(r.dc?.fieldLossProtection).toBe(true);
    expect(fired(r)).toContain('dc-field-loss');
  });
  it('quick stops -> dynamic braking; variable speed -> DC drive; reversing by the armature', async () => {
    const r = await sel({ supply: 'dc', volts: 240, hp: 10, dcField: 'shunt', quickStop: true, reversing: true });
    expect(r.dc?.dynamicBraking).toBe(true);
    expect(r.starter).toMatchObject({ type: 'dc-armature-resistance', reversingContactors: true, interlock: true });
    expect(r.cautions.some((c) => c.includes('reverse the armature current'))).toBe(true);
    expect((await sel({ supply: 'dc', volts: 240, hp: 10, speedControl: 'variable' })).starter.type).toBe('dc-drive');
  });
  it('no dcField given: shunt assumed and flagged, so field-loss protection is included', async () => {
    const r = await sel({ supply: 'dc', volts: 240, hp: 10 });
    expect(r.dc?.field).toBe('shunt');
    expect(r.dc?.fieldLossProtection).toBe(true);
    expect(r.assumed.find((a) => a.field === 'dcField')?.assumed).toBe('shunt');
  });
});

describe('single-phase cautions', () => {
  it('reversing: swap the start-winding leads, never both (common practice)', async () => {
    const r = await sel({ supply: 'ac1', volts: 230, hp: 1, reversing: true, singlePhaseType: 'psc' });
    expect(r.starter.type).toBe('FVR');
    expect(r.cautions.some((c) => c.includes('never both'))).toBe(true);
    expect(r.cautions.some((c) => c.includes('reverse only from rest'))).toBe(false);
  });
  it('split-phase reversing: only from rest (centrifugal switch)', async () => {
    const r = await sel({ supply: 'ac1', volts: 230, hp: 1, reversing: true, singlePhaseType: 'split-phase' });
    expect(r.cautions.some((c) => c.includes('reverse only from rest'))).toBe(true);
  });
  it('no rotation-check caution rule for single-phase; present for three-phase and DC', async () => {
    expect((await sel({ supply: 'ac1', volts: 230, hp: 1 })).cautions).not.toContain('Check motor rotation before coupling the load.');
    expect((await sel({})).cautions).toContain('Check motor rotation before coupling the load.');
  });
});

describe('protective relays (common practice)', () => {
  it('reverse-rotation hazard -> phase-reversal relay', async () => {
    expect((await sel({ reverseRotationHazard: true })).relays.phaseReversal).toBe(true);
    expect((await sel({})).relays.phaseReversal).toBe(false);
  });
  it('critical load -> phase-loss relay', async () => {
    expect((await sel({ critical: true })).relays.phaseLoss).toBe(true);
  });
  it('large motor threshold at 100 hp: 75 hp no, 100 hp yes', async () => {
    expect((await sel({ hp: 75 })).relays.phaseLoss).toBe(false);
    expect((await sel({ hp: 100 })).relays.phaseLoss).toBe(true);
  });
  it('fused three-phase branch -> overload relay with phase-loss sensitivity', async () => {
    expect((await sel({ scpdType: 'non-time-delay-fuse' })).relays.phaseLossByOverload).toBe(true);
  });
  it('behind a drive the hazard relays give way to the drive’s own protection', async () => {
    const r = await sel({ speedControl: 'variable', reverseRotationHazard: true, critical: true });
    expect(r.relays).toEqual({ phaseLoss: false, phaseReversal: false, phaseLossByOverload: true });
  });
});

describe('enclosure per environment (NEMA 250)', () => {
  it.each([
    ['indoor-dry', '1', 'IP10', false],
    ['indoor-dusty', '12', 'IP52', false],
    ['outdoor', '3R', 'IP14', false],
    ['washdown', '4X', 'IP66', false],
    ['corrosive', '4X', 'IP66', false],
    ['class1-div1', '7', 'none (hazardous location)', true],
    ['class1-div2', '7', 'none (hazardous location)', true],
    ['class2-div1', '9', 'none (hazardous location)', true],
    ['class2-div2', '9', 'none (hazardous location)', true],
  ] as const)('%s -> Type %s (%s), flagged for the engineer: %s', async (environment, nemaType, ipCode, flag) => {
    const r = await sel({ environment });
    expect(r.enclosure).toEqual({ nemaType, ipCode, flagForEngineer: flag });
    expect(r.cautions.some((c) => c.startsWith('Hazardous location'))).toBe(flag);
  });
});

describe('overload trip class by inertia (common practice)', () => {
  it.each([
    ['normal', 10],
    ['high', 20],
    ['very-high', 30],
  ] as const)('%s inertia -> Class %s', async (inertia, cls) => {
    const r = await sel({ inertia });
    expect(r.overload.tripClass).toBe(cls);
    expect(r.overload.basis).toMatch(/trip class: common practice/);
  });
});

describe('drive details (common practice unless cited)', () => {
  it.each([
    [100, 'none'],
    [101, 'dv-dt'],
    [1000, 'dv-dt'],
    [1001, 'sine-wave'],
  ] as const)('%s ft of motor leads at 460 V -> %s filter', async (cableLengthFt, filter) => {
    expect((await sel({ speedControl: 'variable', torque: 'variable', cableLengthFt })).vfd?.outputFilter).toBe(filter);
  });
  it('at 230 V the dV/dt threshold does not apply', async () => {
    expect((await sel({ volts: 230, speedControl: 'variable', torque: 'variable', cableLengthFt: 300 })).vfd?.outputFilter).toBe('none');
  });
  it.each([
    ['constant', 2, 'heavy', false],
    ['constant', 2.5, 'heavy', true],
    ['variable', 10, 'normal', false],
    ['variable', 11, 'normal', true],
  ] as const)('%s torque, %s:1 turndown -> %s duty, inverter-duty motor %s', async (torque, turndown, duty, inv) => {
    const r = await sel({ speedControl: 'variable', torque, turndown, cableLengthFt: 10 });
    expect(r.vfd?.duty).toBe(duty);
    expect(r.vfd?.inverterDutyMotor).toBe(inv);
  });
  it('high inertia with variable torque still takes the heavy-duty rating', async () => {
    expect((await sel({ speedControl: 'variable', torque: 'variable', inertia: 'high' })).vfd?.duty).toBe('heavy');
  });
});
