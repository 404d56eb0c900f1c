// The rule files grouped for running. Each rule's top-level "all" is read once, at load, for the
// conditions that compare one answer with literal values (equal, notEqual, in, notIn): a motor whose
// answer fails one of them cannot fire the rule, so the rule is left out of that motor's run. The
// motors whose answers leave the same rules in play share one json-rules-engine Engine, built the
// first time that rule set is needed and kept for the life of the selector. Only the Engines are
// kept, never a result: every motor's facts are built once and run through its rule set.

import { Engine, type RuleResult, type TopLevelCondition } from 'json-rules-engine';
import { isFactName, type Facts } from './facts';
import type { RuleFile } from './rule-file';

type Guard = (facts: Facts) => boolean;

function guardOf(c: Record<string, unknown>): Guard | null {
  const fact = c.fact;
  if (typeof fact !== 'string' || !isFactName(fact)) return null;
  const v = c.value;
  if (v !== null && typeof v === 'object' && !Array.isArray(v)) return null; // a fact reference
  const read = (f: Facts): unknown => f[fact];
  switch (c.operator) {
    case 'equal':
      return (f) => read(f) === v;
    case 'notEqual':
      return (f) => read(f) !== v;
    case 'in':
      return Array.isArray(v) ? (f) => v.includes(read(f)) : null;
    case 'notIn':
      return Array.isArray(v) ? (f) => !v.includes(read(f)) : null;
    default:
      return null;
  }
}

/** The necessary conditions of a rule: every literal comparison of its top-level "all". */
function guardsOf(rule: RuleFile): Guard[] {
  const all = (rule.conditions as { all?: unknown }).all;
  if (!Array.isArray(all)) return [];
  return all.flatMap((c) => (c && typeof c === 'object' ? (guardOf(c as Record<string, unknown>) ?? []) : []));
}

export interface RuleSets {
  /** the rules a motor with these facts may fire, run through their Engine */
  run(facts: Facts): Promise<RuleResult[]>;
  /** Engines built so far (one per distinct rule set met) */
  readonly engineCount: number;
}

export function ruleSets(rules: ReadonlyArray<RuleFile>): RuleSets {
  const guarded = rules.map((rule) => ({ rule, guards: guardsOf(rule) }));
  const engines = new Map<string, Engine>();

  function engineFor(facts: Facts): Engine | null {
    let key = '';
    const inPlay: RuleFile[] = [];
    for (const { rule, guards } of guarded) {
      const may = guards.every((g) => g(facts));
      key += may ? '1' : '0';
      if (may) inPlay.push(rule);
    }
    if (inPlay.length === 0) return null;
    let engine = engines.get(key);
    if (!engine) {
      engine = new Engine([], { allowUndefinedFacts: false, allowUndefinedConditions: false, replaceFactsInEventParams: false });
      // every rule at one engine priority: a single pass; the rule file's priority decides conflicts (decisions.ts)
      for (const r of inPlay)
        engine.addRule({
          name: r.id,
          priority: 1,
          conditions:
            r.conditions as unknown as TopLevelCondition /* cast: the rule-file schema checks the conditions; json-rules-engine's type is stricter than its runtime */,
          event: r.event,
        });
      engines.set(key, engine);
    }
    return engine;
  }

  // json-rules-engine keeps one run status per Engine: runs are chained, never concurrent.
  let queue: Promise<unknown> = Promise.resolve();
  return {
    run(facts) {
      const engine = engineFor(facts);
      if (!engine) return Promise.resolve([]);
      const next = queue.then(() => engine.run(facts)).then((r) => r.results);
      queue = next.catch(() => undefined);
      return next;
    },
    get engineCount() {
      return engines.size;
    },
  };
}
