// A designer opens a job with the site's measured voltages: the form works the percent unbalance out
// (NEMA MG 1 14.36) and the job page shows it.
import { afterAll, beforeAll, describe, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { launch, newPage, signInThroughForm } from '../setup/browser';

let browser: Browser;
beforeAll(async () => {
  browser = await launch();
});
afterAll(async () => {
  await browser?.close();
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
