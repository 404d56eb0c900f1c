// The motor list's note on motors grouped on one branch circuit (430.53): each group with its motors, the path
// that allows it and the one device that replaces their own in the rows below. A refused group is among the
// roll-up's errors, and its motors keep their own devices.
import type { PanelRollup } from '../../../../shared/schemas/selection';
import { SCPD_WORDS } from '../../../../shared/calc/scpd';

export function GroupCircuitNote({ rollup }: { rollup: PanelRollup | null | undefined }) {
  const groups = (rollup?.groups ?? []).filter((g) => g.device !== null && g.path !== null);
  if (groups.length === 0) return null;
  return (
    <div
      className="rounded border border-state-review/40 bg-warn-bg px-3 py-2 text-sm"
      role="note"
      aria-label="Motors on one branch circuit"
    >
      <p className="font-semibold">◔ Motors on one branch circuit</p>
      <ul className="mt-1 list-disc space-y-0.5 pl-5">
        {groups.map((g) => (
          <li key={g.group}>
            {g.group} feeds {g.motors.join(', ')} at {g.volts} V through one {g.device?.ratingAmps} A{' '}
            {SCPD_WORDS[g.device?.type ?? 'inverse-time-breaker'].toLowerCase()} (NEC 430.53({g.path}))
            {g.conductor ? `, group conductor ${g.conductor.size}` : ''}. In the rows below, their own protective device is replaced by the
            group's; each keeps its own overload relay and controller (see the panel checks).
          </li>
        ))}
      </ul>
    </div>
  );
}
