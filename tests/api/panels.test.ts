import type { PanelRollup } from '../../shared/schemas/selection';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import ExcelJS from 'exceljs';
import type { SMTPServer } from 'smtp-server';
import { send, signInAs, type Session } from '../setup/api';
import { startFakeSmtp } from '../../server/modules/mail/fake-smtp';
import { resetMailer } from '../../server/modules/mail/mailer';
import { resetEnvCache } from '../../server/config/env';
import { MailMessage } from '../../server/db/models/mail-message';
import { Revision } from '../../server/db/models/revision';

let smtp: SMTPServer;
const uniq = () => `P-${Date.now().toString(36)}-${Math.floor(Math.random() * 1e5)}`;

async function newPanel(designer: Session) {
  const job = (await send(designer, 'post', '/api/jobs', { number: uniq(), name: 'Filter gallery', availableFaultKa: 22 }).expect(201))
    .body;
  const panel = (await send(designer, 'post', `/api/jobs/${job.id}/panels`, { name: 'MCC-F' }).expect(201)).body;
  return { job, panel };
}

async function waitForMail(subjectPart: string) {
  for (let i = 0; i < 40; i++) {
    const m = await MailMessage.findOne({ where: {}, order: [['id', 'DESC']] });
    const all = await MailMessage.findAll();
    const hit = all.find((x) => x.subject.includes(subjectPart));
    if (hit) return hit;
    void m;
    await new Promise((r) => setTimeout(r, 100));
  }
  return null;
}

beforeAll(async () => {
  const port = 30000 + Math.floor(Math.random() * 20000);
  process.env.PW_SMTP_FAKE_PORT = String(port);
  resetEnvCache();
  resetMailer();
  smtp = await startFakeSmtp(port);
});
afterAll(async () => {
  await new Promise<void>((r) => smtp.close(() => r()));
});

describe('motors on a panel', () => {
  it('stores the engine selection on save: 25 hp 460 V worked example', async () => {
    const designer = await signInAs('designer');
    const { panel } = await newPanel(designer);
    const r = await send(designer, 'post', `/api/panels/${panel.id}/loads`, {
      answers: { tag: 'P-1', supply: 'ac3', hp: 25, volts: 460, fla: 31, serviceFactor: 1.15, environment: 'indoor-dusty' },
    }).expect(201);
    // NEC 2023 Table 430.250: 25 hp 460 V = 34 A; 430.22: 42.5 A -> 8 AWG Cu 75 °C (50 A, Table 310.16);
    // Table 430.52 inverse-time breaker 250 % = 85 A -> next standard 90 A (240.6(A)); 430.32(A)(1) 125 % x 31 = 38.75 A.
    expect(r.body.selection).toMatchObject({
      flcAmps: 34,
      conductor: { size: '8 AWG' },
      scpd: { ratingAmps: 90 },
      overload: { maxSettingAmps: 38.75 },
    });
    const detail = (await designer.agent.get(`/api/panels/${panel.id}`).expect(200)).body;
    // 430.24 with one motor: 125 % of 34 A = 42.5 A
    expect(detail.rollup.feeder.minAmpacity).toBe(42.5);
  });

  it('refuses a motor it cannot size: 400 V without nameplate FLA is a 400 naming volts; with the FLA it is stored on the nameplate current', async () => {
    const designer = await signInAs('designer');
    const { panel } = await newPanel(designer);
    // NEC 2023 Table 430.250 has no 400 V column (115, 200, 208, 230, 460, 575, 2300 V)
    const bad = await send(designer, 'post', `/api/panels/${panel.id}/loads`, {
      answers: { tag: 'M-400', supply: 'ac3', hp: 10, volts: 400 },
    }).expect(400);
    expect(bad.body.error.details).toEqual([
      {
        path: 'body.answers.volts',
        message: expect.stringMatching(/rated 400 V: no full-load current table covers it.*give the nameplate FLA/),
      },
    ]);
    expect(bad.body.error.message).toMatch(/^M-400 cannot be sized/);
    const ok = await send(designer, 'post', `/api/panels/${panel.id}/loads`, {
      answers: { tag: 'M-400', supply: 'ac3', hp: 10, volts: 400, fla: 15.5 },
    }).expect(201);
    expect(ok.body.selection).toMatchObject({ flcAmps: 15.5, tableVolts: null, errors: [] }); // 430.6(A)(1): nameplate current where no table applies
    expect(ok.body.selection.flcSource).toMatch(/^nameplate FLA/);
    expect(ok.body.selection.cautions.some((c: string) => c.includes('nameplate current 15.5 A'))).toBe(true);
  });

  it('names the bad answer field and refuses a duplicate tag', async () => {
    const designer = await signInAs('designer');
    const { panel } = await newPanel(designer);
    const bad = await send(designer, 'post', `/api/panels/${panel.id}/loads`, {
      answers: { tag: 'M-1', supply: 'ac3', volts: 460 },
    }).expect(400);
    expect(bad.body.error.details.map((d: { path: string }) => d.path)).toContain('body.answers.hp');
    await send(designer, 'post', `/api/panels/${panel.id}/loads`, { answers: { tag: 'M-1', supply: 'ac3', hp: 5, volts: 460 } }).expect(
      201,
    );
    const dup = await send(designer, 'post', `/api/panels/${panel.id}/loads`, {
      answers: { tag: 'm-1', supply: 'ac3', hp: 5, volts: 460 },
    }).expect(400);
    expect(dup.body.error.details[0].path).toBe('body.answers.tag');
  });

  it('keeps overrides with their justification and refuses an undersized conductor', async () => {
    const designer = await signInAs('designer');
    const { panel } = await newPanel(designer);
    const load = (
      await send(designer, 'post', `/api/panels/${panel.id}/loads`, { answers: { tag: 'K-1', supply: 'ac3', hp: 25, volts: 460 } }).expect(
        201,
      )
    ).body;
    const small = await send(designer, 'put', `/api/loads/${load.id}/overrides`, {
      version: load.version,
      overrides: [{ field: 'conductor.size', value: '12 AWG', justification: 'Existing cable in the field is 12 AWG' }],
    }).expect(400);
    expect(small.body.error.message).toMatch(/below the 42.5 A that 430.22 requires/);
    const ok = await send(designer, 'put', `/api/loads/${load.id}/overrides`, {
      version: load.version,
      overrides: [{ field: 'starter.nemaSize', value: '3', justification: 'Shop standard: size 3 for all pump buckets' }],
    }).expect(200);
    expect(ok.body.effective.starter.nemaSize).toBe('3');
    expect(ok.body.selection.starter.nemaSize).toBe('2');
    expect(ok.body.overrides[0]).toMatchObject({ field: 'starter.nemaSize', was: '2', by: 'Dev Halloran' });
    const short = await send(designer, 'put', `/api/loads/${load.id}/overrides`, {
      version: ok.body.version,
      overrides: [{ field: 'starter.nemaSize', value: '4', justification: 'bigger' }],
    }).expect(400);
    expect(short.body.error.details[0].path).toBe('body.overrides[0].justification');
  });
});

describe('review and sign-off', () => {
  it('moves Draft → In review → Returned → In review → Signed off, with the right roles, mail and a frozen revision', async () => {
    const designer = await signInAs('designer');
    const engineer = await signInAs('engineer');
    const estimator = await signInAs('estimator');
    const { job, panel } = await newPanel(designer);
    await send(designer, 'post', `/api/panels/${panel.id}/loads`, {
      answers: { tag: 'P-1', supply: 'ac3', hp: 10, volts: 460, environment: 'indoor-dusty' },
    }).expect(201);
    let p = (await designer.agent.get(`/api/panels/${panel.id}`)).body;

    await send(engineer, 'post', `/api/panels/${panel.id}/approve`, { version: p.version }).expect(409); // still a draft
    await send(estimator, 'post', `/api/panels/${panel.id}/submit`, { version: p.version }).expect(403);
    p = (await send(designer, 'post', `/api/panels/${panel.id}/submit`, { version: p.version, comment: 'Ready' }).expect(200)).body;
    expect(p.status).toBe('in_review');
    expect(await waitForMail(`Sign-off requested: ${job.number}`)).not.toBeNull();

    // motors are read-only in review
    const locked = await send(designer, 'post', `/api/panels/${panel.id}/loads`, {
      answers: { tag: 'P-2', supply: 'ac3', hp: 5, volts: 460 },
    }).expect(409);
    expect(locked.body.error.message).toMatch(/in review/);
    // a designer cannot approve or return
    await send(designer, 'post', `/api/panels/${panel.id}/approve`, { version: p.version }).expect(403);
    await send(designer, 'post', `/api/panels/${panel.id}/return`, { version: p.version, comment: 'x' }).expect(403);
    // returning needs a comment
    const noComment = await send(engineer, 'post', `/api/panels/${panel.id}/return`, { version: p.version, comment: '' }).expect(400);
    expect(noComment.body.error.details[0].path).toBe('body.comment');
    p = (
      await send(engineer, 'post', `/api/panels/${panel.id}/return`, {
        version: p.version,
        comment: 'Use a dual-element fuse on P-1',
      }).expect(200)
    ).body;
    expect(p.status).toBe('returned');
    expect(await waitForMail(`Returned: ${job.number}`)).not.toBeNull();

    const loadId = p.loads[0].id;
    const fixed = await send(designer, 'put', `/api/loads/${loadId}`, {
      version: p.loads[0].version,
      answers: { ...p.loads[0].answers, scpdType: 'dual-element-fuse' },
    }).expect(200);
    // Table 430.52 dual-element fuse 175 % of 14 A (Table 430.250, 10 hp 460 V) = 24.5 A -> next standard 25 A
    expect(fixed.body.selection.scpd).toMatchObject({ type: 'dual-element-fuse', ratingAmps: 25 });
    p = (await designer.agent.get(`/api/panels/${panel.id}`)).body;
    p = (await send(designer, 'post', `/api/panels/${panel.id}/submit`, { version: p.version }).expect(200)).body;
    // the panel's SCCR is below the 22 kA available (unmarked contactor and overload relay, 5 kA assumed,
    // UL 508A Table SB4.1 from memory): NEC 409.22 asks for an acknowledgement with a reason
    const refused = await send(engineer, 'post', `/api/panels/${panel.id}/approve`, { version: p.version, comment: 'OK' }).expect(400);
    expect(refused.body.error.message).toMatch(/^Panel SCCR [\d.]+ kA is below the 22 kA available at the site \(NEC 409\.22\)/);
    expect(refused.body.error.details.map((d: { path: string }) => d.path)).toEqual(['body.acknowledgeSccr', 'body.comment']);
    await send(engineer, 'post', `/api/panels/${panel.id}/approve`, { version: p.version, comment: 'OK', acknowledgeSccr: true }).expect(
      400,
    ); // no reason given
    p = (
      await send(engineer, 'post', `/api/panels/${panel.id}/approve`, {
        version: p.version,
        comment: 'Feeder fused Class J upstream, let-through checked',
        acknowledgeSccr: true,
      }).expect(200)
    ).body;
    expect(p.status).toBe('signed_off');
    expect(p.revisionNumber).toBe(0);
    expect(await waitForMail(`Signed off: ${job.number}`)).not.toBeNull();

    const r0 = (await estimator.agent.get(`/api/panels/${panel.id}/revisions/0`).expect(200)).body;
    expect(r0.snapshot.loads[0].selection.scpd.ratingAmps).toBe(25);
    expect(r0.snapshot.bom.length).toBeGreaterThan(3);
    expect(r0.snapshot.sccr).toMatchObject({
      availableFaultKa: 22,
      verdict: 'below-available',
      acknowledged: { reason: 'Feeder fused Class J upstream, let-through checked', finding: expect.stringContaining('NEC 409.22') },
    });

    // editing a signed-off panel opens a new draft; R0 stays as it was
    const again = (await designer.agent.get(`/api/panels/${panel.id}`)).body;
    await send(designer, 'post', `/api/panels/${panel.id}/loads`, { answers: { tag: 'P-2', supply: 'ac3', hp: 20, volts: 460 } }).expect(
      201,
    );
    // P-1 moves to a washdown area: NEMA 250 Type 4X instead of 12 (the enclosure rules)
    const p1 = (await designer.agent.get(`/api/panels/${panel.id}`)).body.loads.find((l: { tag: string }) => l.tag === 'P-1');
    await send(designer, 'put', `/api/loads/${p1.id}`, { answers: { ...p1.answers, environment: 'washdown' }, version: p1.version }).expect(
      200,
    );
    const draft = (await designer.agent.get(`/api/panels/${panel.id}`)).body;
    expect(draft.status).toBe('draft');
    expect(draft.version).toBeGreaterThan(again.version);
    const r0again = (await estimator.agent.get(`/api/panels/${panel.id}/revisions/0`).expect(200)).body;
    expect(r0again.snapshot).toEqual(r0.snapshot);

    // second sign-off and the change report R0 → R1 with the cost delta
    let d = (await send(designer, 'post', `/api/panels/${panel.id}/submit`, { version: draft.version }).expect(200)).body;
    d = (
      await send(engineer, 'post', `/api/panels/${panel.id}/approve`, {
        version: d.version,
        comment: 'Accepted: fault study pending',
        acknowledgeSccr: true,
      }).expect(200)
    ).body;
    expect(d.revisionNumber).toBe(1);
    const report = (await estimator.agent.get(`/api/panels/${panel.id}/change-report?from=0&to=1`).expect(200)).body;
    expect(report.motors.added).toEqual(['P-2']);
    expect(report.motors.changed).toEqual(['P-1']);
    expect(report.motors.decisions).toEqual([
      { tag: 'P-1', differences: [{ field: 'enclosure.nemaType', label: 'Enclosure type', from: '12', to: '4X' }] },
    ]);

    // the same report as a workbook for the change-order price: totals with their change, lines with formulas
    const x = await estimator.agent
      .get(`/api/panels/${panel.id}/change-report.xlsx?from=0&to=1`)
      .buffer(true)
      .parse((res, cb) => {
        const chunks: Buffer[] = [];
        res.on('data', (c: Buffer) => chunks.push(c));
        res.on('end', () => cb(null, Buffer.concat(chunks)));
      })
      .expect(200);
    expect(x.headers['content-disposition']).toContain(`${job.number}-MCC-F-R0-R1-changes.xlsx`);
    const cw = new ExcelJS.Workbook();
    await cw.xlsx.load(x.body as ArrayBuffer);
    expect(cw.worksheets.map((w) => w.name)).toEqual(['Summary', 'Lines', 'Decisions']);
    const sellRow = cw
      .getWorksheet('Summary')!
      .getRows(1, 12)!
      .find((r) => r.getCell(1).value === 'Sell price')!;
    expect(sellRow.getCell(2).value).toBe(report.totals.from.sell);
    expect(sellRow.getCell(3).value).toBe(report.totals.to.sell);
    expect(sellRow.getCell(4).value).toMatchObject({ formula: `C${sellRow.number}-B${sellRow.number}`, result: report.totals.sellDelta });
    const linesSheet = cw.getWorksheet('Lines')!;
    const lineCount = report.bom.added.length + report.bom.removed.length + report.bom.changed.length;
    expect(linesSheet.rowCount).toBe(lineCount + 2); // header, lines, total
    const total = linesSheet.getRow(lineCount + 2);
    expect(total.getCell(9).value).toMatchObject({ formula: `SUM(I2:I${lineCount + 1})`, result: report.bom.materialDelta });
    expect(cw.getWorksheet('Decisions')!.getRow(2).values).toEqual([undefined, 'P-1', 'Enclosure type', '12', '4X']);
    expect(report.bom.added.length).toBeGreaterThan(0);
    expect(report.totals.sellDelta).toBeGreaterThan(0);
    expect(await Revision.count({ where: { panelId: panel.id } })).toBe(2);
  });
});

describe('motor-list import', () => {
  async function workbook(rows: Array<Record<string, unknown>>) {
    const wb = new ExcelJS.Workbook();
    const ws = wb.addWorksheet('Motors');
    const headers = ['tag', 'description', 'supply', 'hp', 'volts', 'reversing', 'environment'];
    ws.addRow(headers);
    for (const r of rows) ws.addRow(headers.map((h) => r[h] ?? ''));
    return Buffer.from(await wb.xlsx.writeBuffer());
  }

  it('previews each row with its problems and imports nothing while one row is bad', async () => {
    const designer = await signInAs('designer');
    const { panel } = await newPanel(designer);
    const file = await workbook([
      { tag: 'A-1', supply: 'ac3', hp: 10, volts: 460 },
      { tag: 'A-2', supply: 'ac3', hp: 'ten', volts: 460 },
      { tag: 'A-1', supply: 'ac3', hp: 5, volts: 460 },
      { tag: 'A-4', supply: 'ac9', hp: 5, volts: 460, reversing: 'maybe' },
    ]);
    const prev = await designer.agent
      .post(`/api/panels/${panel.id}/import/preview`)
      .set('x-csrf-token', designer.token)
      .attach('file', file, 'motors.xlsx')
      .expect(200);
    expect(prev.body.ok).toBe(false);
    const problems = Object.fromEntries(
      prev.body.rows.map((r: { row: number; problems: Array<{ column: string }> }) => [r.row, r.problems.map((p) => p.column)]),
    );
    expect(problems).toEqual({ 2: [], 3: ['hp'], 4: ['tag'], 5: ['reversing'] });
    const commit = await designer.agent
      .post(`/api/panels/${panel.id}/import/commit`)
      .set('x-csrf-token', designer.token)
      .attach('file', file, 'motors.xlsx')
      .expect(400);
    expect(commit.body.error.message).toMatch(/nothing was imported/);
    const after = (await designer.agent.get(`/api/panels/${panel.id}`)).body;
    expect(after.loads).toEqual([]);
  });

  it('imports a good file in one go, from .xlsx and from .csv', async () => {
    const designer = await signInAs('designer');
    const { panel } = await newPanel(designer);
    const file = await workbook([
      { tag: 'B-1', description: 'Mixer', supply: 'ac3', hp: 15, volts: 460, environment: 'washdown' },
      { tag: 'B-2', supply: 'ac3', hp: 3, volts: 460, reversing: 'yes' },
    ]);
    const r = await designer.agent
      .post(`/api/panels/${panel.id}/import/commit`)
      .set('x-csrf-token', designer.token)
      .attach('file', file, 'motors.xlsx')
      .expect(201);
    expect(r.body.imported).toBe(2);
    const csv = 'tag,supply,hp,volts\r\nB-3,ac1,1,115\r\n"B-4",ac3,7.5,460\r\n';
    await designer.agent
      .post(`/api/panels/${panel.id}/import/commit`)
      .set('x-csrf-token', designer.token)
      .attach('file', Buffer.from(csv), 'more.csv')
      .expect(201);
    const p = (await designer.agent.get(`/api/panels/${panel.id}`)).body;
    expect(p.loads.map((l: { tag: string }) => l.tag)).toEqual(['B-1', 'B-2', 'B-3', 'B-4']);
    const b1 = p.loads[0].selection;
    expect(b1.enclosure.nemaType).toMatch(/^4X?$/); // NEMA 250: washdown -> Type 4 or 4X
    expect(p.loads[1].selection.starter.type).toBe('FVR');
  });

  it('refuses a file that is not a spreadsheet, and a template can be downloaded', async () => {
    const designer = await signInAs('designer');
    const { panel } = await newPanel(designer);
    const r = await designer.agent
      .post(`/api/panels/${panel.id}/import/preview`)
      .set('x-csrf-token', designer.token)
      .attach('file', Buffer.from('%PDF-1.4 not a workbook'), 'motors.xlsx')
      .expect(415);
    expect(r.body.error.code).toBe('unsupported_file');
    const t = await designer.agent
      .get(`/api/panels/${panel.id}/import/template`)
      .buffer(true)
      .parse((res, cb) => {
        const chunks: Buffer[] = [];
        res.on('data', (c: Buffer) => chunks.push(c));
        res.on('end', () => cb(null, Buffer.concat(chunks)));
      })
      .expect(200);
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.load(t.body as ArrayBuffer);
    expect(wb.getWorksheet('Motors')!.getRow(1).getCell(1).value).toBe('tag');
    // the template belongs to a panel: none for a panel that is not the shop's
    await designer.agent.get('/api/panels/2147483000/import/template').expect(404);
  });
});

describe('job changes that the selections depend on', () => {
  it("selects every motor again when the job's ambient changes, and refuses while a panel is in review", async () => {
    const designer = await signInAs('designer');
    const engineer = await signInAs('engineer');
    const { job, panel } = await newPanel(designer);
    await send(designer, 'post', `/api/panels/${panel.id}/loads`, { answers: { tag: 'A-1', supply: 'ac3', hp: 25, volts: 460 } }).expect(
      201,
    );
    let p = (await designer.agent.get(`/api/panels/${panel.id}`)).body;
    // NEC 2023 430.22: 125 % of 34 A (Table 430.250) = 42.5 A; at 30 °C 8 AWG Cu 75 °C carries 50 A (Table 310.16)
    expect(p.loads[0].selection.conductor.size).toBe('8 AWG');
    p = (await send(designer, 'post', `/api/panels/${panel.id}/submit`, { version: p.version }).expect(200)).body;
    const j = (await designer.agent.get(`/api/jobs/${job.id}`)).body;
    const refused = await send(designer, 'patch', `/api/jobs/${job.id}`, { ambientC: 50, version: j.version }).expect(409);
    expect(refused.body.error.message).toMatch(/in review/);
    p = (
      await send(engineer, 'post', `/api/panels/${panel.id}/approve`, {
        version: p.version,
        comment: 'Accepted: fault study pending',
        acknowledgeSccr: true,
      }).expect(200)
    ).body;
    expect(p.status).toBe('signed_off');

    const j2 = (await designer.agent.get(`/api/jobs/${job.id}`)).body;
    expect(j2.ambientC).toBe(30); // the refused change was not written
    await send(designer, 'patch', `/api/jobs/${job.id}`, { ambientC: 50, version: j2.version }).expect(200);
    const after = (await designer.agent.get(`/api/panels/${panel.id}`)).body;
    // Table 310.15(B)(1)(1): 75 °C insulation at 46–50 °C ambient, factor 0.75: 8 AWG 50 A x 0.75 = 37.5 A < 42.5 A,
    // 6 AWG 65 A x 0.75 = 48.75 A >= 42.5 A
    expect(after.loads[0].selection.conductor.size).toBe('6 AWG');
    expect(after.status).toBe('draft');
    expect(after.rollup.feeder.minAmpacity).toBe(42.5);
  });

  it("derates every three-phase motor when the job's measured voltage unbalance is set (NEMA MG 1 14.35)", async () => {
    const designer = await signInAs('designer');
    const { job, panel } = await newPanel(designer);
    await send(designer, 'post', `/api/panels/${panel.id}/loads`, { answers: { tag: 'U-1', supply: 'ac3', hp: 25, volts: 460 } }).expect(
      201,
    );
    let p = (await designer.agent.get(`/api/panels/${panel.id}`)).body;
    expect(p.loads[0].selection.unbalance).toBeNull();
    expect(p.job.voltageUnbalancePercent).toBe(0);
    const j = (await designer.agent.get(`/api/jobs/${job.id}`)).body;
    const bad = await send(designer, 'patch', `/api/jobs/${job.id}`, { voltageUnbalancePercent: -1, version: j.version }).expect(400);
    expect(bad.body.error.details[0].path).toBe('body.voltageUnbalancePercent');
    // 460, 467 and 450 V measured: 1.96 % (NEMA MG 1 14.36) -> about 0.952 x 25 hp on the Figure 14-1 line (from memory)
    await send(designer, 'patch', `/api/jobs/${job.id}`, { voltageUnbalancePercent: 1.96, version: j.version }).expect(200);
    p = (await designer.agent.get(`/api/panels/${panel.id}`)).body;
    expect(p.job.voltageUnbalancePercent).toBe(1.96);
    expect(p.loads[0].selection.unbalance).toMatchObject({ percent: 1.96, deratingFactor: 0.952, deratedHp: 23.8 });
    expect(p.loads[0].selection.relays.phaseLoss).toBe(true); // common practice above 1 %
    expect((await designer.agent.get(`/api/jobs/${job.id}`)).body.voltageUnbalancePercent).toBe(1.96);
    const activity = (await designer.agent.get(`/api/jobs/${job.id}/activity`).expect(200)).body as Array<{ summary: string }>;
    expect(activity.map((a) => a.summary)).toContain(`Changed job ${job.number}: voltage unbalance`);
  });

  it('changes a shared answer on several motors in one go', async () => {
    const designer = await signInAs('designer');
    const { panel } = await newPanel(designer);
    for (const tag of ['W-1', 'W-2', 'W-3'])
      await send(designer, 'post', `/api/panels/${panel.id}/loads`, {
        answers: { tag, supply: 'ac3', hp: 5, volts: 460, environment: 'indoor-dry' },
      }).expect(201);
    let p = (await designer.agent.get(`/api/panels/${panel.id}`)).body;
    const ids = p.loads.slice(0, 2).map((l: { id: number }) => l.id);
    await send(designer, 'post', `/api/panels/${panel.id}/loads/bulk-edit`, {
      loadIds: ids,
      changes: { environment: 'washdown' },
      panelVersion: p.version,
    }).expect(200);
    p = (await designer.agent.get(`/api/panels/${panel.id}`)).body;
    // NEMA 250: indoor dry -> Type 1; washdown -> Type 4 or 4X
    expect(p.loads.map((l: { selection: { enclosure: { nemaType: string } } }) => l.selection.enclosure.nemaType)).toEqual([
      expect.stringMatching(/^4X?$/),
      expect.stringMatching(/^4X?$/),
      '1',
    ]);
    expect(p.loads.map((l: { version: number }) => l.version)).toEqual([1, 1, 0]);
  });

  it('files each motor and panel change in the history under the panel and its job', async () => {
    const designer = await signInAs('designer');
    const { job, panel } = await newPanel(designer);
    const added = (
      await send(designer, 'post', `/api/panels/${panel.id}/loads`, { answers: { tag: 'H-1', supply: 'ac3', hp: 5, volts: 460 } }).expect(
        201,
      )
    ).body;
    await send(designer, 'put', `/api/loads/${added.id}`, {
      answers: { tag: 'H-1', supply: 'ac3', hp: 7.5, volts: 460 },
      version: added.version,
    }).expect(200);
    const copy = (await send(designer, 'post', `/api/loads/${added.id}/copy`).expect(201)).body;
    await send(designer, 'delete', `/api/loads/${copy.id}`).expect(204);
    const twin = (await send(designer, 'post', `/api/panels/${panel.id}/duplicate`).expect(201)).body;
    const log = (await designer.agent.get(`/api/jobs/${job.id}/activity`).expect(200)).body as Array<{
      entity: string;
      action: string;
      panelId: number | null;
      summary: string;
    }>;
    const onPanel = (id: number) =>
      log
        .filter((a) => a.panelId === id)
        .map((a) => `${a.entity} ${a.action}`)
        .sort();
    expect(onPanel(panel.id)).toEqual(['load added', 'load added', 'load changed', 'load removed', 'panel created'].sort());
    expect(onPanel(twin.id)).toEqual(['panel duplicated']);
    expect(log.find((a) => a.action === 'changed' && a.entity === 'load')?.summary).toBe('Changed motor H-1: hp');
  });
});

describe("the panel page's data", () => {
  it('answers 304 to an unchanged panel and shows a new comment or motor at once', async () => {
    const designer = await signInAs('designer');
    const { panel } = await newPanel(designer);
    const first = await designer.agent.get(`/api/panels/${panel.id}`).expect(200);
    const etag = first.headers.etag as string;
    expect(etag).toMatch(/^W\//);
    await designer.agent.get(`/api/panels/${panel.id}`).set('if-none-match', etag).expect(304);
    await send(designer, 'post', `/api/panels/${panel.id}/comments`, { body: 'Check the door clearance', loadId: null }).expect(201);
    const afterComment = await designer.agent.get(`/api/panels/${panel.id}`).set('if-none-match', etag).expect(200);
    expect(afterComment.body.comments.map((c: { body: string }) => c.body)).toEqual(['Check the door clearance']);
    await send(designer, 'post', `/api/panels/${panel.id}/loads`, { answers: { tag: 'Z-1', supply: 'ac3', hp: 2, volts: 460 } }).expect(
      201,
    );
    const afterMotor = await designer.agent
      .get(`/api/panels/${panel.id}`)
      .set('if-none-match', afterComment.headers.etag as string)
      .expect(200);
    expect(afterMotor.body.loads.map((l: { tag: string }) => l.tag)).toEqual(['Z-1']);
  });
});

describe('stored selections against the current rules', () => {
  // A selection stored by an earlier rule set is imitated by writing an older-looking selection into
  // the row: the 25 hp 460 V worked example (NEC 2023 Table 430.250 34 A; Table 430.52 250 % = 85 A
  // -> 90 A, Table 240.6(A)) stored with a 100 A breaker, no phase-reversal relay and one caution fewer.
  it('names every decision the current rules would change, selects again on request and then finds nothing', async () => {
    const { Load } = await import('../../server/db/models/load');
    const designer = await signInAs('designer');
    const { job, panel } = await newPanel(designer);
    const added = (
      await send(designer, 'post', `/api/panels/${panel.id}/loads`, {
        answers: {
          tag: 'P-7',
          supply: 'ac3',
          hp: 25,
          volts: 460,
          fla: 31,
          serviceFactor: 1.15,
          environment: 'indoor-dusty',
          reverseRotationHazard: true,
        },
      }).expect(201)
    ).body;
    await send(designer, 'post', `/api/panels/${panel.id}/loads`, {
      answers: { tag: 'P-8', supply: 'ac3', hp: 10, volts: 460, environment: 'indoor-dusty' },
    }).expect(201);
    const fresh = (await designer.agent.get(`/api/panels/${panel.id}/rule-check`).expect(200)).body;
    expect(fresh).toMatchObject({ panelId: panel.id, motorCount: 2, changed: [] });

    const row = (await Load.findByPk(added.id))!;
    const sel = structuredClone(row.selection) as { scpd: { ratingAmps: number }; relays: { phaseReversal: boolean }; cautions: string[] };
    expect(sel.scpd.ratingAmps).toBe(90);
    expect(sel.relays.phaseReversal).toBe(true);
    sel.scpd.ratingAmps = 100;
    sel.relays.phaseReversal = false;
    sel.cautions = sel.cautions.slice(1);
    await Load.update(
      { selection: sel as unknown as import('../../server/db/models/load').Load['selection'] },
      { where: { id: added.id } },
    );

    const check = (await designer.agent.get(`/api/panels/${panel.id}/rule-check`).expect(200)).body;
    expect(check.changed).toHaveLength(1);
    expect(check.changed[0].tag).toBe('P-7');
    expect(check.changed[0].differences).toEqual([
      { field: 'scpd.ratingAmps', label: 'Branch protection (A)', from: '100', to: '90' },
      { field: 'relays.phaseReversal', label: 'Phase-reversal relay', from: 'no', to: 'yes' },
      expect.objectContaining({
        field: 'cautions',
        from: String(sel.cautions.length),
        to: expect.stringMatching(/^\d+ \(1 new or reworded\): “.+”$/),
      }),
    ]);
    // every role may look; only a panel builder (or admin) may select again
    const engineer = await signInAs('engineer');
    expect((await engineer.agent.get(`/api/panels/${panel.id}/rule-check`).expect(200)).body.changed).toHaveLength(1);
    const p = (await designer.agent.get(`/api/panels/${panel.id}`).expect(200)).body;
    await send(designer, 'post', `/api/panels/${panel.id}/reselect`, { version: p.version - 1 }).expect(409);
    await send(engineer, 'post', `/api/panels/${panel.id}/reselect`, { version: p.version }).expect(403);
    const done = (await send(designer, 'post', `/api/panels/${panel.id}/reselect`, { version: p.version }).expect(200)).body;
    expect(done.motorCount).toBe(2);
    expect(done.changed.map((c: { tag: string }) => c.tag)).toEqual(['P-7']);
    expect((await designer.agent.get(`/api/panels/${panel.id}/rule-check`).expect(200)).body.changed).toEqual([]);
    const after = (await designer.agent.get(`/api/panels/${panel.id}`).expect(200)).body;
    expect(after.version).toBe(p.version + 1);
    const p7 = after.loads.find((l: { tag: string }) => l.tag === 'P-7');
    expect(p7.selection.scpd.ratingAmps).toBe(90);
    expect(p7.selection.relays.phaseReversal).toBe(true);
    const activity = (await designer.agent.get(`/api/jobs/${job.id}/activity`).expect(200)).body as Array<{ summary: string }>;
    expect(activity.map((a) => a.summary)).toContain(
      'Selected 2 motors again under the current rules: P-7 (branch protection, phase-reversal relay, cautions)',
    );
  });

  it('names a motor whose stored answers the current rules refuse, and still checks the others', async () => {
    const { Load } = await import('../../server/db/models/load');
    const designer = await signInAs('designer');
    const { panel } = await newPanel(designer);
    const a = (
      await send(designer, 'post', `/api/panels/${panel.id}/loads`, {
        answers: { tag: 'R-1', supply: 'ac3', hp: 10, volts: 460, environment: 'indoor-dusty' },
      }).expect(201)
    ).body;
    const b = (
      await send(designer, 'post', `/api/panels/${panel.id}/loads`, {
        answers: { tag: 'R-2', supply: 'ac3', hp: 15, volts: 460, environment: 'indoor-dusty' },
      }).expect(201)
    ).body;
    // R-1's answers as an earlier release might have let them through; R-2's stored breaker differs
    await Load.update(
      { answers: { tag: 'R-1', supply: 'ac3', hp: 10, volts: 460, environment: 'indoor-dusty', poles: 3 } },
      { where: { id: a.id } },
    );
    const row = (await Load.findByPk(b.id))!;
    await Load.update(
      {
        selection: {
          ...(row.selection as unknown as Record<string, unknown>),
          scpd: { ...(row.selection as unknown as { scpd: object }).scpd, ratingAmps: 1 },
        } as unknown as import('../../server/db/models/load').Load['selection'],
      },
      { where: { id: b.id } },
    );
    const check = (await designer.agent.get(`/api/panels/${panel.id}/rule-check`).expect(200)).body;
    expect(check.changed.map((c: { tag: string }) => c.tag)).toEqual(['R-1', 'R-2']);
    expect(check.changed[0].differences).toEqual([
      { field: 'answers', label: 'Answers', from: 'accepted', to: expect.stringMatching(/^its answers no longer pass: .*poles/) },
    ]);
    expect(check.changed[1].differences.map((d: { field: string }) => d.field)).toEqual(['scpd.ratingAmps']);
    // selecting again waits until the motor is fixed, and says which answer
    const p = (await designer.agent.get(`/api/panels/${panel.id}`)).body;
    const r = await send(designer, 'post', `/api/panels/${panel.id}/reselect`, { version: p.version }).expect(400);
    expect(JSON.stringify(r.body.error)).toContain('poles');
  });

  it('refuses to select again while the panel is in review', async () => {
    const designer = await signInAs('designer');
    const { panel } = await newPanel(designer);
    await send(designer, 'post', `/api/panels/${panel.id}/loads`, {
      answers: { tag: 'P-9', supply: 'ac3', hp: 10, volts: 460, environment: 'indoor-dusty' },
    }).expect(201);
    let p = (await designer.agent.get(`/api/panels/${panel.id}`).expect(200)).body;
    p = (await send(designer, 'post', `/api/panels/${panel.id}/submit`, { version: p.version }).expect(200)).body;
    const r = await send(designer, 'post', `/api/panels/${panel.id}/reselect`, { version: p.version }).expect(409);
    expect(r.body.error.message).toMatch(/in review/);
  });
});

describe('the motor list as a workbook', () => {
  const MOTORS = [
    // the 25 hp 460 V worked example: NEC 2023 Table 430.250 34 A; Table 430.52 250 % = 85 A -> 90 A; 8 AWG Cu 75 °C
    {
      tag: 'P-1',
      description: 'Feed pump',
      supply: 'ac3',
      hp: 25,
      volts: 460,
      fla: 31,
      serviceFactor: 1.15,
      codeLetter: 'G',
      design: 'B',
      energyEfficient: true,
      poles: 4,
      environment: 'indoor-dusty',
    },
    {
      tag: 'K-1',
      description: '=HYPERLINK("http://example.test","blower")',
      supply: 'ac3',
      hp: 60,
      volts: 460,
      fla: 70,
      serviceFactor: 1.15,
      leads: 6,
      connection: 'delta',
      startingLimit: 'reduced-inrush',
      starterPreference: 'wye-delta',
      conductor: { material: 'al', tempRatingC: 90 },
      inertia: 'high',
      lockedRotorWithstandS: 22,
      reverseRotationHazard: true,
      environment: 'indoor-dusty',
    },
    {
      tag: 'D-1',
      supply: 'dc',
      hp: 5,
      volts: 240,
      dcField: 'compound',
      quickStop: true,
      reversing: true,
      environment: 'indoor-dry',
      fedFrom: 'external',
    },
    { tag: 'S-1', supply: 'ac1', hp: 1, volts: 115, singlePhaseType: 'capacitor-start', reversing: true, environment: 'outdoor' },
    {
      tag: 'V-1',
      supply: 'ac3',
      hp: 20,
      volts: 460,
      speedControl: 'variable',
      turndown: 10,
      torque: 'constant',
      driveInputAmps: 30,
      sharedDrive: 'VFD-1',
      cableLengthFt: 150,
      environment: 'washdown',
    },
    {
      tag: 'O-1',
      supply: 'ac3',
      hp: 10,
      volts: 460,
      tempRiseC: 40,
      plugging: true,
      scpdType: 'dual-element-fuse',
      scpdOverride: { maxPercent: 225, reason: 'Motor trips on start at 175 %, checked on site' },
      critical: true,
      environment: 'corrosive',
    },
  ];

  it('exports every answer in the import format and the selections as a schedule; the file imports back into another panel unchanged', async () => {
    const designer = await signInAs('designer');
    const { job, panel } = await newPanel(designer);
    for (const answers of MOTORS) await send(designer, 'post', `/api/panels/${panel.id}/loads`, { answers }).expect(201);

    const estimator = await signInAs('estimator'); // every role may download it
    const r = await estimator.agent
      .get(`/api/panels/${panel.id}/motors.xlsx`)
      .buffer(true)
      .parse((res, cb) => {
        const chunks: Buffer[] = [];
        res.on('data', (c: Buffer) => chunks.push(c));
        res.on('end', () => cb(null, Buffer.concat(chunks)));
      })
      .expect(200);
    expect(r.headers['content-type']).toBe('application/vnd.openxmlformats-officedocument.spreadsheetml.sheet');
    expect(r.headers['content-disposition']).toContain(`${job.number}-MCC-F-motors.xlsx`);
    const file = r.body as Buffer;
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.load(file as unknown as ArrayBuffer);
    expect(wb.worksheets.map((w) => w.name)).toEqual(['Motors', 'Selections', 'Columns', 'About']);

    // the formula-looking description is a plain text cell, not a formula
    const motorsSheet = wb.getWorksheet('Motors')!;
    const header = (motorsSheet.getRow(1).values as unknown[]).slice(1);
    const k1 = motorsSheet.getRow(3);
    expect(k1.getCell(header.indexOf('description') + 1).value).toBe('=HYPERLINK("http://example.test","blower")');
    expect(k1.getCell(header.indexOf('conductorMaterial') + 1).value).toBe('al');
    expect(k1.getCell(header.indexOf('starterPreference') + 1).value).toBe('wye-delta');

    const sched = wb.getWorksheet('Selections')!;
    const sHead = (sched.getRow(1).values as unknown[]).slice(1) as string[];
    const p1 = sched.getRow(2);
    const col = (name: string) => p1.getCell(sHead.indexOf(name) + 1).value;
    expect([col('Tag'), col('FLC (A)'), col('Rating (A)'), col('Conductor'), col('Overload max (A, line)')]).toEqual([
      'P-1',
      34,
      90,
      '8 AWG Cu 75 °C',
      38.75,
    ]);
    const k1s = sched.getRow(3);
    // K-301-like blower: relay in the delta windings, 70 / √3 = 40.41 A (common practice); six leads to the motor
    expect(k1s.getCell(sHead.indexOf('Relays × dial (A)') + 1).value).toBe('1 × 40.41');
    expect(String(k1s.getCell(sHead.indexOf('To the motor') + 1).value)).toMatch(/^6 × /);
    const about = wb.getWorksheet('About')!;
    expect(JSON.stringify(about.getSheetValues())).toContain('qualified person');

    // into a new panel of the same job: same answers, motor by motor
    const other = (await send(designer, 'post', `/api/jobs/${job.id}/panels`, { name: 'MCC-G' }).expect(201)).body;
    const commit = await designer.agent
      .post(`/api/panels/${other.id}/import/commit`)
      .set('x-csrf-token', designer.token)
      .attach('file', file, 'motors.xlsx');
    expect(commit.status, JSON.stringify(commit.body)).toBe(201);
    expect(commit.body.imported).toBe(MOTORS.length);
    const copy = (await designer.agent.get(`/api/panels/${other.id}`).expect(200)).body as {
      loads: Array<{ tag: string; answers: unknown; selection: { scpd: unknown; conductor: unknown } }>;
    };
    const original = (await designer.agent.get(`/api/panels/${panel.id}`).expect(200)).body as typeof copy;
    expect(copy.loads.map((l) => l.answers)).toEqual(MOTORS);
    expect(copy.loads.map((l) => [l.selection.scpd, l.selection.conductor])).toEqual(
      original.loads.map((l) => [l.selection.scpd, l.selection.conductor]),
    );
  });

  it('has an import column for every answer of the motor schema, so the export loses none', async () => {
    const { LoadSchema } = await import('../../shared/schemas/load');
    const { IMPORT_COLUMNS } = await import('../../server/modules/panels/import');
    const keys = Object.keys((LoadSchema as unknown as { shape: Record<string, unknown> }).shape);
    expect(keys.length).toBeGreaterThan(30);
    const covered = new Set(IMPORT_COLUMNS.map((c) => c.path?.[0] ?? c.key));
    expect(keys.filter((k) => !covered.has(k))).toEqual([]);
  });

  it('names the nested column of a bad nested answer in an import', async () => {
    const designer = await signInAs('designer');
    const { panel } = await newPanel(designer);
    const csv = 'tag,supply,hp,volts,conductorTempC\nB-1,ac3,10,460,80\n';
    const r = await designer.agent
      .post(`/api/panels/${panel.id}/import/preview`)
      .set('x-csrf-token', designer.token)
      .attach('file', Buffer.from(csv), 'motors.csv')
      .expect(200);
    expect(r.body.ok).toBe(false);
    expect(r.body.rows[0].problems).toEqual([{ column: 'conductorTempC', message: expect.stringContaining('60, 75 or 90') }]);
  });
});

describe('the sign-off queue', () => {
  it('lists a panel in review with its note, then returned with the reason, then signed off as R0; never an archived job’s', async () => {
    const designer = await signInAs('designer');
    const engineer = await signInAs('engineer');
    const { job, panel } = await newPanel(designer);
    await send(designer, 'post', `/api/panels/${panel.id}/loads`, {
      answers: { tag: 'Q-1', supply: 'ac3', hp: 10, volts: 460, environment: 'indoor-dusty' },
    }).expect(201);
    const entry = async () =>
      ((await engineer.agent.get('/api/sign-off-queue').expect(200)).body as Array<{ panelId: number }>).find(
        (q) => q.panelId === panel.id,
      );
    expect(await entry()).toBeUndefined(); // a draft waits on nobody

    let p = (await designer.agent.get(`/api/panels/${panel.id}`)).body;
    p = (
      await send(designer, 'post', `/api/panels/${panel.id}/submit`, {
        version: p.version,
        comment: 'Pump skid, please check the fuses',
      }).expect(200)
    ).body;
    expect(await entry()).toMatchObject({
      panelName: 'MCC-F',
      jobId: job.id,
      jobNumber: job.number,
      status: 'in_review',
      motorCount: 1,
      note: { body: 'Pump skid, please check the fuses', author: expect.any(String) },
    });

    p = (
      await send(engineer, 'post', `/api/panels/${panel.id}/return`, {
        version: p.version,
        comment: 'Use dual-element fuses on Q-1',
      }).expect(200)
    ).body;
    expect(await entry()).toMatchObject({ status: 'returned', note: { body: 'Returned: Use dual-element fuses on Q-1' } });

    p = (await send(designer, 'post', `/api/panels/${panel.id}/submit`, { version: p.version }).expect(200)).body;
    p = (
      await send(engineer, 'post', `/api/panels/${panel.id}/approve`, {
        version: p.version,
        comment: 'Accepted: fault study pending',
        acknowledgeSccr: true,
      }).expect(200)
    ).body;
    expect(await entry()).toMatchObject({ status: 'signed_off', revisionNumber: 0 });

    const j = (await designer.agent.get(`/api/jobs/${job.id}`).expect(200)).body;
    await send(designer, 'post', `/api/jobs/${job.id}/archive`, { archived: true, version: j.version }).expect(200);
    expect(await entry()).toBeUndefined();
  });
});

describe('signing off against the site fault current (NEC 409.22)', () => {
  it('signs off without an acknowledgement when the panel SCCR covers the available fault current', async () => {
    const designer = await signInAs('designer');
    const engineer = await signInAs('engineer');
    // 2 kA available: at or below even the 5 kA assumed for an unmarked contactor (UL 508A Table SB4.1, from memory)
    const job = (await send(designer, 'post', '/api/jobs', { number: uniq(), name: 'Small site', availableFaultKa: 2 }).expect(201)).body;
    const panel = (await send(designer, 'post', `/api/jobs/${job.id}/panels`, { name: 'LCP-1' }).expect(201)).body;
    await send(designer, 'post', `/api/panels/${panel.id}/loads`, {
      answers: { tag: 'F-1', supply: 'ac3', hp: 5, volts: 460, environment: 'indoor-dusty' },
    }).expect(201);
    let p = (await designer.agent.get(`/api/panels/${panel.id}`)).body;
    p = (await send(designer, 'post', `/api/panels/${panel.id}/submit`, { version: p.version }).expect(200)).body;
    p = (await send(engineer, 'post', `/api/panels/${panel.id}/approve`, { version: p.version }).expect(200)).body;
    expect(p.status).toBe('signed_off');
    const r0 = (await engineer.agent.get(`/api/panels/${panel.id}/revisions/0`).expect(200)).body;
    expect(r0.snapshot.sccr).toMatchObject({ availableFaultKa: 2, verdict: 'adequate', acknowledged: null });
    expect(r0.snapshot.sccr.panelSccrKa).toBeGreaterThanOrEqual(2);
  });
});

describe('motors at another voltage than the supply (fedFrom)', () => {
  // a 480 V three-phase job (the default supply): a 10 hp 460 V motor and two 1.5 hp 230 V single-phase motors
  const P1 = { tag: 'P-1', supply: 'ac3', hp: 10, volts: 460, environment: 'indoor-dusty' }; // 14 A, NEC 2023 Table 430.250
  const fan = (tag: string, fedFrom?: 'panel' | 'external') => ({
    tag,
    supply: 'ac1',
    hp: 1.5,
    volts: 230,
    environment: 'indoor-dusty',
    ...(fedFrom ? { fedFrom } : {}),
  }); // 10 A, Table 430.248

  it('fedFrom panel (the default): the transformer is in the roll-up, the feeder, the nameplate FLC, the checks and the bill of materials', async () => {
    const designer = await signInAs('designer');
    const { job, panel } = await newPanel(designer);
    expect(job.supplyVolts).toBe(480);
    for (const answers of [P1, fan('F-1'), fan('F-2')])
      await send(designer, 'post', `/api/panels/${panel.id}/loads`, { answers }).expect(201);
    const detail = (await designer.agent.get(`/api/panels/${panel.id}`).expect(200)).body;
    // (125 % × 10 A + 10 A) × 240 V = 5.4 kVA → 7.5 kVA; 7500 VA / 480 V = 15.63 A primary
    expect(detail.rollup.otherSources).toHaveLength(1);
    expect(detail.rollup.otherSources[0]).toMatchObject({ tag: 'T1', kva: 7.5, primaryAmps: 15.63 });
    expect(detail.rollup.feeder.minAmpacity).toBe(33.13); // 430.24: 125 % × 14 A + 15.63 A
    const checks = (await designer.agent.get(`/api/panels/${panel.id}/checks`).expect(200)).body;
    expect(checks.nameplate.result.fullLoadAmps).toBe(29.6); // 409.110(2): 14 A + 15.63 A
    expect(checks.otherSources.lines.join(' ')).toMatch(
      /T1: F-1 \(230 V single-phase\), F-2 \(230 V single-phase\) fed from a 7\.5 kVA 480-240\/120 V single-phase transformer/,
    );
    const bom = (await send(designer, 'post', `/api/panels/${panel.id}/bom/rebuild`, {}).expect(200)).body as {
      lines: Array<{ bucket: string; category: string; code: string | null; heatLossW: number }>;
    };
    const t1 = bom.lines.filter((l) => l.bucket === 'T1 transformer');
    expect(t1.map((l) => l.code)).toEqual(['PW-XF-1-7A5K-240', 'PW-BR-2P-035', 'PW-BR-2P-040']); // Table 450.3(B): 250 % primary, 125 % secondary
    const after = (await designer.agent.get(`/api/panels/${panel.id}/checks`).expect(200)).body;
    expect(after.heat.result.byBucket.find((b: { bucketTag: string }) => b.bucketTag === 'T1 transformer')?.watts).toBeGreaterThan(0);
  });

  it('a roll-up stored before the panel carried other sources: the rule check names the motor’s new source, and selecting again stores it', async () => {
    const { Panel } = await import('../../server/db/models/panel');
    const designer = await signInAs('designer');
    const { panel } = await newPanel(designer);
    await send(designer, 'post', `/api/panels/${panel.id}/loads`, { answers: P1 }).expect(201);
    await send(designer, 'post', `/api/panels/${panel.id}/loads`, { answers: fan('F-1') }).expect(201);
    expect((await designer.agent.get(`/api/panels/${panel.id}/rule-check`).expect(200)).body.changed).toEqual([]);
    // the earlier release left the 230 V motor out of the feeder: its roll-up had no other sources
    const row = (await Panel.findByPk(panel.id))!;
    const old = { ...(row.rollup as unknown as Record<string, unknown>) };
    delete old.otherSources;
    delete old.externalMotors;
    delete old.otherLoadsAmps;
    await Panel.update({ rollup: old as unknown as PanelRollup }, { where: { id: panel.id } });
    const check = (await designer.agent.get(`/api/panels/${panel.id}/rule-check`).expect(200)).body;
    expect(check.changed).toEqual([
      {
        loadId: expect.any(Number),
        tag: 'F-1',
        differences: [
          { field: 'fedFrom', label: 'Fed from', from: 'left out of the feeder', to: 'T1, 3 kVA transformer 480-240/120 V single-phase' },
        ],
      },
    ]); // one 1.5 hp 230 V motor: 125 % × 10 A × 240 V = 3 kVA (NEC 2023 Table 430.248)
    const p = (await designer.agent.get(`/api/panels/${panel.id}`).expect(200)).body;
    await send(designer, 'post', `/api/panels/${panel.id}/reselect`, { version: p.version }).expect(200);
    expect((await designer.agent.get(`/api/panels/${panel.id}/rule-check`).expect(200)).body.changed).toEqual([]);
    expect((await designer.agent.get(`/api/panels/${panel.id}`).expect(200)).body.rollup.otherSources[0].tag).toBe('T1');
  });

  it('fedFrom external: left out of the feeder and the nameplate FLC, with the note in the checks; the submittal is written', async () => {
    const designer = await signInAs('designer');
    const { panel } = await newPanel(designer);
    await send(designer, 'post', `/api/panels/${panel.id}/loads`, { answers: P1 }).expect(201);
    const f1 = (await send(designer, 'post', `/api/panels/${panel.id}/loads`, { answers: fan('F-1') }).expect(201)).body;
    await send(designer, 'put', `/api/loads/${f1.id}`, { answers: fan('F-1', 'external'), version: f1.version }).expect(200);
    const detail = (await designer.agent.get(`/api/panels/${panel.id}`).expect(200)).body;
    expect(detail.rollup.otherSources).toEqual([]);
    expect(detail.rollup.externalMotors).toEqual([
      { tag: 'F-1', supply: 'ac1', volts: 230, needs: '240/120 V single-phase (a transformer)' },
    ]);
    expect(detail.rollup.feeder.minAmpacity).toBe(17.5); // 125 % × 14 A
    const checks = (await designer.agent.get(`/api/panels/${panel.id}/checks`).expect(200)).body;
    expect(checks.nameplate.result.fullLoadAmps).toBe(14);
    expect(checks.otherSources.lines).toEqual([
      expect.stringMatching(
        /^F-1 \(230 V single-phase\) needs 240\/120 V single-phase \(a transformer\): fed from a source outside the panel, left out of the feeder/,
      ),
    ]);
    const pdf = await designer.agent
      .get(`/api/panels/${panel.id}/submittal.pdf`)
      .buffer(true)
      .parse((res, cb) => {
        const chunks: Buffer[] = [];
        res.on('data', (c: Buffer) => chunks.push(c));
        res.on('end', () => cb(null, Buffer.concat(chunks)));
      });
    expect(pdf.status).toBe(200);
  });
});
