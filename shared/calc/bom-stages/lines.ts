// The lines of a bill of materials: a matched line (the item's price, labour, heat and rating) or an
// unmatched one stating what it needs, each with its labour, and the line builder the stages add to.
import {
  CATEGORIES,
  CATEGORY_LABELS,
  type BomLine,
  type CatalogueItem,
  type Category,
  type LabourKey,
  type LabourUnit,
  type Requirement,
} from '../../schemas/catalogue';
import { round4 } from '../round';
import { describeRequirement } from './describe';
import { selectItem, type CatalogueIndex } from './match';

export interface LabourTable {
  get(key: LabourKey): LabourUnit | undefined;
}

const CATEGORY_LABOUR = Object.fromEntries(CATEGORIES.map((c) => [c.id, c.labourKey])) as Record<Category, LabourKey>;

/** Labour hours for one unit of an item: the category's mounting unit + its terminations + the item's own adder. */
export function unitLabourHours(category: Category, item: CatalogueItem | null, labour: LabourTable): number {
  const mount = labour.get(CATEGORY_LABOUR[category])?.hours ?? 0;
  const term = labour.get('termination')?.hours ?? 0;
  if (!item) return round4(mount);
  return round4(mount + item.terminations * term + item.labourHours);
}

/** A line swapped by the estimator for an equivalent item: the item's price, labour, heat and rating, with the reason. */
export function swappedLine(line: BomLine, item: CatalogueItem, labour: LabourTable, reason: string | null): BomLine {
  return {
    ...matchedLine(line.bucket, item, line.quantity, labour, line.requirement ?? null),
    source: 'swapped',
    swapReason: reason,
    swappedFrom: line.source === 'swapped' ? (line.swappedFrom ?? null) : line.code,
  };
}

export function matchedLine(
  bucket: string,
  item: CatalogueItem,
  quantity: number,
  labour: LabourTable,
  requirement: Requirement[] | null,
): BomLine {
  return {
    bucket,
    category: item.category,
    code: item.code,
    description: item.description,
    quantity,
    unit: item.unit,
    unitCost: item.unitCost,
    unitLabourHours: unitLabourHours(item.category, item, labour),
    heatLossW: item.heatLossW,
    sccrKa: item.sccrKa,
    status: 'matched',
    requiredRatings: null,
    source: 'auto',
    swapReason: null,
    requirement,
  };
}

export function unmatchedLine(
  bucket: string,
  category: Category,
  quantity: number,
  needs: string,
  labour: LabourTable,
  requirement: Requirement[] | null,
): BomLine {
  return {
    bucket,
    category,
    code: null,
    description: `Unmatched — ${CATEGORY_LABELS[category]}`,
    quantity,
    unit: category === 'wire' ? 'ft' : 'ea',
    unitCost: 0,
    unitLabourHours: unitLabourHours(category, null, labour),
    heatLossW: 0,
    sccrKa: null,
    status: 'unmatched',
    requiredRatings: needs,
    source: 'auto',
    swapReason: null,
    requirement,
  };
}

/**
 * The lines of one bill of materials as the stages add them: each requirement matched once (a memo by
 * requirement), a matched line for the item or an unmatched line describing what it needs.
 */
export class LineBuilder {
  readonly lines: BomLine[] = [];
  private readonly memo = new Map<string, CatalogueItem | null>();
  constructor(
    readonly index: CatalogueIndex,
    readonly labour: LabourTable,
  ) {}

  find(req: Requirement): CatalogueItem | null {
    const key = JSON.stringify(req);
    let hit = this.memo.get(key);
    if (hit === undefined) {
      hit = selectItem(this.index, req);
      this.memo.set(key, hit);
    }
    return hit;
  }

  /** Add the match for req, or an unmatched line; returns the item. */
  add(bucket: string, req: Requirement, quantity: number): CatalogueItem | null {
    if (quantity <= 0) return null;
    const item = this.find(req);
    this.lines.push(
      item
        ? matchedLine(bucket, item, quantity, this.labour, [req])
        : unmatchedLine(bucket, req.category, quantity, describeRequirement(req), this.labour, [req]),
    );
    return item;
  }

  /** First requirement of the list that matches; unmatched line describing the first when none does. */
  addFirst(bucket: string, reqs: Requirement[], quantity: number): CatalogueItem | null {
    for (const req of reqs) {
      const item = this.find(req);
      if (item) {
        this.lines.push(matchedLine(bucket, item, quantity, this.labour, reqs));
        return item;
      }
    }
    const needs = reqs.map(describeRequirement).join(' — or — ');
    this.lines.push(unmatchedLine(bucket, reqs[0]!.category, quantity, needs, this.labour, reqs));
    return null;
  }

  /** A line for an item already chosen, with the requirement a swap must keep meeting. */
  addItem(bucket: string, item: CatalogueItem, quantity: number, requirement: Requirement[]): void {
    this.lines.push(matchedLine(bucket, item, quantity, this.labour, requirement));
  }

  unmatched(bucket: string, category: Category, quantity: number, needs: string): void {
    this.lines.push(unmatchedLine(bucket, category, quantity, needs, this.labour, null));
  }
}
