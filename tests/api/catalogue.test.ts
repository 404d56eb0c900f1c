// Catalogue and labour-unit API: roles, optimistic versions, history, export/import round trip,
// all-or-nothing imports, and the frozen unit cost of a stored bill-of-materials line.
import { describe, expect, it } from 'vitest';
import ExcelJS from 'exceljs';
import { send, signInAs, type Session } from '../setup/api';

const uniq = () => Date.now().toString(36).toUpperCase() + Math.floor(Math.random() * 1e4);

interface Entry {
  id: number;
  code: string;
  unitCost: number;
  version: number;
  active: boolean;
  [k: string]: unknown;
}

/** A class CC fuse (invented demo item; CC fuses are 600 V, up to 30 A by UL 248-4, from memory). */
function fuse(code: string, unitCost = 7.5) {
  return {
    code,
    description: 'Fuse class CC time-delay 15 A 600 V (test item)',
    category: 'fuse',
    unit: 'ea',
    ratings: { volts: 600, amps: 15, fuseClass: 'CC', timeDelay: true },
    sccrKa: 200,
    heatLossW: 1.2,
    unitCost,
    labourHours: 0,
    terminations: 4,
    leadTimeDays: 3,
    active: true,
  };
}

function upload(s: Session, name: string, body: Buffer | string, contentType: string) {
  return s.agent
    .post('/api/catalogue/import')
    .set('x-csrf-token', s.token)
    .attach('file', Buffer.isBuffer(body) ? body : Buffer.from(body, 'utf8'), { filename: name, contentType });
}

async function download(s: Session, url: string): Promise<Buffer> {
  const r = await s.agent.get(url).responseType('blob').expect(200);
  return r.body as Buffer;
}

async function allItems(s: Session): Promise<Entry[]> {
  return (await s.agent.get('/api/catalogue/items?active=all').expect(200)).body as Entry[];
}

/** The catalogue without ids, versions and timestamps, for comparing two states. */
const content = (items: Entry[]) =>
  items.map(({ id: _i, version: _v, updatedAt: _u, ...rest }) => rest).sort((a, b) => String(a.code).localeCompare(String(b.code)));

describe('catalogue items', () => {
  it('lets estimators and admins edit, designers and engineers only read', async () => {
    const [estimator, designer, engineer, admin] = await Promise.all([
      signInAs('estimator'),
      signInAs('designer'),
      signInAs('engineer'),
      signInAs('admin'),
    ]);
    const code = `PW-TEST-${uniq()}`;
    await send(designer, 'post', '/api/catalogue/items', fuse(code)).expect(403);
    await send(engineer, 'post', '/api/catalogue/items', fuse(code)).expect(403);
    const created = (await send(estimator, 'post', '/api/catalogue/items', fuse(code)).expect(201)).body as Entry;
    expect(created).toMatchObject({ code, unitCost: 7.5, version: 0, active: true });
    await send(admin, 'post', '/api/catalogue/items', fuse(code)).expect(409); // the code is taken

    const seen = (await designer.agent.get(`/api/catalogue/items?q=${code}`).expect(200)).body as Entry[];
    expect(seen.map((i) => i.code)).toEqual([code]);
    await send(engineer, 'patch', `/api/catalogue/items/${created.id}`, { unitCost: 1, version: 0 }).expect(403);
    await send(designer, 'post', `/api/catalogue/items/${created.id}/active`, { active: false, version: 0 }).expect(403);
  });

  it('refuses an item without the ratings its category needs, naming the field', async () => {
    const estimator = await signInAs('estimator');
    const bad = fuse(`PW-TEST-${uniq()}`) as Record<string, unknown>;
    bad.ratings = { volts: 600, amps: 15, fuseClass: 'CC' };
    const r = await send(estimator, 'post', '/api/catalogue/items', bad).expect(400);
    expect(r.body.error.details.map((d: { path: string }) => d.path)).toContain('body.ratings.timeDelay');
  });

  it('changes price, labour and lead time with the version, answers 409 to a stale version, and keeps the history', async () => {
    const estimator = await signInAs('estimator');
    const admin = await signInAs('admin');
    const code = `PW-TEST-${uniq()}`;
    const item = (await send(estimator, 'post', '/api/catalogue/items', fuse(code, 7.5)).expect(201)).body as Entry;

    const v1 = (
      await send(estimator, 'patch', `/api/catalogue/items/${item.id}`, {
        unitCost: 8.25,
        labourHours: 0.02,
        leadTimeDays: 10,
        version: 0,
      }).expect(200)
    ).body as Entry;
    expect(v1).toMatchObject({ unitCost: 8.25, labourHours: 0.02, leadTimeDays: 10, version: 1 });

    // an admin who opened version 0 is refused instead of overwriting the estimator's price
    const stale = await send(admin, 'patch', `/api/catalogue/items/${item.id}`, { unitCost: 6, version: 0 }).expect(409);
    expect(stale.body.error.code).toBe('conflict');
    expect(((await admin.agent.get(`/api/catalogue/items/${item.id}`).expect(200)).body as Entry).unitCost).toBe(8.25);

    // a change that breaks the category's needs is refused as a whole
    await send(estimator, 'patch', `/api/catalogue/items/${item.id}`, { ratings: { volts: 600 }, version: 1 }).expect(400);
    // the code is the key bills of materials refer to: not changeable
    await send(estimator, 'patch', `/api/catalogue/items/${item.id}`, { code: 'PW-OTHER-1', version: 1 }).expect(400);

    const off = (await send(admin, 'post', `/api/catalogue/items/${item.id}/active`, { active: false, version: 1 }).expect(200))
      .body as Entry;
    expect(off).toMatchObject({ active: false, version: 2 });
    const activeOnly = (await estimator.agent.get(`/api/catalogue/items?q=${code}`).expect(200)).body as Entry[];
    expect(activeOnly).toEqual([]);
    const inactive = (await estimator.agent.get(`/api/catalogue/items?q=${code}&active=false`).expect(200)).body as Entry[];
    expect(inactive.map((i) => i.code)).toEqual([code]);
    const on = (await send(admin, 'post', `/api/catalogue/items/${item.id}/active`, { active: true, version: 2 }).expect(200))
      .body as Entry;
    expect(on).toMatchObject({ active: true, version: 3 });

    const history = (await estimator.agent.get(`/api/catalogue/items/${item.id}/history`).expect(200)).body as Array<{
      action: string;
      user: string;
      diff: Record<string, unknown>;
    }>;
    expect(history.map((h) => h.action)).toEqual(['reactivated', 'deactivated', 'updated', 'created']);
    expect(history.map((h) => h.user)).toEqual(['Ada Quarry', 'Ada Quarry', 'Esme Tolliver', 'Esme Tolliver']);
    // exactly the fields sent: the others (heat loss 1.2 W, 4 terminations, SCCR) keep their values
    expect(history[2]!.diff).toEqual({ unitCost: [7.5, 8.25], leadTimeDays: [3, 10], labourHours: [0, 0.02] });
    const now = (await estimator.agent.get(`/api/catalogue/items/${item.id}`).expect(200)).body as Entry;
    expect(now).toMatchObject({ heatLossW: 1.2, terminations: 4, sccrKa: 200, active: true, unit: 'ea' });
  });

  it('filters by category and text', async () => {
    const engineer = await signInAs('engineer');
    const vfds = (await engineer.agent.get('/api/catalogue/items?category=vfd').expect(200)).body as Entry[];
    expect(vfds.length).toBeGreaterThan(5);
    expect(new Set(vfds.map((i) => i.category))).toEqual(new Set(['vfd']));
    await engineer.agent.get('/api/catalogue/items?category=toaster').expect(400);
  });
});

describe('labour units', () => {
  it('are read by every role and changed by estimators with the version', async () => {
    const [estimator, engineer] = await Promise.all([signInAs('estimator'), signInAs('engineer')]);
    const units = (await engineer.agent.get('/api/labour-units').expect(200)).body as Array<{
      key: string;
      hours: number;
      version: number;
    }>;
    expect(units).toHaveLength(10); // catalog/labour-units.json
    const term = units.find((u) => u.key === 'termination')!;
    await send(engineer, 'patch', '/api/labour-units/termination', { hours: 0.07, version: term.version }).expect(403);
    const changed = (await send(estimator, 'patch', '/api/labour-units/termination', { hours: 0.07, version: term.version }).expect(200))
      .body;
    expect(changed).toMatchObject({ key: 'termination', hours: 0.07, version: term.version + 1 });
    await send(estimator, 'patch', '/api/labour-units/termination', { hours: 0.08, version: term.version }).expect(409);
    await send(estimator, 'patch', '/api/labour-units/termination', { hours: term.hours, version: term.version + 1 }).expect(200);
  });
});

describe('catalogue export and import', () => {
  it('gives back the same catalogue after an .xlsx export and import (and after a .csv one)', async () => {
    const estimator = await signInAs('estimator');
    const before = content(await allItems(estimator));
    expect(before.length).toBeGreaterThanOrEqual(758); // the seed catalogue

    const xlsx = await download(estimator, '/api/catalogue.xlsx');
    expect(xlsx.subarray(0, 2).toString()).toBe('PK');
    const r1 = (
      await upload(estimator, 'catalogue.xlsx', xlsx, 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet').expect(200)
    ).body;
    expect(r1).toEqual({ created: 0, updated: 0, unchanged: before.length });
    expect(content(await allItems(estimator))).toEqual(before);

    const csvRes = await estimator.agent.get('/api/catalogue.csv').expect(200);
    expect(csvRes.headers['content-disposition']).toMatch(/attachment; filename="panelwright-catalogue-.*\.csv"/);
    const r2 = (await upload(estimator, 'catalogue.csv', csvRes.text, 'text/csv').expect(200)).body;
    expect(r2).toEqual({ created: 0, updated: 0, unchanged: before.length });
    expect(content(await allItems(estimator))).toEqual(before);
  });

  it('upserts by code: a changed price and a new row', async () => {
    const estimator = await signInAs('estimator');
    const code = `PW-TEST-${uniq()}`;
    const item = (await send(estimator, 'post', '/api/catalogue/items', fuse(code, 7.5)).expect(201)).body as Entry;
    const csv = (await estimator.agent.get('/api/catalogue.csv').expect(200)).text.replace(/^\uFEFF/, '');
    const lines = csv.trim().split('\r\n');
    const header = lines[0]!.split(',');
    const at = header.indexOf('unitCost');
    const codeAt = header.indexOf('code');
    const row = lines.find((l) => l.split(',')[codeAt] === code)!.split(',');
    row[at] = '9.1';
    const newCode = `PW-TEST-${uniq()}N`;
    const added = [...row];
    added[codeAt] = newCode;
    const file = [lines[0], row.join(','), added.join(',')].join('\r\n');
    const r = (await upload(estimator, 'two.csv', file, 'text/csv').expect(200)).body;
    expect(r).toEqual({ created: 1, updated: 1, unchanged: 0 });
    const now = (await estimator.agent.get(`/api/catalogue/items/${item.id}`).expect(200)).body as Entry;
    expect(now).toMatchObject({ unitCost: 9.1, version: 1 });
    const history = (await estimator.agent.get(`/api/catalogue/items/${item.id}/history`).expect(200)).body as Array<{ action: string }>;
    expect(history[0]!.action).toBe('imported');
  });

  it('refuses a file with duplicate codes or a bad number, lists the rows, and changes nothing', async () => {
    const estimator = await signInAs('estimator');
    const before = content(await allItems(estimator));
    const csv = (await estimator.agent.get('/api/catalogue.csv').expect(200)).text.replace(/^\uFEFF/, '');
    // rows without quoted fields, so that splitting on commas is exact
    const lines = csv
      .trim()
      .split('\r\n')
      .filter((l) => !l.includes('"'));
    const header = lines[0]!.split(',');
    const costAt = header.indexOf('unitCost');
    // rows 2 and 3 are good but priced differently: they must not be written either
    const cheaper = (l: string) => {
      const c = l.split(',');
      c[costAt] = '0.01';
      return c.join(',');
    };
    const badNumber = lines[3]!.split(',');
    badNumber[costAt] = 'twelve';
    const file = [lines[0], cheaper(lines[1]!), cheaper(lines[2]!), badNumber.join(','), lines[1]].join('\r\n');
    const r = await upload(estimator, 'bad.csv', file, 'text/csv').expect(400);
    const details = r.body.error.details as Array<{ row: number; column: string; message: string }>;
    expect(details).toEqual(
      expect.arrayContaining([
        expect.objectContaining({ row: 4, column: 'unitCost', message: '"twelve" is not a number' }),
        expect.objectContaining({ row: 5, column: 'code', message: expect.stringMatching(/^duplicate code .* \(first on row 2\)$/) }),
      ]),
    );
    expect(r.body.error.message).toMatch(/nothing was imported/);
    expect(content(await allItems(estimator))).toEqual(before);
  });

  it('keeps formula text of an uploaded workbook as text, takes a formula cell by its value, and neutralises both exports', async () => {
    const estimator = await signInAs('estimator');
    // a workbook as someone might send it: the exported sheet with one row added by hand
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.load((await download(estimator, '/api/catalogue.xlsx')) as unknown as ArrayBuffer);
    const ws = wb.worksheets[0]!;
    const headers = (ws.getRow(1).values as unknown[]).slice(1).map(String);
    const col = (h: string) => headers.indexOf(h) + 1;
    const source = ws.getRow(2);
    const code = `PW-FX-${uniq()}`;
    const injected = '=HYPERLINK("http://example.invalid","open")';
    const values = headers.map((_h, i) => source.getCell(i + 1).value);
    const added = ws.addRow(values);
    added.getCell(col('code')).value = code;
    added.getCell(col('description')).value = injected;
    added.getCell(col('unitCost')).value = { formula: 'ROUND(25/2,2)', result: 12.5 };
    added.commit();
    const file = Buffer.from(await wb.xlsx.writeBuffer());
    const r = (
      await upload(estimator, 'hand-edited.xlsx', file, 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet').expect(200)
    ).body;
    expect(r).toMatchObject({ created: 1 });

    const item = (await allItems(estimator)).find((i) => i.code === code)!;
    expect(item.description).toBe(injected); // stored as the text it was
    expect(item.unitCost).toBe(12.5); // the formula's value, not the formula

    // CSV export: the text is prefixed with a quote, so a spreadsheet shows it and runs nothing
    const csv = (await estimator.agent.get('/api/catalogue.csv').expect(200)).text;
    const line = csv.split('\r\n').find((l) => l.startsWith(`${code},`))!;
    expect(line).toContain(`"'=HYPERLINK(""http://example.invalid"",""open"")"`);
    // .xlsx export: a plain string cell, never a formula
    const out = new ExcelJS.Workbook();
    await out.xlsx.load((await download(estimator, '/api/catalogue.xlsx')) as unknown as ArrayBuffer);
    const sheet = out.worksheets[0]!;
    let found: ExcelJS.CellValue | undefined;
    sheet.eachRow((row) => {
      if (row.getCell(col('code')).value === code) found = row.getCell(col('description')).value;
    });
    expect(found).toBe(injected);
    // and the neutralised CSV comes back as the original text
    const again = (await upload(estimator, 'again.csv', csv, 'text/csv').expect(200)).body as { updated: number };
    expect(again.updated).toBe(0);
    expect((await estimator.agent.get(`/api/catalogue/items/${item.id}`).expect(200)).body.description).toBe(injected);
  });

  it('refuses an oversized file (413), a package that expands to an absurd size, and too many rows, changing nothing', async () => {
    const { IMPORT_LIMITS } = await import('../../server/modules/catalogue/spreadsheet');
    const { makeZip } = await import('../unit/bom/zip');
    const estimator = await signInAs('estimator');
    const before = content(await allItems(estimator));
    const big = await upload(estimator, 'catalogue.csv', Buffer.alloc(IMPORT_LIMITS.maxFileBytes + 1, 0x41), 'text/csv');
    expect(big.status).toBe(413);
    expect(big.body.error.code).toBe('payload_too_large');
    // 64 MB of spaces deflated to a few dozen kB, its expanded size understated in the zip headers
    const sheet = Buffer.concat([
      Buffer.from('<?xml version="1.0"?><worksheet xmlns="http://schemas.openxmlformats.org/spreadsheetml/2006/main"><sheetData>'),
      Buffer.alloc(64 * 1024 * 1024, 0x20),
      Buffer.from('</sheetData></worksheet>'),
    ]);
    const bomb = makeZip([
      {
        name: '[Content_Types].xml',
        data: Buffer.from('<?xml version="1.0"?><Types xmlns="http://schemas.openxmlformats.org/package/2006/content-types"/>'),
      },
      {
        name: 'xl/workbook.xml',
        data: Buffer.from('<?xml version="1.0"?><workbook xmlns="http://schemas.openxmlformats.org/spreadsheetml/2006/main"/>'),
      },
      { name: 'xl/worksheets/sheet1.xml', data: sheet, declaredSize: 4096 },
    ]);
    expect(bomb.length).toBeLessThan(IMPORT_LIMITS.maxFileBytes);
    const started = Date.now();
    const r = await upload(estimator, 'catalogue.xlsx', bomb, 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet');
    expect(r.status).toBe(400);
    expect(r.body.error.details[0].message).toMatch(/expands beyond|damaged/);
    expect(Date.now() - started).toBeLessThan(10_000);
    // one row over the limit: refused before any is written
    const header = (await estimator.agent.get('/api/catalogue.csv').expect(200)).text.replace(/^\uFEFF/, '').split('\r\n')[0]!;
    const rows = Array.from({ length: IMPORT_LIMITS.maxRows + 1 }, (_v, i) => `PW-ROWS-${i},x`);
    const many = await upload(estimator, 'many.csv', [header, ...rows].join('\r\n'), 'text/csv');
    expect(many.status).toBe(400);
    expect(many.body.error.details[0].message).toBe(`the file has more than ${IMPORT_LIMITS.maxRows} rows`);
    expect(content(await allItems(estimator))).toEqual(before);
  });

  it('refuses an empty file, a file that is not a spreadsheet, missing columns, and a wrong file type', async () => {
    const estimator = await signInAs('estimator');
    const empty = await upload(estimator, 'empty.csv', '', 'text/csv').expect(400);
    expect(empty.body.error.details[0].message).toBe('the file is empty');
    const notXlsx = await upload(
      estimator,
      'fake.xlsx',
      'this is plain text, not a workbook',
      'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet',
    ).expect(400);
    expect(notXlsx.body.error.details[0].message).toMatch(/not an \.xlsx workbook/);
    const cols = await upload(estimator, 'cols.csv', 'code,description\r\nPW-X-1,thing\r\n', 'text/csv').expect(400);
    expect(cols.body.error.details.map((d: { message: string }) => d.message)).toContain('missing required column "category"');
    const pdf = await upload(estimator, 'catalogue.pdf', '%PDF-1.4', 'application/pdf').expect(415);
    expect(pdf.body.error.code).toBe('unsupported_file');
    await upload(await signInAs('designer'), 'x.csv', 'code\r\n', 'text/csv').expect(403);
  });
});

describe('frozen unit cost', () => {
  it('keeps a stored bill-of-materials line at the unit cost it was priced at when the catalogue price changes', async () => {
    const designer = await signInAs('designer');
    const estimator = await signInAs('estimator');
    const job = (
      await send(designer, 'post', '/api/jobs', { number: `FZ-${uniq()}`, name: 'Frozen price check', availableFaultKa: 22 }).expect(201)
    ).body;
    const panel = (await send(designer, 'post', `/api/jobs/${job.id}/panels`, { name: 'MCC-Z' }).expect(201)).body;
    await send(designer, 'post', `/api/panels/${panel.id}/loads`, { answers: { tag: 'P-9', supply: 'ac3', hp: 10, volts: 460 } }).expect(
      201,
    );
    const built = (await send(estimator, 'post', `/api/panels/${panel.id}/bom/rebuild`, {}).expect(200)).body;
    const line = built.lines.find(
      (l: { bucket: string; category: string; status: string }) =>
        l.bucket === 'P-9' && l.category === 'contactor' && l.status === 'matched',
    );
    expect(line).toBeDefined();
    const [item] = (await estimator.agent.get(`/api/catalogue/items?q=${line.code}`).expect(200)).body as Entry[];
    expect(item!.unitCost).toBe(line.unitCost);
    const raised = Math.round((item!.unitCost + 123.45) * 100) / 100;
    await send(estimator, 'patch', `/api/catalogue/items/${item!.id}`, { unitCost: raised, version: item!.version }).expect(200);

    const after = (await estimator.agent.get(`/api/panels/${panel.id}/bom`).expect(200)).body;
    const same = after.lines.find((l: { id: number }) => l.id === line.id);
    expect(same.unitCost).toBe(line.unitCost);
    expect(after.totals.materialCost).toBe(built.totals.materialCost);
    expect(after.stale).toBe(false); // a price is not a design change

    // a plain rebuild keeps the frozen price; only an explicit re-price takes today's
    const again = (await send(estimator, 'post', `/api/panels/${panel.id}/bom/rebuild`, {}).expect(200)).body;
    expect(again.lines.find((l: { code: string; bucket: string }) => l.code === line.code && l.bucket === 'P-9').unitCost).toBe(
      line.unitCost,
    );
    const repriced = (await send(estimator, 'post', `/api/panels/${panel.id}/bom/rebuild`, { reprice: true }).expect(200)).body;
    expect(repriced.lines.find((l: { code: string; bucket: string }) => l.code === line.code && l.bucket === 'P-9').unitCost).toBe(raised);
    await send(estimator, 'patch', `/api/catalogue/items/${item!.id}`, { unitCost: item!.unitCost, version: item!.version + 1 }).expect(
      200,
    );
  });
});
