// Motors on one branch circuit (NEC 2023 430.53) through the API: the panel's roll-up, the bill of
// materials, the checks and the motor-list export and import. FLC from NEC 2023 Table 430.250 (460 V):
// 10 hp 14 A, 5 hp 7.6 A; inverse-time breaker 250 % (Table 430.52): 35 A and 19 → 20 A.
import ExcelJS from 'exceljs';
import { describe, expect, it } from 'vitest';
import { send, signInAs, binary } from '../setup/api';

const uniq = () => `G-${Date.now().toString(36)}-${Math.floor(Math.random() * 1e5)}`;
const base = { supply: 'ac3', volts: 460, environment: 'indoor-dry', branchGroup: 'G-1', groupListedMaxAmps: 60 };
const MOTORS = [
  { ...base, tag: 'CV-1', hp: 10 },
  { ...base, tag: 'CV-2', hp: 5 },
  { ...base, tag: 'CV-3', hp: 5 },
  { tag: 'P-1', supply: 'ac3', hp: 5, volts: 460, environment: 'indoor-dry' },
];

describe('a group of motors on one branch circuit', () => {
  it('430.53(C): one 50 A group breaker in the bill of materials, the path in the checks, the group carried by the motor list', async () => {
    const designer = await signInAs('designer');
    const engineer = await signInAs('engineer');
    const job = (await send(designer, 'post', '/api/jobs', { number: uniq(), name: 'Conveyor line', availableFaultKa: 22 }).expect(201))
      .body;
    const panel = (await send(designer, 'post', `/api/jobs/${job.id}/panels`, { name: 'CV-MCC' }).expect(201)).body;
    for (const answers of MOTORS) await send(designer, 'post', `/api/panels/${panel.id}/loads`, { answers }).expect(201);

    const p = (await designer.agent.get(`/api/panels/${panel.id}`).expect(200)).body;
    const g = p.rollup.groups[0];
    // (B): 20 A < 29.2 A running; (C)(4): 35 + 7.6 + 7.6 = 50.2 → 50 A (Table 240.6(A)), within the 60 A listing
    expect([g.group, g.path, g.device.ratingAmps, g.conductor.size]).toEqual(['G-1', 'C', 50, '10 AWG']); // 430.24: 32.7 A → 10 AWG 35 A
    // 430.62(A): the group's 50 A counted once + P-1 7.6 A = 57.6 → 50 A (next lower standard rating)
    expect(p.rollup.feeder.ocpdMaxAmps).toBe(50);

    const bom = (await send(designer, 'post', `/api/panels/${panel.id}/bom/rebuild`, {}).expect(200)).body as {
      lines: Array<{ bucket: string; category: string; code: string | null; quantity: number }>;
    };
    const breakers = bom.lines.filter((l) => l.category === 'inverse-time-breaker').map((l) => [l.bucket, l.code, l.quantity]);
    expect(breakers).toEqual([
      ['P-1', 'PW-BR-3P-020', 1], // its own branch circuit: 7.6 × 2.5 = 19 → 20 A
      ['G-1', 'PW-BR-3P-050', 1],
    ]);
    for (const tag of ['CV-1', 'CV-2', 'CV-3'])
      expect(
        bom.lines.some((l) => l.bucket === tag && l.category === 'overload-relay'),
        `${tag} overload (430.32)`,
      ).toBe(true);

    const checks = (await engineer.agent.get(`/api/panels/${panel.id}/checks`).expect(200)).body;
    expect(checks.groupCircuits.groups.map((x: { group: string; path: string }) => [x.group, x.path])).toEqual([['G-1', 'C']]);
    expect(checks.groupCircuits.findings).toEqual([]);

    // the shop's drawings: a grouped motor's power circuit taps the group's breaker, drawn under the group's
    // tag, and has no breaker of its own (the bill of materials has none); P-1 keeps its own
    const sheet = async (tag: string) =>
      (
        await engineer.agent.get(`/api/panels/${panel.id}/drawings/schematic.svg?tag=${tag}`).buffer(true).parse(binary).expect(200)
      ).body.toString('utf8') as string;
    const cv2 = await sheet('CV-2');
    expect(cv2).toContain('G-1-CB');
    expect(cv2).toContain('group G-1 50 A, 430.53(C)');
    expect(cv2).not.toMatch(/>2CB</);
    const p1 = await sheet('P-1');
    expect(p1).toMatch(/>4CB</);
    expect(p1).not.toContain('G-1-CB');

    // the motor list carries the group and its listing; imported into another panel it forms the same group
    const file = (await designer.agent.get(`/api/panels/${panel.id}/motors.xlsx`).buffer(true).parse(binary).expect(200)).body as Buffer;
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.load(file as unknown as ArrayBuffer);
    const header = (wb.getWorksheet('Motors')!.getRow(1).values as unknown[]).slice(1);
    expect(header).toContain('branchGroup');
    expect(header).toContain('groupListedMaxAmps');
    const other = (await send(designer, 'post', `/api/jobs/${job.id}/panels`, { name: 'CV-MCC-2' }).expect(201)).body;
    const commit = await designer.agent
      .post(`/api/panels/${other.id}/import/commit`)
      .set('x-csrf-token', designer.token)
      .attach('file', file, 'motors.xlsx');
    expect(commit.status, JSON.stringify(commit.body)).toBe(201);
    const copy = (await designer.agent.get(`/api/panels/${other.id}`).expect(200)).body;
    expect(copy.loads.map((l: { answers: unknown }) => l.answers)).toEqual(p.loads.map((l: { answers: unknown }) => l.answers));
    expect(copy.rollup.groups).toEqual(p.rollup.groups);
  });

  it('refused without the listing: a finding in the checks and each motor on its own breaker', async () => {
    const designer = await signInAs('designer');
    const engineer = await signInAs('engineer');
    const job = (await send(designer, 'post', '/api/jobs', { number: uniq(), name: 'Conveyor line', availableFaultKa: 22 }).expect(201))
      .body;
    const panel = (await send(designer, 'post', `/api/jobs/${job.id}/panels`, { name: 'CV-MCC' }).expect(201)).body;
    for (const m of MOTORS.slice(0, 3)) {
      const { groupListedMaxAmps: _, ...answers } = m as typeof base & { tag: string; hp: number };
      await send(designer, 'post', `/api/panels/${panel.id}/loads`, { answers }).expect(201);
    }
    const bom = (await send(designer, 'post', `/api/panels/${panel.id}/bom/rebuild`, {}).expect(200)).body as {
      lines: Array<{ bucket: string; category: string; code: string | null }>;
    };
    // Table 430.52: 35, 20, 20 A, each on its own branch circuit
    expect(bom.lines.filter((l) => l.category === 'inverse-time-breaker').map((l) => [l.bucket, l.code])).toEqual([
      ['CV-1', 'PW-BR-3P-035'],
      ['CV-2', 'PW-BR-3P-020'],
      ['CV-3', 'PW-BR-3P-020'],
    ]);
    const checks = (await engineer.agent.get(`/api/panels/${panel.id}/checks`).expect(200)).body;
    expect(checks.groupCircuits.findings).toHaveLength(1);
    expect(checks.groupCircuits.findings[0]).toMatch(/G-1 .*refused.*not listed for group installation/);
  });
});
