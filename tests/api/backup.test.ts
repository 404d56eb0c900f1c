// Job backup: export → import → export gives the same job (ids and timestamps aside); a bad file
// is refused naming the field; an import that fails midway leaves nothing behind.
import { beforeAll, describe, expect, it } from 'vitest';
import { QueryTypes } from 'sequelize';
import { send, signInAs, testApp, type Session } from '../setup/api';
import { db } from '../../server/db/sequelize';
import { Job } from '../../server/db/models/job';
import { findUserById } from '../../server/modules/users/repository';
import { importJob } from '../../server/modules/backup/service';
import { JobBackupSchema, MAX_BACKUP_BYTES, type JobBackup } from '../../server/modules/backup/schema';
import type { CurrentUser, Role } from '../../shared/schemas/auth';

type Json = Record<string, unknown>;

/** The export without what must differ between two jobs: the job number and the export/BOM times. */
function comparable(b: JobBackup) {
  const copy = structuredClone(b) as Json & { job: Json; panels: Json[] };
  delete copy.exportedAt;
  delete copy.job.number;
  for (const p of copy.panels) delete p.bomGeneratedAt;
  return copy;
}

/** Keys that name database ids, outside the frozen blobs (selection, snapshot) carried verbatim. */
function idKeys(v: unknown, path = ''): string[] {
  if (Array.isArray(v)) return v.flatMap((x, i) => idKeys(x, `${path}[${i}]`));
  if (!v || typeof v !== 'object') return [];
  return Object.entries(v as Json).flatMap(([k, x]) => {
    if (k === 'selection' || k === 'snapshot' || k === 'rollup' || k === 'answers') return [];
    const here = /^id$|Id$/.test(k) ? [`${path}.${k}`] : [];
    return [...here, ...idKeys(x, `${path}.${k}`)];
  });
}

async function counts() {
  const rows = await db().query<{ t: string; n: number }>(
    `select 'jobs' t, count(*)::int n from jobs union all select 'panels', count(*)::int from panels union all select 'loads', count(*)::int from loads
     union all select 'comments', count(*)::int from comments union all select 'revisions', count(*)::int from revisions
     union all select 'bom_lines', count(*)::int from bom_lines union all select 'activities', count(*)::int from activities`,
    { type: QueryTypes.SELECT },
  );
  return Object.fromEntries(rows.map((r) => [r.t, r.n]));
}

async function actorOf(s: Session): Promise<CurrentUser> {
  const me = await s.agent.get('/api/auth/me').expect(200);
  const u = (await findUserById(me.body.id))!;
  return {
    id: u.id,
    organisationId: u.organisationId,
    organisationName: u.organisationName,
    email: u.email,
    name: u.name,
    roles: u.roles as Role[],
  };
}

describe('job backup', () => {
  let designer: Session;
  let engineer: Session;
  let demoJobId: number;
  let richJobId: number;
  let richNumber: string;

  beforeAll(async () => {
    testApp();
    designer = await signInAs('designer');
    engineer = await signInAs('engineer');
    demoJobId = (await Job.findOne({ where: { number: 'J-2041' } }))!.id;

    // A job with everything a backup must carry: overrides, comments on the panel and on a motor,
    // a frozen revision with its bill of materials, and an archived second panel.
    richNumber = `BK-${Date.now().toString(36)}`;
    const job = await send(designer, 'post', '/api/jobs', {
      number: richNumber,
      name: 'Backup round trip',
      customer: 'Fictional mill',
      supplyVolts: 480,
      availableFaultKa: 42,
    }).expect(201);
    richJobId = job.body.id;
    const panel = await send(designer, 'post', `/api/jobs/${richJobId}/panels`, {
      name: 'MCC-B1',
      mounting: 'row-end',
      markupPercent: 18,
    }).expect(201);
    const pid = panel.body.id as number;
    const motors = [
      { tag: 'P-1', supply: 'ac3', hp: 25, volts: 460, environment: 'washdown' },
      { tag: 'F-2', supply: 'ac3', hp: 5, volts: 460, reversing: true },
      { tag: 'M-3', supply: 'ac1', hp: 1, volts: 230, singlePhaseType: 'capacitor-start' },
    ];
    const loads = [];
    for (const answers of motors) loads.push((await send(designer, 'post', `/api/panels/${pid}/loads`, { answers }).expect(201)).body);
    await send(designer, 'put', `/api/loads/${loads[0].id}/overrides`, {
      overrides: [{ field: 'enclosure.nemaType', value: '4X', justification: 'Chlorine dosing room next door: stainless enclosure' }],
      version: loads[0].version,
    }).expect(200);
    await send(designer, 'post', `/api/panels/${pid}/comments`, { body: 'Guard the conveyor coupling', loadId: loads[1].id }).expect(201);
    await send(designer, 'post', `/api/panels/${pid}/comments`, { body: 'Space heater wanted' }).expect(201);
    let v = (await designer.agent.get(`/api/panels/${pid}`).expect(200)).body.version;
    await send(designer, 'post', `/api/panels/${pid}/submit`, { version: v, comment: 'Ready for sign-off' }).expect(200);
    v = (await designer.agent.get(`/api/panels/${pid}`).expect(200)).body.version;
    const approved = await send(engineer, 'post', `/api/panels/${pid}/approve`, {
      version: v,
      comment: 'Approved as drawn, fault study pending',
      acknowledgeSccr: true,
    }).expect(200);
    expect(approved.body.status).toBe('signed_off');
    const second = await send(designer, 'post', `/api/jobs/${richJobId}/panels`, { name: 'Spare panel' }).expect(201);
    await send(designer, 'post', `/api/panels/${second.body.id}/archive`, { archived: true, version: second.body.version }).expect(200);
  });

  it('exports the demo job in the versioned format with local references instead of ids', async () => {
    const r = await designer.agent.get(`/api/jobs/${demoJobId}/export`).expect(200);
    expect(r.headers['content-disposition']).toBe('attachment; filename="J-2041.panelwright.json"');
    const b = r.body as JobBackup;
    expect(b.format).toBe('panelwright-job');
    expect(b.version).toBe(1);
    expect(b.job.number).toBe('J-2041');
    expect(b.panels.map((p) => p.name)).toContain('MCC-1 Pump hall');
    const mcc = b.panels.find((p) => p.name === 'MCC-1 Pump hall')!;
    expect(mcc.loads.map((l) => l.tag)).toEqual(['P-101', 'P-102', 'P-110', 'C-201', 'K-301', 'M-401', 'V-501', 'H-601']);
    expect(mcc.loads[0].ref).toBe(`${mcc.ref}.L1`);
    expect(idKeys(b)).toEqual([]);
    expect(JobBackupSchema.safeParse(b).success).toBe(true);
  });

  it('round-trips the demo job: export → import → export is equal apart from ids and timestamps', async () => {
    const first = (await designer.agent.get(`/api/jobs/${demoJobId}/export`).expect(200)).body as JobBackup;
    const imported = await send(designer, 'post', '/api/jobs/import', first).expect(201);
    expect(imported.body.number).toBe('J-2041-copy');
    expect(imported.body.id).not.toBe(demoJobId);
    expect(imported.body.motors).toBe(8);
    const again = (await designer.agent.get(`/api/jobs/${imported.body.id}/export`).expect(200)).body as JobBackup;
    expect(again.job.number).toBe('J-2041-copy');
    expect(comparable(again)).toEqual(comparable(first));
    // the copy is a separate job: its panel and motors have their own rows
    const panels = (await designer.agent.get(`/api/jobs/${imported.body.id}/panels`).expect(200)).body;
    const demoPanels = (await designer.agent.get(`/api/jobs/${demoJobId}/panels`).expect(200)).body;
    expect(panels.map((p: { id: number }) => p.id)).not.toContain(demoPanels[0].id);
    // a second import takes the next free number
    const second = await send(designer, 'post', '/api/jobs/import', first).expect(201);
    expect(second.body.number).toBe('J-2041-copy-2');
  });

  it('reads a backup written before the job carried its voltage unbalance (0 %), and keeps a given one', async () => {
    const first = (await designer.agent.get(`/api/jobs/${demoJobId}/export`).expect(200)).body as JobBackup;
    const { voltageUnbalancePercent: _dropped, ...olderJob } = first.job;
    const older = await send(designer, 'post', '/api/jobs/import', { ...first, job: olderJob }).expect(201);
    expect((await designer.agent.get(`/api/jobs/${older.body.id}`).expect(200)).body.voltageUnbalancePercent).toBe(0);
    const given = await send(designer, 'post', '/api/jobs/import', {
      ...first,
      job: { ...first.job, voltageUnbalancePercent: 2.5 },
    }).expect(201);
    const back = (await designer.agent.get(`/api/jobs/${given.body.id}/export`).expect(200)).body as JobBackup;
    expect(back.job.voltageUnbalancePercent).toBe(2.5);
  });

  it('round-trips a signed-off job with overrides, comments, a revision and its bill of materials', async () => {
    const first = (await designer.agent.get(`/api/jobs/${richJobId}/export`).expect(200)).body as JobBackup;
    const a = first.panels.find((p) => p.name === 'MCC-B1')!;
    expect(a.status).toBe('signed_off');
    expect(a.revisionNumber).toBe(0);
    expect(a.revisions).toHaveLength(1);
    expect(a.revisions[0].approvedBy).toEqual({ email: 'engineer@copperline.test', name: 'Ines Markham' });
    expect(a.bomLines.length).toBeGreaterThan(5);
    expect(a.loads[0].overrides).toMatchObject([{ field: 'enclosure.nemaType', value: '4X', by: 'Dev Halloran' }]);
    const onMotor = a.comments.find((c) => c.body === 'Guard the conveyor coupling')!;
    expect(onMotor.loadRef).toBe(a.loads.find((l) => l.tag === 'F-2')!.ref);
    expect(a.comments.map((c) => c.body)).toEqual(['Guard the conveyor coupling', 'Space heater wanted', 'Ready for sign-off']);
    expect(first.panels.find((p) => p.name === 'Spare panel')!.archivedAt).not.toBeNull();

    const imported = await send(designer, 'post', '/api/jobs/import', first).expect(201);
    expect(imported.body.number).toBe(`${richNumber}-copy`);
    const again = (await designer.agent.get(`/api/jobs/${imported.body.id}/export`).expect(200)).body as JobBackup;
    expect(comparable(again)).toEqual(comparable(first));

    // the restored panel reads like the original: signed off, R0, comment on F-2, current bill of materials
    const restored = (await designer.agent.get(`/api/jobs/${imported.body.id}/panels`).expect(200)).body.find(
      (p: { name: string }) => p.name === 'MCC-B1',
    );
    const detail = (await designer.agent.get(`/api/panels/${restored.id}`).expect(200)).body;
    expect(detail.status).toBe('signed_off');
    expect(detail.revisions.map((r: { number: number; approvedBy: string }) => [r.number, r.approvedBy])).toEqual([[0, 'Ines Markham']]);
    const f2 = detail.loads.find((l: { tag: string }) => l.tag === 'F-2');
    expect(detail.comments.find((c: { body: string }) => c.body === 'Guard the conveyor coupling').loadId).toBe(f2.id);
    const rev = await designer.agent.get(`/api/panels/${restored.id}/revisions/0`).expect(200);
    expect(rev.body.snapshot).toEqual(a.revisions[0].snapshot);
  });

  it('accepts the backup as an uploaded .json file', async () => {
    const first = (await designer.agent.get(`/api/jobs/${demoJobId}/export`).expect(200)).body as JobBackup;
    const r = await designer.agent
      .post('/api/jobs/import')
      .set('x-csrf-token', designer.token)
      .attach('file', Buffer.from(JSON.stringify(first)), { filename: 'J-2041.panelwright.json', contentType: 'application/json' })
      .expect(201);
    expect(r.body.number).toMatch(/^J-2041-copy/);
    expect(r.body.motors).toBe(8);
  });

  it('refuses a wrong file type (415), an oversized file (413) and a file that is not JSON (400)', async () => {
    const before = await counts();
    const txt = await designer.agent
      .post('/api/jobs/import')
      .set('x-csrf-token', designer.token)
      .attach('file', Buffer.from('number,name\nJ-1,x\n'), { filename: 'jobs.csv', contentType: 'text/csv' });
    expect(txt.status).toBe(415);
    expect(txt.body.error.code).toBe('unsupported_file');
    const big = Buffer.alloc(MAX_BACKUP_BYTES + 1024, 0x20);
    const over = await designer.agent
      .post('/api/jobs/import')
      .set('x-csrf-token', designer.token)
      .attach('file', big, { filename: 'big.json', contentType: 'application/json' });
    expect(over.status).toBe(413);
    expect(over.body.error.code).toBe('payload_too_large');
    const bad = await designer.agent
      .post('/api/jobs/import')
      .set('x-csrf-token', designer.token)
      .attach('file', Buffer.from('{"format": "panelwright-job", '), { filename: 'cut.json', contentType: 'application/json' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.code).toBe('bad_json');
    expect(await counts()).toEqual(before);
  });

  it('refuses an invalid backup naming the field, and writes nothing', async () => {
    const good = (await designer.agent.get(`/api/jobs/${demoJobId}/export`).expect(200)).body as JobBackup;
    const before = await counts();
    const cases: Array<[string, (b: JobBackup) => void, string]> = [
      ['wrong format', (b) => ((b as Json).format = 'another-format'), 'body.format'],
      ['future version', (b) => ((b as Json).version = 2), 'body.version'],
      ['negative hp', (b) => (b.panels[0].loads[0].answers.hp = -5), 'body.panels[0].loads[0].answers.hp'],
      ['unknown panel state', (b) => ((b.panels[0] as Json).status = 'approved-ish'), 'body.panels[0].status'],
      [
        'comment on a missing motor',
        (b) => b.panels[0].comments.push({ loadRef: 'P9.L9', body: 'x', author: null, at: new Date().toISOString() }),
        `body.panels[0].comments[${good.panels[0].comments.length}].loadRef`,
      ],
      ['duplicate tag', (b) => (b.panels[0].loads[1].tag = b.panels[0].loads[0].tag), 'body.panels[0].loads[1].tag'],
    ];
    for (const [name, mutate, path] of cases) {
      const b = structuredClone(good);
      mutate(b);
      const r = await send(designer, 'post', '/api/jobs/import', b);
      expect(r.status, name).toBe(400);
      expect(r.body.error.code, name).toBe('validation_failed');
      expect(
        r.body.error.details.map((d: { path: string }) => d.path),
        name,
      ).toContain(path);
    }
    expect(await counts()).toEqual(before);
  });

  it('leaves nothing behind when the import fails after writing every row (one transaction)', async () => {
    const backup = JobBackupSchema.parse((await designer.agent.get(`/api/jobs/${richJobId}/export`).expect(200)).body);
    const before = await counts();
    const actor = await actorOf(designer);
    await expect(importJob(actor, backup, { failAfterWrite: true })).rejects.toThrow(/failure injected/);
    expect(await counts()).toEqual(before);
    // the same call without the failure writes the rows: the counts above could have moved
    const ok = await importJob(actor, backup);
    const after = await counts();
    expect(after.jobs).toBe(before.jobs + 1);
    expect(after.loads).toBe(before.loads + 3);
    expect(after.revisions).toBe(before.revisions + 1);
    expect(ok.motors).toBe(3);
  });

  it('lets only administrators and designers export or import', async () => {
    const estimator = await signInAs('estimator');
    expect((await estimator.agent.get(`/api/jobs/${demoJobId}/export`)).status).toBe(403);
    expect((await send(engineer, 'post', '/api/jobs/import', {})).status).toBe(403);
  });
});
