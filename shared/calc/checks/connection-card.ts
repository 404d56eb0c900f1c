// A motor's lead connection card from its answers (lead count, connection, voltage, single-phase type,
// DC field) and its selection (starter type). The card itself comes from shared/calc/connections.
import { connectionCard, type ConnectionRequest } from '../connections';
import type { LoadSelection } from '../../schemas/selection';
import type { MotorConnectionCard } from '../../schemas/checks';

/** Dual-voltage three-phase motors are wound 230/460 V: at 380 V or more the high-voltage connection (common practice). */
const HIGH_VOLTAGE_FROM = 380;
/** Dual-voltage single-phase motors are wound 115/230 V (common practice). */
const SINGLE_PHASE_LOW_UP_TO = 130;

export function motorConnectionCard(
  loadId: number,
  answers: Record<string, unknown>,
  selection: LoadSelection | null,
): MotorConnectionCard {
  const tag = String(answers.tag ?? selection?.tag ?? '');
  const volts = Number(answers.volts ?? selection?.volts);
  const ratedVolts = Number.isFinite(volts) ? volts : undefined;
  const assumptions: string[] = [];
  const out = (req: ConnectionRequest | null, reason: string | null = null): MotorConnectionCard => ({
    loadId,
    tag,
    card: req ? connectionCard(req) : null,
    assumptions,
    reason,
  });
  const supply = answers.supply ?? selection?.supply;

  if (supply === 'ac3') {
    const leads = answers.leads as 3 | 6 | 9 | 12 | undefined;
    const starter = selection?.starter.type;
    if (leads === undefined || leads === 3) {
      if (leads === undefined)
        assumptions.push(
          'Lead count not given: shown as a three-lead, single-voltage motor. Set the lead count for a six-, nine- or twelve-lead card.',
        );
      return out({ motor: 'three-phase', leads: 3, ratedVolts });
    }
    if (leads === 6) {
      if (starter !== 'wye-delta') assumptions.push('The starter is not wye-delta: connect the motor as the "Run (delta)" step only.');
      return out({ motor: 'three-phase', leads: 6, method: 'wye-delta', ratedVolts });
    }
    const voltage: 'low' | 'high' = (ratedVolts ?? 0) >= HIGH_VOLTAGE_FROM ? 'high' : 'low';
    assumptions.push(
      `${ratedVolts} V taken as the ${voltage} voltage of a dual-voltage 230/460 V motor (common practice): check the nameplate.`,
    );
    const answered = answers.connection as 'wye' | 'delta' | undefined;
    const winding = answered ?? 'wye';
    if (!answered) assumptions.push('Internal connection not given: shown as wye. Check the motor nameplate (wye or delta).');
    if (starter === 'part-winding') {
      if (leads === 9 && winding === 'wye' && voltage === 'low')
        return out({ motor: 'three-phase', leads: 9, winding: 'wye', voltage: 'low', method: 'part-winding', ratedVolts });
      assumptions.push('Part-winding start needs a nine-lead wye motor on its low-voltage connection: check the starter and the motor.');
    }
    return out({ motor: 'three-phase', leads, winding, voltage, ratedVolts });
  }

  if (supply === 'ac1') {
    if (answers.singlePhaseType === 'psc') {
      return out(
        null,
        'Permanent-split capacitor motor: follow the lead diagram on the motor (no standard dual-voltage card). Reverse by the motor maker’s instructions.',
      );
    }
    const voltage: 'low' | 'high' = (ratedVolts ?? 0) <= SINGLE_PHASE_LOW_UP_TO ? 'low' : 'high';
    assumptions.push(
      `Taken as an eight-lead dual-voltage 115/230 V motor at its ${voltage} voltage (${ratedVolts} V, common practice): check the nameplate.`,
    );
    return out({ motor: 'single-phase', leads: 8, voltage, ratedVolts });
  }

  if (supply === 'dc') {
    const field = (answers.dcField as 'shunt' | 'series' | 'compound' | undefined) ?? selection?.dc?.field;
    if (!field) return out(null, 'DC field type not given (shunt, series or compound): set it on the motor.');
    return out({ motor: 'dc', field, ratedVolts });
  }
  return out(null, 'Supply kind not known.');
}
