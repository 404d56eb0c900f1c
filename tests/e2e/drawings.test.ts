import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import ExcelJS from 'exceljs';
import { baseUrl, launch, newPage, screenshot, signInThroughForm } from '../setup/browser';

const DEMO_TAGS = ['P-101', 'P-102', 'P-110', 'C-201', 'K-301', 'M-401', 'V-501', 'H-601'];

/** The engineer on the demo panel MCC-1 of J-2041. */
async function openDemoPanel(browser: Browser): Promise<Page> {
  const page = await newPage(browser);
  await signInThroughForm(page, 'engineer');
  await page.waitForURL(/\/jobs$/);
  await page.getByRole('table', { name: 'Jobs' }).getByRole('link', { name: 'J-2041' }).click();
  await page.getByRole('link', { name: 'MCC-1 Pump hall' }).first().click();
  return page;
}

describe('drawings in the browser', () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launch();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('shows the engineer a one-line and a connection card per motor, and the submittal download', async () => {
    const page = await openDemoPanel(browser);
    await page.getByRole('navigation', { name: 'Panel sections' }).getByRole('link', { name: 'Drawings' }).click();
    await page.waitForURL(/\/drawings$/);

    for (const tag of DEMO_TAGS) {
      const oneLine = page.getByRole('img', { name: new RegExp(`^One-line of ${tag}:`) });
      await oneLine.waitFor();
      expect(await oneLine.evaluate((el) => el.tagName.toLowerCase())).toBe('svg');
    }
    // K-301 is a six-lead motor on a wye-delta starter: its card shows both steps (NEMA MG 1 lead markings)
    const k301 = page.getByRole('img', { name: /^Three-phase, six leads, wye start \/ delta run\./ });
    await k301.waitFor();
    expect(await k301.getAttribute('aria-labelledby')).toBeTruthy();
    expect(await page.getByRole('img', { name: /^DC compound motor\./ }).count()).toBe(1);
    // its overload relay sits in the delta windings: 70 A / √3 = 40.41 A set, 87.5 A / √3 = 50.52 A max (common practice)
    await page.getByText('1 relay in the delta windings: set 40.41 A, max 50.52 A each').first().waitFor();
    expect(await page.getByRole('note').filter({ hasText: 'Check rotation before coupling the load.' }).count()).toBe(DEMO_TAGS.length);
    expect(await page.getByText('To reverse:', { exact: false }).count()).toBeGreaterThanOrEqual(DEMO_TAGS.length);

    const link = page.getByRole('link', { name: /Download submittal \(PDF\)/ });
    const href = await link.getAttribute('href');
    expect(href).toMatch(/^\/api\/panels\/\d+\/submittal\.pdf$/);
    const pdf = await page.request.get(`${baseUrl()}${href}`);
    expect(pdf.status()).toBe(200);
    expect(pdf.headers()['content-type']).toBe('application/pdf');
    expect((await pdf.body()).subarray(0, 5).toString('latin1')).toBe('%PDF-');

    await screenshot(page, 'drawings');
  });

  it('names the motors at another voltage on the Motors page, and draws the 115 V pump from its transformer', async () => {
    const page = await openDemoPanel(browser);
    const note = page.getByRole('note', { name: 'Motors at another voltage' });
    // the demo's 0.5 hp 115 V sampling pump (9.8 A, NEC 2023 Table 430.248): (125 % × 9.8 A) × 240 V = 2.94 kVA → 3 kVA
    await note
      .getByText(/T1: M-401 \(115 V single-phase\) fed from a 3 kVA 480-240\/120 V single-phase transformer in the panel/)
      .waitFor();
    // the 5 hp 240 V DC hoist (20 A, Table 430.247): a 240 V DC supply ≥ 25 A (125 %)
    await note.getByText(/DC1: H-601 \(240 V DC\) fed from a 240 V DC supply \(25 A\) in the panel/).waitFor();
    const row = page.getByRole('table', { name: 'Motors' }).getByRole('row').filter({ hasText: 'M-401' });
    await row.getByText('⚡ from T1').waitFor();
    await screenshot(page, 'motors-other-voltage');

    await page.getByRole('navigation', { name: 'Panel sections' }).getByRole('link', { name: 'Drawings' }).click();
    const m401 = page.getByRole('img', { name: /^One-line of M-401:/ });
    await m401.waitFor();
    const title = await m401.locator('title').textContent();
    expect(title).toMatch(
      /^One-line of M-401: Feeder bus, \d+ A T1 primary breaker, T1 — 3 kVA transformer, \d+ A T1 secondary breaker, T1 secondary bus, /,
    );
  });

  it('asks the designer where a motor at another voltage is fed from, and only then', async () => {
    const page = await newPage(browser);
    await signInThroughForm(page, 'designer');
    await page.waitForURL(/\/jobs$/);
    await page.getByRole('table', { name: 'Jobs' }).getByRole('link', { name: 'J-2041' }).click();
    await page.getByRole('link', { name: 'MCC-1 Pump hall' }).first().click();
    const motors = page.getByRole('table', { name: 'Motors' });
    await motors.getByRole('link', { name: 'M-401' }).click();
    await page.getByRole('button', { name: /3\. Site & hazards/ }).click();
    const fedFrom = page.getByLabel('Fed from');
    await fedFrom.waitFor();
    expect(await fedFrom.inputValue()).toBe('panel');
    await screenshot(page, 'wizard-fed-from');
    // a 460 V motor on the 480 V supply is on the panel's own bus: no question
    await page.goBack();
    await motors.getByRole('link', { name: 'P-101' }).click();
    await page.getByRole('button', { name: /3\. Site & hazards/ }).click();
    await page.getByLabel('Environment at the panel').waitFor();
    expect(await page.getByLabel('Fed from').count()).toBe(0);
  });

  it('lists the wye-delta blower at its relay’s dial limit, never at the line value', async () => {
    const page = await openDemoPanel(browser);
    const row = page.getByRole('table', { name: 'Motors' }).getByRole('row').filter({ hasText: 'K-301' });
    // NEC 2023 430.32(A)(1): 125 % × 70 A = 87.5 A in line terms; in the delta windings 87.5 / √3 = 50.52 A
    await row.getByText('50.52 (in Δ) · C20').waitFor();
    expect(await row.getByText('87.5').count()).toBe(0);

    // the motor list as a workbook: the import format first, then the schedule
    const [download] = await Promise.all([
      page.waitForEvent('download'),
      page.getByRole('link', { name: 'Export motor list (.xlsx)' }).click(),
    ]);
    expect(download.suggestedFilename()).toBe('J-2041-MCC-1 Pump hall-motors.xlsx');
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.readFile((await download.path())!);
    expect(wb.worksheets.map((w) => w.name)).toEqual(['Motors', 'Selections', 'Columns', 'About']);
    const tags = (wb.getWorksheet('Selections')!.getColumn(1).values as unknown[]).slice(2);
    expect(tags).toEqual(DEMO_TAGS);

    // its six leads from controller to motor: 125 % of 58 % of the 77 A table FLC (Table 430.250, 60 hp
    // 460 V) = 55.83 A (NEC 2023 430.22(C)) -> 6 AWG Cu, 65 A at 75 °C (Table 310.16) × 0.94 for the
    // demo job's 35 °C ambient (Table 310.15(B)(1)(1)) = 61.1 A
    await page.getByRole('navigation', { name: 'Panel sections' }).getByRole('link', { name: 'Protection' }).click();
    await page.waitForURL(/\/protection$/);
    await page
      .getByTestId('motor-leads')
      .filter({ hasText: 'controller to motor: 6 × 6 AWG Cu (61.1 A ≥ 55.83 A, 58 % of FLC)' })
      .first()
      .waitFor();
    expect(await page.getByTestId('motor-leads').count()).toBe(1); // only the wye-delta blower has them
  });
  it('opens the control schematics of the reversing conveyor and the wye-delta blower with their interlocks', async () => {
    const page = await openDemoPanel(browser);
    await page.getByRole('navigation', { name: 'Panel sections' }).getByRole('link', { name: 'Drawings' }).click();
    await page.waitForURL(/\/drawings$/);
    const list = page.getByRole('navigation', { name: 'Sheet list' });
    for (const [tag, coils] of [
      ['C-201', ['F', 'R']],
      ['K-301', ['S', 'D']],
    ] as const) {
      await list.getByRole('button', { name: new RegExp(`${tag} control schematic`) }).click();
      const sheet = page.getByRole('img', { name: new RegExp(`${tag} control schematic`) });
      await sheet.waitFor();
      // the mechanical interlock drawn, and each coil's NC interlock contact of the other contactor
      expect(await sheet.locator('text.mech-interlock').count()).toBeGreaterThanOrEqual(1);
      const xrefs = await sheet.locator('text.xref').allTextContents();
      for (const c of coils)
        expect(
          xrefs.some((x) => new RegExp(`^\\d+${c}: .*NC \\d+`).test(x)),
          `${tag} ${c}: ${xrefs.join(' | ')}`,
        ).toBe(true);
      expect(await sheet.getByText('IL', { exact: false }).count()).toBeGreaterThanOrEqual(2);
      expect(await sheet.getByText('IEEE 315 / NEMA ICS 19', { exact: false }).count()).toBeGreaterThan(0);
      await screenshot(page, `drawings-${tag}`);
    }
    // the backplate layout to scale, in the enclosure of the bill of materials
    await list.getByRole('button', { name: /Backplate layout/ }).click();
    const layout = page.getByRole('img', { name: /Backplate layout/ });
    await layout.waitFor();
    expect(await layout.locator('rect.pw-part').count()).toBeGreaterThan(20);
    expect(await layout.locator('rect.pw-duct').count()).toBeGreaterThan(2);
    expect(await layout.getByText(/^Scale 1:\d+/).count()).toBe(1);
    await page.getByText(/parts laid out in PW-EN-/).waitFor();
    await screenshot(page, 'drawings-layout');
    await list.getByRole('button', { name: /Terminal plan/ }).click();
    await page.getByText(/terminals, the \d+ terminal blocks of the bill of materials/).waitFor();
    await list.getByRole('button', { name: /Panel marking/ }).click();
    await page
      .getByRole('img', { name: /Panel marking/ })
      .locator('text')
      .filter({ hasText: 'INDUSTRIAL CONTROL PANEL' })
      .waitFor();
    await screenshot(page, 'drawings-nameplate');
  });
});
