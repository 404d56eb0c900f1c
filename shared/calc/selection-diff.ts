// What a selection decides, compared field by field: a stored selection against what the current
// rules and tables make of the same answers. Reasoning and basis texts are left out (they follow
// the decisions); cautions count as one field.
import type { LoadSelection } from '../schemas/selection';
import { relayOf } from './overload';
import { answerValueLabel, decisionValueLabel, starterTypeLabel } from '../labels';

export interface SelectionDifference {
  field: string;
  label: string;
  from: string;
  to: string;
}

type Pick = (s: LoadSelection) => unknown;

const FIELDS: ReadonlyArray<readonly [string, string, Pick]> = [
  ['flcAmps', 'Full-load current (A)', (s) => s.flcAmps],
  ['starter.type', 'Starter', (s) => starterTypeLabel(s.starter.type)],
  ['starter.nemaSize', 'NEMA size', (s) => s.starter.nemaSize],
  ['starter.iecAmps', 'Contactor current (A)', (s) => s.starter.iecAmps],
  ['starter.reversingContactors', 'Reversing contactors', (s) => s.starter.reversingContactors],
  ['overload.maxSettingAmps', 'Overload limit (A)', (s) => s.overload.maxSettingAmps],
  ['overload.tripClass', 'Trip class', (s) => s.overload.tripClass],
  ['overload.providedByDrive', 'Overload by the drive', (s) => s.overload.providedByDrive],
  ['overload.relay', 'Overload relay as wired', (s) => (s.overload.providedByDrive || s.flcAmps <= 0 ? null : relayText(s))],
  ['scpd.type', 'Branch protection type', (s) => answerValueLabel('scpdType', s.scpd.type)],
  ['scpd.ratingAmps', 'Branch protection (A)', (s) => s.scpd.ratingAmps],
  ['scpd.perWinding', 'Per half-winding devices (A)', (s) => s.scpd.perWinding?.ratingAmps ?? null],
  ['conductor.size', 'Conductors', (s) => s.conductor.size],
  ['conductor.motorLeads', 'Conductors to the motor', (s) => s.conductor.motorLeads?.size ?? null],
  ['conductor.termination60C', 'Conductors at 60 °C terminations', (s) => s.conductor.termination60C?.size ?? null],
  ['conductor.voltageDrop', 'Running voltage drop (%)', (s) => s.conductor.voltageDrop?.percent ?? null],
  ['disconnect.minAmps', 'Disconnect at least (A)', (s) => s.disconnect.minAmps],
  ['relays.phaseLoss', 'Phase-loss relay', (s) => s.relays.phaseLoss],
  ['relays.phaseReversal', 'Phase-reversal relay', (s) => s.relays.phaseReversal],
  ['relays.phaseLossByOverload', 'Phase loss by the overload', (s) => s.relays.phaseLossByOverload],
  ['enclosure.nemaType', 'Enclosure type', (s) => s.enclosure.nemaType],
  ['enclosure.flagForEngineer', 'Enclosure for the engineer', (s) => s.enclosure.flagForEngineer],
  ['vfd.minOutputAmps', 'Drive output (A)', (s) => s.vfd?.minOutputAmps ?? null],
  ['vfd.duty', 'Drive duty', (s) => (s.vfd ? decisionValueLabel('vfd.duty', s.vfd.duty) : null)],
  ['vfd.outputFilter', 'Drive output filter', (s) => (s.vfd ? decisionValueLabel('vfd.outputFilter', s.vfd.outputFilter) : null)],
  ['vfd.inverterDutyMotor', 'Inverter-duty motor', (s) => s.vfd?.inverterDutyMotor ?? null],
  ['softStarter.minAmps', 'Soft starter (A)', (s) => s.softStarter?.minAmps ?? null],
  ['softStarter.bypass', 'Soft starter bypass', (s) => s.softStarter?.bypass ?? null],
  ['dc.fieldLossProtection', 'Field-loss protection', (s) => s.dc?.fieldLossProtection ?? null],
  ['dc.dynamicBraking', 'Dynamic braking', (s) => s.dc?.dynamicBraking ?? null],
  ['controlScheme', 'Control scheme', (s) => s.controlScheme ?? 'three-wire'],
  ['unbalance.deratingFactor', 'Unbalance derating', (s) => s.unbalance?.deratingFactor ?? null],
  ['errors', 'Problems', (s) => (s.errors.length ? s.errors.join('; ') : null)],
];

function relayText(s: LoadSelection): string {
  const r = relayOf(s);
  return `${r.count} × set ${r.settingAmps} A, max ${r.maxAmps} A`;
}

function show(v: unknown): string {
  if (v === null || v === undefined) return '—';
  if (typeof v === 'boolean') return v ? 'yes' : 'no';
  return String(v);
}

/** The decisions that differ between two selections of the same motor, in reading order. */
export function selectionDifferences(before: LoadSelection, after: LoadSelection): SelectionDifference[] {
  const out: SelectionDifference[] = [];
  for (const [field, label, pick] of FIELDS) {
    const a = show(pick(before));
    const b = show(pick(after));
    if (a !== b) out.push({ field, label, from: a, to: b });
  }
  const ca = [...before.cautions].sort();
  const cb = [...after.cautions].sort();
  if (ca.join('\n') !== cb.join('\n')) {
    const added = cb.filter((c) => !ca.includes(c));
    const removed = ca.filter((c) => !cb.includes(c)).length;
    const what = added.length === removed ? `${added.length} reworded` : [added.length ? `${added.length} new or reworded` : '', removed > added.length ? `${removed - added.length} gone` : ''].filter(Boolean).join(', ');
    out.push({ field: 'cautions', label: 'Cautions', from: `${ca.length}`, to: `${cb.length} (${what})${added.length ? `: ${added.map((c) => `“${c}”`).join(' ')}` : ''}` });
  }
  return out;
}
