import { describe, expect, it } from 'vitest';
import { connectionCard, type ConnectionStep } from '../../../shared/calc/connections';

const leadsOf = (s: ConnectionStep) => [...Object.values(s.lineGroups).flat(), ...s.joined.flat(), ...s.insulated];

describe('three-phase nine-lead (NEMA MG 1 markings, DOMAIN §6)', () => {
  const cases = [
    // wye low V: L1=T1,T7 · L2=T2,T8 · L3=T3,T9 · join T4-T5-T6
    ['wye', 'low', { L1: ['T1', 'T7'], L2: ['T2', 'T8'], L3: ['T3', 'T9'] }, [['T4', 'T5', 'T6']]],
    // wye high V: L1=T1 · L2=T2 · L3=T3 · join T4-T7, T5-T8, T6-T9
    [
      'wye',
      'high',
      { L1: ['T1'], L2: ['T2'], L3: ['T3'] },
      [
        ['T4', 'T7'],
        ['T5', 'T8'],
        ['T6', 'T9'],
      ],
    ],
    // delta low V: L1=T1,T6,T7 · L2=T2,T4,T8 · L3=T3,T5,T9
    ['delta', 'low', { L1: ['T1', 'T6', 'T7'], L2: ['T2', 'T4', 'T8'], L3: ['T3', 'T5', 'T9'] }, []],
    // delta high V: L1=T1 · L2=T2 · L3=T3 · join T4-T7, T5-T8, T6-T9
    [
      'delta',
      'high',
      { L1: ['T1'], L2: ['T2'], L3: ['T3'] },
      [
        ['T4', 'T7'],
        ['T5', 'T8'],
        ['T6', 'T9'],
      ],
    ],
  ] as const;
  it.each(cases)('%s, %s voltage', (winding, voltage, lines, joined) => {
    const card = connectionCard({ motor: 'three-phase', leads: 9, winding, voltage });
    expect(card.steps).toHaveLength(1);
    expect(card.steps[0].lineGroups).toEqual(lines);
    expect(card.steps[0].joined).toEqual(joined);
    expect(leadsOf(card.steps[0]).sort()).toEqual(['T1', 'T2', 'T3', 'T4', 'T5', 'T6', 'T7', 'T8', 'T9'].sort());
    expect(card.reverse).toContain('two line leads');
    expect(card.cautions).toContain('Check rotation before coupling the load.');
  });
});

describe('three-phase six-lead wye-delta and twelve-lead (NEMA MG 1, from memory)', () => {
  it('six-lead: start wye T4-T5-T6; run delta L1=T1,T6 L2=T2,T4 L3=T3,T5', () => {
    const card = connectionCard({ motor: 'three-phase', leads: 6, method: 'wye-delta' });
    expect(card.steps[0].joined).toEqual([['T4', 'T5', 'T6']]);
    expect(card.steps[1].lineGroups).toEqual({ L1: ['T1', 'T6'], L2: ['T2', 'T4'], L3: ['T3', 'T5'] });
  });
  it('twelve-lead: every lead used once in each connection', () => {
    for (const winding of ['wye', 'delta'] as const) {
      for (const voltage of ['low', 'high'] as const) {
        const s = connectionCard({ motor: 'three-phase', leads: 12, winding, voltage }).steps[0];
        expect(leadsOf(s).sort()).toEqual(Array.from({ length: 12 }, (_, i) => `T${i + 1}`).sort());
      }
    }
  });
  it('twelve-lead delta low V (parallel): L1=T1,T6,T7,T12 L2=T2,T4,T8,T10 L3=T3,T5,T9,T11', () => {
    const s = connectionCard({ motor: 'three-phase', leads: 12, winding: 'delta', voltage: 'low' }).steps[0];
    expect(s.lineGroups).toEqual({ L1: ['T1', 'T6', 'T7', 'T12'], L2: ['T2', 'T4', 'T8', 'T10'], L3: ['T3', 'T5', 'T9', 'T11'] });
  });
  it('twelve-lead wye high V (series): join T4-T7, T5-T8, T6-T9 and T10-T11-T12', () => {
    const s = connectionCard({ motor: 'three-phase', leads: 12, winding: 'wye', voltage: 'high' }).steps[0];
    expect(s.joined).toEqual([
      ['T4', 'T7'],
      ['T5', 'T8'],
      ['T6', 'T9'],
      ['T10', 'T11', 'T12'],
    ]);
  });
  it('part-winding on a nine-lead wye at low voltage: first winding T1-T3, second adds T7-T9', () => {
    const c = connectionCard({ motor: 'three-phase', leads: 9, winding: 'wye', voltage: 'low', method: 'part-winding' });
    expect(c.steps[0].lineGroups).toEqual({ L1: ['T1'], L2: ['T2'], L3: ['T3'] });
    expect(c.steps[1].lineGroups).toEqual({ L1: ['T1', 'T7'], L2: ['T2', 'T8'], L3: ['T3', 'T9'] });
  });
});

describe('single-phase dual voltage (DOMAIN §6)', () => {
  it('low voltage: run halves T1–T2 and T3–T4 in parallel, start winding T5–T8 across', () => {
    const s = connectionCard({ motor: 'single-phase', leads: 8, voltage: 'low' }).steps[0];
    expect(s.lineGroups.L1).toEqual(expect.arrayContaining(['T1', 'T3']));
    expect(s.lineGroups.L2).toEqual(expect.arrayContaining(['T2', 'T4']));
    // start winding across the lines, one end on each (rotation as drawn from memory: L1 T8, L2 T5)
    expect(s.lineGroups).toEqual({ L1: ['T1', 'T3', 'T8'], L2: ['T2', 'T4', 'T5'] });
  });
  it('high voltage: halves in series (T2 joined to T3), start winding across one half', () => {
    const s = connectionCard({ motor: 'single-phase', leads: 8, voltage: 'high' }).steps[0];
    expect(s.lineGroups).toEqual({ L1: ['T1'], L2: ['T4', 'T5'] });
    expect(s.joined).toEqual([['T2', 'T3', 'T8']]);
  });
  it('reverse by interchanging T5 and T8', () => {
    expect(connectionCard({ motor: 'single-phase', leads: 8, voltage: 'low' }).reverse).toContain('Interchange T5 and T8');
  });
});

describe('DC (NEMA MG 1: A1–A2 armature, S1–S2 series, F1–F2 shunt)', () => {
  it('series motor: A2 joined to S1, never unloaded', () => {
    const c = connectionCard({ motor: 'dc', field: 'series' });
    expect(c.steps[0].joined).toEqual([['A2', 'S1']]);
    expect(c.steps[0].lineGroups).toEqual({ 'A+': ['A1'], 'A-': ['S2'] });
    expect(c.cautions.join(' ')).toContain('Never run a DC series motor unloaded');
    expect(c.reverse).toContain('interchange A1 and A2');
    expect(c.reverse).toContain('Never reverse both');
  });
  it('shunt motor: field across the line, field-loss caution, no runaway caution', () => {
    const c = connectionCard({ motor: 'dc', field: 'shunt' });
    expect(c.steps[0].lineGroups).toEqual({ 'A+': ['A1', 'F1'], 'A-': ['A2', 'F2'] });
    expect(c.cautions.join(' ')).toContain('field-loss');
    expect(c.cautions.join(' ')).not.toContain('unloaded');
  });
  it('compound motor uses all six leads', () => {
    const s = connectionCard({ motor: 'dc', field: 'compound' }).steps[0];
    expect(leadsOf(s).sort()).toEqual(['A1', 'A2', 'F1', 'F2', 'S1', 'S2']);
  });
});
