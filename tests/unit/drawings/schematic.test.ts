// Control schematics, terminal plan and wire list generated from engine selections and a bill of materials
// built from the seed catalogue (invented parts). Expected circuits are the trade's common practice for each
// starter (three-wire stop/start with seal-in, interlocked reversing and wye-delta contactors, the overload
// relay's trip contact in series with every coil: NEMA ICS 2 / NFPA 79 practice, from memory).
import { beforeAll, describe, expect, it } from 'vitest';
import { createSelector } from '../../../shared/engine/selector';
import { loadRuleFiles } from '../../../server/engine/rule-files';
import { buildBom } from '../../../shared/calc/bom';
import { motorConnectionCard } from '../../../shared/calc/checks/connection-card';
import {
  buildPanelDrawings,
  drawingNumber,
  terminalRowsFor,
  toCsv,
  TERMINAL_COLUMNS,
  wireNumberUse,
  type PanelDrawings,
} from '../../../shared/drawings/panel-drawings';
import { railPaths, type PlacedElement } from '../../../shared/drawings/ladder';
import { bucketSheetSvg, nameplateSvg, schematicSheets } from '../../../shared/drawings/svg';
import type { LoadInput } from '../../../shared/schemas/load';
import type { BucketSchematic } from '../../../shared/drawings/schematic';
import { panelNameplate } from '../../../shared/calc/nameplate';
import { seedCatalogue, seedLabourUnits } from '../bom/fixtures';

const SUPPLY = { volts: 480, phases: 3 as const, hz: 60 as const, availableFaultKa: 35, ambientC: 40 };
const MOTORS: LoadInput[] = [
  { tag: 'P-1', supply: 'ac3', hp: 10, volts: 460 },
  { tag: 'P-2', supply: 'ac3', hp: 10, volts: 460, controlScheme: 'two-wire' },
  { tag: 'P-3', supply: 'ac3', hp: 10, volts: 460, controlScheme: 'hand-off-auto' },
  { tag: 'C-1', supply: 'ac3', hp: 7.5, volts: 460, reversing: true, reverseRotationHazard: true },
  { tag: 'C-2', supply: 'ac3', hp: 2, volts: 460, reversing: true, jogging: true },
  { tag: 'C-3', supply: 'ac3', hp: 5, volts: 460, reversing: true, controlScheme: 'two-wire' },
  { tag: 'C-4', supply: 'ac3', hp: 5, volts: 460, reversing: true, controlScheme: 'hand-off-auto' },
  {
    tag: 'K-1',
    supply: 'ac3',
    hp: 60,
    volts: 460,
    leads: 6,
    connection: 'delta',
    startingLimit: 'reduced-inrush',
    starterPreference: 'wye-delta',
    reverseRotationHazard: true,
  },
  {
    tag: 'K-2',
    supply: 'ac3',
    hp: 60,
    volts: 460,
    leads: 6,
    connection: 'delta',
    startingLimit: 'reduced-inrush',
    starterPreference: 'wye-delta',
    controlScheme: 'two-wire',
  },
  {
    tag: 'F-1',
    supply: 'ac3',
    hp: 25,
    volts: 230,
    leads: 9,
    connection: 'wye',
    startingLimit: 'reduced-inrush',
    starterPreference: 'part-winding',
  },
  { tag: 'S-1', supply: 'ac3', hp: 150, volts: 460, fla: 172, startingLimit: 'reduced-inrush', critical: true },
  { tag: 'V-1', supply: 'ac3', hp: 40, volts: 460, speedControl: 'variable', turndown: 4, torque: 'variable' },
  {
    tag: 'V-2',
    supply: 'ac3',
    hp: 40,
    volts: 460,
    speedControl: 'variable',
    turndown: 4,
    torque: 'variable',
    controlScheme: 'hand-off-auto',
  },
  { tag: 'T-1', supply: 'ac3', hp: 10, volts: 460, twoSpeed: true },
  { tag: 'M-1', supply: 'ac1', hp: 0.5, volts: 115, singlePhaseType: 'capacitor-start' },
  { tag: 'H-1', supply: 'dc', hp: 5, volts: 240, dcField: 'compound', reversing: true, quickStop: true },
  { tag: 'H-2', supply: 'dc', hp: 5, volts: 240, dcField: 'shunt', speedControl: 'variable' },
];

let d: PanelDrawings;
let bomTerminals: number;
const bucket = (tag: string) => d.buckets.find((b) => b.tag === tag)!;
const isCoilOf = (e: PlacedElement, dev: string) => e.el.kind === 'coil' && e.el.device === dev;
const pathsThrough = (b: BucketSchematic, dev: string) => railPaths(b.layout).filter((p) => p.some((e) => isCoilOf(e, dev)));

beforeAll(async () => {
  const selector = createSelector(loadRuleFiles());
  const out = await selector.selectPanel({ supply: SUPPLY, loads: MOTORS });
  const ok = out.results.filter((r) => r.errors.length === 0);
  expect(ok.map((s) => s.tag)).toEqual(MOTORS.map((m) => m.tag));
  const bom = buildBom({
    panelName: 'T',
    selections: ok,
    panel: out.panel,
    supply: SUPPLY,
    enclosureType: '12',
    catalogue: seedCatalogue(),
    labourUnits: seedLabourUnits(),
  });
  bomTerminals = bom.lines.filter((l) => l.category === 'terminal-block').reduce((n, l) => n + l.quantity, 0);
  d = buildPanelDrawings({
    jobNumber: 'J-1',
    jobName: 'Test',
    panelName: 'MCC 1',
    revision: 'Draft',
    date: '2026-01-01',
    supply: SUPPLY,
    controlVolts: 120,
    bom: bom.lines,
    buckets: ok.map((s) => {
      const a = MOTORS.find((m) => m.tag === s.tag)! as Record<string, unknown>;
      return { selection: s, card: motorConnectionCard(0, a, s).card, jogging: a.jogging === true };
    }),
  });
});

describe('control schematics', () => {
  it('draws the starter each selection decided (engine decisions for these answers)', () => {
    const starters = Object.fromEntries(d.buckets.map((b) => [b.tag, b.starter]));
    expect(starters).toMatchObject({
      'P-1': 'Full-voltage non-reversing',
      'C-1': 'Full-voltage reversing',
      'K-1': 'Wye-delta, open transition',
      'F-1': 'Part-winding',
      'S-1': 'Solid-state reduced-voltage (soft starter)',
      'V-1': 'Adjustable-speed drive',
      'T-1': 'Two-speed',
    });
  });

  it('gives every node one wire number, unique on the panel (X2, the grounded rail, is one node for all)', () => {
    const use = wireNumberUse(d);
    expect(use.size).toBeGreaterThan(d.buckets.length * 5);
    const reused = [...use].filter(([, n]) => n > 1);
    expect(reused).toEqual([]);
    for (const b of d.buckets) {
      const control = b.nodeWire.filter((_, i) => i !== 1);
      expect(new Set(control).size).toBe(control.length);
      expect(control.every((w) => w !== '')).toBe(true);
    }
  });

  it('holds the other contactor’s normally closed contact in each coil’s rung (reversing, wye-delta, two-speed)', () => {
    const checked: string[] = [];
    for (const tag of ['C-1', 'C-2', 'C-3', 'C-4', 'K-1', 'K-2', 'T-1', 'H-1']) {
      const b = bucket(tag);
      expect(b.interlocked.length, tag).toBe(1);
      for (const [a, z] of b.interlocked) {
        for (const [coil, other] of [
          [a, z],
          [z, a],
        ] as const) {
          const paths = pathsThrough(b, coil);
          expect(paths.length, `${tag} ${coil}`).toBeGreaterThan(0);
          for (const p of paths)
            expect(
              p.some((e) => e.el.kind === 'contact' && e.el.device === other && (e.el.contact === 'nc' || e.el.contact === 'nc-to')),
              `${tag}: ${coil} through ${other} NC`,
            ).toBe(true);
          checked.push(`${tag}:${coil}`);
        }
      }
    }
    expect(checked).toContain('K-1:4D'.replace('4', String(bucket('K-1').index)));
  });

  it('puts the overload trip contact in series with every coil unless the drive gives the overload (NEC 430.124)', () => {
    let coils = 0;
    for (const b of d.buckets) {
      for (const p of railPaths(b.layout)) {
        if (!p.some((e) => e.el.kind === 'coil')) continue;
        coils++;
        if (b.overload === 'drive') continue;
        const trip = p.some(
          (e) =>
            e.el.kind === 'overload' ||
            (b.overload === 'starter' && e.el.kind === 'contact' && (e.el.label === 'OL TRIP' || e.el.label === 'FAULT')),
        );
        expect(trip, `${b.tag}: ${p.map((e) => ('device' in e.el ? e.el.device : e.el.kind)).join(' → ')}`).toBe(true);
      }
    }
    expect(coils).toBeGreaterThan(d.buckets.length);
    expect(bucket('V-1').overload).toBe('drive');
    // part-winding: both windings' relays in series (NEC 430.4, one relay per half-winding)
    const pw = railPaths(bucket('F-1').layout).filter((p) => p.some((e) => e.el.kind === 'coil'));
    for (const p of pw) expect(p.filter((e) => e.el.kind === 'overload').length).toBe(2);
  });

  it('puts the phase monitor relay’s contact in series with every coil where the selection has one', () => {
    const b = bucket('C-1');
    expect(b.devices.some((x) => x.tag.endsWith('PMR'))).toBe(true);
    for (const p of railPaths(b.layout).filter((p) => p.some((e) => e.el.kind === 'coil')))
      expect(p.some((e) => e.el.kind === 'contact' && e.el.device.endsWith('PMR'))).toBe(true);
  });

  it('draws the control scheme answered: seal-in around START, a maintained remote contact, or a hand-off-auto selector', () => {
    const coilPaths = (tag: string) => railPaths(bucket(tag).layout).filter((p) => p.some((e) => e.el.kind === 'coil'));
    const three = coilPaths('P-1');
    expect(three.some((p) => p.some((e) => e.el.kind === 'push' && e.el.label === 'START'))).toBe(true);
    expect(three.some((p) => p.some((e) => e.el.kind === 'contact' && e.el.label === 'SEAL'))).toBe(true);
    expect(three.every((p) => p.some((e) => e.el.kind === 'push' && e.el.label === 'STOP'))).toBe(true);
    const two = coilPaths('P-2');
    expect(two.every((p) => p.some((e) => e.el.kind === 'field' && e.el.maintained))).toBe(true);
    expect(two.some((p) => p.some((e) => e.el.kind === 'push'))).toBe(false);
    expect(bucket('P-2').notes.join(' ')).toMatch(/restarts/);
    const hoa = coilPaths('P-3');
    expect(
      hoa
        .map((p) => p.find((e) => e.el.kind === 'selector')?.el)
        .map((e) => (e as { position: string }).position)
        .sort(),
    ).toEqual(['A', 'H']);
  });

  it('cross-references each contact to its coil’s rung and each coil to its contacts', () => {
    for (const b of d.buckets) {
      for (const x of b.xrefs) {
        const coil = b.layout.elements.find((e) => isCoilOf(e, x.device))!;
        expect(b.firstRung + coil.row).toBe(x.coilRung);
        const contacts = b.layout.elements.filter((e) => e.el.kind === 'contact' && e.el.device === x.device);
        expect(x.no.length + x.nc.length).toBe(contacts.length);
      }
    }
    const first = d.buckets.map((b) => b.firstRung);
    expect([...first].sort((a, z) => a - z)).toEqual(first);
  });

  it('draws the motor leads with their NEMA MG 1 markings', () => {
    expect(bucket('K-1').power.motorLeads).toEqual(['T1', 'T2', 'T3', 'T6', 'T4', 'T5']);
    expect(bucket('F-1').power.motorLeads).toEqual(['T1', 'T2', 'T3', 'T7', 'T8', 'T9']);
    expect(bucket('H-1').power.motorLeads).toEqual(['A1', 'S2', 'F1', 'F2']);
    const svg = bucketSheetSvg(d, 'K-1');
    expect(svg).toContain('IEEE 315 / NEMA ICS 19');
    expect(svg).toMatch(/MECH\. INTERLOCK/);
  });
});

describe('terminal plan and wire list', () => {
  it('has exactly the bill of materials’ terminal blocks, all of them held by it (one source)', () => {
    expect(d.warnings).toEqual([]);
    expect(bomTerminals).toBeGreaterThan(0);
    expect(d.terminals.length).toBe(bomTerminals);
    expect(d.bomTerminalBlocks).toBe(bomTerminals);
    expect(d.terminals.filter((t) => !t.inBom)).toEqual([]);
    const refs = d.terminals.map((t) => t.ref);
    expect(new Set(refs).size).toBe(refs.length);
  });

  it('lands every field conductor of the schematics on a terminal', () => {
    for (const b of d.buckets) {
      const landed = d.terminals.filter((t) => t.bucket === b.tag && t.group !== 'spare').length;
      expect(landed, b.tag).toBe(b.fieldPoints.length);
    }
  });

  it('colours conductors per NFPA 79 13.2.4 (from memory): black power, red control, white X2, orange foreign', () => {
    const colours = new Set(d.wires.map((w) => w.colour));
    expect([...colours].sort()).toEqual(['black', 'orange', 'red', 'white']);
    expect(d.wires.filter((w) => w.wire === 'X2').every((w) => w.colour === 'white')).toBe(true);
    expect(d.colourPractice).toMatch(/NFPA 79/);
    expect(toCsv(TERMINAL_COLUMNS, terminalRowsFor(d)).split('\r\n')[0]).toBe(TERMINAL_COLUMNS.join(','));
  });

  it('numbers the drawing from the job and the panel', () => {
    expect(drawingNumber('J-2041', 'MCC-1 Pump hall')).toBe('J-2041-MCC-1-PUMP-HALL-E');
    expect(schematicSheets(d).length).toBe(MOTORS.length);
  });
});

describe('panel marking', () => {
  it('prints the nameplate values (NEC 2023 409.110) with the shop name given, else a placeholder', () => {
    const np = panelNameplate({
      rollup: {
        feeder: { minAmpacity: 100, conductorSize: '3 AWG', ocpdMaxAmps: 150, basis: '' },
        totalFlcAmps: 77,
        largestMotorTag: 'P-1',
      },
      supply: { volts: 480, phases: 3, hz: 60 },
      sccrKa: 10,
      enclosureType: '12',
    });
    const svg = nameplateSvg(np, { drawingNumber: 'J-1-MCC-E', fullLoadWorking: '' });
    expect(svg).toContain('77 A');
    expect(svg).toContain('10 kA rms symmetrical, 480 V');
    expect(svg).toContain('[Shop name]');
    expect(nameplateSvg(np, { shopName: 'Northfield Panel Works', drawingNumber: 'J-1-MCC-E', fullLoadWorking: '' })).toContain(
      'Northfield Panel Works',
    );
    const none = nameplateSvg(
      panelNameplate({
        rollup: {
          feeder: { minAmpacity: 100, conductorSize: '3 AWG', ocpdMaxAmps: 150, basis: '' },
          totalFlcAmps: 77,
          largestMotorTag: 'P-1',
        },
        supply: { volts: 480, phases: 3, hz: 60 },
        sccrKa: null,
        enclosureType: '12',
      }),
      { drawingNumber: 'x', fullLoadWorking: '' },
    );
    expect(none).toContain('NOT ESTABLISHED');
  });
});
