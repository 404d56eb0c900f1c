// The motor list of a panel whose roll-up has a shared drive: the note the panel builder reads above the rows.
// Figures: NEC 2023 Table 430.250 at 460 V (10 hp 14 A, 7.5 hp 11 A, 5 hp 7.6 A), input device 90 A (430.130(A)(1)).
import { describe, expect, it } from 'vitest';
import { screen, within } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { Component as Motors } from '../../src/app/routes/panel/motors';
import { sharedDrives } from '../../shared/calc/shared-drives';
import { LoadSchema } from '../../shared/schemas/load';
import type { PanelRollup } from '../../shared/schemas/selection';
import { motor, selector, supply480 } from '../unit/engine/selector-setup';
import type { CurrentUser } from '../../shared/schemas/auth';
import { meHandler, server } from './server';
import { JOB, panelDetail, renderRoute } from './render';

async function rollupWithDrive(): Promise<PanelRollup> {
  const loads = [
    ['CV-1', 10],
    ['CV-2', 7.5],
    ['CV-3', 5],
  ].map(([tag, hp]) => motor({ tag: tag as string, hp: hp as number, speedControl: 'variable', sharedDrive: 'VFD-1' }));
  const out = await selector.selectPanel({ supply: supply480, loads });
  const r = sharedDrives(
    loads.map((l, i) => ({ load: LoadSchema.parse(l), selection: out.results[i]!, onBus: true })),
    { ambientC: 30 },
    '2023',
  );
  return { ...out.panel, sharedDrives: r.drives };
}

const DESIGNER: CurrentUser = {
  id: 7,
  organisationId: 1,
  organisationName: 'Harbourside Controls',
  email: 'robin@example.test',
  name: 'Robin Castell',
  roles: ['designer'],
};

describe('motor list with a shared drive', () => {
  it('says which motors share VFD-1, its sums and its input device, and what replaces their own rows', async () => {
    const PANEL = panelDetail({ rollup: await rollupWithDrive() });
    server.use(
      meHandler(DESIGNER),
      http.get(`/api/panels/${PANEL.id}`, () => HttpResponse.json(PANEL)),
    );
    renderRoute([{ path: '/jobs/:jobId/panels/:panelId/motors', element: <Motors /> }], `/jobs/${JOB.id}/panels/${PANEL.id}/motors`);
    const note = await screen.findByRole('note', { name: 'Motors on a shared drive' });
    expect(within(note).getByText(/^VFD-1 feeds CV-1, CV-2, CV-3 at 460 V: sum of FLC 32\.6 A/)).toBeTruthy();
    expect(note.textContent).toMatch(/input device 90 A inverse-time breaker/);
    expect(note.textContent).toMatch(/each motor's own overload relay and output contactor/);
  });

  it('shows no note without a shared drive', async () => {
    const PANEL = panelDetail();
    server.use(
      meHandler(DESIGNER),
      http.get(`/api/panels/${PANEL.id}`, () => HttpResponse.json(PANEL)),
    );
    renderRoute([{ path: '/jobs/:jobId/panels/:panelId/motors', element: <Motors /> }], `/jobs/${JOB.id}/panels/${PANEL.id}/motors`);
    await screen.findByRole('link', { name: '+ Add motor' });
    expect(screen.queryByRole('note', { name: 'Motors on a shared drive' })).toBeNull();
  });
});
