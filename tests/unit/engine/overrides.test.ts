// The effective selection: overrides written over the engine's result, and what follows from them.
import { describe, expect, it } from 'vitest';
import { applyOverrides } from '../../../shared/calc/overrides';
import { relayOf, relayWiringText } from '../../../shared/calc/overload';
import { motor, selector, supply480 } from './selector-setup';

describe('applyOverrides', () => {
  it('writes the overridden values over the engine result and leaves the rest alone', async () => {
    const sel = await selector.selectLoad(motor({ hp: 25, volts: 460, fla: 31, serviceFactor: 1.15 }), supply480);
    const eff = applyOverrides(sel, [
      { field: 'overload.tripClass', value: '20' },
      { field: 'enclosure.nemaType', value: '4X' },
    ]);
    expect(eff.overload.tripClass).toBe(20);
    expect(eff.enclosure.nemaType).toBe('4X');
    expect(eff.scpd).toEqual(sel.scpd);
    expect(sel.overload.tripClass).toBe(10); // the engine's result is not changed
  });

  it('moves the overload relay with a starter type changed to wye-delta: FLA/√3 in the delta windings (common practice)', async () => {
    const sel = await selector.selectLoad(
      motor({ hp: 25, volts: 460, fla: 31, serviceFactor: 1.15, leads: 6, connection: 'delta' }),
      supply480,
    );
    expect(sel.starter.type).toBe('FVNR');
    expect(relayWiringText(sel)).toBeNull();
    const eff = applyOverrides(sel, [{ field: 'starter.type', value: 'wye-delta' }]);
    // 31 / √3 = 17.90 A; 38.75 / √3 = 22.37 A
    expect(eff.overload.relay).toMatchObject({ count: 1, settingAmps: 17.9, maxAmps: 22.37 });
    expect(relayWiringText(eff)).toBe('1 relay in the delta windings: set 17.9 A, max 22.37 A each');
    expect(eff.overload.maxSettingAmps).toBe(38.75); // the 430.32(A)(1) limit in line terms stays
  });

  it('works the relay out the same way for a selection stored before the relay was recorded', async () => {
    const sel = await selector.selectLoad(
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
    const stored = { ...sel, overload: { ...sel.overload, relay: undefined } };
    expect(relayOf(stored)).toEqual(sel.overload.relay);
    expect(relayWiringText(stored)).toBe('1 relay in the delta windings: set 68.13 A, max 85.16 A each');
  });

  it("drops the motor-lead conductors and per-winding devices sized for the engine's part-winding starter when another starter is fitted", async () => {
    const sel = await selector.selectLoad(
      motor({
        hp: 25,
        volts: 230,
        fla: 60,
        serviceFactor: 1.0,
        leads: 9,
        connection: 'wye',
        startingLimit: 'reduced-inrush',
        starterPreference: 'part-winding',
      }),
      { ...supply480, volts: 240 },
    );
    expect(sel.conductor.motorLeads).toBeDefined();
    expect(sel.scpd.perWinding).toBeDefined();
    const eff = applyOverrides(sel, [{ field: 'starter.type', value: 'RVSS' }]);
    expect(eff.conductor.motorLeads).toBeUndefined();
    expect(eff.scpd.perWinding).toBeUndefined();
    // a changed device type leaves the starter's leads but not the per-winding devices of the other type
    const fuse = applyOverrides(sel, [{ field: 'scpd.type', value: 'dual-element-fuse' }]);
    expect(fuse.conductor.motorLeads).toEqual(sel.conductor.motorLeads);
    expect(fuse.scpd.perWinding).toBeUndefined();
  });
});
