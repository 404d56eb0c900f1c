import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { baseUrl, launch, newPage, screenshot, signInThroughForm } from '../setup/browser';

describe('shop settings in the browser', () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launch();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('lets the admin set the address and the drawing-number scheme, refusing a scheme without a sheet number', async () => {
    const page = await newPage(browser);
    await signInThroughForm(page, 'admin');
    await page.waitForURL(/\/jobs$/);
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Shop settings' }).click();
    await page.waitForURL(/\/settings$/);
    const scheme = page.getByLabel('Drawing-number scheme');
    await scheme.waitFor();
    expect(await page.getByLabel('Shop name').inputValue()).toBe('Copperline Panel Works (demo)');
    await page.getByLabel('Address').fill('18 Tinsmith Row\nKestrel Flats');
    await scheme.fill('{job}-{panel}');
    await page.getByRole('button', { name: 'Save settings' }).click();
    expect(await page.getByRole('alert').first().textContent()).toContain('Put {sheet} in the scheme');
    await scheme.fill('CPW-{job}-{panel}-{sheet:2}');
    // job J-2041, panel "MCC 1": the space becomes a dash, the sheet two digits
    expect(await page.getByTestId('scheme-preview').textContent()).toContain('CPW-J-2041-MCC-1-01');
    await page.getByRole('button', { name: 'Save settings' }).click();
    await page.getByText('✔ Saved.').waitFor();
    await screenshot(page, 'shop-settings');
    await page.reload();
    await scheme.waitFor();
    expect(await scheme.inputValue()).toBe('CPW-{job}-{panel}-{sheet:2}');
    expect(await page.getByLabel('Address').inputValue()).toBe('18 Tinsmith Row\nKestrel Flats');
  });

  it('shows the shop settings to the admin only', async () => {
    const page = await newPage(browser);
    await signInThroughForm(page, 'designer');
    await page.waitForURL(/\/jobs$/);
    expect(await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Shop settings' }).count()).toBe(0);
    await page.goto(`${baseUrl()}/settings`);
    await page.getByText('Only a shop administrator changes the shop settings.').waitFor();
  });
});
