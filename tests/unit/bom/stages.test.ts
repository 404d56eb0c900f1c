// The bill of materials' stages on their own: the control scheme and the enclosure need, from the
// common-practice tables of shared/standards (listed in catalog/README.md).
import { describe, expect, it } from 'vitest';
import { contactorCount, controlFuseAmps, controlPoints, pilotScheme } from '../../../shared/calc/bom-stages/control-scheme';
import { enclosureNeed } from '../../../shared/calc/bom-stages/enclosure';
import { CONTACTOR_AREA_BY_AMPS, stepValue } from '../../../shared/standards/panel-layout';

describe('control scheme (common practice, catalog/README.md)', () => {
  it('door devices per starter type', () => {
    expect(pilotScheme('FVNR')).toEqual([
      ['start', 1],
      ['stop', 1],
      ['run-light', 1],
    ]);
    expect(pilotScheme('FVR')).toEqual([
      ['forward', 1],
      ['reverse', 1],
      ['stop', 1],
      ['run-light', 2],
    ]);
    expect(pilotScheme('VFD')).toEqual([
      ['hand-off-auto', 1],
      ['run-light', 1],
      ['fault-light', 1],
    ]);
  });
  it('control points 4 / 6 / 8 and contactors per starter type', () => {
    expect([controlPoints('FVNR'), controlPoints('two-speed'), controlPoints('dc-drive')]).toEqual([4, 6, 8]);
    expect([contactorCount('FVNR'), contactorCount('part-winding'), contactorCount('wye-delta'), contactorCount('VFD')]).toEqual([
      1, 2, 3, 0,
    ]);
  });
  it('control fuse: 250 % of the sealed current, at least 2 A', () => {
    expect(controlFuseAmps(120, 120)).toBe(2.5); // 2.5 × 120 VA / 120 V
    expect(controlFuseAmps(30, 120)).toBe(2); // 0.63 A, raised to the 2 A minimum
    expect(controlFuseAmps(100, 24)).toBeCloseTo(10.42, 2); // 2.5 × 100 / 24 = 10.4167
  });
});

describe('enclosure need (common practice estimate, catalog/README.md)', () => {
  it('a step table takes the first row whose limit the value does not exceed', () => {
    expect(stepValue(CONTACTOR_AREA_BY_AMPS, 32)).toBe(90 * 250);
    expect(stepValue(CONTACTOR_AREA_BY_AMPS, 32.01)).toBe(110 * 300);
    expect(stepValue(CONTACTOR_AREA_BY_AMPS, 5000)).toBe(400 * 800);
  });
  it('(devices + panel items + 12 × 80 mm per terminal) × 1.6; a main above 400 A wants 400 mm of depth', () => {
    const tally = { sealedVa: 0, largestInrushVa: 0, footprintMm2: 100_000, terminalCount: 10, minDepthMm: 250 };
    // (100 000 + 120 000 for a ≤ 100 A main + 10 × 960) × 1.6 = 367 360 mm²
    expect(enclosureNeed(tally, 100)).toEqual({ requiredAreaMm2: 367_360, minDepthMm: 250 });
    // > 400 A: 0.45 m² of panel items and at least 400 mm deep
    expect(enclosureNeed(tally, 800)).toEqual({ requiredAreaMm2: Math.round((100_000 + 450_000 + 9_600) * 1.6), minDepthMm: 400 });
    expect(enclosureNeed(tally, 0).requiredAreaMm2).toBe(Math.round((100_000 + 9_600) * 1.6));
  });
});
