// The motor list's note on drives that feed several motors: each drive with its motors and what replaces the
// per-motor rows (the drive's input device for their own protective devices, their own overload relays for the
// drive's overload). The motors that could not join their drive are among the roll-up's errors.
import type { PanelRollup } from '../../../../shared/schemas/selection';
import { sharedDriveLine } from '../../../../shared/calc/checks/shared-drive-check';

export function SharedDriveNote({ rollup }: { rollup: PanelRollup | null | undefined }) {
  const drives = rollup?.sharedDrives ?? [];
  if (drives.length === 0) return null;
  return (
    <div className="rounded border border-state-review/40 bg-warn-bg px-3 py-2 text-sm" role="note" aria-label="Motors on a shared drive">
      <p className="font-semibold">◔ Motors on a shared drive</p>
      <ul className="mt-1 list-disc space-y-0.5 pl-5">
        {drives.map((d) => (
          <li key={d.tag}>
            {sharedDriveLine(d)} In the rows below, their protective device and the drive's overload are replaced by the drive's input
            device and each motor's own overload relay and output contactor (see the panel checks).
          </li>
        ))}
      </ul>
    </div>
  );
}
