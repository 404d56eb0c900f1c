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
/** A compared decision: its label (the value read at its path), or a label and how to read it. */
type Decision = string | readonly [label: string, pick: Pick];
/** Every field of a card, each a decision or null (not a decision: a basis text, an input echoed, a detail). */
type CardPlan<T> = { readonly [F in keyof NonNullable<T>]-?: Decision | null };
type Plan = {
  readonly [K in keyof LoadSelection]-?: NonNullable<LoadSelection[K]> extends readonly unknown[]
    ? Decision | null
    : NonNullable<LoadSelection[K]> extends object
      ? CardPlan<LoadSelection[K]>
      : Decision | null;
};

/**
 * Every field of LoadSelection, each said to be a compared decision or not, in reading order. The type asks
 * for every field of every card: a new decision field fails the typecheck until it is placed here, so the rule
 * check and the change report cannot miss it.
 */
const PLAN: Plan = {
  flcAmps: 'Full-load current (A)',
  starter: {
    type: ['Starter', (s) => starterTypeLabel(s.starter.type)],
    nemaSize: 'NEMA size',
    iecAmps: 'Contactor current (A)',
    reversingContactors: 'Reversing contactors',
    iecCategory: null,
    interlock: null,
    basis: null,
  },
  overload: {
    maxSettingAmps: 'Overload limit (A)',
    tripClass: 'Trip class',
    providedByDrive: 'Overload by the drive',
    relay: ['Overload relay as wired', (s) => (s.overload.providedByDrive || s.flcAmps <= 0 ? null : relayText(s))],
    maxPercent: null,
    basis: null,
  },
  scpd: {
    type: ['Branch protection type', (s) => answerValueLabel('scpdType', s.scpd.type)],
    ratingAmps: 'Branch protection (A)',
    perWinding: ['Per half-winding devices (A)', (s) => s.scpd.perWinding?.ratingAmps ?? null],
    maxPercent: null,
    computedMaxAmps: null,
    basis: null,
  },
  conductor: {
    size: 'Conductors',
    motorLeads: ['Conductors to the motor', (s) => s.conductor.motorLeads?.size ?? null],
    termination60C: ['Conductors at 60 °C terminations', (s) => s.conductor.termination60C?.size ?? null],
    voltageDrop: ['Running voltage drop (%)', (s) => s.conductor.voltageDrop?.percent ?? null],
    minAmpacity: null,
    material: null,
    tempRatingC: null,
    ampacity: null,
    basis: null,
  },
  disconnect: { minAmps: 'Disconnect at least (A)', minHp: null, basis: null },
  relays: { phaseLoss: 'Phase-loss relay', phaseReversal: 'Phase-reversal relay', phaseLossByOverload: 'Phase loss by the overload' },
  enclosure: { nemaType: 'Enclosure type', flagForEngineer: 'Enclosure for the engineer', ipCode: null },
  vfd: {
    minOutputAmps: 'Drive output (A)',
    duty: ['Drive duty', (s) => (s.vfd ? decisionValueLabel('vfd.duty', s.vfd.duty) : null)],
    outputFilter: ['Drive output filter', (s) => (s.vfd ? decisionValueLabel('vfd.outputFilter', s.vfd.outputFilter) : null)],
    inverterDutyMotor: 'Inverter-duty motor',
    basis: null,
  },
  softStarter: { minAmps: 'Soft starter (A)', bypass: 'Soft starter bypass', insideDelta: null },
  dc: { fieldLossProtection: 'Field-loss protection', dynamicBraking: 'Dynamic braking', field: null },
  controlScheme: ['Control scheme', (s) => s.controlScheme ?? 'three-wire'],
  unbalance: { deratingFactor: 'Unbalance derating', percent: null, deratedHp: null, basis: null },
  errors: ['Problems', (s) => (s.errors.length ? s.errors.join('; ') : null)],
  // not decisions: the motor's own data and the engine's texts (cautions are compared as one field below)
  tag: null,
  description: null,
  supply: null,
  hp: null,
  volts: null,
  tableVolts: null,
  flcSource: null,
  flaAmps: null,
  lockedRotorAmps: { min: null, max: null, basis: null },
  synchronousRpm: null,
  cautions: null,
  assumed: null,
  trace: null,
};

const FIELDS: ReadonlyArray<readonly [string, string, Pick]> = Object.entries(PLAN).flatMap(
  ([key, entry]): Array<readonly [string, string, Pick]> => {
    if (entry === null) return [];
    if (typeof entry === 'string' || Array.isArray(entry)) return [decision(key, entry as Decision, (s) => Reflect.get(s, key))];
    return Object.entries(entry as Record<string, Decision | null>).flatMap(([field, d]) =>
      d === null
        ? []
        : [
            decision(`${key}.${field}`, d, (s) => {
              const card: unknown = Reflect.get(s, key);
              return card && typeof card === 'object' ? (Reflect.get(card, field) ?? null) : null;
            }),
          ],
    );
  },
);

function decision(field: string, d: Decision, read: Pick): readonly [string, string, Pick] {
  return typeof d === 'string' ? [field, d, read] : [field, d[0], d[1]];
}

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
    const what =
      added.length === removed
        ? `${added.length} reworded`
        : [added.length ? `${added.length} new or reworded` : '', removed > added.length ? `${removed - added.length} gone` : '']
            .filter(Boolean)
            .join(', ');
    out.push({
      field: 'cautions',
      label: 'Cautions',
      from: `${ca.length}`,
      to: `${cb.length} (${what})${added.length ? `: ${added.map((c) => `“${c}”`).join(' ')}` : ''}`,
    });
  }
  return out;
}
