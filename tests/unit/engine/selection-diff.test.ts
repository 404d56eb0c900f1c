// A stored selection against the current engine's: which decisions differ, in words.
import { describe, expect, it } from 'vitest';
import { selectionDifferences } from '../../../shared/calc/selection-diff';
import { motor, selector, supply480 } from './selector-setup';

describe('selectionDifferences', () => {
  it('finds nothing between two runs of the same answers', async () => {
    const a = await selector.selectLoad(motor({ hp: 25, volts: 460, fla: 31, serviceFactor: 1.15 }), supply480);
    const b = await selector.selectLoad(motor({ hp: 25, volts: 460, fla: 31, serviceFactor: 1.15 }), supply480);
    expect(selectionDifferences(a, b)).toEqual([]);
  });

  it('names each changed decision with the stored and the current value; reasoning texts alone do not count', async () => {
    const now = await selector.selectLoad(
      motor({
        hp: 100,
        volts: 460,
        fla: 118,
        serviceFactor: 1.15,
        leads: 6,
        connection: 'delta',
        startingLimit: 'reduced-inrush',
        starterPreference: 'wye-delta',
      }),
      supply480,
    );
    const stored = structuredClone(now);
    // as an earlier release would have stored it: no motor-lead conductors, no relay recorded, class 30
    delete stored.conductor.motorLeads;
    delete stored.overload.relay;
    expect(now.overload.tripClass).not.toBe(30);
    stored.overload.tripClass = 30;
    stored.starter.basis = 'older wording';
    stored.trace = [];
    const d = selectionDifferences(stored, now);
    expect(d.map((x) => x.field)).toEqual(['overload.tripClass', 'conductor.motorLeads']);
    expect(d[0]).toEqual({ field: 'overload.tripClass', label: 'Trip class', from: '30', to: String(now.overload.tripClass) });
    // 124 A × 0.58 × 1.25 = 89.9 A -> 3 AWG Cu 75 °C (NEC 2023 430.22(C), Table 310.16)
    expect(d[1]).toEqual({ field: 'conductor.motorLeads', label: 'Conductors to the motor', from: '—', to: '3 AWG' });
    // a relay stored before it was recorded is worked out from the starter: same as now, no difference
    expect(d.some((x) => x.field === 'overload.relay')).toBe(false);
  });

  it('counts cautions as one decision and quotes the new wording', async () => {
    const now = await selector.selectLoad(
      motor({ hp: 25, volts: 460, fla: 31, serviceFactor: 1.15, reverseRotationHazard: true }),
      supply480,
    );
    expect(now.cautions.length).toBeGreaterThan(0);
    const stored = { ...now, cautions: now.cautions.map((c, i) => (i === 0 ? `${c} (old)` : c)) };
    const [d] = selectionDifferences(stored, now);
    expect(d).toEqual({
      field: 'cautions',
      label: 'Cautions',
      from: String(now.cautions.length),
      to: `${now.cautions.length} (1 reworded): “${now.cautions[0]}”`,
    });
    const fewer = { ...now, cautions: now.cautions.slice(1) };
    expect(selectionDifferences(fewer, now)[0].to).toBe(`${now.cautions.length} (1 new or reworded): “${now.cautions[0]}”`);
  });
});
