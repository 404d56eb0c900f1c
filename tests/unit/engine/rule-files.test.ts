// Rule files as data: validation at load (file named with the problem) and outcomes changed by
// adding a file, with no code change.
import { describe, expect, it } from 'vitest';
import { RuleFileError } from '../../../shared/errors';
import { createSelector } from '../../../shared/engine/selector';
import { motor, ruleFiles, supply480 } from './selector-setup';

const good = {
  id: 'pump-always-class-20',
  name: 'Pumps in this shop get Class 20',
  priority: 90,
  conditions: { all: [{ fact: 'hp', operator: 'greaterThanInclusive', value: 20 }] },
  event: {
    type: 'decision',
    params: {
      decision: 'Overload trip class 20',
      reason: 'shop standard for large pumps',
      basis: 'common practice',
      set: { 'overload.tripClass': 20 },
    },
  },
};

function refusal(content: unknown, file = 'rules/overload-class/pump-always-class-20.json'): string {
  try {
    createSelector([...ruleFiles, { file, content }]);
  } catch (e) {
    expect(e).toBeInstanceOf(RuleFileError);
    return (e as Error).message;
  }
  throw new Error('rule file was accepted');
}

describe('malformed rule files are refused with their name and the problem', () => {
  it.each([
    [
      'unknown fact',
      { ...good, conditions: { all: [{ fact: 'horsepower', operator: 'greaterThan', value: 20 }] } },
      /unknown fact "horsepower"/,
    ],
    [
      'unknown operator',
      { ...good, conditions: { all: [{ fact: 'hp', operator: 'biggerThan', value: 20 }] } },
      /unknown operator "biggerThan"/,
    ],
    [
      'impossible fact value',
      { ...good, conditions: { all: [{ fact: 'supply', operator: 'equal', value: 'ac4' }] } },
      /"ac4" is not a possible value of fact "supply"/,
    ],
    [
      'numeric operator on text',
      { ...good, conditions: { all: [{ fact: 'hp', operator: 'greaterThan', value: '20' }] } },
      /needs a number value/,
    ],
    [
      'unknown decision',
      { ...good, event: { ...good.event, params: { ...good.event.params, set: { 'overload.class': 20 } } } },
      /unknown decision "overload.class"/,
    ],
    [
      'bad decision value',
      { ...good, event: { ...good.event, params: { ...good.event.params, set: { 'overload.tripClass': 15 } } } },
      /15 is not a valid value for "overload.tripClass"/,
    ],
    [
      'missing basis',
      { ...good, event: { ...good.event, params: { decision: 'x', reason: 'y', set: { 'overload.tripClass': 20 } } } },
      /event\.params\.basis/,
    ],
    ['missing priority', { ...good, priority: undefined }, /priority/],
    ['id not matching the file name', { ...good, id: 'other-name' }, /must match the file name/],
    ['empty all', { ...good, conditions: { all: [] } }, /non-empty array/],
    [
      'no top-level all/any/not',
      { ...good, conditions: { fact: 'hp', operator: 'equal', value: 1 } },
      /exactly one of "all", "any" or "not"/,
    ],
    ['unknown key', { ...good, weight: 3 }, /Unrecognized key/],
    [
      'nothing to do',
      { ...good, event: { type: 'decision', params: { decision: 'x', reason: 'y', basis: 'common practice' } } },
      /at least one of "set", "caution" or "error"/,
    ],
  ])('%s', (_label, content, problem) => {
    const msg = refusal(content);
    expect(msg.startsWith('rules/overload-class/pump-always-class-20.json: ')).toBe(true);
    expect(msg).toMatch(problem);
  });
  it('a duplicate id in another folder is refused', () => {
    const dup = ruleFiles.find((f) => f.file.endsWith('/fvr-reversing.json'));
    expect(dup).toBeDefined();
    expect(() => createSelector([...ruleFiles, { file: 'rules/extra/fvr-reversing.json', content: dup?.content }])).toThrow(
      /duplicate rule id "fvr-reversing"/,
    );
  });
  it('the error carries the file and problem as details', () => {
    try {
      createSelector([{ file: 'rules/x/broken.json', content: 'not an object' }]);
      expect.unreachable();
    } catch (e) {
      expect((e as RuleFileError).code).toBe('rule_file_invalid');
      expect((e as RuleFileError).details).toMatchObject({ file: 'rules/x/broken.json' });
    }
  });
});

describe('an added rule file changes outcomes with no code change', () => {
  it('a higher-priority rule overrides the trip class and shows in the trace', async () => {
    const base = createSelector(ruleFiles);
    const withRule = createSelector([...ruleFiles, { file: 'rules/overload-class/pump-always-class-20.json', content: good }]);
    const load = motor({ hp: 25 });
    expect((await base.selectLoad(load, supply480)).overload.tripClass).toBe(10);
    const r = await withRule.selectLoad(load, supply480);
    expect(r.overload.tripClass).toBe(20);
    expect(r.trace.find((t) => t.ruleId === 'pump-always-class-20')?.decision).toBe('Overload trip class 20: overload.tripClass = 20');
    expect(r.trace.find((t) => t.ruleId === 'trip-class-10-normal')?.decision).toMatch(/overridden/);
    // below the threshold written in the rule, nothing changes
    expect((await withRule.selectLoad(motor({ hp: 15 }), supply480)).overload.tripClass).toBe(10);
  });
  it('a new caution rule adds its caution, with {edition} replaced', async () => {
    const s = createSelector([
      ...ruleFiles,
      {
        file: 'rules/cautions/outdoor-heater.json',
        content: {
          id: 'outdoor-heater',
          name: 'Outdoor panels get a space heater',
          priority: 5,
          conditions: { all: [{ fact: 'environment', operator: 'equal', value: 'outdoor' }] },
          event: {
            type: 'decision',
            params: {
              decision: 'Space heater',
              reason: 'condensation',
              basis: 'common practice',
              caution: 'Add a thermostat-controlled space heater (NEC {edition} review).',
            },
          },
        },
      },
    ]);
    const r = await s.selectLoad(motor({ environment: 'outdoor' }), supply480);
    expect(r.cautions).toContain('Add a thermostat-controlled space heater (NEC 2023 review).');
  });
  it('two rules setting one decision differently at the same priority are reported as a conflict on the load', async () => {
    const s = createSelector([
      ...ruleFiles,
      {
        file: 'rules/enclosure/enclosure-dusty-13.json',
        content: {
          id: 'enclosure-dusty-13',
          name: 'Oil mist areas',
          priority: 10,
          conditions: { all: [{ fact: 'environment', operator: 'equal', value: 'indoor-dusty' }] },
          event: {
            type: 'decision',
            params: { decision: 'Type 13', reason: 'oil mist', basis: 'NEMA 250 Type 13', set: { 'enclosure.nemaType': '13' } },
          },
        },
      },
    ]);
    const r = await s.selectLoad(motor({ environment: 'indoor-dusty' }), supply480);
    expect(r.errors.some((e) => e.includes('at the same priority 10'))).toBe(true);
    expect(r.enclosure.nemaType).toBe('13'); // deterministic: the lower id wins the tie
  });
  it('a rule set missing a required decision reports it on the load', async () => {
    const s = createSelector(ruleFiles.filter((f) => !f.file.includes('/overload-class/')));
    const r = await s.selectLoad(motor({}), supply480);
    expect(r.errors).toContain('no rule decided overload.tripClass');
  });
});
