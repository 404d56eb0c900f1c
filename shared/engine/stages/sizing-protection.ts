// Stage 3b, sizing the protection: the overload's maximum setting (430.32) and its relay, the branch
// short-circuit and ground-fault device (430.52) and, for part-winding, the device per half-winding.

import { overloadMaxSetting, overloadRelay } from '../../calc/overload';
import { branchProtection, motorKind, partWindingProtection, SCPD_WORDS } from '../../calc/scpd';
import type { PerWindingScpd, StarterType } from '../../schemas/selection';
import type { Assumptions } from './assumptions';
import { emptyReport, step, type StageContext, type StageReport } from './stage';

export interface ProtectionSizing extends StageReport {
  overload: ReturnType<typeof overloadMaxSetting> | null;
  relay: ReturnType<typeof overloadRelay> | null;
  scpd: ReturnType<typeof branchProtection> | null;
  perWinding: PerWindingScpd | null;
}

export function sizeProtection(ctx: StageContext, a: Assumptions, starterType: StarterType): ProtectionSizing {
  const { load, edition } = ctx;
  const report = emptyReport();
  const fla = a.flaAmps ?? 0;
  const flc = a.flc;
  const ol = step(report, 'overload', () =>
    overloadMaxSetting({ flaAmps: fla, serviceFactor: load.serviceFactor, tempRiseC: load.tempRiseC }, edition),
  );
  if (ol && flc)
    report.trace.push({
      ruleId: 'sizing.overload',
      decision: `overload.maxSettingAmps = ${ol.maxSettingAmps} (${ol.maxPercent} % of ${fla} A)`,
      words: `Overload at most ${ol.maxSettingAmps} A (${ol.maxPercent} % of ${fla} A)`,
      reason: ol.why,
      basis: ol.basis,
    });
  const relay = ol && flc ? overloadRelay({ flaAmps: fla, maxSettingAmps: ol.maxSettingAmps, starterType }, edition) : null;
  if (relay && relay.share !== 1) {
    report.trace.push({
      ruleId: 'sizing.overload-relay',
      decision: `overload.relay: ${relay.count} × set ${relay.settingAmps} A, ≤ ${relay.maxAmps} A`,
      words: `Overload relay${relay.count > 1 ? 's' : ''}: ${relay.count} × set ${relay.settingAmps} A, ≤ ${relay.maxAmps} A`,
      reason: relay.note ?? '',
      basis: relay.basis,
    });
  }
  if (!flc) return { ...report, overload: ol, relay, scpd: null, perWinding: null };

  const flcAmps = flc.flcAmps;
  const motor = motorKind(load);
  let scpd = step(report, 'branch protection', () =>
    branchProtection({ flcAmps, type: load.scpdType, motor, override: load.scpdOverride }, edition),
  );
  if (!scpd && load.scpdOverride)
    scpd = step(report, 'branch protection', () => branchProtection({ flcAmps, type: load.scpdType, motor }, edition));
  // Part-winding (NEC 430.4): one device for both windings under the exception (it must let the motor
  // start), and the alternative of a device on each half-winding at one-half the 430.52 value.
  let perWinding: PerWindingScpd | null = null;
  if (scpd && starterType === 'part-winding') {
    const single = scpd;
    const pw = step(report, 'branch protection per half-winding', () => partWindingProtection(single, { flcAmps, motor }, edition));
    if (pw) {
      scpd = pw.single;
      perWinding = pw.perWinding;
      report.trace.push({
        ruleId: 'sizing.scpd-per-winding',
        decision: `scpd.perWinding = 2 × ${perWinding.ratingAmps} A (max ${perWinding.maxPercent} % = ${perWinding.computedMaxAmps} A each)`,
        words: `Per half-winding: 2 × ${perWinding.ratingAmps} A (max ${perWinding.maxPercent} % = ${perWinding.computedMaxAmps} A each)`,
        reason: 'a part-winding motor may instead have a device on each half-winding connection, each at one-half the 430.52 value',
        basis: perWinding.basis,
      });
    }
  }
  if (scpd) {
    const why = {
      'exception-1': 'the computed maximum is not a standard rating: next higher standard rating',
      'exception-2': `explicit override: ${load.scpdOverride?.reason}`,
    } as Record<string, string>;
    report.trace.push({
      ruleId: 'sizing.scpd',
      decision: `scpd.ratingAmps = ${scpd.ratingAmps} (${scpd.type}, max ${scpd.maxPercent} % = ${scpd.computedMaxAmps} A)`,
      words: `Branch protection ${scpd.ratingAmps} A ${SCPD_WORDS[scpd.type]} (max ${scpd.maxPercent} % = ${scpd.computedMaxAmps} A)`,
      reason: why[scpd.exception] ?? 'at the Table 430.52 maximum',
      basis: scpd.basis,
    });
  }
  return { ...report, overload: ol, relay, scpd, perWinding };
}
