// Stage 2, decisions: the fired rules, highest priority first, each key kept by the first rule that
// set it (decisions.ts); a conflict at equal priority, a required decision left undecided and a
// starter the motor cannot take are errors on the load. Returns the rules' part of the trace.

import type { RuleResult } from 'json-rules-engine';
import type { StarterType } from '../../schemas/selection';
import { REQUIRED_DECISIONS, STARTER_NEEDS, type DecisionKey, type Decisions } from '../decisions';
import type { RuleFile } from '../rule-file';
import { emptyReport, type StageContext, type StageReport } from './stage';
import { DECISION_LABELS, decisionValueLabel } from '../../labels';

export interface DecisionsStage extends StageReport {
  decisions: Decisions;
  starterType: StarterType;
  /** the basis of the rule that decided a key, or "fallback (no rule)" */
  ruleBasis(key: DecisionKey): string;
}

function formatValue(v: unknown): string {
  return typeof v === 'string' ? v : JSON.stringify(v);
}

export function decide(
  ctx: StageContext,
  results: ReadonlyArray<RuleResult>,
  byId: ReadonlyMap<string, RuleFile>,
  sub: (text: string) => string,
): DecisionsStage {
  const report = emptyReport();
  const fired = results
    .map((r) => byId.get(String(r.name)))
    .filter((r): r is RuleFile => r !== undefined)
    .sort((a, b) => b.priority - a.priority || a.id.localeCompare(b.id));
  const decided = new Map<DecisionKey, { value: unknown; rule: RuleFile }>();
  for (const rule of fired) {
    const p = rule.event.params;
    const overridden: string[] = [];
    const setText: string[] = [];
    for (const [k, v] of Object.entries(p.set ?? {})) {
      const key = k as DecisionKey;
      setText.push(`${key} = ${formatValue(v)}`);
      const winner = decided.get(key);
      if (!winner) decided.set(key, { value: v, rule });
      else if (winner.value !== v) {
        overridden.push(`${key} kept ${formatValue(winner.value)} from ${winner.rule.id}`);
        if (winner.rule.priority === rule.priority)
          report.errors.push(`rules ${winner.rule.id} and ${rule.id} set ${key} differently at the same priority ${rule.priority}`);
      }
    }
    let decision = p.decision;
    if (setText.length) decision += `: ${setText.join(', ')}`;
    if (overridden.length) decision += ` (overridden: ${overridden.join('; ')})`;
    // the same in words for people (shared/labels.ts): no decision key or value key
    const setWords = Object.entries(p.set ?? {}).map(
      ([k, v]) => `${DECISION_LABELS[k as DecisionKey]}: ${decisionValueLabel(k as DecisionKey, v) ?? String(v)}`,
    );
    const words = `${p.decision}${setWords.length ? ` (${setWords.join('; ')})` : ''}${overridden.length ? `; ${overridden.length === 1 ? 'one decision was' : `${overridden.length} decisions were`} kept from a rule of higher priority` : ''}`;
    report.trace.push({ ruleId: rule.id, decision, words, reason: sub(p.reason), basis: sub(p.basis) });
    if (p.caution) report.cautions.push(sub(p.caution));
    if (p.error) report.errors.push(sub(p.error));
  }
  const decisions = Object.fromEntries([...decided].map(([k, d]) => [k, d.value])) as Decisions;
  for (const [key, fallback] of Object.entries(REQUIRED_DECISIONS[ctx.ac ? 'ac' : 'dc'])) {
    if (decided.has(key as DecisionKey)) continue;
    report.errors.push(`no rule decided ${key}`);
    Object.assign(decisions, { [key]: fallback });
  }
  const starterType = decisions['starter.type'] as StarterType;
  const needs = STARTER_NEEDS[starterType];
  if (ctx.ac !== needs.ac) report.errors.push(`starter type ${starterType} does not suit a ${ctx.load.supply} motor`);
  const leadsOk = !needs.leads || (ctx.load.leads !== undefined && needs.leads.includes(ctx.load.leads));
  const connectionOk = !needs.connection || ctx.load.connection === needs.connection;
  if (needs.error && !(leadsOk && connectionOk)) report.errors.push(needs.error);
  const ruleBasis = (key: DecisionKey) => {
    const d = decided.get(key);
    return d ? sub(d.rule.event.params.basis) : 'fallback (no rule)';
  };
  return { ...report, decisions, starterType, ruleBasis };
}
