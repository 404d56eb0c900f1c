// Benchmark: the bill of materials of a 200-motor job (selections from the engine), built and written to .xlsx.
// Figures, not a timed test. Targets (issue 4): build < 1 s, .xlsx < 2 s.
//   npm run -s bench:bom
import fs from 'node:fs';
import path from 'node:path';
import { Writable } from 'node:stream';
import { performance } from 'node:perf_hooks';
import { buildBom } from '../shared/calc/bom';
import { LabourUnitsFileSchema } from '../shared/schemas/catalogue';
import { readSeedCatalogue } from '../server/db/seeders/catalogue';
import { createSelector } from '../shared/engine/selector';
import type { SelectionOutput } from '../shared/schemas/selection';
import { loadRuleFiles } from '../server/engine/rule-files';
import { writeBomWorkbook } from '../server/modules/bom/export';
import { BOM_MIX, median, motorLoads, timeRuns } from './bench-data';

const MOTORS = 200;
const PANELS = 4;

function loadCatalogue() {
  const dir = path.resolve(import.meta.dirname, '../catalog');
  const catalogue = readSeedCatalogue(dir);
  const labourUnits = LabourUnitsFileSchema.parse(JSON.parse(fs.readFileSync(path.join(dir, 'labour-units.json'), 'utf8')));
  return { catalogue, labourUnits };
}

async function main(): Promise<void> {
  const input = motorLoads(MOTORS, BOM_MIX);
  const selector = createSelector(loadRuleFiles());
  const per = Math.ceil(MOTORS / PANELS);
  const panelInputs = Array.from({ length: PANELS }, (_, i) => ({ ...input, loads: input.loads.slice(i * per, (i + 1) * per) }));
  const selections: SelectionOutput[] = [];
  for (const p of panelInputs) selections.push(await selector.selectPanel(p));
  const { catalogue, labourUnits } = loadCatalogue();

  const build = () =>
    selections.map((s, i) =>
      buildBom({
        panelName: `MCC-${i + 1}`,
        selections: s.results,
        panel: s.panel,
        supply: { volts: input.supply.volts, phases: input.supply.phases, hz: input.supply.hz ?? 60 },
        enclosureType: '12',
        catalogue,
        labourUnits,
        markupPercent: 15,
        labourRatePerHour: 85,
      }),
    );
  build(); // warm-up (JIT), not timed
  let boms = build();
  const buildTimes = await timeRuns(7, () => {
    boms = build();
  });
  const lines = boms.reduce((n, b) => n + b.lines.length, 0);
  const unmatched = boms.flatMap((b) => b.lines.filter((l) => l.status === 'unmatched'));

  const panels = boms.map((b, i) => ({ name: `MCC-${i + 1}`, lines: b.lines }));
  const jobInfo = { number: 'J-BENCH', name: 'Benchmark job', markupPercent: 15, labourRatePerHour: 85 };
  const writeTimes: number[] = [];
  let bytes = 0;
  for (let i = 0; i < 4; i++) {
    let n = 0;
    const sink = new Writable({
      write(chunk: Buffer, _e, cb) {
        n += chunk.length;
        cb();
      },
    });
    const done = new Promise((r) => sink.on('finish', r));
    const t = performance.now();
    await writeBomWorkbook(jobInfo, panels, sink);
    await done;
    if (i > 0) writeTimes.push(performance.now() - t); // first run is warm-up
    bytes = n;
  }

  console.log(`bill of materials, ${MOTORS} motors in ${PANELS} panels, ${catalogue.length} catalogue items`);
  console.log(`  lines: ${lines}, unmatched: ${unmatched.length}`);
  console.log(`  build:  median ${median(buildTimes).toFixed(1)} ms, min ${Math.min(...buildTimes).toFixed(1)} ms (target < 1000 ms)`);
  console.log(
    `  .xlsx:  median ${median(writeTimes).toFixed(1)} ms, min ${Math.min(...writeTimes).toFixed(1)} ms, ${(bytes / 1024).toFixed(0)} kB (target < 2000 ms)`,
  );
  if (unmatched.length > 0) {
    const byNeed = new Map<string, number>();
    for (const u of unmatched) byNeed.set(u.requiredRatings ?? u.category, (byNeed.get(u.requiredRatings ?? u.category) ?? 0) + 1);
    console.log('  unmatched needs:');
    for (const [need, n] of [...byNeed].sort((a, b) => b[1] - a[1]).slice(0, 15)) console.log(`    ${n} × ${need}`);
  }
}

main().catch((e) => {
  console.error(e);
  process.exit(1);
});
