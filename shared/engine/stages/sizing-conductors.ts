// Stage 3c, sizing the circuit: branch conductors (430.22, 430.122), the motor leads of wye-delta and
// part-winding starters, the running voltage drop over the given cable, and the disconnect (430.110).

import { branchConductor, motorLeadConductors } from '../../calc/conductor';
import { motorDisconnect } from '../../calc/disconnect';
import { motorVoltageDrop, type VoltageDropResult } from '../../calc/voltage-drop';
import type { StarterType } from '../../schemas/selection';
import type { Assumptions } from './assumptions';
import { emptyReport, round2, step, type StageContext, type StageReport } from './stage';

export interface CircuitSizing extends StageReport {
  conductor: ReturnType<typeof branchConductor> | null;
  leads: ReturnType<typeof motorLeadConductors> | null;
  voltageDrop: VoltageDropResult | null;
  disconnect: ReturnType<typeof motorDisconnect> | null;
}

export function sizeCircuit(ctx: StageContext, a: Assumptions, starterType: StarterType): CircuitSizing {
  const { load, supply, edition } = ctx;
  const report = emptyReport();
  const none: CircuitSizing = { ...report, conductor: null, leads: null, voltageDrop: null, disconnect: null };
  if (!a.flc) return none;
  const flcAmps = a.flc.flcAmps;
  const fla = a.flaAmps ?? 0;
  const material = load.conductor.material;
  const tempRatingC = load.conductor.tempRatingC;
  const driveInputAmps = starterType === 'VFD' ? load.driveInputAmps : undefined;

  const cond = step(report, 'branch conductors', () => branchConductor({ flcAmps, material, tempRatingC, ambientC: supply.ambientC, driveInputAmps }, edition));
  if (cond) {
    report.cautions.push(...cond.cautions);
    report.trace.push({ ruleId: 'sizing.conductor', decision: `conductor.size = ${cond.size} (${cond.ampacity} A >= ${cond.minAmpacity} A)`, words: `Conductors ${cond.size} (${cond.ampacity} A ≥ ${cond.minAmpacity} A)`, reason: 'smallest conductor whose allowable ampacity covers the minimum', basis: cond.basis });
  }
  const leads = cond ? step(report, 'motor-lead conductors', () => motorLeadConductors({ flcAmps, starterType, material, tempRatingC, ambientC: supply.ambientC }, edition)) : null;
  if (leads) {
    report.cautions.push(...leads.cautions);
    report.trace.push({
      ruleId: 'sizing.motor-leads',
      decision: `conductor.motorLeads = ${leads.count} × ${leads.size} (${leads.ampacity} A >= ${leads.minAmpacity} A)`,
      words: `Motor leads ${leads.count} × ${leads.size} (${leads.ampacity} A ≥ ${leads.minAmpacity} A)`,
      reason: `between the controller and the motor each lead carries ${leads.share === 0.5 ? 'half' : 'about 58 % (1/√3)'} of the motor current`,
      basis: leads.basis,
    });
  }
  // running voltage drop over the cable, on the conductors that make the run to the motor
  let voltageDrop: VoltageDropResult | null = null;
  const lengthFt = load.cableLengthFt;
  if (cond && lengthFt !== undefined && lengthFt > 0) {
    const conductor = leads ? leads.size : cond.size;
    const circuit = leads ? (starterType === 'wye-delta' ? 'delta-leads' : 'half-windings') : 'line';
    voltageDrop = step(report, 'voltage drop', () => motorVoltageDrop({ amps: fla, ratedVolts: load.volts, threePhase: load.supply === 'ac3', lengthFt, conductor, material, circuit }, edition));
    if (voltageDrop) {
      report.trace.push({
        ruleId: 'sizing.voltage-drop',
        decision: `conductor.voltageDrop = ${voltageDrop.volts} V (${voltageDrop.percent} %) over ${voltageDrop.lengthFt} ft`,
        words: `Running voltage drop ${voltageDrop.volts} V (${voltageDrop.percent} %) over ${voltageDrop.lengthFt} ft`,
        reason: `${fla} A at full load on ${leads ? `the motor leads (${leads.size})` : cond.size}`,
        basis: voltageDrop.basis,
      });
    }
  }
  const disc = step(report, 'disconnect', () => motorDisconnect({ flcAmps, hp: round2(a.hp), driveInputAmps }, edition));
  if (disc) report.trace.push({ ruleId: 'sizing.disconnect', decision: `disconnect.minAmps = ${disc.minAmps}, minHp = ${disc.minHp}`, words: `Disconnect at least ${disc.minAmps} A${disc.minHp ? ` and ${disc.minHp} hp` : ''}`, reason: '115 % of the table FLC, horsepower rated', basis: disc.basis });
  return { ...report, conductor: cond, leads, voltageDrop, disconnect: disc };
}
