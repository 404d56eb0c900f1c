// Tested combination ratings (UL 508A SB4): who may edit them, what is refused, and how they change a
// panel's SCCR worksheet. Combination data here is invented, as in the demo catalogue.
import { beforeAll, describe, expect, it } from 'vitest';
import { addSecondMake, send, signInAs, type Session } from '../setup/api';

const uniq = () => `${Date.now().toString(36)}${Math.floor(Math.random() * 1e4)}`.toUpperCase();

interface Row {
  location: string;
  category: string;
  code: string;
  ratingKa: number;
  source: string;
  basis: string;
}

let designer: Session;
let engineer: Session;
let estimator: Session;

beforeAll(async () => {
  designer = await signInAs('designer');
  engineer = await signInAs('engineer');
  estimator = await signInAs('estimator');
});

/** A panel with one 10 hp 460 V FVNR motor and its stored bill of materials. */
async function onePanel() {
  const job = (
    await send(designer, 'post', '/api/jobs', { number: `CMB-${uniq()}`, name: 'Filter press feed', availableFaultKa: 22 }).expect(201)
  ).body;
  const panel = (await send(designer, 'post', `/api/jobs/${job.id}/panels`, { name: 'MCC-F' }).expect(201)).body;
  await send(designer, 'post', `/api/panels/${panel.id}/loads`, {
    answers: { tag: 'F-1', supply: 'ac3', hp: 10, volts: 460, fla: 14, environment: 'indoor-dusty' },
  }).expect(201);
  await send(estimator, 'post', `/api/panels/${panel.id}/bom/rebuild`, {}).expect((r) => expect(r.status).toBeLessThan(300));
  return panel.id as number;
}

async function bucketRows(panelId: number): Promise<Row[]> {
  const c = (await engineer.agent.get(`/api/panels/${panelId}/checks`).expect(200)).body;
  return (c.sccr.rows as Row[]).filter((r) => r.location === 'F-1');
}

describe('tested combination ratings', () => {
  it('lists the seeded combinations to every role and lets only estimators, engineers and administrators change them', async () => {
    const list = (await designer.agent.get('/api/catalogue/combinations').expect(200)).body as Array<{
      ref: string;
      ratingKa: number;
      componentCodes: string[];
    }>;
    expect(list.find((c) => c.ref === 'PW-CMB-N1-030')).toMatchObject({
      ratingKa: 14,
      componentCodes: ['PW-BR-3P-030', 'PW-CN-N1-120', 'PW-OT-13A-C10'],
    });
    const body = { ref: `T-${uniq()}`, componentCodes: ['PW-BR-3P-030', 'PW-CN-N1-120'], ratingKa: 10, source: 'test' };
    await send(designer, 'post', '/api/catalogue/combinations', body).expect(403);
    await send(engineer, 'post', '/api/catalogue/combinations', body).expect(201);
  });

  it('raises a bucket’s contactor and overload relay to the combination’s rating, and drops it when deactivated', async () => {
    const panelId = await onePanel();
    const before = await bucketRows(panelId);
    const breaker = before.find((r) => r.category === 'circuit-breaker')!;
    const contactor = before.find((r) => r.category === 'contactor')!;
    const overload = before.find((r) => r.category === 'overload-relay')!;
    // alone: UL 508A Table SB4.1 (from memory), motor controller 0–50 hp 5 kA
    expect(contactor.ratingKa).toBeLessThanOrEqual(5);
    expect(overload).toMatchObject({ source: 'assumed', ratingKa: 5 });

    const ref = `T-${uniq()}`;
    const created = (
      await send(engineer, 'post', '/api/catalogue/combinations', {
        ref,
        componentCodes: [breaker.code, contactor.code, overload.code],
        ratingKa: breaker.ratingKa, // no higher than the breaker's own interrupting rating
        maxVolts: 480,
        source: 'maker’s combination table (test data)',
      }).expect(201)
    ).body as { id: number; version: number };
    const after = await bucketRows(panelId);
    for (const code of [breaker.code, contactor.code, overload.code]) {
      expect(after.find((r) => r.code === code)).toMatchObject({ source: 'combination', ratingKa: breaker.ratingKa });
    }
    expect(after.find((r) => r.code === overload.code)!.basis).toContain(ref);

    // a second panel with the same motor gets the same parts; swapping its contactor for another part
    // breaks the tested combination there, and only there
    const other = await onePanel();
    expect((await bucketRows(other)).find((r) => r.code === overload.code)).toMatchObject({ source: 'combination' });
    const lines = (await estimator.agent.get(`/api/panels/${other}/bom`).expect(200)).body.lines as Array<{
      id: number;
      bucket: string;
      category: string;
      code: string;
    }>;
    const line = lines.find((l) => l.bucket === 'F-1' && l.category === 'contactor')!;
    // a second make of the same contactor (the only kind of part a swap may take: one that meets the line's requirement)
    const second = await addSecondMake(estimator, line.code);
    const alternatives = (await estimator.agent.get(`/api/panels/${other}/bom/lines/${line.id}/alternatives`).expect(200)).body as Array<{
      code: string;
    }>;
    expect(alternatives.map((a) => a.code)).toContain(second);
    await send(estimator, 'patch', `/api/panels/${other}/bom/lines/${line.id}`, { swapCode: second, swapReason: 'stock' }).expect(200);
    expect((await bucketRows(other)).find((r) => r.code === overload.code)).toMatchObject({ source: 'assumed', ratingKa: 5 });
    expect((await bucketRows(panelId)).find((r) => r.code === overload.code)).toMatchObject({ source: 'combination' });

    // a stale version is refused; the current one deactivates it
    await send(engineer, 'patch', `/api/catalogue/combinations/${created.id}`, { active: false, version: created.version + 1 }).expect(409);
    await send(estimator, 'patch', `/api/catalogue/combinations/${created.id}`, { active: false, version: created.version }).expect(200);
    expect((await bucketRows(panelId)).find((r) => r.code === overload.code)).toMatchObject({ source: 'assumed', ratingKa: 5 });
  });

  it('refuses a part not in the catalogue, a rating above the breaker’s, a repeated reference and a single part, naming the field', async () => {
    const unknown = await send(engineer, 'post', '/api/catalogue/combinations', {
      ref: `T-${uniq()}`,
      componentCodes: ['PW-CN-N1-120', 'PW-NO-SUCH-PART'],
      ratingKa: 5,
      source: 'test',
    }).expect(400);
    expect(unknown.body.error.details[0]).toMatchObject({
      path: 'body.componentCodes.1',
      message: 'PW-NO-SUCH-PART is not in the catalogue',
    });
    // PW-BR-3P-030 is marked 14 kA: a combination with it cannot be rated 65 kA (UL 508A SB4)
    const tooHigh = await send(engineer, 'post', '/api/catalogue/combinations', {
      ref: `T-${uniq()}`,
      componentCodes: ['PW-BR-3P-030', 'PW-CN-N1-120'],
      ratingKa: 65,
      source: 'test',
    }).expect(400);
    expect(tooHigh.body.error.details[0]).toMatchObject({ path: 'body.ratingKa', message: 'at most 14 kA (PW-BR-3P-030)' });
    const again = await send(engineer, 'post', '/api/catalogue/combinations', {
      ref: 'PW-CMB-N1-030',
      componentCodes: ['PW-BR-3P-030', 'PW-CN-N1-120'],
      ratingKa: 5,
      source: 'test',
    }).expect(409);
    expect(again.body.error.details[0].path).toBe('body.ref');
    const single = await send(engineer, 'post', '/api/catalogue/combinations', {
      ref: `T-${uniq()}`,
      componentCodes: ['PW-CN-N1-120'],
      ratingKa: 5,
      source: 'test',
    }).expect(400);
    expect(single.body.error.details[0].path).toBe('body.componentCodes');
  });
});

describe('a combination table as a file', () => {
  const csvOf = (rows: string[]) => Buffer.from(`${['ref,parts,ratingKa,maxVolts,source,active', ...rows].join('\r\n')}\r\n`);
  const upload = (s: Session, body: Buffer, name = 'combinations.csv') =>
    s.agent.post('/api/catalogue/combinations/import').set('x-csrf-token', s.token).attach('file', body, name);
  const list = async () =>
    (await estimator.agent.get('/api/catalogue/combinations').expect(200)).body as Array<{
      ref: string;
      ratingKa: number;
      source: string;
      version: number;
      active: boolean;
    }>;

  it('exports the combinations in the import format, imports a table all or nothing, and changes in place by reference', async () => {
    const exported = await estimator.agent.get('/api/catalogue/combinations.csv').expect(200);
    expect(exported.headers['content-type']).toBe('text/csv; charset=utf-8');
    const original = exported.text.replace(/^\uFEFF/, '');
    const lines = original.trim().split(/\r\n/);
    expect(lines[0]).toBe('ref,parts,ratingKa,maxVolts,source,active');
    expect(lines).toContain(
      `PW-CMB-N1-030,PW-BR-3P-030 + PW-CN-N1-120 + PW-OT-13A-C10,14,480,maker's published combination table (invented demo data); no higher than the breaker's 14 kA,yes`,
    );
    const before = await list();

    // field problems: every bad row named, nothing written
    const bad = await upload(
      engineer,
      csvOf([`X-${uniq()},PW-BR-3P-030,abc,480,maker's table,yes`, `Y-${uniq()},PW-BR-3P-030 + PW-CN-N1-120,10,480,maker's table,maybe`]),
    ).expect(400);
    expect(bad.body.error.details.map((d: { path: string }) => d.path)).toEqual(['rows[2].parts', 'rows[2].ratingKa', 'rows[3].active']);
    // a rating above the combination's own breaker (PW-BR-3P-030, 14 kA marked; invented demo data)
    const over = await upload(engineer, csvOf([`Z-${uniq()},PW-BR-3P-030 + PW-CN-N1-120,20,480,maker's table,no`])).expect(400);
    expect(over.body.error.details).toEqual([{ path: 'rows[2].ratingKa', message: 'at most 14 kA (PW-BR-3P-030)' }]);
    const unknown = await upload(engineer, csvOf([`Z-${uniq()},PW-BR-3P-030 + NOT-A-PART,10,480,maker's table,no`])).expect(400);
    expect(unknown.body.error.details).toEqual([{ path: 'rows[2].parts.1', message: 'NOT-A-PART is not in the catalogue' }]);
    expect(await list()).toEqual(before);

    // a good table: the original rows, one source changed (text that looks like a formula), one new (set aside, so no panel changes)
    const fresh = `NEW-${uniq()}`;
    const changedRows = lines
      .slice(1)
      .map((l) =>
        l.startsWith('PW-CMB-N0-010,')
          ? l.replace(/,maker's published[^,]*,yes$/, ',"=HYPERLINK(""http://example.test"",""table"")",yes')
          : l,
      );
    const good = await upload(
      engineer,
      csvOf([...changedRows, `${fresh},PW-BR-3P-010 + PW-CN-N0-120,5,480,maker's table (invented),no`]),
    ).expect(200);
    expect(good.body).toEqual({ created: 1, changed: 1, unchanged: before.length - 1 });
    const after = await list();
    const n0 = after.find((c) => c.ref === 'PW-CMB-N0-010')!;
    expect(n0.source).toBe('=HYPERLINK("http://example.test","table")');
    expect(n0.version).toBe(before.find((c) => c.ref === 'PW-CMB-N0-010')!.version + 1);
    expect(after.find((c) => c.ref === fresh)).toMatchObject({ ratingKa: 5, active: false });
    // the export neutralises the formula-like text; importing the original table puts the source back
    expect((await estimator.agent.get('/api/catalogue/combinations.csv').expect(200)).text).toContain(
      `PW-CMB-N0-010,PW-BR-3P-010 + PW-CN-N0-120 + PW-OT-4A-C10,14,480,"'=HYPERLINK(""http://example.test"",""table"")",yes`,
    );
    const back = await upload(engineer, Buffer.from(original)).expect(200);
    expect(back.body).toEqual({ created: 0, changed: 1, unchanged: before.length - 1 });
    expect((await list()).find((c) => c.ref === 'PW-CMB-N0-010')!.source).toBe(before.find((c) => c.ref === 'PW-CMB-N0-010')!.source);
  });

  it('refuses the panel builder and a wrong header', async () => {
    await upload(designer, csvOf([])).expect(403);
    const r = await upload(estimator, Buffer.from('code,rating\r\nA,1\r\n')).expect(400);
    expect(r.body.error.message).toBe('The header row must be: ref, parts, ratingKa, maxVolts, source, active');
  });
});
