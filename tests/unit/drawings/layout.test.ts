// The backplate layout: a worked example checked by hand (known parts → known rows, positions and enclosure),
// the enclosure choice it makes in the bill of materials, and the parts it cannot place. Spacing is the
// common practice of BACKPLATE (shared/standards/panel-layout.ts): 40 mm duct on a plate up to 500 mm wide,
// 60 mm above; 25 mm from duct to part; 10 mm between parts; parts centred on the rail.
import { describe, expect, it } from 'vitest';
import { chooseEnclosure } from '../../../shared/calc/bom-stages/enclosure';
import type { BomContext } from '../../../shared/calc/bom-stages/context';
import { LineBuilder } from '../../../shared/calc/bom-stages/lines';
import { indexCatalogue } from '../../../shared/calc/bom-stages/match';
import { backplateLayout } from '../../../shared/calc/layout/backplate';
import { partRects, placeUnits } from '../../../shared/calc/layout/layout-place';
import { layoutUnits } from '../../../shared/calc/layout/layout-units';
import { PANEL_BUCKET, type CatalogueItem, type CatalogueItemInput } from '../../../shared/schemas/catalogue';
import { item } from '../bom/fixtures';

const base = {
  unit: 'ea',
  sccrKa: null,
  heatLossW: 0,
  unitCost: 10,
  labourHours: 0,
  terminations: 0,
  leadTimeDays: 1,
  active: true,
} as const;
const part = (code: string, category: CatalogueItemInput['category'], ratings: CatalogueItemInput['ratings'], dims: number[]) =>
  item({
    ...base,
    code,
    description: code,
    category,
    ratings,
    outlineWidthMm: dims[0]!,
    outlineHeightMm: dims[1]!,
    outlineDepthMm: dims[2]!,
    ...(dims[3] !== undefined ? { clearanceAboveMm: dims[3], clearanceBelowMm: dims[4]! } : {}),
  });
const enclosure = (code: string, h: number, w: number, d: number) =>
  part(code, 'enclosure', { nemaType: '12', heightMm: h, widthMm: w, depthMm: d }, [w, h, d]);

// invented test parts: sizes chosen so the sums come out round, not any maker's
const MAIN = part('PW-MB-TEST', 'main-breaker', { volts: 480, amps: 100, poles: 3, kaic: 22 }, [100, 150, 90]);
const CONTACTOR = part('PW-CN-TEST', 'contactor', { volts: 600, coilVolts: 120, amps: 27, sealedVa: 10, inrushVa: 100 }, [50, 100, 100]);
const OVERLOAD = part(
  'PW-OT-TEST',
  'overload-relay',
  { kind: 'thermal', settingMinAmps: 9, settingMaxAmps: 18, tripClasses: [20] },
  [50, 80, 90],
);
const BREAKER = part('PW-BR-TEST', 'inverse-time-breaker', { volts: 480, amps: 30, poles: 3 }, [60, 90, 80]);
const DRIVE = part(
  'PW-VF-TEST',
  'vfd',
  { volts: 480, voltsMin: 380, normalDutyAmps: 20, heavyDutyAmps: 16, inputAmps: 22 },
  [150, 300, 200, 100, 100],
);
const TB = part('PW-TB-TEST', 'terminal-block', { kind: 'feed-through', amps: 20, wireMin: '18', wireMax: '12' }, [5, 50, 45]);
const INTERLOCK = part('PW-MI-TEST', 'mechanical-interlock', { kind: 'nema' }, [10, 60, 40]);
const ENC_SHORT = enclosure('PW-EN-12-100X60X30', 1000, 600, 300);
const ENC_TALL = enclosure('PW-EN-12-120X60X30', 1200, 600, 300);
const ENC_DEEP = enclosure('PW-EN-12-120X60X40', 1200, 600, 400);
const CATALOGUE = [MAIN, CONTACTOR, OVERLOAD, BREAKER, DRIVE, TB, INTERLOCK, ENC_SHORT, ENC_TALL, ENC_DEEP];

/** The example panel's lines: the main, a starter bucket M-1 and a drive bucket V-1, each with its terminals. */
function exampleLines(drive: CatalogueItem = DRIVE) {
  const lines = new LineBuilder(indexCatalogue([...CATALOGUE, drive]), new Map());
  lines.addItem(PANEL_BUCKET, MAIN, 1, []);
  lines.addItem('M-1', CONTACTOR, 1, []);
  lines.addItem('M-1', INTERLOCK, 1, []);
  lines.addItem('M-1', OVERLOAD, 1, []);
  lines.addItem('M-1', BREAKER, 1, []);
  lines.addItem('M-1', TB, 2, []);
  lines.addItem('V-1', drive, 1, []);
  lines.addItem('V-1', BREAKER, 1, []);
  lines.addItem('V-1', TB, 2, []);
  return lines;
}
const byCode = (items: CatalogueItem[]) => {
  const m = new Map(items.map((i) => [i.code, i]));
  return (code: string) => m.get(code);
};

describe('a worked example, checked by hand', () => {
  const lines = exampleLines();
  const { units, unplaced } = layoutUnits(lines.lines, byCode(CATALOGUE));
  // a 500 × 1050 mm plate (a 1200 × 600 enclosure less 150 / 100 mm): 40 mm duct, 370 mm between the side ducts (65–435)
  const p = placeUnits(units, { widthMm: 500, heightMm: 1050 });

  it('orders the main first, then bucket by bucket, terminal strips last; the overload hangs under its contactor', () => {
    expect(units.map((u) => u.tag)).toEqual(['MAIN', '1M', '1CB', '2VFD', '2CB', 'TB1:1', 'TB1:2', 'TB2:1', 'TB2:2']);
    expect(units[1]!.parts.map((x) => x.code)).toEqual(['PW-CN-TEST', 'PW-OT-TEST']);
    expect(units[1]!.heightMm).toBe(180); // 100 + 80
    expect(unplaced).toEqual([]); // the interlock kit is fitted to the contactors, not laid out
  });

  it('fills rows left to right and starts a row when the next part does not fit across', () => {
    // row 1: MAIN 65–165, 1M 175–225, 1CB 235–295; 2VFD would end at 455 > 435
    // band: 90 above and below the rail (half of the 180 mm contactor and overload); top 40 + 25 = 65, rail 155, bottom 245
    // row 2: 2VFD 65–215, 2CB 225–285; 150 + 100 mm clearance = 250 each side; top 245 + 25 + 40 + 25 = 335, rail 585, bottom 835
    // row 3, terminals: 50 mm blocks, top 835 + 90 = 925, rail 950; the last duct ends at 975 + 25 + 40 = 1040 ≤ 1050
    expect(p.rows.map((r) => [r.topMm, r.railMm, r.bottomMm])).toEqual([
      [65, 155, 245],
      [335, 585, 835],
      [925, 950, 975],
    ]);
    const at = (tag: string) => p.placed.find((x) => x.unit.tag === tag)!.rect;
    expect(at('MAIN')).toMatchObject({ x: 65, y: 80, w: 100, h: 150 });
    expect(at('1M')).toMatchObject({ x: 175, y: 65, w: 50, h: 180 });
    expect(at('1CB')).toMatchObject({ x: 235, y: 110 });
    expect(at('2VFD')).toMatchObject({ x: 65, y: 435, w: 150, h: 300 });
    expect(at('2CB')).toMatchObject({ x: 225 });
    // blocks of one strip touch; 10 mm (an end stop) between strips
    expect(['TB1:1', 'TB1:2', 'TB2:1', 'TB2:2'].map((t) => at(t).x)).toEqual([65, 70, 85, 90]);
    expect(p.usedHeightMm).toBe(1040);
    expect(p.sections).toBe(1);
    const overload = partRects(p.placed.find((x) => x.unit.tag === '1M')!)[1]!;
    expect(overload.rect).toMatchObject({ y: 165, h: 80 });
    // the drive's 100 mm above reaches exactly to the row's top, below exactly to its bottom
    expect(at('2VFD').y - 100).toBe(335);
    expect(at('2VFD').y + 300 + 100).toBe(835);
  });

  it('the bill of materials takes the smallest enclosure whose plate holds it all (1000 × 600 holds 850 mm; 1040 needed)', () => {
    const ctx = { lines, tally: { sealedVa: 0, largestInrushVa: 0, minDepthMm: 200 } } as unknown as BomContext;
    const need = chooseEnclosure(ctx, 100, '12');
    const enc = lines.lines.find((l) => l.category === 'enclosure')!;
    expect(enc.code).toBe('PW-EN-12-120X60X30');
    expect(enc.quantity).toBe(1);
    // the deepest part, the 200 mm drive, + 50 mm: 250 mm, so 300 mm deep enclosures qualify
    expect(need).toEqual({ requiredAreaMm2: 500 * 1040, minDepthMm: 250, sections: 1 });
    const layout = backplateLayout(lines.lines, byCode(CATALOGUE));
    expect(layout.enclosure?.code).toBe(enc.code);
    expect(layout.placement?.placed.map((x) => x.rect)).toEqual(p.placed.map((x) => x.rect));
  });

  it('a drive too deep for the 300 mm enclosures takes the 400 mm one', () => {
    const deep = part(
      'PW-VF-DEEP',
      'vfd',
      { volts: 480, voltsMin: 380, normalDutyAmps: 20, heavyDutyAmps: 16, inputAmps: 22 },
      [150, 300, 280, 100, 100],
    );
    const lines2 = exampleLines(deep);
    const ctx = { lines: lines2, tally: { sealedVa: 0, largestInrushVa: 0, minDepthMm: 200 } } as unknown as BomContext;
    expect(chooseEnclosure(ctx, 100, '12').minDepthMm).toBe(330);
    expect(lines2.lines.find((l) => l.category === 'enclosure')!.code).toBe('PW-EN-12-120X60X40');
  });

  it('on a plate too short for it all, the rows go on to a second section; with one section allowed the rest overflow', () => {
    // 950 mm: the drive row's duct ends at 900; the terminal row needs 140 more → section 2
    const two = placeUnits(units, { widthMm: 500, heightMm: 950 });
    expect(two.sections).toBe(2);
    expect(two.placed.filter((x) => x.rect.section === 2).map((x) => x.unit.tag)).toEqual(['TB1:1', 'TB1:2', 'TB2:1', 'TB2:2']);
    const one = placeUnits(units, { widthMm: 500, heightMm: 950 }, 1);
    expect(one.overflow.map((u) => u.tag)).toEqual(['TB1:1', 'TB1:2', 'TB2:1', 'TB2:2']);
  });

  it('names a part too large for the plate, and one without dimensions, instead of placing it', () => {
    const huge = part(
      'PW-XF-HUGE',
      'power-transformer',
      { kind: 'three-phase', volts: 480, voltsMin: 480, va: 75000, secondaryVolts: 208 },
      [600, 700, 400],
    );
    const bare = item({
      ...base,
      code: 'PW-PM-BARE',
      description: 'no size',
      category: 'phase-monitor-relay',
      ratings: { volts: 480, voltsMin: 380, va: 2 },
    });
    const lines3 = exampleLines();
    lines3.addItem('M-1', huge, 1, []);
    lines3.addItem('M-1', bare, 1, []);
    lines3.unmatched('M-1', 'soft-starter', 1, 'Soft starters: rated 40 A');
    const got = layoutUnits(lines3.lines, byCode([...CATALOGUE, huge, bare]));
    expect(got.unplaced.map((u) => [u.tag, u.reason])).toEqual([
      ['1PMR', 'PW-PM-BARE has no width, height and depth in the catalogue'],
      ['1SST', 'no catalogue part matched, so no dimensions to lay it out by'],
    ]);
    const placed = placeUnits(got.units, { widthMm: 500, heightMm: 1050 });
    expect(placed.tooLarge.map((t) => [t.unit.tag, t.reason])).toEqual([
      ['1XF', '600 mm wide: the plate leaves 370 mm between its side ducts'],
    ]);
  });
});
