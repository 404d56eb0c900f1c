// The estimator's path: J-2041 → MCC-1 → Bill of materials → rebuild → totals → .xlsx download opened with exceljs;
// the Catalogue page: items, labour units, and the tested combination ratings an engineer keeps there.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser } from 'playwright-core';
import ExcelJS from 'exceljs';
import fs from 'node:fs';
import { baseUrl, launch, newPage, screenshot, signInThroughForm } from '../setup/browser';

const parseMoney = (s: string) => Number(s.replace(/[^0-9.]/g, ''));

describe('estimator in the browser', () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launch();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('rebuilds the bill of materials of MCC-1, reads its totals and downloads the .xlsx', async () => {
    const page = await newPage(browser);
    await signInThroughForm(page, 'estimator');
    await page.waitForURL(/\/jobs$/);
    await page.getByRole('table', { name: 'Jobs' }).getByRole('link', { name: 'J-2041' }).click();
    await page.getByRole('link', { name: 'MCC-1 Pump hall' }).click();
    await page.getByRole('navigation', { name: 'Panel sections' }).getByRole('link', { name: 'Bill of materials' }).click();
    await page.waitForURL(/\/bill-of-materials$/);

    // the demo panel comes with the bill of materials the seeder built: up to date, and still so after a rebuild
    await page.getByText('✔ Up to date with the motors and the catalogue.').waitFor();
    await page.getByRole('button', { name: 'Rebuild', exact: true }).click();
    const table = page.getByRole('table', { name: 'Bill of materials' });
    await table.waitFor();
    await page.getByRole('button', { name: 'Rebuild', exact: true }).waitFor({ state: 'visible' });
    await page.getByText('✔ Up to date with the motors and the catalogue.').waitFor();

    // a subtotal row per bucket, motors and panel items
    for (const tag of ['P-101', 'P-110', 'C-201', 'H-601'])
      await table.getByRole('row', { name: new RegExp(`^Subtotal ${tag}`) }).waitFor();
    await table.getByRole('row', { name: /^Subtotal \(panel\)/ }).waitFor();

    // footer totals: sell = cost + markup, as the page shows them
    const foot = table.locator('tfoot');
    const cell = async (label: string) =>
      parseMoney(
        (await foot
          .getByRole('row')
          .filter({ has: page.getByRole('rowheader', { name: label, exact: true }) })
          .locator('td')
          .nth(1)
          .textContent()) ?? '',
      );
    const cost = await cell('Cost (material + labour)');
    const markup = await cell('Markup 15 %');
    const sell = await cell('Sell');
    expect(cost).toBeGreaterThan(1000);
    expect(markup).toBeCloseTo(Math.round(cost * 15) / 100, 2); // demo panel markup 15 %
    expect(sell).toBeCloseTo(cost + markup, 2);
    await screenshot(page, 'bom');

    // the estimator sees the editing controls
    await expect(page.getByRole('button', { name: '+ Manual line' }).isVisible()).resolves.toBe(true);
    expect(await table.getByRole('button', { name: 'Swap' }).count()).toBeGreaterThan(5);

    const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('link', { name: /Export \.xlsx/ }).click()]);
    // the exact name comes through filename* (RFC 6266); an ASCII fallback is in filename
    expect(download.suggestedFilename()).toBe('J-2041-MCC-1 Pump hall-bom.xlsx');
    const file = await download.path();
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.load(fs.readFileSync(file) as unknown as ArrayBuffer);
    expect(wb.worksheets.map((w) => w.name)).toEqual(['Summary', 'MCC-1 Pump hall', 'Roll-up by part']);
    const summary = wb.getWorksheet('Summary')!;
    const sellCell = summary.getRow(6).getCell(7).value as { formula: string; result: number };
    expect(sellCell.formula).toMatch(/^'MCC-1 Pump hall'!H\d+$/);
    expect(sellCell.result).toBeCloseTo(sell, 2);
    const ws = wb.getWorksheet('MCC-1 Pump hall')!;
    expect((ws.getRow(6).getCell(8).value as { formula: string }).formula).toBe('ROUND(E6*G6,2)');
  });

  it('offers only the parts that meet a line when swapping, and says why Swap waits when none does', async () => {
    const page = await newPage(browser);
    await signInThroughForm(page, 'estimator');
    await page.waitForURL(/\/jobs$/);
    await page.getByRole('table', { name: 'Jobs' }).getByRole('link', { name: 'J-2041' }).click();
    await page.getByRole('link', { name: 'MCC-1 Pump hall' }).click();
    await page.getByRole('navigation', { name: 'Panel sections' }).getByRole('link', { name: 'Bill of materials' }).click();
    await page.waitForURL(/\/panels\/(\d+)\/bill-of-materials$/);
    const panelId = Number(/\/panels\/(\d+)\//.exec(page.url())![1]);
    const table = page.getByRole('table', { name: 'Bill of materials' });
    await table.waitFor();

    // the panel's enclosure: the backplate layout chose it, and a swap must keep the type, the depth and the plate
    // area the layout's fullest section takes; only enclosures meeting all three are offered
    const bom = (await (await page.request.get(`${baseUrl()}/api/panels/${panelId}/bom`)).json()) as {
      lines: Array<{
        id: number;
        bucket: string;
        category: string;
        code: string | null;
        requirement: Array<{
          nemaType: string;
          minUsableAreaMm2: number;
          minDepthMm: number;
          minAmps: number;
          poles: number;
          volts: number;
        }>;
      }>;
    };
    const enc = bom.lines.find((l) => l.category === 'enclosure' && l.code)!;
    const need = enc.requirement[0]!;
    const all = (await (await page.request.get(`${baseUrl()}/api/catalogue/items?category=enclosure`)).json()) as Array<{
      code: string;
      active: boolean;
      ratings: { nemaType: string; heightMm: number; widthMm: number; depthMm: number };
    }>;
    // usable back panel (H − 150 mm) × (W − 100 mm), the matcher's rule (common practice, catalog/README.md)
    const fits = (i: (typeof all)[number]) =>
      i.active &&
      i.ratings.nemaType === need.nemaType &&
      i.ratings.depthMm >= need.minDepthMm &&
      (i.ratings.heightMm - 150) * (i.ratings.widthMm - 100) >= need.minUsableAreaMm2;
    const others = all
      .filter((i) => fits(i) && i.code !== enc.code)
      .map((i) => i.code)
      .sort();
    // the catalogue does hold enclosures that would not do (so a list is a choice, not the whole category)
    expect(all.filter((i) => i.active && !fits(i)).length).toBeGreaterThan(0);
    await table.getByRole('row').filter({ hasText: enc.code! }).getByRole('button', { name: 'Swap' }).click();
    const form = page.getByRole('form', { name: 'Swap a part' });
    await form.getByTestId('swap-needs').getByText(`NEMA Type ${need.nemaType}`).waitFor();
    if (others.length === 0) await form.getByTestId('swap-none').waitFor();
    else {
      const offered = (
        await form
          .getByLabel(/^Part \(\d+ that meets? it/)
          .locator('option')
          .allTextContents()
      )
        .filter((t) => t !== 'Choose…')
        .map((t) => t.split(' — ')[0]!);
      expect(offered.sort()).toEqual(others);
    }
    await form.getByRole('button', { name: 'Cancel' }).click();

    // the distribution block: larger blocks of its poles and voltage are offered, smaller ones and others not
    const pdb = bom.lines.find((l) => l.category === 'power-distribution-block' && l.code)!;
    const pdbNeed = pdb.requirement[0]!;
    const blocks = (await (await page.request.get(`${baseUrl()}/api/catalogue/items?category=power-distribution-block`)).json()) as Array<{
      code: string;
      active: boolean;
      ratings: { amps: number; poles: number; volts: number };
    }>;
    const holds = (i: (typeof blocks)[number]) =>
      i.active && i.ratings.amps >= pdbNeed.minAmps && i.ratings.poles === pdbNeed.poles && i.ratings.volts >= pdbNeed.volts;
    await table.getByRole('row').filter({ hasText: pdb.code! }).getByRole('button', { name: 'Swap' }).click();
    const select = form.getByLabel(/^Part \(\d+ that meets? it/);
    await select.waitFor();
    const offered = (await select.locator('option').allTextContents()).filter((t) => t !== 'Choose…').map((t) => t.split(' — ')[0]!);
    expect(offered.length).toBeGreaterThan(0);
    expect(offered.sort()).toEqual(
      blocks
        .filter((i) => holds(i) && i.code !== pdb.code)
        .map((i) => i.code)
        .sort(),
    );
    expect(blocks.filter((i) => i.active && !holds(i)).length).toBeGreaterThan(0);
    await screenshot(page, 'bom-swap-fitting');
    await form.getByRole('button', { name: 'Cancel' }).click();

    // C-201's size 1 contactor: the demo catalogue has no other size 1 with a 120 V coil, so nothing is offered
    // (not the size 00 or the 24 V coil) and the Swap button says what it waits for
    const contactor = bom.lines.find((l) => l.bucket === 'C-201' && l.category === 'contactor')!;
    await table.getByRole('row').filter({ hasText: contactor.code! }).first().getByRole('button', { name: 'Swap' }).click();
    await form.getByTestId('swap-none').waitFor();
    const swap = form.getByRole('button', { name: 'Swap', exact: true });
    expect(await swap.isDisabled()).toBe(true);
    const described = await swap.getAttribute('aria-describedby');
    expect(described).toBeTruthy();
    expect(await page.locator(`[id="${described}"]`).textContent()).toContain('No part to swap to.');
    await form.getByTestId('swap-needs').getByText('NEMA size 1').waitFor();
  });

  it('shows the catalogue grouped by category and the labour units, read-only for an engineer', async () => {
    const page = await newPage(browser);
    await signInThroughForm(page, 'engineer');
    await page.waitForURL(/\/jobs$/);
    await page.goto(`${baseUrl()}/catalogue`);
    const table = page.getByRole('table', { name: 'Catalogue' });
    await table.waitFor();
    await table.getByRole('button', { name: /^Contactors \(\d+\)$/ }).click();
    expect(await table.getByRole('row').count()).toBeGreaterThan(10);
    expect(await page.getByRole('button', { name: '+ Add item' }).count()).toBe(0);
    expect(await table.getByRole('button', { name: /Unit cost of .* Edit/ }).count()).toBe(0);
    await screenshot(page, 'catalogue-engineer');
    await page.goto(`${baseUrl()}/labour-units`);
    await page.getByRole('table', { name: 'Labour units' }).getByText('termination', { exact: true }).waitFor();
  });

  it('lets an estimator change a price inline and see it in the item history', async () => {
    const page = await newPage(browser);
    await signInThroughForm(page, 'estimator');
    await page.waitForURL(/\/jobs$/);
    await page.goto(`${baseUrl()}/catalogue`);
    const table = page.getByRole('table', { name: 'Catalogue' });
    await table.waitFor();
    await page.getByRole('textbox', { name: 'Code or description' }).fill('PW-TB');
    const edit = table.getByRole('button', { name: /^Unit cost of PW-TB/ }).first();
    const label = (await edit.getAttribute('aria-label'))!;
    const code = /Unit cost of (\S+):/.exec(label)![1]!;
    await edit.click();
    const input = table.getByRole('textbox', { name: `Unit cost of ${code}` });
    await input.fill('4.44');
    await input.press('Enter');
    await table.getByRole('button', { name: `Unit cost of ${code}: 4.44. Edit` }).waitFor();
    await table.getByRole('row').filter({ hasText: code }).getByRole('button', { name: 'History' }).click();
    const history = page.getByRole('region', { name: `History of ${code}` });
    await history.getByText(/Unit cost: .* → 4.44/).waitFor();
    // only the price changed: the item's other fields are untouched
    expect(await history.getByText(/^Terminations:/).count()).toBe(0);
    await screenshot(page, 'catalogue-estimator');

    // add an item through the form: the category decides which ratings it asks for
    await page.getByRole('button', { name: '+ Add item' }).click();
    const form = page.getByRole('form', { name: 'Add catalogue item' });
    await form.getByLabel('Code').fill('PW-FU-CC-TEST-E2E');
    await form.getByLabel('Description').fill('Fuse, class CC, time-delay, 7 A, 600 V (browser test)');
    await form.getByLabel('Category').selectOption('fuse');
    await form.getByRole('button', { name: 'Add item' }).click();
    // a plain sentence, never zod's "Invalid input: expected number, received undefined"
    await form.getByText('This is needed.').first().waitFor();
    expect(await form.getByText(/Invalid input|expected number/).count()).toBe(0);
    await form.getByLabel('Unit cost').fill('9.9');
    await form.getByLabel('Lead time').fill('4');
    // the ratings by their names, never their keys
    await form.getByLabel('Rated voltage').fill('600');
    await form.getByLabel('Rated current').fill('7');
    await form.getByLabel('Fuse class').fill('CC');
    await form.getByLabel('Time delay').check();
    await screenshot(page, 'catalogue-add-item');
    await form.getByRole('button', { name: 'Add item' }).click();
    await page.getByText('✔ Added PW-FU-CC-TEST-E2E.').waitFor();
  });

  it('lets an engineer keep the tested combination ratings: refuses one above the breaker’s rating, adds and sets one aside (UL 508A SB4; invented data)', async () => {
    const page = await newPage(browser);
    await signInThroughForm(page, 'engineer');
    await page.waitForURL(/\/jobs$/);
    await page.getByRole('link', { name: 'Catalogue' }).click();
    const section = page.getByRole('region', { name: 'Tested combination ratings' });
    // the seeded demo combination for the 7.5 hp reversing conveyor's bucket
    await section.getByRole('row').filter({ hasText: 'PW-CMB-N1-030' }).waitFor();

    const ref = `E2E-CMB-${Date.now().toString(36).toUpperCase()}`;
    await section.getByRole('button', { name: '+ Add combination' }).click();
    await section.getByLabel('Reference').fill(ref);
    await section.getByLabel('Parts').fill('PW-BR-3P-030, PW-CN-N1-120, PW-OT-13A-C10');
    await section.getByRole('textbox', { name: /^Rating/ }).fill('65');
    await section.getByLabel('Source').fill('Maker table, row 12 (test data)');
    await section.getByRole('button', { name: 'Add combination' }).click();
    // PW-BR-3P-030 is marked 14 kA: the combination cannot be rated higher (UL 508A SB4)
    await section.getByText('at most 14 kA (PW-BR-3P-030)').waitFor();
    await section.getByRole('textbox', { name: /^Rating/ }).fill('14');
    await section.getByRole('button', { name: 'Add combination' }).click();
    const row = section.getByRole('row').filter({ hasText: ref });
    await row.getByText('✔ in use').waitFor();
    await row.getByRole('button', { name: 'Set aside' }).click();
    await row.getByText('○ set aside').waitFor();

    // a maker's table typed into the file format comes in as a whole (set aside, so no panel changes)
    const tableRef = `E2E-TBL-${Date.now().toString(36).toUpperCase()}`;
    const csv = `ref,parts,ratingKa,maxVolts,source,active\r\n${tableRef},PW-BR-3P-010 + PW-CN-N0-120,5,480,maker table (test data),no\r\n`;
    await section
      .getByLabel('Import a combination table')
      .setInputFiles({ name: 'table.csv', mimeType: 'text/csv', buffer: Buffer.from(csv) });
    await section.getByRole('status').filter({ hasText: '✔ Imported: 1 new, 0 changed' }).waitFor();
    await section.getByRole('row').filter({ hasText: tableRef }).getByText('○ set aside').waitFor();
  });
});
