// A catalogue item's outline (width, height, depth) and a drive's clearances above and below: carried by the
// catalogue spreadsheet both ways, and edited through the API with the same checks as every other field.
import { describe, expect, it } from 'vitest';
import { parse } from 'csv-parse/sync';
import { send, signInAs, type Session } from '../setup/api';
import { seedCatalogue } from '../unit/bom/fixtures';

const uniq = () => Date.now().toString(36).toUpperCase() + Math.floor(Math.random() * 1e4);

interface Entry {
  id: number;
  code: string;
  category: string;
  version: number;
  [k: string]: unknown;
}

/** A class CC fuse (invented demo item; CC fuses are 600 V, up to 30 A by UL 248-4, from memory). */
function fuse(code: string) {
  return {
    code,
    description: 'Fuse class CC time-delay 15 A 600 V (test item)',
    category: 'fuse',
    unit: 'ea',
    ratings: { volts: 600, amps: 15, fuseClass: 'CC', timeDelay: true },
    sccrKa: 200,
    heatLossW: 1.2,
    unitCost: 7.5,
    labourHours: 0,
    terminations: 4,
    leadTimeDays: 3,
    active: true,
  };
}

function upload(s: Session, name: string, body: string) {
  return s.agent
    .post('/api/catalogue/import')
    .set('x-csrf-token', s.token)
    .attach('file', Buffer.from(body, 'utf8'), { filename: name, contentType: 'text/csv' });
}

async function allItems(s: Session): Promise<Entry[]> {
  return (await s.agent.get('/api/catalogue/items?active=all').expect(200)).body as Entry[];
}

describe('catalogue dimensions', () => {
  it('carries every item’s outline and a drive’s clearances through export and import; a changed width in the file changes the item', async () => {
    const estimator = await signInAs('estimator');
    const items = await allItems(estimator);
    // every seed item but wire carries its outline (catalog/README.md: typical sizes, written from memory)
    const seedCodes = new Set(seedCatalogue().map((i) => i.code));
    const seed = items.filter((i) => seedCodes.has(i.code));
    expect(seed.length).toBe(seedCodes.size);
    expect(seed.filter((i) => i.category !== 'wire' && !(Number(i.outlineWidthMm) > 0)).map((i) => i.code)).toEqual([]);
    const drive = seed.find((i) => i.category === 'vfd')!;
    expect(drive).toMatchObject({ clearanceAboveMm: expect.any(Number), clearanceBelowMm: expect.any(Number) });
    const csv = (await estimator.agent.get('/api/catalogue.csv').expect(200)).text.replace(/^\uFEFF/, '');
    const [header, ...rows] = parse(csv) as string[][];
    for (const h of ['outlineWidthMm', 'outlineHeightMm', 'outlineDepthMm', 'clearanceAboveMm', 'clearanceBelowMm'])
      expect(header).toContain(h);
    const row = rows.find((r) => r[header!.indexOf('code')] === drive.code)!;
    expect(Number(row[header!.indexOf('outlineWidthMm')])).toBe(drive.outlineWidthMm);
    expect(Number(row[header!.indexOf('clearanceBelowMm')])).toBe(drive.clearanceBelowMm);
    const original = [...row];
    row[header!.indexOf('outlineWidthMm')] = String(Number(drive.outlineWidthMm) + 11);
    row[header!.indexOf('clearanceAboveMm')] = '175';
    const cell = (v: string) => (/[",\r\n]/.test(v) ? `"${v.replace(/"/g, '""')}"` : v);
    const file = [header!, row].map((r) => r.map(cell).join(',')).join('\r\n');
    const r = (await upload(estimator, 'drive.csv', file).expect(200)).body;
    expect(r).toEqual({ created: 0, updated: 1, unchanged: 0 });
    const now = (await estimator.agent.get(`/api/catalogue/items/${drive.id}`).expect(200)).body as Entry;
    expect(now).toMatchObject({
      outlineWidthMm: Number(drive.outlineWidthMm) + 11,
      clearanceAboveMm: 175,
      clearanceBelowMm: drive.clearanceBelowMm,
    });
    // a blank cell takes the figure away
    row[header!.indexOf('clearanceAboveMm')] = '';
    const cleared = [header!, row].map((r) => r.map(cell).join(',')).join('\r\n');
    expect((await upload(estimator, 'drive.csv', cleared).expect(200)).body).toEqual({ created: 0, updated: 1, unchanged: 0 });
    const after = (await estimator.agent.get(`/api/catalogue/items/${drive.id}`).expect(200)).body as Entry;
    expect(after.clearanceAboveMm).toBeUndefined();
    expect(after.clearanceBelowMm).toBe(drive.clearanceBelowMm);
    // the seed drive back as it was, for the tests that lay panels out after this one
    const restore = [header!, original].map((r) => r.map(cell).join(',')).join('\r\n');
    await upload(estimator, 'drive.csv', restore).expect(200);
    expect((await estimator.agent.get(`/api/catalogue/items/${drive.id}`).expect(200)).body).toMatchObject({
      outlineWidthMm: drive.outlineWidthMm,
      clearanceAboveMm: drive.clearanceAboveMm,
    });
  });

  it('edits an item’s dimensions like any other field, refusing a negative one or a width without height and depth', async () => {
    const estimator = await signInAs('estimator');
    const item = (await send(estimator, 'post', '/api/catalogue/items', fuse(`PW-TEST-${uniq()}`)).expect(201)).body as Entry;
    const half = await send(estimator, 'patch', `/api/catalogue/items/${item.id}`, { outlineWidthMm: 10, version: item.version });
    expect(half.status).toBe(400);
    expect(JSON.stringify(half.body)).toContain('width, height and depth together');
    const negative = await send(estimator, 'patch', `/api/catalogue/items/${item.id}`, { outlineWidthMm: -5, version: item.version });
    expect(negative.status).toBe(400);
    const ok = (
      await send(estimator, 'patch', `/api/catalogue/items/${item.id}`, {
        outlineWidthMm: 10,
        outlineHeightMm: 38,
        outlineDepthMm: 10,
        version: item.version,
      }).expect(200)
    ).body as Entry;
    expect(ok).toMatchObject({ outlineWidthMm: 10, outlineHeightMm: 38, outlineDepthMm: 10, version: item.version + 1 });
    const designer = await signInAs('designer');
    await send(designer, 'patch', `/api/catalogue/items/${item.id}`, { outlineWidthMm: 12, version: ok.version }).expect(403);
  });
});
