// Stage 3d, the motor and its controller: voltage-unbalance derating (NEMA MG 1 14.35), locked-rotor
// current (Table 430.7(B)), synchronous speed, the drive or soft starter ratings, DC protection and
// the enclosure's IP code.

import { softStarterMinAmps, vfdMinOutputAmps } from '../../calc/drives';
import { lockedRotorCurrent } from '../../calc/locked-rotor';
import { synchronousRpm } from '../../calc/synchronous-speed';
import type { LoadSelection, StarterType, UnbalanceResult } from '../../schemas/selection';
import { enclosureType } from '../../standards/nema-250-enclosure-types';
import { UNBALANCE_MAX_PERCENT, unbalanceDerating } from '../../standards/nema-mg1-voltage-unbalance';
import { UNDECIDED, type Decisions } from '../decisions';
import type { Assumptions } from './assumptions';
import { emptyReport, round2, step, type StageContext, type StageReport } from './stage';

export interface MotorSizing extends StageReport {
  unbalance: UnbalanceResult | null;
  lockedRotorAmps: LoadSelection['lockedRotorAmps'];
  synchronousRpm: number | null;
  vfd: LoadSelection['vfd'];
  softStarter: LoadSelection['softStarter'];
  dc: LoadSelection['dc'];
  ipCode: string;
}

export function sizeMotor(ctx: StageContext, a: Assumptions, decisions: Decisions, starterType: StarterType): MotorSizing {
  const { load, supply, edition, ac } = ctx;
  const report = emptyReport();
  const hp = a.hp;
  const fla = a.flaAmps ?? 0;

  // A motor on the line is derated for the site's unbalance; behind a drive the rectifier takes it and
  // the motor sees balanced output (common practice), so no derating (the cautions stage says so).
  let unbalance: UnbalanceResult | null = null;
  if (load.supply === 'ac3' && supply.voltageUnbalancePercent > 0 && starterType !== 'VFD') {
    const u = unbalanceDerating(supply.voltageUnbalancePercent);
    unbalance = {
      percent: u.percent,
      deratingFactor: u.factor,
      deratedHp: u.factor !== null && hp > 0 ? round2(hp * u.factor) : null,
      basis: u.basis,
    };
    report.trace.push({
      ruleId: 'sizing.voltage-unbalance',
      decision:
        u.factor === null ? `unbalance.deratingFactor = none (above ${UNBALANCE_MAX_PERCENT} %)` : `unbalance.deratingFactor = ${u.factor}`,
      words:
        u.factor === null ? `No unbalance derating factor (above ${UNBALANCE_MAX_PERCENT} %)` : `Unbalance derating factor ${u.factor}`,
      reason: `${u.percent} % voltage unbalance at the site`,
      basis: u.basis,
    });
  }

  let lockedRotorAmps: LoadSelection['lockedRotorAmps'] = null;
  const codeLetter = load.codeLetter;
  if (ac && codeLetter !== undefined) {
    lockedRotorAmps = step(report, 'locked-rotor current', () =>
      lockedRotorCurrent({ codeLetter, hp, volts: load.volts, phases: ctx.phases }, edition),
    );
    if (lockedRotorAmps)
      report.trace.push({
        ruleId: 'sizing.locked-rotor',
        decision: `lockedRotorAmps = ${lockedRotorAmps.min}–${lockedRotorAmps.max} A`,
        words: `Locked-rotor current ${lockedRotorAmps.min}–${lockedRotorAmps.max} A`,
        reason: 'code letter kVA/hp at rated voltage',
        basis: lockedRotorAmps.basis,
      });
  }
  const syncRpm = ac && load.poles !== undefined ? synchronousRpm(load.hz, load.poles) : null;

  let vfd: LoadSelection['vfd'] = null;
  if (starterType === 'VFD') {
    const decidedDuty = decisions['vfd.duty'];
    if (!decidedDuty) report.errors.push('no rule decided vfd.duty');
    const duty = decidedDuty ?? UNDECIDED['vfd.duty'];
    const v = vfdMinOutputAmps(fla, duty, edition);
    vfd = {
      duty,
      minOutputAmps: v.minOutputAmps,
      inverterDutyMotor: decisions['vfd.inverterDutyMotor'] ?? UNDECIDED['vfd.inverterDutyMotor'],
      outputFilter: decisions['vfd.outputFilter'] ?? UNDECIDED['vfd.outputFilter'],
      basis: v.basis,
    };
    report.trace.push({
      ruleId: 'sizing.vfd',
      decision: `vfd.minOutputAmps = ${v.minOutputAmps} (${vfd.duty} duty)`,
      words: `Drive output at least ${v.minOutputAmps} A (${vfd.duty} duty)`,
      reason: 'drive output current at its duty rating covers the motor nameplate current',
      basis: v.basis,
    });
  }
  let softStarter: LoadSelection['softStarter'] = null;
  if (starterType === 'RVSS') {
    const insideDelta = decisions['softStarter.insideDelta'] ?? UNDECIDED['softStarter.insideDelta'];
    const s = softStarterMinAmps(fla, insideDelta);
    softStarter = { minAmps: s.minAmps, insideDelta, bypass: decisions['softStarter.bypass'] ?? UNDECIDED['softStarter.bypass'] };
    report.trace.push({
      ruleId: 'sizing.soft-starter',
      decision: `softStarter.minAmps = ${s.minAmps}`,
      words: `Soft starter at least ${s.minAmps} A`,
      reason: insideDelta ? 'inside-delta connection' : 'in-line connection',
      basis: s.basis,
    });
  }
  const dc: LoadSelection['dc'] =
    load.supply === 'dc'
      ? {
          fieldLossProtection: decisions['dc.fieldLossProtection'] ?? UNDECIDED['dc.fieldLossProtection'],
          dynamicBraking: decisions['dc.dynamicBraking'] ?? UNDECIDED['dc.dynamicBraking'],
          field: load.dcField ?? 'shunt',
        }
      : null;
  const nemaType = decisions['enclosure.nemaType'] as string;
  const ipCode = step(report, 'enclosure', () => enclosureType(nemaType).ipCode) ?? '';
  return { ...report, unbalance, lockedRotorAmps, synchronousRpm: syncRpm, vfd, softStarter, dc, ipCode };
}
