// The panel's termination answer (NEC 2023 110.14(C)(1)) through the API: stored on the panel, the
// motors selected again when it changes, carried by the job backup. Ampacities from NEC 2023
// Table 310.16 (copper), FLC from NEC 2023 Table 430.250.
import { describe, expect, it } from 'vitest';
import { send, signInAs } from '../setup/api';

const uniq = () => `T-${Date.now().toString(36)}-${Math.floor(Math.random() * 1e5)}`;
const TEN_HP = { tag: 'FN-1', supply: 'ac3', hp: 10, volts: 460, fla: 14, serviceFactor: 1.15, codeLetter: 'G', environment: 'indoor-dry' };

describe('terminations listed for 75 °C, a panel answer', () => {
  it('not answered: 14 AWG at 75 °C with 12 AWG beside it and flagged; "no" selects the motors again at 60 °C (12 AWG); the backup carries it', async () => {
    const designer = await signInAs('designer');
    const estimator = await signInAs('estimator');
    const job = (await send(designer, 'post', '/api/jobs', { number: uniq(), name: 'Cooling tower', availableFaultKa: 22 }).expect(201))
      .body;
    const panel = (await send(designer, 'post', `/api/jobs/${job.id}/panels`, { name: 'CT-1' }).expect(201)).body;
    expect(panel.terminationsListed75C).toBeNull();
    const load = (await send(designer, 'post', `/api/panels/${panel.id}/loads`, { answers: TEN_HP }).expect(201)).body;
    // 14 A × 1.25 = 17.5 A (430.22): 14 AWG Cu 75 °C = 20 A; at 60 °C 14 AWG = 15 A, so 12 AWG = 20 A (Table 310.16)
    expect(load.selection.conductor).toMatchObject({ size: '14 AWG', ampacity: 20, termination60C: { size: '12 AWG', ampacity: 20 } });
    expect(load.selection.assumed.map((a: { field: string }) => a.field)).toContain('terminationsListed75C');

    let p = (await designer.agent.get(`/api/panels/${panel.id}`).expect(200)).body;
    // an estimator changes only markup and labour rate
    await send(estimator, 'patch', `/api/panels/${panel.id}`, { version: p.version, terminationsListed75C: false }).expect(403);
    await send(designer, 'patch', `/api/panels/${panel.id}`, { version: p.version, terminationsListed75C: 'no' }).expect(400);
    p = (await send(designer, 'patch', `/api/panels/${panel.id}`, { version: p.version, terminationsListed75C: false }).expect(200)).body;
    expect(p.terminationsListed75C).toBe(false);
    const sel = p.loads[0].selection;
    expect(sel.conductor).toMatchObject({ size: '12 AWG', ampacity: 20 }); // Table 310.16 Cu 60 °C
    expect(sel.conductor.termination60C).toBeUndefined();
    expect(sel.assumed.map((a: { field: string }) => a.field)).not.toContain('terminationsListed75C');
    expect(p.rollup.feeder.conductorSize).toBe('12 AWG'); // 430.24: one motor, 17.5 A at 60 °C

    // the stored selections match the current rules with the panel's answer: the rule check finds nothing
    const check = (await designer.agent.get(`/api/panels/${panel.id}/rule-check`).expect(200)).body;
    expect(check.changed).toEqual([]);

    const backup = (await designer.agent.get(`/api/jobs/${job.id}/export`).expect(200)).body;
    expect(backup.panels[0].terminationsListed75C).toBe(false);
    const copy = (await send(designer, 'post', '/api/jobs/import', { ...backup, job: { ...backup.job, number: uniq() } }).expect(201)).body;
    const panels = (await designer.agent.get(`/api/jobs/${copy.id}/panels`).expect(200)).body;
    const restored = (await designer.agent.get(`/api/panels/${panels[0].id}`).expect(200)).body;
    expect(restored.terminationsListed75C).toBe(false);
  });
});
