// The bill of materials of three motors on one drive, from the engine's selections and roll-up and the seed catalogue.
// FLC from NEC 2023 Table 430.250 at 460 V: 10 hp 14 A, 7.5 hp 11 A, 5 hp 7.6 A; sum 32.6 A.
import { describe, expect, it } from 'vitest';
import { buildBom } from '../../../shared/calc/bom';
import type { BomLine } from '../../../shared/schemas/catalogue';
import { motor, selector, supply480 } from '../engine/selector-setup';
import { seedCatalogue, seedLabourUnits, SUPPLY_480 } from './fixtures';

const onDrive = (tag: string, hp: number) => motor({ tag, hp, speedControl: 'variable', sharedDrive: 'VFD-1' });

async function bomOf(loads: ReturnType<typeof motor>[]) {
  const out = await selector.selectPanel({ supply: supply480, loads });
  return buildBom({
    panelName: 'MCC-1',
    selections: out.results,
    panel: out.panel,
    supply: SUPPLY_480,
    enclosureType: '12',
    catalogue: seedCatalogue(),
    labourUnits: seedLabourUnits(),
  });
}
const req = (l: BomLine | undefined) => l?.requirement?.[0];
const of = (lines: BomLine[], bucket: string, category: string) => lines.filter((l) => l.bucket === bucket && l.category === category);

describe('three motors on one drive (VFD-1)', async () => {
  const { lines } = await bomOf([onDrive('P-1', 10), onDrive('P-2', 7.5), onDrive('P-3', 5)]);

  it('one drive for the group, sized for the sum of the FLA (32.6 A; common practice), not one per motor', () => {
    const drives = lines.filter((l) => l.category === 'vfd');
    expect(drives).toHaveLength(1);
    expect(drives[0]?.bucket).toBe('VFD-1');
    expect(req(drives[0])).toMatchObject({ minHeavyDutyAmps: 32.6, volts: 460 }); // heavy duty: constant torque taken when not given
  });

  it('one input device for the drive: 250 % × 32.6 = 81.5 A -> 90 A (NEC 2023 430.130(A)(1), Table 430.52, 430.52(C)(1) Exc. 1)', () => {
    const devices = lines.filter((l) => l.category === 'inverse-time-breaker');
    expect(devices.map((l) => [l.bucket, req(l)])).toEqual([
      ['VFD-1', { category: 'inverse-time-breaker', exactAmps: 90, poles: 3, volts: 460 }],
    ]);
    // input wire 8 AWG (1.25 × 32.6 = 40.75 A, NEC 2023 430.122(A), Table 310.16 Cu 75 °C)
    expect(req(of(lines, 'VFD-1', 'wire')[0])).toMatchObject({ wireSize: '8' });
  });

  it.each([
    // tag, contactor AC-3 at FLA (common practice), overload set at FLA (NEC 2023 430.32(A)(1)), motor wire 14 AWG (430.22)
    ['P-1', 14],
    ['P-2', 11],
    ['P-3', 7.6],
  ])('%s has its own output contactor, interlock contact and overload relay (%s A)', (tag, fla) => {
    expect(of(lines, tag, 'contactor').map(req)).toEqual([{ category: 'contactor', minIecAc3Amps: fla, coilVolts: 120, volts: 460 }]);
    expect(of(lines, tag, 'aux-contact')).toHaveLength(1);
    expect(of(lines, tag, 'overload-relay').map(req)).toEqual([expect.objectContaining({ category: 'overload-relay', settingAmps: fla })]);
    expect(req(of(lines, tag, 'wire').find((l) => req(l)?.kind === 'power'))).toMatchObject({ wireSize: '14' });
    expect(of(lines, tag, 'vfd')).toEqual([]);
    expect(of(lines, tag, 'inverse-time-breaker')).toEqual([]);
  });
});

describe('the same motors without a shared drive', async () => {
  const { lines } = await bomOf([1, 2, 3].map((n) => motor({ tag: `P-${n}`, hp: [10, 7.5, 5][n - 1], speedControl: 'variable' })));
  it("three drives and three breakers; the drives' own overloads serve (no overload relays)", () => {
    expect(lines.filter((l) => l.category === 'vfd')).toHaveLength(3);
    expect(lines.filter((l) => l.category === 'inverse-time-breaker')).toHaveLength(3);
    expect(lines.filter((l) => l.category === 'overload-relay')).toHaveLength(0);
  });
});
