// Stage 6 of the bill of materials, the totals: extended cost and labour per line, material, labour and
// sell for a set of lines by bucket and by category, and the purchasing roll-up by part code.
import { CATEGORIES, MANUAL_CATEGORIES, type BomCategory, type BomLine, type BomTotals } from '../../schemas/catalogue';
import { round2, round4 } from '../round';

export const extendedCost = (l: Pick<BomLine, 'quantity' | 'unitCost'>): number => round2(l.quantity * l.unitCost);
export const extendedLabourHours = (l: Pick<BomLine, 'quantity' | 'unitLabourHours'>): number => round4(l.quantity * l.unitLabourHours);

const CATEGORY_ORDER = new Map<BomCategory, number>([...CATEGORIES.map((c) => c.id), ...MANUAL_CATEGORIES].map((c, i) => [c, i]));

/**
 * Material, labour and sell for a set of lines. Labour cost = hours × rate; markup on material + labour.
 * Extended costs are rounded to the cent per line, as the spreadsheet export does.
 */
export function computeTotals(lines: readonly BomLine[], markupPercent: number, labourRatePerHour = 0): BomTotals {
  let material = 0;
  let hours = 0;
  let unmatched = 0;
  const byBucket = new Map<string, { materialCost: number; labourHours: number }>();
  const byCategory = new Map<BomCategory, { materialCost: number; labourHours: number }>();
  for (const l of lines) {
    const m = extendedCost(l);
    const h = extendedLabourHours(l);
    material += m;
    hours += h;
    if (l.status === 'unmatched') unmatched++;
    const bb = byBucket.get(l.bucket) ?? { materialCost: 0, labourHours: 0 };
    bb.materialCost += m;
    bb.labourHours += h;
    byBucket.set(l.bucket, bb);
    const bc = byCategory.get(l.category) ?? { materialCost: 0, labourHours: 0 };
    bc.materialCost += m;
    bc.labourHours += h;
    byCategory.set(l.category, bc);
  }
  const materialCost = round2(material);
  const labourHours = round2(hours);
  const labourCost = round2(labourHours * labourRatePerHour);
  const cost = round2(materialCost + labourCost);
  const markup = round2((cost * markupPercent) / 100);
  return {
    materialCost,
    labourHours,
    labourRate: labourRatePerHour,
    labourCost,
    cost,
    markupPercent,
    markup,
    sell: round2(cost + markup),
    unmatchedLines: unmatched,
    byBucket: [...byBucket].map(([bucket, g]) => ({ bucket, materialCost: round2(g.materialCost), labourHours: round2(g.labourHours) })),
    byCategory: [...byCategory]
      .sort((a, b) => (CATEGORY_ORDER.get(a[0]) ?? 99) - (CATEGORY_ORDER.get(b[0]) ?? 99))
      .map(([category, g]) => ({ category, materialCost: round2(g.materialCost), labourHours: round2(g.labourHours) })),
  };
}

export interface RollupLine {
  code: string | null;
  category: BomCategory;
  description: string;
  unit: 'ea' | 'ft';
  quantity: number;
  unitCost: number;
  extendedCost: number;
  /** required ratings of an unmatched group */
  requiredRatings: string | null;
  buckets: string[];
}

/** Purchasing roll-up: one row per part code and frozen unit cost; unmatched lines grouped by what they need. Sorted by category then code. */
export function rollupByCode(lines: readonly BomLine[]): RollupLine[] {
  const groups = new Map<string, RollupLine>();
  for (const l of lines) {
    const key = l.code !== null ? `c|${l.code}|${l.unitCost}` : `u|${l.category}|${l.requiredRatings ?? l.description}|${l.unitCost}`;
    let g = groups.get(key);
    if (!g) {
      g = {
        code: l.code,
        category: l.category,
        description: l.description,
        unit: l.unit,
        quantity: 0,
        unitCost: l.unitCost,
        extendedCost: 0,
        requiredRatings: l.code === null ? l.requiredRatings : null,
        buckets: [],
      };
      groups.set(key, g);
    }
    g.quantity = round4(g.quantity + l.quantity);
    if (!g.buckets.includes(l.bucket)) g.buckets.push(l.bucket);
  }
  const out = [...groups.values()];
  for (const g of out) g.extendedCost = extendedCost(g);
  return out.sort(
    (a, b) =>
      (CATEGORY_ORDER.get(a.category) ?? 99) - (CATEGORY_ORDER.get(b.category) ?? 99) ||
      (a.code ?? '\uffff').localeCompare(b.code ?? '\uffff') ||
      a.unitCost - b.unitCost,
  );
}
