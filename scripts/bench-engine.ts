// Benchmark: a 500-motor panel through selectPanel (rules loaded once), and the same loads through
// the sizing functions alone (no rules engine). Prints both times and their ratio.
//   npm run -s bench:engine

import { performance } from 'node:perf_hooks';
import { branchConductor } from '../shared/calc/conductor';
import { motorDisconnect } from '../shared/calc/disconnect';
import { fullLoadCurrent } from '../shared/calc/flc';
import { nemaStarterSize } from '../shared/calc/nema-starter-size';
import { overloadMaxSetting } from '../shared/calc/overload';
import { branchProtection, motorKind } from '../shared/calc/scpd';
import { feederRollup } from '../shared/calc/feeder';
import { LoadSchema, type LoadInput, type SelectionInput } from '../shared/schemas/load';
import { createSelector } from '../shared/engine/selector';
import { loadRuleFiles } from '../server/engine/rule-files';

const MOTORS = 500;

/** deterministic pseudo-random (mulberry32) so every run times the same panel */
function rng(seed: number): () => number {
  let a = seed;
  return () => {
    a = (a + 0x6d2b79f5) | 0;
    let t = Math.imul(a ^ (a >>> 15), 1 | a);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

function panel(n: number): SelectionInput {
  const r = rng(2024);
  const pick = <T,>(xs: readonly T[]): T => xs[Math.floor(r() * xs.length)] as T;
  const envs = ['indoor-dry', 'indoor-dusty', 'outdoor', 'washdown', 'corrosive', 'class1-div2'] as const;
  const loads: LoadInput[] = [];
  for (let i = 0; i < n; i++) {
    const kind = r();
    const base = { tag: `M-${String(i + 1).padStart(3, '0')}`, environment: pick(envs), reversing: r() < 0.2, critical: r() < 0.1, inertia: pick(['normal', 'normal', 'high', 'very-high'] as const) };
    if (kind < 0.75) {
      loads.push({ ...base, supply: 'ac3', hp: pick([0.5, 1, 2, 3, 5, 7.5, 10, 15]), volts: 460, fla: undefined, serviceFactor: 1.15, codeLetter: 'G', speedControl: r() < 0.2 ? 'variable' : 'fixed', startingLimit: r() < 0.1 ? 'reduced-inrush' : 'none', jogging: r() < 0.05, reverseRotationHazard: r() < 0.1, cableLengthFt: Math.round(r() * 400), scpdType: pick(['inverse-time-breaker', 'dual-element-fuse'] as const) });
    } else if (kind < 0.9) {
      loads.push({ ...base, supply: 'ac1', hp: pick([0.5, 1, 2, 3]), volts: 230, singlePhaseType: 'capacitor-start' });
    } else {
      loads.push({ ...base, supply: 'dc', hp: pick([1, 2, 5, 10]), volts: 240, dcField: pick(['shunt', 'series', 'compound'] as const) });
    }
  }
  return { supply: { volts: 480, phases: 3, hz: 60, availableFaultKa: 65, ambientC: 30 }, loads };
}

function sizingOnly(input: SelectionInput): void {
  const loads = input.loads.map((l) => LoadSchema.parse(l));
  const branches = [];
  for (const l of loads) {
    const flc = fullLoadCurrent(l, '2023');
    overloadMaxSetting({ flaAmps: l.fla ?? flc.flcAmps, serviceFactor: l.serviceFactor, tempRiseC: l.tempRiseC }, '2023');
    const p = branchProtection({ flcAmps: flc.flcAmps, type: l.scpdType, motor: motorKind(l) }, '2023');
    branchConductor({ flcAmps: flc.flcAmps, material: l.conductor.material, tempRatingC: l.conductor.tempRatingC, ambientC: 30 }, '2023');
    motorDisconnect({ flcAmps: flc.flcAmps, hp: flc.hp }, '2023');
    if (l.supply !== 'dc') nemaStarterSize({ hp: flc.hp, phases: l.supply === 'ac3' ? 3 : 1, volts: l.volts, duty: 'normal', amps: flc.flcAmps }, '2023');
    branches.push({ tag: l.tag, flcAmps: flc.flcAmps, branchDeviceAmps: p.ratingAmps });
  }
  feederRollup({ branches, material: 'cu', tempRatingC: 75, ambientC: 30, ocpdFamily: 'breaker' }, '2023');
}

async function main(): Promise<void> {
  const input = panel(MOTORS);
  const t0 = performance.now();
  const selector = createSelector(loadRuleFiles());
  const tLoad = performance.now() - t0;

  await selector.selectPanel(panel(20)); // warm-up (JIT), not timed
  sizingOnly(panel(20));

  const runs = 5;
  const engineTimes: number[] = [];
  let out;
  for (let i = 0; i < runs; i++) {
    const t = performance.now();
    out = await selector.selectPanel(input);
    engineTimes.push(performance.now() - t);
  }
  const sizingTimes: number[] = [];
  for (let i = 0; i < runs; i++) {
    const t = performance.now();
    sizingOnly(input);
    sizingTimes.push(performance.now() - t);
  }
  const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)] as number;
  const e = median(engineTimes);
  const s = median(sizingTimes);
  const withErrors = out?.results.filter((r) => r.errors.length > 0).length ?? 0;
  console.log(`rule files loaded and engine built once: ${selector.ruleCount} rules in ${tLoad.toFixed(1)} ms`);
  console.log(`selectPanel, ${MOTORS} motors (rules + sizing + roll-up): median ${e.toFixed(1)} ms of ${runs} runs (${(e / MOTORS).toFixed(3)} ms per motor)`);
  console.log(`sizing functions alone, same ${MOTORS} motors: median ${s.toFixed(1)} ms`);
  console.log(`ratio engine / sizing alone: ${(e / s).toFixed(1)}x`);
  console.log(`budget 500 ms: ${e < 500 ? 'met' : 'NOT met'}; loads with errors: ${withErrors}; feeder ${out?.panel.feeder.minAmpacity} A min ampacity`);
}

main().catch((e) => {
  console.error(String(e));
  process.exit(1);
});
