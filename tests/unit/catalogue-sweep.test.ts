// Every seed file in catalog/ validates against the shared schema; part codes are unique across files.
import fs from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { CatalogueFileSchema, LabourUnitsFileSchema, LABOUR_KEYS, CATEGORY_IDS } from '../../shared/schemas/catalogue';
import { isItemFile } from '../../server/db/seeders/catalogue';

const dir = path.resolve(__dirname, '../../catalog');
const files = fs
  .readdirSync(dir)
  .filter((f) => f.endsWith('.json'))
  .sort();
const itemFiles = files.filter(isItemFile);

describe('catalog/ sweep', () => {
  it('has seed files', () => {
    expect(itemFiles.length).toBeGreaterThanOrEqual(20);
    expect(files).toContain('labour-units.json');
  });

  it.each(itemFiles)('%s validates', (f) => {
    const r = CatalogueFileSchema.safeParse(JSON.parse(fs.readFileSync(path.join(dir, f), 'utf8')));
    expect(r.success ? [] : r.error.issues.slice(0, 5)).toEqual([]);
    expect(r.data!.length).toBeGreaterThan(0);
  });

  it('codes are unique across all files', () => {
    const codes = itemFiles.flatMap((f) =>
      (JSON.parse(fs.readFileSync(path.join(dir, f), 'utf8')) as Array<{ code: string }>).map((i) => i.code),
    );
    const dupes = codes.filter((c, i) => codes.indexOf(c) !== i);
    expect(dupes).toEqual([]);
  });

  it('every category has at least one active item', () => {
    const items = itemFiles.flatMap((f) => CatalogueFileSchema.parse(JSON.parse(fs.readFileSync(path.join(dir, f), 'utf8'))));
    const active = new Set(items.filter((i) => i.active).map((i) => i.category));
    expect(CATEGORY_IDS.filter((c) => !active.has(c))).toEqual([]);
  });

  it('no manufacturer names in descriptions (generic items only)', () => {
    // descriptions are built from generic trade words; a capitalised word outside this list would be a name
    const allowed = new Set([
      'Contactor',
      'NEMA',
      'IEC',
      'AC',
      'DC',
      'V',
      'A',
      'Mechanical',
      'Auxiliary',
      'N.O.',
      'N.C.',
      'Overload',
      'Circuit',
      'Motor',
      'Fuse',
      'UL',
      'J',
      'RK5',
      'CC',
      'Fused',
      'Disconnect',
      'Manual',
      'Soft',
      'Variable-frequency',
      'Phase-monitoring',
      'C',
      'O',
      'AC-3',
      'Control',
      'Terminal',
      'Push',
      'START',
      'STOP',
      'FWD',
      'REV',
      'FAST',
      'SLOW',
      'Selector',
      'HAND-OFF-AUTO',
      'FWD-OFF-REV',
      'Pilot',
      'LED',
      'RUN',
      'FAULT',
      'Wire',
      'Enclosure',
      'Type',
      'Filter',
      'Main',
      'Power',
      'Output',
      'Dynamic',
      'Field-loss',
      'MCP',
      'W',
      'VA',
      'AWG',
      'X',
      'Enclosure,',
      'Fuse,',
      'Wire,',
    ]);
    const items = itemFiles.flatMap((f) => CatalogueFileSchema.parse(JSON.parse(fs.readFileSync(path.join(dir, f), 'utf8'))));
    const odd = new Set<string>();
    for (const i of items) for (const w of i.description.split(/[\s,;()"×–/]+/)) if (/^[A-Z]/.test(w) && !allowed.has(w)) odd.add(w);
    expect([...odd].sort()).toEqual([]);
  });

  it('labour-units.json validates and has every labour key', () => {
    const units = LabourUnitsFileSchema.parse(JSON.parse(fs.readFileSync(path.join(dir, 'labour-units.json'), 'utf8')));
    expect(units.map((u) => u.key).sort()).toEqual([...LABOUR_KEYS].sort());
  });
});

describe('catalog/combination-ratings.json (invented demo data)', () => {
  it('validates, names only seed parts, and is never rated above its protective device', async () => {
    const { readSeedCombinations, readSeedCatalogue } = await import('../../server/db/seeders/catalogue');
    const combos = readSeedCombinations(dir);
    const items = new Map(readSeedCatalogue(dir).map((i) => [i.code, i]));
    expect(combos.length).toBeGreaterThanOrEqual(4);
    for (const c of combos) {
      for (const code of c.componentCodes) expect(items.has(code), `${c.ref}: ${code}`).toBe(true);
      // UL 508A SB4: a branch is rated no higher than its protective device's interrupting rating
      const devices = c.componentCodes
        .map((code) => items.get(code)!)
        .filter((i) => i.category === 'inverse-time-breaker' || i.category === 'fuse');
      expect(devices.length, c.ref).toBeGreaterThan(0);
      for (const d of devices) expect(c.ratingKa, `${c.ref} vs ${d.code}`).toBeLessThanOrEqual(d.sccrKa ?? 0);
    }
  });
});
