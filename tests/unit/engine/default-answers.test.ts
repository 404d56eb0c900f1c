// One default for an answer nobody gave: the motor wizard, the motor-list import and the select CLI
// reach the same selection, with the same "assumed" flags, for a motor whose nameplate leaves the
// service factor (and the environment) unknown.
import { execFile } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { ASSUMED_WHEN_NOT_GIVEN, loadDefaults } from '../../../shared/schemas/load';
import { cleanAnswers, motorResolver, newMotorAnswers } from '../../../src/features/panels/model/motor-answers';
import { previewImport } from '../../../server/modules/panels/import';
import { selector, supply480 } from './selector-setup';
import type { LoadSelection } from '../../../shared/schemas/selection';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../../..');

/** What the user types on the wizard's first step; everything else is left as the wizard starts. */
const TYPED = { tag: 'P-7', supply: 'ac3', hp: 25, volts: 460, fla: 31 } as const;

async function viaWizard(): Promise<LoadSelection> {
  const values = { ...newMotorAnswers(), ...TYPED };
  const r = await motorResolver(values, undefined, { fields: {}, shouldUseNativeValidation: false } as never);
  expect(r.errors).toEqual({});
  // the wizard saves cleanAnswers(values); the server selects on what is stored
  return selector.selectLoad(cleanAnswers(r.values as Record<string, unknown>) as never, supply480);
}

async function viaImport(): Promise<LoadSelection> {
  const csv = `tag,supply,hp,volts,fla\r\n${TYPED.tag},${TYPED.supply},${TYPED.hp},${TYPED.volts},${TYPED.fla}\r\n`;
  const { rows, ok } = await previewImport(Buffer.from(csv), 'motors.csv');
  expect(ok).toBe(true);
  return selector.selectLoad(rows[0]!.answers!, supply480);
}

function viaCli(): Promise<LoadSelection> {
  const dir = mkdtempSync(path.join(tmpdir(), 'pw-defaults-'));
  const file = path.join(dir, 'one.json');
  writeFileSync(file, JSON.stringify({ supply: supply480, loads: [TYPED] }));
  return new Promise((resolve, reject) => {
    execFile('npx', ['tsx', 'server/cli/select.ts', file], { cwd: root, timeout: 60_000 }, (err, stdout) => {
      if (err) reject(new Error(`select exited ${err.code}: ${stdout}`));
      else resolve(JSON.parse(stdout).results[0]);
    });
  });
}

describe('one default for an unknown service factor', () => {
  it('the wizard starts with no service factor, environment or other assumed answer', () => {
    const start = newMotorAnswers() as Record<string, unknown>;
    for (const key of ASSUMED_WHEN_NOT_GIVEN) expect(start[key], key).toBeUndefined();
    // nor an answer the schema requires and nobody gave (the import refuses a row without them)
    for (const key of ['supply', 'volts', 'hp', 'kw']) expect(start[key], key).toBeUndefined();
    // the rest is the schema's own defaults, nothing of the wizard's own
    expect(start).toEqual({ tag: '', ...loadDefaults() });
    expect(loadDefaults()).toMatchObject({
      hz: 60,
      duty: 'continuous',
      speedControl: 'fixed',
      scpdType: 'inverse-time-breaker',
      conductor: { material: 'cu', tempRatingC: 75 },
    });
  });

  it('wizard, import and CLI: overload limit 115 % of FLA with service factor 1.0 assumed', async () => {
    const [wizard, imported, cli] = await Promise.all([viaWizard(), viaImport(), viaCli()]);
    for (const [how, s] of [
      ['wizard', wizard],
      ['import', imported],
      ['cli', cli],
    ] as const) {
      // NEC 2023 430.32(A)(1): service factor below 1.15 and no marked rise of 40 °C or less: 115 % of FLA
      expect(s.overload.maxPercent, how).toBe(115);
      expect(s.overload.maxSettingAmps, how).toBeCloseTo(31 * 1.15, 2); // 35.65 A
      expect(
        s.assumed.map((a) => a.field),
        how,
      ).toContain('serviceFactor');
      expect(
        s.assumed.map((a) => a.field),
        how,
      ).toContain('environment');
    }
    expect(wizard.overload).toEqual(imported.overload);
    expect(cli.overload).toEqual(imported.overload);
    expect(wizard.assumed).toEqual(imported.assumed);
    expect(cli.assumed).toEqual(imported.assumed);
    expect(wizard.enclosure).toEqual(imported.enclosure);
  }, 60_000);

  it('a given service factor of 1.15 lifts the limit to 125 % the same way in all three', async () => {
    const values = { ...newMotorAnswers(), ...TYPED, serviceFactor: 1.15 };
    const r = await motorResolver(values, undefined, { fields: {}, shouldUseNativeValidation: false } as never);
    const s = await selector.selectLoad(cleanAnswers(r.values as Record<string, unknown>) as never, supply480);
    expect(s.overload.maxPercent).toBe(125); // NEC 2023 430.32(A)(1): service factor 1.15 or more
    expect(s.assumed.map((a) => a.field)).not.toContain('serviceFactor');
  });
});
