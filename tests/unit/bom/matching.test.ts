// Catalogue matching at the rating boundaries, category by category.
// Expected codes come from the seed catalogue (catalog/*.json, invented demo data) and the rule
// "smallest adequate active item meeting every required rating"; standard values are cited where they appear.
import { describe, expect, it } from 'vitest';
import { indexCatalogue, selectItem, describeRequirement, type Requirement } from '../../../shared/calc/bom';
import { seedCatalogue } from './fixtures';

const index = indexCatalogue(seedCatalogue());

const cases: Array<[string, Requirement, string | null]> = [
  // Contactors: NEMA size at the coil voltage; rated 600 V
  ['NEMA size 1, 120 V coil, 480 V', { category: 'contactor', nemaSize: '1', coilVolts: 120, volts: 480 }, 'PW-CN-N1-120'],
  ['NEMA size 1, 24 V coil', { category: 'contactor', nemaSize: '1', coilVolts: 24, volts: 480 }, 'PW-CN-N1-24'],
  ['NEMA size 5 at exactly the 600 V rating', { category: 'contactor', nemaSize: '5', coilVolts: 120, volts: 600 }, 'PW-CN-N5-120'],
  ['just over the 600 V rating', { category: 'contactor', nemaSize: '5', coilVolts: 120, volts: 601 }, null],
  ['NEMA size 6 is not catalogued', { category: 'contactor', nemaSize: '6', coilVolts: 120, volts: 480 }, null],
  ['IEC AC-3 exactly 9 A', { category: 'contactor', minIecAc3Amps: 9, coilVolts: 120, volts: 480 }, 'PW-CI-009-120'],
  ['IEC AC-3 just over 9 A', { category: 'contactor', minIecAc3Amps: 9.01, coilVolts: 120, volts: 480 }, 'PW-CI-012-120'],
  ['IEC AC-4 exactly 4 A', { category: 'contactor', minIecAc4Amps: 4, coilVolts: 120, volts: 480 }, 'PW-CI-009-120'],
  ['IEC AC-4 just over 4 A', { category: 'contactor', minIecAc4Amps: 4.1, coilVolts: 120, volts: 480 }, 'PW-CI-012-120'],
  ['IEC AC-3 above the largest (300 A)', { category: 'contactor', minIecAc3Amps: 300.5, coilVolts: 120, volts: 480 }, null],
  // Mechanical interlocks and auxiliary contacts
  ['interlock NEMA size 3', { category: 'mechanical-interlock', kind: 'nema', nemaSize: '3' }, 'PW-MI-N3'],
  ['interlock IEC exactly 32 A', { category: 'mechanical-interlock', kind: 'iec', minAmps: 32 }, 'PW-MI-I032'],
  ['interlock IEC just over 32 A', { category: 'mechanical-interlock', kind: 'iec', minAmps: 33 }, 'PW-MI-I095'],
  ['aux 1NO1NC', { category: 'aux-contact', contacts: '1NO1NC' }, 'PW-AX-1NO1NC'],
  ['aux 3NO not catalogued', { category: 'aux-contact', contacts: '3NO' }, null],
  // Overload relays: range holds the setting; trip class; thermal before electronic
  ['setting exactly at the top of 12–18 A, class 20', { category: 'overload-relay', settingAmps: 18, tripClass: 20 }, 'PW-OT-18A-C20'],
  ['setting just over 18 A, class 20', { category: 'overload-relay', settingAmps: 18.01, tripClass: 20 }, 'PW-OT-25A-C20'],
  ['setting exactly at the bottom of 9–13 A, class 10', { category: 'overload-relay', settingAmps: 9, tripClass: 10 }, 'PW-OT-10A-C10'],
  ['class 30 only electronic', { category: 'overload-relay', settingAmps: 18, tripClass: 30 }, 'PW-OE-25A'],
  [
    'phase-loss detection → electronic',
    { category: 'overload-relay', settingAmps: 13, tripClass: 10, detectsPhaseLoss: true },
    'PW-OE-15A',
  ],
  ['above every thermal range (150 A) → electronic', { category: 'overload-relay', settingAmps: 150.5, tripClass: 20 }, 'PW-OE-200A'],
  ['exactly 600 A', { category: 'overload-relay', settingAmps: 600, tripClass: 10 }, 'PW-OE-600A'],
  ['just over 600 A', { category: 'overload-relay', settingAmps: 600.1, tripClass: 10 }, null],
  // Inverse-time breakers: the decided standard rating exactly (NEC 2023 240.6(A) ratings 15–800 A)
  ['35 A 3-pole at 480 V', { category: 'inverse-time-breaker', exactAmps: 35, poles: 3, volts: 480 }, 'PW-BR-3P-035'],
  ['36 A is not a standard rating', { category: 'inverse-time-breaker', exactAmps: 36, poles: 3, volts: 480 }, null],
  ['800 A 3-pole', { category: 'inverse-time-breaker', exactAmps: 800, poles: 3, volts: 480 }, 'PW-BR-3P-800'],
  ['2-pole at exactly its 480 V rating', { category: 'inverse-time-breaker', exactAmps: 20, poles: 2, volts: 480 }, 'PW-BR-2P-020'],
  ['2-pole just over 480 V', { category: 'inverse-time-breaker', exactAmps: 20, poles: 2, volts: 481 }, null],
  // Motor circuit protectors: continuous ≥ minimum, instantaneous trip settable at or below the maximum
  [
    'MCP exactly 15 A continuous',
    { category: 'motor-circuit-protector', minAmps: 15, maxTripSettingAmps: 112, minPoles: 3, volts: 480 },
    'PW-MC-3P-015',
  ],
  [
    'MCP just over 15 A continuous',
    { category: 'motor-circuit-protector', minAmps: 15.01, maxTripSettingAmps: 112, minPoles: 3, volts: 480 },
    'PW-MC-3P-030',
  ],
  [
    'MCP trip limit exactly the 30 A frame minimum (90 A)',
    { category: 'motor-circuit-protector', minAmps: 16.1, maxTripSettingAmps: 90, minPoles: 3, volts: 480 },
    'PW-MC-3P-030',
  ],
  [
    'MCP trip limit below every frame that carries the current',
    { category: 'motor-circuit-protector', minAmps: 16.1, maxTripSettingAmps: 89, minPoles: 3, volts: 480 },
    null,
  ],
  // Fuses, holders, fused and non-fused disconnects
  ['class J time-delay 30 A', { category: 'fuse', exactAmps: 30, fuseClass: 'J', timeDelay: true, volts: 480 }, 'PW-FU-J-TD-030'],
  ['class J fast-acting 30 A', { category: 'fuse', exactAmps: 30, fuseClass: 'J', timeDelay: false, volts: 480 }, 'PW-FU-J-FA-030'],
  ['class RK5 is dual-element only', { category: 'fuse', exactAmps: 30, fuseClass: 'RK5', timeDelay: false, volts: 480 }, null],
  ['class CC time-delay exactly 2 A', { category: 'fuse', minAmps: 2, fuseClass: 'CC', timeDelay: true, volts: 120 }, 'PW-FU-CC-TD-2A'],
  [
    'class CC time-delay just over 2 A',
    { category: 'fuse', minAmps: 2.01, fuseClass: 'CC', timeDelay: true, volts: 120 },
    'PW-FU-CC-TD-2A5',
  ],
  ['class CC above 30 A', { category: 'fuse', minAmps: 30.1, fuseClass: 'CC', timeDelay: true, volts: 120 }, null],
  ['J holder 3-pole exactly 30 A', { category: 'fuse-holder', minAmps: 30, fuseClass: 'J', poles: 3, volts: 480 }, 'PW-FH-J-3P-030'],
  ['J holder 3-pole just over 30 A', { category: 'fuse-holder', minAmps: 30.5, fuseClass: 'J', poles: 3, volts: 480 }, 'PW-FH-J-3P-060'],
  ['J holder 3-pole just over 100 A', { category: 'fuse-holder', minAmps: 101, fuseClass: 'J', poles: 3, volts: 480 }, 'PW-FH-J-3P-200'],
  ['J holder 2-pole over 100 A is not catalogued', { category: 'fuse-holder', minAmps: 101, fuseClass: 'J', poles: 2, volts: 480 }, null],
  ['J holder over 600 A', { category: 'fuse-holder', minAmps: 601, fuseClass: 'J', poles: 3, volts: 480 }, null],
  [
    'fused disconnect exactly 40 hp at 460 V',
    { category: 'fused-disconnect', minAmps: 60, fuseClass: 'J', minPoles: 3, volts: 480, minHp: { volts: '460', hp: 40 } },
    'PW-FD-J-060',
  ],
  [
    'fused disconnect just over 40 hp',
    { category: 'fused-disconnect', minAmps: 60, fuseClass: 'J', minPoles: 3, volts: 480, minHp: { volts: '460', hp: 40.5 } },
    'PW-FD-J-100',
  ],
  [
    'non-fused exactly 7.5 hp at 460 V',
    { category: 'disconnect-switch', minPoles: 3, volts: 480, minHp: { volts: '460', hp: 7.5 } },
    'PW-NF-3P-016',
  ],
  [
    'non-fused 7.5 hp needing 16.1 A',
    { category: 'disconnect-switch', minAmps: 16.1, minPoles: 3, volts: 480, minHp: { volts: '460', hp: 7.5 } },
    'PW-NF-3P-025',
  ],
  // Manual motor protectors
  ['MMP setting exactly 2.5 A', { category: 'manual-motor-protector', settingAmps: 2.5, volts: 480 }, 'PW-MP-2A5'],
  ['MMP setting just over 2.5 A', { category: 'manual-motor-protector', settingAmps: 2.51, volts: 480 }, 'PW-MP-4A'],
  ['MMP above 32 A', { category: 'manual-motor-protector', settingAmps: 32.5, volts: 480 }, null],
  // Soft starters
  ['soft starter exactly 17 A with bypass', { category: 'soft-starter', minAmps: 17, volts: 480, internalBypass: true }, 'PW-SS-B-017'],
  ['soft starter just over 17 A with bypass', { category: 'soft-starter', minAmps: 17.1, volts: 480, internalBypass: true }, 'PW-SS-B-022'],
  ['soft starter 17 A, bypass not needed → cheaper', { category: 'soft-starter', minAmps: 17, volts: 480 }, 'PW-SS-N-017'],
  ['soft starter above 480 A', { category: 'soft-starter', minAmps: 481, volts: 480 }, null],
  // VFDs: current at the duty covers the need; voltage within the drive's range
  ['VFD normal duty exactly 14 A at 480 V', { category: 'vfd', minNormalDutyAmps: 14, volts: 480 }, 'PW-VF-4-14A'],
  ['VFD normal duty just over 14 A', { category: 'vfd', minNormalDutyAmps: 14.1, volts: 480 }, 'PW-VF-4-21A'],
  ['VFD heavy duty exactly 14 A', { category: 'vfd', minHeavyDutyAmps: 14, volts: 480 }, 'PW-VF-4-21A'],
  ['VFD 208 V class', { category: 'vfd', minNormalDutyAmps: 15.2, volts: 208 }, 'PW-VF-2-15A2'],
  ['VFD 600 V class', { category: 'vfd', minNormalDutyAmps: 2.7, volts: 600 }, 'PW-VF-6-2A7'],
  ['VFD at exactly the 380 V bottom of the range', { category: 'vfd', minNormalDutyAmps: 2, volts: 380 }, 'PW-VF-4-2A1'],
  ['VFD at 379 V (between ranges)', { category: 'vfd', minNormalDutyAmps: 2, volts: 379 }, null],
  // Phase-monitoring relays
  [
    'loss + reversal at 480 V',
    { category: 'phase-monitor-relay', volts: 480, detectsPhaseLoss: true, detectsPhaseReversal: true },
    'PW-PM-LR-480',
  ],
  [
    'loss + reversal + imbalance',
    { category: 'phase-monitor-relay', volts: 480, detectsPhaseLoss: true, detectsPhaseReversal: true, detectsImbalance: true },
    'PW-PM-LRI-480',
  ],
  ['reversal at 575 V', { category: 'phase-monitor-relay', volts: 575, detectsPhaseReversal: true }, 'PW-PM-LR-600'],
  ['490 V falls between the ranges', { category: 'phase-monitor-relay', volts: 490, detectsPhaseLoss: true }, null],
  // Control power transformers (standard VA sizes)
  [
    'CPT 100 VA, inrush exactly 370 VA',
    { category: 'control-transformer', minVa: 100, minInrushVa: 370, secondaryVolts: 120, volts: 480 },
    'PW-CT-0100-120',
  ],
  [
    'CPT inrush just over 370 VA',
    { category: 'control-transformer', minVa: 100, minInrushVa: 371, secondaryVolts: 120, volts: 480 },
    'PW-CT-0150-120',
  ],
  ['CPT exactly 5000 VA', { category: 'control-transformer', minVa: 5000, secondaryVolts: 120, volts: 480 }, 'PW-CT-5000-120'],
  ['CPT over 5000 VA', { category: 'control-transformer', minVa: 5001, secondaryVolts: 120, volts: 480 }, null],
  ['CPT 24 V above 500 VA', { category: 'control-transformer', minVa: 501, secondaryVolts: 24, volts: 480 }, null],
  // Power transformers for motors at another voltage (standard kVA ratings) and DC supplies
  [
    'transformer 7.5 kVA 480-240/120 V single-phase',
    { category: 'power-transformer', kind: 'single-phase', minVa: 7500, secondaryVolts: 240, volts: 480 },
    'PW-XF-1-7A5K-240',
  ],
  [
    'transformer just over 7.5 kVA',
    { category: 'power-transformer', kind: 'single-phase', minVa: 7501, secondaryVolts: 240, volts: 480 },
    'PW-XF-1-10K-240',
  ],
  [
    'transformer 15 kVA 480-208Y/120 V three-phase',
    { category: 'power-transformer', kind: 'three-phase', minVa: 13871, secondaryVolts: 208, volts: 480 },
    'PW-XF-3-15K-208Y',
  ],
  [
    'transformer with a 600 V primary',
    { category: 'power-transformer', kind: 'three-phase', minVa: 9000, secondaryVolts: 208, volts: 600 },
    null,
  ],
  ['DC supply 25 A at 240 V', { category: 'dc-power-supply', minAmps: 25, secondaryVolts: 240, volts: 480 }, 'PW-DS-240-025'],
  ['DC supply above 100 A', { category: 'dc-power-supply', minAmps: 101, secondaryVolts: 240, volts: 480 }, null],
  // Terminal blocks
  ['10 AWG at exactly 30 A', { category: 'terminal-block', kind: 'feed-through', wireSize: '10', minAmps: 30 }, 'PW-TB-10-FT'],
  ['10 AWG needing just over 30 A', { category: 'terminal-block', kind: 'feed-through', wireSize: '10', minAmps: 30.5 }, 'PW-TB-8-FT'],
  ['350 kcmil', { category: 'terminal-block', kind: 'feed-through', wireSize: '350' }, 'PW-TB-350K-FT'],
  ['500 kcmil exceeds every block', { category: 'terminal-block', kind: 'feed-through', wireSize: '500' }, null],
  ['ground 14 AWG', { category: 'terminal-block', kind: 'ground', wireSize: '14' }, 'PW-TB-12-GR'],
  // Pilot devices
  ['hand-off-auto selector', { category: 'pilot-device', kind: 'selector-switch', function: 'hand-off-auto' }, 'PW-SW-HOA'],
  ['run light 24 V', { category: 'pilot-device', kind: 'pilot-light', function: 'run-light', exactVolts: 24 }, 'PW-PL-RUN-24'],
  ['run light 48 V not catalogued', { category: 'pilot-device', kind: 'pilot-light', function: 'run-light', exactVolts: 48 }, null],
  // Wire
  ['power wire 1/0', { category: 'wire', kind: 'power', wireSize: '1/0' }, 'PW-WR-0-BK'],
  ['power wire 600 kcmil not catalogued', { category: 'wire', kind: 'power', wireSize: '600' }, null],
  // Enclosures: usable back panel (H − 150)(W − 100)
  [
    'Type 12, exactly the usable area of 600 × 400',
    { category: 'enclosure', nemaType: '12', minUsableAreaMm2: 450 * 300 },
    'PW-EN-12-60X40X20',
  ],
  ['Type 12, just over it', { category: 'enclosure', nemaType: '12', minUsableAreaMm2: 450 * 300 + 1 }, 'PW-EN-12-60X60X25'],
  ['Type 12, 250 mm deep', { category: 'enclosure', nemaType: '12', minDepthMm: 250 }, 'PW-EN-12-60X60X25'],
  ['Type 7', { category: 'enclosure', nemaType: '7' }, 'PW-EN-7-30X25X20'],
  ['Type 3R free-standing size not catalogued', { category: 'enclosure', nemaType: '3R', minDepthMm: 400 }, null],
  // Cooling
  ['filter fan exactly 100 cfm keeping Type 12', { category: 'cooling', kind: 'filter-fan', minCfm: 100, nemaType: '12' }, 'PW-FF-100-12'],
  ['filter fan keeping Type 4', { category: 'cooling', kind: 'filter-fan', minCfm: 100, nemaType: '4' }, 'PW-FF-100-4'],
  ['no filter fan keeps Type 4X', { category: 'cooling', kind: 'filter-fan', minCfm: 20, nemaType: '4X' }, null],
  [
    'air conditioner exactly 500 W, Type 4X',
    { category: 'cooling', kind: 'air-conditioner', minCoolingW: 500, nemaType: '4X' },
    'PW-AC-0500-4X',
  ],
  ['air conditioner just over 500 W', { category: 'cooling', kind: 'air-conditioner', minCoolingW: 501, nemaType: '12' }, 'PW-AC-0800-12'],
  // Main breakers (largest not above the feeder maximum) and main disconnects
  [
    'main breaker at exactly 70 A maximum',
    { category: 'main-breaker', maxAmps: 70, poles: 3, volts: 480, prefer: 'largest' },
    'PW-MB-3P-070',
  ],
  [
    'main breaker just under 70 A maximum',
    { category: 'main-breaker', maxAmps: 69.9, poles: 3, volts: 480, prefer: 'largest' },
    'PW-MB-3P-060',
  ],
  ['main breaker below the smallest', { category: 'main-breaker', maxAmps: 29, poles: 3, volts: 480, prefer: 'largest' }, null],
  ['main disconnect exactly 100 A', { category: 'main-disconnect', minAmps: 100, fuseClass: 'J', poles: 3, volts: 480 }, 'PW-MD-J-3P-100'],
  [
    'main disconnect just over 100 A',
    { category: 'main-disconnect', minAmps: 101, fuseClass: 'J', poles: 3, volts: 480 },
    'PW-MD-J-3P-200',
  ],
  // Distribution blocks, filters, braking resistors, DC equipment
  ['distribution block exactly 115 A', { category: 'power-distribution-block', minAmps: 115, poles: 3, volts: 480 }, 'PW-PD-3P-115-06'],
  ['distribution block just over 115 A', { category: 'power-distribution-block', minAmps: 116, poles: 3, volts: 480 }, 'PW-PD-3P-175-06'],
  ['dV/dt filter exactly 18 A', { category: 'output-filter', kind: 'dv-dt', minAmps: 18, volts: 480 }, 'PW-OF-DV-018'],
  ['sine-wave filter just over 18 A', { category: 'output-filter', kind: 'sine-wave', minAmps: 18.5, volts: 480 }, 'PW-OF-SW-025'],
  [
    'braking resistor exactly 10 hp at 240 V',
    { category: 'braking-resistor', minHp: { volts: '240', hp: 10 }, volts: 240 },
    'PW-DB-240-010',
  ],
  ['braking resistor just over 10 hp', { category: 'braking-resistor', minHp: { volts: '240', hp: 10.5 }, volts: 240 }, 'PW-DB-240-020'],
  ['DC drive 10 hp at 240 V', { category: 'dc-drive', minAmps: 38, minHp: { volts: '240', hp: 10 }, volts: 240 }, 'PW-DD-040'],
  ['DC drive just over 10 hp at 240 V', { category: 'dc-drive', minAmps: 38, minHp: { volts: '240', hp: 10.1 }, volts: 240 }, 'PW-DD-060'],
  ['DC starter exactly 40 A', { category: 'dc-starter', minAmps: 40, volts: 240, builtInOverload: true }, 'PW-DA-040'],
  ['DC starter over 250 A', { category: 'dc-starter', minAmps: 250.1, volts: 240, builtInOverload: true }, null],
  ['field-loss relay 240 V system', { category: 'field-loss-relay', volts: 240 }, 'PW-FL-300'],
  ['field-loss relay 500 V system', { category: 'field-loss-relay', volts: 500 }, 'PW-FL-600'],
  ['field-loss relay above 600 V', { category: 'field-loss-relay', volts: 601 }, null],
];

describe('selectItem — smallest adequate active item', () => {
  it.each(cases)('%s', (_name, req, expected) => {
    expect(selectItem(index, req)?.code ?? null).toBe(expected);
  });

  it('covers every catalogue category with at least one matched case', () => {
    const matched = new Set(cases.filter((c) => c[2] !== null).map((c) => c[1].category));
    const all = new Set(seedCatalogue().map((i) => i.category));
    expect([...all].filter((c) => !matched.has(c))).toEqual([]);
  });
});

describe('inactive items', () => {
  const req: Requirement = { category: 'contactor', nemaSize: '1', coilVolts: 120, volts: 480 };
  it('are skipped even when cheaper', () => {
    const old = seedCatalogue().find((i) => i.code === 'PW-CN-N1-120-OLD')!;
    expect(old.active).toBe(false);
    expect(old.unitCost).toBeLessThan(seedCatalogue().find((i) => i.code === 'PW-CN-N1-120')!.unitCost);
    expect(selectItem(index, req)?.code).toBe('PW-CN-N1-120');
  });
  it('are chosen once reactivated (the skip is the active flag, not ordering)', () => {
    const reactivated = seedCatalogue().map((i) => (i.code === 'PW-CN-N1-120-OLD' ? { ...i, active: true } : i));
    expect(selectItem(indexCatalogue(reactivated), req)?.code).toBe('PW-CN-N1-120-OLD');
  });
  it('leave nothing to match when every item of the category is inactive', () => {
    const none = seedCatalogue().map((i) => (i.category === 'vfd' ? { ...i, active: false } : i));
    expect(selectItem(indexCatalogue(none), { category: 'vfd', minNormalDutyAmps: 1, volts: 480 })).toBeNull();
  });
});

describe('describeRequirement', () => {
  it('states the ratings an unmatched item needs', () => {
    expect(describeRequirement({ category: 'contactor', nemaSize: '7', coilVolts: 120, volts: 480 })).toBe(
      'Contactors: NEMA size 7; coil 120 V; rated for 480 V',
    );
    expect(describeRequirement({ category: 'overload-relay', settingAmps: 13.2, tripClass: 20 })).toBe(
      'Overload relays: setting range holding 13.2 A; trip class 20',
    );
  });
});
