// Control-circuit conductor protection, NEC 2023 430.72(A), (B) and Table 430.72(B). Table values are
// written from memory of the published table (marked so in its module); the column letters as the table
// names them: A separate protection, B within the enclosure, C extending beyond the enclosure.
import { describe, expect, it } from 'vitest';
import { buildBom } from '../../../shared/calc/bom';
import { checkControlConductor, controlConductorChecks } from '../../../shared/calc/control-conductors';
import { controlConductorMaxAmps } from '../../../shared/standards/nec-table-430-72-b';
import { makePanel, makeSelection, seedCatalogue, seedLabourUnits, SUPPLY_480 } from '../bom/fixtures';

describe('Table 430.72(B) (NEC 2023, from memory)', () => {
  it.each([
    ['18 AWG', 'cu', 'A', 7],
    ['16 AWG', 'cu', 'A', 10],
    ['16 AWG', 'cu', 'B', 40],
    ['16 AWG', 'cu', 'C', 10],
    ['14 AWG', 'cu', 'B', 100],
    ['14 AWG', 'cu', 'C', 45],
    ['12 AWG', 'cu', 'C', 60],
    ['10 AWG', 'cu', 'B', 160],
    ['12 AWG', 'al', 'C', 45],
    ['10 AWG', 'al', 'B', 140],
    ['14 AWG', 'cu', 'A', 15], // Note 1: the ampacity, Table 310.16 60 °C 14 AWG Cu = 15 A
    ['8 AWG', 'cu', 'C', 120], // Note 3: 300 % of Table 310.16 60 °C 8 AWG Cu (40 A)
  ] as const)('%s %s, column %s: at most %s A', (size, material, column, amps) => {
    expect(controlConductorMaxAmps(size, material, column).maxAmps).toBe(amps);
  });
  it('refuses what the table does not give: 16 AWG aluminum, 20 AWG, column B above 10 AWG (Note 2 needs Table 310.17)', () => {
    expect(() => controlConductorMaxAmps('16 AWG', 'al', 'C')).toThrow(/Table 430\.72\(B\)/);
    expect(() => controlConductorMaxAmps('20 AWG', 'cu', 'A')).toThrow(/not in the table/);
    expect(() => controlConductorMaxAmps('8 AWG', 'cu', 'B')).toThrow(/Note 2/);
  });
  it('reads the catalogue\'s bare sizes: "14" is 14 AWG', () => {
    expect(controlConductorMaxAmps('14', 'cu', 'C').maxAmps).toBe(45);
  });
});

describe('a control conductor against its upstream device (430.72(B))', () => {
  it('16 AWG Cu beyond the enclosure behind a 10 A fuse is within column C (10 A); behind 15 A it is a finding', () => {
    expect(checkControlConductor({ size: '16', material: 'cu', column: 'C', deviceAmps: 10 })).toMatchObject({
      ok: true,
      maxAmps: 10,
      finding: null,
    });
    const bad = checkControlConductor({ size: '16', material: 'cu', column: 'C', deviceAmps: 15 });
    expect(bad.ok).toBe(false);
    expect(bad.finding).toMatch(/16 AWG Cu behind a 15 A device: column C.*at most 10 A/);
  });
  it('14 AWG Cu tapped from a 50 A branch breaker: within the enclosure (B, 100 A) passes, beyond it (C, 45 A) does not', () => {
    expect(checkControlConductor({ size: '14 AWG', material: 'cu', column: 'B', deviceAmps: 50 }).ok).toBe(true);
    expect(checkControlConductor({ size: '14 AWG', material: 'cu', column: 'C', deviceAmps: 50 }).ok).toBe(false);
  });
});

describe('every control conductor of the bill of materials', () => {
  const catalogue = seedCatalogue();
  const byCode = new Map(catalogue.map((c) => [c.code, c]));
  const sel = makeSelection({ tag: 'P-1' });
  const bom = buildBom({
    panelName: 'MCC-1',
    selections: [sel],
    panel: makePanel(),
    supply: SUPPLY_480,
    enclosureType: '12',
    catalogue,
    labourUnits: seedLabourUnits(),
  });

  it("checks the bucket's 14 AWG control wire against its own control fuse (column A, separate protection)", () => {
    const r = controlConductorChecks(bom.lines, byCode, [sel]);
    const row = r.rows.find((x) => x.bucket === 'P-1');
    expect(row).toMatchObject({ conductor: '14 AWG', column: 'A', device: { kind: 'control fuse' }, maxAmps: 15, ok: true }); // Note 1: 14 AWG Cu 60 °C = 15 A
    expect(row!.device.amps).toBeLessThanOrEqual(15);
    expect(r.findings).toEqual([]);
  });

  it('16 AWG control wire behind a 15 A control fuse is a finding naming the bucket', () => {
    const wire16 = catalogue.find((c) => c.category === 'wire' && c.ratings.kind === 'control' && c.ratings.wireSize === '16')!;
    const fuse15 = catalogue.find((c) => c.category === 'fuse' && c.ratings.amps === 15 && c.ratings.fuseClass === 'CC')!;
    expect(wire16 && fuse15).toBeTruthy();
    const lines = bom.lines.map((l) => {
      if (l.bucket === 'P-1' && l.category === 'wire' && l.code && byCode.get(l.code)?.ratings.kind === 'control')
        return { ...l, code: wire16.code, description: wire16.description };
      if (l.bucket === 'P-1' && l.category === 'fuse' && l.quantity === 1)
        return { ...l, code: fuse15.code, description: fuse15.description };
      return l;
    });
    const r = controlConductorChecks(lines, byCode, [sel]);
    expect(r.rows.find((x) => x.bucket === 'P-1')).toMatchObject({ conductor: '16 AWG', column: 'A', maxAmps: 10, ok: false });
    expect(r.findings[0]).toMatch(/^P-1: 16 AWG Cu behind a 15 A device/);
  });

  it('with no control fuse in the bucket nor on the transformer secondary, the wire is tapped from the branch device: column C', () => {
    const lines = bom.lines.filter((l) => !(l.category === 'fuse' && l.quantity === 1));
    const r = controlConductorChecks(lines, byCode, [sel]);
    const row = r.rows.find((x) => x.bucket === 'P-1')!;
    expect(row.column).toBe('C');
    expect(row.device.kind).toBe('branch protective device');
    expect(row.device.amps).toBe(sel.scpd.ratingAmps);
    expect(row.ok).toBe(sel.scpd.ratingAmps <= 45); // 14 AWG Cu column C = 45 A
  });
});
