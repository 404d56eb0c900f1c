// An engineer keeps the shop's tested combination ratings (UL 508A SB4) from the Catalogue page:
// a rating above the breaker's own interrupting rating is refused on the field, a valid one is listed
// and can be set aside. Combination data here is invented.
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

describe('tested combination ratings', () => {
  it('lets an engineer add one, refuses a rating above the breaker’s, and sets one aside', async () => {
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
  });
});
