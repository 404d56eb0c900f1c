// Swaps on the bill of materials: only parts that meet the line's requirement (the one the matcher used)
// are offered or accepted, and any change to a signed-off panel's bill of materials opens a new draft that
// needs a new sign-off; in review it is refused, as a motor edit is. On a job of the test's own: one
// 25 hp 460 V three-phase motor across the line (FVNR).
import { beforeAll, describe, expect, it } from 'vitest';
import { send, signInAs, type Session } from '../setup/api';

interface Line {
  id: number;
  bucket: string;
  category: string;
  code: string | null;
  unitCost: number;
  source: 'auto' | 'manual' | 'swapped';
  status: string;
  swapReason: string | null;
  swappedFrom?: string | null;
  requirement?: unknown[] | null;
}
interface Panel {
  id: number;
  status: string;
  version: number;
  revisionNumber: number | null;
}

const uniq = () => `SW-${Date.now().toString(36)}-${Math.floor(Math.random() * 1e6)}`;

let designer: Session;
let estimator: Session;
let engineer: Session;
let admin: Session;
let jobId: number;
let panelId: number;
/** a second make of NEMA size 2 contactor with a 120 V coil (invented part), marked lower and hotter than the demo one */
const OTHER_SIZE_2 = `PW-CN-N2-120-${Date.now().toString(36).toUpperCase().slice(-6)}`;

const lines = async () => (await estimator.agent.get(`/api/panels/${panelId}/bom`).expect(200)).body as { lines: Line[]; stale: boolean };
const panel = async () => (await designer.agent.get(`/api/panels/${panelId}`).expect(200)).body as Panel;
const contactor = async () => (await lines()).lines.find((l) => l.bucket === 'M-25' && l.category === 'contactor')!;

async function signOff() {
  let p = await panel();
  p = (await send(designer, 'post', `/api/panels/${panelId}/submit`, { version: p.version }).expect(200)).body;
  p = (await send(engineer, 'post', `/api/panels/${panelId}/approve`, { version: p.version, comment: 'Checked' }).expect(200)).body;
  expect(p.status).toBe('signed_off');
  return p;
}

beforeAll(async () => {
  [designer, estimator, engineer, admin] = await Promise.all([
    signInAs('designer'),
    signInAs('estimator'),
    signInAs('engineer'),
    signInAs('admin'),
  ]);
  // 2 kA available: the panel's parts (5 kA and up, invented demo ratings) cover it, so sign-off needs no acknowledgement
  const job = (
    await send(designer, 'post', '/api/jobs', { number: uniq(), name: 'Swap test', availableFaultKa: 2, ambientC: 30 }).expect(201)
  ).body;
  jobId = job.id;
  panelId = (await send(designer, 'post', `/api/jobs/${jobId}/panels`, { name: 'Swap panel' }).expect(201)).body.id;
  await send(designer, 'post', `/api/panels/${panelId}/loads`, {
    answers: { tag: 'M-25', supply: 'ac3', hp: 25, volts: 460, fla: 34, serviceFactor: 1.15, environment: 'indoor-dry' },
  }).expect(201);
  await send(estimator, 'post', `/api/panels/${panelId}/bom/rebuild`, {}).expect(200);
  await send(admin, 'post', '/api/catalogue/items', {
    code: OTHER_SIZE_2,
    description: 'Contactor, NEMA size 2, 3-pole, 45 A, 120 V AC coil (second make, test)',
    category: 'contactor',
    unit: 'ea',
    ratings: {
      volts: 600,
      poles: 3,
      coilVolts: 120,
      nemaSize: '2',
      amps: 45,
      hpByVolts: { '460': 25 },
      sealedVa: 40,
      inrushVa: 350,
      kind: 'nema',
    },
    sccrKa: 3,
    heatLossW: 40,
    // dearer than the demo size 2 (188), so the matcher keeps picking that one
    unitCost: 205,
    leadTimeDays: 5,
  }).expect(201);
});

describe('the swap list and the swap', () => {
  it('keeps on each line the requirement the matcher used', async () => {
    const line = await contactor();
    // NEMA ICS 2: a 25 hp 460 V motor across the line takes a size 2 starter (from memory); coil at the 120 V control voltage
    expect(line.code).toBe('PW-CN-N2-120');
    expect(line.requirement).toEqual([expect.objectContaining({ category: 'contactor', nemaSize: '2', coilVolts: 120, volts: 460 })]);
  });

  it('offers only the parts that meet it: not the size 00 or the 24 V coil, but the second size 2 make', async () => {
    const line = await contactor();
    const offered = (
      (await estimator.agent.get(`/api/panels/${panelId}/bom/lines/${line.id}/alternatives`).expect(200)).body as Array<{ code: string }>
    ).map((a) => a.code);
    expect(offered).toEqual([OTHER_SIZE_2]);
    expect(offered).not.toContain('PW-CN-N00-120');
    expect(offered).not.toContain('PW-CN-N2-24');
  });

  it('refuses a swap for a part that does not meet it, naming what it lacks, and leaves the line as it was', async () => {
    const line = await contactor();
    const small = await send(estimator, 'patch', `/api/panels/${panelId}/bom/lines/${line.id}`, {
      swapCode: 'PW-CN-N00-120',
      swapReason: 'In stock',
    }).expect(400);
    // catalogue: PW-CN-N00-120 is a NEMA size 00, 9 A contactor
    expect(small.body.error.message).toBe(
      'PW-CN-N00-120 does not meet what motor M-25 needs: NEMA size 00 (9 A), not the NEMA size 2 motor M-25 needs',
    );
    expect(small.body.error.details).toEqual([
      { path: 'body.swapCode', message: 'NEMA size 00 (9 A), not the NEMA size 2 motor M-25 needs' },
    ]);
    const coil = await send(estimator, 'patch', `/api/panels/${panelId}/bom/lines/${line.id}`, {
      swapCode: 'PW-CN-N2-24',
      swapReason: 'In stock',
    }).expect(400);
    expect(coil.body.error.message).toMatch(/24 V coil, not the 120 V control voltage motor M-25 needs/);
    expect((await contactor()).code).toBe('PW-CN-N2-120');

    // the overload relay: its dial must hold the motor's 34 A nameplate current (NEC 430.32 sets the limit, the dial is set at FLA)
    const b = await lines();
    const relayLine = b.lines.find((l) => l.bucket === 'M-25' && l.category === 'overload-relay')!;
    const relays = (await estimator.agent.get('/api/catalogue/items?category=overload-relay').expect(200)).body as Array<{
      code: string;
      active: boolean;
      ratings: { settingMinAmps: number; settingMaxAmps: number };
    }>;
    const tooSmall = relays.find((r) => r.active && r.ratings.settingMaxAmps < 34)!;
    const refused = await send(estimator, 'patch', `/api/panels/${panelId}/bom/lines/${relayLine.id}`, {
      swapCode: tooSmall.code,
      swapReason: 'In stock',
    }).expect(400);
    expect(refused.body.error.message).toContain(
      `setting range ${tooSmall.ratings.settingMinAmps}–${tooSmall.ratings.settingMaxAmps} A does not hold the 34 A setting motor M-25 needs`,
    );
    const fitting = (await estimator.agent.get(`/api/panels/${panelId}/bom/lines/${relayLine.id}/alternatives`).expect(200)).body as Array<{
      code: string;
      ratings: { settingMinAmps: number; settingMaxAmps: number };
    }>;
    for (const r of fitting) {
      expect(r.ratings.settingMinAmps).toBeLessThanOrEqual(34);
      expect(r.ratings.settingMaxAmps).toBeGreaterThanOrEqual(34);
    }
  });
});

describe('a signed-off panel', () => {
  it('opens a new draft on a swap, and the checks are worked out with the swapped part', async () => {
    const signed = await signOff();
    const before = (await engineer.agent.get(`/api/panels/${panelId}/checks`).expect(200)).body;
    const line = await contactor();
    const swapped = (
      await send(estimator, 'patch', `/api/panels/${panelId}/bom/lines/${line.id}`, {
        swapCode: OTHER_SIZE_2,
        swapReason: "Customer's standard make",
      }).expect(200)
    ).body as Line;
    expect(swapped).toMatchObject({
      code: OTHER_SIZE_2,
      source: 'swapped',
      swappedFrom: 'PW-CN-N2-120',
      swapReason: "Customer's standard make",
      unitCost: 205,
    });
    const p = await panel();
    expect(p.status).toBe('draft');
    expect(p.revisionNumber).toBe(signed.revisionNumber);
    const activity = (await designer.agent.get(`/api/jobs/${jobId}/activity`).expect(200)).body as
      | Array<{ action: string; summary: string }>
      | { items: Array<{ action: string; summary: string }> };
    const items = Array.isArray(activity) ? activity : activity.items;
    expect(
      items.some(
        (a) =>
          a.action === 'reopened' &&
          a.summary.includes(`Opened a new draft after R${signed.revisionNumber}`) &&
          a.summary.includes('swapped'),
      ),
    ).toBe(true);

    // the bill of materials is still up to date (the swap is kept by a rebuild), and the checks see the swapped part:
    // its 3 kA marking limits the panel (weakest link, UL 508A SB4) and its 40 W are in the heat load
    expect((await lines()).stale).toBe(false);
    const checks = (await engineer.agent.get(`/api/panels/${panelId}/checks`).expect(200)).body;
    expect(checks.bom.stale).toBe(false);
    expect(checks.sccr.panelSccrKa).toBe(3);
    expect(checks.sccr.limiting.map((r: { code: string }) => r.code)).toContain(OTHER_SIZE_2);
    const sources = checks.heat.result.sources as Array<{ code: string }>;
    expect(sources.map((s) => s.code)).toContain(OTHER_SIZE_2);
    expect(sources.map((s) => s.code)).not.toContain('PW-CN-N2-120');
    // control power: the second make's coil (40 VA sealed, 350 VA inrush; the demo size 2: 29 and 283, invented catalogue data)
    expect(checks.controlPower.result.sealedVa).toBeCloseTo(before.controlPower.result.sealedVa + 11, 2);
    expect(checks.controlPower.result.inrushVa).toBe(350);
    expect(before.controlPower.result.inrushVa).toBe(283);
  });

  it('refuses bill-of-materials changes while in review (409), and the next sign-off freezes the swap', async () => {
    let p = await panel();
    p = (await send(designer, 'post', `/api/panels/${panelId}/submit`, { version: p.version }).expect(200)).body;
    const line = await contactor();
    const swap = await send(estimator, 'patch', `/api/panels/${panelId}/bom/lines/${line.id}`, {
      swapCode: 'PW-CN-N2-120',
      swapReason: 'Back to the first make',
    }).expect(409);
    expect(swap.body.error.message).toMatch(/is in review: the engineer must return it before its bill of materials can change/);
    await send(estimator, 'post', `/api/panels/${panelId}/bom/lines`, {
      category: 'freight',
      description: 'Freight',
      quantity: 1,
      unitCost: 100,
    }).expect(409);
    // a rebuild that changes no part is no change to the design
    await send(estimator, 'post', `/api/panels/${panelId}/bom/rebuild`, {}).expect(200);
    expect((await panel()).status).toBe('in_review');

    p = (
      await send(engineer, 'post', `/api/panels/${panelId}/approve`, {
        version: (await panel()).version,
        comment: 'Second make accepted',
      }).expect(200)
    ).body;
    expect(p.status).toBe('signed_off');
    const rev = (await engineer.agent.get(`/api/panels/${panelId}/revisions/${p.revisionNumber}`).expect(200)).body;
    const frozen = (rev.snapshot.bom as Line[]).find((l) => l.bucket === 'M-25' && l.category === 'contactor')!;
    expect(frozen).toMatchObject({ code: OTHER_SIZE_2, source: 'swapped', swappedFrom: 'PW-CN-N2-120' });
  });

  it('opens a new draft on a manual line too, and on removing it', async () => {
    expect((await panel()).status).toBe('signed_off');
    const freight = (
      await send(estimator, 'post', `/api/panels/${panelId}/bom/lines`, {
        category: 'freight',
        description: 'Freight to site',
        quantity: 1,
        unitCost: 300,
      }).expect(201)
    ).body as Line;
    expect((await panel()).status).toBe('draft');
    await signOff();
    // the sign-off rebuilt the lines: the manual line is kept, under a new id
    const kept = (await lines()).lines.find((l) => l.source === 'manual' && l.unitCost === freight.unitCost)!;
    await send(estimator, 'delete', `/api/panels/${panelId}/bom/lines/${kept.id}`).expect(204);
    expect((await panel()).status).toBe('draft');
  });

  it('drops a swap on rebuild once its part no longer meets the line (the motor grew), and says so', async () => {
    const loads = (await panel()) as unknown as { loads: Array<{ id: number; version: number; answers: Record<string, unknown> }> };
    const m = loads.loads[0]!;
    // 40 hp at 460 V: 52 A (NEC 2023 Table 430.250), a size 3 starter (NEMA ICS 2, from memory)
    await send(designer, 'put', `/api/loads/${m.id}`, { answers: { ...m.answers, hp: 40, fla: 52 }, version: m.version }).expect(200);
    expect((await lines()).stale).toBe(true);
    await send(estimator, 'post', `/api/panels/${panelId}/bom/rebuild`, {}).expect(200);
    const line = await contactor();
    expect(line).toMatchObject({ code: 'PW-CN-N3-120', source: 'auto' });
    const activity = (await designer.agent.get(`/api/jobs/${jobId}/activity`).expect(200)).body as
      | Array<{ action: string; summary: string }>
      | { items: Array<{ action: string; summary: string }> };
    const items = Array.isArray(activity) ? activity : activity.items;
    expect(items.find((a) => a.action === 'rebuilt')?.summary).toMatch(
      new RegExp(
        `dropped the swap that no longer fit: ${OTHER_SIZE_2} on M-25 \\(NEMA size 2 \\(45 A\\), not the NEMA size 3 motor M-25 needs\\)`,
      ),
    );
  });
});
