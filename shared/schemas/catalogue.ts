// The shop's component catalogue, its labour units, and the bill-of-materials line, by concern:
//   catalogue-items.ts (categories, ratings, items, labour units), catalogue-bom.ts (the bill-of-materials
//   line, its requirement and totals), catalogue-spreadsheet.ts (import/export rows); here the API's shapes.
import type { CatalogueItem, CatalogueItemInput, Category, LabourUnit } from './catalogue-items';

export * from './catalogue-items';
export * from './catalogue-bom';
export * from './catalogue-spreadsheet';

// Catalogue API answers and requests
/** A catalogue item as the API returns it. */
export type CatalogueEntry = CatalogueItem & { id: number; version: number; updatedAt: string };
export type LabourUnitEntry = LabourUnit & { version: number };

/** Filters of the catalogue list. */
export interface CatalogueFilter {
  category?: Category;
  q?: string;
  active?: 'true' | 'false' | 'all';
}

/** Changes to a catalogue item: any field but its code. */
export type ItemChanges = Partial<Omit<CatalogueItemInput, 'code'>>;

/** One entry of a catalogue item's history (from the activity log). */
export interface HistoryEntry {
  id: number;
  action: string;
  summary: string;
  diff: Record<string, unknown> | null;
  user: string | null;
  at: string;
}

/** What an import did. */
export interface ImportSummary {
  created: number;
  updated: number;
  unchanged: number;
}
