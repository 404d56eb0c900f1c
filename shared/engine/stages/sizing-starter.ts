// Stage 3a, sizing the starter's contactors: the NEMA size (NEMA ICS 2) and the IEC rated
// operational current in its utilisation category, each contactor's share of the motor current.

import { DomainError } from '../../errors';
import { nemaStarterSize } from '../../calc/nema-starter-size';
import { CONTACTOR_SHARE, type Decisions } from '../decisions';
import type { Assumptions } from './assumptions';
import { emptyReport, round2, type StageContext, type StageReport } from './stage';
import type { StarterType } from '../../schemas/selection';
import { IEC_60947_4_1, iecMinOperationalCurrent, type IecCategory } from '../../standards/iec-60947-4-1-categories';

export interface StarterSizing extends StageReport {
  nemaSize: string | null;
  /** the NEMA size table's basis, added to the starter's basis */
  nemaBasis: string | null;
  iecCategory: IecCategory | null;
  iecAmps: number | null;
}

export function sizeStarter(ctx: StageContext, a: Assumptions, decisions: Decisions, starterType: StarterType): StarterSizing {
  const report = emptyReport();
  const out: StarterSizing = { ...report, nemaSize: null, nemaBasis: null, iecCategory: null, iecAmps: null };
  const contactor = CONTACTOR_SHARE[starterType];
  if (!a.flc || !ctx.ac || !contactor) return out;
  const contactorAmps = iecMinOperationalCurrent(a.flc.flcAmps, a.flaAmps ?? 0);
  if (contactor.nemaSized) {
    try {
      const n = nemaStarterSize(
        { hp: a.hp, phases: ctx.phases, volts: ctx.load.volts, duty: decisions['starter.nemaDuty'] ?? 'normal', amps: contactorAmps },
        ctx.edition,
      );
      out.nemaSize = n.size;
      out.nemaBasis = n.basis;
      report.trace.push({
        ruleId: 'sizing.nema-size',
        decision: `starter.nemaSize = ${n.size}`,
        words: `NEMA size ${n.size}`,
        reason: `${n.ratedHp} hp rated at this voltage and duty, ${n.continuousAmps} A continuous`,
        basis: n.basis,
      });
    } catch (e) {
      if (!(e instanceof DomainError)) throw e;
      report.cautions.push(`No NEMA size: ${e.message}; select the contactor by its IEC rated operational current.`);
    }
  }
  const share = contactor.share;
  out.iecCategory = decisions['starter.iecCategory'] ?? 'AC-3';
  out.iecAmps = round2(contactorAmps * share);
  report.trace.push({
    ruleId: 'sizing.iec-contactor',
    decision: `starter.iecAmps = ${out.iecAmps} (${out.iecCategory})`,
    words: `Contactor ${out.iecAmps} A (${out.iecCategory})`,
    reason:
      share === 1
        ? 'rated operational current in the category at least the motor current'
        : `each contactor carries ${share === 0.5 ? 'half' : '1/√3'} of the motor current`,
    basis: `${IEC_60947_4_1} utilisation categories${share === 1 ? '' : ' (common practice)'}`,
  });
  return out;
}
