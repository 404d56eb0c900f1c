import { describe, expect, it } from 'vitest';
import { panelNameplate, SHOP_NAME_PLACEHOLDER } from '../../../shared/calc/nameplate';
import { rollup } from './fixtures';

describe('panel nameplate (NEC 2023 409.110) and feeder (409.20, 409.21)', () => {
  it('sums the full-load currents and marks the SCCR and enclosure', () => {
    // FLC 14 + 34 + 27 A (NEC Table 430.250 at 460 V) + 4 A control and lighting = 79 A
    const n = panelNameplate({
      rollup,
      supply: { volts: 480, phases: 3, hz: 60 },
      otherLoadsAmps: 4,
      sccrKa: 22,
      enclosureType: '12',
      shopName: 'Cedar Flats Panel Works',
    });
    expect(n.fullLoadAmps).toBe(79);
    const v = Object.fromEntries(n.lines.map((l) => [l.label, l.value]));
    expect(v['Full-load current']).toBe('79 A');
    expect(v['Short-circuit current rating']).toBe('22 kA rms symmetrical, 480 V');
    expect(v['Enclosure type']).toBe('Type 12');
    expect(v.Phases).toBe('3 phase');
    expect(v.Frequency).toBe('60 Hz');
    expect(n.label[0]).toBe('INDUSTRIAL CONTROL PANEL');
    expect(n.warnings).toEqual([]);
    // main disconnect 430.110(C)(1): 115 % × 79 A = 90.85 A; supply fuses up to 125 A (430.62(A)) -> 200 A switch
    expect(n.feeder.mainDisconnect.minAmps).toBeCloseTo(90.85, 2);
    expect(n.feeder.mainDisconnect.sizeAmps).toBe(200);
    expect(n.feeder.supplyProtection.maxAmps).toBe(125);
    expect(n.feeder.conductor.minAmpacity).toBeCloseTo(83.5, 6);
  });
  it('placeholder shop name and a missing SCCR are flagged', () => {
    const n = panelNameplate({ rollup, supply: { volts: 480, phases: 3, hz: 60 }, sccrKa: null, enclosureType: '4X' });
    expect(n.lines[0].value).toBe(SHOP_NAME_PLACEHOLDER);
    expect(n.warnings).toHaveLength(2);
    expect(n.label).toContain('Short-circuit current rating: NOT ESTABLISHED');
  });
});
