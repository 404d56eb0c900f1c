// The sign-off section as the panel builder and the engineer meet it: the state of the panel, the checks
// shown before signing, and what the screen says when the server takes an action and when it refuses it.
import { describe, expect, it } from 'vitest';
import { fireEvent, screen, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { Component as SignOff } from '../../src/app/routes/panel/sign-off';
import type { CurrentUser, Role } from '../../shared/schemas/auth';
import type { PanelDetail } from '../../shared/schemas/panel';
import { apiError, meHandler, server } from './server';
import { JOB, panelDetail, renderRoute } from './render';

const user = (name: string, roles: Role[]): CurrentUser => ({
  id: roles.length,
  organisationId: 1,
  organisationName: 'Harbourside Controls',
  email: `${name.split(' ')[0].toLowerCase()}@example.test`,
  name,
  roles,
});
const DESIGNER = user('Robin Castell', ['designer']);
const ENGINEER = user('Dana Whitfield', ['engineer']);

/** The panel as the server holds it; an action the server takes moves it on, as the real one does. */
function panelServer(start: PanelDetail, me: CurrentUser) {
  let panel = start;
  const posted: Array<{ action: string; body: Record<string, unknown> }> = [];
  server.use(
    meHandler(me),
    http.get(`/api/panels/${start.id}`, () => HttpResponse.json(panel)),
    http.post(`/api/panels/${start.id}/:action`, async ({ request, params }) => {
      const body = (await request.json()) as Record<string, unknown>;
      posted.push({ action: String(params.action), body });
      if (params.action === 'submit') panel = { ...panel, status: 'in_review', version: panel.version + 1 };
      if (params.action === 'approve')
        panel = {
          ...panel,
          status: 'signed_off',
          revisionNumber: 0,
          version: panel.version + 1,
          revisions: [{ number: 0, approvedAt: '2026-11-03T14:00:00.000Z', approvedBy: me.name }],
        };
      return HttpResponse.json(panel);
    }),
  );
  return { posted };
}

/** The part of the checks answer the sign-off section reads (the full answer: shared/schemas/checks.ts). */
const checksWithSccr = (panelSccrKa: number, verdict: 'adequate' | 'below-available') =>
  http.get(`/api/panels/12/checks`, () =>
    HttpResponse.json({
      sccr: { verdict, panelSccrKa, availableFaultKa: JOB.availableFaultKa, limiting: [] },
      heat: { result: null },
      controlPower: { fitted: null, result: null },
      bom: { source: 'stored', stale: false, unmatchedLines: 0, note: null },
    }),
  );

/** The section's other reads while a panel is in review: its bill of materials (for the swaps) and whether this engineer may sign (separation of duties). */
const reviewReads = (reason: string | null = null) => [
  http.get('/api/panels/12/bom', () => HttpResponse.json({ lines: [], totals: null, generatedAt: null, stale: false })),
  http.get('/api/panels/12/sign-off-eligibility', () =>
    HttpResponse.json({ selfReview: reason !== null, allowed: false, actions: [], reason }),
  ),
];

const openSignOff = (panel: PanelDetail) =>
  renderRoute([{ path: '/jobs/:jobId/panels/:panelId/sign-off', element: <SignOff /> }], `/jobs/${JOB.id}/panels/${panel.id}/sign-off`);

const signOffSection = async () => (await screen.findByRole('heading', { name: /^Sign-off/ })).closest('section') as HTMLElement;

describe('sign-off section, panel builder', () => {
  it('shows a draft panel and, once submitted, that it waits for an engineer', async () => {
    const { posted } = panelServer(panelDetail({ status: 'draft' }), DESIGNER);
    openSignOff(panelDetail());
    const section = await signOffSection();
    expect(within(section).getByText('Draft')).toBeTruthy();
    fireEvent.change(within(section).getByRole('textbox', { name: 'Sign-off comment' }), { target: { value: 'Ready for review' } });
    fireEvent.click(await within(section).findByRole('button', { name: 'Submit for sign-off' }));
    expect(await within(section).findByText(/Waiting for an engineer/)).toBeTruthy();
    expect(within(section).getByText('In review')).toBeTruthy();
    expect(posted).toEqual([{ action: 'submit', body: { version: 3, comment: 'Ready for review' } }]);
    expect(screen.getByRole('heading', { name: 'Change report' })).toBeTruthy();
  });

  it('shows the server error and keeps the panel a draft when the server refuses', async () => {
    panelServer(panelDetail({ status: 'draft' }), DESIGNER);
    server.use(
      http.post('/api/panels/12/submit', () =>
        apiError(409, 'conflict', 'Someone changed this panel since you opened it. Reload and try again.'),
      ),
    );
    openSignOff(panelDetail());
    const section = await signOffSection();
    fireEvent.click(await within(section).findByRole('button', { name: 'Submit for sign-off' }));
    const alert = await within(section).findByRole('alert');
    expect(alert.textContent).toMatch(/Someone changed this panel since you opened it/);
    expect(within(section).getByText('Draft')).toBeTruthy();
  });
});

describe('sign-off section, engineer', () => {
  it('shows the short-circuit rating before signing and the new revision after', async () => {
    const { posted } = panelServer(panelDetail({ status: 'in_review' }), ENGINEER);
    server.use(checksWithSccr(65, 'adequate'), ...reviewReads());
    openSignOff(panelDetail());
    const section = await signOffSection();
    const before = await within(section).findByRole('group', { name: 'Before you sign' });
    // NEC 409.22: the panel's SCCR against the available fault current at the site; the first revision is R0
    expect((await within(before).findByText(/Panel SCCR 65 kA covers the 65 kA available/)).textContent).toMatch(/NEC 409\.22/);
    fireEvent.click(within(section).getByRole('button', { name: /Sign off as R0/ }));
    expect(await screen.findByText(/signed off by Dana Whitfield/)).toBeTruthy();
    expect(within(section).getByText('Signed off')).toBeTruthy();
    expect(posted.map((p) => p.action)).toEqual(['approve']);
  });

  it('marks a rating below the available fault current and asks for the acknowledgement', async () => {
    panelServer(panelDetail({ status: 'in_review' }), ENGINEER);
    server.use(checksWithSccr(5, 'below-available'), ...reviewReads());
    openSignOff(panelDetail());
    const section = await signOffSection();
    expect(await within(section).findByText(/Panel SCCR 5 kA is below the 65 kA available/)).toBeTruthy();
    expect(within(section).getByRole('checkbox', { name: /I sign off with this rating/ })).toBeTruthy();
  });

  it('shows the server error when signing off fails', async () => {
    panelServer(panelDetail({ status: 'in_review' }), ENGINEER);
    server.use(
      checksWithSccr(65, 'adequate'),
      ...reviewReads(),
      http.post('/api/panels/12/approve', () => apiError(500, 'internal', 'The revision could not be frozen; the panel is unchanged.')),
    );
    openSignOff(panelDetail());
    const section = await signOffSection();
    fireEvent.click(await within(section).findByRole('button', { name: /Sign off as R0/ }));
    expect((await within(section).findByRole('alert')).textContent).toMatch(/The revision could not be frozen/);
    expect(within(section).getByText('In review')).toBeTruthy();
    expect(screen.queryByText(/signed off by/)).toBeNull();
  });
});
