// What the benchmarks share: a deterministic motor list of a given mix, and timing helpers.
import { performance } from 'node:perf_hooks';
import type { LoadInput, SelectionInput } from '../shared/schemas/load';

type Environment = NonNullable<LoadInput['environment']>;

/** How a benchmark's motor list is drawn. */
export interface MotorMix {
  /** seed of the pseudo-random draw: the same seed gives the same list on every run */
  seed: number;
  /** one environment for every motor, or a list to draw from */
  environment: Environment | readonly Environment[];
  inertia: readonly NonNullable<LoadInput['inertia']>[];
  /** a draw below this is a three-phase motor */
  ac3Below: number;
  /** a draw from ac3Below up to this is a single-phase motor; the rest are DC */
  ac1Below: number;
  ac3Hp: readonly number[];
  /** share of three-phase motors on a drive */
  variableSpeedShare: number;
  maxCableFt: number;
  dcFields: readonly NonNullable<LoadInput['dcField']>[];
}

/** scripts/bench-engine.ts: a 500-motor panel of every environment and motor type. */
export const ENGINE_MIX: MotorMix = {
  seed: 2024,
  environment: ['indoor-dry', 'indoor-dusty', 'outdoor', 'washdown', 'corrosive', 'class1-div2'],
  inertia: ['normal', 'normal', 'high', 'very-high'],
  ac3Below: 0.75,
  ac1Below: 0.9,
  ac3Hp: [0.5, 1, 2, 3, 5, 7.5, 10, 15],
  variableSpeedShare: 0.2,
  maxCableFt: 400,
  dcFields: ['shunt', 'series', 'compound'],
};

/** scripts/bench-bom.ts: a 200-motor job in one dusty plant room. */
export const BOM_MIX: MotorMix = {
  seed: 4242,
  environment: 'indoor-dusty',
  inertia: ['normal', 'normal', 'high'],
  ac3Below: 0.8,
  ac1Below: 0.92,
  ac3Hp: [0.5, 1, 2, 3, 5, 7.5, 10, 15, 20, 25, 40, 50],
  variableSpeedShare: 0.25,
  maxCableFt: 300,
  dcFields: ['shunt', 'compound'],
};

/** deterministic pseudo-random (mulberry32) so every run times the same motors */
function rng(seed: number): () => number {
  let a = seed;
  return () => {
    a = (a + 0x6d2b79f5) | 0;
    let t = Math.imul(a ^ (a >>> 15), 1 | a);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** n motors drawn by the mix, on a 480 V, 65 kA supply. */
export function motorLoads(n: number, mix: MotorMix): SelectionInput {
  const r = rng(mix.seed);
  const pick = <T>(xs: readonly T[]): T => xs[Math.floor(r() * xs.length)] as T;
  const env = mix.environment;
  const loads: LoadInput[] = [];
  for (let i = 0; i < n; i++) {
    const kind = r();
    const base = {
      tag: `M-${String(i + 1).padStart(3, '0')}`,
      environment: typeof env === 'string' ? env : pick(env),
      reversing: r() < 0.2,
      critical: r() < 0.1,
      inertia: pick(mix.inertia),
    };
    if (kind < mix.ac3Below) {
      loads.push({
        ...base,
        supply: 'ac3',
        hp: pick(mix.ac3Hp),
        volts: 460,
        serviceFactor: 1.15,
        codeLetter: 'G',
        speedControl: r() < mix.variableSpeedShare ? 'variable' : 'fixed',
        startingLimit: r() < 0.1 ? 'reduced-inrush' : 'none',
        jogging: r() < 0.05,
        reverseRotationHazard: r() < 0.1,
        cableLengthFt: Math.round(r() * mix.maxCableFt),
        scpdType: pick(['inverse-time-breaker', 'dual-element-fuse'] as const),
      });
    } else if (kind < mix.ac1Below) {
      loads.push({ ...base, supply: 'ac1', hp: pick([0.5, 1, 2, 3]), volts: 230, singlePhaseType: 'capacitor-start' });
    } else {
      loads.push({ ...base, supply: 'dc', hp: pick([1, 2, 5, 10]), volts: 240, dcField: pick(mix.dcFields) });
    }
  }
  return { supply: { volts: 480, phases: 3, hz: 60, availableFaultKa: 65, ambientC: 30 }, loads };
}

export const median = (xs: number[]): number => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!;

/** Runs fn `runs` times (awaiting it when it returns a promise); the milliseconds of each run. */
export async function timeRuns(runs: number, fn: () => unknown): Promise<number[]> {
  const times: number[] = [];
  for (let i = 0; i < runs; i++) {
    const t = performance.now();
    const result = fn();
    if (result instanceof Promise) await result;
    times.push(performance.now() - t);
  }
  return times;
}
