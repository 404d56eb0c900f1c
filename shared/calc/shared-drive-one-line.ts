// The one-line of a motor on a shared drive, top (supply) to bottom (motor): the feeder bus, the drive's
// disconnect, input protective device and the drive (named with the motors it feeds), the drive's output, then
// this motor's output contactor (interlocked with the drive's enable), its own overload relay and the motor.
import { SCPD_WORDS } from './scpd';
import { decisionValueLabel } from '../labels';
import { disconnectMinAmps } from '../standards/nec-430-110-disconnect';
import type { LoadSelection, PanelRollup, SharedDrive } from '../schemas/selection';
import type { OneLineElement } from './one-line';

/** The shared drive that feeds a motor, or null when it has its own controller. */
export function sharedDriveOf(rollup: Pick<PanelRollup, 'sharedDrives'> | null | undefined, tag: string): SharedDrive | null {
  return rollup?.sharedDrives?.find((d) => d.motors.some((m) => m.tag === tag)) ?? null;
}

export function sharedDriveOneLine(s: LoadSelection, d: SharedDrive): OneLineElement[] {
  const m = d.motors.find((x) => x.tag === s.tag);
  const p = d.input.protection;
  const filter = d.output.outputFilter !== 'none' ? `, ${decisionValueLabel('vfd.outputFilter', d.output.outputFilter)}` : '';
  return [
    { kind: 'bus', label: 'Feeder bus', detail: `${d.volts} V` },
    {
      kind: 'disconnect',
      label: `${d.tag} disconnect`,
      detail: `≥ ${disconnectMinAmps(d.input.amps)} A (the motors together, 430.110(C)(1))`,
    },
    { kind: p.type.endsWith('fuse') ? 'fuse' : 'breaker', label: `${p.ratingAmps} A ${SCPD_WORDS[p.type]}`, detail: p.basis },
    {
      kind: 'vfd',
      label: `${d.tag} — shared drive (feeds ${d.motors.map((x) => x.tag).join(', ')})`,
      detail: `≥ ${d.output.minOutputAmps} A, ${decisionValueLabel('vfd.duty', d.output.duty)?.toLowerCase()}${filter}`,
    },
    { kind: 'bus', label: `${d.tag} output`, detail: `${d.outputConductor.size} to the taps` },
    {
      kind: 'contactor',
      label: 'Output contactor',
      detail: `AC-3 ≥ ${m?.outputContactor.minAc3Amps ?? s.flaAmps} A, interlocked with the drive's enable`,
      poles: ['M'],
      interlocked: true,
    },
    {
      kind: 'overload',
      label: `Overload, class ${m?.overload.tripClass ?? s.overload.tripClass}`,
      detail: `set ${m?.overload.settingAmps ?? s.flaAmps} A, max ${m?.overload.maxSettingAmps ?? s.overload.maxSettingAmps} A (${s.overload.maxPercent} % FLA)`,
    },
    {
      kind: 'motor',
      label: `${s.tag}${s.hp !== null ? ` — ${s.hp} hp` : ''}`,
      detail: [`FLC ${s.flcAmps} A`, ...(m ? [`${m.conductor.size}`] : [])].join(' · '),
    },
  ];
}
