// The motor wizard as a panel builder meets it: the live selection preview from the browser's engine, and
// what the screen says when the server takes the motor and when it refuses it.
import { describe, expect, it } from 'vitest';
import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { Component as MotorWizard } from '../../src/app/routes/panel/motor-wizard';
import { apiError, server } from './server';
import { JOB, panelDetail, renderRoute } from './render';

const PANEL = panelDetail();
const NEW_MOTOR = `/jobs/${JOB.id}/panels/${PANEL.id}/motors/new`;

function openWizard() {
  server.use(http.get(`/api/panels/${PANEL.id}`, () => HttpResponse.json(PANEL)));
  return renderRoute(
    [
      { path: '/jobs/:jobId/panels/:panelId/motors/new', element: <MotorWizard /> },
      { path: '/jobs/:jobId/panels/:panelId/motors', element: <h1>Motors of this panel</h1> },
    ],
    NEW_MOTOR,
  );
}

/** A 10 hp, 460 V three-phase motor: NEC 2023 Table 430.250 gives 14 A. */
async function answerTenHorsepower() {
  fireEvent.change(await screen.findByRole('textbox', { name: /^Tag/ }), { target: { value: 'P-101' } });
  // the wizard pre-fills neither the supply nor the voltage: the panel builder answers them from the nameplate
  fireEvent.change(screen.getByRole('combobox', { name: /^Supply/ }), { target: { value: 'ac3' } });
  fireEvent.change(screen.getByRole('textbox', { name: /^Rated voltage/ }), { target: { value: '460' } });
  fireEvent.change(screen.getByRole('textbox', { name: /^Horsepower/ }), { target: { value: '10' } });
  fireEvent.change(screen.getByRole('textbox', { name: /^Nameplate FLA/ }), { target: { value: '13.2' } });
}

describe('motor wizard', () => {
  it('shows the wizard and the live selection preview for the answers given', async () => {
    openWizard();
    expect(await screen.findByRole('heading', { name: 'New motor' })).toBeTruthy();
    const preview = screen.getByRole('complementary', { name: 'Selection preview' });
    expect(within(preview).getByRole('heading', { name: /Selection/ })).toBeTruthy();
    await answerTenHorsepower();
    // NEC 2023 Table 430.250: 10 hp at 460 V, 14 A
    const flcRow = await waitFor(() => within(preview).getByText('Full-load current (table)').closest('tr') as HTMLElement, {
      timeout: 10_000,
    });
    expect(within(flcRow).getByText('14 A')).toBeTruthy();
    expect(flcRow.textContent).toMatch(/Table 430\.250/);
    // the caution stands wherever results are shown
    expect(within(preview).getByLabelText('Caution')).toBeTruthy();
  });

  it('says what is missing while the answers are incomplete', async () => {
    openWizard();
    fireEvent.change(await screen.findByRole('textbox', { name: /^Tag/ }), { target: { value: 'P-102' } });
    const preview = screen.getByRole('complementary', { name: 'Selection preview' });
    await waitFor(() => expect(within(preview).getByText(/Complete the answers to see the selection/)).toBeTruthy(), { timeout: 10_000 });
    expect(within(preview).queryByText(/Full-load current/)).toBeNull();
  });

  it('adds the motor and returns to the motor list when the server takes it', async () => {
    let sent: { answers: Record<string, unknown> } | null = null;
    server.use(
      http.post(`/api/panels/${PANEL.id}/loads`, async ({ request }) => {
        sent = (await request.json()) as { answers: Record<string, unknown> };
        return HttpResponse.json(
          { id: 501, tag: 'P-101', position: 1, answers: sent.answers, selection: null, effective: null, overrides: [], version: 0 },
          { status: 201 },
        );
      }),
    );
    const { router } = openWizard();
    await answerTenHorsepower();
    fireEvent.click(screen.getByRole('button', { name: 'Add motor' }));
    expect(await screen.findByRole('heading', { name: 'Motors of this panel' })).toBeTruthy();
    expect(router.state.location.pathname).toBe(`/jobs/${JOB.id}/panels/${PANEL.id}/motors`);
    expect(sent).toMatchObject({ answers: { tag: 'P-101', hp: 10, fla: 13.2, supply: 'ac3', volts: 460 } });
  });

  it('asks for the branch-circuit group and its group-installation listing and sends them with the motor (NEC 2023 430.53)', async () => {
    let sent: { answers: Record<string, unknown> } | null = null;
    server.use(
      http.post(`/api/panels/${PANEL.id}/loads`, async ({ request }) => {
        sent = (await request.json()) as { answers: Record<string, unknown> };
        return HttpResponse.json(
          { id: 502, tag: 'P-101', position: 1, answers: sent.answers, selection: null, effective: null, overrides: [], version: 0 },
          { status: 201 },
        );
      }),
    );
    openWizard();
    await answerTenHorsepower();
    fireEvent.click(screen.getByRole('button', { name: /Protection/ }));
    fireEvent.change(await screen.findByRole('textbox', { name: /^Branch-circuit group/ }), { target: { value: 'G-1' } });
    fireEvent.change(screen.getByRole('textbox', { name: /^Group-installation listing/ }), { target: { value: '60' } });
    fireEvent.click(screen.getByRole('button', { name: 'Add motor' }));
    expect(await screen.findByRole('heading', { name: 'Motors of this panel' })).toBeTruthy();
    expect(sent).toMatchObject({ answers: { tag: 'P-101', branchGroup: 'G-1', groupListedMaxAmps: 60 } });
  });

  it('shows the server error and stays on the wizard when saving fails', async () => {
    server.use(
      http.post(`/api/panels/${PANEL.id}/loads`, () => apiError(500, 'internal', 'The database did not answer; nothing was saved.')),
    );
    const { router } = openWizard();
    await answerTenHorsepower();
    fireEvent.click(screen.getByRole('button', { name: 'Add motor' }));
    const alert = await screen.findByText(/The database did not answer; nothing was saved\./);
    expect(alert.closest('[role="alert"]')).toBeTruthy();
    expect(router.state.location.pathname).toBe(NEW_MOTOR);
    expect(screen.getByRole('heading', { name: 'New motor' })).toBeTruthy();
  });

  it('puts a field error from the server beside the field', async () => {
    server.use(
      http.post(`/api/panels/${PANEL.id}/loads`, () =>
        apiError(422, 'validation_failed', 'Check the answers', [{ path: 'body.answers.tag', message: 'P-101 is already on this panel' }]),
      ),
    );
    openWizard();
    await answerTenHorsepower();
    fireEvent.click(screen.getByRole('button', { name: 'Add motor' }));
    expect(await screen.findByText(/P-101 is already on this panel/)).toBeTruthy();
    expect(screen.getByRole('textbox', { name: /^Tag/ }).getAttribute('aria-invalid')).toBe('true');
  });
});

describe('motor wizard: a motor on a shared drive', () => {
  it('asks for the shared drive only at variable speed and sends its tag with the answers', async () => {
    let sent: { answers: Record<string, unknown> } | null = null;
    server.use(
      http.post(`/api/panels/${PANEL.id}/loads`, async ({ request }) => {
        sent = (await request.json()) as { answers: Record<string, unknown> };
        return HttpResponse.json(
          { id: 502, tag: 'P-101', position: 1, answers: sent.answers, selection: null, effective: null, overrides: [], version: 0 },
          { status: 201 },
        );
      }),
    );
    openWizard();
    await answerTenHorsepower();
    fireEvent.click(screen.getByRole('button', { name: /2\. Duty/ }));
    const speed = await screen.findByRole('combobox', { name: /^Speed/ });
    expect(screen.queryByRole('textbox', { name: /^Shared drive/ })).toBeNull();
    fireEvent.change(speed, { target: { value: 'variable' } });
    fireEvent.change(await screen.findByRole('textbox', { name: /^Shared drive/ }), { target: { value: 'VFD-1' } });
    fireEvent.click(screen.getByRole('button', { name: 'Add motor' }));
    await waitFor(() => expect(sent).not.toBeNull(), { timeout: 10_000 });
    expect(sent).toMatchObject({ answers: { tag: 'P-101', speedControl: 'variable', sharedDrive: 'VFD-1' } });
  });
});
