// The submittal's section for drives that feed several motors: each drive with its sums and input circuit,
// each motor's overload relay, output contactor and conductors, the drive's cautions and what kept a motor off it.
import { sharedDriveCheck } from '../../../shared/calc/checks/shared-drive-check';
import type { SubmittalData } from './pdf-data';
import type { Writer } from './pdf-writer';

export function sharedDrivesSection(w: Writer, data: SubmittalData): void {
  const sd = sharedDriveCheck(data.rollup);
  if (sd.drives.length === 0 && sd.errors.length === 0) return;
  w.heading('Motors on a shared drive');
  for (const e of sd.errors) w.para(`Problem: ${e}`);
  for (const line of sd.lines) w.para(line);
  for (const d of sd.drives) {
    w.table(
      ['Item', 'Basis'],
      [0.3, 0.7],
      [
        ['Drive output', d.output.basis],
        ['Input conductors', d.input.conductor.basis],
        ['Input protective device', d.input.protection.basis],
        ['Output conductors to the taps', d.outputConductor.basis],
      ],
    );
    for (const c of d.cautions) w.para(`Caution: ${c}`, 8);
  }
}
