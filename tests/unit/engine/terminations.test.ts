// Termination temperature, NEC 2023 110.14(C)(1): a conductor of 14–1 AWG, or of a circuit rated 100 A
// or less, is held to the 60 °C column of Table 310.16 unless the equipment is listed and identified
// for 75 °C conductors ((a)(3)); a larger conductor on a circuit over 100 A takes 75 °C ((b)).
// Ampacities from NEC 2023 Table 310.16 (copper), FLC from NEC 2023 Table 430.250.
import { execFile } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { selectConductor, terminationColumnC } from '../../../shared/calc/conductor';
import { motor, selector, supply480 } from './selector-setup';

const listed = { ...supply480, terminationsListed75C: true };
const notListed = { ...supply480, terminationsListed75C: false };

describe('the termination column (110.14(C)(1))', () => {
  it.each([
    ['14 AWG', true, 20, 75, '(a)(3): equipment listed for 75 °C'],
    ['14 AWG', false, 20, 60, '(a): 14–1 AWG'],
    ['1 AWG', false, 200, 60, '(a): 1 AWG is in 14–1 AWG whatever the circuit'],
    ['1/0 AWG', false, 200, 75, '(b): larger than 1 AWG on a circuit over 100 A'],
    ['1/0 AWG', false, 100, 60, '(a): a circuit rated 100 A or less'],
  ])('%s, listed %s, circuit %s A: %s °C (%s)', (size, isListed, amps, column) => {
    expect(terminationColumnC(size, isListed, amps)).toBe(column);
  });

  it('90 °C insulation on 60 °C terminations keeps the 60 °C ampacity: 17.5 A takes 12 AWG (20 A), not 14 AWG (25 A at 90 °C)', () => {
    // Table 310.16 Cu: 14 AWG 15/20/25 A, 12 AWG 20/25/30 A at 60/75/90 °C
    const c = selectConductor(17.5, { material: 'cu', tempRatingC: 90, ambientC: 30, terminationsListed75C: false }, '2023');
    expect(c.size).toBe('12 AWG');
    expect(c.ampacity).toBe(20);
    expect(c.basis).toMatch(/110\.14\(C\)\(1\)\(a\)/);
  });
});

describe("motor branch conductors with the panel's termination answer", () => {
  it('10 hp, 460 V: 14 A × 1.25 = 17.5 A; 14 AWG at 75 °C (20 A), and 12 AWG beside it at 60 °C (14 AWG is 15 A there)', async () => {
    const r = await selector.selectLoad(motor({ hp: 10, volts: 460 }), supply480);
    expect(r.flcAmps).toBe(14); // NEC 2023 Table 430.250
    expect(r.conductor.minAmpacity).toBe(17.5); // 430.22
    expect(r.conductor).toMatchObject({ size: '14 AWG', ampacity: 20 }); // Table 310.16 Cu 75 °C
    expect(r.conductor.termination60C).toMatchObject({ size: '12 AWG', ampacity: 20, minAmpacity: 17.5 }); // Table 310.16 Cu 60 °C
    const flag = r.assumed.find((a) => a.field === 'terminationsListed75C');
    expect(flag?.note).toMatch(/14 AWG at 75 °C; at 60 °C terminations 12 AWG/);
    expect(r.cautions.some((c) => c.includes('at 60 °C it takes 12 AWG'))).toBe(true);
    expect(r.trace.some((t) => t.ruleId === 'sizing.conductor-60c')).toBe(true);
  });

  it('answered "listed for 75 °C": no assumption flagged, the 60 °C size still shown beside it', async () => {
    const r = await selector.selectLoad(motor({ hp: 10, volts: 460 }), listed);
    expect(r.conductor.size).toBe('14 AWG');
    expect(r.conductor.termination60C?.size).toBe('12 AWG');
    expect(r.assumed.map((a) => a.field)).not.toContain('terminationsListed75C');
  });

  it('answered "not listed": the branch conductors are sized at 60 °C, 12 AWG (20 A), nothing beside', async () => {
    const r = await selector.selectLoad(motor({ hp: 10, volts: 460 }), notListed);
    expect(r.conductor).toMatchObject({ size: '12 AWG', ampacity: 20 }); // Table 310.16 Cu 60 °C
    expect(r.conductor.termination60C).toBeUndefined();
    expect(r.conductor.basis).toMatch(/110\.14\(C\)\(1\)\(a\)/);
    expect(r.assumed.map((a) => a.field)).not.toContain('terminationsListed75C');
  });

  it('25 hp, 460 V: 34 A × 1.25 = 42.5 A; 8 AWG at 75 °C (50 A), 6 AWG at 60 °C (8 AWG is 40 A there)', async () => {
    const r = await selector.selectLoad(motor({ hp: 25, volts: 460 }), notListed);
    expect(r.flcAmps).toBe(34); // NEC 2023 Table 430.250
    expect(r.conductor).toMatchObject({ size: '6 AWG', ampacity: 55 }); // Table 310.16 Cu 60 °C
  });

  it('100 hp, 460 V: 124 A × 1.25 = 155 A takes 2/0 AWG (175 A at 75 °C) either way: larger than 1 AWG on a circuit over 100 A (110.14(C)(1)(b))', async () => {
    const r = await selector.selectLoad(motor({ hp: 100, volts: 460 }), notListed);
    expect(r.flcAmps).toBe(124); // NEC 2023 Table 430.250
    expect(r.conductor).toMatchObject({ size: '2/0 AWG', ampacity: 175 }); // Table 310.16 Cu 75 °C
    const d = await selector.selectLoad(motor({ hp: 100, volts: 460 }), supply480);
    expect(d.conductor.termination60C).toBeUndefined();
    expect(d.assumed.map((a) => a.field)).not.toContain('terminationsListed75C');
  });

  it('the feeder follows the answer: one 10 hp motor, 17.5 A, 14 AWG listed, 12 AWG not listed (430.24, Table 310.16)', async () => {
    const loads = [motor({ hp: 10, volts: 460 })];
    expect((await selector.selectPanel({ supply: listed, loads })).panel.feeder.conductorSize).toBe('14 AWG');
    expect((await selector.selectPanel({ supply: notListed, loads })).panel.feeder.conductorSize).toBe('12 AWG');
  });
});

describe('the CLI takes the answer on the supply', () => {
  const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../../..');
  function run(input: unknown): Promise<{ code: number; stdout: string }> {
    const dir = mkdtempSync(path.join(tmpdir(), 'pw-term-'));
    const file = path.join(dir, 'in.json');
    writeFileSync(file, JSON.stringify(input));
    return new Promise((resolve) => {
      execFile('npx', ['tsx', 'server/cli/select.ts', file], { cwd: root, timeout: 60_000 }, (err, stdout) => {
        resolve({ code: err ? (typeof err.code === 'number' ? err.code : 1) : 0, stdout });
      });
    });
  }
  it('false sizes at 60 °C; a value that is not true or false exits 2 naming supply.terminationsListed75C', async () => {
    const ok = await run({ supply: notListed, loads: [motor({ hp: 10, volts: 460 })] });
    expect(ok.code).toBe(0);
    expect(JSON.parse(ok.stdout).results[0].conductor.size).toBe('12 AWG');
    const bad = await run({ supply: { ...supply480, terminationsListed75C: 'yes' }, loads: [motor({ hp: 10, volts: 460 })] });
    expect(bad.code).toBe(2);
    expect(JSON.parse(bad.stdout).errors[0].path).toBe('supply.terminationsListed75C');
  });
});
