// The control schematic of motors on a shared drive: each output contactor closes only while the drive is
// stopped (the drive's RUNNING contact, normally closed, or the contactor's own seal-in in each path to its
// coil), the drive's enable runs through each contactor's auxiliary contact, and each motor's own overload
// contact opens its coil (NEC 2023 430.32; interlock practice: common practice, the drive's instructions govern).
import { beforeAll, describe, expect, it } from 'vitest';
import { buildBom } from '../../../shared/calc/bom';
import { motorConnectionCard } from '../../../shared/calc/checks/connection-card';
import { railPaths } from '../../../shared/drawings/ladder';
import { buildPanelDrawings, type PanelDrawings, wireNumberUse } from '../../../shared/drawings/panel-drawings';
import { motor, selector, supply480 } from '../engine/selector-setup';
import { seedCatalogue, seedLabourUnits } from '../bom/fixtures';

const MOTORS = ['CV-1', 'CV-2', 'CV-3'].map((tag, i) =>
  motor({ tag, hp: [10, 7.5, 5][i], speedControl: 'variable', torque: 'variable', sharedDrive: 'VFD-1' }),
);
const SUPPLY = { volts: 480, phases: 3, hz: 60 };
let d: PanelDrawings;

beforeAll(async () => {
  const out = await selector.selectPanel({ supply: supply480, loads: MOTORS });
  const bom = buildBom({
    panelName: 'T',
    selections: out.results,
    panel: out.panel,
    supply: SUPPLY,
    enclosureType: '12',
    catalogue: seedCatalogue(),
    labourUnits: seedLabourUnits(),
  });
  d = buildPanelDrawings({
    jobNumber: 'J-1',
    jobName: 'Test',
    panelName: 'CV',
    revision: 'Draft',
    date: '2026-01-01',
    supply: SUPPLY,
    controlVolts: 120,
    bom: bom.lines,
    buckets: out.results.map((s) => ({
      selection: s,
      card: motorConnectionCard(0, MOTORS.find((m) => m.tag === s.tag) as Record<string, unknown>, s).card,
      jogging: false,
      sharedDrive: 'VFD-1',
    })),
  });
});

describe('motors on shared drive VFD-1', () => {
  it.each([
    ['CV-1', '1M'],
    ['CV-2', '2M'],
    ['CV-3', '3M'],
  ])(
    "%s: every path to the output contactor %s passes the drive's RUNNING contact or the contactor's seal, and its overload",
    (tag, coil) => {
      const b = d.buckets.find((x) => x.tag === tag)!;
      expect(b.starter).toBe('Output contactor on shared drive VFD-1');
      const paths = railPaths(b.layout).filter((p) => p.some((e) => e.el.kind === 'coil' && e.el.device === coil));
      expect(paths.length).toBe(2);
      for (const p of paths) {
        const interlock = p.some((e) => e.el.kind === 'contact' && e.el.device === 'VFD-1' && e.el.contact === 'nc');
        const seal = p.some((e) => e.el.kind === 'contact' && e.el.device === coil && e.el.contact === 'no');
        expect(interlock || seal).toBe(true);
        expect(p.some((e) => e.el.kind === 'overload')).toBe(true);
      }
      // the closing path (not through the seal) always takes the drive's stopped contact
      expect(paths.some((p) => p.some((e) => e.el.kind === 'contact' && e.el.device === 'VFD-1'))).toBe(true);
      // the drive's enable through this contactor's auxiliary contact
      const enable = b.layout.elements.filter((e) => e.el.kind === 'input' && e.el.device === 'VFD-1').map((e) => e.el.label);
      expect(enable).toEqual(['ENABLE COM', 'DI ENABLE']);
      expect(b.notes.join(' ')).toMatch(/starting a motor onto a running drive output/);
      // the power circuit: the shared drive's output, then this motor's contactor and overload, no breaker of its own
      expect(b.power.tail.map((x) => x.kind)).toEqual(['vfd', 'contactor', 'ol', 'terminals']);
      expect(b.power.head).toEqual([]);
    },
  );

  it('keeps wire numbers unique on the panel', () => {
    expect([...wireNumberUse(d)].filter(([, n]) => n > 1)).toEqual([]);
  });
});
