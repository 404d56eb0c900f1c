// Applies a designer's overrides on top of the engine's selection and says what the engineer must
// look at. Refuses an override that makes a protection choice smaller than the code minimum.
import type { LoadSelection } from '../schemas/selection';
import type { OverrideInput, StoredOverride } from '../schemas/override';
import { ValidationError } from '../errors';
import { relayFor } from './overload';
import { NEMA_SIZES } from '../standards/nema-ics-2-starter-sizes';
import { ampacity310_16 } from '../standards/nec-table-310-16';

const SIZE_ORDER = NEMA_SIZES.map((s) => s.size);

function getPath(sel: LoadSelection, field: string): unknown {
  const [a, b] = field.split('.') as [keyof LoadSelection, string];
  const part = sel[a] as Record<string, unknown> | null;
  return part ? part[b] : undefined;
}

/** Checks an override against the selection; returns warnings or throws a ValidationError. */
export function checkOverride(sel: LoadSelection, o: OverrideInput, index = 0): string[] {
  const bad = (message: string) => {
    throw new ValidationError(message, [{ path: `overrides[${index}].value`, message }]);
  };
  const warnings: string[] = [];
  switch (o.field) {
    case 'starter.nemaSize': {
      const to = SIZE_ORDER.indexOf(String(o.value));
      if (to < 0) bad(`NEMA size ${o.value} is not an ICS 2 size (${SIZE_ORDER.join(', ')})`);
      const from = sel.starter.nemaSize ? SIZE_ORDER.indexOf(sel.starter.nemaSize) : -1;
      if (from >= 0 && to < from) bad(`NEMA size ${o.value} is smaller than the size ${sel.starter.nemaSize} the motor needs (NEMA ICS 2)`);
      break;
    }
    case 'scpd.ratingAmps': {
      const v = Number(o.value);
      if (!Number.isFinite(v)) bad('The rating must be a number of amperes');
      if (v > sel.scpd.ratingAmps) {
        warnings.push(
          `${v} A is above the ${sel.scpd.ratingAmps} A that 430.52(C)(1) with Exception 1 permits; the higher limits of Exception 2 apply only where the motor will not start`,
        );
      }
      if (v < sel.flcAmps)
        warnings.push(`${v} A is below the motor's ${sel.flcAmps} A full-load current: nuisance tripping on start is likely`);
      break;
    }
    case 'conductor.size': {
      let amp = 0;
      try {
        amp = ampacity310_16(String(o.value), sel.conductor.material, sel.conductor.tempRatingC);
      } catch {
        bad(`${o.value} is not a size in Table 310.16 (write e.g. "10 AWG", "1/0 AWG", "250 kcmil")`);
      }
      if (amp < sel.conductor.minAmpacity)
        bad(`${o.value} carries ${amp} A, below the ${sel.conductor.minAmpacity} A that 430.22 requires (125 % of FLC)`);
      break;
    }
    case 'overload.tripClass':
      if (![10, 20, 30].includes(Number(o.value))) bad('Trip class is 10, 20 or 30');
      if (Number(o.value) > sel.overload.tripClass)
        warnings.push(
          `Class ${o.value} trips slower than the chosen class ${sel.overload.tripClass}: confirm it stays within the motor's locked-rotor withstand time`,
        );
      break;
    case 'relays.phaseLoss':
    case 'relays.phaseReversal':
      if (typeof o.value !== 'boolean') bad('Give true or false');
      if (o.value === false && getPath(sel, o.field) === true)
        warnings.push(`Removes a relay the rules chose (${o.field === 'relays.phaseLoss' ? 'phase loss' : 'phase reversal'})`);
      break;
    case 'enclosure.nemaType':
      if (!['1', '3R', '4', '4X', '7', '9', '12'].includes(String(o.value))) bad('NEMA type is one of 1, 3R, 4, 4X, 7, 9, 12');
      if (String(o.value) !== sel.enclosure.nemaType)
        warnings.push(`Enclosure type ${o.value} replaces the type ${sel.enclosure.nemaType} chosen for the environment`);
      break;
    case 'starter.type':
    case 'scpd.type':
      warnings.push(
        `${o.field === 'starter.type' ? 'Starter' : 'Protective device'} type changed from ${String(getPath(sel, o.field))}: sizes were computed for the engine's choice`,
      );
      break;
  }
  return warnings;
}

/** The effective selection: the engine's result with the overrides written over it. */
export function applyOverrides(sel: LoadSelection, overrides: ReadonlyArray<Pick<StoredOverride, 'field' | 'value'>>): LoadSelection {
  if (!overrides.length) return sel;
  const eff = structuredClone(sel);
  for (const o of overrides) {
    const [a, b] = o.field.split('.');
    // the field names a card and one of its values ("overload.tripClass"): the override fields' list is the schema
    const card: unknown = Reflect.get(eff, a!);
    if (card && typeof card === 'object')
      Reflect.set(card, b!, o.field === 'overload.tripClass' || o.field === 'scpd.ratingAmps' ? Number(o.value) : o.value);
  }
  // the overload relay's position follows the starter actually fitted (sizes stay the engine's)
  if (eff.starter.type !== sel.starter.type) {
    eff.overload.relay = relayFor(eff);
    // conductors to the motor and per-winding devices were sized for the engine's wye-delta or
    // part-winding starter: another starter takes them away (the warning says the sizes were the engine's)
    delete eff.conductor.motorLeads;
    delete eff.conductor.voltageDrop;
    delete eff.scpd.perWinding;
  }
  // the drop was worked out on the engine's conductor
  if (eff.conductor.size !== sel.conductor.size) delete eff.conductor.voltageDrop;
  if (eff.scpd.type !== sel.scpd.type) delete eff.scpd.perWinding;
  return eff;
}
