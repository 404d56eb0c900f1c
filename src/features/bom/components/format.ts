import { CATEGORY_LABELS, PANEL_BUCKET, type BomCategory } from '../../../../shared/schemas/catalogue';
import { isSourceBucket } from '../../../../shared/calc/other-sources';

export const hours = (n: number) => n.toLocaleString('en-US', { minimumFractionDigits: 2, maximumFractionDigits: 2 });
export const qty = (n: number) => n.toLocaleString('en-US', { maximumFractionDigits: 2 });

const MANUAL_LABELS: Record<string, string> = { freight: 'Freight', engineering: 'Engineering', spares: 'Spares', other: 'Other' };
export const categoryLabel = (c: BomCategory) =>
  c in CATEGORY_LABELS ? CATEGORY_LABELS[c as keyof typeof CATEGORY_LABELS] : (MANUAL_LABELS[c] ?? c);
export const bucketLabel = (b: string) =>
  b === PANEL_BUCKET ? 'Panel items' : isSourceBucket(b) ? `${b} (motors at another voltage)` : `Motor ${b}`;
