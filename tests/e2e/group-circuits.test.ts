// A group of motors on one branch circuit (NEC 2023 430.53) as the panel builder sees it in the browser: the
// group with its path on the Protection page and the group breaker on each grouped motor's one-line.
// 10 hp and two 5 hp at 460 V (Table 430.250: 14 A, 7.6 A), listed for group installation at 60 A:
// 430.53(C)(4) 35 A (Table 430.52, 250 %) + 7.6 + 7.6 = 50.2 A → 50 A (Table 240.6(A)); hand-worked.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { baseUrl, launch, newPage, screenshot, signInThroughForm } from '../setup/browser';

const group = { supply: 'ac3', volts: 460, environment: 'indoor-dry', branchGroup: 'G-1', groupListedMaxAmps: 60 };

describe('motors on one branch circuit in the browser', () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launch();
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('shows the group, its 430.53 path and device on the Protection page, and the group breaker on the one-lines', async () => {
    const page = await newPage(browser);
    await signInThroughForm(page, 'designer');
    await page.waitForURL(/\/jobs$/);
    const api = page.request;
    const token = ((await (await api.get(`${baseUrl()}/api/auth/csrf`)).json()) as { token: string }).token;
    const post = async (path: string, data: unknown) => {
      const r = await api.post(`${baseUrl()}${path}`, { data, headers: { 'x-csrf-token': token } });
      expect(r.status(), `${path}: ${await r.text()}`).toBeLessThan(300);
      return r.json();
    };
    const job = await post('/api/jobs', { number: `GC-${Date.now().toString(36)}`, name: 'Conveyor line', availableFaultKa: 22 });
    const panel = await post(`/api/jobs/${job.id}/panels`, { name: 'CV-MCC' });
    for (const [tag, hp] of [
      ['CV-1', 10],
      ['CV-2', 5],
      ['CV-3', 5],
    ] as const)
      await post(`/api/panels/${panel.id}/loads`, { answers: { ...group, tag, hp } });
    await post(`/api/panels/${panel.id}/bom/rebuild`, {});

    await page.goto(`${baseUrl()}/jobs/${job.id}/panels/${panel.id}/protection`);
    const section = page.getByRole('region', { name: 'Motors on one branch circuit' });
    await section.getByText('G-1: CV-1, CV-2, CV-3 at 460 V').waitFor();
    await section.getByText(/430\.53\(C\) applies: one inverse-time circuit breaker of 50 A/).waitFor();
    await section.getByText('✔ every group allowed by 430.53').waitFor();
    expect(await section.getByRole('table', { name: 'G-1 taps and overloads' }).getByRole('row').count()).toBe(4);
    // each grouped motor's card says the group's device serves it
    await page
      .getByText(/On group G-1: one inverse-time circuit breaker of 50 A serves CV-1, CV-2, CV-3 \(430\.53\(C\)\)/)
      .first()
      .waitFor();
    expect(await page.getByText(/On group G-1: one inverse-time circuit breaker of 50 A/).count()).toBe(3);
    await screenshot(page, 'group-circuits');

    await page.goto(`${baseUrl()}/jobs/${job.id}/panels/${panel.id}/drawings`);
    const cv2 = page.getByRole('img', { name: /^One-line of CV-2:/ });
    await cv2.waitFor();
    expect(await cv2.locator('title').textContent()).toMatch(/50 A inverse-time .*group G-1 \(430\.53\(C\)\)/);
  });
});
