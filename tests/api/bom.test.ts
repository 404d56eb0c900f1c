// Bill-of-materials API on the demo panel "MCC-1 Pump hall" of job J-2041: rebuild, totals, manual
// lines, swaps with a reason, and the .xlsx/.csv downloads opened back with exceljs.
import { beforeAll, describe, expect, it } from 'vitest';
import ExcelJS from 'exceljs';
import { addSecondMake, send, signInAs, type Session } from '../setup/api';
import { DEMO_MOTORS } from '../../server/db/seeders/demo-panels';

interface Line {
  id: number;
  bucket: string;
  category: string;
  code: string | null;
  description: string;
  quantity: number;
  unit: string;
  unitCost: number;
  unitLabourHours: number;
  status: 'matched' | 'unmatched' | 'manual';
  source: 'auto' | 'manual' | 'swapped';
  requiredRatings: string | null;
  swapReason: string | null;
}
interface Bom {
  lines: Line[];
  totals: {
    materialCost: number;
    labourHours: number;
    labourRate: number;
    labourCost: number;
    cost: number;
    markupPercent: number;
    markup: number;
    sell: number;
    unmatchedLines: number;
  };
  stale: boolean;
  generatedAt: string | null;
}

const cents = (n: number) => Math.round(n * 100) / 100;
/** Parts that start or drive a motor: the bucket's starter (common practice: every motor bucket has one). */
const STARTERS = ['contactor', 'vfd', 'soft-starter', 'dc-drive', 'dc-starter'];

let estimator: Session;
let designer: Session;
let engineer: Session;
let jobId: number;
let panelId: number;

beforeAll(async () => {
  [estimator, designer, engineer] = await Promise.all([signInAs('estimator'), signInAs('designer'), signInAs('engineer')]);
  const jobs = (await estimator.agent.get('/api/jobs').expect(200)).body as Array<{ id: number; number: string }>;
  jobId = jobs.find((j) => j.number === 'J-2041')!.id;
  const panels = (await estimator.agent.get(`/api/jobs/${jobId}/panels`).expect(200)).body as Array<{ id: number; name: string }>;
  panelId = panels.find((p) => p.name === 'MCC-1 Pump hall')!.id;
});

async function bom(s: Session = estimator): Promise<Bom> {
  return (await s.agent.get(`/api/panels/${panelId}/bom`).expect(200)).body as Bom;
}

describe('rebuild', () => {
  it('gives every motor bucket a starter line and totals that are the sum of the extended costs', async () => {
    await send(engineer, 'post', `/api/panels/${panelId}/bom/rebuild`, {}).expect(403);
    const b = (await send(designer, 'post', `/api/panels/${panelId}/bom/rebuild`, {}).expect(200)).body as Bom;
    expect(b.stale).toBe(false);
    expect(b.generatedAt).not.toBeNull();
    for (const m of DEMO_MOTORS) {
      const starters = b.lines.filter((l) => l.bucket === m.tag && STARTERS.includes(l.category));
      expect(starters.length, `bucket ${m.tag}`).toBeGreaterThan(0);
    }
    expect(b.lines.some((l) => l.bucket === '(panel)' && l.category === 'enclosure')).toBe(true);
    // an unmatched line states what it needs and carries no code or price
    for (const l of b.lines.filter((x) => x.status === 'unmatched')) {
      expect(l.code).toBeNull();
      expect(l.requiredRatings).toBeTruthy();
      expect(l.unitCost).toBe(0);
    }

    // totals recomputed here from the lines: extended cost rounded per line to the cent
    const material = cents(b.lines.reduce((s, l) => s + cents(l.quantity * l.unitCost), 0));
    const hours = cents(b.lines.reduce((s, l) => s + l.quantity * l.unitLabourHours, 0));
    expect(b.totals.materialCost).toBeCloseTo(material, 2);
    expect(b.totals.labourHours).toBeCloseTo(hours, 2);
    // demo panel defaults: labour rate 85 /h, markup 15 % (panel model defaults)
    expect(b.totals.labourRate).toBe(85);
    expect(b.totals.markupPercent).toBe(15);
    expect(b.totals.labourCost).toBeCloseTo(cents(b.totals.labourHours * 85), 2);
    expect(b.totals.cost).toBeCloseTo(cents(b.totals.materialCost + b.totals.labourCost), 2);
    expect(b.totals.markup).toBeCloseTo(cents(b.totals.cost * 0.15), 2);
    expect(b.totals.sell).toBeCloseTo(cents(b.totals.cost + b.totals.markup), 2);
    expect(b.totals.unmatchedLines).toBe(b.lines.filter((l) => l.status === 'unmatched').length);
    expect(b.totals.materialCost).toBeGreaterThan(1000);
  });

  it('is read by every role', async () => {
    const b = await bom(engineer);
    expect(b.lines.length).toBeGreaterThan(20);
  });
});

describe('manual lines and swaps', () => {
  it('adds freight and engineering hours, keeps them through a rebuild, and removes them', async () => {
    const before = await bom();
    await send(designer, 'post', `/api/panels/${panelId}/bom/lines`, {
      category: 'freight',
      description: 'Freight to site',
      quantity: 1,
      unitCost: 450,
    }).expect(403);
    const freight = (
      await send(estimator, 'post', `/api/panels/${panelId}/bom/lines`, {
        category: 'freight',
        description: 'Freight to site',
        quantity: 1,
        unitCost: 450,
      }).expect(201)
    ).body as Line;
    expect(freight).toMatchObject({ bucket: '(panel)', status: 'manual', source: 'manual', unitCost: 450, code: null });
    const eng = (
      await send(estimator, 'post', `/api/panels/${panelId}/bom/lines`, {
        category: 'engineering',
        description: 'Engineering and drawings',
        quantity: 6,
        unitCost: 0,
        unitLabourHours: 1,
      }).expect(201)
    ).body as Line;

    let b = await bom();
    expect(b.totals.materialCost).toBeCloseTo(before.totals.materialCost + 450, 2);
    expect(b.totals.labourHours).toBeCloseTo(before.totals.labourHours + 6, 2);

    // a manual line's quantity changes directly
    const more = (await send(estimator, 'patch', `/api/panels/${panelId}/bom/lines/${freight.id}`, { quantity: 2 }).expect(200))
      .body as Line;
    expect(more.quantity).toBe(2);

    b = (await send(estimator, 'post', `/api/panels/${panelId}/bom/rebuild`, {}).expect(200)).body as Bom;
    const kept = b.lines.filter((l) => l.source === 'manual').map((l) => [l.description, l.quantity]);
    expect(kept).toEqual(
      expect.arrayContaining([
        ['Freight to site', 2],
        ['Engineering and drawings', 6],
      ]),
    );
    expect(b.totals.materialCost).toBeCloseTo(before.totals.materialCost + 900, 2);

    // an automatic line is not removed or re-quantified by hand
    const auto = b.lines.find((l) => l.source === 'auto')!;
    await send(estimator, 'delete', `/api/panels/${panelId}/bom/lines/${auto.id}`).expect(400);
    const q = await send(estimator, 'patch', `/api/panels/${panelId}/bom/lines/${auto.id}`, { quantity: 7 }).expect(400);
    expect(q.body.error.message).toMatch(/follow the design/);

    for (const l of b.lines.filter((x) => x.source === 'manual'))
      await send(estimator, 'delete', `/api/panels/${panelId}/bom/lines/${l.id}`).expect(204);
    b = await bom();
    expect(b.lines.some((l) => l.source === 'manual')).toBe(false);
    expect(b.totals.materialCost).toBeCloseTo(before.totals.materialCost, 2);
    void eng;
  });

  it("swaps a part for an equivalent with a reason, at the new part's price, and keeps the swap through a rebuild", async () => {
    const b = (await send(estimator, 'post', `/api/panels/${panelId}/bom/rebuild`, {}).expect(200)).body as Bom;
    const line = b.lines.find((l) => l.bucket === 'C-201' && l.category === 'contactor' && l.status === 'matched')!;
    expect(line).toBeDefined();
    // the demo catalogue has one size 1 contactor with a 120 V coil: a second make is what a swap may take
    // (only parts that meet the line's requirement are offered; tests/api/bom-swaps.test.ts)
    const second = await addSecondMake(estimator, line.code!);
    const alternatives = (await estimator.agent.get(`/api/panels/${panelId}/bom/lines/${line.id}/alternatives`).expect(200)).body as Array<{
      code: string;
      unitCost: number;
    }>;
    expect(alternatives.length).toBeGreaterThan(0);
    expect(alternatives.map((a) => a.code)).toContain(second);
    expect(alternatives.map((a) => a.code)).not.toContain(line.code);
    const pick = alternatives.find((a) => a.unitCost !== line.unitCost) ?? alternatives[0]!;

    const noReason = await send(estimator, 'patch', `/api/panels/${panelId}/bom/lines/${line.id}`, { swapCode: pick.code }).expect(400);
    expect(noReason.body.error.details[0].path).toBe('body.swapReason');
    const overload = b.lines.find((l) => l.category === 'overload-relay' && l.code)!;
    await send(estimator, 'patch', `/api/panels/${panelId}/bom/lines/${line.id}`, { swapCode: overload.code, swapReason: 'stock' }).expect(
      400,
    );
    await send(designer, 'patch', `/api/panels/${panelId}/bom/lines/${line.id}`, { swapCode: pick.code, swapReason: 'stock' }).expect(403);

    const swapped = (
      await send(estimator, 'patch', `/api/panels/${panelId}/bom/lines/${line.id}`, {
        swapCode: pick.code,
        swapReason: 'Customer standard for conveyors',
      }).expect(200)
    ).body as Line;
    expect(swapped).toMatchObject({
      code: pick.code,
      source: 'swapped',
      status: 'matched',
      swapReason: 'Customer standard for conveyors',
      unitCost: pick.unitCost,
      quantity: line.quantity,
    });

    const after = (await send(estimator, 'post', `/api/panels/${panelId}/bom/rebuild`, {}).expect(200)).body as Bom;
    const still = after.lines.filter((l) => l.bucket === 'C-201' && l.category === 'contactor');
    expect(still.map((l) => [l.code, l.source])).toContainEqual([pick.code, 'swapped']);
    expect(after.totals.materialCost).toBeCloseTo(cents(b.totals.materialCost + cents(line.quantity * (pick.unitCost - line.unitCost))), 2);
    expect(after.stale).toBe(false);
  });
});

describe('downloads', () => {
  async function workbook(url: string) {
    const r = await estimator.agent.get(url).responseType('blob').expect(200);
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.load(r.body as unknown as ArrayBuffer);
    return { wb, headers: r.headers };
  }

  it('writes the panel .xlsx with formulas for extended costs, and a text starting with = stays text', async () => {
    const injected = '=HYPERLINK("http://example.invalid","click")';
    const manual = (
      await send(estimator, 'post', `/api/panels/${panelId}/bom/lines`, {
        category: 'other',
        description: injected,
        quantity: 3,
        unitCost: 12.5,
      }).expect(201)
    ).body as Line;
    const b = await bom();
    const { wb, headers } = await workbook(`/api/panels/${panelId}/bom.xlsx`);
    expect(headers['content-type']).toBe('application/vnd.openxmlformats-officedocument.spreadsheetml.sheet');
    expect(headers['content-disposition']).toMatch(/^attachment; filename="J-2041-MCC-1-Pump-hall-bom\.xlsx"/);
    expect(wb.worksheets.map((w) => w.name)).toEqual(['Summary', 'MCC-1 Pump hall', 'Roll-up by part']);

    const ws = wb.getWorksheet('MCC-1 Pump hall')!;
    expect(ws.getRow(4).getCell(8).value).toBe('Extended cost');
    let lineRows = 0;
    let injectedRow = 0;
    ws.eachRow((row, n) => {
      const h = row.getCell(8).value as { formula?: string } | null;
      if (n > 4 && typeof row.getCell(5).value === 'number') {
        lineRows++;
        expect(h?.formula).toBe(`ROUND(E${n}*G${n},2)`);
      }
      if (row.getCell(4).value === injected) injectedRow = n;
    });
    expect(lineRows).toBe(b.lines.length);
    expect(injectedRow).toBeGreaterThan(4);
    // the description cell is a plain string, not a formula object
    expect(typeof ws.getRow(injectedRow).getCell(4).value).toBe('string');
    expect((ws.getRow(injectedRow).getCell(8).value as { result: number }).result).toBe(37.5);

    const summary = wb.getWorksheet('Summary')!;
    const panelRow = summary.getRow(6);
    expect(panelRow.getCell(1).value).toBe('MCC-1 Pump hall');
    expect((panelRow.getCell(2).value as { formula: string; result: number }).formula).toMatch(/^'MCC-1 Pump hall'!H\d+$/);
    expect((panelRow.getCell(2).value as { result: number }).result).toBeCloseTo(b.totals.materialCost, 2);
    expect((panelRow.getCell(7).value as { result: number }).result).toBeCloseTo(b.totals.sell, 2);

    const csv = await estimator.agent.get(`/api/panels/${panelId}/bom.csv`).expect(200);
    expect(csv.headers['content-disposition']).toMatch(/filename="J-2041-MCC-1-Pump-hall-bom\.csv"/);
    // CSV: the formula-like text is prefixed with a quote so a spreadsheet shows it as text
    expect(csv.text).toContain(`"'=HYPERLINK(""http://example.invalid"",""click"")"`);
    await send(estimator, 'delete', `/api/panels/${panelId}/bom/lines/${manual.id}`).expect(204);
  });

  it('writes the whole job: a sheet for every panel that is not archived', async () => {
    const panels = (await estimator.agent.get(`/api/jobs/${jobId}/panels`).expect(200)).body as Array<{
      name: string;
      archivedAt: string | null;
    }>;
    const { wb, headers } = await workbook(`/api/jobs/${jobId}/bom.xlsx`);
    expect(headers['content-disposition']).toMatch(/filename="J-2041-bom\.xlsx"/);
    const names = wb.worksheets.map((w) => w.name);
    expect(names[0]).toBe('Summary');
    expect(names.at(-1)).toBe('Roll-up by part');
    expect(names.slice(1, -1).sort()).toEqual(
      panels
        .filter((p) => !p.archivedAt)
        .map((p) => p.name.slice(0, 31))
        .sort(),
    );
  });
});
