// Motors at another voltage than the panel's supply (a 230 V or 115 V single-phase motor, a 240 V DC
// motor on a 480 V three-phase panel): which source each needs, and — for the motors fed from the
// panel (`fedFrom: "panel"`, the default) — the transformers (one per other AC system) and DC supplies
// the panel carries for them, sized from those motors, with their primary currents for the feeder
// (430.24, 430.62(A), 430.63) and the panel's full-load current (409.110). A motor with
// `fedFrom: "external"` is left out of both, with a note.

import type { Load, Supply } from '../schemas/load';
import type { ExternalMotor, LoadSelection, OtherSource, OtherSourceMotor, SupplyKind } from '../schemas/selection';
import { nec, type CodeEdition } from '../standards/code-edition';
import { nextHigherStandard } from '../standards/nec-table-240-6a';
import { nominalSystemVolts } from '../standards/nominal-system-voltages';
import type { FeederBranch, FeederOtherLoad } from './feeder';
import { ratedAmps, transformerKva, transformerProtection } from './transformer';
import { round2 } from './round';

const SQRT3 = Math.sqrt(3);

/**
 * The AC line a DC drive's armature voltage is usually fed from (common practice, from memory):
 * 90 V from 120 V single-phase, 180 V from 240 V single-phase, 240 V from 240 V three-phase,
 * 500 V from 480 V and 550 V from 600 V three-phase.
 */
const DC_DRIVE_LINE: Record<number, { phases: 1 | 3; volts: number }> = {
  90: { phases: 1, volts: 120 },
  180: { phases: 1, volts: 240 },
  240: { phases: 3, volts: 240 },
  500: { phases: 3, volts: 480 },
  550: { phases: 3, volts: 600 },
};
/** AC line current of a full-wave bridge with continuous DC current: 0.816 × Idc three-phase, 1.0 × Idc single-phase (from memory). */
const BRIDGE_LINE_FACTOR = { 1: 1, 3: 0.816 } as const;
/** DC supply input: output kW / 0.85 (efficiency about 0.9 × power factor about 0.95; common practice estimate). */
const DC_SUPPLY_KVA_PER_KW = 1 / 0.85;

/** Where a motor's power comes from. */
export type SourceNeed =
  | { on: 'bus' }
  | { on: 'bus-dc-drive'; amps: number; note: string }
  | {
      on: 'transformer';
      key: string;
      phases: 1 | 3;
      secondaryVolts: number;
      secondaryLabel: string;
      splitPhase: boolean;
      circuitVolts: number;
      amps: number;
      note?: string;
    }
  | { on: 'dc-supply'; key: string; dcVolts: number; amps: number }
  | { on: 'none'; reason: string };

const SECONDARY_LABEL: Record<number, string> = { 208: '208Y/120 V', 240: '240 V', 480: '480Y/277 V', 600: '600 V', 120: '120 V' };

function acNeed(
  motorPhases: 1 | 3,
  circuit: number,
  supply: Pick<Supply, 'phases'>,
  amps: number,
): Extract<SourceNeed, { on: 'transformer' }> {
  if (motorPhases === 1 && (circuit === 120 || circuit === 240)) {
    return {
      on: 'transformer',
      key: '1-240/120',
      phases: 1,
      secondaryVolts: 240,
      secondaryLabel: '240/120 V single-phase',
      splitPhase: true,
      circuitVolts: circuit,
      amps,
    };
  }
  if (supply.phases === 1) {
    return {
      on: 'transformer',
      key: `1-${circuit}`,
      phases: 1,
      secondaryVolts: circuit,
      secondaryLabel: `${circuit} V single-phase`,
      splitPhase: false,
      circuitVolts: circuit,
      amps,
    };
  }
  const label = `${SECONDARY_LABEL[circuit] ?? `${circuit} V`} three-phase`;
  return {
    on: 'transformer',
    key: `3-${circuit}`,
    phases: 3,
    secondaryVolts: circuit,
    secondaryLabel: label,
    splitPhase: false,
    circuitVolts: circuit,
    amps,
  };
}

/** The source a motor needs on this supply (its selection gives the current it draws). */
export function sourceNeed(
  load: Pick<Load, 'supply' | 'volts'>,
  selection: Pick<LoadSelection, 'flcAmps' | 'starter'>,
  supply: Pick<Supply, 'volts' | 'phases'>,
): SourceNeed {
  const system = nominalSystemVolts(supply.volts);
  if (load.supply === 'dc') {
    const line = selection.starter.type === 'dc-drive' ? DC_DRIVE_LINE[load.volts] : undefined;
    if (!line) return { on: 'dc-supply', key: `dc-${load.volts}`, dcVolts: load.volts, amps: selection.flcAmps };
    const amps = round2(selection.flcAmps * BRIDGE_LINE_FACTOR[line.phases]);
    const note = `DC drive: AC line current ${BRIDGE_LINE_FACTOR[line.phases]} × ${selection.flcAmps} A = ${amps} A at ${line.volts} V ${line.phases === 3 ? 'three' : 'single'}-phase (full-wave bridge, from memory); use the drive's rated input current when known`;
    if (line.volts === system && (line.phases === 1 || supply.phases === 3)) return { on: 'bus-dc-drive', amps, note };
    return { ...acNeed(line.phases, line.volts, supply, amps), note };
  }
  const circuit = nominalSystemVolts(load.volts);
  // a motor rated at the supply's own voltage (say 400 V on a 400 V supply, outside the nominal systems) is on the bus too
  if (load.volts === supply.volts || (circuit !== null && circuit === system)) return { on: 'bus' };
  if (circuit === null)
    return {
      on: 'none',
      reason: `rated ${load.volts} V is outside the nominal system voltages (120, 208, 240, 480, 600 V): no standard transformer secondary`,
    };
  return acNeed(load.supply === 'ac1' ? 1 : 3, circuit, supply, selection.flcAmps);
}

/** The source a motor needs, in words ("a 240/120 V single-phase source", "a 240 V DC supply"), or null on the panel's own bus. */
export function sourceNeedWords(need: SourceNeed): string | null {
  switch (need.on) {
    case 'bus':
    case 'bus-dc-drive':
      return null;
    case 'transformer':
      return `${need.secondaryLabel} (a transformer)`;
    case 'dc-supply':
      return `${need.dcVolts} V DC (a DC supply)`;
    case 'none':
      return need.reason;
  }
}

export interface OtherSourcesResult {
  sources: OtherSource[];
  externalMotors: ExternalMotor[];
  /** DC drives fed at the supply voltage: motor branches of the feeder at their AC line current */
  branches: FeederBranch[];
  /** each source's primary current with its primary device, for the feeder */
  otherLoads: FeederOtherLoad[];
  notes: string[];
  errors: string[];
}

interface Group {
  need: Extract<SourceNeed, { on: 'transformer' } | { on: 'dc-supply' }>;
  motors: OtherSourceMotor[];
  notes: string[];
}

/**
 * The panel's other sources. `results` are the motors' selections in the order of `loads`; motors
 * whose selection has errors, and three-phase motors on a single-phase supply, are left to the
 * feeder roll-up's own errors.
 */
export function otherSources(
  supply: Supply,
  loads: readonly Load[],
  results: readonly LoadSelection[],
  edition: CodeEdition,
): OtherSourcesResult {
  const out: OtherSourcesResult = { sources: [], externalMotors: [], branches: [], otherLoads: [], notes: [], errors: [] };
  const groups = new Map<string, Group>();
  results.forEach((r, i) => {
    const load = loads[i];
    if (!load || r.flcAmps <= 0 || r.scpd.ratingAmps <= 0) return;
    if (load.supply === 'ac3' && supply.phases === 1) return;
    const need = sourceNeed(load, r, supply);
    if (need.on === 'bus') return;
    if (need.on === 'bus-dc-drive') {
      out.branches.push({ tag: r.tag, flcAmps: need.amps, branchDeviceAmps: r.scpd.ratingAmps });
      out.notes.push(`${r.tag}: ${need.note}; counted on the feeder`);
      return;
    }
    if (need.on === 'none' && load.fedFrom !== 'external') {
      out.errors.push(`${r.tag}: ${need.reason}; left out of the feeder`);
      return;
    }
    if (load.fedFrom === 'external' || need.on === 'none') {
      const needs = sourceNeedWords(need) ?? '';
      out.externalMotors.push({ tag: r.tag, supply: load.supply as SupplyKind, volts: load.volts, needs });
      out.notes.push(
        `${r.tag}: rated ${load.volts} V ${load.supply === 'dc' ? 'DC' : load.supply === 'ac1' ? 'single-phase' : 'three-phase'}, fed from a source outside the panel (${needs}): left out of the feeder and the panel's full-load current`,
      );
      return;
    }
    let g = groups.get(need.key);
    if (!g) groups.set(need.key, (g = { need, motors: [], notes: [] }));
    g.motors.push({
      tag: r.tag,
      supply: load.supply as SupplyKind,
      volts: load.volts,
      amps: need.amps,
      circuitVolts: need.on === 'transformer' ? need.circuitVolts : need.dcVolts,
    });
    if (need.on === 'transformer' && need.note) g.notes.push(`${r.tag}: ${need.note}`);
  });

  // source tags T1, T2 … and DC1 … that no motor of the panel carries
  const motorTags = new Set(results.map((r) => r.tag.toUpperCase()));
  let t = 0;
  let d = 0;
  const nextTag = (prefix: string, n: number): [string, number] => {
    let k = n + 1;
    while (motorTags.has(`${prefix}${k}`)) k++;
    return [`${prefix}${k}`, k];
  };
  const family = supply.feeder.ocpdType === 'inverse-time-breaker' ? 'breaker' : 'fuse';
  for (const g of groups.values()) {
    const tags = g.motors.map((m) => m.tag).join(', ');
    try {
      if (g.need.on === 'transformer') {
        const n = g.need;
        const [tag, tn] = nextTag('T', t);
        t = tn;
        const size = transformerKva({ phases: n.phases, secondaryVolts: n.secondaryVolts, splitPhase: n.splitPhase, loads: g.motors });
        const primaryAmps = ratedAmps(size.kva, supply.volts, n.phases);
        const secondaryAmps = ratedAmps(size.kva, n.secondaryVolts, n.phases);
        const p = transformerProtection({ primaryAmps, secondaryAmps }, edition);
        out.sources.push({
          kind: 'transformer',
          tag,
          description: `${size.kva} kVA transformer ${supply.volts}-${n.secondaryLabel}`,
          phases: n.phases,
          primaryVolts: supply.volts,
          secondaryVolts: n.secondaryVolts,
          secondaryLabel: n.secondaryLabel,
          loadKva: size.loadKva,
          kva: size.kva,
          secondaryAmps,
          primaryAmps,
          primaryProtection: p.primary,
          secondaryProtection: p.secondary,
          motors: g.motors,
          basis: `sized as the feeder rule ${nec(edition, '430.24')} counts motors; protected per ${nec(edition, 'Table 450.3(B)')}`,
          notes: [
            ...size.steps,
            `rated ${primaryAmps} A primary at ${supply.volts} V, ${secondaryAmps} A secondary at ${n.secondaryVolts} V`,
            ...g.notes,
            'secondary conductors to the first device: the transformer secondary rules of 240.21(C); the secondary device also protects the motors’ bus',
          ],
        });
        out.otherLoads.push({ tag, amps: primaryAmps, deviceAmps: p.primary.ratingAmps });
        out.notes.push(
          `${tag}: ${tags} fed from a ${size.kva} kVA ${supply.volts}-${n.secondaryLabel} transformer in the panel; its rated primary current ${primaryAmps} A is counted in the feeder and the full-load current`,
        );
      } else {
        const n = g.need;
        const [tag, dn] = nextTag('DC', d);
        d = dn;
        const largest = Math.max(...g.motors.map((m) => m.amps));
        const sum = g.motors.reduce((s, m) => s + m.amps, 0);
        const outputAmps = round2(sum + 0.25 * largest);
        const outputKw = round2((outputAmps * n.dcVolts) / 1000);
        const inputKva = outputKw * DC_SUPPLY_KVA_PER_KW;
        const phases = supply.phases;
        const primaryAmps = round2((inputKva * 1000) / (phases === 3 ? SQRT3 * supply.volts : supply.volts));
        const maxAmps = round2(1.25 * primaryAmps);
        const ratingAmps = nextHigherStandard(maxAmps, edition, family);
        out.sources.push({
          kind: 'dc-supply',
          tag,
          description: `DC supply (rectifier) ${supply.volts} V ${phases === 3 ? 'three' : 'single'}-phase in, ${n.dcVolts} V DC ≥ ${outputAmps} A out`,
          phases,
          primaryVolts: supply.volts,
          secondaryVolts: n.dcVolts,
          secondaryLabel: `${n.dcVolts} V DC`,
          loadKva: outputKw,
          kva: null,
          secondaryAmps: outputAmps,
          primaryAmps,
          primaryProtection: {
            method: 'input',
            percent: 125,
            maxAmps,
            ratingAmps,
            basis: `125 % of the estimated input current ${primaryAmps} A, next higher standard rating (Table 240.6(A)); common practice — the supply maker's instructions take precedence`,
          },
          secondaryProtection: null,
          motors: g.motors,
          basis: `output current as the feeder rule ${nec(edition, '430.24')} counts motors; input estimated (common practice)`,
          notes: [
            `${round2(sum)} A of DC motor current + 25 % of the largest motor's ${largest} A = ${outputAmps} A at ${n.dcVolts} V = ${outputKw} kW`,
            `input ≈ ${outputKw} kW / 0.85 (efficiency × power factor, common practice) = ${round2(inputKva)} kVA → ${primaryAmps} A at ${supply.volts} V; use the supply's rated input current when chosen`,
          ],
        });
        out.otherLoads.push({ tag, amps: primaryAmps, deviceAmps: ratingAmps });
        out.notes.push(
          `${tag}: ${tags} fed from a ${n.dcVolts} V DC supply in the panel; its estimated input current ${primaryAmps} A is counted in the feeder and the full-load current`,
        );
      }
    } catch (e) {
      out.errors.push(`${tags}: no source sized in the panel (${(e as Error).message}); left out of the feeder`);
    }
  }
  return out;
}

export interface SourcesSummary {
  sources: OtherSource[];
  externalMotors: ExternalMotor[];
  /** one sentence per source and per motor fed from outside the panel, for the Motors page, the checks and the submittal */
  lines: string[];
}

const kindWords = (m: { supply: SupplyKind; volts: number }) =>
  `${m.volts} V ${m.supply === 'dc' ? 'DC' : m.supply === 'ac1' ? 'single-phase' : 'three-phase'}`;

/** The panel's other sources and its motors fed from outside it, in words. */
export function sourcesSummary(
  rollup: { otherSources?: OtherSource[]; externalMotors?: ExternalMotor[] } | null | undefined,
): SourcesSummary {
  const sources = rollup?.otherSources ?? [];
  const externalMotors = rollup?.externalMotors ?? [];
  const lines: string[] = [];
  for (const s of sources) {
    const motors = s.motors.map((m) => `${m.tag} (${kindWords(m)})`).join(', ');
    const prot = `${s.primaryProtection.ratingAmps} A primary${s.secondaryProtection ? `, ${s.secondaryProtection.ratingAmps} A secondary` : ''} protection`;
    lines.push(
      `${s.tag}: ${motors} fed from ${s.kind === 'transformer' ? `a ${s.kva} kVA ${s.primaryVolts}-${s.secondaryLabel} transformer` : `a ${s.secondaryLabel} supply (${s.secondaryAmps} A)`} in the panel; ${prot}; ${s.primaryAmps} A at ${s.primaryVolts} V counted in the feeder and the full-load current.`,
    );
  }
  for (const m of externalMotors) {
    lines.push(
      `${m.tag} (${kindWords(m)}) needs ${m.needs}: fed from a source outside the panel, left out of the feeder and the panel's full-load current — the source and its protection are someone else's to provide.`,
    );
  }
  return { sources, externalMotors, lines };
}

/** Whether a motor of this kind and rated voltage needs a source other than the panel's own bus (DC motors always do; a DC drive at the supply voltage is its own rectifier, see sourceNeed). */
export function needsOtherSource(load: { supply?: string; volts?: number }, supplyVolts: number): boolean {
  if (load.supply === 'dc') return true;
  if (typeof load.volts !== 'number' || !Number.isFinite(load.volts)) return false;
  return nominalSystemVolts(load.volts) !== nominalSystemVolts(supplyVolts);
}

/** What a motor's bucket is fed from, for its one-line: the panel's feeder bus (null), one of its other sources, or a source outside it. */
export function motorFeed(
  rollup: { otherSources?: OtherSource[]; externalMotors?: ExternalMotor[] } | null | undefined,
  tag: string,
): { source: OtherSource; external: null } | { source: null; external: ExternalMotor } | null {
  const source = (rollup?.otherSources ?? []).find((s) => s.motors.some((m) => m.tag === tag));
  if (source) return { source, external: null };
  const external = (rollup?.externalMotors ?? []).find((m) => m.tag === tag);
  return external ? { source: null, external } : null;
}

/** The bill-of-materials bucket of a source: "T1 transformer", "DC1 DC supply". */
export function sourceBucket(source: Pick<OtherSource, 'tag' | 'kind'>): string {
  return `${source.tag} ${source.kind === 'transformer' ? 'transformer' : 'DC supply'}`;
}

/** Whether a bill-of-materials bucket is a source's (see sourceBucket). */
export function isSourceBucket(bucket: string): boolean {
  return /^(T|DC)\d+ (transformer|DC supply)$/.test(bucket);
}
