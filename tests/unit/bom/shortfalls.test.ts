// What a catalogue part lacks against a line's requirement, in words: the one check behind the matcher,
// the swap list and a swap's validation. Parts from the seed catalogue (catalog/*.json, invented demo data).
import { describe, expect, it } from 'vitest';
import { buildBom, indexCatalogue, lineShortfalls, satisfies, selectItem, shortfalls, type Requirement } from '../../../shared/calc/bom';
import { makePanel, makeSelection, seedCatalogue, seedLabourUnits, SUPPLY_480 } from './fixtures';

const catalogue = seedCatalogue();
const part = (code: string) => {
  const i = catalogue.find((c) => c.code === code);
  if (!i) throw new Error(`no ${code} in the seed catalogue`);
  return i;
};

const cases: Array<[string, string, Requirement, string[]]> = [
  // NEMA ICS 2: a 25 hp 460 V motor takes a size 2 starter (from memory); the size 00 is rated 9 A (catalogue)
  [
    'a size 00 contactor for a size 2 need',
    'PW-CN-N00-120',
    { category: 'contactor', nemaSize: '2', coilVolts: 120, volts: 460 },
    ['NEMA size 00 (9 A), not the NEMA size 2 motor M-1 needs'],
  ],
  [
    'a 24 V coil at a 120 V control voltage',
    'PW-CN-N2-24',
    { category: 'contactor', nemaSize: '2', coilVolts: 120, volts: 460 },
    ['24 V coil, not the 120 V control voltage motor M-1 needs'],
  ],
  [
    'every shortfall, not only the first',
    'PW-CN-N00-24',
    { category: 'contactor', nemaSize: '2', coilVolts: 120, volts: 460 },
    ['24 V coil, not the 120 V control voltage motor M-1 needs', 'NEMA size 00 (9 A), not the NEMA size 2 motor M-1 needs'],
  ],
  ['the part that meets it', 'PW-CN-N2-120', { category: 'contactor', nemaSize: '2', coilVolts: 120, volts: 460 }, []],
  [
    'another category',
    'PW-CN-N2-120',
    { category: 'overload-relay', settingAmps: 34, tripClass: 10 },
    ['it is in Contactors, not Overload relays'],
  ],
  // NEC 2023 Table 430.250: 25 hp at 460 V, 34 A
  [
    'a breaker of another rating',
    'PW-BR-3P-030',
    { category: 'inverse-time-breaker', exactAmps: 80, poles: 3, volts: 460 },
    ['rated 30 A, not the 80 A rating motor M-1 needs'],
  ],
];

describe('shortfalls', () => {
  it.each(cases)('%s', (_name, code, req, expected) => {
    expect(shortfalls(part(code), req, 'motor M-1')).toEqual(expected);
    expect(satisfies(part(code), req)).toBe(expected.length === 0);
  });

  it('names the setting an overload relay must hold, and its range', () => {
    const small = catalogue.find((c) => c.active && c.category === 'overload-relay' && (c.ratings.settingMaxAmps ?? 0) < 34)!;
    const [why] = shortfalls(small, { category: 'overload-relay', settingAmps: 34, tripClass: 10 }, 'motor M-1');
    expect(why).toBe(
      `setting range ${small.ratings.settingMinAmps}–${small.ratings.settingMaxAmps} A does not hold the 34 A setting motor M-1 needs`,
    );
  });

  it('meets a line of alternatives when it meets any one of them (fuse classes tried in order)', () => {
    const j = catalogue.find(
      (c) => c.active && c.category === 'fuse' && c.ratings.fuseClass === 'J' && c.ratings.timeDelay && c.ratings.amps === 30,
    )!;
    const reqs: Requirement[] = (['RK5', 'J'] as const).map((fc) => ({
      category: 'fuse',
      exactAmps: 30,
      fuseClass: fc,
      timeDelay: true,
      volts: 480,
    }));
    expect(lineShortfalls(j, reqs, 'motor M-1')).toEqual([]);
    expect(lineShortfalls(j, [reqs[0]!], 'motor M-1')).toEqual(['class J, not the class RK5 motor M-1 needs']);
  });

  it('agrees with the matcher: the part it picks meets the requirement, a smaller one does not', () => {
    const index = indexCatalogue(catalogue);
    const req: Requirement = { category: 'contactor', nemaSize: '2', coilVolts: 120, volts: 460 };
    expect(selectItem(index, req)?.code).toBe('PW-CN-N2-120');
    for (const item of catalogue.filter((c) => c.active && c.category === 'contactor')) {
      expect(satisfies(item, req), item.code).toBe(shortfalls(item, req).length === 0);
    }
  });
});

describe('lines keep the requirement the matcher used', () => {
  it('on every matched line, and the line part meets it', () => {
    const bom = buildBom({
      panelName: 'T',
      selections: [makeSelection()],
      panel: makePanel(),
      supply: SUPPLY_480,
      enclosureType: '12',
      catalogue,
      labourUnits: seedLabourUnits(),
    });
    const byCode = new Map(catalogue.map((c) => [c.code, c]));
    const matched = bom.lines.filter((l) => l.status === 'matched');
    expect(matched.length).toBeGreaterThan(10);
    for (const l of matched) {
      expect(l.requirement, `${l.bucket} ${l.category}`).toBeTruthy();
      expect(lineShortfalls(byCode.get(l.code!)!, l.requirement!, 'x'), `${l.bucket} ${l.code}`).toEqual([]);
    }
  });

  it('holds the main breaker between the feeder minimum ampacity and the 430.62(A) limit', () => {
    const panel = makePanel({ minAmpacity: 50, ocpdMaxAmps: 90 }, 40);
    const bom = buildBom({
      panelName: 'T',
      selections: [makeSelection()],
      panel,
      supply: SUPPLY_480,
      enclosureType: '12',
      catalogue,
      labourUnits: seedLabourUnits(),
    });
    const main = bom.lines.find((l) => l.category === 'main-breaker')!;
    expect(main.requirement?.[0]).toMatchObject({ minAmps: 50, maxAmps: 90, prefer: 'largest' });
    const amps = part(main.code!).ratings.amps!;
    expect(amps).toBeGreaterThanOrEqual(50);
    expect(amps).toBeLessThanOrEqual(90);
    const small = catalogue.find((c) => c.active && c.category === 'main-breaker' && (c.ratings.amps ?? 0) < 50)!;
    expect(lineShortfalls(small, main.requirement!, 'the panel')).toContain(`${small.ratings.amps} A, below the 50 A the panel needs`);
  });
});
