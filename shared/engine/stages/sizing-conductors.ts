// Stage 3c, sizing the circuit: branch conductors (430.22, 430.122), the motor leads of wye-delta and
// part-winding starters, the running voltage drop over the given cable, and the disconnect (430.110).
// The terminations follow the panel's answer (110.14(C)(1)): listed for 75 °C, or held to 60 °C; taken
// as listed when not answered, with the 60 °C conductors beside the result and flagged where they differ.

import { branchConductor, motorLeadConductors } from '../../calc/conductor';
import { motorDisconnect } from '../../calc/disconnect';
import { motorVoltageDrop, type VoltageDropResult } from '../../calc/voltage-drop';
import { DISCONNECT_PERCENT_OF_FLC } from '../../standards/nec-430-110-disconnect';
import type { AssumedInput, StarterType } from '../../schemas/selection';
import type { Assumptions } from './assumptions';
import { emptyReport, round2, step, type StageContext, type StageReport } from './stage';

export interface CircuitSizing extends StageReport {
  conductor: ReturnType<typeof branchConductor> | null;
  /** the branch conductors at 60 °C terminations, where the terminations are taken as listed for 75 °C and the size differs */
  termination60C: ReturnType<typeof branchConductor> | null;
  /** the terminations answer, flagged when it was not given and changes the conductor */
  assumed: AssumedInput[];
  leads: ReturnType<typeof motorLeadConductors> | null;
  voltageDrop: VoltageDropResult | null;
  disconnect: ReturnType<typeof motorDisconnect> | null;
}

/** `circuitAmps`: the branch protective device's rating (the circuit's rating for 110.14(C)(1)), when sized. */
export function sizeCircuit(ctx: StageContext, a: Assumptions, starterType: StarterType, circuitAmps: number | null = null): CircuitSizing {
  const { load, supply, edition } = ctx;
  const report = emptyReport();
  const none: CircuitSizing = {
    ...report,
    conductor: null,
    termination60C: null,
    assumed: [],
    leads: null,
    voltageDrop: null,
    disconnect: null,
  };
  if (!a.flc) return none;
  const flcAmps = a.flc.flcAmps;
  const fla = a.flaAmps ?? 0;
  const material = load.conductor.material;
  const tempRatingC = load.conductor.tempRatingC;
  const driveInputAmps = starterType === 'VFD' ? load.driveInputAmps : undefined;

  const listed = supply.terminationsListed75C !== false;
  const circuit = circuitAmps !== null && circuitAmps > 0 ? { circuitAmps } : {};
  const cond = step(report, 'branch conductors', () =>
    branchConductor(
      { flcAmps, material, tempRatingC, ambientC: supply.ambientC, driveInputAmps, terminationsListed75C: listed, ...circuit },
      edition,
    ),
  );
  let at60: CircuitSizing['termination60C'] = null;
  const assumed: AssumedInput[] = [];
  if (cond) {
    report.cautions.push(...cond.cautions);
    report.trace.push({
      ruleId: 'sizing.conductor',
      decision: `conductor.size = ${cond.size} (${cond.ampacity} A >= ${cond.minAmpacity} A)`,
      words: `Conductors ${cond.size} (${cond.ampacity} A ≥ ${cond.minAmpacity} A)`,
      reason: `smallest conductor whose allowable ampacity covers the minimum, at ${listed ? `75 °C terminations (the panel's equipment listed for 75 °C${supply.terminationsListed75C === undefined ? ', assumed' : ''})` : 'the termination column of 110.14(C)(1) (equipment not listed for 75 °C)'}`,
      basis: cond.basis,
    });
    if (listed) {
      const alt = step(report, 'branch conductors at 60 °C terminations', () =>
        branchConductor(
          { flcAmps, material, tempRatingC, ambientC: supply.ambientC, driveInputAmps, terminationsListed75C: false, ...circuit },
          edition,
        ),
      );
      if (alt && alt.size !== cond.size) {
        at60 = alt;
        report.trace.push({
          ruleId: 'sizing.conductor-60c',
          decision: `conductor.termination60C = ${alt.size} (${alt.ampacity} A >= ${alt.minAmpacity} A)`,
          words: `At 60 °C terminations: ${alt.size} (${alt.ampacity} A ≥ ${alt.minAmpacity} A)`,
          reason: `if the starter, protective device or terminal blocks are not listed for 75 °C conductors, ${cond.size} is held to its 60 °C ampacity and ${alt.size} is needed`,
          basis: alt.basis,
        });
        report.cautions.push(
          `Conductors sized at 75 °C terminations: ${cond.size} holds only if every termination on the circuit (starter, protective device, terminal blocks) is listed and identified for 75 °C conductors (110.14(C)(1)(a)(3)); at 60 °C it takes ${alt.size}. The motor's own terminals: a motor marked design B, C or D may take the 75 °C ampacity (110.14(C)(1)(a)(4), from memory).`,
        );
        if (supply.terminationsListed75C === undefined) {
          assumed.push({
            field: 'terminationsListed75C',
            assumed: 'yes (75 °C terminations)',
            note: `not answered on the panel: ${cond.size} at 75 °C; at 60 °C terminations ${alt.size} (110.14(C)(1)(a))`,
          });
        }
      }
    }
  }
  const leads = cond
    ? step(report, 'motor-lead conductors', () =>
        motorLeadConductors(
          { flcAmps, starterType, material, tempRatingC, ambientC: supply.ambientC, terminationsListed75C: listed, ...circuit },
          edition,
        ),
      )
    : null;
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
    const run = leads ? (starterType === 'wye-delta' ? 'delta-leads' : 'half-windings') : 'line';
    voltageDrop = step(report, 'voltage drop', () =>
      motorVoltageDrop(
        { amps: fla, ratedVolts: load.volts, threePhase: load.supply === 'ac3', lengthFt, conductor, material, circuit: run },
        edition,
      ),
    );
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
  if (disc)
    report.trace.push({
      ruleId: 'sizing.disconnect',
      decision: `disconnect.minAmps = ${disc.minAmps}, minHp = ${disc.minHp}`,
      words: `Disconnect at least ${disc.minAmps} A${disc.minHp ? ` and ${disc.minHp} hp` : ''}`,
      reason: `${DISCONNECT_PERCENT_OF_FLC} % of the table FLC, horsepower rated`,
      basis: disc.basis,
    });
  return { ...report, conductor: cond, termination60C: at60, assumed, leads, voltageDrop, disconnect: disc };
}
