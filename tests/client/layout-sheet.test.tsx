// The Drawings section's backplate layout sheet: listed beside the other sheets, drawn from layout.svg, with
// its enclosure and every part it could not place named beside it.
import { describe, expect, it } from 'vitest';
import { fireEvent, screen } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { Sheets } from '../../src/features/drawings/components/sheets';
import type { DrawingsView } from '../../shared/drawings/panel-drawings';
import { renderRoute } from './render';
import { server } from './server';

const VIEW: DrawingsView = {
  drawingNumber: 'J-2041-MCC-1',
  sheets: [
    { number: 'J-2041-MCC-1-01', title: 'Supply, main disconnect and control power', kind: 'supply' },
    { number: 'J-2041-MCC-1-02', title: 'Backplate layout', kind: 'layout' },
  ],
  standard: 'Symbols: IEEE 315 / NEMA ICS 19 (ladder diagram, US practice)',
  colourPractice: '',
  warnings: [],
  bomTerminalBlocks: 0,
  terminals: [],
  wires: [],
  buckets: [],
  layout: {
    enclosure: { code: 'PW-EN-12-120X80X30', description: 'Enclosure', heightMm: 1200, widthMm: 800, depthMm: 300 },
    sections: 1,
    placedCount: 31,
    unplaced: [
      {
        tag: '2SST',
        bucket: 'P-102',
        code: null,
        category: 'soft-starter',
        description: 'Unmatched — Soft starters',
        reason: 'no catalogue part matched, so no dimensions to lay it out by',
      },
    ],
  },
};

describe('backplate layout sheet', () => {
  it('shows the layout sheet with its enclosure and names the part it could not place', async () => {
    let asked = 0;
    server.use(
      http.get('/api/panels/5/drawings/schematic.svg', () => new HttpResponse('<svg xmlns="http://www.w3.org/2000/svg"></svg>')),
      http.get('/api/panels/5/drawings/layout.svg', () => {
        asked++;
        return new HttpResponse('<svg xmlns="http://www.w3.org/2000/svg"><text>Scale 1:10</text></svg>', {
          headers: { 'content-type': 'image/svg+xml' },
        });
      }),
    );
    renderRoute([{ path: '/', element: <Sheets panelId={5} view={VIEW} /> }], '/');
    expect(screen.getByRole('link', { name: /Backplate layout \(\.svg\)/ }).getAttribute('href')).toBe('/api/panels/5/drawings/layout.svg');
    fireEvent.click(screen.getByRole('button', { name: /Backplate layout/ }));
    await screen.findByRole('img', { name: 'J-2041-MCC-1-02 Backplate layout' });
    expect(asked).toBe(1);
    expect(screen.getByText(/31 parts laid out in PW-EN-12-120X80X30 \(1200 × 800 × 300 mm\)/)).toBeTruthy();
    const alert = screen.getByRole('alert');
    expect(alert.textContent).toContain('1 part not placed');
    expect(alert.textContent).toContain('2SST Unmatched — Soft starters (P-102): no catalogue part matched');
  });
});
