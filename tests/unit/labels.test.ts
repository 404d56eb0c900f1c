// Words for people: every value a rule can decide and every rating a catalogue item can carry has a
// label, and zod's developer texts become plain sentences.
import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import type { z } from 'zod';
import {
  DECISION_LABELS,
  RATING_LABELS,
  RATING_VALUE_LABELS,
  decisionValueLabel,
  fieldLabel,
  starterTypeLabel,
  ANSWER_LABELS,
} from '../../shared/labels';
import { issueSentence } from '../../shared/plain-messages';
import { isDecisionKey, STARTER_TYPES } from '../../shared/engine/decisions';
import { RatingsSchema, REQUIRED_RATINGS, CatalogueItemSchema } from '../../shared/schemas/catalogue';
import { LoadSchema } from '../../shared/schemas/load';
import { JobInputSchema } from '../../shared/schemas/job';
import { previewImport } from '../../server/modules/panels/import';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../..');
const walk = (dir: string): string[] =>
  readdirSync(dir, { withFileTypes: true }).flatMap((e) => (e.isDirectory() ? walk(path.join(dir, e.name)) : [path.join(dir, e.name)]));

/** Every (decision, value) a rule file sets, from rules/**.json as stored. */
const decided: Array<[string, unknown, string]> = walk(path.join(root, 'rules'))
  .filter((f) => f.endsWith('.json'))
  .flatMap((f) => {
    const rule = JSON.parse(readFileSync(f, 'utf8')) as { event: { params: { set?: Record<string, unknown> } } };
    return Object.entries(rule.event.params.set ?? {}).map(([k, v]) => [k, v, path.relative(root, f)] as [string, unknown, string]);
  });

/** Every rating key in the catalogue seed files, and every key the ratings schema knows. */
const seedRatingKeys = new Set(
  readdirSync(path.join(root, 'catalog'))
    .filter((f) => f.endsWith('.json') && f !== 'combination-ratings.json' && f !== 'labour-units.json')
    .flatMap((f) =>
      (JSON.parse(readFileSync(path.join(root, 'catalog', f), 'utf8')) as Array<{ ratings: Record<string, unknown> }>).flatMap((i) =>
        Object.keys(i.ratings),
      ),
    ),
);
const schemaRatingKeys = Object.keys(RatingsSchema.shape);

/** the trade's own abbreviations stay as the trade writes them */
const TRADE_TERMS = new Set(['FVNR', 'FVR', 'RVSS', 'VFD', 'AC-3', 'AC-4']);
const looksLikeKey = (s: string) =>
  !TRADE_TERMS.has(s) && (/^[a-z]+[A-Z][A-Za-z]*$/.test(s) || /^[A-Z]{4,}$/.test(s) || /^[a-z0-9]+(-[a-z0-9]+)+$/.test(s));

describe('a label for every key the product shows', () => {
  it('finds the rules and the catalogue seed (the walk itself can fail)', () => {
    expect(decided.length).toBeGreaterThan(40);
    expect(seedRatingKeys.size).toBeGreaterThan(30);
    expect(seedRatingKeys).toContain('coilVolts');
    expect(seedRatingKeys).toContain('sealedVa');
  });

  it.each(decided)('%s = %j (%s) has a label', (key, value) => {
    expect(isDecisionKey(key)).toBe(true);
    if (!isDecisionKey(key)) return;
    expect(DECISION_LABELS[key]).toBeTruthy();
    const label = decisionValueLabel(key, value);
    expect(label, `${key} = ${String(value)}`).toBeTruthy();
    expect(looksLikeKey(label!), label).toBe(false);
  });

  it('every text rating value in the catalogue seed (kind, function) has words', () => {
    const values = readdirSync(path.join(root, 'catalog'))
      .filter((f) => f.endsWith('.json') && f !== 'combination-ratings.json' && f !== 'labour-units.json')
      .flatMap((f) =>
        (
          JSON.parse(readFileSync(path.join(root, 'catalog', f), 'utf8')) as Array<{ ratings: { kind?: string; function?: string } }>
        ).flatMap((i) => [i.ratings.kind, i.ratings.function]),
      )
      .filter((v): v is string => typeof v === 'string');
    expect(values.length).toBeGreaterThan(100);
    for (const v of new Set(values)) expect(RATING_VALUE_LABELS[v], v).toBeTruthy();
  });

  it('every starter type reads as words: "dc-armature-resistance" is never shown', () => {
    for (const t of STARTER_TYPES) expect(looksLikeKey(starterTypeLabel(t)), t).toBe(false);
    expect(starterTypeLabel('dc-armature-resistance')).toBe('DC armature-resistance starter');
  });

  it.each([...new Set([...seedRatingKeys, ...schemaRatingKeys])])('rating %s has a label', (key) => {
    const label = (RATING_LABELS as Record<string, string>)[key];
    expect(label, key).toBeTruthy();
    expect(label, key).not.toBe(key); // shown upper-case, a raw key reads COILVOLTS, SEALEDVA
    expect(label, key).toMatch(/^[A-Z]/);
    expect(looksLikeKey(label!), label).toBe(false);
    expect(fieldLabel(`ratings.${key}`)).toBe(key === 'volts' || key === 'poles' ? ANSWER_LABELS[key] : label);
  });

  it('every rating a category must carry and every answer has a label', () => {
    for (const keys of Object.values(REQUIRED_RATINGS)) for (const k of keys) expect(RATING_LABELS[k], k).toBeTruthy();
    for (const k of Object.keys((LoadSchema as unknown as { def?: unknown }) ? ANSWER_LABELS : {})) expect(fieldLabel(k), k).toBeTruthy();
    expect(fieldLabel('body.answers.conductor.tempRatingC')).toBe('Termination temperature');
    expect(fieldLabel('loads[3].hp')).toBe('Horsepower');
    expect(fieldLabel('ratings.hpByVolts.460')).toBe('Horsepower by voltage');
    expect(fieldLabel('body')).toBeUndefined();
  });
});

describe('plain sentences for typical validation problems', () => {
  const messages = (schema: z.ZodType, value: unknown) => {
    const r = schema.safeParse(value);
    expect(r.success).toBe(false);
    return Object.fromEntries(r.error!.issues.map((i) => [i.path.join('.'), i.message]));
  };

  it('a catalogue item: NaN, an empty description, a negative cost', () => {
    const m = messages(CatalogueItemSchema, {
      code: 'PW-X-1',
      description: '',
      category: 'contactor',
      unitCost: Number.NaN,
      leadTimeDays: 2.5,
      ratings: { volts: 600, coilVolts: 120, amps: 9, sealedVa: 8, inrushVa: -1 },
    });
    expect(m.unitCost).toBe('Enter a number.'); // was "Invalid input: expected number, received NaN"
    expect(m.description).toBe('This is needed.'); // was "Too small: expected string to have >=1 characters"
    expect(m.leadTimeDays).toBe('Enter a whole number.');
    expect(m['ratings.inrushVa']).toBe('Enter a number greater than 0.');
  });

  it('a motor: a too-large horsepower says so, not "hp must be a number"', () => {
    const m = messages(LoadSchema, { tag: 'P-1', supply: 'ac3', hp: 5000, volts: 460 });
    expect(m.hp).toBe('Enter 1000 or less.');
    const t = messages(LoadSchema, { tag: 'P-1', supply: 'ac3', hp: 'ten', volts: 460, environment: 'moon' });
    expect(t.hp).toBe('Enter a number.');
    expect(t.environment).toMatch(/^Choose Indoor, dry and clean, .* or Hazardous: Class II Division 2 \(dust\)\.$/);
  });

  it('a job without a number keeps its own message; an over-long name gets a sentence', () => {
    const m = messages(JobInputSchema, { number: '', name: 'x'.repeat(201), customer: '', site: '', notes: '' });
    expect(m.number).toBe('Enter the job number');
    expect(m.name).toBe('Keep it to 200 characters or fewer.');
  });

  it('a sentence with no field beside it names the field by its label', () => {
    expect(issueSentence('body.answers.hp', 'Enter 1000 or less.')).toBe('Horsepower: Enter 1000 or less.');
    expect(issueSentence('body.ratings.coilVolts', 'Enter a number.')).toBe('Coil voltage: Enter a number.');
  });

  it('the motor-list import preview words its problems the same way', async () => {
    const csv = 'tag,supply,hp,volts,serviceFactor\r\nP-1,ac3,5000,460,0.9\r\n,ac3,5,460,\r\n';
    const { rows } = await previewImport(Buffer.from(csv), 'motors.csv');
    expect(rows[0]!.problems).toEqual([
      { column: 'hp', message: 'Enter 1000 or less.' },
      { column: 'serviceFactor', message: 'A service factor is at least 1.0' },
    ]);
    expect(rows[1]!.problems).toEqual([{ column: 'tag', message: 'This is needed.' }]);
    for (const r of rows) for (const p of r.problems) expect(p.message).not.toMatch(/Invalid input|Too (small|big)|expected/);
  });
});
