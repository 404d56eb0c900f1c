// Rule files: one rule per file, rules/<concern>/<rule-id>.json, validated at load. A malformed
// file is refused with a RuleFileError naming the file and the problem.
//
// { "id": "fvr-reversing", "name": "Reversing duty needs a reversing starter", "priority": 20,
//   "conditions": { "all": [ { "fact": "reversing", "operator": "equal", "value": true } ] },
//   "event": { "type": "decision", "params": {
//     "decision": "Full-voltage reversing starter", "reason": "...", "basis": "NEC {edition} 430.83 / common practice",
//     "set": { "starter.type": "FVR" }, "caution": "..." } } }
//
// "{edition}" in basis, reason and caution is replaced by the code edition in use.

import { z } from 'zod';
import { RuleFileError } from '../errors';
import { DECISION_SCHEMAS, isDecisionKey } from './decisions';
import { FACT_SCHEMAS, isFactName } from './facts';

export const OPERATORS = [
  'equal',
  'notEqual',
  'lessThan',
  'lessThanInclusive',
  'greaterThan',
  'greaterThanInclusive',
  'in',
  'notIn',
  'contains',
  'doesNotContain',
] as const;
type Operator = (typeof OPERATORS)[number];

const scalar = z.union([z.string(), z.number(), z.boolean(), z.null()]);

export const RuleParamsSchema = z
  .object({
    decision: z.string().trim().min(1, 'params.decision is required'),
    reason: z.string().trim().min(1, 'params.reason is required'),
    basis: z.string().trim().min(1, 'params.basis is required (code clause with edition, or "common practice")'),
    set: z.record(z.string(), scalar).optional(),
    caution: z.string().trim().min(1).optional(),
    error: z.string().trim().min(1).optional(),
  })
  .strict();

export const RuleFileSchema = z
  .object({
    id: z.string().regex(/^[a-z0-9]+(?:-[a-z0-9]+)*$/, 'id must be kebab-case (a-z, 0-9, -)'),
    name: z.string().trim().min(1, 'name (the title) is required'),
    priority: z.number().int('priority must be an integer').min(1, 'priority must be 1 or more').max(1000),
    conditions: z.record(z.string(), z.unknown()),
    event: z
      .object({
        type: z.string().trim().min(1),
        params: RuleParamsSchema,
      })
      .strict(),
  })
  .strict();

export type RuleFile = z.output<typeof RuleFileSchema>;
export type RuleParams = z.output<typeof RuleParamsSchema>;

const NUMERIC: readonly Operator[] = ['lessThan', 'lessThanInclusive', 'greaterThan', 'greaterThanInclusive'];

function checkValue(fact: string, op: Operator, value: unknown, where: string): string | null {
  if (value !== null && typeof value === 'object' && !Array.isArray(value)) {
    const ref = (value as Record<string, unknown>).fact;
    if (typeof ref !== 'string' || !isFactName(ref)) return `${where}: value refers to unknown fact ${JSON.stringify(ref)}`;
    return null;
  }
  const schema = FACT_SCHEMAS[fact as keyof typeof FACT_SCHEMAS];
  if (NUMERIC.includes(op)) {
    if (typeof value !== 'number') return `${where}: operator "${op}" needs a number value`;
    if (!schema.safeParse(value).success) return `${where}: fact "${fact}" is not numeric`;
    return null;
  }
  if (op === 'in' || op === 'notIn') {
    if (!Array.isArray(value) || value.length === 0) return `${where}: operator "${op}" needs a non-empty array value`;
    const bad = value.find((v) => !schema.safeParse(v).success);
    return bad === undefined ? null : `${where}: ${JSON.stringify(bad)} is not a possible value of fact "${fact}"`;
  }
  if (op === 'contains' || op === 'doesNotContain') return null;
  return schema.safeParse(value).success ? null : `${where}: ${JSON.stringify(value)} is not a possible value of fact "${fact}"`;
}

function checkCondition(node: unknown, where: string, depth: number): string | null {
  if (depth > 20) return `${where}: conditions nested too deeply`;
  if (node === null || typeof node !== 'object' || Array.isArray(node)) return `${where}: a condition must be an object`;
  const o = node as Record<string, unknown>;
  const keys = Object.keys(o);
  for (const k of ['all', 'any'] as const) {
    if (k in o) {
      if (keys.length !== 1) return `${where}: "${k}" must stand alone (found ${keys.join(', ')})`;
      const list = o[k];
      if (!Array.isArray(list) || list.length === 0) return `${where}.${k}: must be a non-empty array`;
      for (let i = 0; i < list.length; i++) {
        const p = checkCondition(list[i], `${where}.${k}[${i}]`, depth + 1);
        if (p) return p;
      }
      return null;
    }
  }
  if ('not' in o) {
    if (keys.length !== 1) return `${where}: "not" must stand alone`;
    return checkCondition(o.not, `${where}.not`, depth + 1);
  }
  if (!('fact' in o)) return `${where}: expected "all", "any", "not" or a fact condition`;
  const allowed = new Set(['fact', 'operator', 'value']);
  const extra = keys.find((k) => !allowed.has(k));
  if (extra) return `${where}: unsupported key "${extra}" in a fact condition`;
  if (typeof o.fact !== 'string' || !isFactName(o.fact)) return `${where}: unknown fact ${JSON.stringify(o.fact)}`;
  if (typeof o.operator !== 'string' || !(OPERATORS as readonly string[]).includes(o.operator)) {
    return `${where}: unknown operator ${JSON.stringify(o.operator)}`;
  }
  if (!('value' in o)) return `${where}: value is required`;
  return checkValue(o.fact, o.operator as Operator, o.value, where);
}

function baseName(file: string): string {
  const last = file.split(/[\\/]/).pop() ?? file;
  return last.replace(/\.json$/i, '');
}

/** Validates one rule file's parsed content; throws RuleFileError(file, problem). */
export function validateRuleFile(file: string, content: unknown): RuleFile {
  const parsed = RuleFileSchema.safeParse(content);
  if (!parsed.success) {
    const i = parsed.error.issues[0];
    const path = i ? i.path.map(String).join('.') : '';
    throw new RuleFileError(file, `${path ? `${path}: ` : ''}${i?.message ?? 'invalid rule'}`);
  }
  const rule = parsed.data;
  if (baseName(file) !== rule.id) throw new RuleFileError(file, `id "${rule.id}" must match the file name "${baseName(file)}.json"`);
  const top = Object.keys(rule.conditions);
  if (top.length !== 1 || !['all', 'any', 'not'].includes(top[0] as string)) {
    throw new RuleFileError(file, 'conditions must have exactly one of "all", "any" or "not" at the top');
  }
  const problem = checkCondition(rule.conditions, 'conditions', 0);
  if (problem) throw new RuleFileError(file, problem);
  for (const [key, value] of Object.entries(rule.event.params.set ?? {})) {
    if (!isDecisionKey(key)) throw new RuleFileError(file, `event.params.set: unknown decision "${key}"`);
    if (!DECISION_SCHEMAS[key].safeParse(value).success) {
      throw new RuleFileError(file, `event.params.set: ${JSON.stringify(value)} is not a valid value for "${key}"`);
    }
  }
  const p = rule.event.params;
  if (!p.set && !p.caution && !p.error) throw new RuleFileError(file, 'event.params needs at least one of "set", "caution" or "error"');
  return rule;
}

/** Validates a whole set: every file, and ids unique across files. */
export function validateRuleFiles(files: ReadonlyArray<{ file: string; content: unknown }>): Array<RuleFile & { file: string }> {
  const seen = new Map<string, string>();
  return files.map(({ file, content }) => {
    const rule = validateRuleFile(file, content);
    const other = seen.get(rule.id);
    if (other) throw new RuleFileError(file, `duplicate rule id "${rule.id}" (also in ${other})`);
    seen.set(rule.id, file);
    return { ...rule, file };
  });
}
