// Motors on one branch circuit (NEC 2023 430.53) in the bill of materials: one group device in place of
// each motor's own; the motors keep their overload relays and controllers.
import { describe, expect, it } from 'vitest';
import { buildBom } from '../../../shared/calc/bom';
import type { LoadInput } from '../../../shared/schemas/load';
import { motor, selector, supply480 } from '../engine/selector-setup';
import { seedCatalogue, seedLabourUnits, SUPPLY_480 } from './fixtures';

async function bomOf(loads: LoadInput[]) {
  const out = await selector.selectPanel({ supply: supply480, loads });
  const { lines } = buildBom({
    panelName: 'MCC-1',
    selections: out.results,
    panel: out.panel,
    supply: SUPPLY_480,
    enclosureType: '12',
    catalogue: seedCatalogue(),
    labourUnits: seedLabourUnits(),
  });
  const of = (bucket: string, category: string) => lines.filter((l) => l.bucket === bucket && l.category === category);
  return { lines, of };
}

const listed = (tag: string, hp: number, over: Partial<LoadInput> = {}) =>
  motor({ tag, hp, branchGroup: 'G-1', groupListedMaxAmps: 60, ...over });

describe('a 430.53(C) group: 10 hp and two 5 hp at 460 V, listed for group installation at 60 A', () => {
  it('one 50 A inverse-time breaker for the group (35 A + 7.6 A + 7.6 A = 50.2 A → 50 A, NEC 2023 430.53(C)(4), 240.6(A))', async () => {
    const { of } = await bomOf([listed('M-1', 10), listed('M-2', 5), listed('M-3', 5)]);
    expect(of('G-1', 'inverse-time-breaker').map((l) => [l.code, l.quantity])).toEqual([['PW-BR-3P-050', 1]]);
    for (const tag of ['M-1', 'M-2', 'M-3']) {
      expect(of(tag, 'inverse-time-breaker'), tag).toEqual([]);
      expect(of(tag, 'overload-relay').length, `${tag} keeps its overload relay (430.53(C), 430.32)`).toBe(1);
      expect(of(tag, 'contactor').length, `${tag} keeps its controller`).toBeGreaterThan(0);
    }
  });

  it('without the listing the group is refused and each motor keeps its own breaker (35, 20, 20 A, Table 430.52)', async () => {
    const { of } = await bomOf([
      listed('M-1', 10, { groupListedMaxAmps: undefined }),
      listed('M-2', 5, { groupListedMaxAmps: undefined }),
      listed('M-3', 5, { groupListedMaxAmps: undefined }),
    ]);
    expect(of('G-1', 'inverse-time-breaker')).toEqual([]);
    expect(['M-1', 'M-2', 'M-3'].map((t) => of(t, 'inverse-time-breaker')[0]?.code)).toEqual([
      'PW-BR-3P-035',
      'PW-BR-3P-020',
      'PW-BR-3P-020',
    ]);
  });
});
