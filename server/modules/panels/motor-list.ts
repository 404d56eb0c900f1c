// A panel's motor list as a workbook: the first sheet in the import format (every answer, so it
// imports back into another panel unchanged), then the selections as a schedule, the column
// meanings and a sheet naming the panel, the date and the cautions.
import { starterTypeLabel } from '../../../shared/labels';
import ExcelJS from 'exceljs';
import type { CurrentUser } from '../../../shared/schemas/auth';
import type { LoadSelection } from '../../../shared/schemas/selection';
import { applyOverrides } from '../../../shared/calc/overrides';
import { relayOf } from '../../../shared/calc/overload';
import { IMPORT_COLUMNS, answerValue } from './import';
import { loadsOf } from './repository';
import { requirePanel } from './service';
import { CHECK_CAUTIONS } from '../../../shared/schemas/checks';
import { SCPD_WORDS } from '../../../shared/calc/scpd';

function cell(v: unknown): string | number | null {
  if (v === undefined || v === null) return null;
  if (typeof v === 'boolean') return v ? 'yes' : 'no';
  if (typeof v === 'number') return v;
  return String(v);
}

/** The schedule columns: header with its unit, and the value from the effective selection. */
const SCHEDULE: ReadonlyArray<readonly [string, number, (s: LoadSelection) => string | number | null]> = [
  ['Tag', 12, (s) => s.tag],
  ['Description', 28, (s) => s.description ?? null],
  ['hp', 7, (s) => s.hp],
  ['V', 6, (s) => s.volts],
  ['FLC (A)', 9, (s) => s.flcAmps],
  ['FLA (A)', 9, (s) => s.flaAmps],
  ['Starter', 16, (s) => starterTypeLabel(s.starter.type)],
  ['NEMA size', 9, (s) => s.starter.nemaSize],
  ['Reversing', 10, (s) => (s.starter.reversingContactors ? 'yes' : 'no')],
  ['Overload max (A, line)', 12, (s) => (s.overload.providedByDrive ? null : s.overload.maxSettingAmps)],
  ['Relays × dial (A)', 16, (s) => (s.overload.providedByDrive ? 'by the drive' : `${relayOf(s).count} × ${relayOf(s).settingAmps}`)],
  ['Relay max each (A)', 12, (s) => (s.overload.providedByDrive ? null : relayOf(s).maxAmps)],
  ['Trip class', 8, (s) => s.overload.tripClass],
  ['Branch protection', 24, (s) => SCPD_WORDS[s.scpd.type]],
  ['Rating (A)', 9, (s) => s.scpd.ratingAmps],
  ['Per half-winding (A)', 12, (s) => (s.scpd.perWinding ? `2 × ${s.scpd.perWinding.ratingAmps}` : null)],
  ['Conductor', 16, (s) => `${s.conductor.size} ${s.conductor.material === 'cu' ? 'Cu' : 'Al'} ${s.conductor.tempRatingC} °C`],
  ['Ampacity (A)', 10, (s) => s.conductor.ampacity],
  ['To the motor', 16, (s) => (s.conductor.motorLeads ? `${s.conductor.motorLeads.count} × ${s.conductor.motorLeads.size}` : null)],
  ['Voltage drop (%)', 11, (s) => s.conductor.voltageDrop?.percent ?? null],
  ['Disconnect ≥ (A)', 11, (s) => s.disconnect.minAmps],
  ['Disconnect ≥ (hp)', 11, (s) => s.disconnect.minHp],
  ['Phase loss', 14, (s) => (s.relays.phaseLoss ? (s.relays.phaseLossByOverload ? 'in the overload' : 'relay') : 'no')],
  ['Phase reversal', 10, (s) => (s.relays.phaseReversal ? 'relay' : 'no')],
  ['NEMA Type', 9, (s) => s.enclosure.nemaType],
  ['Drive ≥ (A)', 10, (s) => s.vfd?.minOutputAmps ?? null],
  ['Soft starter ≥ (A)', 12, (s) => s.softStarter?.minAmps ?? null],
  ['Cautions', 60, (s) => s.cautions.join(' | ') || null],
  ['Problems', 30, (s) => s.errors.join(' | ') || null],
];

export async function motorListExport(actor: CurrentUser, panelId: number) {
  const p = await requirePanel(actor, panelId);
  const loads = await loadsOf(p.id);
  const wb = new ExcelJS.Workbook();
  wb.creator = 'Panelwright';
  wb.created = new Date();

  const motors = wb.addWorksheet('Motors');
  motors.columns = IMPORT_COLUMNS.map((c) => ({ header: c.header, key: c.key, width: Math.max(10, c.header.length + 2) }));
  motors.getRow(1).font = { bold: true };
  motors.views = [{ state: 'frozen', ySplit: 1 }];
  for (const l of loads) {
    const answers = l.answers as Record<string, unknown>;
    motors.addRow(Object.fromEntries(IMPORT_COLUMNS.map((c) => [c.key, cell(answerValue(answers, c))])));
  }

  const schedule = wb.addWorksheet('Selections');
  schedule.columns = SCHEDULE.map(([header, width]) => ({ header, width }));
  schedule.getRow(1).font = { bold: true };
  schedule.views = [{ state: 'frozen', ySplit: 1, xSplit: 1 }];
  for (const l of loads) {
    const stored = l.selection;
    if (!stored) {
      schedule.addRow([l.tag, 'no selection']);
      continue;
    }
    const overrides = l.overrides ?? [];
    const s = applyOverrides(stored, overrides);
    const row = schedule.addRow(SCHEDULE.map(([, , pick]) => pick(s)));
    if (overrides.length)
      row.getCell(1).note =
        `Overridden by the designer: ${overrides.map((o) => `${o.field} = ${o.value} (${o.justification})`).join('; ')}`;
  }

  const help = wb.addWorksheet('Columns');
  help.columns = [
    { header: 'column', width: 24 },
    { header: 'meaning', width: 90 },
  ];
  help.getRow(1).font = { bold: true };
  for (const c of IMPORT_COLUMNS) help.addRow([c.header, c.note]);

  const about = wb.addWorksheet('About');
  about.columns = [{ width: 22 }, { width: 100 }];
  about.addRows([
    ['Job', `${p.job.number} ${p.job.name}`],
    ['Panel', p.name],
    [
      'Supply',
      `${p.job.supplyVolts} V, ${p.job.supplyPhases}-phase, ${p.job.supplyHz} Hz; ${p.job.availableFaultKa} kA available; ambient ${p.job.ambientC} °C`,
    ],
    ['Code edition', `NEC ${p.job.codeEdition}`],
    [
      'Terminations',
      p.terminationsListed75C === false
        ? 'not listed for 75 °C: 14–1 AWG and circuits of 100 A or less at 60 °C (NEC 110.14(C)(1)(a))'
        : p.terminationsListed75C
          ? 'listed for 75 °C (NEC 110.14(C)(1)(a)(3))'
          : 'not answered: taken as listed for 75 °C, flagged (NEC 110.14(C)(1))',
    ],
    ['Exported', `${new Date().toISOString().slice(0, 16).replace('T', ' ')} UTC`],
    ['Motors sheet', 'The import format: upload this workbook on another panel to add the same motors (tags must be new there).'],
    [
      'Selections sheet',
      "The engine's selections with the designer's overrides written over them (a note on the tag names each override).",
    ],
    [],
    ...CHECK_CAUTIONS.map((c, i) => [i === 0 ? 'Cautions' : '', c]),
  ]);
  about.getColumn(1).font = { bold: true };

  const base = `${p.job.number}-${p.name}-motors`;
  return { base, buffer: Buffer.from(await wb.xlsx.writeBuffer()) };
}
