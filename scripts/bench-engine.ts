// Benchmark: a 500-motor panel through selectPanel (rules loaded once), with the time of each
// selection stage, and the same loads through the sizing functions alone (no rules engine). Prints
// the times, the rules against the sizing stage of the same runs, and the engine against sizing alone.
//   npm run -s bench:engine

import { performance } from 'node:perf_hooks';
import { branchConductor } from '../shared/calc/conductor';
import { motorDisconnect } from '../shared/calc/disconnect';
import { fullLoadCurrent } from '../shared/calc/flc';
import { nemaStarterSize } from '../shared/calc/nema-starter-size';
import { overloadMaxSetting } from '../shared/calc/overload';
import { branchProtection, motorKind } from '../shared/calc/scpd';
import { feederRollup } from '../shared/calc/feeder';
import { LoadSchema, type SelectionInput } from '../shared/schemas/load';
import { createSelector, STAGES, type StageName } from '../shared/engine/selector';
import type { SelectionOutput } from '../shared/schemas/selection';
import { loadRuleFiles } from '../server/engine/rule-files';
import { ENGINE_MIX, median, motorLoads, timeRuns } from './bench-data';

const MOTORS = 500;

function sizingOnly(input: SelectionInput): void {
  const loads = input.loads.map((l) => LoadSchema.parse(l));
  const branches = [];
  for (const l of loads) {
    const flc = fullLoadCurrent(l, '2023');
    overloadMaxSetting({ flaAmps: l.fla ?? flc.flcAmps, serviceFactor: l.serviceFactor, tempRiseC: l.tempRiseC }, '2023');
    const p = branchProtection({ flcAmps: flc.flcAmps, type: l.scpdType, motor: motorKind(l) }, '2023');
    branchConductor({ flcAmps: flc.flcAmps, material: l.conductor.material, tempRatingC: l.conductor.tempRatingC, ambientC: 30 }, '2023');
    motorDisconnect({ flcAmps: flc.flcAmps, hp: flc.hp }, '2023');
    if (l.supply !== 'dc')
      nemaStarterSize({ hp: flc.hp, phases: l.supply === 'ac3' ? 3 : 1, volts: l.volts, duty: 'normal', amps: flc.flcAmps }, '2023');
    branches.push({ tag: l.tag, flcAmps: flc.flcAmps, branchDeviceAmps: p.ratingAmps });
  }
  feederRollup({ branches, material: 'cu', tempRatingC: 75, ambientC: 30, ocpdFamily: 'breaker' }, '2023');
}

async function main(): Promise<void> {
  const input = motorLoads(MOTORS, ENGINE_MIX);
  const stageMs = new Map<StageName, number>();
  const profile = {
    now: () => performance.now(),
    add: (stage: StageName, ms: number) => stageMs.set(stage, (stageMs.get(stage) ?? 0) + ms),
  };
  const t0 = performance.now();
  const selector = createSelector(loadRuleFiles(), { profile });
  const tLoad = performance.now() - t0;

  await selector.selectPanel(motorLoads(20, ENGINE_MIX)); // warm-up (JIT), not timed
  sizingOnly(motorLoads(20, ENGINE_MIX));

  const runs = 5;
  let out: SelectionOutput | undefined;
  const perStage = new Map<StageName, number[]>(STAGES.map((st) => [st, []]));
  const engineTimes = await timeRuns(runs, async () => {
    stageMs.clear();
    out = await selector.selectPanel(input);
    for (const st of STAGES) perStage.get(st)?.push(stageMs.get(st) ?? 0);
  });
  const sizingTimes = await timeRuns(runs, () => sizingOnly(input));
  const e = median(engineTimes);
  const s = median(sizingTimes);
  const withErrors = out?.results.filter((r) => r.errors.length > 0).length ?? 0;
  console.log(`rule files loaded and engine built once: ${selector.ruleCount} rules in ${tLoad.toFixed(1)} ms`);
  console.log(
    `selectPanel, ${MOTORS} motors (rules + sizing + roll-up): median ${e.toFixed(1)} ms of ${runs} runs (${(e / MOTORS).toFixed(3)} ms per motor)`,
  );
  const stage = (st: StageName) => median(perStage.get(st) ?? [0]);
  console.log(`per stage, median of ${runs} runs: ${STAGES.map((st) => `${st} ${stage(st).toFixed(1)} ms`).join(', ')}`);
  console.log(`ratio rules / sizing stage, same runs: ${(stage('rules') / stage('sizing')).toFixed(1)}x (goal at most 5x)`);
  console.log(`sizing functions alone, same ${MOTORS} motors: median ${s.toFixed(1)} ms`);
  console.log(`ratio rules stage / sizing alone: ${(stage('rules') / s).toFixed(1)}x`);
  console.log(`ratio engine / sizing alone: ${(e / s).toFixed(1)}x`);
  console.log(
    `budget 500 ms: ${e < 500 ? 'met' : 'NOT met'}; loads with errors: ${withErrors}; feeder ${out?.panel.feeder.minAmpacity} A min ampacity`,
  );
}

main().catch((e) => {
  console.error(String(e));
  process.exit(1);
});
