// Several motors on one branch circuit (NEC 430.53), through the engine's panel roll-up.
// Full-load currents from NEC 2023 Table 430.250 (460 V): 3/4 hp 1.6 A, 1 hp 2.1 A, 5 hp 7.6 A,
// 10 hp 14 A, 30 hp 40 A. Inverse-time breaker 250 % of FLC (Table 430.52), next higher standard
// rating (430.52(C)(1) Exc. 1, Table 240.6(A), NEC 2023 starting at 10 A). Conductors copper 75 °C,
// Table 310.16: 14 AWG 20 A, 12 AWG 25 A, 10 AWG 35 A, 6 AWG 65 A. Hand-worked values beside each case.
import { describe, expect, it } from 'vitest';
import type { LoadInput } from '../../../shared/schemas/load';
import { motor, selector, selector2020, supply480 } from './selector-setup';

const m = (tag: string, hp: number, over: Partial<LoadInput> = {}) => motor({ tag, hp, branchGroup: 'G-1', ...over });
const panel = async (loads: LoadInput[], s = selector) => (await s.selectPanel({ supply: supply480, loads })).panel;

describe('430.53 paths, the group device and conductor', () => {
  const cases: Array<{
    name: string;
    loads: LoadInput[];
    path: 'A' | 'B' | 'C';
    device: number;
    conductor: { minAmpacity: number; size: string };
    taps: Array<[string, 'D(1)' | 'D(2)', string]>;
    feederOcpd: number;
    source: string;
  }> = [
    {
      // (A): each ≤ 1 hp and ≤ 6 A, 460 V ≤ 1000 V: not over 15 A; running 3 × 1.6 = 4.8 A; 430.24 1.25 × 1.6 + 3.2 = 5.2 A
      name: 'three 3/4 hp fans',
      loads: [m('F-1', 0.75), m('F-2', 0.75), m('F-3', 0.75)],
      path: 'A',
      device: 15,
      conductor: { minAmpacity: 5.2, size: '14 AWG' },
      taps: [
        ['F-1', 'D(1)', '14 AWG'],
        ['F-2', 'D(1)', '14 AWG'],
        ['F-3', 'D(1)', '14 AWG'],
      ],
      feederOcpd: 15, // 430.62(A): 15 A group device + 0 A of motors on other devices
      source: 'NEC 2023 430.53(A), 240.6(A); hand-worked',
    },
    {
      // (B): smallest motor 5 hp: 7.6 × 2.5 = 19 → 20 A; running 15.2 A ≤ 20 A; 430.24 9.5 + 7.6 = 17.1 A
      name: 'two 5 hp conveyors',
      loads: [m('C-1', 5), m('C-2', 5)],
      path: 'B',
      device: 20,
      conductor: { minAmpacity: 17.1, size: '14 AWG' },
      taps: [
        ['C-1', 'D(1)', '14 AWG'],
        ['C-2', 'D(1)', '14 AWG'],
      ],
      feederOcpd: 20,
      source: 'NEC 2023 430.53(B), Table 430.52, 240.6(A); hand-worked',
    },
    {
      // (C): B gives 20 A < 29.2 A running; (C)(4) 35 A (10 hp: 14 × 2.5) + 7.6 + 7.6 = 50.2 → next lower 50 A, under the 60 A listing;
      // 430.24 17.5 + 15.2 = 32.7 A → 10 AWG 35 A; taps 14 AWG (20 A) < 35 A but ≥ 35/3 = 11.67 A → (D)(2)
      name: '10 hp and two 5 hp, listed for group installation at 60 A',
      loads: [m('M-1', 10, { groupListedMaxAmps: 60 }), m('M-2', 5, { groupListedMaxAmps: 60 }), m('M-3', 5, { groupListedMaxAmps: 60 })],
      path: 'C',
      device: 50,
      conductor: { minAmpacity: 32.7, size: '10 AWG' },
      taps: [
        ['M-1', 'D(2)', '14 AWG'],
        ['M-2', 'D(2)', '14 AWG'],
        ['M-3', 'D(2)', '14 AWG'],
      ],
      feederOcpd: 50, // the group device counts once: 50 A + 0 A (not 50 + 15.2 → 60 A)
      source: 'NEC 2023 430.53(C)(1), (2), (4), 430.53(D)(2), 430.62(A); hand-worked',
    },
    {
      // (C): 30 hp 40 × 2.5 = 100 A; + 2.1 A = 102.1 → 100 A (listed 125 A); 430.24 50 + 2.1 = 52.1 A → 6 AWG 65 A;
      // one-third 21.67 A is above the 1 hp motor's own 14 AWG (20 A) → its tap is 12 AWG (25 A)
      name: '30 hp with a 1 hp motor: the small tap grows to one-third',
      loads: [m('P-1', 30, { groupListedMaxAmps: 125 }), m('P-2', 1, { groupListedMaxAmps: 125 })],
      path: 'C',
      device: 100,
      conductor: { minAmpacity: 52.1, size: '6 AWG' },
      taps: [
        ['P-1', 'D(2)', '8 AWG'],
        ['P-2', 'D(2)', '12 AWG'],
      ],
      feederOcpd: 100,
      source: 'NEC 2023 430.53(C)(4), 430.53(D)(2), Table 310.16; hand-worked',
    },
  ];

  it.each(cases)('$name: 430.53($path), $device A ($source)', async (c) => {
    const p = await panel(c.loads);
    const g = p.groups?.[0];
    expect(g?.refusal).toBeNull();
    expect(g?.path).toBe(c.path);
    expect(g?.device).toMatchObject({ type: 'inverse-time-breaker', ratingAmps: c.device });
    expect(g?.device?.basis).toContain(`430.53(${c.path})`);
    expect(g?.conductor).toMatchObject(c.conductor);
    expect(g?.taps.map((t) => [t.tag, t.rule, t.size])).toEqual(c.taps);
    expect(g?.overloads.map((o) => o.tag)).toEqual(c.loads.map((l) => l.tag));
    expect(p.feeder.ocpdMaxAmps).toBe(c.feederOcpd);
  });

  it('the 10 hp motor conductor: 17.5 A → 14 AWG on its own (430.22), 30 hp 50 A → 8 AWG (50 A) on its own', async () => {
    const p = await panel(cases[3]!.loads);
    // Table 310.16 copper 75 °C: 8 AWG 50 A ≥ 50 A (430.22: 1.25 × 40); the 65 A group conductor / 3 = 21.67 A < 50 A
    expect(p.groups?.[0]?.taps[0]).toMatchObject({ ownSize: '8 AWG', minAmpacity: 50 });
  });
});

describe('430.53 refusals', () => {
  const cases: Array<{ name: string; loads: LoadInput[]; says: RegExp[]; source: string }> = [
    {
      // B: 20 A < 29.2 A; C without listing: each unlisted motor keeps its own 430.52 value, 20 A < 29.2 A
      name: 'three motors too big for (A), (B) short, not listed for group installation',
      loads: [m('M-1', 10), m('M-2', 5), m('M-3', 5)],
      says: [/over 1 hp/, /\(B\) 20 A is below the 29.2 A/, /not listed for group installation/],
      source: 'NEC 2023 430.53(A), (B), (C)(1), (2)',
    },
    {
      name: 'an instantaneous-trip breaker',
      loads: [m('M-1', 1, { scpdType: 'instantaneous-trip-breaker' }), m('M-2', 1, { scpdType: 'instantaneous-trip-breaker' })],
      says: [/fuses or an inverse-time breaker/],
      source: 'NEC 2023 430.53 (fuses or inverse time circuit breakers)',
    },
    {
      name: 'a group of one motor',
      loads: [m('M-1', 1), motor({ tag: 'M-2', hp: 1 })],
      says: [/two or more motors/],
      source: 'NEC 2023 430.53',
    },
  ];

  it.each(cases)('$name ($source)', async (c) => {
    const p = await panel(c.loads);
    const g = p.groups?.[0];
    expect(g?.path).toBeNull();
    expect(g?.device).toBeNull();
    for (const re of c.says) expect(g?.refusal).toMatch(re);
    // the refusal is a roll-up error too: the motors page lists it and the CLI exits 3
    expect(p.errors?.some((e) => e.startsWith('group G-1') && e.includes(g?.refusal ?? '—'))).toBe(true);
  });

  it('a refused group leaves each motor on its own device for the feeder (430.62(A))', async () => {
    const p = await panel(cases[0]!.loads);
    // own devices 35, 20, 20 A: 35 + 7.6 + 7.6 = 50.2 → 50 A (hand-worked, NEC 2023 430.62(A))
    expect(p.feeder.ocpdMaxAmps).toBe(50);
    expect(p.notes?.some((n) => n.includes("group G-1's"))).toBe(false);
  });
});

describe('430.53(A) limits by voltage and edition', () => {
  it.each([
    // 1/2 hp 115 V single-phase: Table 430.248 9.8 A → over 6 A, (A) fails; (B) 9.8 × 2.5 = 24.5 → 25 A ≥ 19.6 A
    { supply: 'ac1' as const, volts: 115, hp: 0.5, path: 'B', device: 25, source: 'NEC 2023 Table 430.248, 430.53(A)(1), (B)' },
    // 1/6 hp 115 V: 4.4 A ≤ 6 A; nominal 120 V circuit: not over 20 A; running 8.8 A
    { supply: 'ac1' as const, volts: 115, hp: 1 / 6, path: 'A', device: 20, source: 'NEC 2023 Table 430.248, 430.53(A)' },
    // 1/3 hp 90 V DC: Table 430.247 5.2 A ≤ 6 A, but not a nominal 120 V AC circuit: not over 15 A; running 10.4 A
    { supply: 'dc' as const, volts: 90, hp: 1 / 3, path: 'A', device: 15, source: 'NEC 2023 Table 430.247 (from memory), 430.53(A)' },
  ])('$hp hp at $volts V: 430.53($path) $device A ($source)', async (c) => {
    const loads = [m('F-1', c.hp, { supply: c.supply, volts: c.volts }), m('F-2', c.hp, { supply: c.supply, volts: c.volts })];
    const out = await selector.selectPanel({
      supply: { ...supply480, volts: c.supply === 'dc' ? 480 : 120, phases: c.supply === 'dc' ? 3 : 1 },
      loads,
    });
    const g = out.panel.groups?.[0];
    expect(g?.path).toBe(c.path);
    expect(g?.device?.ratingAmps).toBe(c.device);
  });

  it('NEC 2020 states the (A) limit up to 600 V (from memory of the 2020 text)', async () => {
    const p = await panel([m('F-1', 0.75), m('F-2', 0.75)], selector2020);
    const a = p.groups?.[0]?.paths.find((x) => x.path === 'A');
    expect(a?.conditions).toContain('15 A up to 600 V');
    // NEC 2020 Table 240.6(A) starts at 15 A: the 15 A limit is itself a standard rating
    expect(a?.ratingAmps).toBe(15);
  });
});
