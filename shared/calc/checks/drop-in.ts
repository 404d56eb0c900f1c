// Whether a catalogue part can take the place of another without changing the design: same duty, same
// protection, ratings at least those of the part it replaces. The SCCR worksheet's ways out offer only these.
import type { CatalogueItem } from '../../schemas/catalogue';
import type { LoadSelection } from '../../schemas/selection';

/** The overload setting in a bucket, as the bill of materials sets the dial (common practice). */
function overloadSetting(s: LoadSelection): number {
  const t = s.starter.type;
  return t === 'wye-delta' ? s.flaAmps / Math.sqrt(3) : t === 'part-winding' ? s.flaAmps / 2 : s.flaAmps;
}

const SAME_RATINGS = ['nemaSize', 'coilVolts', 'poles', 'fuseClass', 'timeDelay', 'kind', 'secondaryVolts'] as const;
const AT_LEAST = ['volts', 'iecAc3Amps', 'iecAc4Amps', 'normalDutyAmps', 'heavyDutyAmps', 'inputAmps', 'va', 'outputs'] as const;
const PROTECTIVE = new Set(['fuse', 'inverse-time-breaker', 'main-breaker', 'motor-circuit-protector']);
const FLAGS = ['builtInOverload', 'internalBypass', 'detectsPhaseLoss', 'detectsPhaseReversal', 'detectsImbalance'] as const;

/** Whether a catalogue part can take the place of another without changing the design (same duty, same protection). */
export function isDropInReplacement(current: CatalogueItem, candidate: CatalogueItem, selection: LoadSelection | undefined): boolean {
  if (candidate.category !== current.category || !candidate.active || candidate.code === current.code) return false;
  const a = current.ratings;
  const b = candidate.ratings;
  for (const k of SAME_RATINGS) if (a[k] !== undefined && a[k] !== b[k]) return false;
  for (const k of AT_LEAST) if (a[k] !== undefined && (b[k] === undefined || (b[k] as number) < (a[k] as number))) return false;
  for (const k of FLAGS) if (a[k] && !b[k]) return false;
  if (a.amps !== undefined) {
    if (b.amps === undefined) return false;
    if (PROTECTIVE.has(current.category) ? b.amps !== a.amps : b.amps < a.amps) return false;
  }
  for (const [v, hp] of Object.entries(a.hpByVolts ?? {})) {
    const other = b.hpByVolts?.[v as keyof typeof b.hpByVolts];
    if (other === undefined || other < (hp ?? 0)) return false;
  }
  if (a.tripClasses && !a.tripClasses.every((c) => b.tripClasses?.includes(c))) return false;
  if (a.settingMinAmps !== undefined && a.settingMaxAmps !== undefined) {
    if (b.settingMinAmps === undefined || b.settingMaxAmps === undefined) return false;
    if (current.category === 'overload-relay' && selection) {
      const set = overloadSetting(selection);
      if (b.settingMinAmps > set || b.settingMaxAmps < set) return false;
    } else if (b.settingMinAmps > a.settingMinAmps || b.settingMaxAmps < a.settingMaxAmps) return false;
  }
  return true;
}
