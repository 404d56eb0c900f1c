// Tested combination ratings (UL 508A SB4): who may edit them, what is refused, and how they change a
// panel's SCCR worksheet. Combination data here is invented, as in the demo catalogue.
import { beforeAll, describe, expect, it } from 'vitest';
import { send, signInAs, type Session } from '../setup/api';

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
  const job = (await send(designer, 'post', '/api/jobs', { number: `CMB-${uniq()}`, name: 'Filter press feed', availableFaultKa: 22 }).expect(201)).body;
  const panel = (await send(designer, 'post', `/api/jobs/${job.id}/panels`, { name: 'MCC-F' }).expect(201)).body;
  await send(designer, 'post', `/api/panels/${panel.id}/loads`, { answers: { tag: 'F-1', supply: 'ac3', hp: 10, volts: 460, fla: 14, environment: 'indoor-dusty' } }).expect(201);
  await send(estimator, 'post', `/api/panels/${panel.id}/bom/rebuild`, {}).expect((r) => expect(r.status).toBeLessThan(300));
  return panel.id as number;
}

async function bucketRows(panelId: number): Promise<Row[]> {
  const c = (await engineer.agent.get(`/api/panels/${panelId}/checks`).expect(200)).body;
  return (c.sccr.rows as Row[]).filter((r) => r.location === 'F-1');
}

describe('tested combination ratings', () => {
  it('lists the seeded combinations to every role and lets only estimators, engineers and administrators change them', async () => {
    const list = (await designer.agent.get('/api/catalogue/combinations').expect(200)).body as Array<{ ref: string; ratingKa: number; componentCodes: string[] }>;
    expect(list.find((c) => c.ref === 'PW-CMB-N1-030')).toMatchObject({ ratingKa: 14, componentCodes: ['PW-BR-3P-030', 'PW-CN-N1-120', 'PW-OT-13A-C10'] });
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
    const lines = (await estimator.agent.get(`/api/panels/${other}/bom`).expect(200)).body.lines as Array<{ id: number; bucket: string; category: string; code: string }>;
    const line = lines.find((l) => l.bucket === 'F-1' && l.category === 'contactor')!;
    const alternatives = (await estimator.agent.get(`/api/panels/${other}/bom/lines/${line.id}/alternatives`).expect(200)).body as Array<{ code: string }>;
    await send(estimator, 'patch', `/api/panels/${other}/bom/lines/${line.id}`, { swapCode: alternatives[0]!.code, swapReason: 'stock' }).expect(200);
    expect((await bucketRows(other)).find((r) => r.code === overload.code)).toMatchObject({ source: 'assumed', ratingKa: 5 });
    expect((await bucketRows(panelId)).find((r) => r.code === overload.code)).toMatchObject({ source: 'combination' });

    // a stale version is refused; the current one deactivates it
    await send(engineer, 'patch', `/api/catalogue/combinations/${created.id}`, { active: false, version: created.version + 1 }).expect(409);
    await send(estimator, 'patch', `/api/catalogue/combinations/${created.id}`, { active: false, version: created.version }).expect(200);
    expect((await bucketRows(panelId)).find((r) => r.code === overload.code)).toMatchObject({ source: 'assumed', ratingKa: 5 });
  });

  it('refuses a part not in the catalogue, a rating above the breaker’s, a repeated reference and a single part, naming the field', async () => {
    const unknown = await send(engineer, 'post', '/api/catalogue/combinations', { ref: `T-${uniq()}`, componentCodes: ['PW-CN-N1-120', 'PW-NO-SUCH-PART'], ratingKa: 5, source: 'test' }).expect(400);
    expect(unknown.body.error.details[0]).toMatchObject({ path: 'body.componentCodes.1', message: 'PW-NO-SUCH-PART is not in the catalogue' });
    // PW-BR-3P-030 is marked 14 kA: a combination with it cannot be rated 65 kA (UL 508A SB4)
    const tooHigh = await send(engineer, 'post', '/api/catalogue/combinations', { ref: `T-${uniq()}`, componentCodes: ['PW-BR-3P-030', 'PW-CN-N1-120'], ratingKa: 65, source: 'test' }).expect(400);
    expect(tooHigh.body.error.details[0]).toMatchObject({ path: 'body.ratingKa', message: 'at most 14 kA (PW-BR-3P-030)' });
    const again = await send(engineer, 'post', '/api/catalogue/combinations', { ref: 'PW-CMB-N1-030', componentCodes: ['PW-BR-3P-030', 'PW-CN-N1-120'], ratingKa: 5, source: 'test' }).expect(409);
    expect(again.body.error.details[0].path).toBe('body.ref');
    const single = await send(engineer, 'post', '/api/catalogue/combinations', { ref: `T-${uniq()}`, componentCodes: ['PW-CN-N1-120'], ratingKa: 5, source: 'test' }).expect(400);
    expect(single.body.error.details[0].path).toBe('body.componentCodes');
  });
});
