// Stage 1, assumptions: the full-load current (430.6(A)(1)) and every answer the selection has to
// assume, each flagged with what was assumed and why.

import { fullLoadCurrent, WATTS_PER_HP, type FlcResult } from '../../calc/flc';
import type { AssumedInput } from '../../schemas/selection';
import { emptyReport, round2, step, type StageContext, type StageReport } from './stage';

export interface Assumptions extends StageReport {
  flc: FlcResult | null;
  /** horsepower used (kW converted) */
  hp: number;
  /** nameplate FLA, or the table FLC where none was given */
  flaAmps: number | null;
  assumed: AssumedInput[];
}

/** `raw` is the load as given (before defaults), to tell an answer left out from its default. */
export function assumptions(ctx: StageContext, raw: Record<string, unknown> | null): Assumptions {
  const { load, ac } = ctx;
  const report = emptyReport();
  const assumed: AssumedInput[] = [];
  const flc = step(report, 'full-load current', () => fullLoadCurrent(load, ctx.edition));
  const hp = flc?.hp ?? round2(load.hp ?? ((load.kw ?? 0) * 1000) / WATTS_PER_HP);
  if (flc) {
    assumed.push(...flc.assumed);
    report.cautions.push(...flc.cautions);
    report.trace.push({
      ruleId: 'sizing.flc',
      decision: `flcAmps = ${flc.flcAmps}`,
      words: `Full-load current ${flc.flcAmps} A`,
      reason: `table full-load current (${flc.source}) sizes conductors, protection and disconnect`,
      basis: flc.basis,
    });
  }
  const flaAmps = load.fla ?? flc?.flcAmps ?? null;
  const assume = (when: boolean, field: string, value: string, note: string) => {
    if (when) assumed.push({ field, assumed: value, note });
  };
  if (load.fla === undefined && flc) {
    assumed.push({
      field: 'fla',
      assumed: `${flc.flcAmps} A (table FLC)`,
      note: 'no nameplate FLA: the overload setting rests on the table current; set it from the nameplate (430.6(A)(2))',
    });
  }
  assume(
    raw !== null && raw.serviceFactor === undefined && load.tempRiseC === undefined,
    'serviceFactor',
    '1.0',
    'not given: overload limit 115 % of FLA (430.32(A)(1)), the lower setting',
  );
  assume(
    load.environment === undefined,
    'environment',
    'indoor-dusty',
    'not given: NEMA Type 12, the usual industrial control panel enclosure',
  );
  assume(ac && load.codeLetter === undefined, 'codeLetter', 'none', 'no code letter: locked-rotor current not computed (Table 430.7(B))');
  assume(
    load.supply === 'dc' && load.dcField === undefined,
    'dcField',
    'shunt',
    'not given: shunt field assumed, so field-loss protection is included',
  );
  assume(
    load.speedControl === 'variable' && load.torque === undefined,
    'torque',
    'constant',
    'not given: constant torque assumed (heavy-duty drive rating)',
  );
  assume(
    load.supply === 'ac3' && load.speedControl === 'variable' && load.cableLengthFt === undefined,
    'cableLengthFt',
    'short (not given)',
    'output filter need for long motor leads not evaluated',
  );
  return { ...report, flc, hp, flaAmps, assumed };
}
