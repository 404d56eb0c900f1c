// The whole path of the three users: a designer adds motors through the wizard and by import and
// submits; an engineer returns the panel with a comment and then signs off the fix; an estimator
// downloads the bill of materials and sees the difference between two revisions. Then a new job whose
// voltage unbalance the form works out from three measured voltages.
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import ExcelJS from 'exceljs';
import type { Browser, Page } from 'playwright-core';
import { launch, newPage, screenshot, signInThroughForm } from '../setup/browser';

let browser: Browser;
let panelUrl = '';

async function fillWizard(
  page: Page,
  v: { tag: string; hp: string; fla?: string; serviceFactor?: string; reversing?: boolean; reverseHazard?: boolean },
) {
  await page.getByLabel('Tag', { exact: true }).fill(v.tag);
  // a new motor starts with no supply, voltage or service factor: the nameplate's answers are typed
  await page.getByLabel('Supply').selectOption('ac3');
  await page.getByLabel('Rated voltage').fill('460');
  await page.getByLabel('Horsepower').fill(v.hp);
  if (v.fla) await page.getByLabel('Nameplate FLA').fill(v.fla);
  if (v.serviceFactor) await page.getByLabel('Service factor').fill(v.serviceFactor);
  await page.getByRole('button', { name: /2\. Duty/ }).click();
  if (v.reversing) await page.getByLabel('Runs in both directions').check();
  await page.getByRole('button', { name: /3\. Site & hazards/ }).click();
  if (v.reverseHazard) await page.getByLabel(/Running backwards would damage/).check();
}

/** The designer submits from the Sign-off section; an engineer signs off the expected revision. */
async function submitAndSignOff(page: Page, revision: string) {
  await page.getByRole('link', { name: 'Sign-off' }).click();
  await page.getByRole('button', { name: 'Submit for sign-off' }).click();
  await page.locator('[data-state="in_review"]').first().waitFor();
  const eng = await newPage(browser);
  await signInThroughForm(eng, 'engineer');
  await eng.waitForURL(/\/jobs$/);
  await eng.goto(`${panelUrl}/sign-off`);
  // J-2042 has 22 kA available; unmarked contactors and overload relays are taken at 5 kA (UL 508A
  // Table SB4.1, from memory), so NEC 409.22 asks the engineer to acknowledge the rating with a reason
  const sccrLine = eng.getByTestId('sign-off-sccr');
  await sccrLine.waitFor();
  expect(await sccrLine.textContent()).toMatch(/^✖ Panel SCCR [\d.]+ kA is below the 22 kA available at the site \(NEC 409\.22\)\.$/);
  // the heat verdict stands beside it (IEC TR 60890 simplified): a temperature in one decimal against the limit
  expect(await eng.getByTestId('sign-off-heat').textContent()).toMatch(/Inside the enclosure \d+\.\d °C against a \d+ °C limit/);
  const sign = eng.getByRole('button', { name: new RegExp(`Sign off as ${revision}`) });
  expect(await sign.isDisabled()).toBe(true);
  await eng.getByLabel(/I sign off with this rating/).check();
  await eng.getByLabel('Sign-off comment').fill('Class J fuses upstream per the fault study');
  await sign.click();
  await eng.locator('[data-state="signed_off"]').first().waitFor();
}

beforeAll(async () => {
  browser = await launch();
});
afterAll(async () => {
  await browser?.close();
});

describe('designer → engineer → estimator', () => {
  it('designer creates a panel, adds a motor with the wizard (live preview), imports two more and submits', async () => {
    const page = await newPage(browser);
    await signInThroughForm(page, 'designer');
    await page.waitForURL(/\/jobs$/);
    await page.getByRole('link', { name: 'J-2042' }).click();
    await page.getByLabel('New panel name').fill('MCC-S Sludge press');
    await page.getByRole('button', { name: '+ Add panel' }).click();
    await page.getByRole('link', { name: 'MCC-S Sludge press' }).click();
    await page.waitForURL(/\/panels\/\d+\/motors$/);
    panelUrl = page.url().replace(/\/motors$/, '');

    await page.getByRole('link', { name: '+ Add motor' }).click();
    // Enter on the first step moves to the next step; it never saves answers the user has not seen
    await page.getByLabel('Tag', { exact: true }).fill('SP-1');
    await page.getByLabel('Tag', { exact: true }).press('Enter');
    await page.getByLabel('Load inertia').waitFor();
    expect(await page.getByRole('button', { name: /2\. Duty/ }).getAttribute('aria-current')).toBe('step');
    expect(page.url()).toMatch(/\/motors\/new$/);
    await page.getByRole('button', { name: /1\. Nameplate/ }).click();
    // with no service factor given, the live preview shows the engine's assumption (430.32(A)(1), 115 %)
    await page.getByLabel('Supply').selectOption('ac3');
    await page.getByLabel('Rated voltage').fill('460');
    await page.getByLabel('Horsepower').fill('25');
    await page.getByLabel('Nameplate FLA').fill('31');
    const preview = page.getByRole('complementary', { name: 'Selection preview' });
    await preview.getByText(/≤ 35\.65 A \(115 %\)/).waitFor(); // 31 A × 115 %, NEC 2023 430.32(A)(1)
    await preview.getByText(/Service factor = 1\.0/).waitFor();
    await page.getByLabel('Horsepower').press('Enter');
    await page.getByLabel('Load inertia').waitFor();
    await page.getByRole('button', { name: /1\. Nameplate/ }).click();
    await fillWizard(page, { tag: 'SP-1', hp: '25', fla: '31', serviceFactor: '1.15', reversing: true, reverseHazard: true });
    // the live preview runs the engine in the browser: FVR with phase reversal for this motor
    await preview.getByText(/FVR size 2/).waitFor();
    await preview.getByText(/Phase reversal/).waitFor();
    await screenshot(page, 'wizard-preview');
    await page.getByRole('button', { name: 'Add motor' }).click();
    await page.waitForURL(/\/motors$/);
    const motors = page.getByRole('table', { name: 'Motors' });
    await motors.getByRole('link', { name: 'SP-1' }).waitFor();

    await page.getByRole('link', { name: 'Import motor list' }).click();
    const csv = path.join(os.tmpdir(), `motors-${Date.now()}.csv`);
    fs.writeFileSync(
      csv,
      'tag,description,supply,hp,volts,environment\r\nSP-2,Polymer pump,ac3,5,460,washdown\r\nSP-3,Cake conveyor,ac3,10,460,indoor-dusty\r\n',
    );
    await page.getByLabel('Motor list file').setInputFiles(csv);
    await page.getByText('✔ 2 rows are ready to import.').waitFor();
    await page.getByRole('button', { name: /Import 2 motors/ }).click();
    await page.waitForURL(/\/motors$/);
    await motors.getByRole('link', { name: 'SP-3' }).waitFor();
    await screenshot(page, 'motors-list');

    await page.getByRole('link', { name: 'Sign-off' }).click();
    await page.getByRole('button', { name: 'Submit for sign-off' }).click();
    await page.locator('[data-state="in_review"]').first().waitFor();
  });

  it('engineer reviews the protection choices, comments on a motor and returns the panel', async () => {
    const page = await newPage(browser);
    await signInThroughForm(page, 'engineer');
    await page.waitForURL(/\/jobs$/);
    // the jobs page puts the engineer's queue first: the submitted panel, opened at its Protection section
    await page
      .getByRole('navigation', { name: 'Main' })
      .getByRole('link', { name: /^Jobs\s*[1-9]\d* waiting for you$/ })
      .waitFor();
    const waiting = page.getByRole('region', { name: 'Sign-off queue' }).getByLabel('Waiting for sign-off');
    await waiting.getByText('your next work').waitFor();
    await waiting.getByRole('link', { name: 'J-2042 · MCC-S Sludge press' }).click();
    await page.waitForURL(`${panelUrl}/protection`);
    const card = page.getByRole('article', { name: 'Motor SP-1' });
    await card
      .getByText(/430\.52/)
      .first()
      .waitFor();
    // the overload relay's dial at the nameplate FLA of 31 A; the trip limit 125 % = 38.75 A (NEC 2023 430.32(A)(1))
    await card.getByText('dial at 31 A (nameplate FLA)').waitFor();
    await card.getByText(/≤ 38\.75 A \(125 %\)/).waitFor();
    await card.getByLabel('Comment on SP-1').fill('Use a dual-element fuse for SP-1');
    await card.getByRole('button', { name: 'Comment' }).click();
    await card.getByText('Use a dual-element fuse for SP-1').waitFor();
    await screenshot(page, 'protection-review');
    await page.getByRole('link', { name: 'Sign-off' }).click();
    await page.getByLabel('Sign-off comment').fill('Change SP-1 to fuses, then resubmit');
    await page.getByRole('button', { name: '↩ Return to designer' }).click();
    await page.locator('[data-state="returned"]').first().waitFor();
    // returned: the next move is the panel builder's, and the engineer is told so instead of an empty form
    await page.getByTestId('sign-off-waiting').waitFor();
    expect(await page.getByLabel('Sign-off comment').count()).toBe(0);
  });

  it('designer fixes the motor and resubmits; engineer signs off R0', async () => {
    const page = await newPage(browser);
    await signInThroughForm(page, 'designer');
    await page.waitForURL(/\/jobs$/);
    await page.goto(`${panelUrl}/motors`);
    await page.getByRole('table', { name: 'Motors' }).getByRole('link', { name: 'SP-1' }).click();
    await page.getByRole('button', { name: /4\. Protection/ }).click();
    await page.getByLabel('Branch protective device').selectOption('dual-element-fuse');
    await page
      .getByRole('complementary', { name: 'Selection preview' })
      .getByText(/Dual-element fuse 60 A/)
      .waitFor();
    await page.getByRole('button', { name: 'Save motor' }).click();
    await page.waitForURL(/\/motors$/);
    await submitAndSignOff(page, 'R0');
  });

  it('a change order makes R1; the estimator downloads the .xlsx and sees the difference R0 → R1', async () => {
    const page = await newPage(browser);
    await signInThroughForm(page, 'designer');
    await page.waitForURL(/\/jobs$/);
    await page.goto(`${panelUrl}/motors/new`);
    await fillWizard(page, { tag: 'SP-4', hp: '15' });
    await page.getByRole('button', { name: 'Add motor' }).click();
    await page.waitForURL(/\/motors$/);
    await submitAndSignOff(page, 'R1');

    const est = await newPage(browser);
    await signInThroughForm(est, 'estimator');
    await est.waitForURL(/\/jobs$/);
    await est.goto(`${panelUrl}/sign-off`);
    const report = est.getByLabel('Change report');
    await report.getByText(/Motors added:\s*SP-4/).waitFor();
    const delta = await report.getByTestId('sell-delta').textContent();
    expect(delta).toMatch(/^\+\$[\d,]+\.\d\d$/);
    await screenshot(est, 'change-report');
    // the change-order price as a workbook: the sell price change matches the page
    const [changes] = await Promise.all([
      est.waitForEvent('download'),
      report.getByRole('link', { name: 'Download R0 → R1 (.xlsx)' }).click(),
    ]);
    const cw = new ExcelJS.Workbook();
    await cw.xlsx.readFile((await changes.path())!);
    const sell = cw
      .getWorksheet('Summary')!
      .getRows(1, 12)!
      .find((r) => r.getCell(1).value === 'Sell price')!;
    const result = (sell.getCell(4).value as { result: number }).result;
    expect(`+${result.toLocaleString('en-US', { style: 'currency', currency: 'USD' })}`).toBe(delta);

    await est.goto(`${panelUrl}/bill-of-materials`);
    const [download] = await Promise.all([
      est.waitForEvent('download'),
      est
        .getByRole('link', { name: /\.xlsx/ })
        .first()
        .click(),
    ]);
    const file = await download.path();
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.readFile(file!);
    const names = wb.worksheets.map((w) => w.name);
    expect(names.some((n) => /summary/i.test(n))).toBe(true);
    expect(JSON.stringify(wb.worksheets.map((w) => w.getSheetValues()))).toContain('SP-4');
  });

  it('a selection stored by an earlier release: the panel names what the current rules change, and the designer selects again', async () => {
    // imitate an earlier release by writing an older-looking breaker rating into SP-1's stored selection
    const { default: pg } = await import('pg');
    const client = new pg.Client({ connectionString: inject('e2eDatabaseUrl') });
    await client.connect();
    const panelId = Number(/\/panels\/(\d+)$/.exec(panelUrl)![1]);
    const engine = await client.query(`SELECT selection->'scpd'->>'ratingAmps' AS amps FROM loads WHERE panel_id = $1 AND tag = 'SP-1'`, [
      panelId,
    ]);
    const updated = await client.query(
      `UPDATE loads SET selection = jsonb_set(selection, '{scpd,ratingAmps}', '999') WHERE panel_id = $1 AND tag = 'SP-1'`,
      [panelId],
    );
    await client.end();
    expect(updated.rowCount).toBe(1);

    const page = await newPage(browser);
    await signInThroughForm(page, 'designer');
    await page.waitForURL(/\/jobs$/);
    await page.goto(`${panelUrl}/motors`);
    const banner = page.getByRole('region', { name: 'Current rules' });
    await banner.getByText(/^⟳ 1 of \d+ motors would select differently under the current rules and tables\.$/).waitFor();
    await banner.getByText(/What would change/).click();
    const row = banner.getByRole('table', { name: 'What the current rules would change' }).getByRole('row').filter({ hasText: 'SP-1' });
    expect(await row.getByRole('cell').allTextContents()).toEqual(['SP-1', 'Branch protection (A)', '999', engine.rows[0].amps]);
    await screenshot(page, 'rule-check');
    // the panel is signed off as R1: selecting again opens a new draft
    await banner.getByRole('button', { name: 'Select again (opens a draft after R1)' }).click();
    await page.getByRole('status').filter({ hasText: 'Selected again under the current rules.' }).waitFor();
    await page.locator('[data-state="draft"]').first().waitFor();
    expect(await page.getByRole('region', { name: 'Current rules' }).count()).toBe(0);
    await page.goto(`${panelUrl}/activity`);
    await page.getByText('Selected 4 motors again under the current rules: SP-1 (branch protection)').first().waitFor();
  });
});

describe('new job', () => {
  it('takes the voltage unbalance from three measured voltages', async () => {
    const page = await newPage(browser);
    await signInThroughForm(page, 'designer');
    await page.waitForURL(/\/jobs$/);
    await page.getByRole('link', { name: '+ New job' }).click();
    await page.getByLabel('Job number').fill(`J-UB-${Date.now().toString(36)}`);
    await page.getByLabel('Name', { exact: true }).fill('Intake screens (unbalanced supply)');
    await page.getByText('Work it out from three line voltages').click();
    await page.getByLabel('Measured voltage L1–L2').fill('460');
    await page.getByLabel('Measured voltage L2–L3').fill('467');
    await page.getByLabel('Measured voltage L3–L1').fill('450');
    // 100 × 9 / 459 = 1.96 % (NEMA MG 1 14.36)
    await page.getByRole('button', { name: 'Use 1.96 %' }).click();
    await page.getByRole('button', { name: 'Create job' }).click();
    await page.waitForURL(/\/jobs\/\d+$/);
    await page.getByText('1.96 %').waitFor();
  });
});
