// The pure panel checks on plain data: what the bill of materials' source and staleness say, which motors
// are left out, and the reasons given when a check cannot run. Expected values are the product's own
// wording and rules (no standard is involved in these).
import { describe, expect, it } from 'vitest';
import { panelChecks, revisionText, type PanelChecksInput } from '../../../shared/calc/checks/panel-checks';
import { pumpFvnr, selection } from '../panel/fixtures';

function input(patch: Partial<PanelChecksInput> = {}): PanelChecksInput {
  return {
    panel: { id: 1, name: 'MCP-1', mounting: 'wall-mounted', revisionNumber: null, status: 'draft' },
    job: {
      id: 2,
      number: 'J-1',
      name: 'Test',
      customer: '',
      site: '',
      supplyVolts: 480,
      supplyPhases: 3,
      supplyHz: 60,
      availableFaultKa: 10,
      ambientC: 35,
      codeEdition: '2023',
    },
    motors: [{ id: 10, tag: pumpFvnr.tag, answers: { tag: pumpFvnr.tag }, effective: pumpFvnr }],
    rollup: null,
    bom: { lines: [], source: 'stored', stale: false, enclosureType: '12' },
    catalogue: new Map(),
    combinations: [],
    shopName: 'Shop',
    ...patch,
  };
}

describe('panelChecks (pure)', () => {
  it('says where the bill of materials comes from and whether it is current', () => {
    const cases: Array<[PanelChecksInput['bom']['source'], boolean, boolean, RegExp | null]> = [
      ['stored', false, false, null],
      ['stored', true, true, /rebuild it for current checks/],
      // a bill built in memory is what a rebuild would store: never stale
      ['in-memory', true, false, /No bill of materials is stored yet/],
    ];
    for (const [source, stale, expectStale, note] of cases) {
      const c = panelChecks(input({ bom: { lines: [], source, stale, enclosureType: '4X' } }));
      expect(c.bom.source).toBe(source);
      expect(c.bom.stale).toBe(expectStale);
      if (note) expect(c.bom.note).toMatch(note);
      else expect(c.bom.note).toBeNull();
      expect(c.panel.enclosureType).toBe('4X');
    }
  });

  it('leaves out motors without a clean selection but keeps a connection card row for every motor', () => {
    const broken = selection({ tag: 'P-999', errors: ['no FLC'] });
    const c = panelChecks(
      input({
        motors: [
          { id: 10, tag: pumpFvnr.tag, answers: { tag: pumpFvnr.tag }, effective: pumpFvnr },
          { id: 11, tag: 'P-999', answers: { tag: 'P-999' }, effective: broken },
          { id: 12, tag: 'P-000', answers: { tag: 'P-000' }, effective: null },
        ],
      }),
    );
    expect(c.motorsWithErrors).toEqual(['P-999', 'P-000']);
    expect(c.connectionCards.map((x) => x.loadId)).toEqual([10, 11, 12]);
  });

  it('gives the reason when a check has nothing to work on', () => {
    const c = panelChecks(input());
    expect(c.nameplate.result).toBeNull();
    expect(c.nameplate.reason).toMatch(/no roll-up/);
    expect(c.heat.result).toBeNull();
    expect(c.heat.reason).toMatch(/No enclosure with dimensions/);
    expect(c.sccr.verdict).toBe('incomplete');
    expect(c.cautions.join(' ')).toMatch(/qualified person/);
  });

  it('writes the revision as the reader sees it', () => {
    expect(revisionText({ revisionNumber: null, status: 'draft' })).toBe('Draft (no signed-off revision)');
    expect(revisionText({ revisionNumber: 2, status: 'signed_off' })).toBe('R2');
    expect(revisionText({ revisionNumber: 2, status: 'draft' })).toBe('Draft after R2');
  });
});
