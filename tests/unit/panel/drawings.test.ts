import { describe, expect, it } from 'vitest';
import { createElement } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import { OneLine, oneLineElements } from '../../../src/features/drawings/components/one-line';
import { ConnectionCardDrawing } from '../../../src/features/drawings/components/connection-card';
import { connectionCard } from '../../../shared/calc/connections';
import { blowerVfd, conveyorFvr, pumpFvnr } from './fixtures';

describe('one-line per bucket', () => {
  it('FVNR: disconnect, fuses, contactor, overload, motor', () => {
    const els = oneLineElements(pumpFvnr);
    expect(els.map((e) => e.kind)).toEqual(['bus', 'disconnect', 'fuse', 'contactor', 'overload', 'motor']);
    expect(els[2].label).toBe('25 A dual-element fuses');
  });
  it('FVR: an interlocked F and R pair, breaker, phase-sequence relay noted', () => {
    const els = oneLineElements(conveyorFvr);
    const c = els.find((e) => e.kind === 'contactor')!;
    expect(c.poles).toEqual(['F', 'R']);
    expect(c.interlocked).toBe(true);
    expect(els.find((e) => e.kind === 'breaker')?.label).toBe('90 A inverse-time breaker');
    expect(els.at(-1)?.detail).toContain('47 phase-sequence');
  });
  it('VFD with the drive’s overload: no separate overload', () => {
    const kinds = oneLineElements(blowerVfd).map((e) => e.kind);
    expect(kinds).toEqual(['bus', 'disconnect', 'fuse', 'vfd', 'motor']);
  });
  it('renders accessible SVG', () => {
    const svg = renderToStaticMarkup(createElement(OneLine, { selection: conveyorFvr }));
    expect(svg).toMatch(/^<svg[^>]*role="img"/);
    expect(svg).toContain('<title id="one-line-CV-201">One-line of CV-201');
    expect(svg).toContain('#b87333');
    expect(svg).toContain('Barlow');
  });
});

describe('connection card drawing', () => {
  it('draws the lines, the joined group and the reverse instruction', () => {
    const svg = renderToStaticMarkup(
      createElement(ConnectionCardDrawing, { card: connectionCard({ motor: 'three-phase', leads: 9, winding: 'wye', voltage: 'low' }) }),
    );
    expect(svg).toContain('role="img"');
    expect(svg).toContain('L1=T1,T7 L2=T2,T8 L3=T3,T9; join T4-T5-T6');
    expect(svg).toContain('To reverse: Interchange any two line leads');
    expect(svg).toContain('Check rotation before coupling the load.');
  });
});
