// The select CLI run as a child process, as other tools will run it.
import { execFile } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../../..');

function run(...args: string[]): Promise<{ code: number; stdout: string; stderr: string }> {
  return new Promise((resolve) => {
    execFile('npx', ['tsx', 'server/cli/select.ts', ...args], { cwd: root, timeout: 60_000 }, (err, stdout, stderr) => {
      const code = err ? (typeof err.code === 'number' ? err.code : 1) : 0;
      resolve({ code, stdout, stderr });
    });
  });
}

describe('npm run -s select -- FILE.json', () => {
  it('writes its whole answer into a slow pipe (more than 64 KiB) before it exits', async () => {
    // the sample's answer (8 motors) is about 88 kB; `sleep 1` holds the pipe's reader back so the writer must wait for it
    const out = await new Promise<{ stdout: string }>((resolve) => {
      execFile(
        'sh',
        ['-c', 'npx tsx server/cli/select.ts tests/fixtures/select-sample.json | (sleep 1; cat)'],
        { cwd: root, timeout: 60_000, maxBuffer: 8 * 1024 * 1024 },
        (_err, stdout) => resolve({ stdout }),
      );
    });
    expect(out.stdout.length).toBeGreaterThan(65_536);
    expect(JSON.parse(out.stdout).results).toHaveLength(8);
  }, 60_000);

  it('prints one result per load in input order and the panel roll-up', async () => {
    const { code, stdout, stderr } = await run('tests/fixtures/select-sample.json');
    expect(stderr).toBe('');
    expect(code).toBe(0);
    const out = JSON.parse(stdout);
    expect(out.results.map((r: { tag: string }) => r.tag)).toEqual([
      'P-101',
      'CV-201',
      'F-301',
      'C-401',
      'AG-501',
      'SP-601',
      'HS-701',
      'W-801',
    ]);
    const [p101, cv201, f301, c401, ag501, sp601, hs701, w801] = out.results;
    expect(p101).toMatchObject({
      flcAmps: 34,
      scpd: { ratingAmps: 90 },
      conductor: { size: '8 AWG' },
      overload: { maxSettingAmps: 38.75 },
      relays: { phaseLoss: true },
    }); // NEC 2023 Tables 430.250, 430.52, 310.16
    expect(cv201.starter).toMatchObject({ type: 'FVR', reversingContactors: true, interlock: true, iecCategory: 'AC-4' });
    expect(cv201.enclosure).toMatchObject({ nemaType: '4X', ipCode: 'IP66' });
    expect(f301.starter.type).toBe('VFD');
    expect(f301.overload.tripClass).toBe(30);
    expect(c401.starter.type).toBe('wye-delta');
    expect(c401.relays).toMatchObject({ phaseLoss: true, phaseReversal: true });
    expect(ag501.starter.type).toBe('RVSS');
    expect(ag501.enclosure.flagForEngineer).toBe(true);
    expect(ag501.assumed.map((a: { field: string }) => a.field)).toContain('kw');
    expect(sp601.flcAmps).toBe(16); // NEC 2023 Table 430.248
    expect(hs701.cautions.join(' ')).toMatch(/DC series motor unloaded/);
    expect(w801.starter.type).toBe('dc-drive');
    // 430.24, 430.62(A): 317 A of motors on the 480 V bus, plus the primary currents of the panel's sources for
    // SP-601 (T1, 5 kVA 480-240/120 V: 10.42 A), HS-701 (DC1: 16.13 A estimated) and W-801 (T2, 9 kVA 480-240 V: 10.83 A)
    expect(out.panel.feeder).toMatchObject({ minAmpacity: 354.38, conductorSize: '500 kcmil', ocpdMaxAmps: 500 }); // 500 kcmil Cu 75 °C = 380 A, NEC 2023 Table 310.16
    expect(out.panel.otherSources.map((s: { tag: string; kva: number | null }) => [s.tag, s.kva])).toEqual([
      ['T1', 5],
      ['DC1', null],
      ['T2', 9],
    ]);
    for (const r of out.results) expect(r.errors).toEqual([]);
  }, 60_000);

  it('invalid input exits 2 and names each bad field', async () => {
    const { code, stdout } = await run('tests/fixtures/select-invalid.json');
    expect(code).toBe(2);
    const { errors } = JSON.parse(stdout);
    const paths = errors.map((e: { path: string }) => e.path);
    expect(paths).toContain('loads[1].hp');
    expect(paths).toContain('loads[2].dcField');
    expect(paths).toContain('loads[3].hp');
    expect(paths).toContain('loads[3].scpdType');
    expect(stdout).not.toMatch(/\bat .*\.ts:\d+/); // no stack trace
  }, 60_000);

  it('a missing file and bad JSON exit 2 with an error, never a stack trace', async () => {
    const missing = await run('tests/fixtures/does-not-exist.json');
    expect(missing.code).toBe(2);
    expect(JSON.parse(missing.stdout).errors[0].message).toMatch(/cannot read .*ENOENT/);
    const dir = mkdtempSync(path.join(tmpdir(), 'pw-cli-'));
    const bad = path.join(dir, 'bad.json');
    writeFileSync(bad, '{ "supply": ');
    const r = await run(bad);
    expect(r.code).toBe(2);
    expect(JSON.parse(r.stdout).errors[0].message).toMatch(/not valid JSON/);
    expect(r.stderr).toBe('');
  }, 60_000);

  const supply = { volts: 480, phases: 3, availableFaultKa: 35, ambientC: 30 };
  function inputFile(body: unknown): string {
    const dir = mkdtempSync(path.join(tmpdir(), 'pw-cli-'));
    const f = path.join(dir, 'in.json');
    writeFileSync(f, JSON.stringify(body));
    return f;
  }

  it('a rated voltage no FLC table covers, without nameplate FLA, exits 2 naming loads[i].volts (NEC 2023 Table 430.250: no 400 V column)', async () => {
    const r = await run(inputFile({ supply, loads: [{ tag: 'M-400', supply: 'ac3', hp: 10, volts: 400 }] }));
    expect(r.code).toBe(2);
    const { errors, results } = JSON.parse(r.stdout);
    expect(results).toBeUndefined();
    expect(errors).toEqual([
      { path: 'loads[0].volts', message: expect.stringMatching(/rated 400 V: no full-load current table covers it/) },
    ]);
  }, 60_000);

  it('with a nameplate FLA the nameplate governs, said in flcSource and cautioned; exit 0', async () => {
    // on a 400 V 50 Hz supply: the motor is on the panel's own bus (on a 480 V panel it would need a 400 V source, which exits 3)
    const r = await run(
      inputFile({ supply: { ...supply, volts: 400, hz: 50 }, loads: [{ tag: 'M-400', supply: 'ac3', hp: 10, volts: 400, fla: 15.5 }] }),
    );
    expect(r.code).toBe(0);
    const [m] = JSON.parse(r.stdout).results;
    expect(m.flcAmps).toBe(15.5); // NEC 2023 430.6(A)(1): nameplate current where the tables do not apply
    expect(m.flcSource).toMatch(/^nameplate FLA \(Table 430\.250: 400 V/);
    expect(m.cautions.join(' ')).toMatch(/nameplate current 15\.5 A is used/);
  }, 60_000);

  it('a result with errors exits 3 with the results and the errors listed (a three-phase motor on a single-phase supply)', async () => {
    const r = await run(
      inputFile({ supply: { ...supply, volts: 240, phases: 1 }, loads: [{ tag: 'M-3P', supply: 'ac3', hp: 5, volts: 230 }] }),
    );
    expect(r.code).toBe(3);
    const out = JSON.parse(r.stdout);
    expect(out.results).toHaveLength(1);
    expect(out.errors).toContainEqual({ path: 'panel', message: 'M-3P: a three-phase motor cannot be fed from a single-phase supply' });
  }, 60_000);
});
