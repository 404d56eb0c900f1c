// Several motors on one drive: the drive sized for the sum, its input circuit (NEC 2023 430.122(A), 430.130),
// each motor's overload (430.32(A)(1)), output contactor and conductors (430.22), and the feeder counting the
// drive once (430.24, 430.62(A)).
//
// Worked example, by hand (480 V three-phase supply, copper, 75 °C, 30 °C ambient, inverse-time breakers, no nameplate FLA):
//   FLC, NEC 2023 Table 430.250 at 460 V: 10 hp 14 A, 7.5 hp 11 A, 5 hp 7.6 A, 15 hp 21 A.
//   VFD-1 feeds P-1 (10 hp), P-2 (7.5 hp), P-3 (5 hp): sum of FLC 14 + 11 + 7.6 = 32.6 A; no FLA given, so the
//     drive's output is at least 32.6 A (sum of FLA = table FLC; common practice).
//   Input conductor 430.122(A): 1.25 × 32.6 = 40.75 A (sum of FLC standing in for the rated input) -> 8 AWG (50 A,
//     Table 310.16 Cu 75 °C; 10 AWG carries 35 A).
//   Input device 430.130(A)(1) with Table 430.52: 250 % × 32.6 = 81.5 A -> 90 A (430.52(C)(1) Exception No. 1, Table 240.6(A)).
//   Output conductors to the taps, 430.24 read over the three motors: 1.25 × 14 + 11 + 7.6 = 36.1 A -> 8 AWG (50 A).
//   Each motor: conductor 1.25 × FLC = 17.5 / 13.75 / 9.5 A -> 14 AWG (20 A at 75 °C); overload at 115 % (service
//     factor 1.0, 430.32(A)(1)): 16.1 / 12.65 / 8.74 A.
//   Feeder with P-4 (15 hp FVNR, 21 A, device 250 % × 21 = 52.5 -> 60 A): VFD-1 is the largest load,
//     430.24: 1.25 × 32.6 + 21 = 61.75 A (each motor counted alone would give 1.25 × 21 + 32.6 = 58.85 A);
//     430.62(A): 90 A + 21 A = 111 A -> 110 A (next lower standard rating, Table 240.6(A)).
import { describe, expect, it } from 'vitest';
import { sharedDriveCautions, sharedDrives } from '../../../shared/calc/shared-drives';
import { LoadSchema, type LoadInput } from '../../../shared/schemas/load';
import { motor, selector, supply240, supply480 } from './selector-setup';

const onDrive = (tag: string, hp: number, over: Partial<LoadInput> = {}) =>
  motor({ tag, hp, speedControl: 'variable', sharedDrive: 'VFD-1', ...over });

const threeOnOne = [onDrive('P-1', 10), onDrive('P-2', 7.5), onDrive('P-3', 5)];
const fifteenFvnr = motor({ tag: 'P-4', hp: 15 });

describe('a drive shared by three motors', () => {
  it('is sized for the sum and keeps each motor its own overload, contactor and conductors', async () => {
    const out = await selector.selectPanel({ supply: supply480, loads: threeOnOne });
    expect(out.results.map((r) => r.starter.type)).toEqual(['VFD', 'VFD', 'VFD']);
    const d = out.panel.sharedDrives?.[0];
    expect(out.panel.sharedDrives).toHaveLength(1);
    expect(d?.tag).toBe('VFD-1');
    expect(d?.sumFlcAmps).toBe(32.6); // NEC 2023 Table 430.250: 14 + 11 + 7.6
    expect(d?.output.minOutputAmps).toBe(32.6); // sum of FLA (table FLC, no nameplate) — common practice
    expect(d?.input).toMatchObject({
      ratedInputAmps: null,
      amps: 32.6,
      conductor: { minAmpacity: 40.75, size: '8 AWG', ampacity: 50 }, // NEC 2023 430.122(A), Table 310.16
      protection: { type: 'inverse-time-breaker', maxPercent: 250, computedMaxAmps: 81.5, ratingAmps: 90 }, // 430.130(A)(1), Table 430.52, 240.6(A)
    });
    expect(d?.outputConductor).toMatchObject({ minAmpacity: 36.1, size: '8 AWG', ampacity: 50 }); // 430.24 (a reading)
    const rows: Array<[string, number, number, number, string]> = [
      // tag, FLC (Table 430.250), conductor min (430.22), overload max (430.32(A)(1) 115 %), size (Table 310.16 Cu 75 °C)
      ['P-1', 14, 17.5, 16.1, '14 AWG'],
      ['P-2', 11, 13.75, 12.65, '14 AWG'],
      ['P-3', 7.6, 9.5, 8.74, '14 AWG'],
    ];
    for (const [tag, flc, minAmpacity, maxSetting, size] of rows) {
      const m = d?.motors.find((x) => x.tag === tag);
      expect(m?.flcAmps, tag).toBe(flc);
      expect(m?.conductor.minAmpacity, tag).toBe(minAmpacity);
      expect(m?.conductor.size, tag).toBe(size);
      expect(m?.overload.maxSettingAmps, tag).toBe(maxSetting);
      expect(m?.overload.settingAmps, tag).toBe(flc); // dial at the FLA, here the table FLC
      expect(m?.outputContactor.minAc3Amps, tag).toBe(flc); // AC-3 at the motor FLA — common practice
    }
    expect(d?.cautions.join(' ')).toMatch(/protects one motor only/);
    expect(d?.cautions.join(' ')).toMatch(/Starting a motor onto a running drive output/);
  });

  it('takes the rated input current when it is given and above the sum (430.122(A)): 40 A -> 50 A conductor, 100 A device', async () => {
    // 1.25 × 40 = 50 A -> 8 AWG (50 A, Table 310.16 Cu 75 °C); 250 % × 40 = 100 A, a standard rating (Table 240.6(A))
    const loads = threeOnOne.map((l) => ({ ...l, driveInputAmps: 40 }));
    const out = await selector.selectPanel({ supply: supply480, loads });
    expect(out.panel.sharedDrives?.[0]?.input).toMatchObject({
      ratedInputAmps: 40,
      amps: 40,
      conductor: { minAmpacity: 50, size: '8 AWG' },
      protection: { ratingAmps: 100 },
    });
  });

  it('sums the nameplate FLA for the output where given (14.5 + 11 + 7.6 = 33.1 A)', async () => {
    const loads = [onDrive('P-1', 10, { fla: 14.5 }), onDrive('P-2', 7.5), onDrive('P-3', 5)];
    const out = await selector.selectPanel({ supply: supply480, loads });
    const d = out.panel.sharedDrives?.[0];
    expect(d?.output.minOutputAmps).toBe(33.1); // sum of FLA, common practice
    expect(d?.sumFlcAmps).toBe(32.6); // conductors and protection stay on the table FLC, NEC 2023 430.6(A)(1)
    expect(d?.motors[0]?.overload.settingAmps).toBe(14.5);
  });
});

describe('the feeder counts the shared drive once', () => {
  it('VFD-1 at its input current and input device beside a 15 hp FVNR motor', async () => {
    const out = await selector.selectPanel({ supply: supply480, loads: [...threeOnOne, fifteenFvnr] });
    expect(out.results[3]?.scpd.ratingAmps).toBe(60); // 250 % × 21 = 52.5 -> 60 A, NEC 2023 430.52(C)(1) Exc. 1
    expect(out.panel.largestMotorTag).toBe('VFD-1');
    expect(out.panel.totalFlcAmps).toBe(53.6); // 32.6 + 21 (409.110)
    expect(out.panel.feeder.minAmpacity).toBe(61.75); // NEC 2023 430.24: 1.25 × 32.6 + 21
    expect(out.panel.feeder.ocpdMaxAmps).toBe(110); // NEC 2023 430.62(A): 90 + 21 = 111 -> 110 A
    expect(out.panel.notes?.some((n) => n.startsWith('VFD-1: one drive for P-1, P-2, P-3'))).toBe(true);
  });

  it('without the shared drive each motor is its own branch (1.25 × 21 + 32.6 = 58.85 A, NEC 2023 430.24)', async () => {
    const own = threeOnOne.map(({ sharedDrive: _s, ...l }) => l);
    const out = await selector.selectPanel({ supply: supply480, loads: [...own, fifteenFvnr] });
    expect(out.panel.sharedDrives).toBeUndefined();
    expect(out.panel.feeder.minAmpacity).toBe(58.85);
  });
});

describe('what a shared drive refuses', () => {
  it.each([
    ['fixed speed', { speedControl: 'fixed' as const }, 'A shared drive applies only to motors with variable speed'],
    ['DC', { supply: 'dc' as const, volts: 500, speedControl: 'variable' as const }, 'A shared drive applies to AC motors only'],
  ])('the answers refuse a shared drive on a %s motor', (_what, over, message) => {
    const r = LoadSchema.safeParse({ ...motor({ sharedDrive: 'VFD-1' }), ...over });
    expect(r.success).toBe(false);
    expect(r.error?.issues.find((i) => i.path[0] === 'sharedDrive')?.message).toBe(message);
  });

  it('a single-phase motor takes no drive (FVNR), so it is left out of the shared drive with the reason', async () => {
    const loads = [
      onDrive('P-1', 10, { volts: 230 }),
      onDrive('P-2', 7.5, { volts: 230 }),
      onDrive('P-3', 3, { volts: 230, supply: 'ac1' }),
    ];
    const out = await selector.selectPanel({ supply: supply240, loads });
    expect(out.panel.sharedDrives?.[0]?.motors.map((m) => m.tag)).toEqual(['P-1', 'P-2']);
    expect(out.panel.errors).toContain('P-3: names shared drive VFD-1 but its starter is FVNR, not a drive: left out of VFD-1');
  });

  it('motors of different voltages on one drive: an error naming them, and no shared drive', async () => {
    const a = onDrive('P-1', 10);
    const b = onDrive('P-2', 10, { volts: 575 });
    const sa = await selector.selectLoad(a, supply480);
    const sb = await selector.selectLoad(b, { ...supply480, volts: 600 });
    const r = sharedDrives(
      [
        { load: LoadSchema.parse(a), selection: sa, onBus: true },
        { load: LoadSchema.parse(b), selection: sb, onBus: true },
      ],
      { ambientC: 30 },
      '2023',
    );
    expect(r.drives).toEqual([]);
    expect(r.memberTags.size).toBe(0);
    expect(r.errors[0]).toMatch(/^VFD-1: its motors are at different voltages or phases \(P-1 three-phase 460 V, P-2 three-phase 575 V\)/);
  });

  it('a 460 V and a 480 V motor are on one 480 V system: one shared drive (same Table 430.250 column)', async () => {
    const loads = [onDrive('P-1', 10), onDrive('P-2', 7.5, { volts: 480 })];
    const out = await selector.selectPanel({ supply: supply480, loads });
    expect(out.panel.sharedDrives?.[0]?.sumFlcAmps).toBe(25); // NEC 2023 Table 430.250 460 V column: 14 + 11
  });

  it('a motor behind a transformer is left out of the shared drive, with the reason', async () => {
    const loads = [onDrive('P-1', 10), onDrive('P-2', 7.5), onDrive('P-3', 5, { volts: 230 })];
    const out = await selector.selectPanel({ supply: supply480, loads });
    expect(out.panel.sharedDrives?.[0]?.motors.map((m) => m.tag)).toEqual(['P-1', 'P-2']);
    expect(out.panel.errors?.some((e) => e.startsWith("P-3: names shared drive VFD-1 but is not fed from the panel's bus"))).toBe(true);
  });

  it('one motor alone on a named drive is its own drive, with a note', async () => {
    const out = await selector.selectPanel({ supply: supply480, loads: [onDrive('P-1', 10)] });
    expect(out.panel.sharedDrives).toBeUndefined();
    expect(out.panel.notes).toContain("VFD-1: only P-1 names it: sized as that motor's own drive");
  });

  it('different rated input currents on one drive are an error', async () => {
    const loads = [onDrive('P-1', 10, { driveInputAmps: 40 }), onDrive('P-2', 7.5, { driveInputAmps: 45 })];
    const out = await selector.selectPanel({ supply: supply480, loads });
    expect(out.panel.errors?.some((e) => e.includes('different drive input currents (40, 45 A)'))).toBe(true);
    expect(out.panel.sharedDrives?.[0]?.input.amps).toBe(45); // the larger one, conservative
  });

  it('the cautions name the drive and its motors', () => {
    const c = sharedDriveCautions('VFD-9', ['A', 'B']);
    expect(c[0]).toMatch(/^VFD-9 feeds A, B/);
    expect(c[1]).toMatch(/interlocked with VFD-9's enable/);
  });
});
