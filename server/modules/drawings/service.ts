// The panel's shop drawings from the same context as the panel checks (effective selections, the bill of
// materials the checks read, the nameplate values they computed): schematic sheets, terminal plan, wire list,
// panel marking. Nothing is stored: a change to a motor changes every drawing with it.
import ExcelJS from 'exceljs';
import type { CurrentUser } from '../../../shared/schemas/auth';
import { NotFoundError } from '../../../shared/errors';
import {
  buildPanelDrawings,
  TERMINAL_COLUMNS,
  terminalRowsFor,
  WIRE_COLUMNS,
  wireRowsFor,
  type PanelDrawings,
} from '../../../shared/drawings/panel-drawings';
import { bucketSheetSvg, nameplateSvg, schematicSheets, stackSheets, supplySheetSvg, terminalRefMap } from '../../../shared/drawings/svg';
import type { PanelChecks } from '../../../shared/schemas/checks';
import type { SubmittalDrawings } from '../../../shared/drawings/panel-drawings';
import { computeChecks, type ChecksContext } from '../checks/service';
import { CONTROL_VOLTS } from '../../../shared/calc/checks/control-power-check';
import { backplateLayout } from '../../../shared/calc/layout/backplate';
import { motorGroup } from '../../../shared/calc/group-circuits';
import { layoutSheetSvg } from '../../../shared/drawings/svg-layout';

export interface DrawingContext {
  drawings: PanelDrawings;
  checks: PanelChecks;
  mainText: string;
  cptText: string;
}

export async function panelDrawings(actor: CurrentUser, panelId: number): Promise<DrawingContext> {
  return drawingsFrom(await computeChecks(actor, panelId));
}

/** The drawings from a panel-checks context already computed (the submittal reuses its own). */
export function drawingsFrom(ctx: ChecksContext): DrawingContext {
  const { checks, selections, lines } = ctx;
  const byTag = new Map(selections.map((s) => [s.tag, s]));
  const answersByTag = new Map(ctx.answers.map((a) => [String(a.tag ?? ''), a]));
  const buckets = checks.connectionCards
    .filter((c) => byTag.has(c.tag))
    .map((c) => {
      const drive = ctx.checks.sharedDrives?.drives.find((d) => d.motors.some((m) => m.tag === c.tag));
      const group = motorGroup({ groups: ctx.checks.groupCircuits?.groups }, c.tag);
      return {
        selection: byTag.get(c.tag)!,
        card: c.card,
        jogging: answersByTag.get(c.tag)?.jogging === true,
        ...(drive ? { sharedDrive: drive.tag } : {}),
        ...(group?.device && group.path
          ? {
              branchGroup: {
                tag: group.group,
                type: group.device.type,
                ratingAmps: group.device.ratingAmps,
                clause: `430.53(${group.path})`,
              },
            }
          : {}),
      };
    });
  // the revision as the sheets' title block and drawing numbers carry it: R1 when signed off, else a draft (D)
  const revisionCode = ctx.panel.status === 'signed_off' && ctx.panel.revisionNumber !== null ? `R${ctx.panel.revisionNumber}` : 'D';
  const drawings = buildPanelDrawings({
    jobNumber: checks.job.number,
    jobName: checks.job.name,
    panelName: checks.panel.name,
    revision: revisionCode === 'D' ? 'Draft' : revisionCode,
    date: new Date().toISOString().slice(0, 10),
    supply: { volts: checks.job.supplyVolts, phases: checks.job.supplyPhases, hz: checks.job.supplyHz },
    controlVolts: CONTROL_VOLTS,
    buckets,
    bom: lines,
    // the shop's name in every sheet's title block (shop settings)
    shopName: ctx.shop.name,
    // the sheets numbered by the shop's scheme, as the submittal's pages are
    numberScheme: { scheme: ctx.shop.drawingNumberScheme, revisionCode },
    // the parts of the bill of materials on the enclosure its enclosure line names (the heat check's enclosure)
    layout: backplateLayout(lines, (code) => ctx.catalogue.get(code)),
  });
  const main = lines.find((l) => l.bucket === '(panel)' && (l.category === 'main-breaker' || l.category === 'main-disconnect'));
  const cpt = lines.find((l) => l.category === 'control-transformer');
  if (checks.motorsWithErrors.length > 0)
    drawings.warnings.push(`Not drawn until their selection is fixed: ${checks.motorsWithErrors.join(', ')}.`);
  if (checks.bom.note) drawings.warnings.push(checks.bom.note);
  return {
    drawings,
    checks,
    mainText: main ? `${main.code ?? ''} ${main.description}`.trim().slice(0, 60) : 'main device (see the bill of materials)',
    cptText: cpt ? cpt.description.slice(0, 50) : 'control power transformer',
  };
}

/** All sheets of the schematic, or one bucket's (404 for a tag not on the panel). */
export function schematicSvg(c: DrawingContext, tag?: string): string {
  if (tag !== undefined) {
    if (!c.drawings.buckets.some((b) => b.tag === tag)) throw new NotFoundError(`No drawn motor ${tag} on this panel`);
    return `<?xml version="1.0" encoding="UTF-8"?>\n${bucketSheetSvg(c.drawings, tag, terminalRefMap(c.drawings))}`;
  }
  return stackSheets([supplySheetSvg(c.drawings, c.mainText, c.cptText), ...schematicSheets(c.drawings)]);
}

/** The backplate layout sheet, drawn to scale. */
export function layoutSvg(c: DrawingContext): string {
  const ref = c.drawings.sheets.find((s) => s.kind === 'layout')!;
  return `<?xml version="1.0" encoding="UTF-8"?>\n${layoutSheetSvg(c.drawings, ref)}`;
}

export function supplySvg(c: DrawingContext): string {
  return `<?xml version="1.0" encoding="UTF-8"?>\n${supplySheetSvg(c.drawings, c.mainText, c.cptText)}`;
}

/** The panel marking; its manufacturer line is the shop's name, as the checks' nameplate gives it. */
export function panelNameplateSvg(c: DrawingContext): string {
  const np = c.checks.nameplate.result;
  if (!np) throw new NotFoundError(c.checks.nameplate.reason ?? 'No nameplate for this panel yet');
  return `<?xml version="1.0" encoding="UTF-8"?>\n${nameplateSvg(np, { drawingNumber: c.drawings.drawingNumber, fullLoadWorking: fullLoadWorking(c.checks) })}`;
}

/** The 409.110(2) full-load current with its working. */
export function fullLoadWorking(checks: PanelChecks): string {
  const np = checks.nameplate.result;
  if (!np) return '';
  return `Full-load current ${np.fullLoadAmps} A: the sum of the motors’ table full-load currents (NEC 2023 430.6(A)(1)) and the other loads, NEC 2023 409.110(2).`;
}

export async function wiringWorkbook(c: DrawingContext): Promise<Buffer> {
  const wb = new ExcelJS.Workbook();
  wb.creator = 'Panelwright';
  wb.created = new Date(0);
  const add = (name: string, header: readonly string[], rows: unknown[][], widths: number[]) => {
    const ws = wb.addWorksheet(name, { views: [{ state: 'frozen', ySplit: 1 }] });
    ws.addRow([...header]).font = { bold: true };
    for (const r of rows) ws.addRow(r.map((v) => (typeof v === 'string' && /^[=+\-@]/.test(v) ? `'${v}` : v)));
    ws.columns.forEach((col, i) => {
      col.width = widths[i] ?? 14;
    });
    ws.autoFilter = { from: { row: 1, column: 1 }, to: { row: 1, column: header.length } };
  };
  add('Terminals', TERMINAL_COLUMNS, terminalRowsFor(c.drawings), [10, 7, 7, 12, 8, 40, 8, 16, 34, 22, 12, 10, 10]);
  add('Wires', WIRE_COLUMNS, wireRowsFor(c.drawings), [8, 20, 28, 22, 12, 10, 22]);
  const about = wb.addWorksheet('About');
  about.addRow([`Drawing ${c.drawings.drawingNumber}`]);
  about.addRow([c.drawings.colourPractice]);
  about.addRow([
    `Terminal blocks in the bill of materials: ${c.drawings.bomTerminalBlocks}; terminals in the plan: ${c.drawings.terminals.length}.`,
  ]);
  about.addRow([
    'Generated from the stored selections and the bill of materials; a qualified person verifies them before the panel is built.',
  ]);
  return Buffer.from(await wb.xlsx.writeBuffer());
}

/** The submittal's drawing pages: supply and schematic sheets, backplate layout, terminal plan, panel marking. */
export function submittalDrawings(c: DrawingContext): SubmittalDrawings {
  return {
    drawingNumber: c.drawings.drawingNumber,
    sheets: [supplySheetSvg(c.drawings, c.mainText, c.cptText), ...schematicSheets(c.drawings)],
    layoutSvg: layoutSheetSvg(c.drawings, c.drawings.sheets.find((s) => s.kind === 'layout')!),
    terminals: c.drawings.terminals,
    bomTerminalBlocks: c.drawings.bomTerminalBlocks,
    colourPractice: c.drawings.colourPractice,
    nameplateSvg: c.checks.nameplate.result ? panelNameplateSvg(c) : null,
  };
}
