import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { baseUrl, launch, newPage, screenshot, signInThroughForm } from '../setup/browser';

describe('sign-in in the browser', () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launch();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('sends a signed-out visitor to the sign-in page and back to the jobs list after sign-in', async () => {
    const page = await newPage(browser);
    await page.goto(`${baseUrl()}/jobs`);
    await page.waitForURL(/\/sign-in/);
    await signInThroughForm(page, 'designer');
    await page.waitForURL(/\/jobs$/);
    const table = page.getByRole('table', { name: 'Jobs' });
    await table.waitFor();
    await expect(table.getByRole('link', { name: 'J-2041' }).isVisible()).resolves.toBe(true);
    await expect(page.getByText('Raw water pump station upgrade').isVisible()).resolves.toBe(true);
    await expect(page.getByRole('link', { name: '+ New job' }).isVisible()).resolves.toBe(true);
    await screenshot(page, 'jobs-list-designer');
  });

  it('shows a clear message for a wrong password and stays on the sign-in page', async () => {
    const page = await newPage(browser);
    await page.goto(`${baseUrl()}/sign-in`);
    await page.getByLabel('E-mail').fill('designer@copperline.test');
    await page.getByLabel('Password').fill('wrong-password-123');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByRole('alert').waitFor();
    expect(await page.getByRole('alert').textContent()).toContain('do not match');
    expect(page.url()).toContain('/sign-in');
  });

  it('hides the new-job action from an estimator and shows a 404 page for an unknown address', async () => {
    const page = await newPage(browser);
    await signInThroughForm(page, 'estimator');
    await page.waitForURL(/\/jobs$/);
    await page.getByRole('table', { name: 'Jobs' }).waitFor();
    expect(await page.getByRole('link', { name: '+ New job' }).count()).toBe(0);
    await page.goto(`${baseUrl()}/no/such/page`);
    await page.getByRole('heading', { name: 'No such page' }).waitFor();
  });
});
