// Published-table checks. Expected values are taken from the NEC 2023 tables named beside each
// case (transcribed from memory of the published tables unless noted), NEMA ICS 2 and NEMA 250.
import { describe, expect, it } from 'vitest';
import { OutsideTableError } from '../../../shared/errors';
import { column430250, threePhaseFlc } from '../../../shared/standards/nec-table-430-250';
import { column430248, singlePhaseFlc } from '../../../shared/standards/nec-table-430-248';
import { column430247, dcFlc } from '../../../shared/standards/nec-table-430-247';
import { lockedRotorKvaPerHp } from '../../../shared/standards/nec-table-430-7b';
import { exception2LimitPercent, maxPercent430_52 } from '../../../shared/standards/nec-table-430-52';
import { nextHigherStandard, nextLowerStandard, standardRatings } from '../../../shared/standards/nec-table-240-6a';
import { ampacity310_16, sizesFor, smallConductorOcpdLimit } from '../../../shared/standards/nec-table-310-16';
import { ambientCorrectionFactor } from '../../../shared/standards/nec-table-310-15-b-1';
import { nemaColumn, nemaSizeFor } from '../../../shared/standards/nema-ics-2-starter-sizes';
import { enclosureType } from '../../../shared/standards/nema-250-enclosure-types';
import { disconnectMinAmps } from '../../../shared/standards/nec-430-110-disconnect';

describe('NEC 2023 Table 430.250 (three-phase FLC)', () => {
  it.each([
    // [hp, table column V, amps, source]
    [0.5, 115, 4.4, 'NEC 2023 Table 430.250, first row'],
    [0.5, 460, 1.1, 'NEC 2023 Table 430.250'],
    [2, 115, 13.6, 'NEC 2023 Table 430.250, last row of the 115 V column'],
    [5, 208, 16.7, 'NEC 2023 Table 430.250'],
    [10, 230, 28, 'NEC 2023 Table 430.250'],
    [25, 460, 34, 'NEC 2023 Table 430.250'],
    [25, 200, 78.2, 'NEC 2023 Table 430.250'],
    [40, 575, 41, 'NEC 2023 Table 430.250'],
    [100, 460, 124, 'NEC 2023 Table 430.250'],
    [200, 200, 552, 'NEC 2023 Table 430.250, last row of the 200 V column'],
    [200, 230, 480, 'NEC 2023 Table 430.250'],
    [60, 2300, 16, 'NEC 2023 Table 430.250, first row of the 2300 V column'],
    [500, 460, 590, 'NEC 2023 Table 430.250, last row'],
    [500, 575, 472, 'NEC 2023 Table 430.250'],
  ] as const)('%s hp at %s V = %s A (%s)', (hp, col, amps, _source) => {
    expect(threePhaseFlc(hp, col)).toBe(amps);
  });

  it.each([
    [3, 115, 'NEC 2023 Table 430.250: 115 V column stops at 2 hp'],
    [250, 230, 'NEC 2023 Table 430.250: 230 V column stops at 200 hp'],
    [50, 2300, 'NEC 2023 Table 430.250: 2300 V column starts at 60 hp'],
    [600, 460, 'NEC 2023 Table 430.250: last row is 500 hp'],
    [0.25, 460, 'NEC 2023 Table 430.250: first row is 1/2 hp'],
  ] as const)('refuses %s hp at %s V (%s)', (hp, col, _source) => {
    expect(() => threePhaseFlc(hp, col)).toThrow(OutsideTableError);
  });

  it.each([
    [110, 115],
    [120, 115],
    [200, 200],
    [208, 208],
    [220, 230],
    [240, 230],
    [440, 460],
    [480, 460],
    [550, 575],
    [600, 575],
  ] as const)('system %s V maps to the %s V column (NEC 2023 Table 430.250 heading)', (v, col) => {
    expect(column430250(v)).toBe(col);
  });

  it.each([109, 121, 210, 241, 380, 400, 415, 439, 481, 549, 601])('refuses %s V (between the table ranges)', (v) => {
    expect(() => column430250(v)).toThrow(OutsideTableError);
  });
});

describe('NEC 2023 Table 430.248 (single-phase FLC)', () => {
  it.each([
    [1 / 6, 115, 4.4, 'NEC 2023 Table 430.248, first row'],
    [1 / 3, 230, 3.6, 'NEC 2023 Table 430.248'],
    [1, 115, 16, 'NEC 2023 Table 430.248'],
    [1, 208, 8.8, 'NEC 2023 Table 430.248'],
    [5, 230, 28, 'NEC 2023 Table 430.248'],
    [10, 115, 100, 'NEC 2023 Table 430.248, last row'],
    [10, 200, 57.5, 'NEC 2023 Table 430.248'],
  ] as const)('%s hp at %s V = %s A (%s)', (hp, col, amps, _source) => {
    expect(singlePhaseFlc(hp, col)).toBe(amps);
  });
  it('refuses 15 hp (beyond the last row) and 460 V (no column) — NEC 2023 Table 430.248', () => {
    expect(() => singlePhaseFlc(15, 230)).toThrow(OutsideTableError);
    expect(() => column430248(460)).toThrow(OutsideTableError);
    expect(column430248(240)).toBe(230);
  });
});

describe('NEC 2023 Table 430.247 (DC FLC)', () => {
  it.each([
    [0.25, 90, 4.0, 'NEC 2023 Table 430.247, first row'],
    [1, 90, 12.2, 'NEC 2023 Table 430.247, last row of the 90 V column'],
    [5, 240, 20, 'NEC 2023 Table 430.247'],
    [10, 120, 76, 'NEC 2023 Table 430.247, last row of the 120 V column'],
    [10, 240, 38, 'NEC 2023 Table 430.247'],
    [7.5, 500, 13.6, 'NEC 2023 Table 430.247, first row of the 500 V column'],
    [200, 240, 675, 'NEC 2023 Table 430.247, last row'],
    [200, 550, 294, 'NEC 2023 Table 430.247'],
  ] as const)('%s hp at %s V = %s A (%s)', (hp, col, amps, _source) => {
    expect(dcFlc(hp, col)).toBe(amps);
  });
  it('refuses 1-1/2 hp at 90 V, 5 hp at 500 V and a 250 V armature — NEC 2023 Table 430.247', () => {
    expect(() => dcFlc(1.5, 90)).toThrow(OutsideTableError);
    expect(() => dcFlc(5, 500)).toThrow(OutsideTableError);
    expect(() => column430247(250)).toThrow(OutsideTableError);
  });
});

describe('NEC 2023 Table 430.7(B) (code letters)', () => {
  it.each([
    ['A', 0, 3.14],
    ['B', 3.15, 3.54],
    ['F', 5.0, 5.59],
    ['G', 5.6, 6.29],
    ['H', 6.3, 7.09],
    ['J', 7.1, 7.99],
    ['L', 9.0, 9.99],
    ['P', 12.5, 13.99],
    ['U', 20.0, 22.39],
  ] as const)('letter %s = %s–%s kVA/hp (NEC 2023 Table 430.7(B))', (l, min, max) => {
    expect(lockedRotorKvaPerHp(l)).toEqual({ min, max });
  });
  it('letter V is open-ended at 22.4 kVA/hp; I, O and Q are not letters (NEC 2023 Table 430.7(B))', () => {
    expect(lockedRotorKvaPerHp('V')).toEqual({ min: 22.4, max: null });
    for (const bad of ['I', 'O', 'Q', 'W']) expect(() => lockedRotorKvaPerHp(bad)).toThrow(OutsideTableError);
  });
});

describe('NEC 2023 Table 430.52 (branch protection, % of FLC)', () => {
  it.each([
    ['single-phase', 300, 175, 800, 250],
    ['squirrel-cage', 300, 175, 800, 250],
    ['squirrel-cage-design-b-energy-efficient', 300, 175, 1100, 250],
    ['wound-rotor', 150, 150, 800, 150],
    ['dc-constant-voltage', 150, 150, 250, 150],
  ] as const)('%s: NTD %s, dual-element %s, instantaneous %s, inverse-time %s (NEC 2023 Table 430.52)', (motor, ntd, de, inst, itb) => {
    expect(maxPercent430_52(motor, 'non-time-delay-fuse')).toBe(ntd);
    expect(maxPercent430_52(motor, 'dual-element-fuse')).toBe(de);
    expect(maxPercent430_52(motor, 'instantaneous-trip-breaker')).toBe(inst);
    expect(maxPercent430_52(motor, 'inverse-time-breaker')).toBe(itb);
  });
  it.each([
    ['non-time-delay-fuse', 50, 400, 'NEC 2023 430.52(C)(1) Exc. 2(a)'],
    ['dual-element-fuse', 50, 225, 'NEC 2023 430.52(C)(1) Exc. 2(b)'],
    ['inverse-time-breaker', 100, 400, 'NEC 2023 430.52(C)(1) Exc. 2(c), FLC 100 A or less'],
    ['inverse-time-breaker', 100.1, 300, 'NEC 2023 430.52(C)(1) Exc. 2(c), FLC over 100 A'],
    ['instantaneous-trip-breaker', 50, 1300, 'NEC 2023 430.52(C)(3) Exc. 1'],
  ] as const)('Exception 2 limit for %s at %s A FLC = %s %% (%s)', (device, flc, pct, _source) => {
    expect(exception2LimitPercent('squirrel-cage', device, flc)).toBe(pct);
  });
  it('Exception limit for Design B energy-efficient instantaneous trip is 1700 % (NEC 2023 430.52(C)(3) Exc. 1)', () => {
    expect(exception2LimitPercent('squirrel-cage-design-b-energy-efficient', 'instantaneous-trip-breaker', 20)).toBe(1700);
  });
});

describe('NEC Table 240.6(A) (standard ratings)', () => {
  it('NEC 2023 lists 10 A for breakers and fuses; NEC 2020 lists 10 A only as an added fuse rating', () => {
    expect(standardRatings('2023', 'breaker')[0]).toBe(10);
    expect(standardRatings('2020', 'breaker')[0]).toBe(15);
    expect(standardRatings('2020', 'fuse').slice(0, 5)).toEqual([1, 3, 6, 10, 15]);
    expect(standardRatings('2023', 'fuse').slice(0, 5)).toEqual([1, 3, 6, 10, 15]);
    expect(standardRatings('2023', 'fuse')).toContain(601);
    expect(standardRatings('2023', 'breaker')).not.toContain(601);
  });
  it.each([
    [85, 90],
    [90, 90],
    [90.01, 100],
    [100.5, 110],
    [111, 125],
    [126, 150],
    [451, 500],
    [501, 600],
    [801, 1000],
    [5001, 6000],
  ])('next higher standard of %s A is %s A (NEC 2023 Table 240.6(A))', (a, r) => {
    expect(nextHigherStandard(a, '2023', 'breaker')).toBe(r);
  });
  it.each([
    [111.6, 110],
    [110, 110],
    [512, 500],
    [9.9, null],
    [6500, 6000],
  ])('next lower standard breaker rating of %s A is %s A (NEC 2023 Table 240.6(A))', (a, r) => {
    if (r === null) expect(() => nextLowerStandard(a, '2023', 'breaker')).toThrow(OutsideTableError);
    else expect(nextLowerStandard(a, '2023', 'breaker')).toBe(r);
  });
  it('refuses above 6000 A and gives 2.75 A -> 10 A (2023) / 15 A (2020) for breakers, 3 A for fuses', () => {
    expect(() => nextHigherStandard(6001, '2023', 'fuse')).toThrow(OutsideTableError);
    expect(nextHigherStandard(2.75, '2023', 'breaker')).toBe(10);
    expect(nextHigherStandard(2.75, '2020', 'breaker')).toBe(15);
    expect(nextHigherStandard(2.75, '2023', 'fuse')).toBe(3);
    expect(nextHigherStandard(600.5, '2023', 'fuse')).toBe(601);
  });
});

describe('NEC 2023 Table 310.16 (ampacity) and 240.4(D)', () => {
  it.each([
    ['14 AWG', 'cu', 60, 15],
    ['14 AWG', 'cu', 75, 20],
    ['14 AWG', 'cu', 90, 25],
    ['12 AWG', 'cu', 75, 25],
    ['10 AWG', 'cu', 75, 35],
    ['8 AWG', 'cu', 75, 50],
    ['6 AWG', 'cu', 75, 65],
    ['4 AWG', 'cu', 75, 85],
    ['1/0 AWG', 'cu', 75, 150],
    ['4/0 AWG', 'cu', 75, 230],
    ['250 kcmil', 'cu', 75, 255],
    ['350 kcmil', 'cu', 90, 350],
    ['500 kcmil', 'cu', 75, 380],
    ['1000 kcmil', 'cu', 90, 615],
    ['12 AWG', 'al', 75, 20],
    ['8 AWG', 'al', 75, 40],
    ['2 AWG', 'al', 75, 90],
    ['4/0 AWG', 'al', 75, 180],
    ['500 kcmil', 'al', 75, 310],
    ['1000 kcmil', 'al', 60, 375],
  ] as const)('%s %s %s °C = %s A (NEC 2023 Table 310.16)', (size, m, t, a) => {
    expect(ampacity310_16(size, m, t)).toBe(a);
  });
  it('aluminum starts at 12 AWG; 1250 kcmil and 18 AWG are outside the carried range', () => {
    expect(() => ampacity310_16('14 AWG', 'al', 75)).toThrow(OutsideTableError);
    expect(() => ampacity310_16('1250 kcmil', 'cu', 75)).toThrow(OutsideTableError);
    expect(sizesFor('cu')[0]).toBe('14 AWG');
    expect(sizesFor('al')[0]).toBe('12 AWG');
    expect(sizesFor('cu').at(-1)).toBe('1000 kcmil');
  });
  it.each([
    ['14 AWG', 'cu', 15],
    ['12 AWG', 'cu', 20],
    ['10 AWG', 'cu', 30],
    ['12 AWG', 'al', 15],
    ['10 AWG', 'al', 25],
    ['8 AWG', 'cu', null],
  ] as const)('240.4(D) limit for %s %s is %s A (NEC 2023 240.4(D))', (size, m, a) => {
    expect(smallConductorOcpdLimit(size, m)).toBe(a);
  });
});

describe('NEC 2023 Table 310.15(B)(1)(1) (ambient correction)', () => {
  it.each([
    [30, 75, 1.0],
    [26, 75, 1.0],
    [31, 75, 0.94],
    [35, 90, 0.96],
    [40, 75, 0.88],
    [40, 90, 0.91],
    [45, 60, 0.71],
    [50, 75, 0.75],
    [10, 60, 1.29],
    [85, 90, 0.29],
  ] as const)('%s °C ambient, %s °C conductor: %s (NEC 2023 Table 310.15(B)(1)(1))', (amb, t, f) => {
    expect(ambientCorrectionFactor(amb, t)).toBe(f);
  });
  it('no factor for 60 °C conductors above 55 °C, nor for any above 85 °C', () => {
    expect(() => ambientCorrectionFactor(56, 60)).toThrow(OutsideTableError);
    expect(() => ambientCorrectionFactor(86, 90)).toThrow(OutsideTableError);
  });
});

describe('NEMA ICS 2 starter sizes (from memory)', () => {
  it.each([
    [2, '3ph-460-575', 'normal', 2, '00'],
    [2.01, '3ph-460-575', 'normal', 3, '0'],
    [5, '3ph-460-575', 'normal', 7.6, '0'],
    [10, '3ph-460-575', 'normal', 14, '1'],
    [25, '3ph-460-575', 'normal', 34, '2'],
    [30, '3ph-460-575', 'normal', 40, '3'],
    [7.5, '3ph-230', 'normal', 22, '1'],
    [10, '3ph-230', 'normal', 28, '2'],
    [10, '3ph-200', 'normal', 32.2, '2'],
    [15, '3ph-200', 'normal', 48.3, '3'],
    [100, '3ph-460-575', 'normal', 124, '4'],
    [1600, '3ph-460-575', 'normal', 1000, '9'],
    [5, '3ph-460-575', 'plugging-jogging', 7.6, '1'],
    [7.5, '3ph-460-575', 'plugging-jogging', 11, '2'],
    [300, '3ph-460-575', 'plugging-jogging', 361, '6'],
    [1, '1ph-115', 'normal', 16, '0'],
    [3, '1ph-115', 'normal', 34, '1P'],
    [3, '1ph-230', 'normal', 17, '1'],
  ] as const)('%s hp at %s, %s duty, %s A -> size %s (NEMA ICS 2)', (hp, col, duty, amps, size) => {
    expect(nemaSizeFor(hp, col, duty, amps).size).toBe(size);
  });
  it('size 00 is not rated for plugging/jogging; beyond size 9 and plugging beyond size 6 refused', () => {
    expect(nemaSizeFor(1, '3ph-460-575', 'plugging-jogging', 2.1).size).toBe('0');
    expect(() => nemaSizeFor(1601, '3ph-460-575', 'normal', 1000)).toThrow(OutsideTableError);
    expect(() => nemaSizeFor(301, '3ph-460-575', 'plugging-jogging', 400)).toThrow(OutsideTableError);
  });
  it('continuous current can push the size up: 2 hp at 460 V drawing 10 A needs size 0 (size 00 is 9 A)', () => {
    expect(nemaSizeFor(2, '3ph-460-575', 'normal', 10).size).toBe('0');
  });
  it('maps voltages to columns and refuses 115 V three-phase and 380 V', () => {
    expect(nemaColumn(3, 208)).toBe('3ph-200');
    expect(nemaColumn(3, 480)).toBe('3ph-460-575');
    expect(nemaColumn(3, 600)).toBe('3ph-460-575');
    expect(nemaColumn(1, 120)).toBe('1ph-115');
    expect(() => nemaColumn(3, 115)).toThrow(OutsideTableError);
    expect(() => nemaColumn(3, 380)).toThrow(OutsideTableError);
  });
});

describe('NEMA 250 types with approximate IP codes (from memory of the NEMA comparison)', () => {
  it.each([
    ['1', 'IP10'],
    ['3R', 'IP14'],
    ['4', 'IP66'],
    ['4X', 'IP66'],
    ['12', 'IP52'],
    ['6P', 'IP68'],
    ['13', 'IP54'],
  ] as const)('Type %s ~ %s', (t, ip) => {
    expect(enclosureType(t).ipCode).toBe(ip);
  });
  it('Types 7 and 9 carry no IP equivalent; unknown types are refused', () => {
    expect(enclosureType('7').ipCode).toMatch(/none/);
    expect(enclosureType('9').ipCode).toMatch(/none/);
    expect(() => enclosureType('4XX')).toThrow(OutsideTableError);
  });
});

describe('NEC 2023 430.110(A) disconnect', () => {
  it('115 % of FLC: 34 A -> 39.1 A', () => {
    expect(disconnectMinAmps(34)).toBeCloseTo(39.1, 6);
  });
  it('refuses a non-positive current', () => {
    expect(() => disconnectMinAmps(0)).toThrow(OutsideTableError);
  });
});
