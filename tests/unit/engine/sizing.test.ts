// Sizing functions against the published tables and clauses named beside each expected value.
import { describe, expect, it } from 'vitest';
import { OutsideTableError, ValidationError } from '../../../shared/errors';
import { fullLoadCurrent } from '../../../shared/calc/flc';
import { overloadMaxSetting } from '../../../shared/calc/overload';
import { branchProtection } from '../../../shared/calc/scpd';
import { branchConductor, selectConductor } from '../../../shared/calc/conductor';
import { motorDisconnect } from '../../../shared/calc/disconnect';
import { lockedRotorCurrent } from '../../../shared/calc/locked-rotor';
import { synchronousRpm } from '../../../shared/calc/synchronous-speed';
import { nemaStarterSize } from '../../../shared/calc/nema-starter-size';
import { softStarterMinAmps } from '../../../shared/calc/drives';
import { feederRollup } from '../../../shared/calc/feeder';

describe('full-load current (NEC 2023 430.6(A)(1))', () => {
  it.each([
    ['ac3', 25, 480, 34, 460, 'NEC 2023 Table 430.250, 480 V system -> 460 V column'],
    ['ac3', 10, 240, 28, 230, 'NEC 2023 Table 430.250, 240 V system -> 230 V column'],
    ['ac3', 15, 600, 17, 575, 'NEC 2023 Table 430.250'],
    ['ac1', 1, 120, 16, 115, 'NEC 2023 Table 430.248'],
    ['dc', 5, 240, 20, 240, 'NEC 2023 Table 430.247'],
  ] as const)('%s %s hp at %s V -> %s A (%s column %s V)', (supply, hp, volts, amps, col, _source) => {
    const r = fullLoadCurrent({ supply, hp, volts }, '2023');
    expect(r.flcAmps).toBe(amps);
    expect(r.tableVolts).toBe(col);
    expect(r.basis).toMatch(/^NEC 2023 430\.6\(A\)\(1\), Table 430\.2(47|48|50)$/);
  });
  it('7.5 kW (10.06 hp) is within 2 % of the 10 hp row: 14 A at 460 V (NEC 2023 Table 430.250; 2 % snap is common practice)', () => {
    const r = fullLoadCurrent({ supply: 'ac3', kw: 7.5, volts: 460 }, '2023');
    expect(r.flcAmps).toBe(14);
    expect(r.assumed[0]?.field).toBe('kw');
  });
  // Deliberate change: a rating between two rows took an interpolated current before (8.10 A here);
  // it now takes the next higher row, as the horsepower case below.
  it('4 kW (5.36 hp) lies between the 5 and 7-1/2 hp rows: the next higher row, 11 A at 460 V (NEC 2023 Table 430.250)', () => {
    const r = fullLoadCurrent({ supply: 'ac3', kw: 4, volts: 460 }, '2023');
    expect(r.flcAmps).toBe(11);
    expect(r.assumed[0]?.field).toBe('kw');
    expect(r.assumed[0]?.assumed).toMatch(/7-1\/2 hp row \(11 A\), the next higher row/);
  });
  it.each([
    [12, 460, 15, 21, 'NEC 2023 Table 430.250: 15 hp, 460 V = 21 A'],
    [12, 230, 15, 42, 'NEC 2023 Table 430.250: 15 hp, 230 V = 42 A'],
    [35, 460, 40, 52, 'NEC 2023 Table 430.250: 40 hp, 460 V = 52 A'],
    [4, 575, 5, 6.1, 'NEC 2023 Table 430.250: 5 hp, 575 V = 6.1 A'],
  ])('%s hp at %s V is not a row: the next higher row (%s hp) gives %s A, never an interpolation (%s)', (hp, volts, row, amps) => {
    const r = fullLoadCurrent({ supply: 'ac3', hp, volts }, '2023');
    expect(r.flcAmps).toBe(amps);
    expect(r.source).toMatch(new RegExp(`next higher row ${row} hp for ${hp} hp$`));
    expect(r.assumed).toHaveLength(1);
    expect(r.assumed[0]).toMatchObject({ field: 'hp', assumed: `${row} hp row (${amps} A), the next higher row` });
    expect(r.assumed[0]?.note).toMatch(/not interpolated/);
  });
  it('single-phase and DC between rows take the next higher row too (NEC 2023 Tables 430.248, 430.247)', () => {
    expect(fullLoadCurrent({ supply: 'ac1', hp: 4, volts: 230 }, '2023').flcAmps).toBe(28); // Table 430.248: 5 hp, 230 V = 28 A
    expect(fullLoadCurrent({ supply: 'dc', hp: 4, volts: 240 }, '2023').flcAmps).toBe(20); // Table 430.247: 5 hp, 240 V = 20 A
  });
  it('outside the tables: error without nameplate FLA, nameplate with a caution when given', () => {
    expect(() => fullLoadCurrent({ supply: 'ac3', hp: 10, volts: 400 }, '2023')).toThrow(OutsideTableError);
    expect(() => fullLoadCurrent({ supply: 'ac3', hp: 600, volts: 460 }, '2023')).toThrow(/give the nameplate FLA/);
    const r = fullLoadCurrent({ supply: 'ac3', hp: 10, volts: 400, fla: 15.5 }, '2023');
    expect(r.flcAmps).toBe(15.5);
    expect(r.tableVolts).toBeNull();
    expect(r.cautions[0]).toMatch(/nameplate current 15.5 A/);
  });
});

describe('overload (NEC 2023 430.32(A)(1))', () => {
  it.each([
    [31, 1.15, undefined, 125, 38.75, 'SF 1.15 -> 125 %'],
    [31, 1.0, 40, 125, 38.75, 'temperature rise 40 °C -> 125 %'],
    [31, 1.0, 41, 115, 35.65, 'temperature rise over 40 °C -> 115 %'],
    [27, 1.0, undefined, 115, 31.05, 'all other motors -> 115 %'],
    [10, 1.1, undefined, 115, 11.5, 'SF 1.10 is below 1.15 -> 115 %'],
  ])('FLA %s A, SF %s, rise %s -> %s %% = %s A (%s)', (fla, sf, rise, pct, amps, _case) => {
    const r = overloadMaxSetting({ flaAmps: fla, serviceFactor: sf, tempRiseC: rise }, '2023');
    expect(r.maxPercent).toBe(pct);
    expect(r.maxSettingAmps).toBeCloseTo(amps, 6);
    expect(r.basis).toBe('NEC 2023 430.32(A)(1)');
  });
});

describe('branch short-circuit and ground-fault protection (NEC 2023 430.52, Table 430.52, Table 240.6(A))', () => {
  it.each([
    [34, 'inverse-time-breaker', 'squirrel-cage', 250, 85, 90, 'exception-1'],
    [28, 'dual-element-fuse', 'squirrel-cage', 175, 49, 50, 'exception-1'],
    [16, 'inverse-time-breaker', 'single-phase', 250, 40, 40, 'none'],
    [65, 'non-time-delay-fuse', 'wound-rotor', 150, 97.5, 100, 'exception-1'],
    [20, 'inverse-time-breaker', 'dc-constant-voltage', 150, 30, 30, 'none'],
    [14, 'non-time-delay-fuse', 'squirrel-cage', 300, 42, 45, 'exception-1'],
    [46.2, 'instantaneous-trip-breaker', 'squirrel-cage-design-b-energy-efficient', 1100, 508.2, 508.2, 'none'],
    [21, 'instantaneous-trip-breaker', 'squirrel-cage', 800, 168, 168, 'none'],
  ] as const)('FLC %s A, %s, %s: %s %% = %s A -> %s A (%s)', (flc, type, motor, pct, computed, rating, exc) => {
    const r = branchProtection({ flcAmps: flc, type, motor }, '2023');
    expect(r.maxPercent).toBe(pct);
    expect(r.computedMaxAmps).toBeCloseTo(computed, 6);
    expect(r.ratingAmps).toBe(rating);
    expect(r.exception).toBe(exc);
  });
  it('edition setting: 1.1 A x 250 % = 2.75 A -> 10 A breaker under NEC 2023, 15 A under NEC 2020 (Table 240.6(A))', () => {
    expect(branchProtection({ flcAmps: 1.1, type: 'inverse-time-breaker', motor: 'squirrel-cage' }, '2023').ratingAmps).toBe(10);
    const r2020 = branchProtection({ flcAmps: 1.1, type: 'inverse-time-breaker', motor: 'squirrel-cage' }, '2020');
    expect(r2020.ratingAmps).toBe(15);
    expect(r2020.basis).toMatch(/^NEC 2020 /);
  });
  it('Exception 2 override: 34 A x 400 % = 136 A -> 125 A (in no case exceeding), and refused above 400 %', () => {
    const r = branchProtection(
      {
        flcAmps: 34,
        type: 'inverse-time-breaker',
        motor: 'squirrel-cage',
        override: { maxPercent: 400, reason: 'high-inertia fan trips on start' },
      },
      '2023',
    );
    expect(r.ratingAmps).toBe(125);
    expect(r.exception).toBe('exception-2');
    expect(r.basis).toMatch(/430\.52\(C\)\(1\) Exception No\. 2/);
    expect(() =>
      branchProtection(
        {
          flcAmps: 34,
          type: 'inverse-time-breaker',
          motor: 'squirrel-cage',
          override: { maxPercent: 401, reason: 'too much protection headroom' },
        },
        '2023',
      ),
    ).toThrow(ValidationError);
    expect(() =>
      branchProtection(
        {
          flcAmps: 124,
          type: 'inverse-time-breaker',
          motor: 'squirrel-cage',
          override: { maxPercent: 350, reason: 'above 100 A FLC the limit is 300 %' },
        },
        '2023',
      ),
    ).toThrow(ValidationError);
  });
});

describe('conductors (NEC 2023 430.22, Table 310.16, Table 310.15(B)(1)(1), 110.14(C))', () => {
  it.each([
    [34, 'cu', 75, 30, 42.5, '8 AWG', 50, 'NEC 2023 Table 310.16: 10 AWG is 35 A, 8 AWG 50 A'],
    [28, 'cu', 75, 30, 35, '10 AWG', 35, 'boundary: 35 A needs exactly 10 AWG (35 A)'],
    [28.01, 'cu', 75, 30, 35.01, '8 AWG', 50, 'just over the boundary'],
    [16, 'cu', 75, 30, 20, '14 AWG', 20, '240.4(G): motor circuits follow Article 430, not 240.4(D)'],
    [41, 'al', 60, 30, 51.25, '4 AWG', 55, 'aluminum 60 °C: 6 AWG 40 A, 4 AWG 55 A'],
    [34, 'cu', 75, 40, 42.5, '8 AWG', 44, '40 °C ambient: 50 x 0.88 = 44 A'],
    [40, 'cu', 75, 45, 50, '6 AWG', 53.3, '45 °C ambient: 8 AWG 41 A, 6 AWG 65 x 0.82 = 53.3 A'],
    [40, 'cu', 90, 30, 50, '8 AWG', 50, '90 °C insulation held to the 75 °C column (55 -> 50 A)'],
    [40, 'cu', 90, 40, 50, '8 AWG', 50, '90 °C at 40 °C: min(55 x 0.91 = 50.05, 50) = 50 A'],
  ] as const)('FLC %s A, %s %s °C, %s °C ambient: min %s A -> %s (%s A) — %s', (flc, m, t, amb, min, size, amp, _source) => {
    const r = branchConductor({ flcAmps: flc, material: m, tempRatingC: t, ambientC: amb }, '2023');
    expect(r.minAmpacity).toBeCloseTo(min, 6);
    expect(r.size).toBe(size);
    expect(r.ampacity).toBeCloseTo(amp, 6);
  });
  it('parallel sets beyond a single conductor: 737.5 A -> 2 x 500 kcmil Cu 75 °C (2 x 380 = 760 A, NEC 2023 310.10(G))', () => {
    const r = selectConductor(737.5, { material: 'cu', tempRatingC: 75, ambientC: 30 }, '2023');
    expect(r.size).toBe('2 × 500 kcmil per phase');
    expect(r.ampacity).toBe(760);
  });
  it('drive input current governs when larger (NEC 2023 430.122(A))', () => {
    const r = branchConductor({ flcAmps: 28, material: 'cu', tempRatingC: 75, ambientC: 30, driveInputAmps: 31 }, '2023');
    expect(r.minAmpacity).toBe(38.75);
    expect(r.size).toBe('8 AWG');
    expect(r.basis).toMatch(/430\.122\(A\)/);
  });
});

describe('disconnect, locked rotor, synchronous speed, NEMA size, soft starter', () => {
  it('disconnect 115 % of FLC and motor hp (NEC 2023 430.110(A), 430.109(A))', () => {
    expect(motorDisconnect({ flcAmps: 34, hp: 25 }, '2023')).toEqual({
      minAmps: 39.1,
      minHp: 25,
      basis: 'NEC 2023 430.110(A), 430.109(A)',
    });
    expect(motorDisconnect({ flcAmps: 96, hp: 75, driveInputAmps: 100 }, '2023').minAmps).toBe(115);
  });
  it('25 hp code G at 460 V: 5.6–6.29 kVA/hp -> 175.7–197.4 A (NEC 2023 Table 430.7(B))', () => {
    const r = lockedRotorCurrent({ codeLetter: 'G', hp: 25, volts: 460, phases: 3 }, '2023');
    expect(r.min).toBe(175.7);
    expect(r.max).toBe(197.4);
  });
  it('1 hp single-phase code L at 115 V: 9.0–9.99 kVA/hp -> 78.3–86.9 A (NEC 2023 Table 430.7(B))', () => {
    const r = lockedRotorCurrent({ codeLetter: 'L', hp: 1, volts: 115, phases: 1 }, '2023');
    expect(r.min).toBe(78.3);
    expect(r.max).toBe(86.9);
  });
  it.each([
    [60, 4, 1800],
    [60, 2, 3600],
    [50, 2, 3000],
    [50, 6, 1000],
    [60, 8, 900],
  ])('%s Hz, %s poles -> %s r/min (n = 120 f / p)', (hz, p, n) => {
    expect(synchronousRpm(hz, p)).toBe(n);
  });
  it('odd poles refused', () => {
    expect(() => synchronousRpm(60, 3)).toThrow(RangeError);
  });
  it('NEMA size basis names ICS 2 and NEC 2023 430.83(A)', () => {
    const r = nemaStarterSize({ hp: 25, phases: 3, volts: 480, duty: 'normal', amps: 34 }, '2023');
    expect(r.size).toBe('2');
    expect(r.basis).toMatch(/NEMA ICS 2.*NEC 2023 430\.83\(A\)/);
  });
  it('soft starter inside the delta carries FLA/√3: 118 A -> 68.13 A (common practice)', () => {
    expect(softStarterMinAmps(118, true).minAmps).toBe(68.13);
    expect(softStarterMinAmps(118, false).minAmps).toBe(118);
  });
});

describe('feeder roll-up (NEC 2023 430.24, 430.62(A))', () => {
  it('25 + 10 + 5 hp at 460 V: 1.25 x 34 + 14 + 7.6 = 64.1 A -> 6 AWG Cu 75 °C; 90 + 21.6 = 111.6 A -> 110 A', () => {
    const r = feederRollup(
      {
        branches: [
          { tag: 'A', flcAmps: 34, branchDeviceAmps: 90 },
          { tag: 'B', flcAmps: 14, branchDeviceAmps: 35 },
          { tag: 'C', flcAmps: 7.6, branchDeviceAmps: 20 },
        ],
        material: 'cu',
        tempRatingC: 75,
        ambientC: 30,
        ocpdFamily: 'breaker',
      },
      '2023',
    );
    expect(r.feeder.minAmpacity).toBe(64.1);
    expect(r.feeder.conductorSize).toBe('6 AWG');
    expect(r.feeder.ocpdMaxAmps).toBe(110);
    expect(r.totalFlcAmps).toBe(55.6);
    expect(r.largestMotorTag).toBe('A');
    expect(r.feeder.basis).toMatch(/NEC 2023 430\.24, 430\.62\(A\)/);
  });
  it('the largest device need not belong to the largest motor (430.62(A)): wound-rotor 150 % vs cage 250 %', () => {
    const r = feederRollup(
      {
        branches: [
          { tag: 'WR', flcAmps: 40, branchDeviceAmps: 60 },
          { tag: 'SC', flcAmps: 34, branchDeviceAmps: 90 },
        ],
        material: 'cu',
        tempRatingC: 75,
        ambientC: 30,
        ocpdFamily: 'breaker',
      },
      '2023',
    );
    expect(r.feeder.minAmpacity).toBe(84); // 1.25 x 40 + 34
    expect(r.feeder.ocpdMaxAmps).toBe(125); // 90 + 40 = 130 -> 125
    expect(r.largestMotorTag).toBe('WR');
  });
});
