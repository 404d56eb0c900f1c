import { describe, expect, it } from 'vitest';
import { assumedSccr, findCombination, raiseByCurrentLimitingFeeder } from '../../../shared/standards/ul508a-sb4';
import {
  calculatePanelSccr,
  sccrTypeForCatalogueCategory,
  type SccrBucketInput,
  type SccrComponentInput,
  type SccrInput,
} from '../../../shared/calc/sccr';

// Assumed ratings: UL 508A Table SB4.1 (from memory) — motor controllers by hp, terminal and distribution blocks,
// supplementary protectors, circuit breakers.
describe('UL 508A Table SB4.1 assumed ratings (from memory)', () => {
  const hpCases: Array<[number, number]> = [
    [0.5, 5],
    [50, 5], // 0–50 hp: 5 kA
    [51, 10],
    [200, 10], // 51–200 hp: 10 kA
    [201, 18],
    [400, 18], // 201–400 hp: 18 kA
    [401, 30],
    [600, 30], // 401–600 hp: 30 kA
    [601, 42],
    [900, 42], // 601–900 hp: 42 kA
    [901, 85],
    [1500, 85], // 901–1500 hp: 85 kA
  ];
  it.each(hpCases)('motor controller %s hp -> %s kA', (hp, ka) => {
    expect(assumedSccr('contactor', hp)?.ka).toBe(ka);
    expect(assumedSccr('overload-relay', hp)?.ka).toBe(ka);
  });
  it('refuses horsepower outside the table and a missing horsepower', () => {
    expect(() => assumedSccr('contactor', 1501)).toThrow(RangeError);
    expect(() => assumedSccr('motor-controller', null)).toThrow(RangeError);
  });
  it.each([
    ['terminal-block', 10],
    ['power-distribution-block', 10],
    ['fuse-holder', 10],
    ['bus-bar', 10],
    ['circuit-breaker', 5],
    ['supplementary-protector', 0.2],
    ['disconnect-switch', 5],
  ] as const)('%s -> %s kA', (type, ka) => {
    const a = assumedSccr(type);
    expect(a?.ka).toBe(ka);
    expect(a?.basis).toContain('UL 508A Table SB4.1');
  });
  it('gives no assumed value for an unknown type', () => {
    expect(assumedSccr('other')).toBeNull();
  });
});

const tb = (code = 'TB-1'): SccrComponentInput => ({ code, category: 'terminal-block', description: 'feed-through terminal' });
const contactor = (code = 'C-09', extra: Partial<SccrComponentInput> = {}): SccrComponentInput => ({
  code,
  category: 'contactor',
  description: 'contactor 3-pole',
  ...extra,
});
const ol = (code = 'OL-1', extra: Partial<SccrComponentInput> = {}): SccrComponentInput => ({
  code,
  category: 'overload-relay',
  description: 'bimetal overload relay',
  ...extra,
});

describe('panel SCCR, weakest link (UL 508A SB4)', () => {
  it('all unmarked: every rating assumed and cited; 10 hp and 75 hp controllers', () => {
    const input: SccrInput = {
      feeder: [{ code: 'PDB-1', category: 'power-distribution-block', description: 'distribution block' }],
      buckets: [
        { tag: 'P-101', hp: 10, components: [contactor(), ol(), tb()] },
        { tag: 'P-102', hp: 75, components: [contactor('C-65'), ol('OL-65'), tb('TB-2')] },
      ],
      availableFaultKa: 10,
    };
    const r = calculatePanelSccr(input);
    const byCode = Object.fromEntries(r.rows.map((x) => [`${x.location}/${x.code}`, x]));
    expect(byCode['feeder/PDB-1'].ratingKa).toBe(10); // SB4.1 power distribution block 10 kA
    expect(byCode['P-101/C-09'].ratingKa).toBe(5); // SB4.1 motor controller 0–50 hp 5 kA
    expect(byCode['P-101/OL-1'].ratingKa).toBe(5); // SB4.1 0–50 hp 5 kA
    expect(byCode['P-101/TB-1'].ratingKa).toBe(10); // SB4.1 terminal block 10 kA
    expect(byCode['P-102/C-65'].ratingKa).toBe(10); // SB4.1 51–200 hp 10 kA
    expect(r.rows.every((x) => x.source === 'assumed')).toBe(true);
    expect(r.rows.every((x) => x.basis.includes('UL 508A Table SB4.1'))).toBe(true);
    expect(r.panelSccrKa).toBe(5);
    expect(r.limiting.map((x) => x.code).sort()).toEqual(['C-09', 'OL-1']);
    expect(r.verdict).toBe('below-available'); // 5 kA < 10 kA, NEC 409.22
  });

  it('one weak component limits the panel', () => {
    const r = calculatePanelSccr({
      feeder: [{ code: 'PDB-1', category: 'power-distribution-block', description: 'block', sccrKa: 100 }],
      buckets: [
        {
          tag: 'P-101',
          hp: 10,
          components: [
            { code: 'CB-25', category: 'circuit-breaker', description: 'breaker', sccrKa: 65 },
            contactor('C-09', { sccrKa: 65 }),
            ol('OL-1', { sccrKa: 65 }),
            { code: 'SP-1', category: 'supplementary-protector', description: 'supplementary protector' },
          ],
        },
      ],
      availableFaultKa: 22,
    });
    expect(r.panelSccrKa).toBe(0.2); // SB4.1 supplementary protector 0.2 kA (from memory)
    expect(r.limiting).toHaveLength(1);
    expect(r.limiting[0].code).toBe('SP-1');
    expect(r.rows.filter((x) => x.source === 'marked')).toHaveLength(4);
    expect(r.verdict).toBe('below-available');
  });

  it('a tested combination rating raises the bucket', () => {
    const bucket: SccrBucketInput = {
      tag: 'P-101',
      hp: 10,
      volts: 480,
      components: [{ code: 'CB-25', category: 'circuit-breaker', description: 'breaker', sccrKa: 65 }, contactor('C-09'), ol('OL-1')],
    };
    const combo = { id: 'TC-7', componentCodes: ['CB-25', 'C-09', 'OL-1'], ratingKa: 65, maxVolts: 480, source: 'maker combination table' };
    const without = calculatePanelSccr({ feeder: [], buckets: [bucket], availableFaultKa: 42 });
    expect(without.panelSccrKa).toBe(5);
    const withCombo = calculatePanelSccr({ feeder: [], buckets: [bucket], combinations: [combo], availableFaultKa: 42 });
    expect(withCombo.panelSccrKa).toBe(65);
    expect(withCombo.rows.every((x) => x.source === 'combination')).toBe(true);
    expect(withCombo.verdict).toBe('adequate');
    // the combination does not apply at a voltage above its rating
    const at600 = calculatePanelSccr({ feeder: [], buckets: [{ ...bucket, volts: 600 }], combinations: [combo], availableFaultKa: 42 });
    expect(at600.panelSccrKa).toBe(5);
    // an incomplete combination does not apply
    expect(findCombination(['CB-25', 'C-09'], [combo])).toBeNull();
  });

  const clFeederInput = (fuseClass: 'J' | 'RK1' | undefined, ipKa: number, atProspectiveKa: number): SccrInput => ({
    feeder: [
      {
        code: 'FU-J-60',
        category: 'fuse',
        description: 'feeder fuses',
        sccrKa: 200,
        currentLimiting: fuseClass ? { fuseClass, letThrough: { ipKa, i2tA2s: 30_000, atProspectiveKa } } : undefined,
      },
      { code: 'PDB-1', category: 'power-distribution-block', description: 'block', sccrKa: 50 },
    ],
    buckets: [
      {
        tag: 'P-101',
        hp: 10,
        components: [
          { code: 'CB-25', category: 'circuit-breaker', description: 'branch breaker', sccrKa: 65 },
          contactor('C-09', { sccrKa: 18 }),
          ol('OL-1', { sccrKa: 18 }),
        ],
      },
    ],
    availableFaultKa: 42,
  });

  it('a current-limiting feeder fuse raises the branch when Ip is below the components’ rating', () => {
    const r = calculatePanelSccr(clFeederInput('J', 12, 100));
    const c = r.rows.find((x) => x.code === 'C-09')!;
    expect(c.source).toBe('current-limiting');
    expect(c.unraisedKa).toBe(18);
    expect(c.ratingKa).toBe(100); // lower of interrupting 200 kA and the let-through's prospective 100 kA
    const cb = r.rows.find((x) => x.code === 'CB-25')!;
    expect(cb.source).toBe('marked'); // a branch protective device keeps its interrupting rating
    expect(cb.ratingKa).toBe(65);
    expect(r.panelSccrKa).toBe(50); // now the distribution block limits
    expect(r.limiting[0].code).toBe('PDB-1');
    expect(r.verdict).toBe('adequate'); // 50 >= 42, NEC 409.22
  });

  it('no raise when Ip exceeds the rating, the class is not listed, or the data stop below the available current', () => {
    expect(calculatePanelSccr(clFeederInput('J', 20, 100)).panelSccrKa).toBe(18); // Ip 20 > 18
    expect(calculatePanelSccr(clFeederInput(undefined, 12, 100)).panelSccrKa).toBe(18); // not current-limiting
    expect(calculatePanelSccr(clFeederInput('J', 12, 25)).panelSccrKa).toBe(18); // data at 25 kA < 42 kA
    const r = raiseByCurrentLimitingFeeder(
      { type: 'contactor', ratingKa: 18, i2tWithstandA2s: 20_000, isBranchProtectiveDevice: false },
      { code: 'FU', fuseClass: 'J', interruptingKa: 200, letThrough: { ipKa: 12, i2tA2s: 30_000, atProspectiveKa: 100 } },
      42,
    );
    expect(r.raised).toBe(false); // I²t 30 000 > withstand 20 000
    const vfd = raiseByCurrentLimitingFeeder(
      { type: 'vfd', ratingKa: 5, isBranchProtectiveDevice: false },
      { code: 'FU', fuseClass: 'J', interruptingKa: 200, letThrough: { ipKa: 3, i2tA2s: 1000, atProspectiveKa: 100 } },
      42,
    );
    expect(vfd.raised).toBe(false);
  });

  it('verdict against the available fault current, and incomplete / unknown cases', () => {
    const base: SccrInput = { feeder: [], buckets: [{ tag: 'P-1', hp: 5, components: [contactor()] }], availableFaultKa: 5 };
    expect(calculatePanelSccr(base).verdict).toBe('adequate'); // 5 >= 5
    expect(calculatePanelSccr({ ...base, availableFaultKa: 5.1 }).verdict).toBe('below-available');
    expect(calculatePanelSccr({ ...base, availableFaultKa: null }).verdict).toBe('no-available-fault-current');
    const incomplete = calculatePanelSccr({
      ...base,
      buckets: [{ tag: 'P-1', hp: 5, components: [contactor(), { code: 'X', category: 'other', description: 'mystery' }] }],
    });
    expect(incomplete.verdict).toBe('incomplete');
    expect(incomplete.panelSccrKa).toBeNull();
  });

  it('ways out with their cost differences', () => {
    const input: SccrInput = {
      feeder: [
        { code: 'FU-RK5-60', category: 'fuse', description: 'RK5 fuses', sccrKa: 200, cost: 25 },
        { code: 'PDB-1', category: 'power-distribution-block', description: 'block', sccrKa: 50, cost: 40 },
      ],
      buckets: [
        {
          tag: 'P-101',
          hp: 10,
          components: [
            { code: 'CB-25', category: 'circuit-breaker', description: 'breaker', sccrKa: 65, cost: 120 },
            contactor('C-09', { cost: 30 }),
            ol('OL-1', { cost: 45 }),
          ],
        },
      ],
      availableFaultKa: 35,
      alternatives: {
        currentLimitingFeeders: [
          {
            code: 'FU-J-60',
            category: 'fuse',
            description: 'Class J fuses',
            sccrKa: 200,
            cost: 60,
            currentLimiting: { fuseClass: 'J', letThrough: { ipKa: 4, i2tA2s: 10_000, atProspectiveKa: 100 } },
          },
        ],
        replacements: [
          contactor('C-09-HR', { sccrKa: 65, cost: 42 }),
          contactor('C-12-HR', { sccrKa: 100, cost: 55 }),
          ol('OL-E-65', { sccrKa: 65, cost: 70 }),
        ],
      },
    };
    const r = calculatePanelSccr(input);
    expect(r.panelSccrKa).toBe(5);
    expect(r.verdict).toBe('below-available');
    const cl = r.waysOut.find((w) => w.kind === 'current-limiting-feeder')!;
    expect(cl.resultingSccrKa).toBe(50); // contactor and overload raised (Ip 4 <= 5 kA); the block then limits
    expect(cl.resolves).toBe(true);
    expect(cl.costDifference).toBe(35); // 60 − 25
    const comps = r.waysOut.filter((w) => w.kind === 'higher-rated-component');
    expect(comps.map((w) => [w.partCodes[0], w.costDifference, w.resultingSccrKa, w.resolves])).toEqual([
      ['C-09-HR', 12, 5, false], // cheapest part >= 35 kA: 42 − 30; the overload still limits at 5 kA
      ['OL-E-65', 25, 5, false], // 70 − 45
    ]);
    const all = r.waysOut.find((w) => w.kind === 'replace-all-weak')!;
    expect(all.costDifference).toBe(37);
    expect(all.resultingSccrKa).toBe(50);
    expect(all.resolves).toBe(true);
  });

  it('advice only when no alternatives are supplied; no ways out when adequate', () => {
    const r = calculatePanelSccr({ feeder: [], buckets: [{ tag: 'P-1', hp: 5, components: [contactor()] }], availableFaultKa: 65 });
    expect(r.waysOut.map((w) => w.kind)).toEqual(['advice', 'advice']);
    expect(r.waysOut[0].description).toContain('Class J, CC, T or RK1');
    const ok = calculatePanelSccr({ feeder: [], buckets: [{ tag: 'P-1', hp: 5, components: [contactor()] }], availableFaultKa: 2 });
    expect(ok.waysOut).toEqual([]);
  });
});

describe('catalogue category to SCCR type', () => {
  it.each([
    ['inverse-time-breaker', 'circuit-breaker'],
    ['fused-disconnect', 'disconnect-switch'],
    ['manual-motor-protector', 'motor-protective-switch'],
    ['power-distribution-block', 'power-distribution-block'],
    ['pilot-device', null],
    ['control-transformer', null],
  ] as const)('%s -> %s', (cat, type) => {
    expect(sccrTypeForCatalogueCategory(cat)).toBe(type);
  });
});
