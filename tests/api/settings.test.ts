// The shop's settings (name, address, logo, pricing defaults, drawing numbers, self sign-off) and the
// separation of duties at sign-off, in a shop of the test's own so the demo shop is never changed.
import { beforeAll, describe, expect, it } from 'vitest';
import argon2 from 'argon2';
import { anonymous, send, signIn, testApp, type Session, binary } from '../setup/api';
import { Organisation } from '../../server/db/models/organisation';
import { User } from '../../server/db/models/user';
import { db } from '../../server/db/sequelize';
import { seedCatalogue } from '../../server/db/seeders/catalogue';
import { DEMO_MOTORS } from '../../server/db/seeders/demo-panels';
import { extractPdfText, inflatePdf } from '../unit/panel/pdf-text';

const uniq = () => `ST-${Date.now().toString(36)}-${Math.floor(Math.random() * 1e6)}`;
const PASSWORD = 'settings-test-pass-1';
// a 1 x 1 px PNG and the first bytes of a JPEG (JFIF)
const PNG = Buffer.from('iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mNk+M9QDwADhgGAWjR9awAAAABJRU5ErkJggg==', 'base64');

type Who = 'admin' | 'designer' | 'estimator' | 'engineer' | 'both';
const ROLES: Record<Who, string[]> = {
  admin: ['admin'],
  designer: ['designer'],
  estimator: ['estimator'],
  engineer: ['engineer'],
  both: ['designer', 'engineer'],
};
const NAMES: Record<Who, string> = {
  admin: 'Ola Admin',
  designer: 'Pia Builder',
  estimator: 'Tom Estimator',
  engineer: 'Una Engineer',
  both: 'Rhea Both',
};

let shopName: string;
const s = {} as Record<Who, Session>;

beforeAll(async () => {
  testApp();
  shopName = 'Lantern Hill Controls'; // fictional
  const org = await Organisation.create({ name: shopName });
  await db().transaction((t) => seedCatalogue(org.id, t));
  const hash = await argon2.hash(PASSWORD);
  const tag = uniq().toLowerCase();
  for (const who of Object.keys(ROLES) as Who[]) {
    const email = `${who}-${tag}@lantern.test`;
    await User.create({
      organisationId: org.id,
      email,
      name: NAMES[who],
      roles: ROLES[who],
      passwordHash: hash,
      inviteToken: null,
      lastSignInAt: null,
    });
    s[who] = await signIn(email, PASSWORD);
  }
});

async function settings() {
  return (await s.admin.agent.get('/api/settings').expect(200)).body;
}

/** PUT the current settings with some fields changed, expecting a status. */
async function put(body: Record<string, unknown>, status: number, who: Who = 'admin') {
  const current = await settings();
  const { logo: _logo, updatedAt: _u, ...fields } = current;
  return send(s[who], 'put', '/api/settings', { ...fields, ...body }).expect(status);
}

function uploadLogo(who: Who, version: number, data: Buffer, name = 'logo.png') {
  return s[who].agent
    .put('/api/settings/logo')
    .set('x-csrf-token', s[who].token)
    .field('version', String(version))
    .attach('file', data, name);
}

describe('shop settings', () => {
  it('shows every role of the shop its settings, with the defaults of a new shop', async () => {
    for (const who of ['admin', 'designer', 'estimator', 'engineer'] as const) {
      const r = (await s[who].agent.get('/api/settings').expect(200)).body;
      expect(r.name).toBe(shopName);
      // the product's defaults (migration 0008): $85/h and 15 % markup, as the panels had before
      expect(r).toMatchObject({
        address: '',
        defaultLabourRate: 85,
        defaultMarkupPercent: 15,
        drawingNumberScheme: '{job}-{panel}-{sheet:2}',
        allowSelfSignOff: false,
        logo: null,
      });
      expect(typeof r.version).toBe('number');
    }
    await (await anonymous()).agent.get('/api/settings').expect(401);
  });

  it('lets only the admin change them', async () => {
    for (const who of ['designer', 'estimator', 'engineer'] as const) {
      const r = await put({ address: 'nope' }, 403, who);
      expect(r.body.error.code).toBe('forbidden');
    }
    expect((await settings()).address).toBe('');
  });

  it('refuses settings it cannot use, saying why', async () => {
    const cases: Array<[string, Record<string, unknown>, string, RegExp]> = [
      ['no sheet number', { drawingNumberScheme: '{job}-{panel}' }, 'body.drawingNumberScheme', /Put \{sheet\} in the scheme/],
      ['unknown part', { drawingNumberScheme: '{customer}-{sheet}' }, 'body.drawingNumberScheme', /\{customer\} is not a known part/],
      ['unclosed brace', { drawingNumberScheme: '{job-{sheet}' }, 'body.drawingNumberScheme', /not a known part|needs its/],
      ['width on the job', { drawingNumberScheme: '{job:3}-{sheet}' }, 'body.drawingNumberScheme', /only the sheet takes a width/],
      ['negative labour rate', { defaultLabourRate: -1 }, 'body.defaultLabourRate', /cannot be negative/],
      ['markup above 300 %', { defaultMarkupPercent: 301 }, 'body.defaultMarkupPercent', /at most 300/],
      ['no name', { name: '  ' }, 'body.name', /Enter the shop name/],
      ['a field it does not know', { colour: 'teal' }, 'body', /.+/],
    ];
    for (const [what, body, path, message] of cases) {
      const r = await put(body, 400);
      const issue = (r.body.error.details as Array<{ path: string; message: string }>).find((i) => i.path === path);
      expect(issue, what).toBeDefined();
      expect(issue!.message, what).toMatch(message);
    }
  });

  it('saves a change, and answers 409 to a second change from the same stale version', async () => {
    const before = await settings();
    const { logo: _l, updatedAt: _u, ...fields } = before;
    const r = await send(s.admin, 'put', '/api/settings', {
      ...fields,
      address: '4 Kiln Road\nLantern Hill',
      drawingNumberScheme: 'LHC-{job}-{panel}-{rev}-{sheet:3}',
    }).expect(200);
    expect(r.body.version).toBe(before.version + 1);
    expect(r.body.address).toBe('4 Kiln Road\nLantern Hill');
    const stale = await send(s.admin, 'put', '/api/settings', { ...fields, address: 'Somewhere else' }).expect(409);
    expect(stale.body.error.message).toMatch(/Someone else changed the shop settings/);
    expect((await settings()).address).toBe('4 Kiln Road\nLantern Hill');
  });

  it("prices a new panel with the shop's defaults, keeps a panel's own rates, and leaves existing panels as they were", async () => {
    const job = (await send(s.designer, 'post', '/api/jobs', { number: uniq(), name: 'Pricing defaults' }).expect(201)).body;
    const old = (await send(s.designer, 'post', `/api/jobs/${job.id}/panels`, { name: 'Before' }).expect(201)).body;
    expect([old.markupPercent, old.labourRate]).toEqual([15, 85]);
    await put({ defaultLabourRate: 112.5, defaultMarkupPercent: 22 }, 200);
    const fresh = (await send(s.designer, 'post', `/api/jobs/${job.id}/panels`, { name: 'After' }).expect(201)).body;
    expect([fresh.markupPercent, fresh.labourRate]).toEqual([22, 112.5]);
    const own = (
      await send(s.designer, 'post', `/api/jobs/${job.id}/panels`, { name: 'Own', markupPercent: 10, labourRate: 70 }).expect(201)
    ).body;
    expect([own.markupPercent, own.labourRate]).toEqual([10, 70]);
    const again = (await s.designer.agent.get(`/api/panels/${old.id}`).expect(200)).body;
    expect([again.markupPercent, again.labourRate]).toEqual([15, 85]);
  });

  it('keeps the logo: upload, download by any role, refusals, removal', async () => {
    let v = (await settings()).version;
    await uploadLogo('designer', v, PNG).expect(403);
    const wrong = await uploadLogo('admin', v, Buffer.from('just text, not a picture'), 'logo.png').expect(400);
    expect(wrong.body.error.message).toMatch(/not a PNG or JPEG image/);
    const big = Buffer.concat([PNG, Buffer.alloc(600 * 1024)]);
    const tooBig = await uploadLogo('admin', v, big).expect(413);
    expect(tooBig.body.error.message).toMatch(/larger than 512 KB/);
    await uploadLogo('admin', v + 7, PNG).expect(409);
    await s.estimator.agent.get('/api/settings/logo').expect(404);

    const up = await uploadLogo('admin', v, PNG).expect(200);
    expect(up.body.logo).toMatchObject({ contentType: 'image/png', bytes: PNG.length });
    expect(up.body.version).toBe(v + 1);
    v = up.body.version;
    const got = await s.estimator.agent.get('/api/settings/logo').buffer(true).parse(binary).expect(200);
    expect(got.headers['content-type']).toBe('image/png');
    expect(Buffer.compare(got.body as Buffer, PNG)).toBe(0);

    const jpeg = Buffer.concat([Buffer.from([0xff, 0xd8, 0xff, 0xe0]), Buffer.alloc(200, 1)]);
    const replaced = await uploadLogo('admin', v, jpeg, 'logo.jpg').expect(200);
    expect(replaced.body.logo).toMatchObject({ contentType: 'image/jpeg', bytes: jpeg.length });
    const removed = await send(s.admin, 'delete', '/api/settings/logo', { version: replaced.body.version }).expect(200);
    expect(removed.body.logo).toBeNull();
    await s.engineer.agent.get('/api/settings/logo').expect(404);
    await uploadLogo('admin', removed.body.version, PNG).expect(200); // for the submittal below
  });

  it('prints the shop on the submittal: name on every page, page n of N, drawing numbers by the scheme, the nameplate manufacturer', async () => {
    const job = (
      await send(s.designer, 'post', '/api/jobs', {
        number: 'LH-77',
        name: 'Filter gallery',
        supplyVolts: 480,
        supplyPhases: 3,
        availableFaultKa: 10,
      }).expect(201)
    ).body;
    const panel = (await send(s.designer, 'post', `/api/jobs/${job.id}/panels`, { name: 'MCC 2' }).expect(201)).body;
    for (const m of DEMO_MOTORS.slice(0, 3)) await send(s.designer, 'post', `/api/panels/${panel.id}/loads`, { answers: m }).expect(201);
    await send(s.designer, 'post', `/api/panels/${panel.id}/bom/rebuild`, {}).expect((r) => expect(r.status).toBeLessThan(300));
    const checks = (await s.engineer.agent.get(`/api/panels/${panel.id}/checks`).expect(200)).body;
    expect(checks.nameplate.result.lines[0]).toMatchObject({ label: 'Manufacturer', value: shopName });
    const r = await s.engineer.agent.get(`/api/panels/${panel.id}/submittal.pdf`).buffer(true).parse(binary).expect(200);
    const pdf = inflatePdf(r.body as Buffer);
    const text = extractPdfText(pdf);
    const pages = (pdf.toString('latin1').match(/\/Type \/Page\b(?!s)/g) ?? []).length;
    expect(pages).toBeGreaterThan(3);
    expect(text).not.toContain('[Shop name]');
    expect(text).not.toContain('->');
    expect(text.split(shopName).length - 1).toBeGreaterThanOrEqual(pages);
    for (let n = 1; n <= pages; n++) {
      expect(text, `page ${n}`).toContain(`Page ${n} of ${pages}`);
      // scheme LHC-{job}-{panel}-{rev}-{sheet:3}; a draft's revision is D; the panel's space becomes a dash
      expect(text, `sheet ${n}`).toContain(`LHC-LH-77-MCC-2-D-${String(n).padStart(3, '0')}`);
    }
    expect(text).toContain('Not signed off');
    expect((pdf.toString('latin1').match(/\/I1 Do/g) ?? []).length).toBe(pages); // the logo on every page
  });
});

async function reviewPanel(author: Who, name: string) {
  const job = (await send(s[author], 'post', '/api/jobs', { number: uniq(), name }).expect(201)).body;
  const panel = (await send(s[author], 'post', `/api/jobs/${job.id}/panels`, { name }).expect(201)).body;
  await send(s[author], 'post', `/api/panels/${panel.id}/loads`, { answers: DEMO_MOTORS[3] }).expect(201);
  const fresh = (await s[author].agent.get(`/api/panels/${panel.id}`).expect(200)).body;
  const submitted = (await send(s[author], 'post', `/api/panels/${panel.id}/submit`, { version: fresh.version, comment: '' }).expect(200))
    .body;
  return { jobId: job.id as number, panelId: panel.id as number, version: submitted.version as number };
}

const approve = (who: Who, panelId: number, version: number) =>
  send(s[who], 'post', `/api/panels/${panelId}/approve`, {
    version,
    comment: 'Checked against the fault study on file',
    acknowledgeSccr: true,
  });

async function actions(jobId: number) {
  return (await s.admin.agent.get(`/api/jobs/${jobId}/activity`).expect(200)).body as Array<{
    action: string;
    summary: string;
    user: string;
  }>;
}

describe('separation of duties at sign-off', () => {
  beforeAll(async () => {
    await put({ allowSelfSignOff: false }, 200);
  });

  it('refuses the sign-off of a panel its engineer submitted, says why, and records the refusal', async () => {
    const { jobId, panelId, version } = await reviewPanel('both', 'Self review');
    const e = (await s.both.agent.get(`/api/panels/${panelId}/sign-off-eligibility`).expect(200)).body;
    expect(e).toMatchObject({ selfReview: true, allowed: false });
    expect(e.reason).toMatch(/another engineer must sign it off/);
    expect(e.actions.join(' ')).toMatch(/Submitted Self review/);
    const r = await approve('both', panelId, version).expect(403);
    expect(r.body.error.message).toBe(e.reason);
    expect((await s.both.agent.get(`/api/panels/${panelId}`).expect(200)).body.status).toBe('in_review');
    const log = await actions(jobId);
    expect(log.find((a) => a.action === 'sign-off-refused')).toMatchObject({ user: NAMES.both });
    expect(log.some((a) => a.action === 'signed-off')).toBe(false);
    // another engineer signs it off
    const other = (await s.engineer.agent.get(`/api/panels/${panelId}/sign-off-eligibility`).expect(200)).body;
    expect(other).toMatchObject({ selfReview: false, reason: null });
    expect((await approve('engineer', panelId, version).expect(200)).body.status).toBe('signed_off');
    // the panel builder who only looks is no author of this panel either; another shop's panel is not found
    expect((await s.designer.agent.get(`/api/panels/${panelId}/sign-off-eligibility`).expect(200)).body.selfReview).toBe(false);
  });

  it('lets a person with both roles sign off what someone else built, even after commenting on it', async () => {
    const { panelId } = await reviewPanel('designer', 'Reviewed by both');
    await send(s.both, 'post', `/api/panels/${panelId}/comments`, { body: 'Looks right to me' }).expect(201);
    const p = (await s.both.agent.get(`/api/panels/${panelId}`).expect(200)).body;
    expect((await approve('both', panelId, p.version).expect(200)).body.status).toBe('signed_off');
  });

  it("counts a change to the job's supply data, not to its name, nor a change of markup", async () => {
    const job = (await send(s.designer, 'post', '/api/jobs', { number: uniq(), name: 'Job data' }).expect(201)).body;
    const panel = (await send(s.designer, 'post', `/api/jobs/${job.id}/panels`, { name: 'Job data' }).expect(201)).body;
    await send(s.designer, 'post', `/api/panels/${panel.id}/loads`, { answers: DEMO_MOTORS[3] }).expect(201);
    const j1 = (await s.both.agent.get(`/api/jobs/${job.id}`).expect(200)).body;
    await send(s.both, 'patch', `/api/jobs/${job.id}`, { name: 'Job data (renamed)', version: j1.version }).expect(200);
    const p1 = (await s.both.agent.get(`/api/panels/${panel.id}`).expect(200)).body;
    await send(s.both, 'patch', `/api/panels/${panel.id}`, { markupPercent: 18, version: p1.version }).expect(200);
    expect((await s.both.agent.get(`/api/panels/${panel.id}/sign-off-eligibility`).expect(200)).body.selfReview).toBe(false);
    const j2 = (await s.both.agent.get(`/api/jobs/${job.id}`).expect(200)).body;
    await send(s.both, 'patch', `/api/jobs/${job.id}`, { ambientC: 45, version: j2.version }).expect(200);
    const e = (await s.both.agent.get(`/api/panels/${panel.id}/sign-off-eligibility`).expect(200)).body;
    expect(e.selfReview).toBe(true);
    expect(e.actions.join(' ')).toMatch(/Changed job/);
    const p2 = (await s.designer.agent.get(`/api/panels/${panel.id}`).expect(200)).body;
    const sub = (await send(s.designer, 'post', `/api/panels/${panel.id}/submit`, { version: p2.version, comment: '' }).expect(200)).body;
    await approve('both', panel.id, sub.version).expect(403);
  });

  it('counts only what was done since the last revision', async () => {
    const { panelId, version } = await reviewPanel('both', 'Since R0');
    await approve('engineer', panelId, version).expect(200); // R0 by another engineer
    // the panel builder opens the next draft and submits; the dual-role person did nothing since R0
    const p = (await s.designer.agent.get(`/api/panels/${panelId}`).expect(200)).body;
    await send(s.designer, 'put', `/api/loads/${p.loads[0].id}`, {
      answers: { ...p.loads[0].answers, critical: true },
      version: p.loads[0].version,
    }).expect(200);
    const draft = (await s.designer.agent.get(`/api/panels/${panelId}`).expect(200)).body;
    const sub = (await send(s.designer, 'post', `/api/panels/${panelId}/submit`, { version: draft.version, comment: '' }).expect(200)).body;
    expect((await approve('both', panelId, sub.version).expect(200)).body.revisionNumber).toBe(1);
  });

  it('allows a self sign-off when the shop allows it, and records it as such', async () => {
    await put({ allowSelfSignOff: true }, 200);
    try {
      const { jobId, panelId, version } = await reviewPanel('both', 'Allowed self review');
      const e = (await s.both.agent.get(`/api/panels/${panelId}/sign-off-eligibility`).expect(200)).body;
      expect(e).toMatchObject({ selfReview: true, allowed: true, reason: null });
      expect((await approve('both', panelId, version).expect(200)).body.status).toBe('signed_off');
      const self = (await actions(jobId)).find((a) => a.action === 'self-sign-off');
      expect(self).toMatchObject({ user: NAMES.both });
      expect(self!.summary).toMatch(/self sign-off allowed by the shop settings/);
    } finally {
      await put({ allowSelfSignOff: false }, 200);
    }
  });
});
