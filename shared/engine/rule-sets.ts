// The rule files grouped for running. Each rule's conditions are read once, at load, for the
// comparisons of one answer with a literal value (equal, notEqual, in, notIn and the four numeric
// ones, each as json-rules-engine's operator compares): a motor whose answers fail them cannot fire
// the rule, so the rule is left out of that motor's run. When a rule's conditions are all such
// comparisons (under all, any and not) the whole of them is the test; otherwise each member of its
// top-level "all" that is one. The motors whose answers leave the same rules in play share one
// json-rules-engine Engine, built the first time that rule set is needed and kept for the life of
// the selector. Only the Engines are kept, never a result: every motor's facts are built once and
// run, through json-rules-engine, against every rule of its set as the rule file writes it.
//
// What a run costs is mostly json-rules-engine's own work per rule and per run, so each run is given
// only what it needs: the rules it may fire, the facts those rules read (each a constant Fact without
// a cache key: a run's facts never change, and hashing every fact's key on every run was the largest
// part of the cost), and each rule's event without its params (the decision stage reads a fired
// rule's params from its rule file, by name, so the engine no longer copies them into every result).

import { Engine, Fact, type RuleResult, type TopLevelCondition } from 'json-rules-engine';
import { isFactName, type FactName, type Facts } from './facts';
import type { RuleFile } from './rule-file';

type Guard = (facts: Facts) => boolean;

/** json-rules-engine's test before a numeric comparison: a fact that does not read as a number fails it */
const numeric = (x: unknown): boolean => Number.parseFloat(x as string).toString() !== 'NaN';

/** One fact compared with a literal value, as json-rules-engine's operator compares it. */
function comparison(c: Record<string, unknown>): Guard | null {
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
    case 'lessThan':
      return typeof v === 'number' ? (f) => numeric(read(f)) && (read(f) as number) < v : null;
    case 'lessThanInclusive':
      return typeof v === 'number' ? (f) => numeric(read(f)) && (read(f) as number) <= v : null;
    case 'greaterThan':
      return typeof v === 'number' ? (f) => numeric(read(f)) && (read(f) as number) > v : null;
    case 'greaterThanInclusive':
      return typeof v === 'number' ? (f) => numeric(read(f)) && (read(f) as number) >= v : null;
    default:
      return null; // contains, doesNotContain: left to the engine
  }
}

const present = (g: Guard | null): g is Guard => g !== null;

/** A condition as a test of the facts, when every comparison in it is one `comparison` reads; null
 *  otherwise. "all" and "any" of nothing hold, as they do in json-rules-engine. */
function exactGuard(node: unknown): Guard | null {
  if (node === null || typeof node !== 'object' || Array.isArray(node)) return null;
  const c = node as Record<string, unknown>;
  if (Array.isArray(c.all)) {
    const gs = c.all.map(exactGuard);
    if (!gs.every(present)) return null;
    return (f) => {
      for (const g of gs) if (!g(f)) return false;
      return true;
    };
  }
  if (Array.isArray(c.any)) {
    const gs = c.any.map(exactGuard);
    if (!gs.every(present)) return null;
    return (f) => {
      for (const g of gs) if (g(f)) return true;
      return gs.length === 0;
    };
  }
  if ('not' in c) {
    const g = exactGuard(c.not);
    return g ? (f) => !g(f) : null;
  }
  return comparison(c);
}

/** The necessary conditions of a rule: its whole conditions when they can be read as a test, else
 *  each member of its top-level "all" that can. */
function guardsOf(rule: RuleFile): Guard[] {
  const whole = exactGuard(rule.conditions);
  if (whole) return [whole];
  const all = (rule.conditions as { all?: unknown }).all;
  return Array.isArray(all) ? all.map(exactGuard).filter(present) : [];
}

/** Every fact a rule's conditions read, as the compared fact or as a value `{ "fact": ... }`. */
export function factsRead(node: unknown, into: Set<FactName> = new Set()): Set<FactName> {
  if (Array.isArray(node)) for (const n of node) factsRead(n, into);
  else if (node !== null && typeof node === 'object') {
    for (const [k, v] of Object.entries(node)) {
      if (k === 'fact' && typeof v === 'string' && isFactName(v)) into.add(v);
      else factsRead(v, into);
    }
  }
  return into;
}

/** How the selector runs the rules for one motor: the rules that fired, by rule id as `name`. */
export interface RuleRunner {
  run(facts: Facts): Promise<RuleResult[]>;
}

export interface RuleSets extends RuleRunner {
  /** the rules a motor with these facts may fire, run through their Engine */
  run(facts: Facts): Promise<RuleResult[]>;
  /** Engines built so far (one per distinct rule set met) */
  readonly engineCount: number;
}

interface RuleSet {
  engine: Engine;
  /** the facts this set's rules read: the only ones its runs are given */
  reads: FactName[];
}

export function ruleSets(rules: ReadonlyArray<RuleFile>): RuleSets {
  const guarded = rules.map((rule) => ({ rule, guards: guardsOf(rule) }));
  const sets = new Map<string, RuleSet>();

  /** whether a motor with these facts passes every guard of a rule */
  const mayFire = (guards: ReadonlyArray<Guard>, facts: Facts): boolean => {
    for (const g of guards) if (!g(facts)) return false;
    return true;
  };

  function setFor(facts: Facts): RuleSet | null {
    let key = '';
    for (const { guards } of guarded) key += mayFire(guards, facts) ? '1' : '0';
    if (!key.includes('1')) return null;
    let set = sets.get(key);
    if (!set) {
      const inPlay = guarded.filter((_, i) => key[i] === '1').map((g) => g.rule);
      const engine = new Engine([], { allowUndefinedFacts: false, allowUndefinedConditions: false, replaceFactsInEventParams: false });
      const reads = new Set<FactName>();
      // every rule at one engine priority: a single pass; the rule file's priority decides conflicts (decisions.ts)
      for (const r of inPlay) {
        engine.addRule({
          name: r.id,
          priority: 1,
          conditions:
            r.conditions as unknown as TopLevelCondition /* cast: the rule-file schema checks the conditions; json-rules-engine's type is stricter than its runtime */,
          event: { type: r.event.type },
        });
        factsRead(r.conditions, reads);
      }
      set = { engine, reads: [...reads] };
      sets.set(key, set);
    }
    return set;
  }

  // json-rules-engine keeps one run status per Engine: runs are chained, never concurrent.
  let queue: Promise<unknown> = Promise.resolve();
  return {
    run(facts) {
      const set = setFor(facts);
      if (!set) return Promise.resolve([]);
      const given: Record<string, Fact> = {};
      for (const name of set.reads) given[name] = new Fact(name, facts[name], { cache: false });
      const next = queue.then(() => set.engine.run(given)).then((r) => r.results);
      queue = next.catch(() => undefined);
      return next;
    },
    get engineCount() {
      return sets.size;
    },
  };
}
