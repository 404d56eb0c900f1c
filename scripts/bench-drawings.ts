// Benchmark: the drawings of a 200-motor job (four panels: every bucket's schematic sheet, the supply sheet,
// the backplate layout, terminal plan, wire list and nameplate), the layouts alone, and one bucket's SVG. Figures, not a timed test. Targets:
// the whole job < 1 s, one bucket's SVG < 20 ms.
//   npm run -s bench:drawings            (PW_DRAWINGS_OUT=dir also writes the demo panel's sheets there)
import fs from 'node:fs';
import path from 'node:path';
import { buildBom } from '../shared/calc/bom';
import { LabourUnitsFileSchema } from '../shared/schemas/catalogue';
import { readSeedCatalogue } from '../server/db/seeders/catalogue';
import { createSelector } from '../shared/engine/selector';
import type { LoadInput, SelectionInput } from '../shared/schemas/load';
import { loadRuleFiles } from '../server/engine/rule-files';
import { motorConnectionCard } from '../shared/calc/checks/connection-card';
import { buildPanelDrawings, terminalRowsFor, toCsv, TERMINAL_COLUMNS, WIRE_COLUMNS, wireRowsFor } from '../shared/drawings/panel-drawings';
import { bucketSheetSvg, schematicSheets, supplySheetSvg, terminalRefMap } from '../shared/drawings/svg';
import { backplateLayout } from '../shared/calc/layout/backplate';
import { layoutSheetSvg } from '../shared/drawings/svg-layout';
import { BOM_MIX, median, motorLoads, timeRuns } from './bench-data';
import { DEMO_MOTORS } from '../server/db/seeders/demo-panels';

const MOTORS = 200;
const PANELS = 4;
const dir = path.resolve(import.meta.dirname, '../catalog');
const catalogue = readSeedCatalogue(dir);
const byCode = new Map(catalogue.map((i) => [i.code, i]));
const itemOf = (code: string) => byCode.get(code);
const labourUnits = LabourUnitsFileSchema.parse(JSON.parse(fs.readFileSync(path.join(dir, 'labour-units.json'), 'utf8')));

async function panelsOf(input: SelectionInput, panels: number) {
  const selector = createSelector(loadRuleFiles());
  const per = Math.ceil(input.loads.length / panels);
  const out = [];
  for (let i = 0; i < panels; i++) {
    const loads = input.loads.slice(i * per, (i + 1) * per);
    const sel = await selector.selectPanel({ ...input, loads });
    const ok = sel.results.filter((r) => r.errors.length === 0);
    const bom = buildBom({
      panelName: `MCC-${i + 1}`,
      selections: ok,
      panel: sel.panel,
      supply: { volts: input.supply.volts, phases: input.supply.phases, hz: input.supply.hz ?? 60 },
      enclosureType: '12',
      catalogue,
      labourUnits,
    });
    const buckets = ok.map((s) => {
      const answers = loads.find((l) => l.tag === s.tag) as Record<string, unknown>;
      return { selection: s, card: motorConnectionCard(0, answers, s).card, jogging: answers.jogging === true };
    });
    out.push({
      name: `MCC-${i + 1}`,
      buckets,
      bom: bom.lines,
      supply: { volts: input.supply.volts, phases: input.supply.phases, hz: input.supply.hz ?? 60 },
    });
  }
  return out;
}

function draw(p: Awaited<ReturnType<typeof panelsOf>>[number]) {
  const d = buildPanelDrawings({
    jobNumber: 'J-BENCH',
    jobName: 'Benchmark job',
    panelName: p.name,
    revision: 'Draft',
    date: '2026-01-01',
    supply: p.supply,
    controlVolts: 120,
    buckets: p.buckets,
    bom: p.bom,
    layout: backplateLayout(p.bom, itemOf),
  });
  const sheets = schematicSheets(d);
  const supply = supplySheetSvg(d, '400 A', '1000 VA');
  const layout = layoutSheetSvg(d, d.sheets.find((s) => s.kind === 'layout')!);
  const csv = toCsv(TERMINAL_COLUMNS, terminalRowsFor(d)) + toCsv(WIRE_COLUMNS, wireRowsFor(d));
  return { d, bytes: sheets.reduce((n, s) => n + s.length, 0) + supply.length + layout.length + csv.length };
}

/** The demo panel's motors (less the twin of P-101) and two more starter kinds the sheets must draw. */
const DEMO: LoadInput[] = [
  ...DEMO_MOTORS.filter((m) => m.tag !== 'P-102'),
  {
    tag: 'F-701',
    description: 'Supply fan',
    supply: 'ac3',
    hp: 25,
    volts: 230,
    leads: 9,
    connection: 'wye',
    startingLimit: 'reduced-inrush',
    starterPreference: 'part-winding',
    controlScheme: 'two-wire',
  },
  { tag: 'P-801', description: 'Sump pump', supply: 'ac3', hp: 10, volts: 460, controlScheme: 'hand-off-auto' },
];

async function main(): Promise<void> {
  const out = process.env.PW_DRAWINGS_OUT;
  if (out) {
    const [demo] = await panelsOf({ supply: { volts: 480, phases: 3, hz: 60, availableFaultKa: 35, ambientC: 40 }, loads: DEMO }, 1);
    const d = draw(demo!).d;
    fs.mkdirSync(out, { recursive: true });
    const refs = terminalRefMap(d);
    for (const b of d.buckets) fs.writeFileSync(path.join(out, `${b.tag}.svg`), bucketSheetSvg(d, b.tag, refs));
    fs.writeFileSync(path.join(out, 'supply.svg'), supplySheetSvg(d, '400 A breaker', '1500 VA'));
    fs.writeFileSync(path.join(out, 'layout.svg'), layoutSheetSvg(d, d.sheets.find((s) => s.kind === 'layout')!));
    fs.writeFileSync(path.join(out, 'terminals.csv'), toCsv(TERMINAL_COLUMNS, terminalRowsFor(d)));
    fs.writeFileSync(path.join(out, 'wires.csv'), toCsv(WIRE_COLUMNS, wireRowsFor(d)));
    console.log(`wrote ${d.buckets.length} sheets to ${out}; warnings: ${d.warnings.join(' | ') || 'none'}`);
    return;
  }
  const panels = await panelsOf(motorLoads(MOTORS, BOM_MIX), PANELS);
  panels.forEach(draw); // warm-up
  let bytes = 0;
  const job = await timeRuns(7, () => {
    bytes = panels.map(draw).reduce((n, x) => n + x.bytes, 0);
  });
  // one bucket from its selection and BOM lines to its SVG sheet (model, wire numbers, terminals, drawing)
  const p0 = panels[0]!;
  const b0 = p0.buckets[0]!;
  const oneBucket = { ...p0, buckets: [b0], bom: p0.bom.filter((l) => l.bucket === b0.selection.tag) };
  const bucket = await timeRuns(50, () => {
    const one = draw({ ...oneBucket }).d;
    return bucketSheetSvg(one, b0.selection.tag, terminalRefMap(one));
  });
  // the backplate layouts alone: every panel's parts placed on its enclosure and drawn
  let parts = 0;
  const layouts = await timeRuns(20, () => {
    parts = 0;
    for (const p of panels) {
      const d = draw({ ...p, buckets: [] }).d;
      parts += d.layout?.placedCount ?? 0;
      layoutSheetSvg(d, d.sheets.find((s) => s.kind === 'layout')!);
    }
  });
  const sheets = panels.reduce((n, p) => n + p.buckets.length, 0);
  console.log(
    `drawings, ${MOTORS}-motor job (${PANELS} panels, ${sheets} schematic sheets + supply, backplate layout, terminal plan and wire list, ${(bytes / 1e6).toFixed(1)} MB): median ${median(job).toFixed(0)} ms (target < 1000 ms)`,
  );
  console.log(`backplate layouts, ${PANELS} panels (${parts} parts placed and drawn): median ${median(layouts).toFixed(1)} ms`);
  console.log(
    `one bucket's schematic SVG (built from its selection and BOM lines): median ${median(bucket).toFixed(2)} ms (target < 20 ms)`,
  );
}

main().catch((e: unknown) => {
  console.error(e);
  process.exit(1);
});
