// Two people on the same panel: optimistic locking answers 409 with a clear message and keeps the
// first write. Multi-row writes run in one transaction: a failure midway leaves nothing changed.
import { beforeAll, describe, expect, it } from 'vitest';
import { QueryTypes } from 'sequelize';
import { send, signInAs, testApp, type Session } from '../setup/api';
import { db } from '../../server/db/sequelize';
import { Load } from '../../server/db/models/load';
import { findUserById } from '../../server/modules/users/repository';
import { approvePanel } from '../../server/modules/review/service';
import { rebuild } from '../../server/modules/bom/service';
import { requirePanel } from '../../server/modules/panels/service';
import type { CurrentUser, Role } from '../../shared/schemas/auth';

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

/** Everything stored about one panel, as text: any change to any of its rows changes it. */
async function panelState(panelId: number) {
  const [row] = await db().query<{ panel: string; loads: string; revisions: string; bom: string; comments: string; activities: string }>(
    `select (select row_to_json(p)::text from panels p where p.id = :panelId) as panel,
            (select coalesce(string_agg(l::text, '|' order by l.id), '') from loads l where l.panel_id = :panelId) as loads,
            (select coalesce(string_agg(r::text, '|' order by r.id), '') from revisions r where r.panel_id = :panelId) as revisions,
            (select coalesce(string_agg(b::text, '|' order by b.id), '') from bom_lines b where b.panel_id = :panelId) as bom,
            (select coalesce(string_agg(c::text, '|' order by c.id), '') from comments c where c.panel_id = :panelId) as comments,
            (select count(*)::text from activities a where a.panel_id = :panelId) as activities`,
    { replacements: { panelId }, type: QueryTypes.SELECT },
  );
  return row!;
}

const MOTORS = [
  { tag: 'P-1', supply: 'ac3', hp: 20, volts: 460 },
  { tag: 'P-2', supply: 'ac3', hp: 10, volts: 460, environment: 'outdoor' },
  { tag: 'M-3', supply: 'ac1', hp: 1, volts: 230, singlePhaseType: 'capacitor-start' },
];

describe('concurrent edits and all-or-nothing writes', () => {
  let designer: Session;
  let admin: Session;
  let engineer: Session;
  let jobId: number;

  async function newPanel(name: string) {
    const p = await send(designer, 'post', `/api/jobs/${jobId}/panels`, { name }).expect(201);
    const loads = [];
    for (const answers of MOTORS)
      loads.push((await send(designer, 'post', `/api/panels/${p.body.id}/loads`, { answers }).expect(201)).body);
    return {
      id: p.body.id as number,
      loads: loads as Array<{ id: number; version: number; tag: string; answers: Record<string, unknown> }>,
    };
  }

  beforeAll(async () => {
    testApp();
    [designer, admin, engineer] = await Promise.all([signInAs('designer'), signInAs('admin'), signInAs('engineer')]);
    const job = await send(designer, 'post', '/api/jobs', { number: `CC-${Date.now().toString(36)}`, name: 'Concurrency job' }).expect(201);
    jobId = job.body.id;
  });

  it('answers 409 to the second of two edits of the same panel, keeping the first', async () => {
    const p = await newPanel('Two editors');
    const seenByDesigner = (await designer.agent.get(`/api/panels/${p.id}`).expect(200)).body;
    const seenByAdmin = (await admin.agent.get(`/api/panels/${p.id}`).expect(200)).body;
    expect(seenByAdmin.version).toBe(seenByDesigner.version);
    await send(designer, 'patch', `/api/panels/${p.id}`, {
      description: 'Designer: add a space heater',
      version: seenByDesigner.version,
    }).expect(200);
    const late = await send(admin, 'patch', `/api/panels/${p.id}`, { description: 'Admin: no heater', version: seenByAdmin.version });
    expect(late.status).toBe(409);
    expect(late.body.error.code).toBe('conflict');
    expect(late.body.error.message).toBe(
      'Someone else changed panel Two editors since you opened it: reload to see their change, then apply yours again',
    );
    const now = (await admin.agent.get(`/api/panels/${p.id}`).expect(200)).body;
    expect(now.description).toBe('Designer: add a space heater');
    expect(now.version).toBe(seenByDesigner.version + 1);
  });

  it('answers 409 to the second of two edits of the same motor, keeping the first', async () => {
    const p = await newPanel('Two motor editors');
    const m = p.loads[0];
    await send(designer, 'put', `/api/loads/${m.id}`, { answers: { ...m.answers, hp: 25 }, version: m.version }).expect(200);
    const late = await send(admin, 'put', `/api/loads/${m.id}`, { answers: { ...m.answers, hp: 30 }, version: m.version });
    expect(late.status).toBe(409);
    expect(late.body.error.message).toBe(
      'Someone else changed motor P-1 since you opened it: reload to see their change, then apply yours again',
    );
    const stored = (await Load.findByPk(m.id))!;
    expect(stored.answers.hp).toBe(25);
    expect(stored.version).toBe(m.version + 1);
  });

  it('lets exactly one of two simultaneous edits of a motor through (row lock + version check)', async () => {
    const p = await newPanel('Simultaneous');
    const m = p.loads[1];
    const [a, b] = await Promise.all([
      send(designer, 'put', `/api/loads/${m.id}`, { answers: { ...m.answers, hp: 15 }, version: m.version }),
      send(admin, 'put', `/api/loads/${m.id}`, { answers: { ...m.answers, hp: 7.5 }, version: m.version }),
    ]);
    expect([a.status, b.status].sort()).toEqual([200, 409]);
    const winner = a.status === 200 ? 15 : 7.5;
    const stored = (await Load.findByPk(m.id))!;
    expect(stored.answers.hp).toBe(winner);
    expect(stored.version).toBe(m.version + 1);
  });

  it('answers 409 to overrides written against a motor version someone else has moved on', async () => {
    const p = await newPanel('Override race');
    const m = p.loads[0];
    await send(designer, 'put', `/api/loads/${m.id}`, { answers: { ...m.answers, hp: 25 }, version: m.version }).expect(200);
    const late = await send(admin, 'put', `/api/loads/${m.id}/overrides`, {
      overrides: [{ field: 'enclosure.nemaType', value: '4X', justification: 'Spray area beside the clarifier' }],
      version: m.version,
    });
    expect(late.status).toBe(409);
    expect(late.body.error.message).toMatch(/^Someone else changed motor P-1/);
    expect((await Load.findByPk(m.id))!.overrides).toEqual([]);
  });

  it('sign-off that fails after freezing the revision leaves no revision, the state in review and the BOM lines as they were', async () => {
    const p = await newPanel('Freeze rollback');
    const eng = await actorOf(engineer);
    // a stored bill of materials to watch: regeneration would replace every row
    await rebuild(await actorOf(designer), await requirePanel(await actorOf(designer), p.id));
    let v = (await designer.agent.get(`/api/panels/${p.id}`).expect(200)).body.version;
    await send(designer, 'post', `/api/panels/${p.id}/submit`, { version: v, comment: '' }).expect(200);
    v = (await designer.agent.get(`/api/panels/${p.id}`).expect(200)).body.version;
    const before = await panelState(p.id);
    expect(before.bom.length).toBeGreaterThan(0);
    expect(before.revisions).toBe('');

    await expect(
      approvePanel(eng, p.id, v, 'looks fine, fault study pending', { failAfterFreeze: true, acknowledgeSccr: true }),
    ).rejects.toThrow(/failure injected/);
    const after = await panelState(p.id);
    expect(after).toEqual(before);
    const detail = (await designer.agent.get(`/api/panels/${p.id}`).expect(200)).body;
    expect(detail.status).toBe('in_review');
    expect(detail.revisionNumber).toBeNull();
    expect(detail.revisions).toEqual([]);

    // the same sign-off without the failure does change all of it: the comparison above can fail
    await approvePanel(eng, p.id, v, 'looks fine, fault study pending', { acknowledgeSccr: true });
    const done = await panelState(p.id);
    expect(done.revisions).not.toBe('');
    expect(done.bom).not.toBe(before.bom);
    expect((await designer.agent.get(`/api/panels/${p.id}`).expect(200)).body.status).toBe('signed_off');
  });

  it('bulk edit with one invalid motor changes no motor', async () => {
    const p = await newPanel('Bulk edit');
    // the last motor's stored answers are no longer valid (a DC field on an AC motor), as old data can be
    await Load.update({ answers: { ...p.loads[2].answers, dcField: 'shunt' } as Load['answers'] }, { where: { id: p.loads[2].id } });
    const before = await panelState(p.id);
    const v = (await designer.agent.get(`/api/panels/${p.id}`).expect(200)).body.version;
    const r = await send(designer, 'post', `/api/panels/${p.id}/loads/bulk-edit`, {
      loadIds: p.loads.map((l) => l.id),
      changes: { critical: true },
      panelVersion: v,
    });
    expect(r.status).toBe(400);
    expect(r.body.error.code).toBe('validation_failed');
    expect(r.body.error.details.map((d: { path: string }) => d.path)).toContain('loads[2].dcField');
    expect(await panelState(p.id)).toEqual(before);

    // one motor of another panel among the ids: refused, nothing changed either
    const other = await newPanel('Bulk edit, other panel');
    const r2 = await send(designer, 'post', `/api/panels/${p.id}/loads/bulk-edit`, {
      loadIds: [p.loads[0].id, other.loads[0].id],
      changes: { critical: true },
      panelVersion: v,
    });
    expect(r2.status).toBe(404);
    expect(await panelState(p.id)).toEqual(before);

    // with the motor's answers repaired, the same request goes through and changes every motor
    await Load.update({ answers: p.loads[2].answers as Load['answers'] }, { where: { id: p.loads[2].id } });
    const ok = await send(designer, 'post', `/api/panels/${p.id}/loads/bulk-edit`, {
      loadIds: p.loads.map((l) => l.id),
      changes: { critical: true },
      panelVersion: v,
    }).expect(200);
    expect(ok.body.updated).toBe(3);
    for (const l of p.loads) expect((await Load.findByPk(l.id))!.answers.critical).toBe(true);
  });
});
