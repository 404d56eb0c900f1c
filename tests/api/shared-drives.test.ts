// Three motors on one drive through the API: the stored roll-up, the bill of materials (one drive sized for the
// sum, three overload relays, three output contactors), the checks, the submittal and the motor-list round trip.
// FLC from NEC 2023 Table 430.250 at 460 V: 10 hp 14 A, 7.5 hp 11 A, 5 hp 7.6 A (sum 32.6 A); 15 hp 21 A.
// Drive input device 250 % × 32.6 = 81.5 A -> 90 A (NEC 2023 430.130(A)(1), Table 430.52, 430.52(C)(1) Exc. 1).
import { describe, expect, it } from 'vitest';
import { send, signInAs, type Session, binary } from '../setup/api';

const uniq = () => `SD-${Date.now().toString(36)}-${Math.floor(Math.random() * 1e5)}`;
const onDrive = (tag: string, hp: number) => ({
  tag,
  supply: 'ac3',
  hp,
  volts: 460,
  speedControl: 'variable',
  torque: 'variable',
  sharedDrive: 'VFD-1',
  environment: 'indoor-dry',
});
const MOTORS = [
  onDrive('CV-1', 10),
  onDrive('CV-2', 7.5),
  onDrive('CV-3', 5),
  { tag: 'P-4', supply: 'ac3', hp: 15, volts: 460, environment: 'indoor-dry' },
];

interface Line {
  bucket: string;
  category: string;
  quantity: number;
  requirement: Array<Record<string, unknown>> | null;
}

async function panelWithMotors(designer: Session) {
  const job = (await send(designer, 'post', '/api/jobs', { number: uniq(), name: 'Conveyor line', availableFaultKa: 22 }).expect(201)).body;
  const panel = (await send(designer, 'post', `/api/jobs/${job.id}/panels`, { name: 'CV-MCC' }).expect(201)).body;
  for (const answers of MOTORS) await send(designer, 'post', `/api/panels/${panel.id}/loads`, { answers }).expect(201);
  return { job, panel };
}

describe('three conveyor motors on one drive', () => {
  it('rolls the drive up once, builds one drive with three overloads and three output contactors, and shows the group in the checks', async () => {
    const designer = await signInAs('designer');
    const engineer = await signInAs('engineer');
    const { job, panel } = await panelWithMotors(designer);
    const p = (await designer.agent.get(`/api/panels/${panel.id}`).expect(200)).body;
    expect(p.rollup.sharedDrives).toHaveLength(1);
    expect(p.rollup.sharedDrives[0]).toMatchObject({
      tag: 'VFD-1',
      sumFlcAmps: 32.6, // NEC 2023 Table 430.250: 14 + 11 + 7.6
      output: { minOutputAmps: 32.6, duty: 'normal' }, // sum of FLA (no nameplate: table FLC) — common practice; variable torque: normal duty
      input: { amps: 32.6, protection: { ratingAmps: 90 }, conductor: { minAmpacity: 40.75, size: '8 AWG' } }, // 430.130, 430.122(A)
    });
    // NEC 2023 430.24: VFD-1 is the largest load, 1.25 × 32.6 + 21 = 61.75 A; 430.62(A): 90 + 21 = 111 -> 110 A
    expect(p.rollup.feeder).toMatchObject({ minAmpacity: 61.75, ocpdMaxAmps: 110 });
    expect(p.rollup.totalFlcAmps).toBe(53.6);

    const bom = (await send(designer, 'post', `/api/panels/${panel.id}/bom/rebuild`, {}).expect(200)).body as { lines: Line[] };
    const lines = bom.lines;
    const drives = lines.filter((l) => l.category === 'vfd');
    expect(drives.map((l) => [l.bucket, l.quantity, l.requirement?.[0]?.minNormalDutyAmps])).toEqual([['VFD-1', 1, 32.6]]);
    const byMotor = (category: string) =>
      lines
        .filter((l) => l.category === category && l.bucket.startsWith('CV-'))
        .map((l) => [l.bucket, l.quantity])
        .sort();
    expect(byMotor('overload-relay')).toEqual([
      ['CV-1', 1],
      ['CV-2', 1],
      ['CV-3', 1],
    ]); // NEC 2023 430.32: one relay per motor
    expect(byMotor('contactor')).toEqual([
      ['CV-1', 1],
      ['CV-2', 1],
      ['CV-3', 1],
    ]); // output contactors, AC-3 at each motor's FLA (common practice)
    const breakers = lines.filter((l) => l.category === 'inverse-time-breaker').map((l) => [l.bucket, l.requirement?.[0]?.exactAmps]);
    // one input device for the drive (90 A) and P-4's own: 250 % × 21 = 52.5 -> 60 A (NEC 2023 430.52(C)(1) Exc. 1)
    expect(breakers.sort()).toEqual([
      ['P-4', 60],
      ['VFD-1', 90],
    ]);

    const checks = (await engineer.agent.get(`/api/panels/${panel.id}/checks`).expect(200)).body;
    expect(checks.sharedDrives.drives.map((d: { tag: string }) => d.tag)).toEqual(['VFD-1']);
    expect(checks.sharedDrives.lines[0]).toMatch(/^VFD-1 feeds CV-1, CV-2, CV-3 at 460 V: sum of FLC 32\.6 A/);
    expect(checks.sharedDrives.drives[0].cautions.join(' ')).toMatch(/Starting a motor onto a running drive output/);
    expect(checks.cautions.join(' ')).toMatch(/qualified person/);

    // the schematic draws each motor's output contactor interlocked with the drive
    const dr = (await engineer.agent.get(`/api/panels/${panel.id}/drawings`).expect(200)).body;
    const starters = dr.buckets.map((b: { tag: string; starter: string }) => [b.tag, b.starter]);
    expect(starters).toContainEqual(['CV-2', 'Output contactor on shared drive VFD-1']);
    expect(starters).toContainEqual(['P-4', 'Full-voltage non-reversing']);
    const svg = await engineer.agent.get(`/api/panels/${panel.id}/drawings/schematic.svg`).buffer(true).parse(binary).expect(200);
    expect((svg.body as Buffer).toString('utf8')).toContain('VFD-1');

    const pdf = await engineer.agent.get(`/api/panels/${panel.id}/submittal.pdf`).buffer(true).parse(binary).expect(200);
    expect((pdf.body as Buffer).subarray(0, 5).toString('latin1')).toBe('%PDF-');
    expect(job.id).toBeGreaterThan(0);
  });

  it('carries the shared drive through the motor-list export and import', async () => {
    const designer = await signInAs('designer');
    const { job, panel } = await panelWithMotors(designer);
    const file = (await designer.agent.get(`/api/panels/${panel.id}/motors.xlsx`).buffer(true).parse(binary).expect(200)).body as Buffer;
    const other = (await send(designer, 'post', `/api/jobs/${job.id}/panels`, { name: 'CV-MCC-2' }).expect(201)).body;
    const commit = await designer.agent
      .post(`/api/panels/${other.id}/import/commit`)
      .set('x-csrf-token', designer.token)
      .attach('file', file, 'motors.xlsx');
    expect(commit.status, JSON.stringify(commit.body)).toBe(201);
    const copy = (await designer.agent.get(`/api/panels/${other.id}`).expect(200)).body;
    expect(copy.loads.map((l: { answers: unknown }) => l.answers)).toEqual(MOTORS);
    expect(
      copy.rollup.sharedDrives.map((d: { tag: string; motors: Array<{ tag: string }> }) => [d.tag, d.motors.map((m) => m.tag)]),
    ).toEqual([['VFD-1', ['CV-1', 'CV-2', 'CV-3']]]);
  });

  it('refuses a shared drive on a fixed-speed motor with the reason', async () => {
    const designer = await signInAs('designer');
    const { panel } = await panelWithMotors(designer);
    const r = await send(designer, 'post', `/api/panels/${panel.id}/loads`, {
      answers: { tag: 'F-1', supply: 'ac3', hp: 5, volts: 460, sharedDrive: 'VFD-1' },
    }).expect(400);
    expect(JSON.stringify(r.body.error)).toContain('A shared drive applies only to motors with variable speed');
  });
});
