// The bill of materials' stages on their own: the control scheme and the enclosure depth, from the
// common-practice tables of shared/standards (listed in catalog/README.md).
import { describe, expect, it } from 'vitest';
import { contactorCount, controlFuseAmps, controlPoints, pilotScheme } from '../../../shared/calc/bom-stages/control-scheme';
import { depthByKindMm } from '../../../shared/calc/bom-stages/enclosure';
import { ENCLOSURE_DEPTH, stepValue } from '../../../shared/standards/panel-layout';

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

describe('enclosure depth by the kind of devices (common practice estimate, catalog/README.md)', () => {
  it('a step table takes the first row whose limit the value does not exceed', () => {
    expect(stepValue(ENCLOSURE_DEPTH.electronicByAmps, 30)).toBe(250);
    expect(stepValue(ENCLOSURE_DEPTH.electronicByAmps, 30.01)).toBe(300);
    expect(stepValue(ENCLOSURE_DEPTH.electronicByAmps, 5000)).toBe(400);
  });
  it('a main above 400 A wants 400 mm of depth; else the devices decide', () => {
    const tally = { sealedVa: 0, largestInrushVa: 0, minDepthMm: 250 };
    expect(depthByKindMm(tally, 100)).toBe(250);
    expect(depthByKindMm(tally, 400)).toBe(250);
    expect(depthByKindMm(tally, 800)).toBe(400);
  });
});
