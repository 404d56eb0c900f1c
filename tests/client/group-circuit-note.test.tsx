// The motor list of a panel whose roll-up groups motors on one branch circuit: the note the panel builder
// reads above the rows, which still show each motor's own 430.52 device. Figures: NEC 2023 Table 430.250 at
// 460 V (10 hp 14 A, 5 hp 7.6 A); 430.53(C)(4): 35 + 7.6 + 7.6 = 50.2 → 50 A (Table 240.6(A), next lower);
// group conductor 430.24: 1.25 × 14 + 7.6 + 7.6 = 32.7 A → 10 AWG (Table 310.16, 75 °C copper).
import { describe, expect, it } from 'vitest';
import { screen } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { Component as Motors } from '../../src/app/routes/panel/motors';
import { LoadSchema, SupplySchema } from '../../shared/schemas/load';
import type { PanelRollup } from '../../shared/schemas/selection';
import type { CurrentUser } from '../../shared/schemas/auth';
import { panelRollupOf } from '../../shared/engine/rollup';
import { motor, selector, supply480 } from '../unit/engine/selector-setup';
import { meHandler, server } from './server';
import { JOB, panelDetail, renderRoute } from './render';

const DESIGNER: CurrentUser = {
  id: 7,
  organisationId: 1,
  organisationName: 'Harbourside Controls',
  email: 'robin@example.test',
  name: 'Robin Castell',
  roles: ['designer'],
};

async function rollupOf(listedMaxAmps: number | undefined): Promise<PanelRollup> {
  const loads = [
    ['CV-1', 10],
    ['CV-2', 5],
    ['CV-3', 5],
  ].map(([tag, hp]) =>
    motor({ tag: tag as string, hp: hp as number, branchGroup: 'G-1', ...(listedMaxAmps ? { groupListedMaxAmps: listedMaxAmps } : {}) }),
  );
  const out = await selector.selectPanel({ supply: supply480, loads });
  return panelRollupOf(
    SupplySchema.parse(supply480),
    loads.map((l) => LoadSchema.parse(l)),
    out.results,
    '2023',
  );
}

function show(rollup: PanelRollup) {
  const PANEL = panelDetail({ rollup });
  server.use(
    meHandler(DESIGNER),
    http.get(`/api/panels/${PANEL.id}`, () => HttpResponse.json(PANEL)),
  );
  renderRoute([{ path: '/jobs/:jobId/panels/:panelId/motors', element: <Motors /> }], `/jobs/${JOB.id}/panels/${PANEL.id}/motors`);
}

describe('motor list with motors on one branch circuit', () => {
  it("names the group's motors, its one device and path, and what it replaces in the rows", async () => {
    show(await rollupOf(60));
    const note = await screen.findByRole('note', { name: 'Motors on one branch circuit' });
    expect(note.textContent).toMatch(/G-1 feeds CV-1, CV-2, CV-3 at 460 V through one 50 A inverse-time breaker \(NEC 430\.53\(C\)\)/);
    expect(note.textContent).toMatch(/group conductor 10 AWG/);
    expect(note.textContent).toMatch(/their own protective device is replaced by the group's/);
  });

  it('shows no group note for a refused group (its motors keep their own devices)', async () => {
    show(await rollupOf(undefined));
    await screen.findByRole('link', { name: '+ Add motor' });
    expect(screen.queryByRole('note', { name: 'Motors on one branch circuit' })).toBeNull();
  });
});
