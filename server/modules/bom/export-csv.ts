// Bill-of-materials export as CSV: one row per line, every text neutralised against formula injection.
import type { Writable } from 'node:stream';
import { extendedCost, extendedLabourHours } from '../../../shared/calc/bom';
import { csvField } from '../catalogue/spreadsheet';
import type { BomExportJob, BomExportPanel } from './export';

export const BOM_CSV_HEADERS = [
  'panel',
  'bucket',
  'category',
  'code',
  'description',
  'quantity',
  'unit',
  'unitCost',
  'extendedCost',
  'unitLabourHours',
  'labourHours',
  'status',
  'source',
  'requiredRatings',
  'swapReason',
];

/** The bill of materials as CSV text: one row per line, every text neutralised against formula injection. */
export function bomCsv(panels: readonly BomExportPanel[]): string {
  const out = [BOM_CSV_HEADERS.join(',')];
  for (const p of panels) {
    for (const l of p.lines) {
      out.push(
        [
          csvField(p.name),
          csvField(l.bucket),
          csvField(l.category),
          csvField(l.code),
          csvField(l.description),
          csvField(l.quantity),
          csvField(l.unit),
          csvField(l.unitCost),
          csvField(extendedCost(l)),
          csvField(l.unitLabourHours),
          csvField(extendedLabourHours(l)),
          csvField(l.status),
          csvField(l.source),
          csvField(l.requiredRatings),
          csvField(l.swapReason),
        ].join(','),
      );
    }
  }
  return `${out.join('\r\n')}\r\n`;
}

/** Stream the CSV; resolves once it is written. */
export async function writeBomCsv(_job: BomExportJob, panels: readonly BomExportPanel[], stream: Writable): Promise<void> {
  const body = `\uFEFF${bomCsv(panels)}`;
  await new Promise<void>((resolve, reject) => {
    stream.once('error', reject);
    stream.end(body, () => resolve());
  });
}
