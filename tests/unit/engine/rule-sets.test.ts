// The rule sets (shared/engine/rule-sets.ts) run each motor through only the rules its facts can
// fire, in a shared Engine, with only the facts those rules read. They must fire exactly the rules a
// straightforward run fires: one Engine holding every rule file as written (its priority, its event),
// run with the motor's facts as a plain object. Compared fact by fact over the whole domain of every
// fact (and the thresholds the rule files use), then selection by selection over generated answers.
import fc from 'fast-check';
import { Engine, type RuleResult, type TopLevelCondition } from 'json-rules-engine';
import { describe, expect, it } from 'vitest';
import { FACT_NAMES, FACT_SCHEMAS, type FactName, type Facts } from '../../../shared/engine/facts';
import { validateRuleFiles, type RuleFile } from '../../../shared/engine/rule-file';
import { ruleSets, type RuleRunner } from '../../../shared/engine/rule-sets';
import { createSelector } from '../../../shared/engine/selector';
import { ENVIRONMENTS, SCPD_TYPES, type LoadInput, type SelectionInput, type SupplyInput } from '../../../shared/schemas/load';
import { ENGINE_MIX, motorLoads } from '../../../scripts/bench-data';
import { ruleFiles, selector } from './selector-setup';

const rules = validateRuleFiles(ruleFiles);

/** The reference: every rule in one Engine, as its file gives it, the facts passed as they are. */
function everyRule(all: ReadonlyArray<RuleFile>): RuleRunner {
  const engine = new Engine(
    all.map((r) => ({ name: r.id, priority: r.priority, conditions: r.conditions as unknown as TopLevelCondition, event: r.event })),
  );
  return { run: async (facts) => (await engine.run({ ...facts })).results };
}

const fired = (results: ReadonlyArray<RuleResult>) => results.map((r) => String(r.name)).sort();

// --- every fact over its whole domain ---------------------------------------------------------

/** the literal values the rule files compare each fact with */
const literals = new Map<FactName, unknown[]>();
function collect(node: unknown): void {
  if (Array.isArray(node)) node.forEach(collect);
  else if (node !== null && typeof node === 'object') {
    const o = node as Record<string, unknown>;
    if (typeof o.fact === 'string' && 'value' in o) {
      const list = literals.get(o.fact as FactName) ?? [];
      list.push(...(Array.isArray(o.value) ? o.value : [o.value]));
      literals.set(o.fact as FactName, list);
    } else Object.values(o).forEach(collect);
  }
}
for (const r of rules) collect(r.conditions);

interface ZodNode {
  _zod: { def: { type: string; innerType?: ZodNode; options?: ZodNode[]; entries?: Record<string, string>; values?: unknown[] } };
}

/** the values a fact can take: every enum member, both booleans, null where allowed, and each
 *  threshold a rule compares a number with, just below, at and just above it */
function domain(name: FactName, schema: ZodNode): unknown[] {
  const def = schema._zod.def;
  const used = literals.get(name) ?? [];
  switch (def.type) {
    case 'nullable':
      return [null, ...domain(name, def.innerType as ZodNode)];
    case 'enum':
      return Object.values(def.entries ?? {});
    case 'boolean':
      return [true, false];
    case 'literal':
      return def.values ?? [];
    case 'union':
      return (def.options ?? []).flatMap((o) => domain(name, o));
    case 'number': {
      const around = used.filter((v): v is number => typeof v === 'number').flatMap((t) => [t - 1, t - 0.5, t, t + 0.5, t + 1]);
      return [...new Set([0, 1, 5, 100, ...around])];
    }
    case 'string':
      return [...new Set(['G', ...used.filter((v) => typeof v === 'string')])];
    default:
      throw new Error(`fact ${name}: no generator for a ${def.type} schema`);
  }
}

const factsArb = fc.record(
  Object.fromEntries(
    FACT_NAMES.map((name) => [name, fc.constantFrom(...domain(name, FACT_SCHEMAS[name] as unknown as ZodNode))]),
  ) as unknown as { [K in FactName]: fc.Arbitrary<Facts[K]> },
);

describe('rule sets against a run of every rule', () => {
  it('fire exactly the rules every rule run fires, for facts across their whole domain', async () => {
    const sets = ruleSets(rules);
    const reference = everyRule(rules);
    const seen = new Set<string>();
    await fc.assert(
      fc.asyncProperty(factsArb, async (facts) => {
        const expected = fired(await reference.run(facts));
        expect(fired(await sets.run(facts))).toEqual(expected);
        for (const id of expected) seen.add(id);
      }),
      { numRuns: 3000, seed: 430 },
    );
    // the draw reaches every rule, so no rule escapes the comparison
    expect([...rules.map((r) => r.id)].filter((id) => !seen.has(id))).toEqual([]);
    // and motors whose facts differ share Engines: far fewer than the motors run
    expect(sets.engineCount).toBeGreaterThan(10);
    expect(sets.engineCount).toBeLessThan(3000);
  });

  it('leave a rule out when one of its numeric conditions fails (the motor is not run through it)', async () => {
    const sets = ruleSets(rules.filter((r) => r.id === 'long-run-voltage-drop'));
    const facts = (cableLengthFt: number | null) => ({ cableLengthFt }) as Facts;
    // long-run-voltage-drop: cableLengthFt greaterThan 250 (rule file; common practice)
    expect(fired(await sets.run(facts(251)))).toEqual(['long-run-voltage-drop']);
    expect(await sets.run(facts(250))).toEqual([]);
    expect(await sets.run(facts(null))).toEqual([]);
    expect(sets.engineCount).toBe(1);
  });

  // --- whole selections over generated answers ------------------------------------------------

  const plain = createSelector(ruleFiles, { ruleRunner: everyRule });

  const common = {
    tag: fc.constant('PT-1'),
    reversing: fc.boolean(),
    jogging: fc.boolean(),
    plugging: fc.boolean(),
    critical: fc.boolean(),
    reverseRotationHazard: fc.boolean(),
    duty: fc.constantFrom('continuous' as const, 'intermittent' as const),
    inertia: fc.constantFrom('normal' as const, 'high' as const, 'very-high' as const),
    environment: fc.option(fc.constantFrom(...ENVIRONMENTS), { nil: undefined }),
    scpdType: fc.constantFrom(...SCPD_TYPES),
    conductor: fc.record({
      material: fc.constantFrom('cu' as const, 'al' as const),
      tempRatingC: fc.constantFrom(60 as const, 75 as const, 90 as const),
    }),
    cableLengthFt: fc.option(fc.constantFrom(0, 50, 100, 249, 250, 251, 400, 1200), { nil: undefined }),
    lockedRotorWithstandS: fc.option(fc.constantFrom(5, 9.5, 10, 15, 20, 30), { nil: undefined }),
    startingLimit: fc.constantFrom('none' as const, 'reduced-inrush' as const),
    twoSpeed: fc.boolean(),
  };
  const ac3 = fc
    .record({
      ...common,
      supply: fc.constant('ac3' as const),
      hp: fc.constantFrom(0.5, 2, 5, 10, 25, 50, 100, 200),
      volts: fc.constantFrom(208, 230, 460, 575),
      codeLetter: fc.option(fc.constantFrom('B' as const, 'G' as const, 'L' as const), { nil: undefined }),
      rotor: fc.constantFrom('squirrel-cage' as const, 'wound-rotor' as const),
      leads: fc.option(fc.constantFrom(3 as const, 6 as const, 9 as const, 12 as const), { nil: undefined }),
      connection: fc.option(fc.constantFrom('wye' as const, 'delta' as const), { nil: undefined }),
      starterPreference: fc.option(fc.constantFrom('rvss' as const, 'wye-delta' as const, 'part-winding' as const), { nil: undefined }),
      insideDelta: fc.boolean(),
      speedControl: fc.constantFrom('fixed' as const, 'variable' as const),
      turndown: fc.option(fc.constantFrom(2, 10, 20, 100), { nil: undefined }),
      torque: fc.option(fc.constantFrom('variable' as const, 'constant' as const), { nil: undefined }),
    })
    .map((l) => {
      const out: Record<string, unknown> = { ...l };
      if (l.speedControl !== 'variable') {
        delete out.turndown;
        delete out.torque;
      }
      if (l.rotor === 'wound-rotor') delete out.starterPreference;
      if (l.leads === 3) out.insideDelta = false;
      return out as LoadInput;
    });
  const ac1 = fc.record({
    ...common,
    supply: fc.constant('ac1' as const),
    hp: fc.constantFrom(0.5, 1, 2, 3),
    volts: fc.constantFrom(115, 230),
    singlePhaseType: fc.option(
      fc.constantFrom('split-phase' as const, 'capacitor-start' as const, 'psc' as const, 'two-value-capacitor' as const),
      {
        nil: undefined,
      },
    ),
  }) as fc.Arbitrary<LoadInput>;
  const dc = fc.record({
    ...common,
    supply: fc.constant('dc' as const),
    hp: fc.constantFrom(1, 5, 10, 25),
    volts: fc.constant(240),
    dcField: fc.option(fc.constantFrom('shunt' as const, 'series' as const, 'compound' as const), { nil: undefined }),
    quickStop: fc.boolean(),
    speedControl: fc.constantFrom('fixed' as const, 'variable' as const),
  }) as fc.Arbitrary<LoadInput>;
  const supplyArb = fc.record({
    volts: fc.constant(480),
    phases: fc.constant(3 as const),
    hz: fc.constant(60 as const),
    availableFaultKa: fc.constantFrom(10, 35, 65),
    ambientC: fc.constantFrom(30, 45),
    voltageUnbalancePercent: fc.constantFrom(0, 1, 2, 3),
  }) as fc.Arbitrary<SupplyInput>;

  it('give the same selection, field for field, as a run of every rule, over generated answers', async () => {
    let selected = 0;
    await fc.assert(
      fc.asyncProperty(fc.oneof(ac3, ac1, dc), supplyArb, async (load, supply) => {
        const run = (s: typeof selector) => s.selectLoad(load, supply).catch((e: unknown) => ({ refused: String(e) }));
        const expected = await run(plain);
        expect(await run(selector)).toEqual(expected);
        if (!('refused' in expected)) selected++;
      }),
      { numRuns: 400 },
    );
    // most answers drawn are valid, so the comparison is of selections, not of refusals
    expect(selected).toBeGreaterThan(300);
  });

  it('give the same panel selection as a run of every rule for the 500 motors of the engine benchmark', async () => {
    const input: SelectionInput = motorLoads(500, ENGINE_MIX);
    const fast = await selector.selectPanel(input);
    expect(fast.results).toHaveLength(500);
    expect(fast).toEqual(await plain.selectPanel(input));
  });
});
