import { describe, expect, it } from 'vitest';
import { DEFAULT_DRAWING_SCHEME, drawingNumber, drawingSchemeProblems, ShopSettingsFields } from '../../../shared/schemas/settings';

const parts = { job: 'J-2041', panel: 'MCC-1 Pump hall', rev: 'R2', sheet: 7 };

describe('drawing numbers from the shop scheme', () => {
  // expected values worked by hand from the scheme's rules (spaces to dashes, {sheet:n} zero-padded)
  it.each([
    [DEFAULT_DRAWING_SCHEME, 'J-2041-MCC-1-Pump-hall-07'],
    ['{job}-{panel}-{sheet}', 'J-2041-MCC-1-Pump-hall-7'],
    ['CPW/{job}/{rev}/{sheet:3}', 'CPW/J-2041/R2/007'],
    ['{job}.{sheet:1}', 'J-2041.7'],
    ['DWG #{sheet:4} {rev}', 'DWG #0007 R2'],
  ])('%s gives %s', (scheme, expected) => {
    expect(drawingSchemeProblems(scheme)).toEqual([]);
    expect(drawingNumber(scheme, parts)).toBe(expected);
  });

  it('pads no further than asked: sheet 123 with {sheet:2} stays 123', () => {
    expect(drawingNumber('{sheet:2}', { ...parts, sheet: 123 })).toBe('123');
  });

  it.each([
    ['{job}-{panel}', /Put \{sheet\}/],
    ['{customer}-{sheet}', /\{customer\} is not a known part/],
    ['{job:2}-{sheet}', /only the sheet takes a width/],
    ['{sheet:9}', /1 to 4 digits/],
    ['{job}-{sheet', /Every \{ needs its \}/],
    ['{job}*{sheet}', /letters, digits, spaces/],
  ])('refuses %s', (scheme, message) => {
    const problems = drawingSchemeProblems(scheme);
    expect(problems.join(' ')).toMatch(message);
    expect(ShopSettingsFields.shape.drawingNumberScheme.safeParse(scheme).success).toBe(false);
  });
});
