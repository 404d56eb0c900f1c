// The shared drives of a panel for the checks and the submittal: each drive with its motors and sums, the
// drive's input circuit (NEC 430.122(A), 430.130), each motor's own overload relay (430.32), output contactor
// and conductors (430.22), in words, with the cautions the drive carries.
import type { SharedDriveCheck } from '../../schemas/checks';
import type { PanelRollup, SharedDrive } from '../../schemas/selection';
import { SCPD_WORDS } from '../scpd';

const material = (m: 'cu' | 'al') => (m === 'cu' ? 'Cu' : 'Al');

/** One drive in words: what it feeds, its sums, its ratings and its input circuit. */
export function sharedDriveLine(d: SharedDrive): string {
  const p = d.input.protection;
  const input =
    d.input.ratedInputAmps !== null
      ? `rated input ${d.input.ratedInputAmps} A`
      : `rated input not given: the sum of the motors' table FLCs, ${d.input.amps} A, stands in`;
  return `${d.tag} feeds ${d.motors.map((m) => m.tag).join(', ')} at ${d.volts} V: sum of FLC ${d.sumFlcAmps} A, of FLA ${d.sumFlaAmps} A; drive output at least ${d.output.minOutputAmps} A (${d.output.duty} duty); ${input}; input conductors ${d.input.conductor.size} (${d.input.conductor.ampacity} A ≥ ${d.input.conductor.minAmpacity} A, 430.122(A)); input device ${p.ratingAmps} A ${SCPD_WORDS[p.type]} (430.130); output conductors to the taps ${d.outputConductor.size} (≥ ${d.outputConductor.minAmpacity} A).`;
}

/** One motor of a drive in words: its overload relay, output contactor and conductors. */
export function sharedDriveMotorLine(d: SharedDrive, m: SharedDrive['motors'][number]): string {
  return `${m.tag} on ${d.tag}: overload relay set ${m.overload.settingAmps} A, at most ${m.overload.maxSettingAmps} A (${m.overload.maxPercent} %, class ${m.overload.tripClass}, 430.32(A)(1)); output contactor AC-3 ≥ ${m.outputContactor.minAc3Amps} A interlocked with the drive's enable; conductors ${m.conductor.size} ${material(m.conductor.material)} (${m.conductor.ampacity} A ≥ ${m.conductor.minAmpacity} A, 430.22).`;
}

export function sharedDriveCheck(rollup: PanelRollup | null | undefined): SharedDriveCheck {
  const drives = rollup?.sharedDrives ?? [];
  return {
    drives,
    lines: drives.flatMap((d) => [sharedDriveLine(d), ...d.motors.map((m) => sharedDriveMotorLine(d, m))]),
    errors: rollup?.sharedDriveErrors ?? [],
  };
}
