// Shop drawings through the API on the demo panel "MCC-1 Pump hall" of job J-2041 (eight motors: a reversing
// conveyor C-201, the wye-delta blower K-301, a drive, a soft starter, single-phase and DC motors).
import { beforeAll, describe, expect, it } from 'vitest';
import ExcelJS from 'exceljs';
import { signInAs, testApp, type DemoRole, type Session, binary } from '../setup/api';
import { Organisation } from '../../server/db/models/organisation';
import { Job } from '../../server/db/models/job';
import { Panel } from '../../server/db/models/panel';
import { NOT_ON_PLATE } from '../../shared/calc/layout/layout-units';
import { CATEGORY_IDS, type Category } from '../../shared/schemas/catalogue';

async function demoPanelId(s: Session): Promise<number> {
  const jobs = (await s.agent.get('/api/jobs?q=J-2041').expect(200)).body as Array<{ id: number; number: string }>;
  const job = jobs.find((j) => j.number === 'J-2041')!;
  const panels = (await s.agent.get(`/api/jobs/${job.id}/panels`).expect(200)).body as Array<{ id: number; name: string }>;
  return panels.find((p) => p.name === 'MCC-1 Pump hall')!.id;
}

const csvRows = (text: string) =>
  text
    .trim()
    .split('\r\n')
    .map((l) => l.split(','));

describe('panel drawings', () => {
  let engineer: Session;
  let panelId: number;

  beforeAll(async () => {
    testApp();
    engineer = await signInAs('engineer');
    panelId = await demoPanelId(engineer);
  });

  it('serves every download at its path to every role of the shop', async () => {
    for (const role of ['admin', 'designer', 'estimator', 'engineer'] as DemoRole[]) {
      const s = role === 'engineer' ? engineer : await signInAs(role);
      const base = `/api/panels/${panelId}/drawings`;
      const svg = await s.agent.get(`${base}/schematic.svg`).expect(200);
      expect(svg.headers['content-type']).toMatch(/^image\/svg\+xml/);
      await s.agent.get(`${base}/nameplate.svg`).expect(200).expect('content-type', /svg/);
      await s.agent
        .get(`${base}/wires.csv`)
        .expect(200)
        .expect('content-type', /text\/csv/);
      await s.agent
        .get(`${base}/terminals.csv`)
        .expect(200)
        .expect('content-type', /text\/csv/);
      await s.agent
        .get(`${base}/wiring.xlsx`)
        .buffer(true)
        .parse(binary)
        .expect(200)
        .expect('content-type', /spreadsheetml/);
    }
  });

  it('draws one bucket with ?tag= and answers 404 for a tag not on the panel', async () => {
    const one = await engineer.agent.get(`/api/panels/${panelId}/drawings/schematic.svg?tag=K-301`).buffer(true).parse(binary).expect(200);
    const text = one.body.toString('utf8');
    expect(text).toContain('K-301 Blower, screw compressor');
    expect(text).toContain('Wye-delta, open transition');
    expect(text).not.toContain('C-201 Screenings conveyor');
    await engineer.agent.get(`/api/panels/${panelId}/drawings/schematic.svg?tag=NOPE-1`).expect(404);
    const all = (
      await engineer.agent.get(`/api/panels/${panelId}/drawings/schematic.svg`).buffer(true).parse(binary).expect(200)
    ).body.toString('utf8');
    for (const tag of ['P-101', 'C-201', 'K-301', 'H-601']) expect(all).toContain(`${tag} `);
    expect(all).toContain('IEEE 315 / NEMA ICS 19');
  });

  it('lists as many terminals as the bill of materials holds terminal blocks (one source)', async () => {
    const bom = (await engineer.agent.get(`/api/panels/${panelId}/bom`).expect(200)).body as {
      lines: Array<{ category: string; quantity: number }>;
    };
    const blocks = bom.lines.filter((l) => l.category === 'terminal-block').reduce((n, l) => n + l.quantity, 0);
    const d = (await engineer.agent.get(`/api/panels/${panelId}/drawings`).expect(200)).body as {
      terminals: Array<{ inBom: boolean }>;
      bomTerminalBlocks: number;
      sheets: Array<{ number: string }>;
    };
    expect(blocks).toBeGreaterThan(0);
    expect(d.bomTerminalBlocks).toBe(blocks);
    expect(d.terminals.length).toBe(blocks);
    const csv = (await engineer.agent.get(`/api/panels/${panelId}/drawings/terminals.csv`).expect(200)).text;
    expect(csvRows(csv).length - 1).toBe(blocks);
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.load(
      (await engineer.agent.get(`/api/panels/${panelId}/drawings/wiring.xlsx`).buffer(true).parse(binary).expect(200)).body,
    );
    expect(wb.getWorksheet('Terminals')!.rowCount - 1).toBe(blocks);
    const wires = (await engineer.agent.get(`/api/panels/${panelId}/drawings/wires.csv`).expect(200)).text;
    expect(wb.getWorksheet('Wires')!.rowCount).toBe(csvRows(wires).length);
    // supply, eight schematics, backplate layout, terminal plan, wire list, nameplate
    expect(d.sheets.length).toBe(1 + 8 + 4);
  });

  it('numbers every sheet by the shop’s drawing-number scheme, as the submittal numbers its pages', async () => {
    const shop = (await engineer.agent.get('/api/settings').expect(200)).body as { drawingNumberScheme: string };
    const d = (await engineer.agent.get(`/api/panels/${panelId}/drawings`).expect(200)).body as {
      drawingNumber: string;
      sheets: Array<{ number: string }>;
    };
    // the demo shop keeps the default scheme {job}-{panel}-{sheet:2}; the demo panel is a draft (D)
    expect(shop.drawingNumberScheme).toBe('{job}-{panel}-{sheet:2}');
    expect(d.sheets.map((s) => s.number)).toEqual(d.sheets.map((_, i) => `J-2041-MCC-1-Pump-hall-${String(i + 1).padStart(2, '0')}`));
    expect(d.drawingNumber).toBe('J-2041-MCC-1-Pump-hall');
    const svg = (
      await engineer.agent.get(`/api/panels/${panelId}/drawings/nameplate.svg`).buffer(true).parse(binary).expect(200)
    ).body.toString('utf8');
    expect(svg).toContain('class="np-wiring-diagram">J-2041-MCC-1-Pump-hall<');
    // every sheet's title block names the shop from its settings, never a placeholder
    const name = ((await engineer.agent.get('/api/settings').expect(200)).body as { name: string }).name;
    const sheets = (
      await engineer.agent.get(`/api/panels/${panelId}/drawings/schematic.svg`).buffer(true).parse(binary).expect(200)
    ).body.toString('utf8');
    expect(sheets).toContain(name.replace(/&/g, '&amp;'));
    expect(sheets).not.toContain('[Shop name]');
  });

  it('prints the nameplate with the checks’ full-load current and SCCR (NEC 2023 409.110)', async () => {
    const checks = (await engineer.agent.get(`/api/panels/${panelId}/checks`).expect(200)).body as {
      nameplate: { result: { fullLoadAmps: number; lines: Array<{ label: string; value: string }> } };
      sccr: { panelSccrKa: number | null };
    };
    const svg = (
      await engineer.agent.get(`/api/panels/${panelId}/drawings/nameplate.svg`).buffer(true).parse(binary).expect(200)
    ).body.toString('utf8');
    const flc = /class="np-full-load-current">([^<]+)</.exec(svg)?.[1];
    const sccr = /class="np-short-circuit-current-rating">([^<]+)</.exec(svg)?.[1];
    expect(flc).toBe(`${checks.nameplate.result.fullLoadAmps} A`);
    expect(checks.sccr.panelSccrKa).not.toBeNull();
    expect(sccr).toBe(`${checks.sccr.panelSccrKa} kA rms symmetrical, 480 V`);
    // the shop's own name from its settings (NEC 2023 409.110(1): the manufacturer's name), never a placeholder
    const shop = (await engineer.agent.get('/api/settings').expect(200)).body as { name: string };
    expect(svg).toContain(`class="np-manufacturer">${shop.name}<`);
    expect(svg).not.toContain('[Shop name]');
  });

  it('draws the backplate layout for every role, in the enclosure of the bill of materials and of the heat check', async () => {
    const base = `/api/panels/${panelId}/drawings`;
    for (const role of ['admin', 'designer', 'estimator', 'engineer'] as DemoRole[]) {
      const s = role === 'engineer' ? engineer : await signInAs(role);
      const res = await s.agent.get(`${base}/layout.svg`).buffer(true).parse(binary).expect(200);
      expect(res.headers['content-type']).toMatch(/^image\/svg\+xml/);
      expect(res.body.toString('utf8')).toContain('Backplate layout');
    }
    const svg = (await engineer.agent.get(`${base}/layout.svg`).buffer(true).parse(binary).expect(200)).body.toString('utf8');
    const bom = (await engineer.agent.get(`/api/panels/${panelId}/bom`).expect(200)).body as {
      lines: Array<{ category: string; code: string | null; quantity: number }>;
    };
    const checks = (await engineer.agent.get(`/api/panels/${panelId}/checks`).expect(200)).body as {
      heat: { enclosure: { code: string; sections: number } | null };
    };
    const view = (await engineer.agent.get(base).expect(200)).body as {
      layout: { enclosure: { code: string } | null; sections: number; placedCount: number; unplaced: Array<{ tag: string }> };
    };
    const enc = bom.lines.find((l) => l.category === 'enclosure' && l.code)!;
    // one enclosure: the bill of materials' line, the heat check's and the layout's
    expect(view.layout.enclosure?.code).toBe(enc.code);
    expect(checks.heat.enclosure?.code).toBe(enc.code);
    expect(view.layout.sections).toBe(enc.quantity);
    expect(checks.heat.enclosure?.sections).toBe(enc.quantity);
    expect(svg).toContain(enc.code!);
    expect(svg).toMatch(/Scale 1:\d+/);
    // every mounted part of the bill of materials is drawn on the plate or named as not placed
    const mounted = new Set(CATEGORY_IDS.filter((c: Category) => !(c in NOT_ON_PLATE)));
    const parts = bom.lines.filter((l) => mounted.has(l.category as Category)).reduce((n, l) => n + Math.ceil(l.quantity), 0);
    const drawn = (svg.match(/class="pw-part"/g) ?? []).length;
    expect(drawn).toBe(view.layout.placedCount);
    expect(drawn + view.layout.unplaced.length).toBe(parts);
    expect(drawn).toBeGreaterThan(0);
  });

  it('answers 404 for another shop’s panel layout', async () => {
    const stamp = Date.now().toString(36);
    const org = await Organisation.create({ name: `Larkspur Switchgear ${stamp} (fictional)` });
    const job = await Job.create({ organisationId: org.id, number: 'J-9', name: 'Not ours', archivedAt: null, createdBy: null });
    const panel = await Panel.create({
      organisationId: org.id,
      jobId: job.id,
      name: 'Their MCC',
      revisionNumber: null,
      archivedAt: null,
      rollup: null,
      submittedAt: null,
    });
    for (const role of ['admin', 'designer', 'estimator', 'engineer'] as DemoRole[]) {
      const s = role === 'engineer' ? engineer : await signInAs(role);
      await s.agent.get(`/api/panels/${panel.id}/drawings/layout.svg`).expect(404);
    }
  });
});
