import { chromium, type Browser, type Page } from 'playwright-core';
import { inject } from 'vitest';
import fs from 'node:fs';
import path from 'node:path';
import { DEMO_USERS } from '../../server/db/seeders/demo';

export const CHROMIUM_FLAGS = [
  '--headless',
  '--no-sandbox',
  '--disable-gpu',
  '--disable-background-networking',
  '--disable-component-update',
  '--no-first-run',
];

export async function launch(): Promise<Browser> {
  return chromium.launch({ executablePath: '/usr/bin/chromium', args: CHROMIUM_FLAGS, headless: true });
}

export function baseUrl() {
  return inject('baseUrl');
}

export async function newPage(browser: Browser): Promise<Page> {
  const context = await browser.newContext({ viewport: { width: 1366, height: 768 }, acceptDownloads: true });
  const page = await context.newPage();
  page.setDefaultTimeout(15_000);
  return page;
}

export async function signInThroughForm(page: Page, role: 'admin' | 'designer' | 'estimator' | 'engineer') {
  const u = DEMO_USERS.find((d) => d.roles[0] === role)!;
  await page.goto(`${baseUrl()}/sign-in`);
  await page.getByLabel('E-mail').fill(u.email);
  await page.getByLabel('Password').fill(u.password);
  await page.getByRole('button', { name: 'Sign in' }).click();
}

export async function screenshot(page: Page, name: string) {
  const dir = path.resolve(import.meta.dirname, '..', 'e2e', 'screenshots');
  fs.mkdirSync(dir, { recursive: true });
  await page.screenshot({ path: path.join(dir, `${name}.png`), fullPage: true });
}
