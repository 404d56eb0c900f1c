// The motor-list columns come from the answers schema: every answer has its column, a new answer gets one
// without a hand-kept list, and the words kept for the existing columns still name real answers.
import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { LoadFieldsSchema } from '../../../shared/schemas/load';
import { IMPORT_COLUMNS, STALE_COLUMN_TEXT, columnsOf } from '../../../server/modules/panels/import-columns';

describe('motor-list columns derived from LoadFieldsSchema', () => {
  it('has one column per answer, nested answers one per inner field', () => {
    const ids = IMPORT_COLUMNS.map((c) => (c.path ? c.path.join('.') : c.key)).sort();
    const expected = Object.entries(LoadFieldsSchema.shape)
      .flatMap(([k, s]) => {
        let t: z.ZodType = s as z.ZodType;
        while (t instanceof z.ZodOptional || t instanceof z.ZodDefault || t instanceof z.ZodPrefault) t = t.unwrap() as z.ZodType;
        return t instanceof z.ZodObject ? Object.keys(t.shape).map((i) => `${k}.${i}`) : [k];
      })
      .sort();
    expect(ids).toEqual(expected);
    expect(new Set(IMPORT_COLUMNS.map((c) => c.header.toLowerCase())).size).toBe(IMPORT_COLUMNS.length);
  });

  it('keeps the words of the columns (headers of nested answers, notes, examples) and none for a missing answer', () => {
    expect(STALE_COLUMN_TEXT).toEqual([]);
    expect(IMPORT_COLUMNS[0]).toEqual({ header: 'tag', key: 'tag', kind: 'string', note: 'unique on the panel', example: 'P-201' });
    expect(IMPORT_COLUMNS.find((c) => c.header === 'conductorTempC')).toMatchObject({
      kind: 'integer',
      path: ['conductor', 'tempRatingC'],
      example: 75,
    });
  });

  it('reads each kind from the schema: literal unions and .int() are whole numbers, booleans yes/no', () => {
    const kind = (h: string) => IMPORT_COLUMNS.find((c) => c.header === h)?.kind;
    expect([kind('hz'), kind('leads'), kind('poles'), kind('hp'), kind('reversing'), kind('supply')]).toEqual([
      'integer',
      'integer',
      'integer',
      'number',
      'boolean',
      'string',
    ]);
  });

  it('gives a new answer its column after the others, its options as the note', () => {
    const extended = LoadFieldsSchema.extend({
      feedPoint: z.enum(['mcc-1', 'mcc-2']).optional(),
      spare: z.object({ count: z.number().int() }).optional(),
    });
    const cols = columnsOf(extended);
    expect(cols.slice(0, IMPORT_COLUMNS.length)).toEqual(IMPORT_COLUMNS);
    expect(cols.slice(IMPORT_COLUMNS.length)).toEqual([
      { header: 'feedPoint', key: 'feedPoint', kind: 'string', note: 'mcc-1 or mcc-2', example: '' },
      { header: 'spareCount', key: 'spareCount', kind: 'integer', note: '', example: '', path: ['spare', 'count'] },
    ]);
  });
});
