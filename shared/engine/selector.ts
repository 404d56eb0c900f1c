// The selection runner. createSelector validates every rule file (a malformed one throws
// RuleFileError naming the file), groups them for running (rule-sets.ts), and returns selectLoad /
// selectPanel. Pure TypeScript: no file access, so it runs in the browser too.
//
// Per load, in stages (stages/), each returning its part of the trace: assumptions (FLC and the
// answers assumed) -> facts -> rules -> decisions (conflicts, required decisions) -> sizing (starter,
// protection, circuit, motor) -> cautions -> LoadSelection. Per panel: the loads in input order,
// then the feeder roll-up (rollup.ts).

import { ValidationError, zodIssues } from '../errors';
import { flcRefusal } from '../calc/flc';
import {
  LoadSchema,
  SelectionInputSchema,
  SupplySchema,
  type Load,
  type LoadInput,
  type SelectionInput,
  type Supply,
  type SupplyInput,
} from '../schemas/load';
import type { LoadSelection, SelectionOutput } from '../schemas/selection';
import { DEFAULT_CODE_EDITION, type CodeEdition } from '../standards/code-edition';
import { buildFacts } from './facts';
import { validateRuleFiles, type RuleFile } from './rule-file';
import { ruleSets, type RuleRunner } from './rule-sets';
import { panelRollupOf } from './rollup';
import { assumptions } from './stages/assumptions';
import { cautions } from './stages/cautions';
import { decide } from './stages/decide';
import { selectionOf } from './stages/result';
import { sizeCircuit } from './stages/sizing-conductors';
import { sizeMotor } from './stages/sizing-motor';
import { sizeProtection } from './stages/sizing-protection';
import { sizeStarter } from './stages/sizing-starter';
import type { StageContext } from './stages/stage';

export interface RuleFileInput {
  file: string;
  content: unknown;
}

/** The stages as the benchmark times them. */
export const STAGES = ['assumptions', 'facts', 'rules', 'decisions', 'sizing', 'cautions', 'result', 'rollup'] as const;
export type StageName = (typeof STAGES)[number];

/** Times each stage: `now` is a clock in ms (performance.now), `add` receives each stage's time. */
export interface StageProfile {
  now(): number;
  add(stage: StageName, ms: number): void;
}

export interface SelectorOptions {
  codeEdition?: CodeEdition;
  profile?: StageProfile;
  /** how the rules are run for each motor; by default only the rule sets its answers can fire (rule-sets.ts) */
  ruleRunner?: (rules: ReadonlyArray<RuleFile>) => RuleRunner;
}

export interface Selector {
  readonly codeEdition: CodeEdition;
  readonly ruleCount: number;
  selectLoad(load: LoadInput, supply: SupplyInput): Promise<LoadSelection>;
  selectPanel(input: SelectionInput): Promise<SelectionOutput>;
  /** The panel roll-up (430.24, 430.62(A)) from selections already made, without running the rules again. */
  panelRollup(supply: SupplyInput, loads: ReadonlyArray<LoadInput>, results: ReadonlyArray<LoadSelection>): SelectionOutput['panel'];
}

function parseOrThrow<T>(
  schema: {
    safeParse(
      v: unknown,
    ):
      | { success: true; data: T }
      | { success: false; error: { issues: ReadonlyArray<{ path: ReadonlyArray<PropertyKey>; message: string }> } };
  },
  value: unknown,
  prefix: string,
): T {
  const r = schema.safeParse(value);
  if (r.success) return r.data;
  const issues = zodIssues(r.error.issues).map((i) => ({ ...i, path: prefix ? (i.path ? `${prefix}.${i.path}` : prefix) : i.path }));
  throw new ValidationError('The selection input is not valid', issues);
}

/** A load the engine cannot size is refused as invalid input, its path naming the answer to correct. */
function refuseUnsizable(loads: ReadonlyArray<Load>, pathOf: (i: number, field: string) => string): void {
  const issues = loads.flatMap((l, i) => {
    const r = flcRefusal(l);
    return r ? [{ path: pathOf(i, r.path), message: r.message }] : [];
  });
  if (issues.length === 0) return;
  const first = issues[0] as { path: string; message: string };
  const message =
    issues.length === 1
      ? `This motor cannot be sized: ${first.message}`
      : `${issues.length} motors cannot be sized: ${issues.map((i) => `${i.path}: ${i.message}`).join('; ')}`;
  throw new ValidationError(message, issues);
}

export function createSelector(ruleFiles: ReadonlyArray<RuleFileInput>, options: SelectorOptions = {}): Selector {
  const edition = options.codeEdition ?? DEFAULT_CODE_EDITION;
  const rules = validateRuleFiles(ruleFiles);
  const byId = new Map<string, RuleFile>(rules.map((r) => [r.id, r]));
  const sets = (options.ruleRunner ?? ruleSets)(rules);
  const sub = (text: string) => text.replace(/\{edition\}/g, edition);
  const profile = options.profile;
  /** runs one stage, timed when a profile is given */
  function timed<T>(stage: StageName, fn: () => T): T {
    if (!profile) return fn();
    const t0 = profile.now();
    const out = fn();
    profile.add(stage, profile.now() - t0);
    return out;
  }

  async function selectParsed(load: Load, supply: Supply, raw: Record<string, unknown> | null): Promise<LoadSelection> {
    const ctx: StageContext = { load, supply, edition, ac: load.supply !== 'dc', phases: load.supply === 'ac3' ? 3 : 1 };
    const a = timed('assumptions', () => assumptions(ctx, raw));
    const facts = timed('facts', () => buildFacts(load, supply, { hp: a.hp, flcAmps: a.flc?.flcAmps ?? null, flaAmps: a.flaAmps }));
    const t0 = profile?.now() ?? 0;
    const results = await sets.run(facts);
    profile?.add('rules', profile.now() - t0);
    const d = timed('decisions', () => decide(ctx, results, byId, sub));
    const sized = timed('sizing', () => {
      const protection = sizeProtection(ctx, a, d.starterType);
      return {
        starter: sizeStarter(ctx, a, d.decisions, d.starterType),
        protection,
        // the branch device's rating is the circuit's rating for the termination rule (110.14(C)(1))
        circuit: sizeCircuit(ctx, a, d.starterType, protection.scpd?.ratingAmps ?? null),
        motor: sizeMotor(ctx, a, d.decisions, d.starterType),
      };
    });
    const c = timed('cautions', () => cautions(load, supply, d.starterType, sized.protection, sized.circuit, sized.motor.unbalance));
    return timed('result', () => selectionOf(ctx, { assumptions: a, decisions: d, ...sized, cautions: c }));
  }

  async function selectLoad(load: LoadInput, supply: SupplyInput): Promise<LoadSelection> {
    const s = parseOrThrow(SupplySchema, supply, 'supply');
    const l = parseOrThrow(LoadSchema, load, '');
    refuseUnsizable([l], (_i, field) => field);
    return selectParsed(l, s, load as Record<string, unknown>);
  }

  async function selectPanel(input: SelectionInput): Promise<SelectionOutput> {
    const parsed = parseOrThrow(SelectionInputSchema, input, '');
    const rawLoads = (input as { loads: Array<Record<string, unknown>> }).loads;
    refuseUnsizable(parsed.loads, (i, field) => `loads[${i}].${field}`);
    const results: LoadSelection[] = [];
    for (let i = 0; i < parsed.loads.length; i++) {
      results.push(await selectParsed(parsed.loads[i] as Load, parsed.supply, rawLoads[i] ?? null));
    }
    const panel = timed('rollup', () => panelRollupOf(parsed.supply, parsed.loads, results, edition));
    return { results, panel, codeEdition: `NEC ${edition}` };
  }

  function panelRollup(
    supply: SupplyInput,
    loads: ReadonlyArray<LoadInput>,
    results: ReadonlyArray<LoadSelection>,
  ): SelectionOutput['panel'] {
    const s = parseOrThrow(SupplySchema, supply, 'supply');
    const parsed = loads.map((l, i) => parseOrThrow(LoadSchema, l, `loads[${i}]`));
    return panelRollupOf(s, parsed, results, edition);
  }

  return { codeEdition: edition, ruleCount: rules.length, selectLoad, selectPanel, panelRollup };
}
